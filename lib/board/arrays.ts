/**
 * Rows and arrays of panels with a gap between them, how many fit in a length, and duplicates
 * of a selection. An array grows right and up from its origin (its lower-left panel's corner),
 * like everything else measured from the surface's datum.
 */
import { nextCodes } from "./labels";
import type { Placement, Point, Rect } from "./types";

export interface ArraySpec {
  origin: Point;
  /** each panel's size, m */
  width: number;
  height: number;
  columns: number;
  rows: number;
  /** clear gap between neighbouring panels, m */
  gapX: number;
  gapY: number;
}

/**
 * The panels of an array, bottom row first, each row left to right. Panel (c, r) sits at
 * x = origin.x + c·(width + gapX), y = origin.y + r·(height + gapY).
 */
export function makeArray(spec: ArraySpec): Rect[] {
  checkSpec(spec);
  const rects: Rect[] = [];
  for (let r = 0; r < spec.rows; r++) {
    for (let c = 0; c < spec.columns; c++) {
      rects.push({
        x: spec.origin.x + c * (spec.width + spec.gapX),
        y: spec.origin.y + r * (spec.height + spec.gapY),
        width: spec.width,
        height: spec.height,
      });
    }
  }
  return rects;
}

/** The length that `count` panels of `size` with `gap` between them take: n·size + (n − 1)·gap. */
export function arraySpan(count: number, size: number, gap: number): number {
  return count > 0 ? count * size + (count - 1) * gap : 0;
}

/**
 * How many panels of `size` with `gap` between them fit in `available`: the largest n with
 * n·size + (n − 1)·gap ≤ available (a micrometre of float noise allowed), 0 when not even one fits.
 */
export function fitCount(available: number, size: number, gap: number): number {
  if (!(size > 0) || !(gap >= 0) || !(available >= size - 1e-6)) return 0;
  return Math.floor((available + gap + 1e-6) / (size + gap));
}

/**
 * Copies of `placements` moved by `offset`, each with a fresh id from `makeId` and the next
 * free codes after those `taken` (the board's placements), in the order given.
 */
export function duplicate(
  placements: readonly Placement[],
  offset: Point,
  options: { taken: readonly Placement[]; makeId?: () => string },
): Placement[] {
  const makeId = options.makeId ?? (() => crypto.randomUUID());
  const codes = nextCodes(options.taken.map((p) => p.code), placements.length);
  return placements.map((p, i) => ({ ...p, id: makeId(), code: codes[i], x: p.x + offset.x, y: p.y + offset.y }));
}

function checkSpec(spec: ArraySpec): void {
  const whole = (field: "columns" | "rows") => {
    if (!Number.isInteger(spec[field]) || spec[field] < 1) throw new RangeError(`${field} must be a whole number of at least 1 (got ${spec[field]})`);
  };
  whole("columns");
  whole("rows");
  for (const field of ["width", "height"] as const) {
    if (!(spec[field] > 0)) throw new RangeError(`${field} must be greater than 0 m (got ${spec[field]})`);
  }
  for (const field of ["gapX", "gapY"] as const) {
    if (!(spec[field] >= 0)) throw new RangeError(`${field} must be 0 m or more (got ${spec[field]})`);
  }
}
