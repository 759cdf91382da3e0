"use client";

import { useEffect, useRef, useState, type ChangeEvent, type KeyboardEvent } from "react";
import { decideCommit, type Parsed } from "@/lib/forms/typed-field";
import { useReportRefusal } from "./refusals";

type Options<T> = {
  label: string;
  value: T;
  format: (value: T) => string;
  parse: (text: string) => Parsed<T>;
  onCommit: (value: T) => void;
  /** commit a good value after a short pause in typing too, so a live result follows it */
  live?: boolean;
};

// The text of a typed field and when it commits (lib/forms/typed-field.ts decides): on leaving
// the field, on Enter, and, for a live field, after a pause in typing. Escape returns to the
// stored value. A refusal is shown at the field and reported to the form.
export function useTypedField<T>({ label, value, format, parse, onCommit, live = false }: Options<T>) {
  const shown = format(value);
  const [text, setText] = useState(shown);
  const [refusal, setRefusal] = useState<string | null>(null);
  const report = useReportRefusal(label);
  const edited = useRef(false);
  const focused = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  // A pending commit must reach the latest onCommit and value, not those of the render in
  // which the key was pressed, or a quick edit elsewhere would be undone.
  const latest = useRef({ value, shown, format, parse, onCommit });
  latest.current = { value, shown, format, parse, onCommit };

  // A new stored value (a reload, a slider, the canvas) replaces the text unless the person
  // is typing in the field.
  useEffect(() => {
    if (focused.current) return;
    setText(shown);
    edited.current = false;
    setRefusal(null);
    report(null);
  }, [shown, report]);

  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  function settle(current: string, final: boolean) {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    const l = latest.current;
    const decision = decideCommit({ text: current, shown: l.shown, edited: edited.current, current: l.value, parse: l.parse, format: l.format });
    if (decision.kind === "refuse") {
      if (final) {
        setRefusal(decision.message);
        report(decision.message);
      }
      return;
    }
    setRefusal(null);
    report(null);
    if (final) {
      edited.current = false;
      setText(decision.kind === "commit" ? decision.text : l.shown);
    }
    if (decision.kind === "commit") l.onCommit(decision.value);
  }

  return {
    refusal,
    /** forget the refusal when the value was set another way (a slider) */
    clearRefusal() {
      edited.current = false;
      setRefusal(null);
      report(null);
    },
    inputProps: {
      value: text,
      onFocus: () => void (focused.current = true),
      onBlur: () => {
        focused.current = false;
        settle(text, true);
      },
      onKeyDown: (e: KeyboardEvent<HTMLInputElement>) => {
        // Enter takes the typed value; it does not submit the surrounding form before that.
        if (e.key === "Enter") {
          e.preventDefault();
          settle(text, true);
        } else if (e.key === "Escape" && edited.current) {
          e.preventDefault();
          edited.current = false;
          setText(latest.current.shown);
          setRefusal(null);
          report(null);
        }
      },
      onChange: (e: ChangeEvent<HTMLInputElement>) => {
        const next = e.target.value;
        setText(next);
        edited.current = true;
        if (!live) return;
        if (timer.current) clearTimeout(timer.current);
        timer.current = setTimeout(() => settle(next, false), 150);
      },
    },
  };
}
