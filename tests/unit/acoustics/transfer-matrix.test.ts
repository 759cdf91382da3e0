import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { airProperties } from "@/lib/acoustics/air";
import type { BuildUp, Layer } from "@/lib/acoustics/build-up";
import { CavityCache } from "@/lib/acoustics/cavity-cache";
import { evaluateBuildUp } from "@/lib/acoustics/evaluate";
import { fieldQuadrature } from "@/lib/acoustics/incidence";
import { LayeredModel } from "@/lib/acoustics/layered-model";
import { findPeak } from "@/lib/acoustics/peak";
import { fillSpectrum, spectrumGrid } from "@/lib/acoustics/spectrum";
import { baselineEvaluate } from "@/tests/bench/baseline-mathjs";
import { benchCases } from "@/tests/bench/cases";
import { NOMINAL } from "./helpers";
import { arbitraryBuildUp } from "./arbitraries";

const air = airProperties();

// Check values computed independently in numpy/scipy from the published formulas (not by this
// engine): a plate of 5 mm holes on a 25 mm square grid (ε = 3.14 %), t = 6 mm, with Maa's
// in-hole terms (Maa, JASA 104(5), 1998), Fok's mass end correction 2δ = 3.192 mm (Fok 1941, as
// used by Melling, JSV 29(1), 1973) and the end resistance 4·R_s/ε (Ingard, JASA 25(6), 1953;
// Cox & D'Antonio, Acoustic Absorbers and Diffusers, 2009, ch. 7); then 25 mm of Miki's porous
// layer, σ = 10 000 Pa·s/m² (Miki, J. Acoust. Soc. Jpn (E) 11(1), 1990), against the plate;
// 25 mm of air; rigid backing; transfer matrices (Allard & Atalla, Propagation of Sound in
// Porous Media, 2009, ch. 11); field incidence 0–78° divided by sin²78° (London 1950; Paris
// 1928). Values at the exact frequency f, printed to four decimals. The table is of the lumped
// (series) facing; the engine takes this 6 mm plate (t' = 9.19 mm, k·t' = 0.95 at 5.6 kHz)
// as a distributed layer, checked against the table where it is thin against the wavelength.
const T6 = {
  normal: [0.0318, 0.0504, 0.0873, 0.1521, 0.2865, 0.5858, 0.9208, 0.653, 0.326, 0.1682, 0.1001, 0.0648, 0.0443, 0.0355, 0.0359, 0.039, 0.0093, 0.0051],
  fieldExtended: [0.0507, 0.0771, 0.1237, 0.1932, 0.3114, 0.527, 0.8217, 0.8369, 0.5907, 0.357, 0.218, 0.1349, 0.0821, 0.0552, 0.0408, 0.0358, 0.0249, 0.0153],
  fieldLocal: [0.0497, 0.0764, 0.1256, 0.2025, 0.3373, 0.5724, 0.7784, 0.6196, 0.3749, 0.222, 0.1432, 0.0975, 0.0689, 0.0563, 0.0575, 0.0625, 0.0153, 0.0084],
  /** the same table computed earlier with 0.85d and Maa's R_s/ε: for comparison only */
  normalEarlier: [0.0312, 0.0498, 0.0871, 0.1547, 0.3013, 0.6379, 0.8872, 0.5171, 0.2428, 0.1241, 0.0739, 0.048, 0.0331, 0.027, 0.028, 0.0302, 0.0066, 0.0035],
};
const T6_CAVITY: Layer[] = [
  { kind: "porous", thickness: 0.025, flowResistivity: 10000, model: "miki" },
  { kind: "air", thickness: 0.025 },
];

describe("perforated plate + porous + air on rigid backing [computed independently in numpy]", () => {
  const plate = { kind: "round-holes", thickness: 0.006, holeDiameter: 0.005, pitch: 0.025, grid: "square" } as const;
  const model = new LayeredModel(plate, T6_CAVITY, air, "lumped");
  const run = (local: boolean, angles: number) => {
    const grid = spectrumGrid(NOMINAL, fieldQuadrature(angles, 78), local);
    fillSpectrum(model, grid);
    return grid;
  };
  const close = (actual: Float64Array, expected: number[], tol: number) =>
    expected.forEach((v, i) => expect(Math.abs(actual[i] - v)).toBeLessThan(tol));

  it("normal incidence, to the printed rounding", () => close(run(true, 16).normal, T6.normal, 6e-5));
  it("field incidence 0–78°/sin²78°, extended and local reaction (64 Gauss points), to the printed rounding", () => {
    close(run(false, 64).diffuse, T6.fieldExtended, 6e-5);
    close(run(true, 64).diffuse, T6.fieldLocal, 6e-5);
  });
  it("normal-incidence peak 404.17 Hz, α = 0.9217", () => {
    const peak = findPeak(model, air.c / (4 * 0.05));
    expect(Math.abs(peak.f - 404.17)).toBeLessThan(0.01);
    expect(peak.alpha).toBeCloseTo(0.9217, 4);
  });
  it("the earlier table (0.85d total end correction, Maa's R_s/ε) is Maa's micro-perforation facing on the same plate: for comparison only", () => {
    const earlier = new LayeredModel({ ...plate, kind: "micro-perforated" }, T6_CAVITY, air, "lumped");
    NOMINAL.forEach((f, i) => expect(Math.abs(earlier.normalAbsorption(f) - T6.normalEarlier[i])).toBeLessThan(6e-5));
    // 4·R_s/ε and Fok's lighter end mass: the peak moves up (384.1 Hz with 0.85d) and α rises
    expect(findPeak(earlier, air.c / (4 * 0.05)).f).toBeCloseTo(384.1, 1);
  });
  it("the engine's distributed facing for this plate is within 0.001 of the table where k·t' < 0.3 (below 1.78 kHz) and 0.004 above, its peak within 0.05 %", () => {
    const engine = new LayeredModel(plate, T6_CAVITY, air);
    expect(engine.facing.model).toBe("distributed");
    const tPrime = 0.006 + 0.003192;
    NOMINAL.forEach((f, i) => {
      const thin = ((2 * Math.PI * f) / air.c) * tPrime < 0.3;
      expect(Math.abs(engine.normalAbsorption(f) - T6.normal[i])).toBeLessThan(thin ? 1e-3 : 4e-3);
    });
    expect(Math.abs(findPeak(engine, air.c / (4 * 0.05)).f / 404.17 - 1)).toBeLessThan(5e-4);
  });
});

describe("independent route: full 2×2 matrices with mathjs complex numbers (tests/bench/baseline-mathjs.ts)", () => {
  // the same fixed 16-point field rule on both sides: this checks the matrices and the facing,
  // not the quadrature (the open-cavity rule is checked against an adaptive one elsewhere)
  const compare = (b: BuildUp) => {
    const fast = evaluateBuildUp(b, { angles: 16 });
    const slow = baselineEvaluate(b);
    fast.thirdOctaves.forEach((band, i) => {
      expect(Math.abs(band.normal - slow.thirds[i].normal)).toBeLessThan(1e-9);
      expect(Math.abs(band.diffuse - slow.thirds[i].diffuse)).toBeLessThan(1e-9);
    });
    expect(Math.abs((fast.peakHz ?? 0) - slow.peakHz)).toBeLessThan(1e-6 * slow.peakHz);
  };
  it.each(benchCases)("$name", ({ buildUp }) => compare(buildUp));
  it("a peak in the last grid cell below c/(4D) is found, not taken for the limit (found by fast-check)", () => {
    const light: BuildUp = {
      facing: { kind: "micro-perforated", thickness: 0.0003, holeDiameter: 0.0002, grid: "square", pitch: 0.00026 },
      cavity: { depth: 0.01, partitioned: false },
      infill: null,
    };
    compare(light);
    const e = evaluateBuildUp(light, { angles: 16 });
    expect(e.peakHz).toBeLessThan(e.quarterWaveHz * 0.99);
    expect(e.warnings.map((w) => w.code)).not.toContain("no-peak");
  });

  it("the highest of two peaks is found, above the bands or sampled on its flank (10 mm cavities, c/(4D) = 8.6 kHz; found by fast-check)", () => {
    const shallow: BuildUp = {
      facing: { kind: "slots", thickness: 0.02237895683504772, slotWidth: 0.0022668748148405526, slotPitch: 0.037231489792492564 },
      cavity: { depth: 0.01, partitioned: false },
      infill: null,
    };
    compare(shallow);
    expect(evaluateBuildUp(shallow).peakHz).toBeCloseTo(6687.83, 1);
    // a narrow air-column peak of a 27 mm slotted plate (5649 Hz, α 0.994) sampled on its flank
    // lower than the broad first peak (538 Hz, α 0.968): both are refined, the higher wins
    const twoPeaks: BuildUp = {
      facing: { kind: "slots", thickness: 0.026988374101639217, slotWidth: 0.0018592657072561594, slotPitch: 0.0525990104433248 },
      cavity: { depth: 0.01, partitioned: false },
      infill: { thickness: 0.008848724763982671, flowResistivity: 2721.244695729127, position: "on-backing", model: "delany-bazley" },
    };
    compare(twoPeaks);
    expect(evaluateBuildUp(twoPeaks).peakHz).toBeCloseTo(5648.9, 0);
  });

  it("random build-ups agree to 1e-9 [fast-check, 6 runs: the baseline is slow]", () => {
    fc.assert(fc.property(arbitraryBuildUp({ withinRange: true }), compare), { numRuns: 6 });
  });
});

describe("cavity cache", () => {
  it("gives the same numbers as a fresh evaluation", () => {
    const cache = new CavityCache();
    fc.assert(
      fc.property(arbitraryBuildUp(), (b) => {
        const fresh = evaluateBuildUp(b);
        evaluateBuildUp(b, { cavityCache: cache });
        const cached = evaluateBuildUp(b, { cavityCache: cache });
        fresh.thirdOctaves.forEach((band, i) => {
          expect(cached.thirdOctaves[i].normal).toBeCloseTo(band.normal, 12);
          expect(cached.thirdOctaves[i].diffuse).toBeCloseTo(band.diffuse, 12);
        });
      }),
      { numRuns: 40 },
    );
  });

  it("keeps a table for the values it was made for, not for the object passed in", () => {
    const cache = new CavityCache();
    const facing = { kind: "round-holes" as const, thickness: 0.012, holeDiameter: 0.008, pitch: 0.032, grid: "square" as const };
    const cavity = { depth: 0.1, partitioned: false };
    const infill = { thickness: 0.05, flowResistivity: 12000, position: "on-backing" as const, model: "delany-bazley" as const };
    evaluateBuildUp({ facing, cavity, infill }, { cavityCache: cache });
    // the same objects, changed in place after the tables were made
    facing.holeDiameter = 0.005;
    cavity.depth = 0.05;
    infill.flowResistivity = 30000;
    const cached = evaluateBuildUp({ facing, cavity, infill }, { cavityCache: cache });
    const fresh = evaluateBuildUp({ facing: { ...facing }, cavity: { ...cavity }, infill: { ...infill } });
    fresh.thirdOctaves.forEach((band, i) => {
      expect(cached.thirdOctaves[i].normal).toBeCloseTo(band.normal, 12);
      expect(cached.thirdOctaves[i].diffuse).toBeCloseTo(band.diffuse, 12);
    });
  });
});
