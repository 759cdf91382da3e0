/**
 * Empirical equivalent-fluid models of fibrous absorbers, normalised: characteristic impedance
 * Zc/(ρ0c) and wavenumber kc/k0 (time convention e^{jωt}, so both imaginary parts are negative).
 *
 * Delany & Bazley, Applied Acoustics 3 (1970) 105–116, X = ρ0 f / σ:
 *   Zc = ρ0c [1 + 0.0571 X^-0.754 − j 0.087 X^-0.732]
 *   kc = k0  [1 + 0.0978 X^-0.700 − j 0.189 X^-0.595]      valid for 0.01 < X < 1
 * Miki, J. Acoust. Soc. Jpn (E) 11(1) (1990) 19–24, X = f / σ:
 *   Zc = ρ0c [1 + 0.0699 X^-0.632 − j 0.107 X^-0.632]
 *   kc = k0  [1 + 0.109 X^-0.618 − j 0.160 X^-0.618]
 */
import type { PorousModel } from "./build-up";

/** Writes [Zc.re, Zc.im, kc.re, kc.im] (normalised) into out at offset. */
export function porousCharacteristics(
  model: PorousModel,
  flowResistivity: number,
  f: number,
  rho: number,
  out: Float64Array,
  offset = 0,
): void {
  // powers as exp(a·ln X): one logarithm instead of four Math.pow calls in the hot path
  if (model === "miki") {
    const lnX = Math.log(f / flowResistivity);
    const a = Math.exp(-0.632 * lnX);
    const b = Math.exp(-0.618 * lnX);
    out[offset] = 1 + 0.0699 * a;
    out[offset + 1] = -0.107 * a;
    out[offset + 2] = 1 + 0.109 * b;
    out[offset + 3] = -0.16 * b;
  } else {
    const lnX = Math.log((rho * f) / flowResistivity);
    out[offset] = 1 + 0.0571 * Math.exp(-0.754 * lnX);
    out[offset + 1] = -0.087 * Math.exp(-0.732 * lnX);
    out[offset + 2] = 1 + 0.0978 * Math.exp(-0.7 * lnX);
    out[offset + 3] = -0.189 * Math.exp(-0.595 * lnX);
  }
}

/** The dimensionless frequency of Delany & Bazley, X = ρ0 f / σ. */
export function delanyBazleyX(rho: number, f: number, flowResistivity: number): number {
  return (rho * f) / flowResistivity;
}
