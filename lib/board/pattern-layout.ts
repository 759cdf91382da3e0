/**
 * Where the holes or slots of a panel's facing go, by arithmetic alone (no points generated):
 * used by the board to draw and by the shop drawing for hole counts.
 *
 * The perforated field is the panel less its border margins: borderX at the left and right,
 * borderY at the bottom and top. Fitting convention: every hole lies wholly inside the field
 * (its edge may touch the field's edge), the holes along an axis are as many as fit,
 *   n = floor((field − d) / pitch) + 1,
 * and the pattern is centred in the field, so any remainder is shared equally by both sides.
 * Slots follow the same rule with their width for d.
 *
 * Grids (centre distance `pitch` between neighbouring holes):
 *   square     rows `pitch` apart, every row alike;
 *   staggered  60° equilateral: rows pitch·√3/2 apart, every other row shifted by pitch/2.
 *              Row 0 (the bottom row) is not shifted; a shifted row holds one hole fewer when
 *              the shift would push its last hole out of the field.
 * Coordinates are from the panel's lower-left corner, m.
 */
import type { Facing, HoleFacing, SlotFacing } from "@/lib/acoustics/build-up";
import { LENGTH_TOLERANCE, type Rect } from "./types";

export interface Borders {
  /** margin left and right, m */
  borderX: number;
  /** margin bottom and top, m */
  borderY: number;
}

export interface HoleLayout {
  kind: "holes";
  holeDiameter: number;
  field: Rect;
  rows: number;
  /** distance between rows, m */
  rowPitch: number;
  /** holes in rows 0, 2, 4 … and in rows 1, 3, 5 … */
  columnsEven: number;
  columnsOdd: number;
  pitch: number;
  /** how far odd rows are shifted right: pitch/2 staggered, 0 square */
  oddShift: number;
  /** centre of the first hole of row 0 */
  firstX: number;
  firstY: number;
  holeCount: number;
}

export interface SlotLayout {
  kind: "slots";
  slotWidth: number;
  slotPitch: number;
  /** "vertical": slots run up the panel, side by side across it; "horizontal": along it, one above another */
  direction: SlotDirection;
  field: Rect;
  slotCount: number;
  /** centre line of the first slot (an x for vertical slots, a y for horizontal ones) */
  first: number;
}

export type SlotDirection = "vertical" | "horizontal";
export type PatternLayout = HoleLayout | SlotLayout;

/** How many marks of size `d` at `pitch` fit wholly in `length`: floor((length − d) / pitch) + 1. */
export function fitAlong(length: number, d: number, pitch: number): number {
  const free = length - d + LENGTH_TOLERANCE;
  return free < 0 ? 0 : Math.floor(free / pitch) + 1;
}

export function perforatedField(size: { width: number; height: number }, borders: Borders): Rect {
  return {
    x: borders.borderX,
    y: borders.borderY,
    width: Math.max(0, size.width - 2 * borders.borderX),
    height: Math.max(0, size.height - 2 * borders.borderY),
  };
}

export function layoutPattern(
  facing: Facing,
  size: { width: number; height: number },
  borders: Borders,
  slotDirection: SlotDirection = "vertical",
): PatternLayout {
  const field = perforatedField(size, borders);
  return facing.kind === "slots" ? layoutSlots(facing, field, slotDirection) : layoutHoles(facing, field);
}

export function layoutHoles(facing: Pick<HoleFacing, "holeDiameter" | "pitch" | "grid">, field: Rect): HoleLayout {
  const d = facing.holeDiameter;
  const p = facing.pitch;
  const staggered = facing.grid === "staggered";
  const rowPitch = staggered ? (p * Math.sqrt(3)) / 2 : p;
  const oddShift = staggered ? p / 2 : 0;
  let rows = fitAlong(field.height, d, rowPitch);
  const columnsEven = fitAlong(field.width, d, p);
  const columnsOdd = staggered ? fitAlong(field.width - oddShift, d, p) : columnsEven;
  if (columnsEven === 0) rows = 0;
  const spanX = Math.max((columnsEven - 1) * p, columnsOdd > 0 && rows > 1 ? oddShift + (columnsOdd - 1) * p : 0);
  const spanY = (rows - 1) * rowPitch;
  const holeCount = rows === 0 ? 0 : Math.ceil(rows / 2) * columnsEven + Math.floor(rows / 2) * columnsOdd;
  return {
    kind: "holes",
    holeDiameter: d,
    field,
    rows,
    rowPitch,
    columnsEven,
    columnsOdd,
    pitch: p,
    oddShift,
    firstX: field.x + d / 2 + (field.width - d - spanX) / 2,
    firstY: field.y + d / 2 + (field.height - d - spanY) / 2,
    holeCount,
  };
}

export function layoutSlots(facing: Pick<SlotFacing, "slotWidth" | "slotPitch">, field: Rect, direction: SlotDirection): SlotLayout {
  const w = facing.slotWidth;
  const across = direction === "vertical" ? field.width : field.height;
  const start = direction === "vertical" ? field.x : field.y;
  const slotCount = fitAlong(across, w, facing.slotPitch);
  const span = (slotCount - 1) * facing.slotPitch;
  return {
    kind: "slots",
    slotWidth: w,
    slotPitch: facing.slotPitch,
    direction,
    field,
    slotCount,
    first: start + w / 2 + (across - w - span) / 2,
  };
}
