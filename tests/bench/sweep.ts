/**
 * The candidates a design assistant would try for one room: hole diameter, pitch, grid and
 * cavity depth over a stock infill, half over a partitioned and half over an open cavity.
 */
import type { BuildUp } from "@/lib/acoustics/build-up";

export const sweepDescription =
  "10 hole diameters × 25 pitches × 2 grids × 10 depths × partitioned or open, 30 mm infill";

export function sweepCandidates(): BuildUp[] {
  const out: BuildUp[] = [];
  const diameters = [0.003, 0.004, 0.005, 0.006, 0.008, 0.01, 0.012, 0.015, 0.018, 0.02];
  const depths = [0.03, 0.04, 0.05, 0.075, 0.1, 0.125, 0.15, 0.2, 0.25, 0.3];
  for (const d of diameters) {
    for (let p = 0; p < 25; p++) {
      const pitch = d * (1.5 + p * 0.25);
      for (const grid of ["square", "staggered"] as const) {
        for (const depth of depths) {
          for (const partitioned of [true, false]) {
            out.push({
              facing: { kind: "round-holes", thickness: 0.0125, holeDiameter: d, pitch, grid },
              cavity: { depth, partitioned },
              infill: { thickness: Math.min(0.03, depth), flowResistivity: 15000, position: "behind-facing", model: "delany-bazley" },
            });
          }
        }
      }
    }
  }
  return out;
}
