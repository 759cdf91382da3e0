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
 * owns each piece. For a board laid out in rows and columns there are few distinct edges and
 * the work is small enough to run on every frame of a drag (tests/bench/board-drag.ts).
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
  /** the panel's build-up; null for an opening */
  buildUpId: string | null;
}

function clip(r: { x: number; y: number; width: number; height: number }, surface: SurfaceShape, buildUpId: string | null): Box | null {
  const x0 = Math.max(0, r.x);
  const x1 = Math.min(surface.width, r.x + r.width);
  const y0 = Math.max(0, r.y);
  const y1 = Math.min(surface.height, r.y + r.height);
  return x1 > x0 && y1 > y0 ? { x0, x1, y0, y1, buildUpId } : null;
}

/** The area of one surface's panels that counts, per build-up, and where the rest went. */
export function countSurface(surface: SurfaceShape, placements: readonly Panel[]): SurfaceCount {
  const account: AreaAccount = { placed: 0, counted: 0, outside: 0, overlapping: 0, overOpenings: 0 };
  const byBuildUp = new Map<string, number>();
  const panels: Box[] = [];
  let inside = 0;
  for (const p of placements) {
    const full = Math.max(0, p.width) * Math.max(0, p.height);
    account.placed += full;
    if (!byBuildUp.has(p.buildUpId)) byBuildUp.set(p.buildUpId, 0);
    const box = clip(p, surface, p.buildUpId);
    if (box) {
      panels.push(box);
      inside += (box.x1 - box.x0) * (box.y1 - box.y0);
    }
  }
  account.outside = Math.max(0, account.placed - inside);
  if (panels.length === 0) return { byBuildUp, account };
  const openings = surface.openings.map((o) => clip(o, surface, null)).filter((b): b is Box => b !== null);

  const xs = new Set<number>();
  for (const b of panels) xs.add(b.x0).add(b.x1);
  for (const b of openings) xs.add(b.x0).add(b.x1);
  const edges = [...xs].sort((a, b) => a - b);
  let union = 0;
  const activePanels: Box[] = [];
  const activeOpenings: Box[] = [];
  const ys: number[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    const xa = edges[i];
    const xb = edges[i + 1];
    const w = xb - xa;
    activePanels.length = 0;
    for (const b of panels) if (b.x0 <= xa && b.x1 >= xb) activePanels.push(b);
    if (activePanels.length === 0) continue;
    activeOpenings.length = 0;
    for (const b of openings) if (b.x0 <= xa && b.x1 >= xb) activeOpenings.push(b);
    ys.length = 0;
    for (const b of activePanels) ys.push(b.y0, b.y1);
    for (const b of activeOpenings) ys.push(b.y0, b.y1);
    ys.sort((a, b) => a - b);
    for (let j = 0; j + 1 < ys.length; j++) {
      const ya = ys[j];
      const yb = ys[j + 1];
      if (!(yb > ya)) continue;
      // The panel on top is the last in the list that covers this piece.
      let owner: Box | null = null;
      for (const b of activePanels) if (b.y0 <= ya && b.y1 >= yb) owner = b;
      if (!owner) continue;
      const piece = w * (yb - ya);
      union += piece;
      if (activeOpenings.some((o) => o.y0 <= ya && o.y1 >= yb)) account.overOpenings += piece;
      else byBuildUp.set(owner.buildUpId!, (byBuildUp.get(owner.buildUpId!) ?? 0) + piece);
    }
  }
  account.overlapping = Math.max(0, inside - union);
  for (const area of byBuildUp.values()) account.counted += area;
  return { byBuildUp, account };
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
