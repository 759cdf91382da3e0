import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ISO_354_LABELS } from "@/lib/acoustics/bands";
import { absorptionClass, rateThirdOctaves } from "@/lib/acoustics/ratings";
import { RATING_EXAMPLES, ratingsOf, thirdsOf } from "./fixtures";

const thirds = thirdsOf;

// Worked examples computed by hand and in Python from the rules of ISO 11654:1997 (clause 4,
// Annex B) and ASTM C423 (NRC, SAA): the procedure and the class boundaries as public summaries
// of the standards give them; the reference curve and the rounding steps from memory.
describe("ISO 11654 and ASTM C423 ratings (worked examples computed from the standards' rules)", () => {
  it.each(RATING_EXAMPLES)("$name", (example) => {
    expect(rateThirdOctaves(thirds(example.third))).toEqual(ratingsOf(example));
  });

  it("NRC tie 0.625 rounds half up to 0.65 (case astm_nrc_tie; Cavitas policy, C423 is silent)", () => {
    const v = Array(18).fill(0.5);
    // 250, 500, 1000, 2000 Hz → mean (0.6 + 0.6 + 0.65 + 0.65)/4 = 0.625
    [250, 500, 1000, 2000].forEach((label, i) => (v[ISO_354_LABELS.indexOf(label as never)] = [0.6, 0.6, 0.65, 0.65][i]));
    expect(rateThirdOctaves(thirds(v)).nrc).toBe(0.65);
  });

  it("ASTM values are not capped; α_p is capped at 1.00", () => {
    const r = rateThirdOctaves(thirds(Array(18).fill(1.12)));
    expect(r.nrc).toBe(1.1);
    expect(r.saa).toBe(1.12);
    expect(Object.values(r.alphaP)).toEqual([1, 1, 1, 1, 1, 1]);
    expect(r.alphaW).toBe(1);
    expect(r.class).toBe("A");
  });

  it("class boundaries (ISO 11654 Annex B)", () => {
    expect([100, 90, 85, 80, 75, 60, 55, 30, 25, 15, 10, 0].map(absorptionClass)).toEqual(["A", "A", "B", "B", "C", "C", "D", "D", "E", "E", "not classified", "not classified"]);
  });
});

describe("rounding rules as properties (fast-check)", () => {
  const alpha = fc.double({ min: 0, max: 1.3, noNaN: true });
  const isHundredths = (x: number) => Math.abs(x * 100 - Math.round(x * 100)) < 1e-9;
  it("every rating is an integer number of hundredths; α_p and α_w in 0.05 steps within [0, 1]; NRC in 0.05 steps", () => {
    fc.assert(
      fc.property(fc.array(alpha, { minLength: 18, maxLength: 18 }), (values) => {
        const r = rateThirdOctaves(thirds(values));
        for (const v of [...Object.values(r.alphaP), r.alphaW, r.nrc, r.saa]) expect(isHundredths(v)).toBe(true);
        for (const v of [...Object.values(r.alphaP), r.alphaW]) {
          expect(Math.round(v * 100) % 5).toBe(0);
          expect(v).toBeGreaterThanOrEqual(0);
          expect(v).toBeLessThanOrEqual(1);
        }
        expect(Math.round(r.nrc * 100) % 5).toBe(0);
      }),
    );
  });

  it("α_w is the highest shifted curve whose unfavourable deviations sum to at most 0.10", () => {
    const reference = [0.8, 1, 1, 1, 0.9];
    fc.assert(
      fc.property(fc.array(alpha, { minLength: 18, maxLength: 18 }), (values) => {
        const r = rateThirdOctaves(thirds(values));
        const p = [250, 500, 1000, 2000, 4000].map((label) => Math.round(r.alphaP[String(label)] * 100));
        const sum = (shift: number) => reference.reduce((s, ref, i) => s + Math.max(0, Math.round(ref * 100) + shift - p[i]), 0);
        const shift = Math.round(r.alphaW * 100) - 100;
        expect(sum(shift)).toBeLessThanOrEqual(10);
        if (shift < 0) expect(sum(shift + 5)).toBeGreaterThan(10);
      }),
    );
  });

  it("α_p at 125 Hz is reported from 100, 125 and 160 Hz but moves neither α_w, the shape nor the class (ISO 11654 clause 4)", () => {
    fc.assert(
      fc.property(fc.array(alpha, { minLength: 18, maxLength: 18 }), fc.array(alpha, { minLength: 3, maxLength: 3 }), (values, low) => {
        const r = rateThirdOctaves(thirds(values));
        const other = rateThirdOctaves(thirds([...low, ...values.slice(3)]));
        expect([other.alphaW, other.shape, other.class]).toEqual([r.alphaW, r.shape, r.class]);
        // the mean of three to 0.01 (half up), then to the nearest 0.05, capped at 1
        const mean = Math.floor((2 * low.reduce((a, v) => a + Math.round(v * 1e6), 0) + 3e4) / 6e4);
        expect(Math.round(other.alphaP["125"] * 100)).toBe(Math.min(100, 5 * Math.round(mean / 5)));
      }),
    );
  });

  it("NRC and SAA are the nearest 0.05 and 0.01 to the band means (ties up)", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 120 }), { minLength: 18, maxLength: 18 }), (hundredths) => {
        const values = hundredths.map((h) => h / 100);
        const r = rateThirdOctaves(thirds(values));
        const at = (label: number) => hundredths[ISO_354_LABELS.indexOf(label as never)];
        const nrcSum = [250, 500, 1000, 2000].reduce((s, l) => s + at(l), 0); // mean = nrcSum/400
        expect(Math.round(r.nrc * 100)).toBe(5 * Math.floor((nrcSum + 10) / 20));
        const saaSum = [200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500].reduce((s, l) => s + at(l), 0);
        expect(Math.round(r.saa * 100)).toBe(Math.floor((2 * saaSum + 12) / 24));
      }),
    );
  });
});
