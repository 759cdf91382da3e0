"use client";

import { useId } from "react";
import { decimal, parseDecimal } from "@/lib/units";
import { FIELD_LABEL, FieldNote } from "./field";
import { useTypedField } from "./use-typed-field";

type Props = {
  label: string;
  /** the quantity in words, for messages ("air temperature") */
  what: string;
  /** the unit the field shows and accepts after the number ("°C", "m²") */
  unit?: string;
  /** the stored value */
  value: number;
  onChange: (value: number) => void;
  /** places shown; the stored value changes only when the person types */
  decimals: number;
  /** stored → shown, and back (°C ↔ °F, m² ↔ ft²) */
  convert?: { toShown: (v: number) => number; fromShown: (v: number) => number };
  negative?: boolean;
  error?: string;
  name?: string;
  testId?: string;
  /** a narrow field whose label is read by assistive technology only, the unit beside it */
  compact?: boolean;
  /** commit after a pause in typing, so a live result follows */
  live?: boolean;
};

// A plain number typed in a field (an area, a temperature, a time). Like MeasureField, it
// commits only what the person typed, and its text is exactly what parseDecimal reads back.
export function NumberField({ label, what, unit, value, onChange, decimals, convert, negative = false, error, name, testId, compact = false, live = false }: Props) {
  const id = useId();
  const toShown = convert?.toShown ?? ((v: number) => v);
  const fromShown = convert?.fromShown ?? ((v: number) => v);
  const field = useTypedField<number>({
    label,
    value,
    live,
    format: (v) => (Number.isFinite(v) ? decimal(toShown(v), decimals) : ""),
    parse: (text) => {
      const r = parseDecimal(text, { what, unit, negative });
      return r.ok ? { ok: true, value: fromShown(r.value) } : r;
    },
    onCommit: onChange,
  });
  const shown = field.refusal ?? error;
  const input = (
    <input
      id={id}
      name={name}
      {...field.inputProps}
      inputMode="decimal"
      autoComplete="off"
      aria-invalid={shown ? true : undefined}
      aria-describedby={shown ? `${id}-error` : undefined}
      className={`figures min-w-0 rounded-sheet border bg-white/70 focus:border-copper focus:outline-none ${compact ? "w-24 px-2 py-1 text-right text-xs" : "w-full px-3 py-2 text-sm"} ${shown ? "border-fault" : "border-paper-edge"}`}
    />
  );
  return (
    <div className={`flex flex-col ${compact ? "gap-0.5" : "gap-1"}`} data-testid={testId}>
      <label htmlFor={id} className={compact ? "sr-only" : FIELD_LABEL}>
        {label}
        {unit && !compact ? ` (${unit})` : ""}
      </label>
      {compact ? (
        <div className="flex items-center gap-1">
          {input}
          {unit && <span className="text-xs text-ink-faint">{unit}</span>}
        </div>
      ) : (
        input
      )}
      <FieldNote id={id} error={shown} small={compact} />
    </div>
  );
}
