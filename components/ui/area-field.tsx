"use client";

import { useEffect, useState } from "react";
import type { UnitPreference } from "@/lib/units";

const FT2 = 0.09290304; // m² per ft², exact by definition of the foot

// An area in m² or ft² as the user prefers; stored in m².
export function AreaField({ label, m2, units, onChange, error, id }: { label: string; m2: number; units: UnitPreference; onChange: (m2: number) => void; error?: string; id: string }) {
  const toShown = (v: number) => (units === "metric" ? v : v / FT2);
  const [text, setText] = useState(() => String(Number(toShown(m2).toFixed(2))));
  const [local, setLocal] = useState<string | null>(null);
  useEffect(() => setText(String(Number(toShown(m2).toFixed(2)))), [m2, units]); // eslint-disable-line react-hooks/exhaustive-deps
  const shown = local ?? error;
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <div className="flex items-center gap-1">
        <input
          id={id}
          inputMode="decimal"
          value={text}
          aria-invalid={shown ? true : undefined}
          onChange={(e) => {
            setText(e.target.value);
            const n = Number(e.target.value);
            if (e.target.value.trim() === "" || !Number.isFinite(n)) {
              setLocal(`Enter the area in ${units === "metric" ? "m²" : "ft²"} as a number.`);
              return;
            }
            setLocal(null);
            onChange(units === "metric" ? n : n * FT2);
          }}
          className={`figures w-24 rounded-sheet border bg-white/70 px-2 py-1 text-right text-xs ${shown ? "border-fault" : "border-paper-edge"}`}
        />
        <span className="text-xs text-ink-faint">{units === "metric" ? "m²" : "ft²"}</span>
      </div>
      {shown && (
        <p role="alert" className="text-[11px] font-medium text-fault">
          {shown}
        </p>
      )}
    </div>
  );
}
