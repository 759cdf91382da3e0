/**
 * Resizing a panel by one of its eight handles, from the rect at the start of the drag and the
 * pointer's travel since then (in metres). The edges opposite the handle stay put, and the panel
 * never gets smaller than `minSize`: dragging a handle past the far edge stops there rather than
 * turning the panel inside out.
 */
import type { Rect } from "./types";

export const RESIZE_HANDLES = ["left", "right", "bottom", "top", "bottom-left", "bottom-right", "top-left", "top-right"] as const;
export type ResizeHandle = (typeof RESIZE_HANDLES)[number];

export function resizeRect(start: Rect, handle: ResizeHandle, dx: number, dy: number, minSize: number): Rect {
  const [x, width] = resizeAxis(start.x, start.width, handle.includes("left"), handle.includes("right"), dx, minSize);
  const [y, height] = resizeAxis(start.y, start.height, handle.includes("bottom"), handle.includes("top"), dy, minSize);
  return { x, y, width, height };
}

/** One axis: [start, size] after moving its low or high edge; untouched when neither moves. */
function resizeAxis(at: number, size: number, low: boolean, high: boolean, delta: number, minSize: number): [number, number] {
  if (low) {
    const end = at + size;
    const moved = Math.min(at + delta, end - minSize);
    return [moved, end - moved];
  }
  if (high) return [at, Math.max(size + delta, minSize)];
  return [at, size];
}
