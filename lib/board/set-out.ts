/**
 * The dimension lines of a board, as a drawing gives set-out: every length measured from the
 * surface's lower-left datum, so an installer can mark it from the corner and the floor.
 *
 * Each line measures a stretch [from, to] along one axis ("x" across, "y" up) and sits at `at`
 * on the other axis. `rows` moves it off the surface on the screen, in rows of dimension lines:
 * positive rows go below the surface (x lines) or to its left (y lines); 0 draws the line on
 * the surface itself at `at`; negative rows go above the surface (x) or to its right (y).
 * Lines drawn off the surface have extension lines back to what they measure, which starts at
 * `witness` on the other axis (the surface's edge, `at`, unless given).
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
  witness?: number;
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
 * A selected panel (or a selection's outline), set out as ordinates from the datum along the
 * surface's top and right edges, where nothing else is drawn: across the top, a chain from the
 * left edge to the panel and across its width; up the right, from the floor to the panel and
 * up its height. Extension lines come down (and across) from the panel's own edges.
 */
export function panelSetOut(panel: Rect, surface: { width: number; height: number }): DimensionLine[] {
  const top = panel.y + panel.height;
  const right = panel.x + panel.width;
  const across = { axis: "x" as const, at: surface.height, rows: -1, witness: top };
  const up = { axis: "y" as const, at: surface.width, rows: -1, witness: right };
  return [
    { kind: "set-out" as const, from: 0, to: panel.x, ...across },
    { kind: "size" as const, from: panel.x, to: right, ...across },
    { kind: "set-out" as const, from: 0, to: panel.y, ...up },
    { kind: "size" as const, from: panel.y, to: top, ...up },
  ].filter(keep);
}
