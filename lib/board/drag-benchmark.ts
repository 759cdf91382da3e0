/**
 * A drag loop on a full board, for the screen's end-to-end benchmark and for measuring by hand:
 * every simulated pointer move snaps the dragged panel against a prebuilt index, writes it into
 * the placements (sharing the others), checks every rule and sums the treated area, the work the
 * board does per frame besides drawing. It reports times; it asserts nothing.
 *
 * The board is a fictional wall of our own: 50 × 10 panels of 575 mm at 25 mm gaps with a door
 * and two windows among them, so the rules have real breaks to word.
 */
import { makeArray } from "./arrays";
import { allPairsOverlapCount, scanSnapOffsets } from "./drag-baseline";
import { updatePlacement } from "./edits";
import { formatCode } from "./labels";
import { checkRules } from "./rules";
import { snapMove } from "./snap";
import { forEachOverlap } from "./sweep";
import { buildSnapIndex, type SnapIndex } from "./snap-index";
import { treatedArea } from "./treated-area";
import type { BoardSurface, Placement, Rect } from "./types";

export function benchmarkBoard(count = 500): { surface: BoardSurface; placements: Placement[] } {
  const columns = 50;
  const rows = Math.max(1, Math.ceil(count / columns));
  const rects = makeArray({ origin: { x: 0.5, y: 0.5 }, width: 0.575, height: 0.575, columns, rows, gapX: 0.025, gapY: 0.025 });
  const placements = rects.slice(0, count).map((r, i) => ({
    id: `bench-${i}`,
    code: formatCode(i + 1),
    buildUpId: i % 3 === 0 ? "slotted-oak" : "perforated-birch",
    x: r.x,
    y: r.y,
    width: r.width,
    height: r.height,
  }));
  const surface: BoardSurface = {
    width: 31,
    height: Math.max(3, 1 + rows * 0.6),
    openings: [
      { id: "door", kind: "door", x: 3.01, y: 0, width: 1, height: 2.1 },
      { id: "window-1", kind: "window", x: 12, y: 1.5, width: 2.4, height: 1.5 },
      { id: "window-2", kind: "window", x: 20, y: 1.5, width: 2.4, height: 1.5 },
    ],
  };
  return { surface, placements };
}

export interface DragBenchmarkResult {
  placements: number;
  frames: number;
  /** mean time per frame of each stage and of the whole frame, ms */
  msPerFrame: { snap: number; rules: number; area: number; total: number };
  /** the slowest whole frame, ms */
  worstFrameMs: number;
  indexBuildMs: number;
  breaksInLastFrame: number;
  /** how many times faster than the plain way, measured on the same frames: all-pairs overlap tests over the sweep, an edge scan over the index */
  ratios: { overlaps: number; snap: number };
}

export function runDragBenchmark(options: { count?: number; frames?: number; clearance?: number } = {}): DragBenchmarkResult {
  const { surface, placements } = benchmarkBoard(options.count ?? 500);
  const frames = options.frames ?? 300;
  const dragged = placements[Math.floor(placements.length / 2)];
  const t0 = performance.now();
  const index = buildSnapIndex(surface, placements, { exclude: new Set([dragged.id]) });
  const indexBuildMs = performance.now() - t0;
  const spent = { snap: 0, rules: 0, area: 0, total: 0 };
  let worstFrameMs = 0;
  let list: readonly Placement[] = placements;
  let breaks = 0;
  for (let f = 0; f < frames; f++) {
    const start = performance.now();
    const raw = pointerPath(dragged, f);
    const snapped = snapMove(raw, index, { tolerance: 0.02, module: 0.3 }).rect;
    const afterSnap = performance.now();
    list = updatePlacement(list, dragged.id, { x: snapped.x, y: snapped.y });
    breaks = checkRules(surface, list, { clearance: options.clearance ?? 0.05 }).length;
    const afterRules = performance.now();
    treatedArea([{ surfaceKey: "wall-a", surface, placements: list }]);
    const end = performance.now();
    spent.snap += afterSnap - start;
    spent.rules += afterRules - afterSnap;
    spent.area += end - afterRules;
    spent.total += end - start;
    worstFrameMs = Math.max(worstFrameMs, end - start);
  }
  const mean = (ms: number) => ms / frames;
  return {
    placements: placements.length,
    frames,
    msPerFrame: { snap: mean(spent.snap), rules: mean(spent.rules), area: mean(spent.area), total: mean(spent.total) },
    worstFrameMs,
    indexBuildMs,
    breaksInLastFrame: breaks,
    ratios: compareWithPlainSearches(list, index, dragged, frames),
  };
}

/** A wandering pointer path across a few panels' width, in uneven steps. */
const pointerPath = (from: Rect, frame: number): Rect => ({
  x: from.x + 1.3 * Math.sin(frame / 17),
  y: from.y + 0.7 * Math.cos(frame / 23),
  width: from.width,
  height: from.height,
});

/**
 * Each search and its plain counterpart run in batches over the same inputs (a single search of a
 * few microseconds is below what a frame's timer can tell apart), each warmed up first.
 */
function compareWithPlainSearches(list: readonly Placement[], index: SnapIndex, dragged: Rect, frames: number) {
  const rects = Array.from({ length: frames }, (_, f) => pointerPath(dragged, f));
  const rounds = Math.max(1, Math.ceil(frames / 30));
  const snap = timed(rounds, () => rects.forEach((r) => snapMove(r, index, { tolerance: 0.02 })));
  const scan = timed(rounds, () => rects.forEach((r) => scanSnapOffsets(r, index, 0.02)));
  const sweep = timed(rounds, () => forEachOverlap(list, () => {}));
  const allPairs = timed(rounds, () => allPairsOverlapCount(list));
  return { overlaps: allPairs / sweep, snap: scan / snap };
}

/** Time of `rounds` runs after as many runs to warm up, ms. */
function timed(rounds: number, run: () => void): number {
  for (let i = 0; i < rounds; i++) run();
  const start = performance.now();
  for (let i = 0; i < rounds; i++) run();
  return performance.now() - start;
}
