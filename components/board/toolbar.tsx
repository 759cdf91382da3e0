"use client";

import { useState } from "react";
import type { BoardView } from "@/lib/services/boards";
import type { UnitPreference } from "@/lib/units";
import { MeasureField } from "@/components/ui/measure-field";
import type { CanvasMode } from "./board-canvas";

type Props = {
  mode: CanvasMode;
  setMode: (m: CanvasMode) => void;
  may: { edit: boolean; pin: boolean };
  buildUps: BoardView["buildUps"];
  buildUpId: string;
  setBuildUpId: (id: string) => void;
  onAdd: () => void;
  onArray: (spec: { columns: number; rows: number; gapX: number; gapY: number }) => void;
  gridModule: number;
  /** the server's refusal of the grid module */
  gridError?: string;
  setGridModule: (m: number) => void;
  units: UnitPreference;
  canUndo: boolean;
  canRedo: boolean;
  onUndo: () => void;
  onRedo: () => void;
  onFit: () => void;
  onZoom: (factor: number) => void;
};

function ModeButton({ active, onClick, children, testId, disabled }: { active?: boolean; onClick: () => void; children: React.ReactNode; testId?: string; disabled?: boolean }) {
  return (
    <button
      type="button"
      data-testid={testId}
      aria-pressed={active}
      onClick={onClick}
      disabled={disabled}
      className={`rounded-sheet border px-2 py-1.5 text-xs disabled:cursor-default disabled:opacity-50 ${active ? "border-copper bg-copper-soft/50 font-semibold" : "border-ink/25 bg-white/60 enabled:hover:bg-white"}`}
    >
      {children}
    </button>
  );
}

export function Toolbar(p: Props) {
  const [array, setArray] = useState({ columns: 4, rows: 3, gapX: 0.025, gapY: 0.025 });
  return (
    <div className="flex flex-col gap-4 text-xs">
      <div className="grid grid-cols-2 gap-1.5">
        <ModeButton active={p.mode === "select"} onClick={() => p.setMode("select")}>
          Select
        </ModeButton>
        {p.may.edit && (
          <ModeButton active={p.mode === "draw"} onClick={() => p.setMode("draw")} testId="mode-draw">
            Draw panel
          </ModeButton>
        )}
        {p.may.pin && (
          <ModeButton active={p.mode === "pin"} onClick={() => p.setMode("pin")} testId="mode-pin">
            Pin
          </ModeButton>
        )}
      </div>
      {p.may.edit && (
        <div className="flex flex-col gap-2 border-t border-ink/15 pt-3">
          <label htmlFor="board-build-up" className="font-semibold uppercase tracking-wider text-ink-soft">
            Build-up
          </label>
          <select id="board-build-up" value={p.buildUpId} onChange={(e) => p.setBuildUpId(e.target.value)} className="rounded-sheet border border-paper-edge bg-white/70 px-2 py-1">
            {p.buildUps.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name}
              </option>
            ))}
          </select>
          <button type="button" onClick={p.onAdd} className="rounded-sheet bg-ink px-2 py-1.5 font-medium text-paper hover:bg-ink-soft" disabled={!p.buildUpId}>
            Add a panel
          </button>
          <div className="mt-2 grid grid-cols-2 gap-2">
            <label className="flex flex-col gap-1">
              <span className="text-ink-soft">Columns</span>
              <input aria-label="Columns" type="number" min={1} max={60} value={array.columns} onChange={(e) => setArray({ ...array, columns: Math.max(1, Number(e.target.value)) })} className="rounded-sheet border border-paper-edge bg-white/70 px-2 py-1" />
            </label>
            <label className="flex flex-col gap-1">
              <span className="text-ink-soft">Rows</span>
              <input aria-label="Rows" type="number" min={1} max={60} value={array.rows} onChange={(e) => setArray({ ...array, rows: Math.max(1, Number(e.target.value)) })} className="rounded-sheet border border-paper-edge bg-white/70 px-2 py-1" />
            </label>
            <MeasureField label="Gap across" metres={array.gapX} units={p.units} onChange={(gapX) => setArray({ ...array, gapX })} />
            <MeasureField label="Gap up" metres={array.gapY} units={p.units} onChange={(gapY) => setArray({ ...array, gapY })} />
          </div>
          <button type="button" onClick={() => p.onArray(array)} className="rounded-sheet border border-ink/40 px-2 py-1.5 hover:bg-white" disabled={!p.buildUpId}>
            Add array {array.columns} × {array.rows}
          </button>
          <p className="text-[11px] text-ink-faint">An array starts at the selected panel, or at the clearance from the datum.</p>
        </div>
      )}
      <div className="flex flex-col gap-2 border-t border-ink/15 pt-3">
        <MeasureField label="Grid module" metres={p.gridModule} units={p.units} onChange={p.setGridModule} error={p.gridError} />
        <div className="grid grid-cols-3 gap-1">
          <ModeButton onClick={() => p.onZoom(1.25)}>
            Zoom +
          </ModeButton>
          <ModeButton onClick={() => p.onZoom(0.8)}>
            Zoom −
          </ModeButton>
          <ModeButton onClick={p.onFit}>
            Fit
          </ModeButton>
        </div>
        {p.may.edit && (
          <div className="grid grid-cols-2 gap-1">
            <ModeButton onClick={p.onUndo} disabled={!p.canUndo}>
              Undo
            </ModeButton>
            <ModeButton onClick={p.onRedo} disabled={!p.canRedo}>
              Redo
            </ModeButton>
          </div>
        )}
      </div>
    </div>
  );
}
