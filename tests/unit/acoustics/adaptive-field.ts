/**
 * A reference for the field-incidence integral, for the tests: adaptive Gauss–Kronrod (the
 * 7-point Gauss and 15-point Kronrod pair of QUADPACK; Piessens et al., 1983) of
 *   α_field = ∫0^θm α(θ) sin2θ dθ / sin²θm,  θm = 78°
 * in u = cosθ (sin2θ dθ = 2u du), where the phase of a layer, 2·k·d·u, is linear: the interval
 * starts cut into panels of at most 0.15 rad of that phase over the whole cavity depth (so that
 * no resonance narrower than the nodes hides between them) and any panel whose 7- and 15-point
 * values differ by more than the tolerance is halved, to depth 30. The integrand α(θ) is the
 * engine's layered model at each angle (itself checked against full mathjs matrices elsewhere);
 * nothing of the engine's own field-incidence rule is used.
 */
import type { LayeredModel } from "@/lib/acoustics/layered-model";

const XGK = [0.991455371120812639, 0.949107912342758525, 0.864864423359769073, 0.741531185599394440, 0.586087235467691130, 0.405845151377397167, 0.207784955007898468, 0];
const WGK = [0.022935322010529225, 0.063092092629978553, 0.104790010322250184, 0.140653259715525919, 0.169004726639267903, 0.190350578064785410, 0.204432940075298892, 0.209482141084727828];
const WG = [0.129484966168869693, 0.279705391489276668, 0.381830050505118945, 0.417959183673469388];

/** The 15 Kronrod nodes of [a, b] in u and their weights, Kronrod and Gauss (0 off the Gauss nodes). */
function panel(a: number, b: number) {
  const mid = 0.5 * (a + b);
  const half = 0.5 * (b - a);
  const u: number[] = [];
  const wk: number[] = [];
  const wg: number[] = [];
  for (let i = 0; i < 7; i++) {
    for (const sign of [-1, 1]) {
      u.push(mid + sign * half * XGK[i]);
      wk.push(half * WGK[i]);
      wg.push(i % 2 === 1 ? half * WG[(i - 1) / 2] : 0);
    }
  }
  u.push(mid);
  wk.push(half * WGK[7]);
  wg.push(half * WG[3]);
  return { u, wk, wg };
}

export interface AdaptiveOptions {
  maxAngleDeg?: number;
  /** absolute tolerance per panel */
  tolerance?: number;
}

/** α_field at the frequency the model was last set to (after `setFrequency(f)`). */
export function adaptiveField(model: LayeredModel, f: number, partitioned: boolean, options: AdaptiveOptions = {}): { value: number; evaluations: number } {
  const max = ((options.maxAngleDeg ?? 78) * Math.PI) / 180;
  const norm = Math.sin(max) ** 2;
  const tol = options.tolerance ?? 1e-10;
  const u0 = Math.cos(max);
  model.impedance();
  const normal = { re: model.cavityRe, im: model.cavityIm };
  const cos = new Float64Array(15);
  const sin2 = new Float64Array(15);
  const re = new Float64Array(15);
  const im = new Float64Array(15);
  let evaluations = 0;
  const alphas = (u: number[]) => {
    u.forEach((x, i) => {
      cos[i] = x;
      sin2[i] = 1 - x * x;
    });
    if (partitioned) {
      re.fill(normal.re);
      im.fill(normal.im);
    } else {
      model.cavityImpedances(cos, sin2, 15, re, im, 0);
    }
    evaluations += 15;
    return u.map((x, i) => {
      model.facing.surface(re[i], im[i]);
      const a = model.facing.sr * x;
      const b = model.facing.si * x;
      return (4 * a) / ((a + 1) * (a + 1) + b * b);
    });
  };
  const recurse = (a: number, b: number, depth: number): number => {
    const { u, wk, wg } = panel(a, b);
    const alpha = alphas(u);
    let kronrod = 0;
    let gauss = 0;
    alpha.forEach((v, i) => {
      kronrod += (wk[i] * 2 * u[i] * v) / norm;
      gauss += (wg[i] * 2 * u[i] * v) / norm;
    });
    if (Math.abs(kronrod - gauss) <= tol || depth >= 30) return kronrod;
    const m = 0.5 * (a + b);
    return recurse(a, m, depth + 1) + recurse(m, b, depth + 1);
  };
  const phase = 2 * ((2 * Math.PI * f) / model.c) * model.depth * (1 - u0);
  const panels = Math.max(16, Math.ceil(phase / 0.15));
  let value = 0;
  for (let i = 0; i < panels; i++) value += recurse(u0 + ((1 - u0) * i) / panels, u0 + ((1 - u0) * (i + 1)) / panels, 0);
  return { value, evaluations };
}
