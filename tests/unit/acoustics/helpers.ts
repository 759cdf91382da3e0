/** Shared helpers of the acoustics tests: reference routes written independently of the engine. */
import type { BuildUp, HoleFacing } from "@/lib/acoustics/build-up";

/** Nominal one-third-octave centres 100–5000 Hz (IEC 61260 preferred numbers), where the computed tables give values. */
export const NOMINAL = [100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];

/** Square-grid pitch that gives open area eps for hole diameter d: ε = πd²/(4b²). */
export const squarePitch = (d: number, eps: number) => d * Math.sqrt(Math.PI / (4 * eps));

export function holes(kind: HoleFacing["kind"], d: number, t: number, eps: number): HoleFacing {
  return { kind, thickness: t, holeDiameter: d, pitch: squarePitch(d, eps), grid: "square" };
}

export function overAir(facing: BuildUp["facing"], depth: number, partitioned = true): BuildUp {
  return { facing, cavity: { depth, partitioned }, infill: null };
}

/**
 * Statistical absorption of a locally reacting surface with normalised impedance z = ζe^{jμ},
 * closed form of London (1950) as given by Kuttruff, Room Acoustics (the formula from memory,
 * for the formula, self-verified there against the Paris integral to 6 decimals):
 * α = 8(cosμ/ζ)[1 − (cosμ/ζ)ln(1 + 2ζcosμ + ζ²) + (cos2μ/(ζ sinμ))·atan(ζ sinμ/(1 + ζcosμ))].
 */
export function londonParis(zr: number, zi: number): number {
  const zeta = Math.hypot(zr, zi);
  const mu = Math.atan2(zi, zr);
  const c = Math.cos(mu);
  const s = Math.sin(mu);
  const log = (c / zeta) * Math.log(1 + 2 * zeta * c + zeta * zeta);
  // the last term tends to (cos2μ/(1 + ζcosμ)) as sinμ → 0
  const last = Math.abs(s) < 1e-12
    ? Math.cos(2 * mu) / (1 + zeta * c)
    : (Math.cos(2 * mu) / (zeta * s)) * Math.atan((zeta * s) / (1 + zeta * c));
  return 8 * (c / zeta) * (1 - log + last);
}

/**
 * Field-incidence absorption of a locally reacting surface in closed form, for any upper angle:
 * with u = cosθ, ∫0^θm α(θ) sin2θ dθ = 8a ∫_{cosθm}^1 u²/(ζ²u² + 2au + 1) du, z = a + jb, a
 * rational integral done by hand here (it reduces to London's formula at θm = 90°).
 */
export function fieldClosedForm(a: number, b: number, maxAngleDeg: number): number {
  const A = a * a + b * b;
  const B = 2 * a;
  const u0 = Math.cos(deg(maxAngleDeg));
  let F: (u: number) => number;
  if (Math.abs(b) < 1e-9 * Math.max(1, Math.abs(a))) {
    F = (u) => u / (a * a) - (2 / a ** 3) * Math.log(a * u + 1) - 1 / (a ** 3 * (a * u + 1));
  } else {
    const s = 2 * Math.abs(b);
    F = (u) =>
      u / A - (B / (2 * A * A)) * Math.log(A * u * u + B * u + 1) + ((B * B - 2 * A) / (A * A * s)) * Math.atan((2 * A * u + B) / s);
  }
  return (8 * a * (F(1) - F(u0))) / Math.sin(deg(maxAngleDeg)) ** 2;
}

/** Composite Simpson rule on [a, b] with n (even) intervals. */
export function simpson(f: (x: number) => number, a: number, b: number, n = 2000): number {
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let i = 1; i < n; i++) sum += (i % 2 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

export const deg = (x: number) => (x * Math.PI) / 180;
