/**
 * The full model: a facing as a thin series impedance over fluid layers (air or equivalent-fluid
 * porous) on a rigid backing, by transfer matrices (Allard & Atalla, Propagation of Sound in
 * Porous Media, 2009, ch. 11; Cox & D'Antonio, Acoustic Absorbers and Diffusers, 2009, ch. 2).
 *
 * With a rigid backing the product matrix only matters through Zs = T11/T21, so the layers are
 * applied from the backing forwards as impedance translations, which is the same algebra with
 * fewer operations: the back layer gives −j Zz cot(kz d); each layer in front of a load Zb gives
 * Zz (Zb + j Zz tan(kz d)) / (Zz + j Zb tan(kz d)); the facing turns the cavity's Zb into Zs
 * (in series when thin, as a layer of its own when thick: facing-impedance.ts).
 * Oblique incidence at trace wavenumber k0 sinθ: air kz = k0 cosθ, Zz = ρ0c/cosθ; porous
 * kz = sqrt(kc² − k0² sin²θ), Zz = Zc kc/kz.
 *
 * Complex arithmetic is written out on (re, im) pairs, one layer at a time over all angles of a
 * frequency (independent angles keep the processor busy); nothing is allocated per frequency.
 */
import type { Air } from "./air";
import type { Facing, Layer } from "./build-up";
import { FacingImpedance, type FacingModel } from "./facing-impedance";
import type { Quadrature } from "./incidence";
import { porousCharacteristics } from "./porous";

const TINY = 1e-12;
const NORMAL_COS = Float64Array.of(1);
const NORMAL_SIN2 = Float64Array.of(0);
const NONE = new Float64Array(0);

export class LayeredModel {
  /** normalised surface impedance at normal incidence after `impedance()` */
  zr = 0;
  zi = 0;
  /** the cavity's own impedance at normal incidence after `impedance()` */
  cavityRe = 0;
  cavityIm = 0;
  readonly facing: FacingImpedance;
  private readonly count: number;
  private readonly layers: Layer[];
  private readonly thickness: Float64Array;
  /** per porous layer: Zc.re, Zc.im, kc.re, kc.im at the current frequency */
  private readonly fluid: Float64Array;
  private readonly rho: number;
  /** speed of sound, m/s */
  readonly c: number;
  /** the whole cavity, facing to backing, m */
  readonly depth: number;
  /** the cavity's depth when it is air alone (no infill), else null */
  readonly airOnly: number | null;
  private k0 = 0;
  // grown to the most angles asked for (none when a cavity table serves)
  private re = NONE;
  private im = NONE;

  constructor(facing: Facing | null, layers: Layer[], air: Air, facingModel?: FacingModel) {
    this.layers = layers.filter((layer) => layer.thickness > 0);
    this.count = this.layers.length;
    this.thickness = Float64Array.from(this.layers, (layer) => layer.thickness);
    this.fluid = new Float64Array(4 * this.count);
    this.facing = new FacingImpedance(facing, air, facingModel);
    this.rho = air.rho;
    this.c = air.c;
    this.depth = this.layers.reduce((sum, layer) => sum + layer.thickness, 0);
    this.airOnly = this.count === 1 && this.layers[0].kind === "air" ? this.depth : null;
  }

  /** Prepare everything that depends on frequency only. */
  setFrequency(f: number): void {
    this.facing.at(f);
    this.setCavityFrequency(f);
  }

  /** The cavity's part of setFrequency: for a caller that has set the facing itself. */
  setCavityFrequency(f: number): void {
    this.k0 = (2 * Math.PI * f) / this.c;
    for (let i = 0; i < this.count; i++) {
      const layer = this.layers[i];
      if (layer.kind === "porous") {
        porousCharacteristics(layer.model, layer.flowResistivity, f, this.rho, this.fluid, 4 * i);
      }
    }
  }

  /** Normal-incidence surface impedance into zr, zi. */
  impedance(): void {
    this.layerImpedances(NORMAL_COS, NORMAL_SIN2, 1);
    this.cavityRe = this.re[0];
    this.cavityIm = this.im[0];
    this.facing.surface(this.cavityRe, this.cavityIm);
    this.zr = this.facing.sr;
    this.zi = this.facing.si;
  }

  /** Normal-incidence absorption at f. */
  normalAbsorption(f: number): number {
    this.setFrequency(f);
    this.impedance();
    const a = this.zr;
    return (4 * a) / ((a + 1) * (a + 1) + this.zi * this.zi);
  }

  /** Extended reaction: field-incidence absorption with every layer at each angle. */
  fieldAbsorption(q: Quadrature): number {
    this.layerImpedances(q.cos, q.sin2, q.n);
    return this.facing.fieldSum(q.weight, q.cos, this.re, this.im, 0, 0, q.n);
  }

  /** The cavity alone (no facing) at n angles (cosines, squared sines), copied into re, im from offset. */
  cavityImpedances(cos: Float64Array, sin2: Float64Array, n: number, re: Float64Array, im: Float64Array, offset = 0): void {
    this.layerImpedances(cos, sin2, n);
    for (let j = 0; j < n; j++) {
      re[offset + j] = this.re[j];
      im[offset + j] = this.im[j];
    }
  }

  /** Impedances of the layers on the backing at n angles (cosines, squared sines) into re, im. */
  private layerImpedances(cos: Float64Array, sin2: Float64Array, n: number): void {
    if (this.re.length < n) {
      this.re = new Float64Array(n);
      this.im = new Float64Array(n);
    }
    const { re, im, k0 } = this;
    for (let i = this.count - 1; i >= 0; i--) {
      const d = this.thickness[i];
      const back = i === this.count - 1;
      if (this.layers[i].kind === "air") {
        for (let j = 0; j < n; j++) {
          const zz = 1 / cos[j];
          let t = Math.tan(k0 * cos[j] * d);
          if (Math.abs(t) < TINY) t = TINY;
          if (back) {
            re[j] = 0;
            im[j] = -zz / t;
            continue;
          }
          // zz (Zb + j zz t) / (zz − Zb.im t + j Zb.re t)
          const br = re[j];
          const bi = im[j];
          const ni = bi + zz * t;
          const dr = zz - bi * t;
          const di = br * t;
          const g = zz / (dr * dr + di * di);
          re[j] = g * (br * dr + ni * di);
          im[j] = g * (ni * dr - br * di);
        }
        continue;
      }
      const o = 4 * i;
      const zcr = this.fluid[o];
      const zci = this.fluid[o + 1];
      const kr = this.fluid[o + 2];
      const ki = this.fluid[o + 3];
      const k2r = kr * kr - ki * ki;
      const k2i = 2 * kr * ki;
      const pr = zcr * kr - zci * ki;
      const pi = zcr * ki + zci * kr;
      const phase = 2 * k0 * d;
      for (let j = 0; j < n; j++) {
        // q = kz/k0 = sqrt((kc/k0)² − sin²θ), the root with negative imaginary part
        const xr = k2r - sin2[j];
        const m = Math.sqrt(xr * xr + k2i * k2i);
        let qr: number;
        let qi: number;
        if (xr >= 0) {
          qr = Math.sqrt(0.5 * (m + xr));
          qi = k2i / (2 * qr);
        } else {
          qi = (k2i < 0 ? -1 : 1) * Math.sqrt(0.5 * (m - xr));
          qr = k2i / (2 * qi);
        }
        // Zz = Zc·kc/kz
        const g0 = 1 / (qr * qr + qi * qi);
        const zzr = g0 * (pr * qr + pi * qi);
        const zzi = g0 * (pi * qr - pr * qi);
        // T = tan(k0 d q); tan(a + jb) = (sin 2a + j sinh 2b) / (cos 2a + cosh 2b)
        const a = phase * qr;
        const b = phase * qi;
        let tr = 0;
        let ti = b > 0 ? 1 : -1;
        if (b < 40 && b > -40) {
          const e = Math.exp(b);
          const ie = 1 / e;
          const g = 1 / (Math.cos(a) + 0.5 * (e + ie));
          tr = g * Math.sin(a);
          ti = g * 0.5 * (e - ie);
        }
        if (back) {
          // −j Zz / T
          const g = 1 / (tr * tr + ti * ti);
          re[j] = g * (zzi * tr - zzr * ti);
          im[j] = -g * (zzr * tr + zzi * ti);
          continue;
        }
        // Zz (Zb + j Zz T) / (Zz + j Zb T)
        const br = re[j];
        const bi = im[j];
        const ar = zzr * tr - zzi * ti;
        const ai = zzr * ti + zzi * tr;
        const cr = br * tr - bi * ti;
        const ci = br * ti + bi * tr;
        const nr = br - ai;
        const ni = bi + ar;
        const dr = zzr - ci;
        const di = zzi + cr;
        const g = 1 / (dr * dr + di * di);
        const hr = g * (nr * dr + ni * di);
        const hi = g * (ni * dr - nr * di);
        re[j] = zzr * hr - zzi * hi;
        im[j] = zzr * hi + zzi * hr;
      }
    }
  }
}
