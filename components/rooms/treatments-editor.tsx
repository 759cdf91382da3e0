"use client";

import Link from "next/link";
import type { RoomFields } from "@/lib/schemas/room";
import type { BuildUpView } from "@/lib/services/build-ups";
import type { CheckInput } from "@/lib/rooms/check-input";
import { netArea, type Surface } from "@/lib/rooms/geometry";
import { panelAreaForRoom } from "@/lib/rooms/panel-area";
import type { PanelAlpha } from "@/lib/room-model";
import { formatArea, type UnitPreference } from "@/lib/units";
import { AreaField } from "@/components/ui/area-field";
import { Sheet } from "@/components/ui/sheet";

type Props = {
  draft: RoomFields;
  onChange: (d: RoomFields) => void;
  surfaces: Surface[];
  buildUps: BuildUpView[];
  panels: Map<string, PanelAlpha>;
  checkInput: CheckInput | null;
  units: UnitPreference;
  fieldError: (f: string) => string | undefined;
  /** false: shown to someone who may not edit the room, without add and remove actions */
  editable: boolean;
};

// Treatment counted by area, until panels are placed one by one on the elevation board.
export function TreatmentsEditor({ draft, onChange, surfaces, buildUps, panels, checkInput, units, fieldError, editable }: Props) {
  const set = (treatments: RoomFields["treatments"]) => onChange({ ...draft, treatments });
  const byKey = new Map(surfaces.map((s) => [s.key, s]));
  return (
    <Sheet title="Treatment by area">
      {buildUps.length === 0 ? (
        <p className="text-sm text-ink-soft">
          The project has no build-ups yet. Make one on the{" "}
          <Link className="text-copper-deep underline" href="../build-ups">
            Build-ups
          </Link>{" "}
          page first.
        </p>
      ) : (
        <>
          <table className="w-full text-xs" data-testid="treatments">
            <thead>
              <tr className="border-b border-ink/30 text-left text-[11px] text-ink-soft">
                <th className="py-1.5 pr-2 font-semibold">Surface</th>
                <th className="py-1.5 pr-2 font-semibold">Build-up</th>
                <th className="py-1.5 pr-2 font-semibold">Panel area</th>
                <th className="py-1.5 pr-2 font-semibold">To close the shortfall</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {draft.treatments.map((t, i) => {
                const patch = (p: Partial<typeof t>) => set(draft.treatments.map((x, j) => (j === i ? { ...x, ...p } : x)));
                const panel = panels.get(t.buildUpId);
                const others = checkInput ? { ...checkInput, treatments: checkInput.treatments.filter((_, j) => j !== i) } : null;
                const need = others && panel ? panelAreaForRoom(others, { surface: t.surfaceKey, alpha: panel.alpha }, (m2) => formatArea(m2, units)) : null;
                const surface = byKey.get(t.surfaceKey);
                return (
                  <tr key={i} className="border-b border-ink/10 align-top" data-treatment={i}>
                    <td className="py-1.5 pr-2">
                      <select aria-label="Treated surface" value={t.surfaceKey} onChange={(e) => patch({ surfaceKey: e.target.value })} className="w-full min-w-[10.5rem] rounded-sheet border border-paper-edge bg-white/70 px-1 py-1">
                        {surfaces.map((s) => (
                          <option key={s.key} value={s.key}>
                            {s.name}
                          </option>
                        ))}
                      </select>
                      {surface && <p className="figures mt-0.5 text-[10px] text-ink-faint">{formatArea(netArea(surface), units)} free of openings</p>}
                      {fieldError(`treatments.${i}.surfaceKey`) && <p className="text-[11px] text-fault">{fieldError(`treatments.${i}.surfaceKey`)}</p>}
                    </td>
                    <td className="py-1.5 pr-2">
                      <select aria-label="Build-up" value={t.buildUpId} onChange={(e) => patch({ buildUpId: e.target.value })} className="w-full min-w-[12rem] rounded-sheet border border-paper-edge bg-white/70 px-1 py-1">
                        {buildUps.map((b) => (
                          <option key={b.id} value={b.id}>
                            {b.name}
                          </option>
                        ))}
                      </select>
                    </td>
                    <td className="py-1.5 pr-2">
                      <AreaField label="Panel area" m2={t.area} units={units} onChange={(area) => patch({ area })} error={fieldError(`treatments.${i}.area`)} />
                    </td>
                    <td className="py-1.5 pr-2 text-[11px] text-ink-soft" data-testid={`need-${i}`}>
                      {need?.ok ? (
                        <>
                          <span className="figures font-semibold text-ink">{need.need.area === null ? "cannot" : formatArea(need.need.area, units)}</span>
                          <span className="block">{need.need.sentence}</span>
                          {editable && need.need.area !== null && need.need.fits && Math.abs(need.need.area - t.area) > 0.05 && (
                            <button type="button" className="mt-0.5 text-copper-deep hover:underline" onClick={() => patch({ area: Math.ceil(need.need.area! * 10) / 10 })}>
                              Use this area
                            </button>
                          )}
                        </>
                      ) : (
                        "—"
                      )}
                    </td>
                    <td className="py-1.5 text-right">
                      {editable && (
                        <button type="button" className="text-fault hover:underline" onClick={() => set(draft.treatments.filter((_, j) => j !== i))}>
                          Remove<span className="sr-only"> treated area {i + 1}</span>
                        </button>
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          {editable && (
            <button
              type="button"
              className="mt-3 text-sm text-copper-deep hover:underline"
              onClick={() => set([...draft.treatments, { surfaceKey: surfaces[0]?.key ?? "", buildUpId: buildUps[0].id, area: 5 }])}
            >
              + Add treated area
            </button>
          )}
          {!editable && draft.treatments.length === 0 && <p className="mt-3 text-sm text-ink-soft">No treatment entered by area.</p>}
        </>
      )}
    </Sheet>
  );
}
