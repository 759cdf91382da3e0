import type { EvaluateInput } from "@/lib/acoustics/contract";

type Facing = EvaluateInput["facing"];

// Sensible starting dimensions when the facing kind changes on the bench (common practice).
export function facingOfKind(kind: Facing["kind"], from: Facing): Facing {
  if (kind === from.kind) return from;
  if (kind === "slots") return { kind, thickness: Math.max(from.thickness, 0.012), slotWidth: 0.003, slotPitch: 0.02 };
  if (kind === "micro-perforated") return { kind, thickness: 0.0005, holeDiameter: 0.0005, pitch: 0.005, grid: "square" };
  return { kind, thickness: Math.max(from.thickness, 0.006), holeDiameter: 0.005, pitch: 0.025, grid: "square" };
}

export const NEW_BUILD_UP_SPEC: EvaluateInput = {
  facing: { kind: "round-holes", thickness: 0.016, holeDiameter: 0.008, pitch: 0.032, grid: "square" },
  cavity: { depth: 0.1, partitioned: true },
  infill: null,
  air: { temperature: 20, pressure: 101325 },
};
