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
