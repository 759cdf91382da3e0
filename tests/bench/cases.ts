/** Typical build-ups for the benchmark and the cross-check against the mathjs baseline. */
import type { BuildUp } from "@/lib/acoustics/build-up";

export const benchCases: { name: string; buildUp: BuildUp }[] = [
  {
    name: "round holes 5/25 mm square, t 6 mm, partitioned 50 mm cavity, no infill",
    buildUp: {
      facing: { kind: "round-holes", thickness: 0.006, holeDiameter: 0.005, pitch: 0.025, grid: "square" },
      cavity: { depth: 0.05, partitioned: true },
      infill: null,
    },
  },
  {
    name: "round holes 8/32 mm staggered, t 12.5 mm, partitioned 100 mm cavity, 50 mm DB infill on backing",
    buildUp: {
      facing: { kind: "round-holes", thickness: 0.0125, holeDiameter: 0.008, pitch: 0.032, grid: "staggered" },
      cavity: { depth: 0.1, partitioned: true },
      infill: { thickness: 0.05, flowResistivity: 12000, position: "on-backing", model: "delany-bazley" },
    },
  },
  {
    name: "round holes 5/25 mm square, t 6 mm, open 50 mm cavity, 25 mm Miki infill behind facing",
    buildUp: {
      facing: { kind: "round-holes", thickness: 0.006, holeDiameter: 0.005, pitch: 0.025, grid: "square" },
      cavity: { depth: 0.05, partitioned: false },
      infill: { thickness: 0.025, flowResistivity: 10000, position: "behind-facing", model: "miki" },
    },
  },
  {
    name: "slots 3/20 mm, t 16 mm, open 50 mm cavity, no infill",
    buildUp: {
      facing: { kind: "slots", thickness: 0.016, slotWidth: 0.003, slotPitch: 0.02 },
      cavity: { depth: 0.05, partitioned: false },
      infill: null,
    },
  },
  {
    name: "micro-perforated 0.2 mm, 1 %, partitioned 60 mm cavity",
    buildUp: {
      facing: { kind: "micro-perforated", thickness: 0.0002, holeDiameter: 0.0002, pitch: 0.0002 * Math.sqrt(Math.PI / 0.04), grid: "square" },
      cavity: { depth: 0.06, partitioned: true },
      infill: null,
    },
  },
];
