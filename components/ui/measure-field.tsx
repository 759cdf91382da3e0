"use client";

import { useId } from "react";
import { formatLength, parseLength, type LengthScale, type UnitPreference } from "@/lib/units";
import { FIELD_LABEL, FieldNote } from "./field";
import { useTypedField } from "./use-typed-field";

type Props = {
  label: string;
  metres: number;
  units: UnitPreference;
  onChange: (metres: number) => void;
  /** slider range in metres; the slider moves in `step` metres */
  range?: { min: number; max: number; step: number };
  error?: string;
  testId?: string;
  /** how finely the length is shown and read (lib/units.ts); "panel" unless given */
  scale?: LengthScale;
  /** false: a room's size (m, or feet and inches), the same as scale "room" */
  small?: boolean;
  /** the label is read by assistive technology only (a column heading shows it) */
  compact?: boolean;
  /** a set-out that may lie left of or below its datum */
  negative?: boolean;
  /** commit after a pause in typing, so a live result follows (on by default with a slider) */
  live?: boolean;
};

// A length typed in the person's units ("19 mm", "3/4 in", "2 ft 6 in") with an optional
// slider. It commits only what the person typed (components/ui/use-typed-field.ts).
export function MeasureField({ label, metres, units, onChange, range, error, testId, scale, small, compact = false, negative = false, live }: Props) {
  const id = useId();
  const resolved: LengthScale = scale ?? (small === false ? "room" : "panel");
  const field = useTypedField<number>({
    label,
    value: metres,
    live: live ?? range !== undefined,
    format: (m) => formatLength(m, units, { scale: resolved }),
    parse: (text) => {
      const r = parseLength(text, { units, negative });
      return r.ok ? { ok: true, value: r.metres } : r;
    },
    onCommit: onChange,
  });
  const shown = field.refusal ?? error;
  return (
    <div className="flex flex-col gap-1" data-testid={testId}>
      <label htmlFor={id} className={compact ? "sr-only" : FIELD_LABEL}>
        {label}
      </label>
      <input
        id={id}
        {...field.inputProps}
        inputMode="text"
        autoComplete="off"
        spellCheck={false}
        aria-invalid={shown ? true : undefined}
        aria-describedby={shown ? `${id}-error` : undefined}
        className={`figures w-full min-w-0 rounded-sheet border bg-white/70 px-2.5 py-1.5 text-sm focus:border-copper focus:outline-none ${shown ? "border-fault" : "border-paper-edge"}`}
      />
      {range && (
        <input
          type="range"
          aria-label={`${label} slider`}
          min={range.min}
          max={range.max}
          step={range.step}
          value={Math.min(range.max, Math.max(range.min, metres))}
          onChange={(e) => {
            field.clearRefusal();
            onChange(Number(e.target.value));
          }}
          className="w-full"
        />
      )}
      <FieldNote id={id} error={shown} />
    </div>
  );
}
