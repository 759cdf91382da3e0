/**
 * A panel drawn by dragging a box on the board: its lower-left corner goes to the nearest grid
 * crossing, and its size to the nearest whole number of the build-up's modules (at least one),
 * so a drawn panel is a panel the maker can cut from their module, not 618.1 × 1,209.3 mm.
 */
import type { Rect } from "./types";

export interface ModuleSize {
  width: number;
  height: number;
}

const nearestLine = (v: number, grid: number) => (grid > 0 ? Math.round(v / grid) * grid : v);
const wholeModules = (size: number, module: number) => (module > 0 ? Math.max(1, Math.round(size / module)) * module : size);

export function snapDrawnPanel(drawn: Rect, module: ModuleSize, grid: number): Rect {
  return {
    x: nearestLine(drawn.x, grid),
    y: nearestLine(drawn.y, grid),
    width: wholeModules(drawn.width, module.width),
    height: wholeModules(drawn.height, module.height),
  };
}
