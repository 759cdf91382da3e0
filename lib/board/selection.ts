/**
 * Choosing panels: by marquee, by a click, by the keyboard; and nudging them with the arrow keys.
 *
 * Marquee semantics: a panel is selected when it lies wholly inside the marquee (a micrometre of
 * float noise allowed). On a board of closely packed panels, "touching" would pick up every
 * neighbour the marquee brushes; "wholly inside" picks exactly the panels framed.
 */
import { moveBy } from "./edits";
import { containsRect } from "./rect";
import { LENGTH_TOLERANCE, type Placement, type Point, type Rect } from "./types";

export function marqueeSelect(placements: readonly Placement[], marquee: Rect): Set<string> {
  const chosen = new Set<string>();
  for (const p of placements) if (containsRect(marquee, p, LENGTH_TOLERANCE)) chosen.add(p.id);
  return chosen;
}

/** The panel under a point: the topmost one, drawn last; null over bare surface. */
export function hitTest(placements: readonly Placement[], point: Point): string | null {
  for (let i = placements.length - 1; i >= 0; i--) {
    const p = placements[i];
    if (point.x >= p.x && point.x <= p.x + p.width && point.y >= p.y && point.y <= p.y + p.height) return p.id;
  }
  return null;
}

/** Shift-click: adds the panel to the selection, or takes it out when it is already in. */
export function toggleSelection(selection: ReadonlySet<string>, id: string): Set<string> {
  const next = new Set(selection);
  if (!next.delete(id)) next.add(id);
  return next;
}

export interface NudgeSteps {
  /** m per arrow key press */
  step: number;
  /** m per press with shift held */
  largeStep: number;
}

/** 10 mm a press, 100 mm with shift; the board may pass its own (the grid module, 1/2 in …). */
export const DEFAULT_NUDGE: NudgeSteps = { step: 0.01, largeStep: 0.1 };

const ARROWS: Record<string, Point> = {
  ArrowLeft: { x: -1, y: 0 },
  ArrowRight: { x: 1, y: 0 },
  // Up on the screen is up the surface: y grows upwards from the datum.
  ArrowUp: { x: 0, y: 1 },
  ArrowDown: { x: 0, y: -1 },
};

/** The move an arrow key asks for, or null for any other key. */
export function nudgeOffset(key: string, shift: boolean, steps: NudgeSteps = DEFAULT_NUDGE): Point | null {
  const direction = ARROWS[key];
  if (!direction) return null;
  const length = shift ? steps.largeStep : steps.step;
  return { x: direction.x * length, y: direction.y * length };
}

export function nudge(
  placements: readonly Placement[],
  selection: ReadonlySet<string>,
  key: string,
  shift: boolean,
  steps: NudgeSteps = DEFAULT_NUDGE,
): readonly Placement[] {
  const offset = nudgeOffset(key, shift, steps);
  return offset ? moveBy(placements, selection, offset.x, offset.y) : placements;
}

/**
 * Tab through the panels in reading order of the elevation: rows from the top of the surface
 * down, each row left to right (rows by the panels' centres, to the millimetre). From nothing
 * selected, forwards starts at the first panel and backwards at the last. Null on an empty board.
 */
export function cycleSelection(placements: readonly Placement[], current: string | null, direction: 1 | -1): string | null {
  if (placements.length === 0) return null;
  const order = readingOrder(placements);
  const at = current === null ? -1 : order.findIndex((p) => p.id === current);
  if (at < 0) return (direction === 1 ? order[0] : order[order.length - 1]).id;
  return order[(at + direction + order.length) % order.length].id;
}

/**
 * Tab on the board: the next panel in reading order, or null past the last (Shift+Tab: before
 * the first), so the key then leaves the board for the rest of the page as Tab always does.
 */
export function stepSelection(placements: readonly Placement[], current: string | null, direction: 1 | -1): string | null {
  if (placements.length === 0) return null;
  const order = readingOrder(placements);
  const at = current === null ? -1 : order.findIndex((p) => p.id === current);
  if (at < 0) return (direction === 1 ? order[0] : order[order.length - 1]).id;
  return order[at + direction]?.id ?? null;
}

/**
 * Alt+arrow: the selected panels grow or shrink from their lower-left corner, which stays put
 * (ArrowRight wider, ArrowLeft narrower, ArrowUp taller, ArrowDown lower), never below `minSize`.
 */
export function resizeByKey(
  placements: readonly Placement[],
  selection: ReadonlySet<string>,
  key: string,
  shift: boolean,
  steps: NudgeSteps,
  minSize: number,
): readonly Placement[] {
  const offset = nudgeOffset(key, shift, steps);
  if (!offset || selection.size === 0) return placements;
  let changed = false;
  const next = placements.map((p) => {
    if (!selection.has(p.id)) return p;
    const width = Math.max(minSize, p.width + offset.x);
    const height = Math.max(minSize, p.height + offset.y);
    if (width === p.width && height === p.height) return p;
    changed = true;
    return { ...p, width, height };
  });
  return changed ? next : placements;
}

export function readingOrder(placements: readonly Placement[]): Placement[] {
  const row = (p: Placement) => Math.round((p.y + p.height / 2) * 1000);
  return [...placements].sort((a, b) => row(b) - row(a) || a.x - b.x);
}
