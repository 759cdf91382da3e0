/**
 * Specific transfer impedance of the facing, normalised by ρ0c (time convention e^{jωt}).
 * Built once per build-up; `at(f)` is the hot path and allocates nothing.
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
 */
import type { Air } from "./air";
import { type Facing, facingEndCorrection, facingOpenArea } from "./build-up";

const NONE = 0;
/** End resistance in units of R_s/ε: Maa's own for micro-perforation, 2·R_s per face otherwise. */
export const MAA_END_RESISTANCE = 1;
export const SHARP_EDGE_END_RESISTANCE = 4;

const HOLES = 1;
const SLIT = 2;

export class FacingImpedance {
  /** normalised resistance and reactance after `at(f)` */
  zr = 0;
  zi = 0;
  private readonly kind: number;
  private readonly resistance: number;
  private readonly shape: number;
  private readonly endResistance: number;
  private readonly mass: number;
  private readonly endMass: number;

  constructor(facing: Facing | null, air: Air) {
    if (!facing) {
      this.kind = NONE;
      this.resistance = this.shape = this.endResistance = this.mass = this.endMass = 0;
      return;
    }
    const eps = facingOpenArea(facing);
    const t = facing.thickness;
    const tEnd = facingEndCorrection(facing);
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
      this.zr = this.resistance * (Math.sqrt(1 + (x * x) / 32) + this.endResistance * x);
      this.zi = w * this.mass * (1 + 1 / Math.sqrt(9 + (x * x) / 2) + this.endMass);
    } else if (this.kind === SLIT) {
      this.slit(w);
    } else {
      this.zr = 0;
      this.zi = 0;
    }
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
      if (2 * p < 40) {
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
    const sw = Math.sqrt(w);
    this.zr = inv * fi + this.endResistance * sw;
    this.zi = inv * fr + w * this.endMass;
  }
}

/** Normalised facing impedance at one frequency (for checks and the interface). */
export function facingImpedance(facing: Facing, f: number, air: Air): { re: number; im: number } {
  const model = new FacingImpedance(facing, air);
  model.at(f);
  return { re: model.zr, im: model.zi };
}
