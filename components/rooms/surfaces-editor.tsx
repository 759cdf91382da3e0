"use client";

import type { RoomFields } from "@/lib/schemas/room";
import type { MaterialView } from "@/lib/services/materials";
import { grossArea, netArea, OPENING_KINDS, type Surface } from "@/lib/rooms/geometry";
import { formatArea, formatLength, type UnitPreference } from "@/lib/units";
import { FIELD_LABEL } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { Sheet } from "@/components/ui/sheet";
import { MaterialSelect } from "./material-select";

type Props = {
  draft: RoomFields;
  onChange: (d: RoomFields) => void;
  surfaces: Surface[];
  materials: MaterialView[];
  units: UnitPreference;
  fieldError: (f: string) => string | undefined;
  /** false: shown to someone who may not edit the room, without add and remove actions */
  editable: boolean;
};

const OPENING_WORDS: Record<string, string> = { door: "Door", window: "Window", glazing: "Glazing", vent: "Vent", other: "Other" };
const DEFAULT_OPENING_MATERIAL: Record<string, string> = { door: "timber-door", window: "window-glass", glazing: "glass-large-pane", vent: "open-opening", other: "open-opening" };

export function SurfacesEditor({ draft, onChange, surfaces, materials, units, fieldError, editable }: Props) {
  // The editor works on the derived list (a shoebox's six surfaces follow its dimensions) and
  // writes the person's choices back by key.
  const write = (next: Surface[]) => onChange({ ...draft, surfaces: next.map((s) => ({ ...s, openings: s.openings.map((o) => ({ ...o, name: o.name ?? "" })) })) });
  const update = (i: number, patch: Partial<Surface>) => write(surfaces.map((s, j) => (j === i ? { ...s, ...patch } : s)));
  const free = draft.shape === "free";

  return (
    <Sheet title="Surfaces and finishes" aside={<span className="figures text-xs text-ink-faint">{formatArea(surfaces.reduce((a, s) => a + grossArea(s), 0), units)} in all</span>}>
      <div className="@container flex flex-col divide-y divide-ink/10" data-testid="surfaces">
        {surfaces.map((s, i) => (
          <div key={s.key} className="py-3" data-surface={s.key}>
            <div className="grid items-start gap-3 md:grid-cols-[1.2fr_1.4fr_1.6fr]">
              <div>
                {free ? (
                  <input
                    aria-label="Surface name"
                    value={s.name}
                    onChange={(e) => update(i, { name: e.target.value })}
                    className="w-full rounded-sheet border border-paper-edge bg-white/70 px-2 py-1 text-sm"
                  />
                ) : (
                  <p className="text-sm font-medium">{s.name}</p>
                )}
                <p className="figures text-[11px] text-ink-faint">
                  net {formatArea(netArea(s), units)}
                  {s.openings.length > 0 && ` of ${formatArea(grossArea(s), units)}`}
                </p>
              </div>
              {free ? (
                <div className="grid grid-cols-2 gap-2">
                  <MeasureField compact label={`${s.name} width`} metres={s.width} units={units} small={false} onChange={(v) => update(i, { width: v })} error={fieldError(`surfaces.${i}.width`)} />
                  <MeasureField compact label={`${s.name} height`} metres={s.height} units={units} small={false} onChange={(v) => update(i, { height: v })} error={fieldError(`surfaces.${i}.height`)} />
                </div>
              ) : (
                <p className="figures pt-1 text-xs text-ink-soft">
                  {formatLength(s.width, units)} × {formatLength(s.height, units)}
                </p>
              )}
              <MaterialSelect id={`finish-${s.key}`} label={`Finish of ${s.name}`} value={s.finish} materials={materials} onChange={(finish) => update(i, { finish })} error={fieldError(`surfaces.${i}.finish`)} />
            </div>
            {s.openings.map((o, j) => {
              const setOpening = (patch: Partial<typeof o>) => update(i, { openings: s.openings.map((x, k) => (k === j ? { ...x, ...patch } : x)) });
              const f = (name: string) => fieldError(`surfaces.${i}.openings.${j}.${name}`);
              const kindId = `opening-kind-${s.key}-${j}`;
              return (
                <fieldset key={j} className="mt-2 rounded-sheet bg-paper-deep/50 p-2" data-opening={`${s.key}-${j}`}>
                  <legend className="sr-only">
                    {OPENING_WORDS[o.kind]} {j + 1} on {s.name}
                  </legend>
                  <div className="flex flex-wrap items-end gap-2">
                    <div className="flex w-28 flex-col gap-1">
                      <label htmlFor={kindId} className={FIELD_LABEL}>
                        Kind
                      </label>
                      <select id={kindId} value={o.kind} onChange={(e) => setOpening({ kind: e.target.value as typeof o.kind, material: DEFAULT_OPENING_MATERIAL[e.target.value] })} className="rounded-sheet border border-paper-edge bg-white/70 px-1 py-1.5 text-sm">
                        {OPENING_KINDS.map((k) => (
                          <option key={k} value={k}>
                            {OPENING_WORDS[k]}
                          </option>
                        ))}
                      </select>
                    </div>
                    <div className="min-w-[14rem] flex-1">
                      <MaterialSelect id={`opening-${s.key}-${j}`} label="Material" showLabel value={o.material} materials={materials} onChange={(material) => setOpening({ material })} error={f("material")} />
                    </div>
                    {editable && (
                      <button type="button" className="px-1 py-1.5 text-xs text-fault hover:underline" onClick={() => update(i, { openings: s.openings.filter((_, k) => k !== j) })}>
                        Remove<span className="sr-only"> {OPENING_WORDS[o.kind].toLowerCase()} {j + 1}</span>
                      </button>
                    )}
                  </div>
                  {/* Sizes and set-out on a line of their own: feet and inches need the room. */}
                  <div className="mt-2 grid grid-cols-2 items-start gap-2 @xl:grid-cols-4">
                    <MeasureField label="Width" metres={o.width} units={units} scale="room" onChange={(v) => setOpening({ width: v })} error={f("width")} />
                    <MeasureField label="Height" metres={o.height} units={units} scale="room" onChange={(v) => setOpening({ height: v })} error={f("height")} />
                    <MeasureField label="From the left" metres={o.x} units={units} scale="room" onChange={(v) => setOpening({ x: v })} error={f("x")} />
                    <MeasureField label="Above the floor" metres={o.y} units={units} scale="room" onChange={(v) => setOpening({ y: v })} error={f("y")} />
                  </div>
                  {fieldError(`surfaces.${i}.openings.${j}`) && <p className="mt-1 text-[11px] font-medium text-fault">{fieldError(`surfaces.${i}.openings.${j}`)}</p>}
                </fieldset>
              );
            })}
            {editable && (
              <button
                type="button"
                className="mt-1 text-xs text-copper-deep hover:underline"
                onClick={() => update(i, { openings: [...s.openings, { kind: "door", name: "", width: Math.min(0.9, s.width), height: Math.min(2.1, s.height), x: 0.2 * s.width, y: 0, material: "timber-door" }] })}
              >
                + Add an opening<span className="sr-only"> to {s.name}</span>
              </button>
            )}
          </div>
        ))}
      </div>
      {free && editable && (
        <button
          type="button"
          className="mt-3 text-sm text-copper-deep hover:underline"
          onClick={() => write([...surfaces, { key: `s-${Date.now().toString(36)}`, name: `Surface ${surfaces.length + 1}`, kind: "wall", width: 3, height: 3, finish: "plaster-on-masonry", openings: [] }])}
        >
          + Add a surface
        </button>
      )}
      {fieldError("surfaces") && <p className="mt-2 text-xs text-fault">{fieldError("surfaces")}</p>}
    </Sheet>
  );
}
