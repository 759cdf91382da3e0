/**
 * The elevation board's shapes. One board is one surface of a room (a wall, the ceiling or the
 * floor) seen face on. Lengths are in metres; coordinates are measured from the surface's
 * lower-left corner (the datum) with x to the right and y up, the way set-out dimensions are
 * given on a shop drawing. The screen's y-down pixels live only in view.ts.
 */
import type { OpeningKind } from "@/lib/rooms/geometry";

export interface Point {
  x: number;
  y: number;
}

/** An axis-aligned rectangle by its lower-left corner and size, m. */
export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A panel of one build-up placed on the surface. */
export interface Placement extends Rect {
  id: string;
  buildUpId: string;
  /** the code people read on drawings and in messages ("P-012"); the id stands in when absent */
  code?: string;
}

export interface BoardOpening extends Rect {
  id?: string;
  kind: OpeningKind;
  /** shown in messages ("Door to corridor"); "the door" when absent */
  name?: string;
}

export interface BoardSurface {
  width: number;
  height: number;
  openings: readonly BoardOpening[];
}

/** Float noise allowed in every comparison of lengths on the board, m (a micrometre). */
export const LENGTH_TOLERANCE = 1e-6;
