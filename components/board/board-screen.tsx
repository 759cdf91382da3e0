"use client";

import dynamic from "next/dynamic";
import { useCallback, useId, useMemo, useRef, useState } from "react";
import type { BoardView } from "@/lib/services/boards";
import type { RoomView } from "@/lib/services/rooms";
import type { MaterialView } from "@/lib/services/materials";
import type { BuildUpView } from "@/lib/services/build-ups";
import type { BoardSurface } from "@/lib/board/types";
import { checkRules, rulesByPlacement, type RuleBreak } from "@/lib/board/rules";
import { boundsOf } from "@/lib/board/rect";
import { updatePlacement } from "@/lib/board/edits";
import { hitTest } from "@/lib/board/selection";
import { panelsHighOnWall } from "@/lib/board/high-panels";
import { issuesOfPanel } from "@/lib/board/refusal";
import { checkAnnouncement, rulesAnnouncement, selectionAnnouncement, surfaceDescription } from "@/lib/board/announce";
import { panBy, zoomAt } from "@/lib/board/view";
import { fetchBoard, usePinActions } from "@/lib/queries/boards";
import type { UnitPreference } from "@/lib/units";
import { Sheet } from "@/components/ui/sheet";
import { SaveNotices } from "@/components/ui/save-notices";
import type { CanvasMode } from "./board-canvas";
import { Announcer } from "./board-announcer";
import { BoardTitle } from "./board-title";
import { FireFlags, InstallCaution, SaveRefusal } from "./board-notices";
import { LiveCheck } from "./live-check";
import { PinComposer } from "./pin-composer";
import { PinsPanel } from "./pins-panel";
import { RulesList } from "./rules-list";
import { SelectionPanel } from "./selection-panel";
import { Toolbar } from "./toolbar";
import { DrawingPanel, useDrawingImage } from "./drawing-panel";
import { useBoardEditor } from "./use-board-editor";
import { useBoardKeys } from "./use-board-keys";
import { useBoardSave } from "./use-board-save";
import { useBoardView } from "./use-board-view";
import { useLiveCheck } from "./use-live-check";

const BoardCanvas = dynamic(() => import("./board-canvas"), { ssr: false, loading: () => <div className="h-full w-full animate-pulse bg-paper-deep" /> });

type May = { edit: boolean; pin: boolean; resolve: boolean; drawing: boolean };
type Props = { initial: BoardView; room: RoomView; materials: MaterialView[]; buildUps: BuildUpView[]; units: UnitPreference; may: May; focusPin: number | null };

// The elevation board of one surface: the canvas in the middle, tools on the left, the
// selected panel, the rules it breaks, the live check and the pins on the right.
export function BoardScreen({ initial, room, materials, buildUps, units, may, focusPin }: Props) {
  const id = useId();
  const [board, setBoard] = useState(initial);
  const [mode, setMode] = useState<CanvasMode>("select");
  const [pinFocus, setPinFocus] = useState<number | null>(focusPin);
  const [draftPin, setDraftPin] = useState<{ x: number; y: number } | null>(null);
  const [scalePoints, setScalePoints] = useState<{ x: number; y: number }[]>([]);
  const surface = useMemo(() => room.surfaces.find((s) => s.key === initial.surfaceKey)!, [room.surfaces, initial.surfaceKey]);
  const boardSurface: BoardSurface = useMemo(
    () => ({ width: surface.width, height: surface.height, openings: surface.openings.map((o, i) => ({ ...o, id: `o${i}`, name: o.name || undefined })) }),
    [surface],
  );
  const bv = useBoardView(surface);
  const save = useBoardSave(initial, initial.version, may.edit);
  const editor = useBoardEditor({ initial, board, surface: boardSurface, scale: bv.view.scale, schedule: save.schedule });
  const { placements, shown, selected, setSelected } = editor;
  const drawing = useDrawingImage(board.drawing?.url ?? null);
  const pinActions = usePinActions(initial, async () => setBoard(await fetchBoard(initial)));
  const canvasRef = bv.ref;
  const onBoardKey = useBoardKeys(editor, {
    editable: may.edit,
    onEscape: () => {
      setMode("select");
      setDraftPin(null);
    },
  });

  const facings = useMemo(() => new Map(board.buildUps.map((b) => [b.id, b])), [board.buildUps]);
  const breaks = useMemo(() => checkRules(boardSurface, shown, { clearance: board.clearance }), [boardSurface, shown, board.clearance]);
  const breaksBy = useStableBreaks(breaks, editor.live?.id ?? null);
  const { check, account } = useLiveCheck({ room, materials, buildUps, surfaceKey: initial.surfaceKey, surface: boardSurface, placements: shown });

  const selectedList = useMemo(() => placements.filter((p) => selected.has(p.id)), [placements, selected]);
  const setOut = useMemo(() => (selectedList.length ? boundsOf(shownSelection(shown, selected)) : null), [shown, selected, selectedList.length]);
  const high = useMemo(() => panelsHighOnWall(surface.kind, placements), [surface.kind, placements]);
  const openPins = board.pins.filter((p) => !p.resolved).length;
  const installed = useMemo(() => new Set(board.installed?.placementIds ?? []), [board.installed]);
  const onBoard = useMemo(() => new Set(placements.map((p) => p.buildUpId)), [placements]);
  const show = useCallback(
    (ids: string[]) => {
      setSelected(new Set(ids));
      canvasRef.current?.focus({ preventScroll: false });
    },
    [setSelected, canvasRef],
  );

  async function reload() {
    const fresh = await fetchBoard(initial);
    setBoard(fresh);
    editor.replaceAll(fresh);
    save.reset(fresh.version);
  }

  const pinOnSelected = may.pin && selectedList.length === 1 ? selectedList[0] : null;
  const draftOn = draftPin ? placements.find((p) => p.id === hitTest(placements, draftPin)) : undefined;

  return (
    <>
      <BoardTitle room={room} surfaceKey={initial.surfaceKey} surfaceName={surface.name} save={save} panels={placements.length} openPins={openPins} mayEdit={may.edit} />
      <div className="mb-4 flex flex-col gap-3 empty:hidden">
        <InstallCaution kind={surface.kind} high={high} units={units} onShow={show} />
        <FireFlags fire={room.fire} onBoard={onBoard} />
        {board.installed && installed.size > 0 && (
          <p className="text-xs text-ink-soft" data-testid="installed-note">
            <span aria-hidden className="mr-1 inline-block h-2.5 w-2.5 rounded-sm border-2 border-sage bg-sage-soft align-middle" />
            {`${installed.size} ${installed.size === 1 ? "panel is" : "panels are"} marked installed on site (revision ${board.installed.letter}), shown in green with a tick.`}
          </p>
        )}
        {save.state === "conflict" ? (
          <SaveNotices what="board" conflict={save.message ?? ""} onReload={reload} error={null} />
        ) : save.failure ? (
          <SaveRefusal failure={save.failure} message={save.message ?? ""} issues={save.issues} onShow={(pid) => show([pid])} />
        ) : null}
      </div>
      <div className="grid gap-5 xl:grid-cols-[220px_1fr_300px]">
        <Toolbar
          mode={mode}
          setMode={setMode}
          may={may}
          buildUps={board.buildUps}
          buildUpId={editor.buildUpId}
          setBuildUpId={editor.setBuildUpId}
          onAdd={() => editor.addPanel()}
          onArray={editor.addArray}
          gridModule={editor.gridModule}
          gridError={save.issues.find((i) => i.field === "gridModule")?.message}
          setGridModule={editor.setGridModule}
          units={units}
          canUndo={editor.canUndo}
          canRedo={editor.canRedo}
          onUndo={editor.undo}
          onRedo={editor.redo}
          onFit={bv.fit}
          onZoom={(f) => bv.moveView((v) => zoomAt(v, f, { x: bv.size.width / 2, y: bv.size.height / 2 }))}
        />
        <div className="min-w-0">
          <div className="relative">
            <div
              ref={canvasRef}
              tabIndex={0}
              role="application"
              aria-roledescription="elevation board"
              aria-label={`Board of ${surface.name}`}
              aria-describedby={`${id}-about ${id}-keys`}
              onKeyDown={onBoardKey}
              onMouseDown={() => canvasRef.current?.focus({ preventScroll: true })}
              className="relative overflow-hidden rounded-sheet border border-ink/30 bg-paper-deep/40 focus-visible:outline-offset-4"
              style={{ height: bv.size.height }}
              data-testid="board-canvas"
            >
              <BoardCanvas
                width={bv.size.width}
                height={bv.size.height}
                view={bv.view}
                units={units}
                surface={boardSurface}
                gridModule={editor.gridModule}
                placements={placements}
                selected={selected}
                setOut={setOut}
                buildUps={facings}
                breaks={breaksBy}
                installed={installed}
                guides={editor.guides}
                pins={board.pins}
                focusPin={pinFocus}
                drawing={drawing && board.drawing ? { image: drawing, ...board.drawing } : null}
                scalePoints={scalePoints}
                mode={mode}
                editable={may.edit}
                {...editor.canvas}
                onDrawn={(rect) => {
                  setMode("select");
                  editor.addPanel(rect);
                }}
                onPinAt={(x, y) => setDraftPin({ x, y })}
                onPinSelect={setPinFocus}
                onScalePick={(x, y) => setScalePoints((pts) => (pts.length >= 2 ? [{ x, y }] : [...pts, { x, y }]))}
                onZoom={(f, px, py) => bv.moveView((v) => zoomAt(v, f, { x: px, y: py }))}
                onPan={(dx, dy) => bv.moveView((v) => panBy(v, dx, dy))}
              />
            </div>
            {draftPin && (
              <PinComposer
                onPanel={draftOn?.code ?? null}
                onCancel={() => setDraftPin(null)}
                onSubmit={async (body) => {
                  const made = await pinActions.create.mutateAsync({ ...draftPin, body }).catch(() => null);
                  if (made) {
                    setDraftPin(null);
                    setMode("select");
                    setPinFocus(made.number);
                  }
                }}
                error={pinActions.create.error}
              />
            )}
          </div>
          <p id={`${id}-about`} className="sr-only">
            {surfaceDescription(surface.name, boardSurface, units)} {placements.length} {placements.length === 1 ? "panel" : "panels"}.
          </p>
          <p id={`${id}-keys`} className="mt-2 text-xs text-ink-soft">
            Click the board or Tab to it, then: Tab steps through the panels; arrows move them 10 mm (Shift: one grid module); Alt+arrows resize; Delete removes; Ctrl+D duplicates; Ctrl+Z / Ctrl+Shift+Z undo and redo; Escape lets go. Wheel to zoom, Alt-drag to pan, drag on bare board to select. A drawn panel snaps to the grid and to whole modules of its build-up.
          </p>
          <Announcer text={selectionAnnouncement(selectedList, units)} delayMs={250} testId="announce-selection" />
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
              issues={selectedList.length === 1 ? issuesOfPanel(save.issues, selectedList[0].id) : {}}
              high={selectedList.length === 1 && high.includes(selectedList[0])}
              onChange={(pid, fields) => editor.change(updatePlacement(placements, pid, fields), "Edit panel")}
              onDelete={editor.removeSelected}
            />
          </Sheet>
          <Sheet title={`Rules (${breaks.length})`}>
            <RulesList breaks={breaks} onPick={show} />
            <Announcer text={editor.live ? "" : rulesAnnouncement(breaks)} testId="announce-rules" />
          </Sheet>
          <Sheet title="Check, live">
            <LiveCheck check={check} account={account} units={units} />
            <Announcer text={editor.live ? "" : checkAnnouncement(check, account, units)} delayMs={900} testId="announce-check" />
          </Sheet>
          <Sheet title={`Pins (${openPins} open)`}>
            {pinOnSelected && !draftPin && (
              <button
                type="button"
                className="mb-3 text-xs font-semibold text-copper-deep hover:underline"
                onClick={() => setDraftPin({ x: pinOnSelected.x + pinOnSelected.width / 2, y: pinOnSelected.y + pinOnSelected.height / 2 })}
              >
                Pin a comment on {pinOnSelected.code ?? "this panel"}
              </button>
            )}
            <PinsPanel pins={board.pins} actions={pinActions} selected={pinFocus} onSelect={setPinFocus} may={may} />
          </Sheet>
        </div>
      </div>
    </>
  );
}

const shownSelection = <T extends { id: string }>(list: readonly T[], ids: ReadonlySet<string>) => list.filter((p) => ids.has(p.id));

// Each panel's list of broken rules stays the same object while its words do not change, so
// the memoised panels that still break the same rules are not redrawn on every frame. While a
// panel is dragged, the other panels keep the marks they had when it started (the list beside
// the board follows every move); they are brought up to date when it is dropped.
function useStableBreaks(breaks: RuleBreak[], dragging: string | null) {
  const previous = useRef(new Map<string, RuleBreak[]>());
  return useMemo(() => {
    const next = rulesByPlacement(breaks);
    for (const [pid, list] of next) {
      const before = previous.current.get(pid);
      if (before && before.length === list.length && before.every((b, i) => b.message === list[i].message)) next.set(pid, before);
    }
    if (dragging) {
      const frozen = new Map(previous.current);
      const mine = next.get(dragging);
      if (mine) frozen.set(dragging, mine);
      else frozen.delete(dragging);
      return frozen;
    }
    previous.current = next;
    return next;
  }, [breaks, dragging]);
}
