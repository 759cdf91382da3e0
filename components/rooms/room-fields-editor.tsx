"use client";

import type { RoomFields } from "@/lib/schemas/room";
import { ROOM_USES, ROOM_USE_WORDS, type RoomUse } from "@/lib/room-uses";
import type { UnitPreference } from "@/lib/units";
import { SelectField, TextField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { Sheet } from "@/components/ui/sheet";
import { TARGET_OPTIONS, targetFromValue, targetValue } from "./target-options";

type Props = { draft: RoomFields; onChange: (d: RoomFields) => void; units: UnitPreference; fieldError: (f: string) => string | undefined };

const OCTAVES = ["125", "250", "500", "1000", "2000", "4000"];

export function RoomFieldsEditor({ draft, onChange, units, fieldError }: Props) {
  const set = (patch: Partial<RoomFields>) => onChange({ ...draft, ...patch });
  const toCelsius = (v: number) => (units === "metric" ? v : ((v - 32) * 5) / 9);
  const fromCelsius = (c: number) => (units === "metric" ? c : (c * 9) / 5 + 32);
  return (
    <Sheet title="Room">
      <div className="flex flex-col gap-4">
        <TextField label="Name" name="room-name" value={draft.name} onChange={(e) => set({ name: e.target.value })} error={fieldError("name")} />
        <SelectField label="Use" name="use" value={draft.use} onChange={(e) => set({ use: e.target.value as RoomUse })} options={ROOM_USES.map((u) => ({ value: u, label: ROOM_USE_WORDS[u] }))} />
        <SelectField label="Target" name="target" value={targetValue(draft.target)} onChange={(e) => set({ target: targetFromValue(e.target.value, draft.target) })} options={TARGET_OPTIONS} error={fieldError("target")} />
        {draft.target?.kind === "manual" && (
          <div className="grid grid-cols-3 gap-2">
            {OCTAVES.map((f) => (
              <TextField
                key={f}
                label={`${Number(f) >= 1000 ? `${Number(f) / 1000} k` : f} Hz, s`}
                name={`target-${f}`}
                inputMode="decimal"
                value={String((draft.target as { seconds: Record<string, number> }).seconds[f] ?? "")}
                onChange={(e) => {
                  const seconds = { ...(draft.target as { seconds: Record<string, number> }).seconds, [f]: Number(e.target.value) };
                  set({ target: { kind: "manual", seconds } });
                }}
                error={fieldError(`target.seconds.${f}`)}
              />
            ))}
          </div>
        )}
        <SelectField
          label="Shape"
          name="shape"
          value={draft.shape}
          onChange={(e) => {
            const shape = e.target.value as RoomFields["shape"];
            // Switching to a free room keeps the shoebox's surfaces as the starting list.
            set(shape === "free" ? { shape, volume: (draft.length ?? 0) * (draft.width ?? 0) * (draft.height ?? 0) || draft.volume } : { shape });
          }}
          options={[
            { value: "shoebox", label: "Shoebox: length × width × height" },
            { value: "free", label: "Volume and a list of surfaces" },
          ]}
        />
        {draft.shape === "shoebox" ? (
          <div className="grid grid-cols-3 gap-3">
            <MeasureField label="Length" metres={draft.length ?? 0} units={units} small={false} onChange={(v) => set({ length: v })} error={fieldError("length")} testId="room-length" />
            <MeasureField label="Width" metres={draft.width ?? 0} units={units} small={false} onChange={(v) => set({ width: v })} error={fieldError("width")} testId="room-width" />
            <MeasureField label="Height" metres={draft.height ?? 0} units={units} small={false} onChange={(v) => set({ height: v })} error={fieldError("height")} testId="room-height" />
          </div>
        ) : (
          <TextField
            label={units === "metric" ? "Volume (m³)" : "Volume (ft³)"}
            name="volume"
            inputMode="decimal"
            value={String(Number(((draft.volume ?? 0) / (units === "metric" ? 1 : 0.3048 ** 3)).toFixed(1)))}
            onChange={(e) => set({ volume: Number(e.target.value) * (units === "metric" ? 1 : 0.3048 ** 3) })}
            error={fieldError("volume")}
          />
        )}
        <div className="grid grid-cols-2 gap-3">
          <TextField
            label={units === "metric" ? "Air temperature (°C)" : "Air temperature (°F)"}
            name="temperature"
            inputMode="decimal"
            value={String(Number(fromCelsius(draft.temperature).toFixed(1)))}
            onChange={(e) => set({ temperature: toCelsius(Number(e.target.value)) })}
            error={fieldError("temperature")}
          />
          <TextField label="Relative humidity (%)" name="humidity" inputMode="decimal" value={String(draft.humidity)} onChange={(e) => set({ humidity: Number(e.target.value) })} error={fieldError("humidity")} />
        </div>
      </div>
    </Sheet>
  );
}
