import type { EvaluateInput } from "@/lib/acoustics/contract";
import { formatLength, type UnitPreference } from "@/lib/units";

// A build-up in a few words, in the reader's units: the library's list and the documents'
// schedules say the same thing the same way.

// Facing sizes at a fabricator's precision; cavities and layers at panel precision.
const fine = (m: number, units: UnitPreference) => formatLength(m, units, { scale: "fine" });
const small = (m: number, units: UnitPreference) => formatLength(m, units, { scale: "panel" });

// "Ø8 mm holes at 32 mm, square, 16 mm plate" in the user's units.
export function describeFacing(spec: EvaluateInput, units: UnitPreference): string {
  const f = spec.facing;
  const len = (m: number) => fine(m, units);
  if (f.kind === "slots") return `${len(f.slotWidth)} slots at ${len(f.slotPitch)}, ${len(f.thickness)} plate`;
  const grid = f.grid === "staggered" ? "60° staggered" : "square";
  const what = f.kind === "micro-perforated" ? "micro-perforation" : "holes";
  return `Ø${len(f.holeDiameter)} ${what} at ${len(f.pitch)}, ${grid}, ${len(f.thickness)} plate`;
}

// "200 mm, partitioned"
export function describeCavity(spec: EvaluateInput, units: UnitPreference): string {
  return `${small(spec.cavity.depth, units)}, ${spec.cavity.partitioned ? "partitioned" : "open"}`;
}

// "50 mm, 10,000 Pa·s/m², behind the facing" or "none"
export function describeInfill(spec: EvaluateInput, units: UnitPreference): string {
  const infill = spec.infill;
  if (!infill) return "none";
  const where = infill.position === "behind-facing" ? "behind the facing" : "on the backing";
  return `${small(infill.thickness, units)}, ${Math.round(infill.flowResistivity).toLocaleString("en-GB")} Pa·s/m², ${where}`;
}
