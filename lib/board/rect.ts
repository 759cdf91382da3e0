/** Small rectangle arithmetic shared by the board's modules. No allocation unless a rect is returned. */
import type { Point, Rect } from "./types";

export const right = (r: Rect) => r.x + r.width;
export const top = (r: Rect) => r.y + r.height;
export const area = (r: Rect) => r.width * r.height;

/** Width of the shared x range of two rects: negative when apart (minus the gap), 0 when touching. */
export function overlapX(a: Rect, b: Rect): number {
  return Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x);
}

export function overlapY(a: Rect, b: Rect): number {
  return Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y);
}

/**
 * Shortest distance between two rects, m: 0 when they touch or overlap, the Euclidean
 * corner-to-corner distance when they are apart in both directions.
 */
export function distanceBetween(a: Rect, b: Rect): number {
  const gx = Math.max(0, -overlapX(a, b));
  const gy = Math.max(0, -overlapY(a, b));
  return gx === 0 || gy === 0 ? gx + gy : Math.hypot(gx, gy);
}

/** The rect spanned by two corners in any order (a marquee dragged in any direction). */
export function rectFromCorners(a: Point, b: Point): Rect {
  return { x: Math.min(a.x, b.x), y: Math.min(a.y, b.y), width: Math.abs(a.x - b.x), height: Math.abs(a.y - b.y) };
}

/** Whether `inner` lies within `outer`, allowing `tolerance` of float noise on every side. */
export function containsRect(outer: Rect, inner: Rect, tolerance: number): boolean {
  return (
    inner.x >= outer.x - tolerance &&
    inner.y >= outer.y - tolerance &&
    inner.x + inner.width <= outer.x + outer.width + tolerance &&
    inner.y + inner.height <= outer.y + outer.height + tolerance
  );
}

/** The smallest rect holding all of `rects`; null for none. */
export function boundsOf(rects: Iterable<Rect>): Rect | null {
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  for (const r of rects) {
    if (r.x < x0) x0 = r.x;
    if (r.y < y0) y0 = r.y;
    if (r.x + r.width > x1) x1 = r.x + r.width;
    if (r.y + r.height > y1) y1 = r.y + r.height;
  }
  return x0 === Infinity ? null : { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
}
