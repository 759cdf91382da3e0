"use client";

import type { RoomFields } from "@/lib/schemas/room";
import { ROOM_USES, ROOM_USE_WORDS, type RoomUse } from "@/lib/room-uses";
import { FOOT, toCelsius, toFahrenheit, type UnitPreference } from "@/lib/units";
import { SelectField, TextField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { NumberField } from "@/components/ui/number-field";
import { Sheet } from "@/components/ui/sheet";
import { TARGET_OPTIONS, targetFromValue, targetValue } from "./target-options";

type Props = { draft: RoomFields; onChange: (d: RoomFields) => void; units: UnitPreference; fieldError: (f: string) => string | undefined };

const OCTAVES = ["125", "250", "500", "1000", "2000", "4000"];

export function RoomFieldsEditor({ draft, onChange, units, fieldError }: Props) {
  const set = (patch: Partial<RoomFields>) => onChange({ ...draft, ...patch });
  const metric = units === "metric";
  return (
    <Sheet title="Room">
      <div className="@container flex flex-col gap-4">
        <TextField label="Name" name="room-name" value={draft.name} onChange={(e) => set({ name: e.target.value })} error={fieldError("name")} />
        <SelectField label="Use" name="use" value={draft.use} onChange={(e) => set({ use: e.target.value as RoomUse })} options={ROOM_USES.map((u) => ({ value: u, label: ROOM_USE_WORDS[u] }))} />
        <SelectField label="Target" name="target" value={targetValue(draft.target)} onChange={(e) => set({ target: targetFromValue(e.target.value, draft.target) })} options={TARGET_OPTIONS} error={fieldError("target")} />
        {draft.target?.kind === "manual" && (
          <div className="grid grid-cols-3 gap-2">
            {OCTAVES.map((f) => (
              <NumberField
                key={f}
                label={`${Number(f) >= 1000 ? `${Number(f) / 1000} k` : `${f} `}Hz`}
                what={`reverberation time at ${f} Hz`}
                unit="s"
                name={`target-${f}`}
                decimals={2}
                value={(draft.target as { seconds: Record<string, number> }).seconds[f] ?? Number.NaN}
                onChange={(v) => {
                  const seconds = { ...(draft.target as { seconds: Record<string, number> }).seconds, [f]: v };
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
          <div className="grid grid-cols-1 gap-3 @sm:grid-cols-2 @lg:grid-cols-3">
            <MeasureField label="Length" metres={draft.length ?? 0} units={units} small={false} onChange={(v) => set({ length: v })} error={fieldError("length")} testId="room-length" />
            <MeasureField label="Width" metres={draft.width ?? 0} units={units} small={false} onChange={(v) => set({ width: v })} error={fieldError("width")} testId="room-width" />
            <MeasureField label="Height" metres={draft.height ?? 0} units={units} small={false} onChange={(v) => set({ height: v })} error={fieldError("height")} testId="room-height" />
          </div>
        ) : (
          <NumberField
            label="Volume"
            what="volume"
            unit={metric ? "m³" : "ft³"}
            name="volume"
            decimals={metric ? 1 : 0}
            value={draft.volume ?? Number.NaN}
            convert={metric ? undefined : { toShown: (v) => v / FOOT ** 3, fromShown: (v) => v * FOOT ** 3 }}
            onChange={(volume) => set({ volume })}
            error={fieldError("volume")}
            testId="room-volume"
          />
        )}
        <div className="grid grid-cols-2 gap-3">
          <NumberField
            label="Air temperature"
            what="air temperature"
            unit={metric ? "°C" : "°F"}
            name="temperature"
            decimals={1}
            negative
            value={draft.temperature}
            convert={metric ? undefined : { toShown: toFahrenheit, fromShown: toCelsius }}
            onChange={(temperature) => set({ temperature })}
            error={fieldError("temperature")}
            testId="room-temperature"
          />
          <NumberField label="Relative humidity" what="relative humidity" unit="%" name="humidity" decimals={1} value={draft.humidity} onChange={(humidity) => set({ humidity })} error={fieldError("humidity")} testId="room-humidity" />
        </div>
      </div>
    </Sheet>
  );
}
