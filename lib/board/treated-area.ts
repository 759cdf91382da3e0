/**
 * The treated area per surface and build-up: what the board hands to the reverberation check
 * (the same shape as the room's treatment lines). Every placement counts at its full size,
 * whether or not it breaks a rule: the rules list says what must change, and the check should
 * not jump when a panel is dragged across an edge. Cheap enough to run on every frame of a drag:
 * one pass over the placements with a small map per surface.
 */
import type { Placement } from "./types";

export interface BoardPlacements {
  surfaceKey: string;
  placements: readonly Pick<Placement, "buildUpId" | "width" | "height">[];
}

export interface TreatedAreaLine {
  surfaceKey: string;
  buildUpId: string;
  /** m² */
  area: number;
}

/** One line per (surface, build-up) with panels, surfaces in the order given, build-ups as first met. */
export function treatedArea(boards: Iterable<BoardPlacements>): TreatedAreaLine[] {
  const lines: TreatedAreaLine[] = [];
  const bySurface = new Map<string, Map<string, TreatedAreaLine>>();
  for (const board of boards) {
    let byBuildUp = bySurface.get(board.surfaceKey);
    if (!byBuildUp) bySurface.set(board.surfaceKey, (byBuildUp = new Map()));
    for (const p of board.placements) {
      let line = byBuildUp.get(p.buildUpId);
      if (!line) {
        line = { surfaceKey: board.surfaceKey, buildUpId: p.buildUpId, area: 0 };
        byBuildUp.set(p.buildUpId, line);
        lines.push(line);
      }
      line.area += p.width * p.height;
    }
  }
  return lines;
}
