"use client";

import { useCallback, useMemo, useRef, useState } from "react";
import type { BoardView } from "@/lib/services/boards";
import type { BoardSurface, Placement, Rect } from "@/lib/board/types";
import { buildSnapIndex, type SnapIndex } from "@/lib/board/snap-index";
import { snapMove, snapResize, type SnapGuide } from "@/lib/board/snap";
import { resizeRect, type ResizeHandle } from "@/lib/board/resize";
import { begin, cancel, canRedo, canUndo, commit, createHistory, push, redo, undo, type History } from "@/lib/board/history";
import { addPlacements, moveBy, removePlacements, updatePlacement } from "@/lib/board/edits";
import { boundsOf } from "@/lib/board/rect";
import { duplicate, makeArray } from "@/lib/board/arrays";
import { snapDrawnPanel } from "@/lib/board/draw";
import { nextCode, nextCodes } from "@/lib/board/labels";
import { marqueeSelect } from "@/lib/board/selection";

/** the smallest panel the server accepts (lib/schemas/board.ts) */
export const MIN_PANEL = 0.02;

declare global {
  interface Window {
    __cavitasBoard?: { lastDragAt: number; checkAt: number; frames: number };
  }
}

export const boardStats = () => (window.__cavitasBoard ??= { lastDragAt: 0, checkAt: 0, frames: 0 });

const toPlacements = (b: BoardView): Placement[] => b.placements.map((p) => ({ ...p }));

type Args = {
  initial: BoardView;
  board: BoardView;
  surface: BoardSurface;
  /** px per m of the view, for the snap tolerance (8 px on screen) */
  scale: number;
  /** every change of placements or grid goes to the autosave */
  schedule: (placements: readonly Placement[], gridModule: number) => void;
};

// The board's editing state: the placements with their undo history, the selection, the grid,
// and every change the canvas, the keyboard and the side panels can make. Each change is put
// on the history and scheduled for saving in one step.
export function useBoardEditor({ initial, board, surface, scale, schedule }: Args) {
  const [history, setHistory] = useState<History<readonly Placement[]>>(() => createHistory<readonly Placement[]>(toPlacements(initial)));
  const placements = history.present.state;
  const [selected, setSelectedState] = useState<Set<string>>(new Set());
  // The latest placements and selection, for keys pressed faster than the screen redraws (a
  // held arrow or Tab key): each press must start from the one before, not from the last render.
  const latest = useRef({ placements, selected });
  latest.current = { placements, selected };
  const setSelected = useCallback((next: Set<string> | ((cur: Set<string>) => Set<string>)) => {
    const value = typeof next === "function" ? next(latest.current.selected) : next;
    latest.current = { ...latest.current, selected: value };
    setSelectedState(value);
  }, []);
  const [gridModule, setGridModuleState] = useState(initial.gridModule);
  const [guides, setGuides] = useState<SnapGuide[]>([]);
  const [live, setLive] = useState<{ id: string; rect: Rect } | null>(null);
  const [buildUpId, setBuildUpId] = useState(board.buildUps[0]?.id ?? "");
  const snapIndex = useRef<SnapIndex | null>(null);
  const dragStart = useRef<Rect | null>(null);
  const tolerance = 8 / scale;
  const codes = useMemo(() => new Map(placements.map((p) => [p.id, p.code ?? ""])), [placements]);

  const change = useCallback(
    (next: readonly Placement[], label: string) => {
      latest.current = { ...latest.current, placements: next };
      setHistory((h) => push(h, next, label));
      schedule(next, gridModule);
    },
    [schedule, gridModule],
  );
  const step = useCallback(
    (move: typeof undo) =>
      setHistory((h) => {
        const next = move(h);
        schedule(next.present.state, gridModule);
        return next;
      }),
    [schedule, gridModule],
  );

  // --- canvas callbacks: stable, since every panel is memoised on its props -------------
  const onSelect = useCallback((ids: string[], additive: boolean) => setSelected((cur) => (additive ? new Set([...cur, ...ids]) : new Set(ids))), []);
  // A drag moves the selection (or the panel alone); it snaps the selection's outline, against
  // everything that is not moving with it.
  const dragGroup = useRef<{ dx: number; dy: number; width: number; height: number } | null>(null);
  const onDragStart = useCallback(
    (id: string) => {
      const moving = selected.has(id) ? selected : new Set([id]);
      snapIndex.current = buildSnapIndex(surface, placements, { exclude: moving });
      const p = placements.find((x) => x.id === id)!;
      const bounds = boundsOf(placements.filter((x) => moving.has(x.id)))!;
      dragGroup.current = { dx: p.x - bounds.x, dy: p.y - bounds.y, width: bounds.width, height: bounds.height };
      dragStart.current = { x: p.x, y: p.y, width: p.width, height: p.height };
      if (!selected.has(id)) setSelected(new Set([id]));
      setHistory((h) => begin(h));
    },
    [placements, surface, selected],
  );
  const snapDragged = useCallback(
    (rect: Rect): { rect: Rect; guides: SnapGuide[] } => {
      const g = dragGroup.current;
      if (!snapIndex.current || !g) return { rect, guides: [] };
      const outline = { x: rect.x - g.dx, y: rect.y - g.dy, width: g.width, height: g.height };
      const snapped = snapMove(outline, snapIndex.current, { tolerance, module: gridModule });
      return { rect: { ...rect, x: rect.x + snapped.dx, y: rect.y + snapped.dy }, guides: snapped.guides };
    },
    [tolerance, gridModule],
  );
  const onDragMove = useCallback(
    (id: string, rect: Rect) => {
      const stats = boardStats();
      stats.lastDragAt = performance.now();
      stats.frames++;
      const snapped = snapDragged(rect);
      setGuides(snapped.guides);
      setLive({ id, rect: snapped.rect });
      return snapped.rect;
    },
    [snapDragged],
  );
  const onDragEnd = useCallback(
    (id: string, rect: Rect) => {
      const start = dragStart.current;
      const snapped = snapDragged(rect).rect;
      setGuides([]);
      setLive(null);
      if (!start) return;
      const ids = selected.has(id) ? selected : new Set([id]);
      const next = moveBy(placements, ids, snapped.x - start.x, snapped.y - start.y);
      setHistory((h) => commit(push(h, next, `Move ${codes.get(id)}`)));
      schedule(next, gridModule);
    },
    [placements, selected, snapDragged, gridModule, codes, schedule],
  );
  // The snap index is built once when a resize starts, not on every pointer move.
  const resizeIndex = useRef<{ id: string; index: SnapIndex } | null>(null);
  const onResize = useCallback(
    (id: string, handle: ResizeHandle, dx: number, dy: number, done: boolean) => {
      const p = placements.find((x) => x.id === id);
      if (!p) return null;
      if (resizeIndex.current?.id !== id) resizeIndex.current = { id, index: buildSnapIndex(surface, placements, { exclude: new Set([id]) }) };
      const raw = resizeRect(p, handle, dx, dy, MIN_PANEL);
      const rect = snapResize(raw, handle, resizeIndex.current.index, { tolerance, module: gridModule, minSize: MIN_PANEL }).rect;
      if (done) {
        resizeIndex.current = null;
        setLive(null);
        change(updatePlacement(placements, id, rect), `Resize ${p.code}`);
      } else setLive({ id, rect });
      return rect;
    },
    [placements, surface, tolerance, gridModule, change],
  );
  const onMarquee = useCallback((rect: Rect, additive: boolean) => {
    setSelected((cur) => {
      const hit = marqueeSelect(placements, rect);
      return additive ? new Set([...cur, ...hit]) : hit;
    });
  }, [placements]);

  const buildUp = board.buildUps.find((x) => x.id === buildUpId);
  const snapDrawn = useCallback((r: Rect) => (buildUp ? snapDrawnPanel(r, { width: buildUp.moduleWidth, height: buildUp.moduleHeight }, gridModule) : r), [buildUp, gridModule]);

  function addPanel(rect?: Rect) {
    if (!buildUp) return;
    const r = rect ?? { x: board.clearance, y: board.clearance, width: buildUp.moduleWidth, height: buildUp.moduleHeight };
    const made: Placement = { id: crypto.randomUUID(), buildUpId, code: nextCode(placements.map((p) => p.code)), ...r };
    change(addPlacements(placements, [made]), `Add ${made.code}`);
    setSelected(new Set([made.id]));
  }

  function addArray(spec: { columns: number; rows: number; gapX: number; gapY: number }) {
    if (!buildUp) return;
    const anchor = placements.find((p) => selected.has(p.id));
    const origin = anchor ? { x: anchor.x, y: anchor.y } : { x: board.clearance, y: board.clearance };
    const rects = makeArray({ origin, width: buildUp.moduleWidth, height: buildUp.moduleHeight, ...spec });
    const codesNew = nextCodes(placements.map((p) => p.code), rects.length);
    const made = rects.map((r, i) => ({ id: crypto.randomUUID(), buildUpId, code: codesNew[i], ...r }));
    change(addPlacements(anchor ? removePlacements(placements, new Set([anchor.id])) : placements, made), `Add ${spec.columns} × ${spec.rows} array`);
    setSelected(new Set(made.map((m) => m.id)));
  }

  function removeSelected() {
    const now = latest.current;
    change(removePlacements(now.placements, now.selected), `Delete ${now.selected.size}`);
    setSelected(new Set());
  }

  function duplicateSelected() {
    const now = latest.current;
    const made = duplicate(now.placements.filter((p) => now.selected.has(p.id)), { x: gridModule, y: 0 }, { taken: now.placements });
    change(addPlacements(now.placements, made), `Duplicate ${made.length}`);
    setSelected(new Set(made.map((m) => m.id)));
  }

  function setGridModule(m: number) {
    setGridModuleState(m);
    schedule(placements, m);
  }

  function replaceAll(fresh: BoardView) {
    setHistory(createHistory<readonly Placement[]>(toPlacements(fresh)));
    setSelected(new Set());
  }

  // What the check and the rules see: the placements, with the one being dragged at its live spot.
  const shown = useMemo(() => (live ? placements.map((p) => (p.id === live.id ? { ...p, ...live.rect } : p)) : placements), [placements, live]);

  return {
    placements,
    /** the placements and selection as of the last change, even before the screen redraws */
    latest,
    shown,
    live,
    guides,
    selected,
    setSelected,
    gridModule,
    setGridModule,
    buildUpId,
    setBuildUpId,
    canUndo: canUndo(history),
    canRedo: canRedo(history),
    undo: () => step(undo),
    redo: () => step(redo),
    cancelGesture: () => setHistory((h) => cancel(h)),
    change,
    addPanel,
    addArray,
    removeSelected,
    duplicateSelected,
    replaceAll,
    canvas: { onSelect, onDragStart, onDragMove, onDragEnd, onResize, onMarquee, snapDrawn },
  };
}

export type BoardEditor = ReturnType<typeof useBoardEditor>;
