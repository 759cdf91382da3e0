"use client";

import dynamic from "next/dynamic";
import Link from "next/link";
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import type { BoardView } from "@/lib/services/boards";
import type { RoomView } from "@/lib/services/rooms";
import type { MaterialView } from "@/lib/services/materials";
import type { BuildUpView } from "@/lib/services/build-ups";
import type { Placement, Rect } from "@/lib/board/types";
import { checkRules, rulesByPlacement, type RuleBreak } from "@/lib/board/rules";
import { buildSnapIndex, type SnapIndex } from "@/lib/board/snap-index";
import { snapMove, snapResize, type SnapGuide } from "@/lib/board/snap";
import { resizeRect, type ResizeHandle } from "@/lib/board/resize";
import { begin, cancel, canRedo, canUndo, commit, createHistory, push, redo, undo, type History } from "@/lib/board/history";
import { addPlacements, moveBy, removePlacements, updatePlacement } from "@/lib/board/edits";
import { boundsOf } from "@/lib/board/rect";
import { duplicate, makeArray } from "@/lib/board/arrays";
import { nextCode, nextCodes } from "@/lib/board/labels";
import { cycleSelection, marqueeSelect, nudge } from "@/lib/board/selection";
import { fitToView, panBy, zoomAt, type View } from "@/lib/board/view";
import { treatedArea } from "@/lib/board/treated-area";
import { runCheck, surfacesFor, type PanelAlpha } from "@/lib/room-model";
import { octaveAlphaFromBands } from "@/lib/rooms/octaves";
import { fetchBoard, usePinActions } from "@/lib/queries/boards";
import type { UnitPreference } from "@/lib/units";
import { Sheet, TitleBlock } from "@/components/ui/sheet";
import { SaveNotices } from "@/components/ui/save-notices";
import { Notice } from "@/components/ui/notice";
import type { CanvasMode } from "./board-canvas";
import { LiveCheck } from "./live-check";
import { PinsPanel } from "./pins-panel";
import { RulesList } from "./rules-list";
import { SelectionPanel } from "./selection-panel";
import { Toolbar } from "./toolbar";
import { DrawingPanel, useDrawingImage } from "./drawing-panel";
import { useBoardSave } from "./use-board-save";

const BoardCanvas = dynamic(() => import("./board-canvas"), { ssr: false, loading: () => <div className="h-full w-full animate-pulse bg-paper-deep" /> });

type May = { edit: boolean; pin: boolean; resolve: boolean; drawing: boolean };
type Props = { initial: BoardView; room: RoomView; materials: MaterialView[]; buildUps: BuildUpView[]; units: UnitPreference; may: May; focusPin: number | null };

const CANVAS_HEIGHT = 600;
/** the smallest panel the server accepts (lib/schemas/board.ts) */
const MIN_PANEL = 0.02;
const toPlacements = (b: BoardView): Placement[] => b.placements.map((p) => ({ ...p }));

declare global {
  interface Window {
    __cavitasBoard?: { lastDragAt: number; checkAt: number; frames: number };
  }
}

// The elevation board of one surface: the canvas in the middle, tools on the left, the
// selected panel, the rules it breaks, the live check and the pins on the right.
export function BoardScreen({ initial, room, materials, buildUps, units, may, focusPin }: Props) {
  const [board, setBoard] = useState(initial);
  const [history, setHistory] = useState<History<readonly Placement[]>>(() => createHistory<readonly Placement[]>(toPlacements(initial)));
  const placements = history.present.state;
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [mode, setMode] = useState<CanvasMode>("select");
  const [gridModule, setGridModule] = useState(initial.gridModule);
  const [guides, setGuides] = useState<SnapGuide[]>([]);
  const [live, setLive] = useState<{ id: string; rect: Rect } | null>(null);
  const [pinFocus, setPinFocus] = useState<number | null>(focusPin);
  const [draftPin, setDraftPin] = useState<{ x: number; y: number } | null>(null);
  const [scalePoints, setScalePoints] = useState<{ x: number; y: number }[]>([]);
  const [buildUpId, setBuildUpId] = useState(buildUps[0]?.id ?? "");
  const wrap = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 900, height: CANVAS_HEIGHT });
  const surface = useMemo(() => room.surfaces.find((s) => s.key === initial.surfaceKey)!, [room.surfaces, initial.surfaceKey]);
  const [view, setView] = useState<View>(() => fitToView(surface, size, 48));
  const save = useBoardSave(initial, initial.version, may.edit);
  const schedule = save.schedule;
  const snapIndex = useRef<SnapIndex | null>(null);
  const dragStart = useRef<Rect | null>(null);
  const drawing = useDrawingImage(board.drawing?.url ?? null);
  const pinActions = usePinActions(initial, async () => setBoard(await fetchBoard(initial)));

  const boardSurface = useMemo(
    () => ({ width: surface.width, height: surface.height, openings: surface.openings.map((o, i) => ({ ...o, id: `o${i}`, name: o.name || undefined })) }),
    [surface],
  );
  const facings = useMemo(() => new Map(board.buildUps.map((b) => [b.id, b])), [board.buildUps]);
  const codes = useMemo(() => new Map(placements.map((p) => [p.id, p.code ?? ""])), [placements]);

  useLayoutEffect(() => {
    const el = wrap.current;
    if (!el) return;
    const measure = () => setSize({ width: el.clientWidth, height: CANVAS_HEIGHT });
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  // Fit the surface to the canvas until the person zooms or pans themselves.
  const userMoved = useRef(false);
  useEffect(() => {
    if (!userMoved.current && size.width > 0) setView(fitToView(surface, size, 48));
  }, [size, surface]);
  const moveView = useCallback((f: (v: View) => View) => {
    userMoved.current = true;
    setView(f);
  }, []);

  // What the check and the rules see: the placements, with the one being dragged at its live spot.
  const shown = useMemo(() => (live ? placements.map((p) => (p.id === live.id ? { ...p, ...live.rect } : p)) : placements), [placements, live]);
  const breaks = useMemo(() => checkRules(boardSurface, shown, { clearance: board.clearance }), [boardSurface, shown, board.clearance]);
  // Keep each panel's list of broken rules the same object while its words do not change, so
  // the memoised panels that still break the same rules are not redrawn on every frame.
  // While a panel is dragged, the other panels keep the marks they had when it started (the
  // list beside the board follows every move); they are brought up to date when it is dropped.
  const previousBreaks = useRef(new Map<string, RuleBreak[]>());
  const breaksBy = useMemo(() => {
    const next = rulesByPlacement(breaks);
    for (const [id, list] of next) {
      const before = previousBreaks.current.get(id);
      if (before && before.length === list.length && before.every((b, i) => b.message === list[i].message)) next.set(id, before);
    }
    if (live) {
      const frozen = new Map(previousBreaks.current);
      const mine = next.get(live.id);
      if (mine) frozen.set(live.id, mine);
      else frozen.delete(live.id);
      return frozen;
    }
    previousBreaks.current = next;
    return next;
  }, [breaks, live]);

  // The live check: the build-ups' band values are computed once; each frame only re-sums the room.
  const panels = useMemo(() => new Map<string, PanelAlpha>(buildUps.map((b) => [b.id, { name: b.name, alpha: octaveAlphaFromBands(b.result.octaves) }])), [buildUps]);
  const lookup = useMemo(() => {
    const byKey = new Map(materials.map((m) => [m.key, m.alpha]));
    return (key: string) => byKey.get(key);
  }, [materials]);
  const roomFields = useMemo(() => ({ ...room, surfaces: room.surfaces.map(({ grossArea: _g, netArea: _n, ...s }) => s) }), [room]);
  const roomSurfaces = useMemo(() => surfacesFor(roomFields), [roomFields]);
  const otherBoards = useMemo(() => room.placed.filter((l) => l.surfaceKey !== initial.surfaceKey), [room.placed, initial.surfaceKey]);
  const check = useMemo(() => {
    const mine = treatedArea([{ surfaceKey: initial.surfaceKey, surface: boardSurface, placements: shown }]);
    return runCheck({ fields: roomFields, surfaces: roomSurfaces, treatments: [...room.treatments, ...otherBoards, ...mine], panels, lookup }).check;
  }, [shown, boardSurface, roomFields, roomSurfaces, room.treatments, otherBoards, panels, lookup, initial.surfaceKey]);
  useLayoutEffect(() => {
    if (typeof window !== "undefined") {
      const stats = (window.__cavitasBoard ??= { lastDragAt: 0, checkAt: 0, frames: 0 });
      stats.checkAt = performance.now();
    }
  }, [check]);

  const change = useCallback(
    (next: readonly Placement[], label: string) => {
      setHistory((h) => push(h, next, label));
      schedule(next, gridModule);
    },
    [schedule, gridModule],
  );

  // --- canvas callbacks ---------------------------------------------------------------
  // Stable callbacks: every panel is memoised on its props, and a new function would redraw all.
  const onSelect = useCallback((ids: string[], additive: boolean) => setSelected((cur) => (additive ? new Set([...cur, ...ids]) : new Set(ids))), []);
  const tolerance = 8 / view.scale;
  // A drag moves the selection (or the panel alone); it snaps the selection's outline, against
  // everything that is not moving with it.
  const dragGroup = useRef<{ dx: number; dy: number; width: number; height: number } | null>(null);
  const onDragStart = useCallback(
    (id: string) => {
      const moving = selected.has(id) ? selected : new Set([id]);
      snapIndex.current = buildSnapIndex(boardSurface, placements, { exclude: moving });
      const p = placements.find((x) => x.id === id)!;
      const bounds = boundsOf(placements.filter((x) => moving.has(x.id)))!;
      dragGroup.current = { dx: p.x - bounds.x, dy: p.y - bounds.y, width: bounds.width, height: bounds.height };
      dragStart.current = { x: p.x, y: p.y, width: p.width, height: p.height };
      if (!selected.has(id)) setSelected(new Set([id]));
      setHistory((h) => begin(h));
    },
    [placements, boardSurface, selected],
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
      const stats = (window.__cavitasBoard ??= { lastDragAt: 0, checkAt: 0, frames: 0 });
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
      const dx = snapped.x - start.x;
      const dy = snapped.y - start.y;
      const ids = selected.has(id) ? selected : new Set([id]);
      const next = moveBy(placements, ids, dx, dy);
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
      if (resizeIndex.current?.id !== id) resizeIndex.current = { id, index: buildSnapIndex(boardSurface, placements, { exclude: new Set([id]) }) };
      const raw = resizeRect(p, handle, dx, dy, MIN_PANEL);
      const rect = snapResize(raw, handle, resizeIndex.current.index, { tolerance, module: gridModule, minSize: MIN_PANEL }).rect;
      if (done) {
        resizeIndex.current = null;
        setLive(null);
        change(updatePlacement(placements, id, rect), `Resize ${p.code}`);
      } else setLive({ id, rect });
      return rect;
    },
    [placements, boardSurface, tolerance, gridModule, change],
  );

  function addPanel(rect?: Rect) {
    const b = board.buildUps.find((x) => x.id === buildUpId);
    if (!b) return;
    const r = rect ?? { x: board.clearance, y: board.clearance, width: b.moduleWidth, height: b.moduleHeight };
    const made: Placement = { id: crypto.randomUUID(), buildUpId, code: nextCode(placements.map((p) => p.code)), ...r };
    change(addPlacements(placements, [made]), `Add ${made.code}`);
    setSelected(new Set([made.id]));
  }

  function addArray(spec: { columns: number; rows: number; gapX: number; gapY: number }) {
    const b = board.buildUps.find((x) => x.id === buildUpId);
    if (!b) return;
    const anchor = placements.find((p) => selected.has(p.id));
    const origin = anchor ? { x: anchor.x, y: anchor.y } : { x: board.clearance, y: board.clearance };
    const rects = makeArray({ origin, width: b.moduleWidth, height: b.moduleHeight, ...spec });
    const codesNew = nextCodes(placements.map((p) => p.code), rects.length);
    const made = rects.map((r, i) => ({ id: crypto.randomUUID(), buildUpId, code: codesNew[i], ...r }));
    change(addPlacements(anchor ? removePlacements(placements, new Set([anchor.id])) : placements, made), `Add ${spec.columns} × ${spec.rows} array`);
    setSelected(new Set(made.map((m) => m.id)));
  }

  // --- keyboard ----------------------------------------------------------------------
  useEffect(() => {
    function onKey(e: KeyboardEvent) {
      const target = e.target as HTMLElement;
      if (target.closest("input, textarea, select")) return;
      const mod = e.ctrlKey || e.metaKey;
      if (mod && e.key.toLowerCase() === "z") {
        e.preventDefault();
        setHistory((h) => {
          const next = e.shiftKey ? redo(h) : undo(h);
          save.schedule(next.present.state, gridModule);
          return next;
        });
        return;
      }
      if (mod && e.key.toLowerCase() === "y") {
        e.preventDefault();
        setHistory((h) => {
          const next = redo(h);
          save.schedule(next.present.state, gridModule);
          return next;
        });
        return;
      }
      if (mod && e.key.toLowerCase() === "a") {
        e.preventDefault();
        setSelected(new Set(placements.map((p) => p.id)));
        return;
      }
      if (e.key === "Escape") {
        setSelected(new Set());
        setMode("select");
        setDraftPin(null);
        setHistory((h) => cancel(h));
        return;
      }
      if (e.key === "Tab" && placements.length) {
        e.preventDefault();
        const current = [...selected][0] ?? null;
        const next = cycleSelection(placements, current, e.shiftKey ? -1 : 1);
        setSelected(new Set(next ? [next] : []));
        return;
      }
      if (!may.edit || selected.size === 0) return;
      if (e.key === "Delete" || e.key === "Backspace") {
        e.preventDefault();
        change(removePlacements(placements, selected), `Delete ${selected.size}`);
        setSelected(new Set());
        return;
      }
      if (mod && e.key.toLowerCase() === "d") {
        e.preventDefault();
        const made = duplicate(placements.filter((p) => selected.has(p.id)), { x: gridModule, y: 0 }, { taken: placements });
        change(addPlacements(placements, made), `Duplicate ${made.length}`);
        setSelected(new Set(made.map((m) => m.id)));
        return;
      }
      if (e.key.startsWith("Arrow")) {
        e.preventDefault();
        const next = nudge(placements, selected, e.key, e.shiftKey, { step: 0.01, largeStep: gridModule });
        change(next, "Nudge");
      }
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [placements, selected, may.edit, change, gridModule, save]);

  async function reload() {
    const fresh = await fetchBoard(initial);
    setBoard(fresh);
    setHistory(createHistory<readonly Placement[]>(toPlacements(fresh)));
    setSelected(new Set());
    save.reset(fresh.version);
  }

  const selectedList = placements.filter((p) => selected.has(p.id));
  const surfaceLinks = room.surfaces.map((s) => ({ key: s.key, name: s.name }));
  const openPins = board.pins.filter((p) => !p.resolved).length;

  return (
    <>
      <TitleBlock
        kicker={`Board · ${room.name}`}
        title={surface.name}
        meta={
          <span className="flex flex-wrap items-center gap-3">
            <span data-testid="board-save-state">
              {save.state === "saved" && `saved, version ${save.version}`}
              {save.state === "pending" && "changes waiting to be saved"}
              {save.state === "saving" && "saving…"}
              {save.state === "conflict" && "not saved: someone else changed this board"}
              {save.state === "error" && "not saved yet"}
            </span>
            <span>· {placements.length} {placements.length === 1 ? "panel" : "panels"}</span>
            <span>· {openPins} open {openPins === 1 ? "pin" : "pins"}</span>
            {!may.edit && <span>· you may pin, not move panels</span>}
          </span>
        }
        actions={
          <nav className="flex flex-wrap gap-1 text-xs" aria-label="Surfaces">
            {surfaceLinks.map((l) => (
              <Link
                key={l.key}
                href={`/projects/${room.projectId}/rooms/${room.id}/board/${l.key}`}
                className={`rounded-sheet border px-2 py-1 ${l.key === initial.surfaceKey ? "border-copper bg-copper-soft/40 text-ink" : "border-ink/20 text-ink-soft hover:text-ink"}`}
              >
                {l.name}
              </Link>
            ))}
          </nav>
        }
      />
      {surface.kind === "ceiling" && (
        <div className="mb-4">
          <Notice tone="caution" title="Overhead panels">
            Panels on a ceiling need fixings rated for their weight and, where required, seismic restraint, designed by a competent person. Follow the manufacturer&apos;s instructions and the governing code.
          </Notice>
        </div>
      )}
      <SaveNotices
        what="board"
        conflict={save.state === "conflict" ? (save.message ?? "") : null}
        onReload={reload}
        error={save.state === "error" && save.message ? { message: save.message, issues: [] } : null}
      />
      <div className="grid gap-5 xl:grid-cols-[220px_1fr_300px]">
        <Toolbar
          mode={mode}
          setMode={setMode}
          may={may}
          buildUps={board.buildUps}
          buildUpId={buildUpId}
          setBuildUpId={setBuildUpId}
          onAdd={() => addPanel()}
          onArray={addArray}
          gridModule={gridModule}
          setGridModule={(m) => {
            setGridModule(m);
            save.schedule(placements, m);
          }}
          units={units}
          canUndo={canUndo(history)}
          canRedo={canRedo(history)}
          onUndo={() => setHistory((h) => (save.schedule(undo(h).present.state, gridModule), undo(h)))}
          onRedo={() => setHistory((h) => (save.schedule(redo(h).present.state, gridModule), redo(h)))}
          onFit={() => {
            userMoved.current = false;
            setView(fitToView(surface, size, 48));
          }}
          onZoom={(f) => moveView((v) => zoomAt(v, f, { x: size.width / 2, y: size.height / 2 }))}
        />
        <div className="min-w-0">
          <div ref={wrap} className="relative overflow-hidden rounded-sheet border border-ink/30 bg-paper-deep/40" style={{ height: CANVAS_HEIGHT }} data-testid="board-canvas">
            <BoardCanvas
              width={size.width}
              height={size.height}
              view={view}
              surface={boardSurface}
              gridModule={gridModule}
              placements={placements}
              selected={selected}
              buildUps={facings}
              breaks={breaksBy}
              guides={guides}
              pins={board.pins}
              focusPin={pinFocus}
              drawing={drawing && board.drawing ? { image: drawing, ...board.drawing } : null}
              scalePoints={scalePoints}
              mode={mode}
              editable={may.edit}
              onSelect={onSelect}
              onDragStart={onDragStart}
              onDragMove={onDragMove}
              onDragEnd={onDragEnd}
              onResize={onResize}
              onDrawn={(rect) => {
                setMode("select");
                addPanel(rect);
              }}
              onPinAt={(x, y) => setDraftPin({ x, y })}
              onPinSelect={setPinFocus}
              onScalePick={(x, y) => setScalePoints((pts) => (pts.length >= 2 ? [{ x, y }] : [...pts, { x, y }]))}
              onZoom={(f, px, py) => moveView((v) => zoomAt(v, f, { x: px, y: py }))}
              onPan={(dx, dy) => moveView((v) => panBy(v, dx, dy))}
              onMarquee={(rect, additive) => {
                const hit = marqueeSelect(placements, rect);
                setSelected((cur) => (additive ? new Set([...cur, ...hit]) : hit));
              }}
            />
            {draftPin && (
              <PinComposer
                onCancel={() => setDraftPin(null)}
                onSubmit={async (body) => {
                  const made = await pinActions.create.mutateAsync({ ...draftPin, body }).catch(() => null);
                  if (made) {
                    setDraftPin(null);
                    setMode("select");
                    setPinFocus(made.number);
                  }
                }}
                error={pinActions.create.error?.message ?? null}
              />
            )}
          </div>
          <p className="mt-2 text-[11px] text-ink-faint">
            Wheel to zoom, Alt-drag or middle button to pan, drag on empty board to select. Arrows nudge 10 mm (Shift: one grid module); Delete removes; Ctrl+D duplicates; Ctrl+Z / Ctrl+Shift+Z undo and redo; Tab steps through panels.
          </p>
          {may.drawing && (
            <div className="mt-4">
              <DrawingPanel board={board} scalePoints={scalePoints} setScalePoints={setScalePoints} mode={mode} setMode={setMode} units={units} onChanged={setBoard} surfaceWidth={surface.width} />
            </div>
          )}
        </div>
        <div className="flex flex-col gap-5">
          <Sheet title="Selection">
            <SelectionPanel
              selected={selectedList}
              units={units}
              editable={may.edit}
              buildUps={board.buildUps}
              onChange={(id, fields) => change(updatePlacement(placements, id, fields), "Edit panel")}
              onDelete={() => {
                change(removePlacements(placements, selected), `Delete ${selected.size}`);
                setSelected(new Set());
              }}
            />
          </Sheet>
          <Sheet title={`Rules (${breaks.length})`}>
            <RulesList breaks={breaks} onPick={(ids) => setSelected(new Set(ids))} />
          </Sheet>
          <Sheet title="Check, live">
            <LiveCheck check={check} />
          </Sheet>
          <Sheet title={`Pins (${openPins} open)`}>
            <PinsPanel pins={board.pins} actions={pinActions} selected={pinFocus} onSelect={setPinFocus} may={may} />
          </Sheet>
        </div>
      </div>
    </>
  );
}

function PinComposer({ onSubmit, onCancel, error }: { onSubmit: (body: string) => void; onCancel: () => void; error: string | null }) {
  const [body, setBody] = useState("");
  return (
    <form
      className="absolute bottom-3 left-3 right-3 flex flex-col gap-2 rounded-sheet border border-copper bg-paper p-3 shadow"
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit(body);
      }}
    >
      <label htmlFor="pin-body" className="text-xs font-semibold uppercase tracking-wider text-ink-soft">
        Comment at this point
      </label>
      <textarea id="pin-body" autoFocus rows={2} value={body} onChange={(e) => setBody(e.target.value)} className="rounded-sheet border border-paper-edge bg-white/80 px-2 py-1 text-sm" />
      {error && <p className="text-xs text-fault">{error}</p>}
      <div className="flex gap-3 text-sm">
        <button type="submit" className="font-semibold text-copper-deep hover:underline">
          Place pin
        </button>
        <button type="button" className="text-ink-soft hover:underline" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
