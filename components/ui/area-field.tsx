"use client";

import { FOOT, type UnitPreference } from "@/lib/units";
import { NumberField } from "./number-field";

const FT2 = FOOT * FOOT; // m² per ft², exact by definition of the foot

// An area in m² or ft² as the person prefers; stored in m².
export function AreaField({ label, m2, units, onChange, error }: { label: string; m2: number; units: UnitPreference; onChange: (m2: number) => void; error?: string }) {
  return (
    <NumberField
      compact
      live
      label={label}
      what={label.toLowerCase()}
      unit={units === "metric" ? "m²" : "ft²"}
      value={m2}
      onChange={onChange}
      decimals={2}
      convert={units === "metric" ? undefined : { toShown: (v) => v / FT2, fromShown: (v) => v * FT2 }}
      error={error}
    />
  );
}
