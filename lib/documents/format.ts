/**
 * How documents write numbers: lengths through lib/units.ts in the reader's preference (metric by
 * default), everything else in fixed, locale-free forms so that one snapshot always prints the
 * same text. Dates are UTC, written out in full, never in the server's time zone.
 */
import type { FireStatus } from "@/lib/fire";
import { octaveName } from "@/lib/rooms/octaves";
import { formatArea, formatLength, formatVolume, type UnitPreference } from "@/lib/units";
import type { ChangeValue, ChangeValueKind } from "@/lib/submittals/changes";

export type { UnitPreference };

const MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** One formatted text per value: a drawing repeats a few lengths hundreds of times, and locale formatting is slow. */
function remembered(format: (x: number) => string): (x: number) => string {
  const seen = new Map<number, string>();
  return (x) => {
    let text = seen.get(x);
    if (text === undefined) seen.set(x, (text = format(x)));
    return text;
  };
}

export function formatters(units: UnitPreference = "metric") {
  const len = remembered((m) => formatLength(m, units));
  /** Hole, slot, pitch, plate and border sizes at the precision a fabricator works to. */
  const fine = remembered((m) => formatLength(m, units, { scale: "fine" }));
  /** Panel sizes and set-outs read off a drawing: mm, or feet and inches to 1/16 in. */
  const panel = remembered((m) => formatLength(m, units, { scale: "panel" }));
  const area = remembered((m2) => formatArea(m2, units));
  return {
    units,
    len,
    fine,
    panel,
    area,
    volume: (m3: number) => formatVolume(m3, units),
    size: (w: number, h: number) => `${panel(w)} × ${panel(h)}`,
    seconds: (s: number | null | undefined) => (s === null || s === undefined ? "–" : `${s.toFixed(2)} s`),
    hz: (f: number) => `${f >= 1000 ? (f / 1000).toFixed(2) + " kHz" : f.toFixed(0) + " Hz"}`,
    octave: octaveName,
    alpha: (a: number) => a.toFixed(2),
    percent: (ratio: number) => `${(ratio * 100).toFixed(2)} %`,
    flow: (r: number) => `${Math.round(r).toLocaleString("en-GB")} Pa·s/m²`,
    count: (n: number) => n.toLocaleString("en-GB"),
  };
}

export type Formatters = ReturnType<typeof formatters>;

/** "2 March 2026, 10:15 UTC" from an ISO 8601 instant. */
export function formatInstant(iso: string): string {
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}, ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())} UTC`;
}

/** "2 March 2026" */
export function formatDay(iso: string): string {
  const d = new Date(iso);
  return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

/** A value of the change list in the reader's units. */
export function formatChange(value: ChangeValue, kind: ChangeValueKind, f: Formatters): string {
  if (value === null || value === "") return "none";
  if (typeof value !== "number") return String(value);
  switch (kind) {
    case "length":
      return f.fine(value);
    case "area":
      return f.area(value);
    case "volume":
      return f.volume(value);
    case "hz":
      return f.hz(value);
    case "alpha":
      return f.alpha(value);
    case "ratio":
      return f.percent(value);
    case "flow":
      return f.flow(value);
    case "celsius":
      return `${value} °C`;
    case "percent":
      return `${value} %`;
    default:
      return f.count(value);
  }
}

export const FIRE_STATUS_WORDS: Record<FireStatus, string> = {
  meets: "meets",
  lower: "lower than required",
  missing: "no class declared",
  "not-comparable": "not comparable",
  unreadable: "cannot be read",
  "no-requirement": "no class required",
};

export const STANDING_WORDS: Record<string, string> = {
  within: "within",
  over: "too long",
  under: "too short",
  "no target": "no target",
  "no data": "no data",
};

/** The first 12 hex digits, for footers; documents print the whole hash where it is cited. */
export const shortHash = (hash: string) => hash.slice(0, 12);
