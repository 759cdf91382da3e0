import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { decideCommit } from "@/lib/forms/typed-field";
import { formatLength, parseLength, type LengthScale, type UnitPreference } from "@/lib/units";

// A length field as MeasureField wires it: the stored value in metres, shown by formatLength and
// read back by parseLength in the person's units.
function lengthField(metres: number, units: UnitPreference, scale: LengthScale) {
  const format = (m: number) => formatLength(m, units, { scale });
  const parse = (text: string) => {
    const r = parseLength(text, { units, negative: true });
    return r.ok ? ({ ok: true, value: r.metres } as const) : r;
  };
  const shown = format(metres);
  return (text: string, edited: boolean) => decideCommit({ text, shown, edited, current: metres, parse, format });
}

const metres = fc.oneof(fc.double({ min: -6, max: 3, noNaN: true }).map((e) => 10 ** e), fc.integer({ min: 1, max: 100_000 }).map((n) => n / 1000));
const units = fc.constantFrom<UnitPreference>("metric", "imperial");
const scale = fc.constantFrom<LengthScale>("fine", "panel", "room");

describe("a typed field commits only what the person typed", () => {
  it("commits nothing on blur for untouched text, whatever the value and the units", () => {
    fc.assert(
      fc.property(metres, units, scale, (m, u, s) => {
        const leave = lengthField(m, u, s);
        const shown = formatLength(m, u, { scale: s });
        expect(leave(shown, false)).toEqual({ kind: "keep" });
        // Typed over and put back exactly as shown: still nothing to commit.
        expect(leave(shown, true)).toEqual({ kind: "keep" });
        expect(leave(`  ${shown} `, true)).toEqual({ kind: "keep" });
      }),
      { numRuns: 3000 },
    );
  });

  it("commits what was typed, and shows it as the formatter writes it", () => {
    // Defect 2: a 600 × 1200 mm panel's fields, tabbed through by an imperial user, wrote the
    // rounded display back; a new value is committed only when it was typed.
    const leave = lengthField(0.6, "imperial", "panel");
    expect(leave("2 ft", true)).toMatchObject({ kind: "commit", value: expect.closeTo(24 * 0.0254, 12), text: "2 ft 0 in" });
    expect(leave("600 mm", true)).toEqual({ kind: "keep" });
  });

  it("refuses text that does not parse, with the parser's message, and commits nothing", () => {
    const leave = lengthField(12, "metric", "room");
    expect(leave("abc", true)).toMatchObject({ kind: "refuse", message: expect.stringMatching(/not a length/) });
    expect(leave("", true)).toMatchObject({ kind: "refuse", message: expect.stringMatching(/Enter a length/) });
  });

  it("would have written the display back without the rule: the rounding is real", () => {
    // 12 m shows as 39 ft 4 7/16 in, which reads back as 11.99991 m (472 7/16 × 25.4 mm), not 12 m: only the
    // "untouched" rule keeps a tab-through from changing the room.
    const back = parseLength(formatLength(12, "imperial"));
    expect(back.ok && back.metres).not.toBe(12);
  });
});
