/**
 * The board's view: metres on the surface to pixels on the screen. The surface's y runs up from
 * its datum, the screen's y runs down, so
 *   screenX = offsetX + x · scale,   screenY = offsetY − y · scale
 * with scale in pixels per metre. (offsetX, offsetY) is where the datum is drawn.
 */
import type { Point, Rect } from "./types";

export interface View {
  /** px per m */
  scale: number;
  offsetX: number;
  offsetY: number;
}

export interface Size {
  width: number;
  height: number;
}

export interface ZoomLimits {
  minScale: number;
  maxScale: number;
}

/**
 * From a whole 40 m wall on a small screen (2 px/m) to 40 px per millimetre, enough to see a
 * 0.2 mm micro-perforation as an 8 px hole.
 */
export const DEFAULT_ZOOM_LIMITS: ZoomLimits = { minScale: 2, maxScale: 40_000 };

export const toScreen = (v: View, p: Point): Point => ({ x: v.offsetX + p.x * v.scale, y: v.offsetY - p.y * v.scale });

export const toWorld = (v: View, p: Point): Point => ({ x: (p.x - v.offsetX) / v.scale, y: (v.offsetY - p.y) / v.scale });

/** A rect on the surface as the screen draws it: x, y its top-left corner in px, size in px. */
export function rectToScreen(v: View, r: Rect): Rect {
  return { x: v.offsetX + r.x * v.scale, y: v.offsetY - (r.y + r.height) * v.scale, width: r.width * v.scale, height: r.height * v.scale };
}

/** The part of the surface the viewport shows, in metres from the datum (for clipping what is drawn). */
export function visibleArea(v: View, viewport: Size): Rect {
  return { x: -v.offsetX / v.scale, y: (v.offsetY - viewport.height) / v.scale, width: viewport.width / v.scale, height: viewport.height / v.scale };
}

/**
 * Zoom by `factor` keeping the surface point under `anchor` (the pointer, a pinch's centre) where
 * it is on the screen; the scale stays within the limits.
 */
export function zoomAt(v: View, factor: number, anchor: Point, limits: ZoomLimits = DEFAULT_ZOOM_LIMITS): View {
  const scale = Math.min(limits.maxScale, Math.max(limits.minScale, v.scale * factor));
  const k = scale / v.scale;
  return { scale, offsetX: anchor.x - (anchor.x - v.offsetX) * k, offsetY: anchor.y - (anchor.y - v.offsetY) * k };
}

export const panBy = (v: View, dxPx: number, dyPx: number): View => ({ ...v, offsetX: v.offsetX + dxPx, offsetY: v.offsetY + dyPx });

/**
 * A wheel's deltaY (in pixels) as a zoom factor: one ordinary notch (100 px) zooms by 2^(1/4) ≈
 * 1.19, so four notches double the scale, and a trackpad's small deltas zoom smoothly.
 */
export const wheelZoomFactor = (deltaY: number) => 2 ** (-deltaY / 400);

/** A pinch's factor: the distance between the two touches now over the distance before. */
export const pinchZoomFactor = (before: number, now: number) => (before > 0 && now > 0 ? now / before : 1);

/**
 * The view that shows the whole surface as large as the viewport allows, `margin` px clear on
 * every side, centred.
 */
export function fitToView(surface: Size, viewport: Size, margin: number, limits: ZoomLimits = DEFAULT_ZOOM_LIMITS): View {
  const room = { width: Math.max(1, viewport.width - 2 * margin), height: Math.max(1, viewport.height - 2 * margin) };
  const fit = Math.min(room.width / surface.width, room.height / surface.height);
  const scale = Math.min(limits.maxScale, Math.max(limits.minScale, fit));
  return {
    scale,
    offsetX: (viewport.width - surface.width * scale) / 2,
    offsetY: (viewport.height + surface.height * scale) / 2,
  };
}

/**
 * How tall the board's canvas should be to show the whole surface across `width` px with
 * `margin` px round it, within [min, max]: a long wall gets a short canvas, a tall one all
 * the height the window has.
 */
export function canvasHeightFor(surface: Size, width: number, limits: { min: number; max: number; margin: number }): number {
  const drawn = (Math.max(1, width - 2 * limits.margin) * surface.height) / Math.max(1e-9, surface.width) + 2 * limits.margin;
  return Math.round(Math.min(Math.max(limits.min, limits.max), Math.max(limits.min, drawn)));
}
