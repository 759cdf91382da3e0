/**
 * Angles of incidence. α(θ) = 1 − |(Zs cosθ − ρ0c)/(Zs cosθ + ρ0c)|², and the diffuse value by
 * Paris' integral (Paris 1928; Kuttruff, Room Acoustics) cut at a field-incidence limit and
 * normalised (0–78°, divided by sin²78°; the 78° limit is common practice, usually credited to
 * London's 1950 transmission-loss work):
 *   α_field = ∫0^θmax α(θ) sin2θ dθ / sin²θmax
 * For a locally reacting (partitioned) cavity the integrand is smooth and a fixed Gauss–Legendre
 * rule, nodes, cosines and weights computed once, is exact to 10⁻⁶; an open cavity's rule is in
 * field-incidence.ts.
 */

export const FIELD_INCIDENCE_LIMIT_DEG = 78;
export const DEFAULT_ANGLES = 16;

/** Angles of a field-incidence rule and their weights: Σ weight·α(θ) is the field-incidence value. */
export interface AngleRule {
  readonly n: number;
  readonly cos: Float64Array;
  /** sin²θ, for the trace wavenumber k0·sinθ */
  readonly sin2: Float64Array;
  readonly weight: Float64Array;
}

/** The fixed rule: Gauss–Legendre in θ, weight = Gauss weight · sin2θ / sin²θmax. */
export interface Quadrature extends AngleRule {
  readonly maxAngleDeg: number;
  readonly theta: Float64Array;
}

/** Gauss–Legendre nodes and weights on [−1, 1], by Newton's method on P_n. */
export function gaussLegendre(n: number): { x: Float64Array; w: Float64Array } {
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = z;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * z * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (z * p1 - p0)) / (z * z - 1);
      const step = p1 / dp;
      z -= step;
      if (Math.abs(step) < 1e-15) break;
    }
    x[i] = z;
    w[i] = 2 / ((1 - z * z) * dp * dp);
  }
  return { x, w };
}

const cache = new Map<string, Quadrature>();

export function fieldQuadrature(angles = DEFAULT_ANGLES, maxAngleDeg = FIELD_INCIDENCE_LIMIT_DEG): Quadrature {
  const key = `${angles}:${maxAngleDeg}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const { x, w } = gaussLegendre(angles);
  const max = (maxAngleDeg * Math.PI) / 180;
  const norm = Math.sin(max) ** 2;
  const theta = new Float64Array(angles);
  const cos = new Float64Array(angles);
  const sin2 = new Float64Array(angles);
  const weight = new Float64Array(angles);
  for (let i = 0; i < angles; i++) {
    theta[i] = (max * (1 + x[i])) / 2;
    cos[i] = Math.cos(theta[i]);
    sin2[i] = Math.sin(theta[i]) ** 2;
    weight[i] = ((max / 2) * w[i] * Math.sin(2 * theta[i])) / norm;
  }
  const q: Quadrature = { n: angles, maxAngleDeg, theta, cos, sin2, weight };
  cache.set(key, q);
  return q;
}

/** Absorption at incidence angle θ of a surface with normalised impedance zr + j zi. */
export function obliqueAbsorption(zr: number, zi: number, cos: number): number {
  const a = zr * cos;
  const b = zi * cos;
  return (4 * a) / ((a + 1) * (a + 1) + b * b);
}

/** Field-incidence value of a locally reacting surface: one impedance at every angle. */
export function locallyReactingField(zr: number, zi: number, q: Quadrature): number {
  let sum = 0;
  for (let i = 0; i < q.n; i++) sum += q.weight[i] * obliqueAbsorption(zr, zi, q.cos[i]);
  return sum;
}
