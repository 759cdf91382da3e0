import { isUnit, unit, type Unit } from "mathjs";

// Lengths are stored in metres; people type and read them in their own units. formatLength and
// parseLength are exact inverses: whatever the formatter prints, the parser reads back to the
// same value within the printed resolution, and printing that again gives the same text. The
// display therefore never uses thousands separators (the parser refuses "1,200 mm" as
// ambiguous) and never rounds a nonzero length to zero.

export type UnitPreference = "metric" | "imperial";
export type ParseResult = { ok: true; metres: number } | { ok: false; message: string };

/**
 * How finely a length is read and written:
 * - "fine": fabrication detail (hole diameter, slot width, plate thickness, pitch): mm to 0.01 mm,
 *   or inches as a fabricator writes them (a fraction to 1/64 in when the value is one, decimal
 *   inches to 0.001 in otherwise);
 * - "panel": a panel's or cavity's size: mm to 0.1 mm, or feet and inches to 1/16 in;
 * - "room": a room's, surface's or opening's size and set-out: m to 1 mm, or feet and inches
 *   to 1/16 in.
 */
export type LengthScale = "fine" | "panel" | "room";
type FormatOptions = { scale?: LengthScale; /** @deprecated use scale: "panel" */ small?: boolean };

// The international inch is exactly 25.4 mm and the foot 12 inches (1959 international yard
// and pound agreement).
export const INCH = 0.0254;
export const FOOT = 12 * INCH;
const MINUS = "\u2212";

/**
 * The printed step for a length (half of it is the most a round trip may move a value), m.
 * Fine imperial detail of a foot or more is printed in feet and inches, to 1/16 in.
 */
export function lengthResolution(metres: number, units: UnitPreference, scale: LengthScale): number {
  if (units === "metric") return scale === "fine" ? 0.01e-3 : scale === "panel" ? 0.1e-3 : 1e-3;
  return scale === "fine" && Math.abs(metres) < FOOT - 0.0005 * INCH ? 0.001 * INCH : INCH / 16;
}

export function formatLength(metres: number, units: UnitPreference, opts: FormatOptions = {}): string {
  const scale: LengthScale = opts.scale ?? (opts.small ? "panel" : "room");
  if (!Number.isFinite(metres)) return "—";
  const sign = metres < 0 ? MINUS : "";
  const size = Math.abs(metres);
  // Past a million kilometres a length is only ever quoted back in a refusal (a fuzzed or
  // mistyped request): whole metres or feet say it plainly, where sixteenths would overflow.
  if (size > 1e9) return sign + (units === "imperial" && Number.isFinite(size / FOOT) ? `${decimal(size / FOOT, 0)} ft` : `${decimal(size, 0)} m`);
  if (units === "metric") {
    return scale === "room" ? `${sign}${decimal(size, 3)} m` : `${sign}${decimal(size * 1000, scale === "fine" ? 2 : 1)} mm`;
  }
  return sign + (scale === "fine" ? fineInches(size / INCH) : feetAndInches(size / INCH));
}

/** A plain decimal, trailing zeros dropped, no separators; more places if rounding would show 0. */
export function decimal(value: number, places: number): string {
  return trimZeros(fixed(value, places));
}

function fixed(value: number, places: number): string {
  let p = places;
  while (value !== 0 && Number(value.toFixed(p)) === 0 && p < 20) p++;
  return value.toFixed(p);
}

const trimZeros = (text: string) => (text.includes(".") ? text.replace(/\.?0+$/, "") : text);

// Feet and inches to 1/16 in: "11 5/8 in" below a foot, "1 ft 11 5/8 in" from a foot up.
function feetAndInches(inches: number): string {
  const sixteenths = Math.round(inches * 16);
  if (sixteenths === 0 && inches > 0) return fineInches(inches);
  const feet = Math.floor(sixteenths / 192);
  const rest = sixteenths - feet * 192;
  return feet === 0 ? `${inchesWithFraction(rest, 16)} in` : `${feet} ft ${inchesWithFraction(rest, 16, true)} in`;
}

// Small dimensions as the trade writes them: 3/16 in when the value is a 64th, else 0.315 in.
function fineInches(inches: number): string {
  const sixtyFourths = Math.round(inches * 64);
  if (sixtyFourths > 0 && Math.abs(inches * 64 - sixtyFourths) < 1e-6) return sixtyFourths >= 768 ? feetAndInches(inches) : `${inchesWithFraction(sixtyFourths, 64)} in`;
  const text = fixed(inches, 3);
  const shown = Number(text);
  if (shown >= 12) return feetAndInches(inches);
  // A decimal that is itself a 64th would read back as one: print it as the fraction.
  if (Number.isInteger(shown * 64) && shown > 0) return `${inchesWithFraction(shown * 64, 64)} in`;
  return `${text} in`;
}

function inchesWithFraction(parts: number, per: number, keepWhole = false): string {
  const whole = Math.floor(parts / per);
  const rest = parts - whole * per;
  if (rest === 0) return String(whole);
  const g = gcd(rest, per);
  const fraction = `${rest / g}/${per / g}`;
  return whole === 0 && !keepWhole ? fraction : `${whole} ${fraction}`;
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

const EXAMPLES: Record<UnitPreference, string> = { metric: "19 mm or 2.4 m", imperial: "3/4 in or 8 ft 6 in" };

type ParseOptions = {
  /** the person's units, for the examples in messages */
  units?: UnitPreference;
  /** accept a leading minus sign (set-out of something left of or below a datum) */
  negative?: boolean;
};

// One number: a decimal (with an optional exponent, "1e3"), a fraction "3/4" or a mixed
// number "10 1/2".
const NUMBER = String.raw`(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?(?:\s+\d+\s*\/\s*\d+)?|\d+\s*\/\s*\d+`;
const TERM = new RegExp(String.raw`(${NUMBER})\s*([a-zA-Z]+)\s*(?:\+\s*)?`, "gy");

export function parseLength(raw: string, opts: ParseOptions = {}): ParseResult {
  const examples = EXAMPLES[opts.units ?? "metric"];
  const quoted = `"${raw.trim()}"`;
  let text = normalise(raw);
  if (!text) return { ok: false, message: `Enter a length with its unit, for example ${examples}.` };
  let sign = 1;
  const signed = /^([+-])\s*/.exec(text);
  if (signed) {
    sign = signed[1] === "-" ? -1 : 1;
    text = text.slice(signed[0].length);
  }
  // Architects write 2'-6": the hyphen between feet and inches is a separator, not a minus.
  text = text.replace(/(\d\s*(?:'|ft|feet|foot))\s*-\s*(?=\d)/g, "$1 ");
  if (/-/.test(text)) return { ok: false, message: `${quoted} is not a length: a minus sign may only come first.` };
  if (!/^[0-9.,/+\sa-zA-Z'"]+$/.test(text)) return { ok: false, message: `${quoted} is not a length. Use a number and a unit, for example ${examples}.` };
  if (/\d,\d/.test(text)) {
    return { ok: false, message: `${quoted} is ambiguous: leave out thousands separators (1200 mm) and write decimals with a point (1.2 m).` };
  }
  const bare = new RegExp(`^(?:${NUMBER})$`).exec(text);
  if (bare) {
    const n = numberOf(text);
    if (n === 0) return { ok: true, metres: 0 };
    return { ok: false, message: `${quoted} has no unit. Add one, for example ${text} mm or ${text} in.` };
  }
  text = text.replace(/(\d)\s*'/g, "$1 ft ").replace(/(\d)\s*"/g, "$1 in ").trim();
  // A length is one or more terms, each a number and a unit; "12 ft 6 in" adds its terms
  // (mathjs alone would multiply them into an area).
  let total = 0;
  let consumed = 0;
  for (const m of text.matchAll(TERM)) {
    if (m.index !== consumed) break;
    consumed = m.index + m[0].length;
    const value = numberOf(m[1]);
    if (Number.isNaN(value)) return { ok: false, message: `${quoted} divides by zero.` };
    const term = lengthUnit(value, m[2]);
    if (term === "unknown") return { ok: false, message: `${quoted} uses a unit Cavitas does not know ("${m[2]}"). Use mm, cm, m, in or ft.` };
    if (term === "not a length") return { ok: false, message: `${quoted} is not a length: "${m[2]}" is not a unit of length. Use mm, cm, m, in or ft.` };
    total += term;
  }
  if (consumed === 0 || consumed !== text.length) {
    return { ok: false, message: `${quoted} is not a length Cavitas understands. Try ${examples}.` };
  }
  if (!Number.isFinite(total)) return { ok: false, message: `${quoted} is too large to be a length.` };
  if (sign < 0 && total > 0 && !opts.negative) {
    return { ok: false, message: `${quoted} is negative: this length must be zero or more. Leave out the minus sign.` };
  }
  return { ok: true, metres: sign * total || 0 };
}

// Typographic marks people paste from drawings: the minus sign, primes and common fractions.
function normalise(raw: string): string {
  return raw
    .trim()
    .replace(/[\u2212\u2012\u2013]/g, "-")
    .replace(/[\u2032\u2019]/g, "'")
    .replace(/[\u2033\u201d]/g, '"')
    .replace(/(\d)?\s*([½¼¾⅛⅜⅝⅞])/g, (_, d: string | undefined, f: string) => `${d ? `${d} ` : ""}${VULGAR[f]}`);
}

const VULGAR: Record<string, string> = { "½": "1/2", "¼": "1/4", "¾": "3/4", "⅛": "1/8", "⅜": "3/8", "⅝": "5/8", "⅞": "7/8" };

function lengthUnit(value: number, name: string): number | "unknown" | "not a length" {
  for (const candidate of [name, name.toLowerCase()]) {
    let u: unknown;
    try {
      u = unit(value, candidate);
    } catch {
      continue;
    }
    if (!isUnit(u) || !(u as Unit).equalBase(unit(1, "m"))) return "not a length";
    return (u as Unit).toNumber("m");
  }
  return "unknown";
}

// "10 1/2", "3/4", "2.5", "1e3" → a number.
function numberOf(text: string): number {
  const parts = text.trim().replace(/\s*\/\s*/g, "/").split(/\s+/);
  return parts.reduce((sum, p) => {
    if (!p.includes("/")) return sum + Number(p);
    const [n, d] = p.split("/").map(Number);
    return d === 0 ? NaN : sum + n / d;
  }, 0);
}

// Plain numbers typed in a field (areas, temperatures, seconds): a decimal point, no
// separators, optionally followed by the unit the field shows.
export type NumberParse = { ok: true; value: number } | { ok: false; message: string };

export function parseDecimal(raw: string, opts: { what: string; unit?: string; negative?: boolean }): NumberParse {
  let text = raw.trim().replace(/[\u2212\u2012\u2013]/g, "-");
  const unitText = opts.unit ? ` in ${opts.unit}` : "";
  if (!text) return { ok: false, message: `Enter the ${opts.what}${unitText}.` };
  if (opts.unit) {
    const plain = opts.unit.replace("²", "2").replace("³", "3");
    for (const u of [opts.unit, plain]) if (text.endsWith(u)) text = text.slice(0, -u.length).trim();
  }
  if (/\d,\d/.test(text)) return { ok: false, message: `"${raw.trim()}" is ambiguous: leave out thousands separators and write decimals with a point.` };
  if (!/^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/.test(text)) return { ok: false, message: `"${raw.trim()}" is not a number: enter the ${opts.what}${unitText}, for example 12.5.` };
  const value = Number(text);
  if (!Number.isFinite(value)) return { ok: false, message: `"${raw.trim()}" is too large.` };
  if (value < 0 && !opts.negative) return { ok: false, message: `"${raw.trim()}" is negative: the ${opts.what} must be zero or more.` };
  return { ok: true, value };
}

// Areas and volumes, like lengths, without thousands separators: a number read on one screen
// may be typed into a field on another.
export function formatArea(m2: number, pref: UnitPreference): string {
  return pref === "metric" ? `${decimal(m2, 1)} m²` : `${decimal(m2 / (FOOT * FOOT), 0)} ft²`;
}

export function formatVolume(m3: number, pref: UnitPreference): string {
  return pref === "metric" ? `${decimal(m3, 0)} m³` : `${decimal(m3 / FOOT ** 3, 0)} ft³`;
}

export const toFahrenheit = (celsius: number) => (celsius * 9) / 5 + 32;
export const toCelsius = (fahrenheit: number) => ((fahrenheit - 32) * 5) / 9;

/** Quantities in the person's units, for messages. */
export type Say = { length: (m: number) => string; area: (m2: number) => string; volume: (m3: number) => string; temperature: (celsius: number) => string };

export function sayIn(units: UnitPreference): Say {
  return {
    length: (m) => formatLength(m, units),
    area: (m2) => formatArea(m2, units),
    volume: (m3) => formatVolume(m3, units),
    temperature: (c) => (units === "metric" ? `${decimal(c, 1)} °C` : `${decimal(toFahrenheit(c), 1)} °F`),
  };
}
