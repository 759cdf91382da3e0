/** fast-check generators of physically valid build-ups. */
import fc from "fast-check";
import type { BuildUp, Facing } from "@/lib/acoustics/build-up";

const holeFacing = fc.record({
  kind: fc.constantFrom("round-holes" as const, "micro-perforated" as const),
  thickness: fc.double({ min: 0.0003, max: 0.025, noNaN: true }),
  holeDiameter: fc.double({ min: 0.0002, max: 0.02, noNaN: true }),
  ratio: fc.double({ min: 1.3, max: 12, noNaN: true }),
  grid: fc.constantFrom("square" as const, "staggered" as const),
}).map(({ ratio, ...f }): Facing => ({ ...f, pitch: f.holeDiameter * ratio }));

const slotFacing = fc.record({
  thickness: fc.double({ min: 0.003, max: 0.03, noNaN: true }),
  slotWidth: fc.double({ min: 0.0005, max: 0.01, noNaN: true }),
  ratio: fc.double({ min: 1.5, max: 30, noNaN: true }),
}).map(({ ratio, ...f }): Facing => ({ kind: "slots", ...f, slotPitch: f.slotWidth * ratio }));

export const arbitraryFacing = fc.oneof(holeFacing, slotFacing);

/**
 * A build-up with or without infill. With withinRange, the flow resistivity stays in
 * 2000–4000 Pa·s/m², where ρ0f/σ > 0.01 over the bands (the porous models' data range).
 */
export function arbitraryBuildUp(options: { withinRange?: boolean } = {}): fc.Arbitrary<BuildUp> {
  return fc
    .record({
      facing: arbitraryFacing,
      depth: fc.double({ min: 0.01, max: 0.4, noNaN: true }),
      partitioned: fc.boolean(),
      infill: fc.option(
        fc.record({
          share: fc.double({ min: 0.1, max: 1, noNaN: true }),
          flowResistivity: fc.double({ min: 2000, max: 80000, noNaN: true }),
          position: fc.constantFrom("behind-facing" as const, "on-backing" as const),
          model: fc.constantFrom("delany-bazley" as const, "miki" as const),
        }).map((infill) =>
          options.withinRange
            ? { ...infill, flowResistivity: 2000 + (infill.flowResistivity - 2000) / 39 }
            : infill,
        ),
        { nil: null },
      ),
    })
    .map(({ facing, depth, partitioned, infill }) => ({
      facing,
      cavity: { depth, partitioned },
      infill: infill && {
        thickness: depth * infill.share,
        flowResistivity: infill.flowResistivity,
        position: infill.position,
        model: infill.model,
      },
    }));
}

/**
 * Any input the evaluate schema accepts, from its practical minimums to its maximums, the
 * extremes included: for properties that must hold over the whole contract.
 */
export function arbitraryEvaluateInput(limits: Record<"facingThickness" | "holeDiameter" | "pitch" | "slotWidth" | "slotPitch" | "cavityDepth" | "infillThickness" | "flowResistivity", { min: number; max: number }>) {
  const within = (l: { min: number; max: number }) => fc.double({ min: l.min, max: l.max, noNaN: true });
  const ratio = fc.double({ min: 1.000001, max: 1e4, noNaN: true });
  const clamp = (x: number, l: { min: number; max: number }) => Math.min(l.max, Math.max(l.min, x));
  const hole = fc
    .record({ kind: fc.constantFrom("round-holes" as const, "micro-perforated" as const), thickness: within(limits.facingThickness), holeDiameter: within(limits.holeDiameter), ratio, grid: fc.constantFrom("square" as const, "staggered" as const) })
    .map(({ ratio: r, ...f }) => ({ ...f, pitch: clamp(f.holeDiameter * r, limits.pitch) }))
    .filter((f) => f.pitch > f.holeDiameter);
  const slot = fc
    .record({ kind: fc.constant("slots" as const), thickness: within(limits.facingThickness), slotWidth: within(limits.slotWidth), ratio })
    .map(({ ratio: r, ...f }) => ({ ...f, slotPitch: clamp(f.slotWidth * r, limits.slotPitch) }))
    .filter((f) => f.slotPitch > f.slotWidth);
  const infill = fc.record({
    share: fc.double({ min: 0, max: 1, noNaN: true }),
    flowResistivity: within(limits.flowResistivity),
    position: fc.constantFrom("behind-facing" as const, "on-backing" as const),
    model: fc.constantFrom("delany-bazley" as const, "miki" as const),
  });
  return fc
    .record({
      facing: fc.oneof(hole, slot),
      depth: within(limits.cavityDepth),
      partitioned: fc.boolean(),
      infill: fc.option(infill, { nil: null }),
      temperature: fc.double({ min: -20, max: 50, noNaN: true }),
      pressure: fc.double({ min: 10_000, max: 200_000, noNaN: true }),
    })
    .filter(({ depth, infill: i }) => !i || depth >= limits.infillThickness.min)
    .map(({ facing, depth, partitioned, infill: i, temperature, pressure }) => ({
      facing,
      cavity: { depth, partitioned },
      infill: i && { thickness: clamp(depth * i.share, { min: limits.infillThickness.min, max: depth }), flowResistivity: i.flowResistivity, position: i.position, model: i.model },
      air: { temperature, pressure },
    }));
}
