import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatArea, formatLength, lengthResolution, parseDecimal, parseLength, type LengthScale, type UnitPreference } from "@/lib/units";

// Reference: the international inch is exactly 25.4 mm and the foot 12 inches (the 1959
// international yard and pound agreement); mathjs uses the same definitions.
const IN = 0.0254;
const FT = 12 * IN;

const metresOf = (text: string, negative = false) => {
  const r = parseLength(text, { negative });
  if (!r.ok) throw new Error(`${text}: ${r.message}`);
  return r.metres;
};

describe("parseLength", () => {
  it.each([
    ["19 mm", 0.019],
    ["1.2 m", 1.2],
    ["45 cm", 0.45],
    ["3/4 in", 0.75 * IN],
    ["12 ft 6 in", 12 * FT + 6 * IN],
    ["2 ft 6 in", 2 * FT + 6 * IN],
    ["2' 6\"", 2 * FT + 6 * IN],
    ["2'-6\"", 2 * FT + 6 * IN],
    ["2 1/2 in", 2.5 * IN],
    ["2½ in", 2.5 * IN],
    ["0.6m", 0.6],
    ["1e3 m", 1000],
    ["1200 mm", 1.2],
    ["0", 0],
    ["0.315 in", 0.315 * IN],
  ])("reads %s", (text, metres) => {
    expect(metresOf(text)).toBeCloseTo(metres, 12);
  });

  it.each([
    ["", /Enter a length/],
    ["19", /has no unit/],
    ["1,5 m", /ambiguous/],
    ["1,200 mm", /leave out thousands separators/],
    ["3 kg", /not a length/],
    ["2 m^2", /not a length/],
    ["ten feet", /not a length/],
    ["-3 m", /negative: this length must be zero or more/],
    ["−3 m", /negative/],
    ["3 - 1 m", /minus sign may only come first/],
    ["1/0 in", /divides by zero/],
    ["1e999 m", /too large/],
  ])("refuses %j with a message that says why", (text, message) => {
    const r = parseLength(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });

  it("reads a negative set-out where the field allows one", () => {
    expect(metresOf("−2 ft 6 in", true)).toBeCloseTo(-(2 * FT + 6 * IN), 12);
  });

  it("gives examples in the person's units", () => {
    const r = parseLength("", { units: "imperial" });
    expect(!r.ok && r.message).toMatch(/3\/4 in or 8 ft 6 in/);
  });
});

describe("formatLength", () => {
  it("shows metric room sizes in m to the millimetre and panel sizes in mm, without separators", () => {
    expect(formatLength(12, "metric")).toBe("12 m");
    expect(formatLength(4.5, "metric")).toBe("4.5 m");
    expect(formatLength(0.9, "metric")).toBe("0.9 m");
    expect(formatLength(12.3456, "metric")).toBe("12.346 m");
    expect(formatLength(0.019, "metric", { small: true })).toBe("19 mm");
    // Defect 4: "1,200 mm" was shown, and the parser refuses it.
    expect(formatLength(1.2, "metric", { small: true })).toBe("1200 mm");
    expect(formatLength(1500, "metric")).toBe("1500 m");
  });

  it("shows panel-scale imperial lengths of a foot or more with their feet (defect 1)", () => {
    // 600 mm / 25.4 mm = 23.622 in → 23 5/8 in to the nearest 1/16 = 1 ft 11 5/8 in.
    expect(formatLength(0.6, "imperial", { small: true })).toBe("1 ft 11 5/8 in");
    // 1200 mm = 47.244 in → 47 1/4 in = 3 ft 11 1/4 in; 500 mm = 19.685 in → 1 ft 7 11/16 in.
    expect(formatLength(1.2, "imperial", { small: true })).toBe("3 ft 11 1/4 in");
    expect(formatLength(0.5, "imperial", { small: true })).toBe("1 ft 7 11/16 in");
    expect(formatLength(0.75 * IN, "imperial", { small: true })).toBe("3/4 in");
    expect(formatLength(12 * FT + 6 * IN, "imperial")).toBe("12 ft 6 in");
    expect(formatLength(2 * FT, "imperial")).toBe("2 ft 0 in");
    // 12 m / 25.4 mm = 472.441 in = 39 ft 4.441 in → 4 7/16 in to the nearest 1/16.
    expect(formatLength(12, "imperial")).toBe("39 ft 4 7/16 in");
  });

  it("shows fabrication detail at a fabricator's precision, never a nonzero value as zero (defect 3)", () => {
    // 0.5 mm = 0.01969 in; 8 mm = 0.31496 in: decimal inches to the thousandth.
    expect(formatLength(0.0005, "imperial", { scale: "fine" })).toBe("0.020 in");
    expect(formatLength(0.008, "imperial", { scale: "fine" })).toBe("0.315 in");
    // A value that is a 64th is written as the fraction the trade uses.
    expect(formatLength((3 / 16) * IN, "imperial", { scale: "fine" })).toBe("3/16 in");
    expect(formatLength(1.5 * IN, "imperial", { scale: "fine" })).toBe("1 1/2 in");
    expect(formatLength(0.00005, "metric", { scale: "fine" })).toBe("0.05 mm");
    expect(formatLength(0.00001, "imperial", { scale: "fine" })).toBe("0.0004 in");
    expect(formatLength(0.0002, "imperial", { small: true })).toBe("0.008 in");
  });

  it("quotes back an absurd length in a refusal without failing (1e308 m, as a fuzzed request sends)", () => {
    for (const units of ["metric", "imperial"] as const) {
      for (const scale of ["fine", "panel", "room"] as const) expect(formatLength(1e308, units, { scale })).toMatch(/\d/);
    }
    expect(formatLength(1e12, "imperial")).toBe(`${(1e12 / 0.3048).toFixed(0)} ft`);
  });

  it("formats areas in m² or ft² (1 ft² = 0.09290304 m² exactly)", () => {
    expect(formatArea(24, "metric")).toBe("24 m²");
    expect(formatArea(0.09290304 * 100, "imperial")).toBe("100 ft²");
  });
});

// The whole range a length can take in Cavitas and beyond: zero, a nanometre to 1000 km
// (log-uniform, so every decade is tried), exact 64ths of an inch and exact tenths of a
// millimetre (what people type), and their negatives.
const magnitude = fc.oneof(
  fc.constant(0),
  fc.double({ min: -9, max: 6, noNaN: true }).map((e) => 10 ** e),
  fc.integer({ min: 1, max: 2_000_000 }).map((n) => (n * IN) / 64),
  fc.integer({ min: 1, max: 50_000_000 }).map((n) => n / 10_000),
);
const length = fc.tuple(magnitude, fc.boolean()).map(([m, negative]) => (negative ? -m : m));
const system = fc.constantFrom<UnitPreference>("metric", "imperial");
const scale = fc.constantFrom<LengthScale>("fine", "panel", "room");

describe("formatLength and parseLength are exact inverses over the whole range", () => {
  it("reads back what it prints, to within half the printed resolution", () => {
    fc.assert(
      fc.property(length, system, scale, (m, units, s) => {
        const back = metresOf(formatLength(m, units, { scale: s }), true);
        expect(Math.abs(back - m)).toBeLessThanOrEqual(lengthResolution(m, units, s) / 2 + 1e-12 * Math.max(1, Math.abs(m)));
      }),
      { numRuns: 4000 },
    );
  });

  it("prints what it read back exactly as before (formatting is stable)", () => {
    fc.assert(
      fc.property(length, system, scale, (m, units, s) => {
        const text = formatLength(m, units, { scale: s });
        expect(formatLength(metresOf(text, true), units, { scale: s })).toBe(text);
      }),
      { numRuns: 4000 },
    );
  });

  it("never shows a nonzero length as zero, nor a negative one without its sign", () => {
    fc.assert(
      fc.property(length, system, scale, (m, units, s) => {
        const back = metresOf(formatLength(m, units, { scale: s }), true);
        expect(Math.sign(back) || 0).toBe(Math.sign(m) || 0);
      }),
      { numRuns: 4000 },
    );
  });

  it("shows imperial lengths of a foot or more in feet and inches, never a remainder alone", () => {
    fc.assert(
      fc.property(length, scale, (m, s) => {
        const text = formatLength(m, "imperial", { scale: s });
        const back = Math.abs(metresOf(text, true));
        if (back >= FT) expect(text).toMatch(/^−?\d+ ft \d+( \d+\/\d+)? in$/);
        else expect(text).not.toContain("ft");
      }),
      { numRuns: 4000 },
    );
  });

  it("never prints a thousands separator or anything else the parser refuses", () => {
    fc.assert(
      fc.property(length, system, scale, (m, units, s) => {
        expect(formatLength(m, units, { scale: s })).not.toMatch(/,/);
      }),
    );
  });

  it("reads any feet, inches and sixteenths typed as the formatter writes them exactly", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3000 }), fc.integer({ min: 0, max: 11 }), fc.integer({ min: 0, max: 15 }), (ft, inch, sixteenths) => {
        const text = `${ft} ft ${inch}${sixteenths ? ` ${sixteenths}/16` : ""} in`;
        expect(metresOf(text)).toBeCloseTo(ft * FT + (inch + sixteenths / 16) * IN, 9);
      }),
    );
  });
});

describe("parseDecimal", () => {
  it("reads plain numbers and the field's own unit, and says why it refuses", () => {
    expect(parseDecimal("15", { what: "panel area", unit: "m²" })).toEqual({ ok: true, value: 15 });
    expect(parseDecimal("15 m²", { what: "panel area", unit: "m²" })).toEqual({ ok: true, value: 15 });
    expect(parseDecimal("1,5", { what: "panel area" })).toMatchObject({ ok: false, message: expect.stringMatching(/ambiguous/) });
    expect(parseDecimal("abc", { what: "panel area", unit: "m²" })).toMatchObject({ ok: false, message: expect.stringMatching(/not a number: enter the panel area in m²/) });
    expect(parseDecimal("-2", { what: "panel area" })).toMatchObject({ ok: false, message: expect.stringMatching(/negative/) });
    expect(parseDecimal("-2", { what: "air temperature", negative: true })).toEqual({ ok: true, value: -2 });
  });
});
