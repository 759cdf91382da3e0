/**
 * End corrections of necks, holes and slots; the sources are named with each below.
 */

/** Rayleigh's radiation mass of a baffled piston: δ = 8a/(3π) ≈ 0.8488 a per flanged end. */
export const FLANGED_END = 8 / (3 * Math.PI);

/** Levine & Schwinger (Phys. Rev. 73, 383, 1948): δ = 0.6133 a for an unflanged (free) end. */
export const FREE_END = 0.6133;

/** Maa's total end correction of a micro-perforation, 0.85 d (Maa 1998), no interaction term. */
export const MAA_END = 0.85;

const FOK = [
  1, -1.40925, 0, 0.33818, 0, 0.06793, -0.02287, 0.03015, -0.01641, 0.01729, -0.01248, 0.01205,
  -0.00985,
];

/**
 * Fok's hole-interaction function ψ(ξ), ξ = √ε (Fok 1941, as used by Melling, JSV 29(1), 1973).
 * It multiplies the isolated-hole end correction; valid up to ξ ≈ 0.5.
 */
export function fokPsi(xi: number): number {
  let sum = 0;
  for (let i = FOK.length - 1; i >= 0; i--) sum = sum * xi + FOK[i];
  return sum;
}

/** Per-side end correction of round holes: δ = 0.8488·a·ψ(√ε) (Fok, via Melling 1973). */
export function roundHoleEndCorrection(holeDiameter: number, openArea: number): number {
  return FLANGED_END * (holeDiameter / 2) * fokPsi(Math.sqrt(openArea));
}

/**
 * Per-side end correction of slots of width w at open area ε = w/b:
 * δ = (w/π)·ln(1/sin(πε/2)) (Smits & Kosten 1951, as used by Kristiansen & Vigran,
 * Applied Acoustics 43, 1994).
 */
export function slotEndCorrection(slotWidth: number, openArea: number): number {
  return (slotWidth / Math.PI) * Math.log(1 / Math.sin((Math.PI * openArea) / 2));
}
