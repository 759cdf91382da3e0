/**
 * Snapping a dragged or resized panel. Each axis is snapped on its own. Priorities:
 *   1. object lines (surface edges, opening edges, other panels' edges) within the tolerance:
 *      the nearest wins;
 *   2. only when no object line is within the tolerance, the grid (lines every `module` metres
 *      from `gridOrigin`, the datum by default): the nearest wins.
 * Moving edges are left and right (x), bottom and top (y); with `centres`, the panel's centre
 * line also snaps to other panels', openings' and the surface's centre lines (and to the grid).
 * A snap never moves the panel more than `tolerance` on either axis (the screen passes
 * tolerance = pixels / scale). The guides returned are every line the snapped panel now sits
 * on, for drawing; they span the panel and the lines it met (a grid line spans the surface).
 */
import type { ResizeHandle } from "./resize";
import { lowerBound, nearestOffset, SNAP_SOURCES, type SnapIndex, type SnapLines, type SnapSource } from "./snap-index";
import { LENGTH_TOLERANCE, type Point, type Rect } from "./types";

export interface SnapOptions {
  /** m; offsets larger than this are ignored */
  tolerance: number;
  /** grid module, m (0.3 for 300 mm, 0.3048 for 1 ft); absent or 0: no grid */
  module?: number;
  gridOrigin?: Point;
  /** snap the panel's centre lines too */
  centres?: boolean;
}

export interface SnapGuide {
  /** "x": a vertical line at x = at; "y": a horizontal line at y = at */
  axis: "x" | "y";
  at: number;
  /** the stretch to draw along the other axis, m */
  from: number;
  to: number;
  sources: SnapSource[];
}

export interface SnapResult {
  rect: Rect;
  dx: number;
  dy: number;
  guides: SnapGuide[];
}

interface Axis {
  edges: SnapLines;
  centres: SnapLines;
  /** the surface's extent along the other axis, for grid guides */
  span: number;
  origin: number;
}

const axesOf = (index: SnapIndex, options: SnapOptions): { x: Axis; y: Axis } => ({
  x: { edges: index.x, centres: index.xCentre, span: index.surface.height, origin: options.gridOrigin?.x ?? 0 },
  y: { edges: index.y, centres: index.yCentre, span: index.surface.width, origin: options.gridOrigin?.y ?? 0 },
});

/** Snap a panel (or a selection's bounding box) being moved; its size never changes. */
export function snapMove(rect: Rect, index: SnapIndex, options: SnapOptions): SnapResult {
  const axes = axesOf(index, options);
  const dx = axisOffset(axes.x, rect.x, rect.x + rect.width, options.centres ? rect.x + rect.width / 2 : NaN, options);
  const dy = axisOffset(axes.y, rect.y, rect.y + rect.height, options.centres ? rect.y + rect.height / 2 : NaN, options);
  const snapped = { x: rect.x + dx, y: rect.y + dy, width: rect.width, height: rect.height };
  const guides: SnapGuide[] = [];
  const r1 = snapped.x + snapped.width;
  const t1 = snapped.y + snapped.height;
  guideAt("x", axes.x.edges, snapped.x, snapped.y, t1, axes.x, options, guides);
  guideAt("x", axes.x.edges, r1, snapped.y, t1, axes.x, options, guides);
  guideAt("y", axes.y.edges, snapped.y, snapped.x, r1, axes.y, options, guides);
  guideAt("y", axes.y.edges, t1, snapped.x, r1, axes.y, options, guides);
  if (options.centres) {
    guideAt("x", axes.x.centres, snapped.x + snapped.width / 2, snapped.y, t1, axes.x, options, guides);
    guideAt("y", axes.y.centres, snapped.y + snapped.height / 2, snapped.x, r1, axes.y, options, guides);
  }
  return { rect: snapped, dx, dy, guides };
}

/**
 * Snap the edges that a resize handle moves; the opposite edges stay put. An axis is left
 * unsnapped when snapping would make the panel narrower than `minSize`.
 */
export function snapResize(rect: Rect, handle: ResizeHandle, index: SnapIndex, options: SnapOptions & { minSize: number }): SnapResult {
  const axes = axesOf(index, options);
  const left = handle.includes("left");
  const right = handle.includes("right");
  const bottom = handle.includes("bottom");
  const top = handle.includes("top");
  const [x, width] = resizeAxis(axes.x, rect.x, rect.width, left, right, options);
  const [y, height] = resizeAxis(axes.y, rect.y, rect.height, bottom, top, options);
  const guides: SnapGuide[] = [];
  if (left || right) guideAt("x", axes.x.edges, left ? x : x + width, y, y + height, axes.x, options, guides);
  if (bottom || top) guideAt("y", axes.y.edges, bottom ? y : y + height, x, x + width, axes.y, options, guides);
  return { rect: { x, y, width, height }, dx: x - rect.x, dy: y - rect.y, guides };
}

/** One axis of a resize: [start, size] with the moving (low or high) edge snapped. */
function resizeAxis(axis: Axis, at: number, size: number, low: boolean, high: boolean, options: SnapOptions & { minSize: number }): [number, number] {
  if (!low && !high) return [at, size];
  const d = axisOffset(axis, low ? at : at + size, NaN, NaN, options);
  const snappedSize = low ? size - d : size + d;
  if (d === 0 || snappedSize < options.minSize) return [at, size];
  return low ? [at + d, snappedSize] : [at, snappedSize];
}

/** The offset for one axis: objects first, the grid only when no object is near. NaN lines are skipped. */
function axisOffset(axis: Axis, low: number, high: number, centre: number, options: SnapOptions): number {
  let best = Infinity;
  const consider = (offset: number) => {
    if (Math.abs(offset) < Math.abs(best)) best = offset;
  };
  consider(nearestOffset(axis.edges, low));
  if (!Number.isNaN(high)) consider(nearestOffset(axis.edges, high));
  if (!Number.isNaN(centre)) consider(nearestOffset(axis.centres, centre));
  if (Math.abs(best) <= options.tolerance) return best;
  const module = options.module ?? 0;
  if (!(module > 0)) return 0;
  best = Infinity;
  consider(gridOffset(low, module, axis.origin));
  if (!Number.isNaN(high)) consider(gridOffset(high, module, axis.origin));
  if (!Number.isNaN(centre)) consider(gridOffset(centre, module, axis.origin));
  return Math.abs(best) <= options.tolerance ? best : 0;
}

const gridOffset = (value: number, module: number, origin: number) => origin + Math.round((value - origin) / module) * module - value;

/** Adds the guide for a line at `at` when the snapped panel sits on an object or grid line there. */
function guideAt(
  axis: "x" | "y",
  lines: SnapLines,
  at: number,
  from: number,
  to: number,
  geometry: Axis,
  options: SnapOptions,
  out: SnapGuide[],
): void {
  let mask = 0;
  let lo = from;
  let hi = to;
  for (let i = lowerBound(lines, at - LENGTH_TOLERANCE); i < lines.position.length && lines.position[i] <= at + LENGTH_TOLERANCE; i++) {
    mask |= 1 << lines.source[i];
    if (lines.lo[i] < lo) lo = lines.lo[i];
    if (lines.hi[i] > hi) hi = lines.hi[i];
  }
  const module = options.module ?? 0;
  if (module > 0 && Math.abs(gridOffset(at, module, geometry.origin)) <= LENGTH_TOLERANCE) {
    mask |= 1 << SNAP_SOURCES.indexOf("grid");
    if (lo > 0) lo = 0;
    if (hi < geometry.span) hi = geometry.span;
  }
  if (mask === 0) return;
  const existing = out.find((g) => g.axis === axis && Math.abs(g.at - at) <= LENGTH_TOLERANCE);
  const sources = SNAP_SOURCES.filter((_, i) => mask & (1 << i));
  if (existing) {
    existing.from = Math.min(existing.from, lo);
    existing.to = Math.max(existing.to, hi);
    for (const s of sources) if (!existing.sources.includes(s)) existing.sources.push(s);
  } else {
    out.push({ axis, at, from: lo, to: hi, sources });
  }
}
