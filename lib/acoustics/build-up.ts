/**
 * The build-up of a resonant absorber: a rigid perforated or slotted facing over a cavity with
 * rigid backing, with or without a porous infill. Geometry helpers shared by the lumped estimate
 * and the full model.
 */
import type { AirConditions } from "./air";
import { MAA_END, roundHoleEndCorrection, slotEndCorrection } from "./end-corrections";
import { type Grid, roundHoleOpenArea, slotOpenArea } from "./perforation";

export type PorousModel = "delany-bazley" | "miki";
export type InfillPosition = "behind-facing" | "on-backing";

export interface HoleFacing {
  kind: "round-holes" | "micro-perforated";
  /** plate thickness, m */
  thickness: number;
  /** m */
  holeDiameter: number;
  /** centre distance, m */
  pitch: number;
  grid: Grid;
}

export interface SlotFacing {
  kind: "slots";
  thickness: number;
  slotWidth: number;
  slotPitch: number;
}

export type Facing = HoleFacing | SlotFacing;

export interface Infill {
  thickness: number;
  /** Pa·s/m² */
  flowResistivity: number;
  position: InfillPosition;
  model: PorousModel;
}

export interface Cavity {
  /** from the back of the facing to the rigid backing, infill included, m */
  depth: number;
  /** partitioned (honeycomb) cavity: locally reacting; open cavity: extended reaction */
  partitioned: boolean;
}

export interface BuildUp {
  facing: Facing;
  cavity: Cavity;
  infill: Infill | null;
  air?: AirConditions;
}

export type Layer =
  | { kind: "air"; thickness: number }
  | { kind: "porous"; thickness: number; flowResistivity: number; model: PorousModel };

export function facingOpenArea(facing: Facing): number {
  return facing.kind === "slots"
    ? slotOpenArea(facing.slotWidth, facing.slotPitch)
    : roundHoleOpenArea(facing.holeDiameter, facing.pitch, facing.grid);
}

/**
 * Total end correction (both sides) of the facing, the variant Cavitas fixes for each kind:
 * Fok 2δ for round holes, Maa's 0.85 d for micro-perforation, Smits–Kosten 2δ for slots.
 */
export function facingEndCorrection(facing: Facing): number {
  const eps = facingOpenArea(facing);
  if (facing.kind === "slots") return 2 * slotEndCorrection(facing.slotWidth, eps);
  if (facing.kind === "micro-perforated") return MAA_END * facing.holeDiameter;
  return 2 * roundHoleEndCorrection(facing.holeDiameter, eps);
}

/** Effective neck length t' = t + end corrections. */
export function effectiveThickness(facing: Facing): number {
  return facing.thickness + facingEndCorrection(facing);
}

/**
 * The cavity as layers from the facing to the backing. "behind-facing": porous layer against the
 * plate, then air; "on-backing": air, then the porous layer on the backing.
 */
export function cavityLayers(cavity: Cavity, infill: Infill | null): Layer[] {
  if (!infill) return [{ kind: "air", thickness: cavity.depth }];
  const porous: Layer = {
    kind: "porous",
    thickness: infill.thickness,
    flowResistivity: infill.flowResistivity,
    model: infill.model,
  };
  const gap = cavity.depth - infill.thickness;
  if (gap <= 0) return [porous];
  const air: Layer = { kind: "air", thickness: gap };
  return infill.position === "behind-facing" ? [porous, air] : [air, porous];
}
