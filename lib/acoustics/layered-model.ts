/**
 * The full model: a facing as a thin series impedance over fluid layers (air or equivalent-fluid
 * porous) on a rigid backing, by transfer matrices (Allard & Atalla, Propagation of Sound in
 * Porous Media, 2009, ch. 11; Cox & D'Antonio, Acoustic Absorbers and Diffusers, 2009, ch. 2).
 *
 * With a rigid backing the product matrix only matters through Zs = T11/T21, so the layers are
 * applied from the backing forwards as impedance translations, which is the same algebra with
 * fewer operations: the back layer gives −j Zz cot(kz d); each layer in front of a load Zb gives
 * Zz (Zb + j Zz tan(kz d)) / (Zz + j Zb tan(kz d)); the facing adds its impedance in series.
 * Oblique incidence at trace wavenumber k0 sinθ: air kz = k0 cosθ, Zz = ρ0c/cosθ; porous
 * kz = sqrt(kc² − k0² sin²θ), Zz = Zc kc/kz.
 *
 * Complex arithmetic is written out on (re, im) pairs; nothing is allocated per frequency.
 */
import { type Air } from "./air";
import type { Facing, Layer } from "./build-up";
import { FacingImpedance } from "./facing-impedance";
import { porousCharacteristics } from "./porous";

const TINY = 1e-12;

export class LayeredModel {
  /** normalised surface impedance after `impedance()` */
  zr = 0;
  zi = 0;
  readonly facing: FacingImpedance;
  private readonly count: number;
  private readonly porous: Uint8Array;
  private readonly thickness: Float64Array;
  private readonly layers: Layer[];
  /** per porous layer: Zc.re, Zc.im, kc.re, kc.im at the current frequency */
  private readonly fluid: Float64Array;
  private readonly rho: number;
  private readonly c: number;
  private k0 = 0;

  constructor(facing: Facing | null, layers: Layer[], air: Air) {
    this.layers = layers.filter((layer) => layer.thickness > 0);
    this.count = this.layers.length;
    this.porous = new Uint8Array(this.count);
    this.thickness = new Float64Array(this.count);
    this.fluid = new Float64Array(4 * this.count);
    this.layers.forEach((layer, i) => {
      this.porous[i] = layer.kind === "porous" ? 1 : 0;
      this.thickness[i] = layer.thickness;
    });
    this.facing = new FacingImpedance(facing, air);
    this.rho = air.rho;
    this.c = air.c;
  }

  /** Prepare everything that depends on frequency only. */
  setFrequency(f: number): void {
    this.k0 = (2 * Math.PI * f) / this.c;
    this.facing.at(f);
    for (let i = 0; i < this.count; i++) {
      const layer = this.layers[i];
      if (layer.kind === "porous") {
        porousCharacteristics(layer.model, layer.flowResistivity, f, this.rho, this.fluid, 4 * i);
      }
    }
  }

  /** Surface impedance at the angle whose cosine and squared sine are given. */
  impedance(cos: number, sin2: number): void {
    let br = 0;
    let bi = 0;
    const k0 = this.k0;
    for (let i = this.count - 1; i >= 0; i--) {
      const d = this.thickness[i];
      const back = i === this.count - 1;
      if (this.porous[i] === 0) {
        // air layer: real Zz and real tangent
        const zz = 1 / cos;
        let t = Math.tan(k0 * cos * d);
        if (Math.abs(t) < TINY) t = TINY;
        if (back) {
          br = 0;
          bi = -zz / t;
        } else {
          // zz (Zb + j zz t) / (zz − Zb.im t + j Zb.re t)
          const nr = br;
          const ni = bi + zz * t;
          const dr = zz - bi * t;
          const di = br * t;
          const den = dr * dr + di * di;
          br = (zz * (nr * dr + ni * di)) / den;
          bi = (zz * (ni * dr - nr * di)) / den;
        }
        continue;
      }
      const o = 4 * i;
      const zcr = this.fluid[o];
      const zci = this.fluid[o + 1];
      const kr = this.fluid[o + 2];
      const ki = this.fluid[o + 3];
      // q = kz/k0 = sqrt((kc/k0)² − sin²θ), the root with negative imaginary part
      let qr = kr;
      let qi = ki;
      let zzr = zcr;
      let zzi = zci;
      if (sin2 > 0) {
        const xr = kr * kr - ki * ki - sin2;
        const xi = 2 * kr * ki;
        const m = Math.sqrt(xr * xr + xi * xi);
        if (xr >= 0) {
          qr = Math.sqrt(0.5 * (m + xr));
          qi = xi / (2 * qr);
        } else {
          qi = (xi < 0 ? -1 : 1) * Math.sqrt(0.5 * (m - xr));
          qr = xi / (2 * qi);
        }
        // Zz = Zc·kc/kz
        const pr = zcr * kr - zci * ki;
        const pi = zcr * ki + zci * kr;
        const qq = qr * qr + qi * qi;
        zzr = (pr * qr + pi * qi) / qq;
        zzi = (pi * qr - pr * qi) / qq;
      }
      // T = tan(k0 d q), tan(a + jb) = (sin 2a + j sinh 2b) / (cos 2a + cosh 2b)
      const a = 2 * k0 * d * qr;
      const b = 2 * k0 * d * qi;
      let tr: number;
      let ti: number;
      if (b > 40 || b < -40) {
        tr = 0;
        ti = b > 0 ? 1 : -1;
      } else {
        const e = Math.exp(b);
        const den = Math.cos(a) + 0.5 * (e + 1 / e);
        tr = Math.sin(a) / den;
        ti = (0.5 * (e - 1 / e)) / den;
      }
      if (back) {
        // −j Zz / T
        const tt = tr * tr + ti * ti;
        const ur = (zzr * tr + zzi * ti) / tt;
        const ui = (zzi * tr - zzr * ti) / tt;
        br = ui;
        bi = -ur;
      } else {
        // Zz (Zb + j Zz T) / (Zz + j Zb T)
        const ar = zzr * tr - zzi * ti;
        const ai = zzr * ti + zzi * tr;
        const cr = br * tr - bi * ti;
        const ci = br * ti + bi * tr;
        const nr = br - ai;
        const ni = bi + ar;
        const dr = zzr - ci;
        const di = zzi + cr;
        const den = dr * dr + di * di;
        const hr = (nr * dr + ni * di) / den;
        const hi = (ni * dr - nr * di) / den;
        br = zzr * hr - zzi * hi;
        bi = zzr * hi + zzi * hr;
      }
    }
    this.zr = br + this.facing.zr;
    this.zi = bi + this.facing.zi;
  }

  /** Normal-incidence absorption at f. */
  normalAbsorption(f: number): number {
    this.setFrequency(f);
    this.impedance(1, 0);
    const a = this.zr;
    return (4 * a) / ((a + 1) * (a + 1) + this.zi * this.zi);
  }
}
