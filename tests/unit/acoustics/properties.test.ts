import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { BuildUp, HoleFacing } from "@/lib/acoustics/build-up";
import { evaluateBuildUp } from "@/lib/acoustics/evaluate";
import { arbitraryBuildUp } from "./arbitraries";

describe("physical properties of the engine (fast-check)", () => {
  it("every absorption value lies in [0, 1], normal and diffuse, one-third octaves and octaves", () => {
    fc.assert(
      fc.property(arbitraryBuildUp(), (b) => {
        const e = evaluateBuildUp(b, { peak: false });
        for (const band of [...e.thirdOctaves, ...e.octaves]) {
          for (const v of [band.normal, band.diffuse]) {
            expect(v).toBeGreaterThanOrEqual(0);
            expect(v).toBeLessThanOrEqual(1);
          }
        }
      }),
      { numRuns: 150 },
    );
  });

  it("Miki's model inside its data range is passive: nothing is clamped to 0", () => {
    const miki = arbitraryBuildUp({ withinRange: true }).filter((b) => b.infill?.model !== "delany-bazley");
    fc.assert(
      fc.property(miki, (b) => {
        expect(evaluateBuildUp(b, { peak: false }).warnings.map((w) => w.code)).not.toContain("negative-absorption");
      }),
      { numRuns: 80 },
    );
  });

  // A panel of round holes over an empty cavity, parameters in the range of trade products.
  const panel = fc.record({
    thickness: fc.double({ min: 0.001, max: 0.02, noNaN: true }),
    holeDiameter: fc.double({ min: 0.002, max: 0.015, noNaN: true }),
    openArea: fc.double({ min: 0.005, max: 0.15, noNaN: true }),
    depth: fc.double({ min: 0.02, max: 0.3, noNaN: true }),
    partitioned: fc.boolean(),
  });
  const buildUp = (p: { thickness: number; holeDiameter: number; openArea: number; depth: number; partitioned: boolean }): BuildUp => {
    const facing: HoleFacing = {
      kind: "round-holes",
      thickness: p.thickness,
      holeDiameter: p.holeDiameter,
      pitch: p.holeDiameter * Math.sqrt(Math.PI / (4 * p.openArea)),
      grid: "square",
    };
    return { facing, cavity: { depth: p.depth, partitioned: p.partitioned }, infill: null };
  };

  it("a deeper cavity lowers the Helmholtz peak (lumped helmholtzHz and full-model peakHz)", () => {
    fc.assert(
      fc.property(panel, fc.double({ min: 1.1, max: 2, noNaN: true }), (p, factor) => {
        const shallow = evaluateBuildUp(buildUp(p));
        const deep = evaluateBuildUp(buildUp({ ...p, depth: p.depth * factor }));
        expect(deep.helmholtzHz).toBeLessThan(shallow.helmholtzHz);
        expect(deep.peakHz as number).toBeLessThan(shallow.peakHz as number);
      }),
      { numRuns: 80 },
    );
  });

  it("a larger open area raises it", () => {
    fc.assert(
      fc.property(panel, fc.double({ min: 1.1, max: 2, noNaN: true }), (p, factor) => {
        const sparse = evaluateBuildUp(buildUp(p));
        const dense = evaluateBuildUp(buildUp({ ...p, openArea: p.openArea * factor }));
        // both at the quarter-wave limit c/(4D): no peak below it to compare
        fc.pre(!dense.warnings.some((w) => w.code === "no-peak"));
        expect(dense.helmholtzHz).toBeGreaterThan(sparse.helmholtzHz);
        expect(dense.peakHz as number).toBeGreaterThan(sparse.peakHz as number);
      }),
      { numRuns: 80 },
    );
  });

  it("the full-model peak lies below the lumped estimate for these panels (the lumped f0 drops cot(kD) ≈ 1/(kD), which sits above)", () => {
    fc.assert(
      fc.property(panel, (p) => {
        const e = evaluateBuildUp(buildUp(p));
        expect(e.peakHz as number).toBeLessThan(e.helmholtzHz);
      }),
      { numRuns: 80 },
    );
  });
});
