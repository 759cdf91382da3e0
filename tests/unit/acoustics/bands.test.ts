import { describe, expect, it } from "vitest";
import { ISO_354_LABELS, OCTAVES, OCTAVE_LABELS, THIRD_OCTAVES, THIRD_OCTAVE_LABELS, bandSamples, octavesFromThirds, thirdOctaveSamples } from "@/lib/acoustics/bands";

// IEC 61260 base-ten bands: centres 1000·10^(k/10), edges fm·10^(±1/20); Cavitas averages seven log-midpoints of
// seven equal log steps; octaves 1000·10^(3k/10), each the mean of three one-third octaves.
describe("bands", () => {
  it("21 one-third octaves 50 Hz – 5 kHz labelled by nominal centre", () => {
    expect(THIRD_OCTAVE_LABELS).toHaveLength(21);
    THIRD_OCTAVES.forEach((band, i) => {
      expect(band.centre).toBeCloseTo(1000 * 10 ** ((i - 13) / 10), 9);
      // nominal labels round the exact centres within 3 % (IEC 61260 preferred numbers)
      expect(Math.abs(band.centre / band.label - 1)).toBeLessThan(0.03);
      expect(band.upper / band.lower).toBeCloseTo(10 ** 0.1, 12);
    });
    expect(THIRD_OCTAVES[0].centre).toBeCloseTo(50.119, 3);
    expect(THIRD_OCTAVES[20].centre).toBeCloseTo(5011.87, 2);
  });

  it("seven samples at log-midpoints, the middle one at the exact centre", () => {
    const band = THIRD_OCTAVES[13];
    const s = bandSamples(band);
    expect(s).toHaveLength(7);
    expect(s[3]).toBeCloseTo(1000, 9);
    expect(s[0]).toBeCloseTo(band.lower * 10 ** (0.1 / 14), 9);
    for (let i = 1; i < 7; i++) expect(s[i] / s[i - 1]).toBeCloseTo(10 ** (0.1 / 7), 12);
    expect(thirdOctaveSamples()).toHaveLength(147);
  });

  it("seven octaves 63 Hz – 4 kHz at the exact mid-band frequencies", () => {
    expect(OCTAVE_LABELS).toEqual([63, 125, 250, 500, 1000, 2000, 4000]);
    expect(OCTAVES.map((o) => Number(o.centre.toFixed(1)))).toEqual([63.1, 125.9, 251.2, 501.2, 1000, 1995.3, 3981.1]);
    expect(octavesFromThirds([1, 2, 3, 4, 5, 6])).toEqual([2, 5]);
  });

  it("the eighteen ISO 354 bands are 100 – 5000 Hz", () => {
    expect(ISO_354_LABELS).toEqual([100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000]);
  });
});
