import { evaluate, isUnit, type Unit } from "mathjs";

// Lengths are stored in metres; people type and read them in their own units.
// Parsing goes through mathjs units, so "19 mm", "3/4 in", "12 ft 6 in", "2' 6\"" all work.

export type UnitPreference = "metric" | "imperial";
export type ParseResult = { ok: true; metres: number } | { ok: false; message: string };

const ALLOWED = /^[0-9.,/+\sa-zA-Z'"]+$/;

export function parseLength(raw: string): ParseResult {
  const text = raw.trim();
  if (!text) return { ok: false, message: "Enter a length with its unit, for example 19 mm or 3/4 in." };
  if (!ALLOWED.test(text)) return { ok: false, message: `"${raw}" is not a length. Use a number and a unit, for example 2.4 m or 8 ft.` };
  if (/\d,\d/.test(text)) return { ok: false, message: `"${raw}" is ambiguous: write decimals with a point, for example 2.4 m.` };
  if (/^[\d.\s/]+$/.test(text)) return { ok: false, message: `"${raw}" has no unit. Add one, for example ${text} mm or ${text} in.` };
  const expr = text
    .replace(/(\d)\s*'/g, "$1 ft ")
    .replace(/(\d)\s*"/g, "$1 in ")
    // "12 ft 6 in" and "2 1/2 in": consecutive terms add up (mathjs would multiply them).
    .replace(/([a-zA-Z])\s+(?=\d)/g, "$1 + ")
    .replace(/(\d)\s+(?=\d+\s*\/\s*\d)/g, "$1 + ")
    .trim();
  let value: unknown;
  try {
    value = evaluate(expr);
  } catch {
    return { ok: false, message: `"${raw}" is not a length Cavitas understands. Try 19 mm, 0.6 m, 3/4 in or 12 ft 6 in.` };
  }
  if (!isUnit(value) || !(value as Unit).equalBase(evaluate("1 m") as Unit)) {
    return { ok: false, message: `"${raw}" is not a length. Use mm, cm, m, in or ft.` };
  }
  const metres = (value as Unit).toNumber("m");
  if (!Number.isFinite(metres)) return { ok: false, message: `"${raw}" is not a finite length.` };
  return { ok: true, metres };
}

const INCH = 0.0254;

export function formatLength(metres: number, pref: UnitPreference, opts: { small?: boolean } = {}): string {
  if (pref === "metric") {
    if (opts.small || Math.abs(metres) < 1) return `${trim(metres * 1000, 1)} mm`;
    return `${trim(metres, 2)} m`;
  }
  const totalEighths = Math.round((Math.abs(metres) / INCH) * 8);
  const sign = metres < 0 ? "−" : "";
  const feet = Math.floor(totalEighths / 96);
  const restEighths = totalEighths - feet * 96;
  const inches = Math.floor(restEighths / 8);
  const frac = fraction(restEighths - inches * 8);
  const inchText = `${inches}${frac ? ` ${frac}` : ""} in`;
  if (opts.small || feet === 0) return `${sign}${inches === 0 && frac ? frac + " in" : inchText}`;
  return `${sign}${feet} ft ${inchText}`;
}

export function formatArea(m2: number, pref: UnitPreference): string {
  return pref === "metric" ? `${trim(m2, 1)} m²` : `${trim(m2 / (0.3048 * 0.3048), 0)} ft²`;
}

export function formatVolume(m3: number, pref: UnitPreference): string {
  return pref === "metric" ? `${trim(m3, 0)} m³` : `${trim(m3 / 0.3048 ** 3, 0)} ft³`;
}

function fraction(eighths: number): string {
  if (eighths === 0) return "";
  const g = gcd(eighths, 8);
  return `${eighths / g}/${8 / g}`;
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

function trim(n: number, decimals: number): string {
  return Number(n.toFixed(decimals)).toLocaleString("en-GB", { maximumFractionDigits: decimals });
}
