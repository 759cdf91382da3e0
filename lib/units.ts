import { fraction as mathFraction, isUnit, number, unit, type Unit } from "mathjs";

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
  const normalised = text.replace(/(\d)\s*'/g, "$1 ft ").replace(/(\d)\s*"/g, "$1 in ").trim();
  // A length is one or more terms, each a number (decimal, fraction or mixed "10 1/2") and a
  // unit; "12 ft 6 in" adds its terms (mathjs alone would multiply them into an area).
  const TERM = /(\d+(?:\.\d+)?(?:\s+\d+\s*\/\s*\d+)?|\d+\s*\/\s*\d+|\.\d+)\s*([a-zA-Z]+)\s*(?:\+\s*)?/gy;
  let total = 0;
  let consumed = 0;
  for (const m of normalised.matchAll(TERM)) {
    if (m.index !== consumed) break;
    consumed = m.index + m[0].length;
    let term: unknown;
    try {
      term = unit(numberOf(m[1]), m[2]);
    } catch {
      return { ok: false, message: `"${raw}" uses a unit Cavitas does not know ("${m[2]}"). Use mm, cm, m, in or ft.` };
    }
    if (!isUnit(term) || !(term as Unit).equalBase(unit(1, "m"))) {
      return { ok: false, message: `"${raw}" is not a length. Use mm, cm, m, in or ft.` };
    }
    total += (term as Unit).toNumber("m");
  }
  if (consumed === 0 || consumed !== normalised.length) {
    return { ok: false, message: `"${raw}" is not a length Cavitas understands. Try 19 mm, 0.6 m, 3/4 in or 12 ft 6 in.` };
  }
  const metres = total;
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

// "10 1/2", "3/4", "2.5" → a plain number (mathjs fractions keep "1/3" exact until here).
function numberOf(text: string): number {
  const parts = text.trim().split(/\s+/);
  return parts.reduce((sum, p) => sum + (p.includes("/") ? number(mathFraction(p.replace(/\s/g, ""))) : Number(p)), 0);
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
