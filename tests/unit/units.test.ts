import { describe, expect, it } from "vitest";
import { formatArea, formatLength, parseLength } from "@/lib/units";

// Reference: the international inch is exactly 25.4 mm and the foot 12 inches (the 1959
// international yard and pound agreement); mathjs uses the same definitions.
const IN = 0.0254;
const FT = 12 * IN;

describe("parseLength", () => {
  it.each([
    ["19 mm", 0.019],
    ["1.2 m", 1.2],
    ["45 cm", 0.45],
    ["3/4 in", 0.75 * IN],
    ["12 ft 6 in", 12 * FT + 6 * IN],
    ["2 ft 6 in", 2 * FT + 6 * IN],
    ["2' 6\"", 2 * FT + 6 * IN],
    ["2 1/2 in", 2.5 * IN],
    ["0.6m", 0.6],
  ])("reads %s", (text, metres) => {
    const r = parseLength(text);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.metres).toBeCloseTo(metres, 12);
  });

  it.each([
    ["", /Enter a length/],
    ["19", /has no unit/],
    ["1,5 m", /ambiguous/],
    ["3 kg", /not a length/],
    ["2 m^2", /not a length/],
    ["ten feet", /not a length/],
  ])("refuses %j with a message", (text, message) => {
    const r = parseLength(text);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });
});

describe("formatLength", () => {
  it("shows metric lengths in m, and small ones in mm", () => {
    expect(formatLength(12, "metric")).toBe("12 m");
    expect(formatLength(4.5, "metric")).toBe("4.5 m");
    expect(formatLength(0.019, "metric")).toBe("19 mm");
  });

  it("shows imperial lengths in feet and inches to the nearest eighth", () => {
    // 12 m / 25.4 mm = 472.44 in = 39 ft 4.44 in → 4 1/2 in to the nearest 1/8.
    expect(formatLength(12, "imperial")).toBe("39 ft 4 1/2 in");
    expect(formatLength(0.75 * IN, "imperial", { small: true })).toBe("3/4 in");
    expect(formatLength(12 * FT + 6 * IN, "imperial")).toBe("12 ft 6 in");
  });

  it("round-trips what it prints", () => {
    for (const m of [0.3, 2.4, 9, 14.2]) {
      const back = parseLength(formatLength(m, "imperial"));
      expect(back.ok && Math.abs(back.metres - m)).toBeLessThanOrEqual(IN / 16);
    }
  });

  it("formats areas in m² or ft² (1 ft² = 0.09290304 m² exactly)", () => {
    expect(formatArea(24, "metric")).toBe("24 m²");
    expect(formatArea(0.09290304 * 100, "imperial")).toBe("100 ft²");
  });
});
