/**
 * Sweep and prune along x: the pairs of rectangles whose interiors overlap by more than the
 * tolerance in both directions. Rectangles are taken in order of their left edges; a list holds
 * those whose x range is still open, so each is tested only against its neighbours in x. For a
 * board of rows and columns that is about n log n; it degrades towards n² only when every panel
 * shares the same x range (one tall column), where n² cheap tests of 500 panels are still fast.
 */
import { orderByValue } from "./order";
import { LENGTH_TOLERANCE as TOL, type Rect } from "./types";

export function forEachOverlap<T extends Rect>(rects: readonly T[], found: (a: T, b: T, overlapWidth: number, overlapHeight: number) => void): void {
  const n = rects.length;
  const buffers = borrow(n);
  try {
    sweep(rects, n, buffers, found);
  } finally {
    if (buffers === shared) lent = false;
  }
}

function sweep<T extends Rect>(rects: readonly T[], n: number, buffers: Scratch, found: (a: T, b: T, w: number, h: number) => void): void {
  const { keys, order, x0, x1, y0, y1, open } = buffers;
  for (let i = 0; i < n; i++) x0[i] = rects[i].x;
  orderByValue(x0, n, keys, order);
  for (let k = 0; k < n; k++) {
    const r = rects[order[k]];
    x0[k] = r.x;
    x1[k] = r.x + r.width;
    y0[k] = r.y;
    y1[k] = r.y + r.height;
  }
  let openCount = 0;
  for (let k = 0; k < n; k++) {
    // Whatever ends at or before this left edge (plus the tolerance) can meet neither this
    // rectangle nor any later one: their overlap would be at most TOL.
    const closed = x0[k] + TOL;
    let kept = 0;
    for (let j = 0; j < openCount; j++) {
      const q = open[j];
      if (x1[q] > closed) open[kept++] = q;
    }
    openCount = kept;
    for (let j = 0; j < openCount; j++) {
      const q = open[j];
      const oy = Math.min(y1[k], y1[q]) - Math.max(y0[k], y0[q]);
      if (oy <= TOL) continue;
      const ox = Math.min(x1[k], x1[q]) - Math.max(x0[k], x0[q]);
      if (ox > TOL) found(rects[order[q]], rects[order[k]], ox, oy);
    }
    open[openCount++] = k;
  }
}

interface Scratch {
  keys: Float64Array;
  order: Int32Array;
  x0: Float64Array;
  x1: Float64Array;
  y0: Float64Array;
  y1: Float64Array;
  open: Int32Array;
}

// Buffers kept between calls, so a drag does not allocate them on every frame. A call made from
// inside `found` while they are lent (never done by the board, but possible) gets its own.
let shared: Scratch | null = null;
let lent = false;

function borrow(n: number): Scratch {
  const fresh = (size: number): Scratch => ({
    keys: new Float64Array(size),
    order: new Int32Array(size),
    x0: new Float64Array(size),
    x1: new Float64Array(size),
    y0: new Float64Array(size),
    y1: new Float64Array(size),
    open: new Int32Array(size),
  });
  if (lent) return fresh(n);
  lent = true;
  if (!shared || shared.keys.length < n) shared = fresh(Math.max(n, 2 * (shared?.keys.length ?? 0)));
  return shared;
}
