"use client";

import { useEffect, useId, useRef, useState } from "react";
import { formatLength, parseLength, type UnitPreference } from "@/lib/units";

type Props = {
  label: string;
  metres: number;
  units: UnitPreference;
  onChange: (metres: number) => void;
  /** slider range in metres; the slider moves in `step` metres */
  range?: { min: number; max: number; step: number };
  error?: string;
  testId?: string;
  /** show millimetres / inches (panel sizes) rather than metres / feet (room sizes) */
  small?: boolean;
  compact?: boolean;
};

// A length typed in the user's units ("19 mm", "3/4 in") with an optional slider. Typing is
// parsed after a short pause; the slider changes the value at once, so the curve follows it.
export function MeasureField({ label, metres, units, onChange, range, error, testId, small = true, compact = false }: Props) {
  const id = useId();
  const [text, setText] = useState(() => formatLength(metres, units, { small }));
  const [parseError, setParseError] = useState<string | null>(null);
  const focused = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  // The pending commit must reach the latest onChange (and so the latest draft), not the one
  // of the render in which the key was pressed, or a quick edit elsewhere would be undone.
  const latest = useRef({ onChange, metres });
  latest.current = { onChange, metres };

  useEffect(() => {
    if (!focused.current) setText(formatLength(metres, units, { small }));
  }, [metres, units]);

  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  function commit(value: string) {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    const parsed = parseLength(value);
    if (!parsed.ok) {
      setParseError(parsed.message);
      return;
    }
    setParseError(null);
    if (parsed.metres !== latest.current.metres) latest.current.onChange(parsed.metres);
  }

  const commitRef = useRef(commit);
  commitRef.current = commit;

  const shown = parseError ?? error;
  return (
    <div className="flex flex-col gap-1" data-testid={testId}>
      <label htmlFor={id} className={compact ? "sr-only" : "text-xs font-semibold uppercase tracking-wider text-ink-soft"}>
        {label}
      </label>
      <input
        id={id}
        value={text}
        aria-invalid={shown ? true : undefined}
        onFocus={() => (focused.current = true)}
        onBlur={() => {
          focused.current = false;
          commit(text);
        }}
        onKeyDown={(e) => {
          // Enter takes the typed length; it does not submit the surrounding form before that.
          if (e.key === "Enter") {
            e.preventDefault();
            commit(text);
          }
        }}
        onChange={(e) => {
          const value = e.target.value;
          setText(value);
          if (timer.current) clearTimeout(timer.current);
          timer.current = setTimeout(() => commitRef.current(value), 150);
        }}
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
            setParseError(null);
            onChange(Number(e.target.value));
          }}
          className="w-full"
        />
      )}
      {shown && (
        <p role="alert" className="text-xs font-medium text-fault">
          {shown}
        </p>
      )}
    </div>
  );
}
