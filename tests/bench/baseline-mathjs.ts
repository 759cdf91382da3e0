/**
 * A plain implementation of the same formulas with mathjs complex numbers, for the benchmark
 * and as an independent route in the unit tests: full 2×2 transfer matrices multiplied front to
 * back (Allard & Atalla 2009, ch. 11), Zs = T11/T21, and every angle's trigonometry computed
 * where it is used. Only the Gauss–Legendre nodes are shared with the engine.
 */
import { type Complex, add, complex, cos, divide, multiply, sin, sqrt, subtract } from "mathjs";
import type { BuildUp, Layer } from "@/lib/acoustics/build-up";
import { gaussLegendre } from "@/lib/acoustics/incidence";

type C = Complex;
type Matrix = [C, C, C, C];

const ONE = complex(1, 0);
const ZERO = complex(0, 0);
const J = complex(0, 1);

function air(temperature = 20, pressure = 101325) {
  const t = temperature + 273.15;
  const c = Math.sqrt(1.4 * 287.05 * t);
  const rho = pressure / (287.05 * t);
  return { c, rho, eta: (1.458e-6 * t ** 1.5) / (t + 110.4) };
}
type Air = ReturnType<typeof air>;

function openArea(b: BuildUp): number {
  const f = b.facing;
  if (f.kind === "slots") return f.slotWidth / f.slotPitch;
  const r = (f.holeDiameter / f.pitch) ** 2;
  return f.grid === "square" ? (Math.PI * r) / 4 : (Math.PI * r) / (2 * Math.sqrt(3));
}

function endCorrection(b: BuildUp, eps: number): number {
  const f = b.facing;
  if (f.kind === "slots") return 2 * (f.slotWidth / Math.PI) * Math.log(1 / Math.sin((Math.PI * eps) / 2));
  if (f.kind === "micro-perforated") return 0.85 * f.holeDiameter;
  const xi = Math.sqrt(eps);
  const psi =
    1 - 1.40925 * xi + 0.33818 * xi ** 3 + 0.06793 * xi ** 5 - 0.02287 * xi ** 6 + 0.03015 * xi ** 7 -
    0.01641 * xi ** 8 + 0.01729 * xi ** 9 - 0.01248 * xi ** 10 + 0.01205 * xi ** 11 - 0.00985 * xi ** 12;
  return 2 * ((8 / (3 * Math.PI)) * (f.holeDiameter / 2) * psi);
}

/**
 * End resistance in units of R_s/ε, R_s = ½·sqrt(2ηωρ0): Maa's own for micro-perforation,
 * 2·R_s per face for ordinary holes and slots (Ingard 1953; Cox & D'Antonio 2009, ch. 7).
 */
const endResistanceFactor = (b: BuildUp) => (b.facing.kind === "micro-perforated" ? 1 : 4);

/** The facing's in-hole (or in-slit) and end impedances, normalised by ρc: Maa (holes) or Stinson's slit (slots). */
function facingParts(b: BuildUp, f: number, a: Air): { inHole: C; ends: C } {
  const w = 2 * Math.PI * f;
  const eps = openArea(b);
  const tEnd = endCorrection(b, eps);
  const fc = b.facing;
  if (fc.kind === "slots") {
    const lambda = multiply(fc.slotWidth / 2, sqrt(complex(0, (w * a.rho) / a.eta))) as C;
    const F = subtract(ONE, divide(tanh(lambda), lambda)) as C;
    const inSlit = divide(complex(0, (w * fc.thickness) / (eps * a.c)), F) as C;
    const rs = 0.5 * Math.sqrt(2 * a.eta * w * a.rho);
    return { inHole: inSlit, ends: complex((endResistanceFactor(b) * rs) / (a.rho * a.c * eps), (w * tEnd) / (eps * a.c)) };
  }
  const d = fc.holeDiameter;
  const t = fc.thickness;
  const x = (d / 2) * Math.sqrt((w * a.rho) / a.eta);
  const rs = 0.5 * Math.sqrt(2 * a.eta * w * a.rho);
  const r = ((32 * a.eta * t) / (eps * a.rho * a.c * d * d)) * Math.sqrt(1 + (x * x) / 32);
  const m = ((w * t) / (eps * a.c)) * (1 + 1 / Math.sqrt(9 + (x * x) / 2));
  return { inHole: complex(r, m), ends: complex((endResistanceFactor(b) * rs) / (a.rho * a.c * eps), (w * tEnd) / (eps * a.c)) };
}

/**
 * The facing as a 2×2 matrix. Thin against the wavelength (k·t' ≤ 0.3 at the top of the 5 kHz
 * band, 5623 Hz): the in-hole and end impedances in series. Thick: half the end impedance, a layer of the holes'
 * equivalent fluid (ρ_eff from the in-hole impedance, bulk modulus ρ0c², porosity ε), the other
 * half (Allard & Atalla 2009, ch. on perforated plates).
 */
function facingMatrix(b: BuildUp, f: number, a: Air): Matrix {
  const { inHole, ends } = facingParts(b, f, a);
  const eps = openArea(b);
  const tPrime = b.facing.thickness + endCorrection(b, eps);
  const topOfBands = 1000 * 10 ** 0.75;
  if (((2 * Math.PI * topOfBands) / a.c) * tPrime <= 0.3) return [ONE, add(inHole, ends) as C, ZERO, ONE];
  const q = (2 * Math.PI * f * b.facing.thickness) / a.c;
  // jωρ_eff t/(ε ρ0 c) = inHole, so ρ_eff/ρ0 = inHole·ε/(j q)
  const relative = divide(multiply(inHole, eps), complex(0, q)) as C;
  const root = sqrt(relative) as C;
  const zh = divide(root, eps) as C;
  const kt = multiply(root, q) as C;
  const layer: Matrix = [cos(kt), multiply(J, multiply(zh, sin(kt))) as C, divide(multiply(J, sin(kt)), zh) as C, cos(kt)];
  const half: Matrix = [ONE, multiply(ends, 0.5) as C, ZERO, ONE];
  return matmul(matmul(half, layer), half);
}

function tanh(z: C): C {
  const e2 = multiply(2, z) as C;
  const ep = complex(Math.exp(e2.re) * Math.cos(e2.im), Math.exp(e2.re) * Math.sin(e2.im));
  return divide(subtract(ep, ONE), add(ep, ONE)) as C;
}

function porous(layer: Extract<Layer, { kind: "porous" }>, f: number, a: Air): { zc: C; kc: C } {
  if (layer.model === "miki") {
    const x = f / layer.flowResistivity;
    return {
      zc: complex(1 + 0.0699 * x ** -0.632, -0.107 * x ** -0.632),
      kc: complex(1 + 0.109 * x ** -0.618, -0.16 * x ** -0.618),
    };
  }
  const x = (a.rho * f) / layer.flowResistivity;
  return {
    zc: complex(1 + 0.0571 * x ** -0.754, -0.087 * x ** -0.732),
    kc: complex(1 + 0.0978 * x ** -0.7, -0.189 * x ** -0.595),
  };
}

function layersOf(b: BuildUp): Layer[] {
  const { cavity, infill } = b;
  if (!infill) return [{ kind: "air", thickness: cavity.depth }];
  const p: Layer = { kind: "porous", thickness: infill.thickness, flowResistivity: infill.flowResistivity, model: infill.model };
  const gap = cavity.depth - infill.thickness;
  if (gap <= 0) return [p];
  return infill.position === "behind-facing" ? [p, { kind: "air", thickness: gap }] : [{ kind: "air", thickness: gap }, p];
}

function matmul(A: Matrix, B: Matrix): Matrix {
  return [
    add(multiply(A[0], B[0]), multiply(A[1], B[2])) as C,
    add(multiply(A[0], B[1]), multiply(A[1], B[3])) as C,
    add(multiply(A[2], B[0]), multiply(A[3], B[2])) as C,
    add(multiply(A[2], B[1]), multiply(A[3], B[3])) as C,
  ];
}

/** Zs (normalised) at angle θ from the product of the layer matrices. */
function surfaceZ(b: BuildUp, f: number, theta: number, a: Air): C {
  const k0 = (2 * Math.PI * f) / a.c;
  const s2 = Math.sin(theta) ** 2;
  let T: Matrix = facingMatrix(b, f, a);
  for (const layer of layersOf(b)) {
    let kz: C;
    let zz: C;
    if (layer.kind === "air") {
      kz = complex(k0 * Math.cos(theta), 0);
      zz = complex(1 / Math.cos(theta), 0);
    } else {
      const { zc, kc } = porous(layer, f, a);
      const q = sqrt(subtract(multiply(kc, kc), s2) as C) as C;
      const qq = q.im > 0 ? (multiply(-1, q) as C) : q;
      kz = multiply(k0, qq) as C;
      zz = divide(multiply(zc, kc), qq) as C;
    }
    const phase = multiply(kz, layer.thickness) as C;
    const L: Matrix = [cos(phase), multiply(J, multiply(zz, sin(phase))) as C, divide(multiply(J, sin(phase)), zz) as C, cos(phase)];
    T = matmul(T, L);
  }
  return divide(T[0], T[2]) as C;
}

function alphaOf(z: C, theta: number): number {
  const zc = multiply(z, Math.cos(theta)) as C;
  const r = divide(subtract(zc, ONE), add(zc, ONE)) as C;
  return 1 - (r.re * r.re + r.im * r.im);
}

export function baselineEvaluate(b: BuildUp, angles = 16, maxDeg = 78, perBand = 7) {
  const a = air(b.air?.temperature, b.air?.pressure);
  const { x, w } = gaussLegendre(angles);
  const max = (maxDeg * Math.PI) / 180;
  const thirds: { normal: number; diffuse: number }[] = [];
  for (let k = -13; k <= 7; k++) {
    const fm = 1000 * 10 ** (k / 10);
    const lo = fm * 10 ** -0.05;
    const hi = fm * 10 ** 0.05;
    let normal = 0;
    let diffuse = 0;
    for (let i = 0; i < perBand; i++) {
      const f = lo * (hi / lo) ** ((i + 0.5) / perBand);
      const zn = surfaceZ(b, f, 0, a);
      // as the engine does: a negative value (a porous model outside its range) counts as 0
      normal += Math.max(0, alphaOf(zn, 0)) / perBand;
      let sum = 0;
      for (let j = 0; j < angles; j++) {
        const theta = (max * (1 + x[j])) / 2;
        const z = b.cavity.partitioned ? zn : surfaceZ(b, f, theta, a);
        sum += ((max / 2) * w[j] * alphaOf(z, theta) * Math.sin(2 * theta)) / Math.sin(max) ** 2;
      }
      diffuse += Math.max(0, sum) / perBand;
    }
    thirds.push({ normal, diffuse });
  }
  return { thirds, peakHz: baselinePeak(b, a) };
}

/**
 * The peak below c/(4D): every local maximum of a log grid 1/70 decade apart over the three
 * decades refined by golden sections, the highest kept (the engine brackets on its band samples
 * and a grid and refines its best candidates by Brent's method: both must land on the same,
 * highest maximum).
 */
function baselinePeak(b: BuildUp, a: Air): number {
  const upper = a.c / (4 * b.cavity.depth);
  const lower = upper / 1000;
  const alpha = (lf: number) => alphaOf(surfaceZ(b, Math.exp(lf), 0, a), 0);
  const points = 211;
  const step = Math.log(1000) / (points - 1);
  const grid = Array.from({ length: points }, (_, i) => alpha(Math.log(lower) + i * step));
  // every local maximum of the grid is refined by golden sections; the highest wins
  let bestF = upper;
  let bestValue = -1;
  for (let i = 0; i < points; i++) {
    if ((i > 0 && grid[i] < grid[i - 1]) || (i < points - 1 && grid[i] < grid[i + 1])) continue;
    let lo = Math.log(lower) + Math.max(i - 1, 0) * step;
    let hi = Math.log(lower) + Math.min(i + 1, points - 1) * step;
    const g = (Math.sqrt(5) - 1) / 2;
    while (hi - lo > 1e-8) {
      const x1 = hi - g * (hi - lo);
      const x2 = lo + g * (hi - lo);
      if (alpha(x1) < alpha(x2)) lo = x1;
      else hi = x2;
    }
    const f = i === points - 1 && Math.log(upper) - 0.5 * (lo + hi) < 1e-7 ? upper : Math.exp(0.5 * (lo + hi));
    const value = alpha(Math.log(f));
    if (value > bestValue) [bestF, bestValue] = [f, value];
  }
  return bestF;
}
