/**
 * The dimension lines of a board, as a drawing gives set-out: every length measured from the
 * surface's lower-left datum, so an installer can mark it from the corner and the floor.
 *
 * Each line measures a stretch [from, to] along one axis ("x" across, "y" up) and sits at `at`
 * on the other axis. `rows` moves it off the surface on the screen, in rows of dimension lines:
 * positive rows go below the surface (x lines) or to its left (y lines); 0 draws the line on
 * the surface itself at `at`; negative rows go above a panel (x) or to its right (y).
 */
import type { BoardSurface, Rect } from "./types";

export type DimensionKind = "overall" | "opening" | "sill" | "set-out" | "size";

export interface DimensionLine {
  kind: DimensionKind;
  axis: "x" | "y";
  from: number;
  to: number;
  at: number;
  rows: number;
}

const MIN_LENGTH = 1e-4;
const keep = (d: DimensionLine) => d.to - d.from > MIN_LENGTH;

/**
 * The surface's own dimensions: its overall width below and height on the left; where it has
 * openings, a chain below it from the datum through each opening's edges to the far end, and
 * each raised opening's sill height from the floor.
 */
export function surfaceDimensions(surface: BoardSurface): DimensionLine[] {
  const lines: DimensionLine[] = [];
  const edges = new Set<number>([0, surface.width]);
  for (const o of surface.openings) {
    edges.add(Math.min(surface.width, Math.max(0, o.x)));
    edges.add(Math.min(surface.width, Math.max(0, o.x + o.width)));
  }
  const chain = [...edges].sort((a, b) => a - b);
  if (surface.openings.length > 0) {
    for (let i = 0; i + 1 < chain.length; i++) lines.push({ kind: "opening", axis: "x", from: chain[i], to: chain[i + 1], at: 0, rows: 1 });
    for (const o of surface.openings) if (o.y > MIN_LENGTH) lines.push({ kind: "sill", axis: "y", from: 0, to: o.y, at: o.x + o.width / 2, rows: 0 });
  }
  lines.push({ kind: "overall", axis: "x", from: 0, to: surface.width, at: 0, rows: surface.openings.length > 0 ? 2 : 1 });
  lines.push({ kind: "overall", axis: "y", from: 0, to: surface.height, at: 0, rows: 1 });
  return lines.filter(keep);
}

/**
 * A selected panel (or a selection's outline): its distance from the left edge, drawn across
 * the surface at the panel's mid-height, and from the floor, drawn up at its mid-width; its
 * width above it and its height to its right.
 */
export function panelSetOut(panel: Rect): DimensionLine[] {
  return [
    { kind: "set-out" as const, axis: "x" as const, from: 0, to: panel.x, at: panel.y + panel.height / 2, rows: 0 },
    { kind: "set-out" as const, axis: "y" as const, from: 0, to: panel.y, at: panel.x + panel.width / 2, rows: 0 },
    { kind: "size" as const, axis: "x" as const, from: panel.x, to: panel.x + panel.width, at: panel.y + panel.height, rows: -1 },
    { kind: "size" as const, axis: "y" as const, from: panel.y, to: panel.y + panel.height, at: panel.x + panel.width, rows: -1 },
  ].filter(keep);
}
