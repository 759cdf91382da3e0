/**
 * Panels high on a wall (SAFETY.md, "Overhead and high-level installation"): they can fall on
 * people below, and fixing them is work at height. The board names them where they are placed.
 * The line is drawn at 2.4 m above the floor (common practice, not a code value): beyond a
 * standing fixer's reach, so fixing the panel's top needs steps or a platform, and above the
 * heads of people below. A ceiling is overhead as a whole and has its own caution.
 */
import type { Placement } from "./types";

/** m above the floor (the wall board's datum) */
export const HIGH_ON_WALL = 2.4;

export function panelsHighOnWall<T extends Pick<Placement, "y" | "height">>(kind: "wall" | "ceiling" | "floor", placements: readonly T[], line = HIGH_ON_WALL): T[] {
  if (kind !== "wall") return [];
  return placements.filter((p) => p.y + p.height > line + 1e-9);
}
