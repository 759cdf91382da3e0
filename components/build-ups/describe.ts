import type { EvaluateInput } from "@/lib/acoustics/contract";
import { formatLength, type UnitPreference } from "@/lib/units";

// "Ø8 mm holes at 32 mm, square, 16 mm plate" in the user's units.
export function describeFacing(spec: EvaluateInput, units: UnitPreference): string {
  const f = spec.facing;
  const len = (m: number) => formatLength(m, units, { scale: "fine" });
  if (f.kind === "slots") return `${len(f.slotWidth)} slots at ${len(f.slotPitch)}, ${len(f.thickness)} plate`;
  const grid = f.grid === "staggered" ? "60° staggered" : "square";
  const what = f.kind === "micro-perforated" ? "micro-perforation" : "holes";
  return `Ø${len(f.holeDiameter)} ${what} at ${len(f.pitch)}, ${grid}, ${len(f.thickness)} plate`;
}
