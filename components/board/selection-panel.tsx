"use client";

import type { Placement, Rect } from "@/lib/board/types";
import type { BoardView } from "@/lib/services/boards";
import { boundsOf } from "@/lib/board/rect";
import { formatArea, formatLength, type UnitPreference } from "@/lib/units";
import { MeasureField } from "@/components/ui/measure-field";

type Props = {
  selected: Placement[];
  units: UnitPreference;
  editable: boolean;
  buildUps: BoardView["buildUps"];
  /** the server's refusal of this panel's fields, by field name */
  issues: Record<string, string>;
  /** its top is high on a wall (lib/board/high-panels.ts) */
  high: boolean;
  onChange: (id: string, fields: Partial<Rect & Pick<Placement, "buildUpId" | "code">>) => void;
  onDelete: () => void;
};

// Exact set-out: the selected panel's position from the surface's lower-left datum and its size.
export function SelectionPanel({ selected, units, editable, buildUps, issues, high, onChange, onDelete }: Props) {
  if (selected.length === 0) return <p className="text-xs text-ink-faint">Click a panel, or drag a box around several.</p>;
  if (selected.length > 1) {
    const b = boundsOf(selected)!;
    const area = selected.reduce((a, p) => a + p.width * p.height, 0);
    return (
      <div className="text-xs" data-testid="selection-many">
        <p className="font-medium">{selected.length} panels</p>
        <p className="figures mt-1 text-ink-soft">
          from {formatLength(b.x, units, { scale: "panel" })}, {formatLength(b.y, units, { scale: "panel" })}; {formatLength(b.width, units, { scale: "panel" })} × {formatLength(b.height, units, { scale: "panel" })} overall; {formatArea(area, units)}
        </p>
        {editable && (
          <button type="button" className="mt-2 text-fault hover:underline" onClick={onDelete}>
            Delete {selected.length} panels
          </button>
        )}
      </div>
    );
  }
  const p = selected[0];
  return (
    <fieldset disabled={!editable} className="flex flex-col gap-3" data-testid="selection-one">
      <div className="flex items-center justify-between">
        <input aria-label="Panel code" value={p.code ?? ""} onChange={(e) => onChange(p.id, { code: e.target.value })} className="figures w-24 rounded-sheet border border-paper-edge bg-white/70 px-2 py-1 text-sm font-semibold" />
        <span className="figures text-xs text-ink-faint">{formatArea(p.width * p.height, units)}</span>
      </div>
      <select aria-label="Panel build-up" value={p.buildUpId} onChange={(e) => onChange(p.id, { buildUpId: e.target.value })} className="rounded-sheet border border-paper-edge bg-white/70 px-2 py-1 text-xs">
        {buildUps.map((b) => (
          <option key={b.id} value={b.id}>
            {b.name}
          </option>
        ))}
      </select>
      {/* Feet and inches ("3 ft 11 1/4 in") need the panel's full width. */}
      <div className={`grid gap-2 ${units === "imperial" ? "grid-cols-1" : "grid-cols-2"}`}>
        <MeasureField label="From the left" metres={p.x} units={units} small={false} onChange={(x) => onChange(p.id, { x })} testId="panel-x" error={issues.x} />
        <MeasureField label="Above the datum" metres={p.y} units={units} small={false} onChange={(y) => onChange(p.id, { y })} testId="panel-y" error={issues.y} />
        <MeasureField label="Width" metres={p.width} units={units} onChange={(width) => onChange(p.id, { width })} testId="panel-width" error={issues.width} />
        <MeasureField label="Height" metres={p.height} units={units} onChange={(height) => onChange(p.id, { height })} testId="panel-height" error={issues.height} />
      </div>
      {(issues.code || issues.buildUpId) && (
        <p role="alert" className="text-xs font-medium text-fault">
          {issues.code ?? issues.buildUpId}
        </p>
      )}
      {high && (
        <p className="rounded-sheet border-l-4 border-caution bg-caution-soft px-2 py-1.5 text-xs text-ink" data-testid="selection-high">
          Its top is {formatLength(p.y + p.height, units)} above the floor: a panel this high needs fixings rated for its load, designed by a competent person, and safe work at height to fit.
        </p>
      )}
      {editable && (
        <button type="button" className="self-start text-xs text-fault hover:underline" onClick={onDelete}>
          Delete panel
        </button>
      )}
    </fieldset>
  );
}
