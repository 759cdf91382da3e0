/**
 * The treated area per surface and build-up: what the board hands to the reverberation check
 * (the same shape as the room's treatment lines). Only what can exist is counted:
 *   - the part of each panel inside the surface (a panel hanging past the edge counts its
 *     part on the wall);
 *   - net of openings (a panel drawn over a door absorbs nothing there: the door is there);
 *   - overlaps counted once, for the panel on top (the one later in the list, drawn last).
 * What was left out is reported, so the screen can say why the check did not move.
 *
 * The method: cut the surface into vertical slabs at every panel and opening edge; inside a
 * slab every covering rectangle spans its full width, so the slab's y intervals decide who
 * owns each piece. The slabs are swept left to right with a list of the panels open at the
 * current x, so each slab looks only at its own panels; for a board of 500 panels this runs
 * on every frame of a drag (tests/bench/board-drag.ts).
 */
import type { BoardSurface, Placement } from "./types";

type Panel = Pick<Placement, "buildUpId" | "x" | "y" | "width" | "height">;
type SurfaceShape = Pick<BoardSurface, "width" | "height" | "openings">;

export interface BoardPlacements {
  surfaceKey: string;
  surface: SurfaceShape;
  placements: readonly Panel[];
}

export interface TreatedAreaLine {
  surfaceKey: string;
  buildUpId: string;
  /** m² */
  area: number;
}

/** Where the placed area went, m². placed = counted + outside + overlapping + overOpenings. */
export interface AreaAccount {
  /** the panels' full sizes added up */
  placed: number;
  /** what the check counts */
  counted: number;
  /** past the surface's edges */
  outside: number;
  /** a second (or third …) layer where panels overlap */
  overlapping: number;
  /** over doors, windows and other openings */
  overOpenings: number;
}

export interface SurfaceCount {
  /** every build-up placed, in the order first met, with the area it counts (0 when none) */
  byBuildUp: Map<string, number>;
  account: AreaAccount;
}

interface Box {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  /** the panel's place in the list (the later one lies on top); -1 for an opening */
  order: number;
  /** its build-up's number in `ids` */
  kind: number;
}

function clip(r: { x: number; y: number; width: number; height: number }, surface: SurfaceShape, order: number, kind: number): Box | null {
  const x0 = Math.max(0, r.x);
  const x1 = Math.min(surface.width, r.x + r.width);
  const y0 = Math.max(0, r.y);
  const y1 = Math.min(surface.height, r.y + r.height);
  return x1 > x0 && y1 > y0 ? { x0, x1, y0, y1, order, kind } : null;
}

/** First index in the sorted `values[0..n)` not below `v`. */
function lowerBound(values: Float64Array, n: number, v: number): number {
  let lo = 0;
  let hi = n;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (values[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The area of one surface's panels that counts, per build-up, and where the rest went. */
export function countSurface(surface: SurfaceShape, placements: readonly Panel[]): SurfaceCount {
  const account: AreaAccount = { placed: 0, counted: 0, outside: 0, overlapping: 0, overOpenings: 0 };
  const ids: string[] = [];
  const kindOf = new Map<string, number>();
  const panels: Box[] = [];
  let inside = 0;
  placements.forEach((p, i) => {
    account.placed += Math.max(0, p.width) * Math.max(0, p.height);
    let kind = kindOf.get(p.buildUpId);
    if (kind === undefined) kindOf.set(p.buildUpId, (kind = ids.push(p.buildUpId) - 1));
    const box = clip(p, surface, i, kind);
    if (box) {
      panels.push(box);
      inside += (box.x1 - box.x0) * (box.y1 - box.y0);
    }
  });
  account.outside = Math.max(0, account.placed - inside);
  const areas = new Float64Array(ids.length);
  if (panels.length > 0) {
    const openings = surface.openings.map((o) => clip(o, surface, -1, -1)).filter((b): b is Box => b !== null);
    const union = sweepSlabs(panels, openings, areas, account);
    account.overlapping = Math.max(0, inside - union);
  }
  const byBuildUp = new Map<string, number>();
  ids.forEach((id, k) => {
    byBuildUp.set(id, areas[k]);
    account.counted += areas[k];
  });
  return { byBuildUp, account };
}

/** Adds each piece's area to its top panel's build-up (or to overOpenings); returns the union. */
function sweepSlabs(panels: Box[], openings: Box[], areas: Float64Array, account: AreaAccount): number {
  const edges = [...new Set([...panels, ...openings].flatMap((b) => [b.x0, b.x1]))].sort((a, b) => a - b);
  const byLeft = [...panels].sort((a, b) => a.x0 - b.x0);
  const active: Box[] = [];
  const ys = new Float64Array(2 * (panels.length + openings.length));
  const owner = new Int32Array(ys.length);
  const kindAt = new Int32Array(ys.length);
  const open = new Uint8Array(ys.length);
  let next = 0;
  let union = 0;
  for (let i = 0; i + 1 < edges.length; i++) {
    const xa = edges[i];
    const w = edges[i + 1] - xa;
    // Panels that ended before this slab leave the list; those that start at it join.
    let kept = 0;
    for (const b of active) if (b.x1 > xa) active[kept++] = b;
    active.length = kept;
    while (next < byLeft.length && byLeft[next].x0 <= xa) {
      const b = byLeft[next++];
      if (b.x1 > xa) active.push(b);
    }
    if (active.length === 0) continue;
    let n = 0;
    for (const b of active) (ys[n++] = b.y0), (ys[n++] = b.y1);
    const here = openings.filter((o) => o.x0 <= xa && o.x1 > xa);
    for (const o of here) (ys[n++] = o.y0), (ys[n++] = o.y1);
    ys.subarray(0, n).sort();
    // Distinct y values, in place; the piece [ys[j], ys[j+1]) goes to the top panel over it.
    let m = 0;
    for (let j = 0; j < n; j++) if (m === 0 || ys[j] !== ys[m - 1]) ys[m++] = ys[j];
    owner.fill(-1, 0, m);
    open.fill(0, 0, m);
    for (const b of active) {
      for (let j = lowerBound(ys, m, b.y0), end = lowerBound(ys, m, b.y1); j < end; j++) {
        if (b.order > owner[j]) (owner[j] = b.order), (kindAt[j] = b.kind);
      }
    }
    for (const o of here) for (let j = lowerBound(ys, m, o.y0), end = lowerBound(ys, m, o.y1); j < end; j++) open[j] = 1;
    for (let j = 0; j + 1 < m; j++) {
      if (owner[j] < 0) continue;
      const piece = w * (ys[j + 1] - ys[j]);
      union += piece;
      if (open[j]) account.overOpenings += piece;
      else areas[kindAt[j]] += piece;
    }
  }
  return union;
}

/**
 * One line per (surface, build-up) with area that counts, surfaces in the order given,
 * build-ups as first met. A surface given twice is counted as one board.
 */
export function treatedArea(boards: Iterable<BoardPlacements>): TreatedAreaLine[] {
  const merged = new Map<string, { surface: SurfaceShape; placements: Panel[] }>();
  for (const board of boards) {
    const seen = merged.get(board.surfaceKey);
    if (seen) seen.placements.push(...board.placements);
    else merged.set(board.surfaceKey, { surface: board.surface, placements: [...board.placements] });
  }
  return [...merged].flatMap(([surfaceKey, { surface, placements }]) => linesOf(surfaceKey, countSurface(surface, placements)));
}

/** One surface's count as treatment lines for the check. */
export function linesOf(surfaceKey: string, count: SurfaceCount): TreatedAreaLine[] {
  const lines: TreatedAreaLine[] = [];
  for (const [buildUpId, area] of count.byBuildUp) {
    // A build-up wholly over an opening or off the surface adds nothing (and the check
    // refuses a line of no area).
    if (area > 1e-9) lines.push({ surfaceKey, buildUpId, area });
  }
  return lines;
}
