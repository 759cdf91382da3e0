/**
 * The plain ways of doing the drag loop's two searches, for the benchmark to measure against in
 * the same run: every pair of panels tested for overlap, and every edge scanned for a snap.
 * Not used by the board.
 */
import type { SnapIndex, SnapLines } from "./snap-index";
import { LENGTH_TOLERANCE as TOL, type Rect } from "./types";

export function allPairsOverlapCount(rects: readonly Rect[]): number {
  let count = 0;
  for (let i = 0; i < rects.length; i++) {
    const a = rects[i];
    for (let j = i + 1; j < rects.length; j++) {
      const b = rects[j];
      const ox = Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x);
      const oy = Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y);
      if (ox > TOL && oy > TOL) count++;
    }
  }
  return count;
}

/** The nearest edge offset of a moving rect on both axes by scanning every line. */
export function scanSnapOffsets(rect: Rect, index: SnapIndex, tolerance: number): { dx: number; dy: number } {
  const nearest = (lines: SnapLines, a: number, b: number) => {
    let best = Infinity;
    for (const p of lines.position) {
      if (Math.abs(p - a) < Math.abs(best)) best = p - a;
      if (Math.abs(p - b) < Math.abs(best)) best = p - b;
    }
    return Math.abs(best) <= tolerance ? best : 0;
  };
  return { dx: nearest(index.x, rect.x, rect.x + rect.width), dy: nearest(index.y, rect.y, rect.y + rect.height) };
}
