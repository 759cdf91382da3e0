import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Facing } from "@/lib/acoustics/build-up";
import { holeCentresIn, MIN_TONE, panelPattern, slotRectsIn, visibleDetail } from "@/lib/board/pattern";
import { type HoleLayout, layoutPattern, type SlotLayout } from "@/lib/board/pattern-layout";

const mm = (v: number) => Math.round(v * 1e7) / 1e4;
const square: Facing = { kind: "round-holes", thickness: 0.012, holeDiameter: 0.008, pitch: 0.032, grid: "square" };
const staggered: Facing = { ...square, grid: "staggered" };
const slots: Facing = { kind: "slots", thickness: 0.016, slotWidth: 0.003, slotPitch: 0.016 };
const panel = { width: 0.6, height: 1.2 };
const borders = { borderX: 0.04, borderY: 0.04 };
const everywhere = { x: -100, y: -100, width: 200, height: 200 };

// Convention under test: holes lie wholly inside the field (panel less borders) and the pattern
// is centred in it; along an axis n = floor((field − d) / pitch) + 1.
describe("holes of a 600 × 1200 mm panel with 40 mm borders, Ø8 mm", () => {
  it("square grid at 32 mm: 17 × 35 = 595 holes, by hand", () => {
    const layout = layoutPattern(square, panel, borders) as HoleLayout;
    // Field 600 − 2·40 = 520 mm by 1200 − 2·40 = 1120 mm.
    // Columns: floor((520 − 8) / 32) + 1 = floor(16) + 1 = 17.
    // Rows: floor((1120 − 8) / 32) + 1 = floor(34.75) + 1 = 35.
    expect([layout.columnsEven, layout.columnsOdd, layout.rows, layout.holeCount]).toEqual([17, 17, 35, 595]);
    // x: the 17 holes span 16 · 32 + 8 = 520 mm, the whole field: first centre 40 + 4 = 44 mm.
    // y: 34 · 32 + 8 = 1096 mm of 1120, 12 mm spare each side: first centre 40 + 12 + 4 = 56 mm.
    expect([mm(layout.firstX), mm(layout.firstY), mm(layout.rowPitch)]).toEqual([44, 56, 32]);
    const { centres, count } = holeCentresIn(layout, { x: 0, y: 0 }, everywhere);
    expect(count).toBe(595);
    expect([mm(centres[2 * 594]), mm(centres[2 * 594 + 1])]).toEqual([556, 1144]);
  });

  it("60° staggered at 32 mm: rows 32·√3/2 = 27.713 mm apart, 21 rows of 17 and 20 rows of 16 = 677 holes", () => {
    const layout = layoutPattern(staggered, panel, borders) as HoleLayout;
    expect(layout.rowPitch).toBeCloseTo((0.032 * Math.sqrt(3)) / 2, 15);
    // Rows: floor((1120 − 8) / 27.7128) + 1 = floor(40.126) + 1 = 41.
    // Shifted rows start 16 mm in: floor((520 − 16 − 8) / 32) + 1 = floor(15.5) + 1 = 16 holes.
    // 21 · 17 + 20 · 16 = 357 + 320 = 677.
    expect([layout.rows, layout.columnsEven, layout.columnsOdd, layout.holeCount]).toEqual([41, 17, 16, 677]);
    // Spare height: 1112 − 40 · 27.7128 = 3.487 mm, half each side: first row at 44 + 1.744 mm.
    expect(mm(layout.firstY)).toBeCloseTo(45.7436, 3);
    const { centres } = holeCentresIn(layout, { x: 0, y: 0 }, everywhere);
    // Row 0 starts at x = 44 mm, row 1 at 44 + 16 = 60 mm: neighbours across rows are one pitch
    // apart, √(16² + 27.713²) = √(256 + 768) = 32 mm, the equilateral triangle of a 60° grid.
    const [x0, y0, x1, y1] = [centres[0], centres[1], centres[2 * 17], centres[2 * 17 + 1]];
    expect([mm(x0), mm(x1)]).toEqual([44, 60]);
    expect(Math.hypot(x1 - x0, y1 - y0)).toBeCloseTo(0.032, 12);
    expect(mm(centres[2 * 17 + 2 * 15])).toBe(540);
  });

  it("micro-perforation follows the same layout", () => {
    const micro: Facing = { kind: "micro-perforated", thickness: 0.001, holeDiameter: 0.0005, pitch: 0.005, grid: "square" };
    // Columns floor((520 − 0.5) / 5) + 1 = 104; rows floor((1120 − 0.5) / 5) + 1 = 224.
    expect((layoutPattern(micro, panel, borders) as HoleLayout).holeCount).toBe(104 * 224);
  });

  it("no holes when the borders leave no field", () => {
    expect((layoutPattern(square, { width: 0.08, height: 1.2 }, borders) as HoleLayout).holeCount).toBe(0);
    expect((layoutPattern(staggered, { width: 0.6, height: 0.085 }, borders) as HoleLayout).holeCount).toBe(0);
  });
});

describe("slots", () => {
  it("3 mm slots at 16 mm, running up the panel: floor((520 − 3) / 16) + 1 = 33", () => {
    const layout = layoutPattern(slots, panel, borders) as SlotLayout;
    // 32 · 16 + 3 = 515 mm of 520: 2.5 mm spare each side, first centre at 40 + 2.5 + 1.5 = 44 mm.
    expect([layout.slotCount, mm(layout.first)]).toEqual([33, 44]);
    const { rects, count } = slotRectsIn(layout, { x: 1, y: 0.5 }, everywhere);
    expect(count).toBe(33);
    // On the surface, the panel's corner at (1, 0.5) m: first slot 1042.5 … 1045.5 mm, 540 … 1660 mm.
    expect(Array.from(rects.subarray(0, 4), mm)).toEqual([1042.5, 540, 3, 1120]);
  });

  it("running along the panel when asked, stepping up it: floor((1120 − 3) / 16) + 1 = 70", () => {
    const layout = layoutPattern(slots, panel, borders, "horizontal") as SlotLayout;
    expect(layout.slotCount).toBe(70);
  });

  it("only the part of a slot inside the view is given", () => {
    const layout = layoutPattern(slots, panel, borders) as SlotLayout;
    const { rects, count } = slotRectsIn(layout, { x: 0, y: 0 }, { x: 0.043, y: 0.1, width: 0.018, height: 0.05 });
    // Slots centred at 44 and 60 mm reach into x 43 … 61 mm; the first is cut at 43 mm.
    expect(count).toBe(2);
    expect(Array.from(rects, mm)).toEqual([43, 100, 2.5, 50, 58.5, 100, 2.5, 50]);
  });
});

describe("drawing only what is visible", () => {
  it("holes reaching into the view: a window 1100 … 1190 × 600 … 650 mm on a panel at (1, 0.5) m", () => {
    const layout = layoutPattern(square, panel, borders) as HoleLayout;
    // Centres on the surface: x = 1044 + 32 c, y = 556 + 32 r (mm). Reaching into the window,
    // within 4 mm of it: c = 2, 3, 4 (1108, 1140, 1172) and r = 2, 3 (620, 652).
    const { centres, count } = holeCentresIn(layout, { x: 1, y: 0.5 }, { x: 1.1, y: 0.6, width: 0.09, height: 0.05 });
    expect(count).toBe(6);
    expect(Array.from(centres, mm)).toEqual([1108, 620, 1140, 620, 1172, 620, 1108, 652, 1140, 652, 1172, 652]);
  });

  it("gives up (and says so) rather than generate more marks than allowed", () => {
    const layout = layoutPattern(square, panel, borders) as HoleLayout;
    const r = holeCentresIn(layout, { x: 0, y: 0 }, everywhere, 100);
    expect([r.truncated, r.count, r.centres.length]).toEqual([true, 595, 0]);
  });
});

describe("marks or tone", () => {
  it("holes are drawn from 1.5 px; below, a tone as dark as the open area", () => {
    // Ø8 mm: 0.8 px at 100 px/m, 1.6 px at 200 px/m.
    expect(visibleDetail(100, square).mode).toBe("tone");
    expect(visibleDetail(200, square).mode).toBe("marks");
    // Open area of the square grid, exact geometry: π·8² / (4·32²) = π/64 = 0.0491.
    expect(visibleDetail(100, square).tone).toBeCloseTo(Math.PI / 64, 12);
    // A micro-perforation of π·0.5² / (4·5²) = 0.79 % would vanish; it gets the lightest tone.
    const micro: Facing = { kind: "micro-perforated", thickness: 0.001, holeDiameter: 0.0005, pitch: 0.005, grid: "square" };
    expect(visibleDetail(100, micro).tone).toBe(MIN_TONE);
    expect(MIN_TONE).toBeGreaterThan(Math.PI / 400);
    // Slots: width 3 mm at 600 px/m is 1.8 px; open area 3/16.
    expect(visibleDetail(600, slots)).toEqual({ mode: "marks", markPx: expect.closeTo(1.8, 12), tone: 3 / 16 });
  });

  it("a panel's pattern in the view: the field on the surface, then marks or tone", () => {
    const at = { x: 1, y: 0.5, ...panel };
    const far = panelPattern(square, at, borders, { scale: 100, clip: everywhere });
    expect([far.detail.mode, far.holes, far.field]).toEqual(["tone", undefined, { x: 1.04, y: 0.54, width: expect.closeTo(0.52, 12), height: expect.closeTo(1.12, 12) }]);
    const near = panelPattern(square, at, borders, { scale: 2000, clip: everywhere });
    expect(near.holes!.length).toBe(2 * 595);
    const tooMany = panelPattern(square, at, borders, { scale: 2000, clip: everywhere, maxMarks: 10 });
    expect([tooMany.detail.mode, tooMany.holes]).toEqual(["tone", undefined]);
    expect(panelPattern(slots, at, borders, { scale: 2000, clip: everywhere }).slots!.length).toBe(4 * 33);
  });
});

describe("properties (fast-check)", () => {
  const holeFacing = fc
    .record({ d: fc.double({ min: 0.001, max: 0.02, noNaN: true }), ratio: fc.double({ min: 1.2, max: 6, noNaN: true }), grid: fc.constantFrom("square" as const, "staggered" as const) })
    .map(({ d, ratio, grid }): Facing => ({ kind: "round-holes", thickness: 0.01, holeDiameter: d, pitch: d * ratio, grid }));
  const size = fc.record({ width: fc.double({ min: 0.05, max: 0.3, noNaN: true }), height: fc.double({ min: 0.05, max: 0.3, noNaN: true }) });
  const border = fc.record({ borderX: fc.double({ min: 0, max: 0.05, noNaN: true }), borderY: fc.double({ min: 0, max: 0.05, noNaN: true }) });

  it("every hole lies wholly inside the field, no two closer than the pitch, as many as counted", () => {
    fc.assert(
      fc.property(holeFacing, size, border, (facing, s, b) => {
        const layout = layoutPattern(facing, s, b) as HoleLayout;
        const { centres, count } = holeCentresIn(layout, { x: 0, y: 0 }, everywhere, Infinity);
        expect(count).toBe(layout.holeCount);
        const r = layout.holeDiameter / 2;
        const f = layout.field;
        let outside = 0;
        for (let i = 0; i < count; i++) {
          const [x, y] = [centres[2 * i], centres[2 * i + 1]];
          if (x - r < f.x - 1e-6 || x + r > f.x + f.width + 1e-6 || y - r < f.y - 1e-6 || y + r > f.y + f.height + 1e-6) outside++;
        }
        expect(outside).toBe(0);
        // The pattern is regular: no hole is nearer the first one than the pitch.
        let nearest = Infinity;
        for (let i = 1; i < count; i++) nearest = Math.min(nearest, Math.hypot(centres[2 * i] - centres[0], centres[2 * i + 1] - centres[1]));
        if (count > 1) expect(nearest).toBeGreaterThanOrEqual(layout.pitch * (1 - 1e-9));
      }),
      { numRuns: 150 },
    );
  });
});
