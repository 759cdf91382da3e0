/**
 * Lumped Helmholtz estimates of a perforated panel and of a single resonator.
 */
import { type AirConditions, airProperties } from "./air";
import { type Facing, effectiveThickness, facingOpenArea } from "./build-up";
import { FLANGED_END, FREE_END } from "./end-corrections";

/**
 * Perforated or slotted panel over a cavity of depth D, cavity ≪ wavelength
 * (Cox & D'Antonio, Acoustic Absorbers and Diffusers, ch. 7; Kuttruff, Room Acoustics):
 * f0 = (c/2π)·sqrt(ε / (D·t')). Infill is ignored.
 */
export function lumpedPanelHz(openArea: number, effectiveNeck: number, depth: number, c: number): number {
  return (c / (2 * Math.PI)) * Math.sqrt(openArea / (depth * effectiveNeck));
}

export function panelHelmholtzHz(facing: Facing, depth: number, air: AirConditions = {}): number {
  return lumpedPanelHz(facingOpenArea(facing), effectiveThickness(facing), depth, airProperties(air).c);
}

/**
 * The same mass over the cavity without the low-frequency approximation cot(kD) ≈ 1/(kD):
 * the first root of ω t'/(ε c) = cot(ω D / c), which always lies below it. Found by bisection on
 * (0, c/(4D)), where the left side rises and the right side falls.
 */
export function cotRootHz(openArea: number, effectiveNeck: number, depth: number, c: number): number {
  const mass = effectiveNeck / (openArea * c);
  const g = (f: number) => {
    const w = 2 * Math.PI * f;
    return w * mass - 1 / Math.tan((w * depth) / c);
  };
  let lo = 0;
  let hi = c / (4 * depth);
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + hi);
    if (g(mid) > 0) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

export type NeckEnds = "flanged-flanged" | "flanged-free" | "none";

export interface ResonatorGeometry {
  /** m² */
  neckArea: number;
  /** m */
  neckLength: number;
  /** m³ */
  volume: number;
  /** m; defaults to the radius of a circular neck of that area */
  neckRadius?: number;
  ends: NeckEnds;
  air?: AirConditions;
}

/** L' = L + end corrections: flanged 8a/(3π) (Rayleigh), free 0.6133a (Levine & Schwinger). */
export function neckEndCorrection(ends: NeckEnds, radius: number): number {
  if (ends === "flanged-flanged") return 2 * FLANGED_END * radius;
  if (ends === "flanged-free") return (FLANGED_END + FREE_END) * radius;
  return 0;
}

/**
 * Single resonator, f0 = (c/2π)·sqrt(S / (V·L')) (Rayleigh, Theory of Sound; Kinsler et al.,
 * Fundamentals of Acoustics, on the Helmholtz resonator).
 */
export function resonatorHz(input: ResonatorGeometry): number {
  const radius = input.neckRadius ?? Math.sqrt(input.neckArea / Math.PI);
  const length = input.neckLength + neckEndCorrection(input.ends, radius);
  const { c } = airProperties(input.air);
  return (c / (2 * Math.PI)) * Math.sqrt(input.neckArea / (input.volume * length));
}
