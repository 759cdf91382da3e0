import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { airProperties } from "@/lib/acoustics/air";
import type { Facing } from "@/lib/acoustics/build-up";
import { FREE_END } from "@/lib/acoustics/end-corrections";
import { cotRootHz, lumpedPanelHz, panelHelmholtzHz, resonatorHz } from "@/lib/acoustics/helmholtz";
import { roundHoleOpenArea } from "@/lib/acoustics/perforation";

const { c } = airProperties();

describe("single resonator, f0 = (c/2π)·sqrt(S/(V·L')) (Rayleigh, Theory of Sound; Levine & Schwinger, Phys. Rev. 73, 1948)", () => {
  const a = 0.01;
  const S = Math.PI * a * a;
  // computed from the formula in numpy, c = 343.232 m/s
  it("H1 both ends flanged: 118.31 Hz", () => {
    expect(resonatorHz({ neckArea: S, neckLength: 0.05, volume: 1e-3, ends: "flanged-flanged" })).toBeCloseTo(118.31, 2);
  });
  it("H2 inner flanged, outer free: 120.45 Hz", () => {
    expect(resonatorHz({ neckArea: S, neckLength: 0.05, volume: 1e-3, ends: "flanged-free" })).toBeCloseTo(120.45, 2);
  });
  it("H3 both free: 122.70 Hz (formula by hand with 0.6133a per end, no contract option)", () => {
    const length = 0.05 + 2 * FREE_END * a;
    expect(length * 1000).toBeCloseTo(62.266, 3);
    expect((c / (2 * Math.PI)) * Math.sqrt(S / (1e-3 * length))).toBeCloseTo(122.7, 2);
  });
  it("H4 short neck, both flanged: 78.58 Hz", () => {
    const big = 0.025;
    expect(resonatorHz({ neckArea: Math.PI * big * big, neckLength: 0.005, volume: 0.02, ends: "flanged-flanged" })).toBeCloseTo(78.58, 2);
  });
  it("uses neckRadius when given and no end correction for ends none", () => {
    const plain = (c / (2 * Math.PI)) * Math.sqrt(S / (1e-3 * 0.05));
    expect(resonatorHz({ neckArea: S, neckLength: 0.05, volume: 1e-3, ends: "none" })).toBeCloseTo(plain, 9);
    expect(resonatorHz({ neckArea: S, neckLength: 0.05, volume: 1e-3, neckRadius: a, ends: "flanged-flanged" })).toBeCloseTo(118.31, 2);
  });
});

// Panels over an air cavity, f0 = (c/2π)·sqrt(ε/(D·t')) (Cox & D'Antonio, Acoustic Absorbers and
// Diffusers, 2009, ch. 7), computed in numpy with the end corrections of: 0.85d; Fok (Cavitas's
// helmholtzHz; Fok 1941 via Melling 1973); Ingard 1953; Allard & Atalla 2009; and the exact root
// of ωt'/(εc) = cot(ωD/c) with 0.85d.
const square = (d: number, b: number, t: number): Facing => ({ kind: "round-holes", thickness: t, holeDiameter: d, pitch: b, grid: "square" });
const PANELS: { name: string; facing: Facing; D: number; f085: number; fok: number; ingard: number; allard: number; cot: number }[] = [
  { name: "P1", facing: square(0.005, 0.025, 0.006), D: 0.05, f085: 427.7, fok: 451.6, ingard: 448.8, allard: 446.7, cot: 417.1 },
  { name: "P2", facing: square(0.008, 0.016, 0.0125), D: 0.1, f085: 551.0, fok: 619.7, ingard: 614.2, allard: 607.7, cot: 472.9 },
  {
    name: "P3",
    facing: { kind: "round-holes", thickness: 0.001, holeDiameter: 0.003, pitch: 0.01, grid: "staggered" },
    D: 0.03,
    f085: 1512.3,
    fok: 1787.3,
    ingard: 1753.9,
    allard: 1727.3,
    cot: 1358.7,
  },
  // P4 is an imperial pegboard: the printed ε = 0.02761 and t' = 8.811 mm need d = t = 3/16 in
  // exactly, and the cot root 304.2 Hz needs D = 3 5/8 in = 92.075 mm (printed as 92.1).
  { name: "P4", facing: square(0.0047625, 0.0254, 0.0047625), D: 0.092075, f085: 318.7, fok: 337.3, ingard: 335.1, allard: 333.5, cot: 304.2 },
  { name: "P5", facing: square(0.01, 0.05, 0.018), D: 0.2, f085: 133.0, fok: 138.6, ingard: 138.0, allard: 137.5, cot: 128.0 },
];

describe("lumped panel resonance (computed in numpy from the formulas named above)", () => {
  for (const p of PANELS) {
    it(`${p.name}: helmholtzHz with Fok's end correction = ${p.fok} Hz, and the comparison variants`, () => {
      if (p.facing.kind === "slots") throw new Error("holes only");
      const { holeDiameter: d, pitch: b, grid, thickness: t } = p.facing;
      const eps = roundHoleOpenArea(d, b, grid);
      const a = d / 2;
      expect(panelHelmholtzHz(p.facing, p.D)).toBeCloseTo(p.fok, 1);
      expect(lumpedPanelHz(eps, t + 0.85 * d, p.D, c)).toBeCloseTo(p.f085, 1);
      expect(lumpedPanelHz(eps, t + 2 * 0.85 * a * (1 - 1.25 * Math.sqrt(eps)), p.D, c)).toBeCloseTo(p.ingard, 1);
      expect(lumpedPanelHz(eps, t + 2 * 0.48 * Math.sqrt(Math.PI) * a * (1 - 1.14 * Math.sqrt(eps)), p.D, c)).toBeCloseTo(p.allard, 1);
      expect(cotRootHz(eps, t + 0.85 * d, p.D, c)).toBeCloseTo(p.cot, 1);
    });
  }

  it("S1 slots w = 3 mm, b = 20 mm, t = 16 mm, D = 50 mm: t' = 18.778 mm, f0 = 690.5 Hz, cot root 647.7 Hz", () => {
    const facing: Facing = { kind: "slots", thickness: 0.016, slotWidth: 0.003, slotPitch: 0.02 };
    expect(panelHelmholtzHz(facing, 0.05)).toBeCloseTo(690.5, 1);
    const tPrime = 0.016 + 2 * (0.003 / Math.PI) * Math.log(1 / Math.sin((Math.PI * 0.15) / 2));
    expect(tPrime * 1000).toBeCloseTo(18.778, 3);
    expect(cotRootHz(0.15, tPrime, 0.05, c)).toBeCloseTo(647.7, 1);
  });

  it("the cot root solves ωt'/(εc) = cot(ωD/c) and always lies below the lumped estimate (cot x < 1/x on (0, π/2))", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.002, max: 0.3, noNaN: true }),
        fc.double({ min: 0.0005, max: 0.05, noNaN: true }),
        fc.double({ min: 0.01, max: 0.5, noNaN: true }),
        (eps, tPrime, depth) => {
          const root = cotRootHz(eps, tPrime, depth, c);
          const w = 2 * Math.PI * root;
          const residual = (w * tPrime) / (eps * c) - 1 / Math.tan((w * depth) / c);
          expect(Math.abs(residual)).toBeLessThan(1e-6 * Math.max(1, (w * tPrime) / (eps * c)));
          expect(root).toBeLessThan(lumpedPanelHz(eps, tPrime, depth, c));
        },
      ),
    );
  });
});
