/**
 * The facing, normalised by ρ0c (time convention e^{jωt}): how it turns the impedance Zb of the
 * cavity behind it into the surface impedance Zs. Built once per build-up; `at(f)` and
 * `surface(zb)` are the hot path and allocate nothing.
 *
 * Round holes and micro-perforation: Maa's formula (Maa, JASA 104(5) 2861, 1998; Noise Control
 * Eng. J. 29(3), 1987), perforation constant x = (d/2)·sqrt(ωρ0/η):
 *   r  = (32ηt/(ερ0cd²))·[sqrt(1 + x²/32) + (√2/32)·x·d/t]
 *   ωm = (ωt/(εc))·[1 + 1/sqrt(9 + x²/2) + t_end/t]
 * with t_end = 0.85d for micro-perforation (Maa) and t_end = 2δ (Fok 1941, as used by Melling,
 * JSV 29(1), 1973) for ordinary round holes. Maa's end resistance (√2/32)·x·d/t equals R_s/ε,
 * R_s = ½·sqrt(2ηωρ0), and micro-perforation keeps it exactly. Ordinary punched or drilled
 * holes take 4·R_s/ε, i.e. 2·R_s per face (Ingard, JASA 25(6), 1953; Cox & D'Antonio, Acoustic
 * Absorbers and Diffusers, 2009, ch. 7; Guo, Allam & Åbom, JSV 2008, for sharp edges): Maa's
 * R_s/ε under-predicts their measured resistance (Hou & Bolton 2008).
 *
 * Slots: the viscous slit of Stinson (JASA 89(2) 550, 1991), as given by Allard & Atalla,
 * Propagation of Sound in Porous Media (2009): ρ_eff = ρ0 / (1 − tanh(λ)/λ),
 * λ = (w/2)·sqrt(jωρ0/η), in-slit impedance jωρ_eff·t/ε; plus the Smits–Kosten mass end
 * correction 2δ (Smits & Kosten 1951, as used by Kristiansen & Vigran, Applied Acoustics 43,
 * 1994) and, as for ordinary holes, the end resistance 4·R_s/ε.
 *
 * Thin against the wavelength (lumped): the in-hole and end terms in series,
 * Zs = Zb + z_in + z_end. Thick (distributed), where k·t' exceeds THICK_FACING_LIMIT anywhere
 * in the bands computed (up to 5623 Hz): the holes or slots are a layer of equivalent fluid of porosity ε and thickness t,
 * with the in-hole effective density of the same in-hole law (ρ_eff = z_in·ε·z0/(jωt)) and the
 * adiabatic bulk modulus of air ρ0c², so k_h = k0·sqrt(ρ̃), Z_h = sqrt(ρ̃)/ε (ρ̃ = ρ_eff/ρ0); the
 * end masses and end resistance are series terms, half at each face (Allard & Atalla 2009, ch.
 * on perforated plates). For k_h·t → 0 it tends to the lumped facing; above, it keeps the
 * air-column resonances of the holes that the lumped facing misses. The choice is made once per
 * facing, not per frequency: switching at k·t' = 0.3 would put a step into the curve wherever a
 * resonance lies near it (up to 0.09 in α for a heavy slotted plate over a shallow cavity), since
 * the layer also holds the compliance of the air in the holes, which the lumped facing lacks.
 */
import type { Air } from "./air";
import { THIRD_OCTAVES } from "./bands";
import { type Facing, effectiveThickness, facingEndCorrection, facingOpenArea } from "./build-up";

/** End resistance in units of R_s/ε: Maa's own for micro-perforation, 2·R_s per face otherwise. */
export const MAA_END_RESISTANCE = 1;
export const SHARP_EDGE_END_RESISTANCE = 4;

/** Above k·t' = 0.3 a facing is thick against the wavelength: the lumped series facing errs. */
export const THICK_FACING_LIMIT = 0.3;
/** The highest frequency the bands compute: the upper edge of the 5 kHz one-third octave. */
export const HIGHEST_BAND_FREQUENCY = THIRD_OCTAVES[THIRD_OCTAVES.length - 1].upper;

export type FacingModel = "lumped" | "distributed";

/** Numbers a facing's state at one frequency takes (FacingImpedance.save). */
export const FACING_STATE = 8;

/** The frequency where k·t' = THICK_FACING_LIMIT. */
export function thickFromHz(facing: Facing, air: Air): number {
  return (THICK_FACING_LIMIT * air.c) / (2 * Math.PI * effectiveThickness(facing));
}

/** Distributed when k·t' exceeds THICK_FACING_LIMIT anywhere in the bands computed (up to 5623 Hz). */
export function facingModelFor(facing: Facing, air: Air, highest = HIGHEST_BAND_FREQUENCY): FacingModel {
  return highest > thickFromHz(facing, air) ? "distributed" : "lumped";
}

const NONE = 0;
const HOLES = 1;
const SLIT = 2;

export class FacingImpedance {
  /** lumped: the series impedance after `at(f)` (also its lumped equivalent when distributed) */
  zr = 0;
  zi = 0;
  /** the surface impedance after `surface(zb)` */
  sr = 0;
  si = 0;
  readonly model: FacingModel;
  /** Zs = (A·Zb + B)/(C·Zb + A) after `at(f)`: thin, A = 1, B = z_in + z_end, C = 0 */
  ar = 1;
  ai = 0;
  br = 0;
  bi = 0;
  cr = 0;
  ci = 0;
  private readonly kind: number;
  private readonly resistance: number;
  private readonly shape: number;
  private readonly endResistance: number;
  private readonly mass: number;
  private readonly endMass: number;
  private readonly openArea: number;
  private readonly thickness: number;
  private readonly c: number;
  // in-hole and end terms of the current frequency
  private inR = 0;
  private inI = 0;
  private endR = 0;
  private endI = 0;
  private readonly scratch: Complex = { re: 0, im: 0 };
  private readonly tan: Complex = { re: 0, im: 0 };

  /** `model` forces one model; by default it follows k·t' at the top of the bands */
  constructor(facing: Facing | null, air: Air, model?: FacingModel) {
    this.c = air.c;
    if (!facing) {
      this.kind = NONE;
      this.model = "lumped";
      this.resistance = this.shape = this.endResistance = this.mass = this.endMass = this.openArea = this.thickness = 0;
      return;
    }
    const eps = facingOpenArea(facing);
    const t = facing.thickness;
    const tEnd = facingEndCorrection(facing);
    this.model = model ?? facingModelFor(facing, air);
    this.openArea = eps;
    this.thickness = t;
    this.mass = t / (eps * air.c);
    if (facing.kind === "slots") {
      this.kind = SLIT;
      this.resistance = 0;
      this.shape = (facing.slotWidth / 2) * Math.sqrt(air.rho / air.eta);
      this.endResistance = (SHARP_EDGE_END_RESISTANCE * Math.sqrt((air.rho * air.eta) / 2)) / (air.z0 * eps);
      this.endMass = tEnd / (eps * air.c);
    } else {
      const d = facing.holeDiameter;
      this.kind = HOLES;
      this.resistance = (32 * air.eta * t) / (eps * air.z0 * d * d);
      this.shape = (d / 2) * Math.sqrt(air.rho / air.eta);
      const ends = facing.kind === "micro-perforated" ? MAA_END_RESISTANCE : SHARP_EDGE_END_RESISTANCE;
      this.endResistance = (ends * (Math.SQRT2 / 32) * d) / t;
      this.endMass = tEnd / t;
    }
  }

  at(f: number): void {
    const w = 2 * Math.PI * f;
    if (this.kind === HOLES) {
      const x = this.shape * Math.sqrt(w);
      this.inR = this.resistance * Math.sqrt(1 + (x * x) / 32);
      this.inI = w * this.mass * (1 + 1 / Math.sqrt(9 + (x * x) / 2));
      this.endR = this.resistance * this.endResistance * x;
      this.endI = w * this.mass * this.endMass;
    } else if (this.kind === SLIT) {
      this.slit(w);
    } else {
      this.inR = this.inI = this.endR = this.endI = 0;
    }
    this.zr = this.inR + this.endR;
    this.zi = this.inI + this.endI;
    if (this.model === "distributed" && this.kind !== NONE) this.layer(w);
    else {
      this.br = this.zr;
      this.bi = this.zi;
    }
  }

  /** The state `at(f)` leaves, as FACING_STATE numbers into out from offset (for a facing table). */
  save(out: Float64Array, offset: number): void {
    out[offset] = this.zr;
    out[offset + 1] = this.zi;
    out[offset + 2] = this.ar;
    out[offset + 3] = this.ai;
    out[offset + 4] = this.br;
    out[offset + 5] = this.bi;
    out[offset + 6] = this.cr;
    out[offset + 7] = this.ci;
  }

  /** The state of a frequency saved by `save`, in place of `at(f)`. */
  restore(from: Float64Array, offset: number): void {
    this.zr = from[offset];
    this.zi = from[offset + 1];
    this.ar = from[offset + 2];
    this.ai = from[offset + 3];
    this.br = from[offset + 4];
    this.bi = from[offset + 5];
    this.cr = from[offset + 6];
    this.ci = from[offset + 7];
  }

  /** Zs from the impedance Zb of what lies behind the facing, into sr, si. */
  surface(zbr: number, zbi: number): void {
    if (this.model === "lumped") {
      this.sr = zbr + this.zr;
      this.si = zbi + this.zi;
      return;
    }
    const nr = this.ar * zbr - this.ai * zbi + this.br;
    const ni = this.ar * zbi + this.ai * zbr + this.bi;
    const dr = this.cr * zbr - this.ci * zbi + this.ar;
    const di = this.cr * zbi + this.ci * zbr + this.ai;
    const g = 1 / (dr * dr + di * di);
    this.sr = g * (nr * dr + ni * di);
    this.si = g * (ni * dr - nr * di);
  }

  /**
   * Σ weight·α(θ) over angles from … to − 1 (cosines `cos`) for cavity impedances re, im (from
   * offset) behind the facing, after `at(f)`: the field-incidence sum, written out on locals.
   */
  fieldSum(weight: ArrayLike<number>, cos: ArrayLike<number>, re: Float64Array, im: Float64Array, offset: number, from: number, to: number): number {
    let sum = 0;
    if (this.model === "lumped") {
      const fr = this.zr;
      const fi = this.zi;
      for (let j = from; j < to; j++) {
        const c = cos[j];
        const a = (re[offset + j] + fr) * c;
        const b = (im[offset + j] + fi) * c;
        sum += (weight[j] * 4 * a) / ((a + 1) * (a + 1) + b * b);
      }
      return sum;
    }
    // Zs = N/D = (A·Zb + B)/(C·Zb + A): α = 4u·Re(N·conj D)/|N·u + D|², one division
    const { ar, ai, br, bi, cr, ci } = this;
    for (let j = from; j < to; j++) {
      const zr = re[offset + j];
      const zi = im[offset + j];
      const nr = ar * zr - ai * zi + br;
      const ni = ar * zi + ai * zr + bi;
      const dr = cr * zr - ci * zi + ar;
      const di = cr * zi + ci * zr + ai;
      const c = cos[j];
      const er = nr * c + dr;
      const ei = ni * c + di;
      sum += (weight[j] * 4 * c * (nr * dr + ni * di)) / (er * er + ei * ei);
    }
    return sum;
  }

  /**
   * The holes as a layer of thickness t between half the end terms e at each face:
   * Zs = e + Z_h·(Zb + e + j Z_h T)/(Z_h + j (Zb + e) T), T = tan(k_h t), which is the Möbius map
   * A = Z_h + j e T, B = 2 e Z_h + j T (Z_h² + e²), C = j T, D = A.
   */
  private layer(w: number): void {
    const q = (w * this.thickness) / this.c;
    const eps = this.openArea;
    // ρ̃ = z_in·ε/(j q)
    const s = this.scratch;
    csqrt((this.inI * eps) / q, (-this.inR * eps) / q, s);
    const zhr = s.re / eps;
    const zhi = s.im / eps;
    ctan(q * s.re, q * s.im, this.tan);
    const tr = this.tan.re;
    const ti = this.tan.im;
    const er = 0.5 * this.endR;
    const ei = 0.5 * this.endI;
    // e·T and j·e·T
    const etr = er * tr - ei * ti;
    const eti = er * ti + ei * tr;
    this.ar = zhr - eti;
    this.ai = zhi + etr;
    // Z_h² + e², times j T
    const pr = zhr * zhr - zhi * zhi + er * er - ei * ei;
    const pi = 2 * (zhr * zhi + er * ei);
    const jtr = -ti;
    const jti = tr;
    this.br = 2 * (er * zhr - ei * zhi) + (jtr * pr - jti * pi);
    this.bi = 2 * (er * zhi + ei * zhr) + (jtr * pi + jti * pr);
    this.cr = jtr;
    this.ci = jti;
  }

  private slit(w: number): void {
    // F = 1 − tanh(λ)/λ with λ = p(1 + j), p = s/√2, s = (w_slot/2)·sqrt(ωρ0/η)
    const s = this.shape * Math.sqrt(w);
    let fr: number;
    let fi: number;
    if (s < 0.1) {
      // series tanh(λ)/λ = 1 − λ²/3 + 2λ⁴/15 − 17λ⁶/315, with λ² = j s²
      const s2 = s * s;
      fr = (2 * s2 * s2) / 15;
      fi = s2 / 3 - (17 * s2 * s2 * s2) / 315;
    } else {
      const p = s / Math.SQRT2;
      let tr = 1;
      let ti = 0;
      // beyond 2p = 24, tanh λ = 1 to 10⁻¹⁰
      if (2 * p < 24) {
        const e = Math.exp(2 * p);
        const sh = 0.5 * (e - 1 / e);
        const den = 0.5 * (e + 1 / e) + Math.cos(2 * p);
        tr = sh / den;
        ti = Math.sin(2 * p) / den;
      }
      // (tr + j ti) / (p (1 + j)) = ((tr + ti) + j (ti − tr)) / (2p)
      fr = 1 - (tr + ti) / (2 * p);
      fi = -(ti - tr) / (2 * p);
    }
    // jω·mass / F
    const wm = w * this.mass;
    const inv = wm / (fr * fr + fi * fi);
    this.inR = inv * fi;
    this.inI = inv * fr;
    this.endR = this.endResistance * Math.sqrt(w);
    this.endI = w * this.endMass;
  }
}

/** Normalised lumped (series) facing impedance at one frequency (for checks and the interface). */
export function facingImpedance(facing: Facing, f: number, air: Air): { re: number; im: number } {
  const model = new FacingImpedance(facing, air, "lumped");
  model.at(f);
  return { re: model.zr, im: model.zi };
}

// Complex helpers of the layer, kept in this module: the hot path calls them per frequency.

/**
 * Taylor coefficients of tan z, of z²⁵ down to z¹ (tan z = Σ c·z^(2n−1), c from the Bernoulli
 * numbers: (−1)^(n−1)·2^(2n)·(2^(2n) − 1)·B_2n/(2n)!).
 */
const TAN_SERIES = [
  58870668456604 / 3698160658676859375,
  113927491862 / 2900518163668125,
  18888466084 / 194896477400625,
  443861162 / 1856156927625,
  6404582 / 10854718875,
  929569 / 638512875,
  21844 / 6081075,
  1382 / 155925,
  62 / 2835,
  17 / 315,
  2 / 15,
  1 / 3,
  1,
];

interface Complex {
  re: number;
  im: number;
}

/** Principal square root: non-negative real part, imaginary part of the sign of z's. */
function csqrt(re: number, im: number, out: Complex): void {
  const m = Math.sqrt(re * re + im * im);
  if (m === 0) {
    out.re = 0;
    out.im = 0;
    return;
  }
  if (re >= 0) {
    const r = Math.sqrt(0.5 * (m + re));
    out.re = r;
    out.im = im / (2 * r);
  } else {
    const i = (im < 0 ? -1 : 1) * Math.sqrt(0.5 * (m - re));
    out.re = im / (2 * i);
    out.im = i;
  }
}

/**
 * tan(a + jb) = (sin 2a + j sinh 2b) / (cos 2a + cosh 2b); ±j where |b| is large. Below
 * |z| = 0.6 its Taylor series to z²⁵ (the rest under 10⁻¹⁰ of the value: each further term is
 * about (2|z|/π)² = 0.15 of the one before), which needs no exponential or sine.
 */
function ctan(a: number, b: number, out: Complex): void {
  if (a * a + b * b < 0.36) {
    // z·P(z²), P by Horner's rule
    const wr = a * a - b * b;
    const wi = 2 * a * b;
    let pr = TAN_SERIES[0];
    let pi = 0;
    for (let i = 1; i < TAN_SERIES.length; i++) {
      const nr = pr * wr - pi * wi + TAN_SERIES[i];
      pi = pr * wi + pi * wr;
      pr = nr;
    }
    out.re = a * pr - b * pi;
    out.im = a * pi + b * pr;
    return;
  }
  if (b > 20 || b < -20) {
    out.re = 0;
    out.im = b > 0 ? 1 : -1;
    return;
  }
  const e = Math.exp(2 * b);
  const ie = 1 / e;
  const g = 1 / (Math.cos(2 * a) + 0.5 * (e + ie));
  out.re = g * Math.sin(2 * a);
  out.im = g * 0.5 * (e - ie);
}
