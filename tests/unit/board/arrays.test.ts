import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { arraySpan, duplicate, fitCount, makeArray } from "@/lib/board/arrays";
import { checkRules } from "@/lib/board/rules";
import type { Placement } from "@/lib/board/types";

const round = (v: number) => Math.round(v * 1e9) / 1e9;

describe("arrays", () => {
  it("4 × 3 panels of 600 × 1200 mm at 25 mm gaps from (100, 200) mm, positions by hand", () => {
    const rects = makeArray({ origin: { x: 0.1, y: 0.2 }, width: 0.6, height: 1.2, columns: 4, rows: 3, gapX: 0.025, gapY: 0.025 });
    // Columns step 0.6 + 0.025 = 0.625 m: x = 0.1, 0.725, 1.35, 1.975.
    // Rows step 1.2 + 0.025 = 1.225 m: y = 0.2, 1.425, 2.65. Bottom row first, left to right.
    const xs = [0.1, 0.725, 1.35, 1.975];
    const ys = [0.2, 1.425, 2.65];
    expect(rects.map((r) => [round(r.x), round(r.y), r.width, r.height])).toEqual(ys.flatMap((y) => xs.map((x) => [x, y, 0.6, 1.2])));
    // The whole array: 4 · 0.6 + 3 · 0.025 = 2.475 m wide, 3 · 1.2 + 2 · 0.025 = 3.65 m high.
    expect(round(arraySpan(4, 0.6, 0.025))).toBe(2.475);
    expect(round(arraySpan(3, 1.2, 0.025))).toBe(3.65);
    expect(round(rects[11].x + rects[11].width - rects[0].x)).toBe(2.475);
  });

  it("refuses a spec that cannot be an array, naming the field", () => {
    const spec = { origin: { x: 0, y: 0 }, width: 0.6, height: 0.6, columns: 2, rows: 2, gapX: 0, gapY: 0 };
    expect(() => makeArray({ ...spec, columns: 0 })).toThrow(/^columns must be a whole number of at least 1/);
    expect(() => makeArray({ ...spec, rows: 1.5 })).toThrow(/^rows/);
    expect(() => makeArray({ ...spec, height: 0 })).toThrow(/^height must be greater than 0/);
    expect(() => makeArray({ ...spec, gapX: -0.01 })).toThrow(/^gapX must be 0 m or more/);
  });

  it("how many fit: the largest n with n·size + (n − 1)·gap ≤ the length", () => {
    // 4 · 0.6 + 3 · 0.025 = 2.475 ≤ 3; 5 · 0.6 + 4 · 0.025 = 3.1 > 3.
    expect(fitCount(3, 0.6, 0.025)).toBe(4);
    expect(fitCount(2.475, 0.6, 0.025)).toBe(4);
    expect(fitCount(3.1, 0.6, 0.025)).toBe(5);
    expect(fitCount(3, 0.6, 0)).toBe(5);
    // 0.3 / 0.1 is 2.9999999999999996 in floating point, and three 100 mm panels do fit in 300 mm.
    expect(fitCount(0.3, 0.1, 0)).toBe(3);
    expect(fitCount(0.5, 0.6, 0.025)).toBe(0);
    expect(fitCount(3, 0, 0.025)).toBe(0);
  });

  it("an n × m array is n·m panels, none overlapping, each gap as asked (fast-check)", () => {
    const mm = (min: number, max: number) => fc.integer({ min, max }).map((v) => v / 1000);
    fc.assert(
      fc.property(
        fc.record({ width: mm(20, 2400), height: mm(20, 2400), columns: fc.integer({ min: 1, max: 12 }), rows: fc.integer({ min: 1, max: 12 }), gapX: mm(0, 100), gapY: mm(0, 100) }),
        (spec) => {
          const rects = makeArray({ ...spec, origin: { x: 0.5, y: 0.5 } });
          expect(rects).toHaveLength(spec.columns * spec.rows);
          const placements = rects.map((r, i): Placement => ({ ...r, id: `p${i}`, buildUpId: "b" }));
          const surface = { width: 100, height: 100, openings: [] };
          expect(checkRules(surface, placements, { clearance: 0 }).filter((b) => b.rule === "overlap")).toEqual([]);
          if (spec.columns > 1) expect(rects[1].x - (rects[0].x + rects[0].width)).toBeCloseTo(spec.gapX, 9);
          if (spec.rows > 1) expect(rects[spec.columns].y - (rects[0].y + rects[0].height)).toBeCloseTo(spec.gapY, 9);
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe("duplicates", () => {
  it("are moved by the offset, with fresh ids and the next codes after the board's highest", () => {
    const board: Placement[] = [
      { id: "a", code: "P-001", buildUpId: "b1", x: 0.1, y: 0.1, width: 0.6, height: 1.2 },
      { id: "b", code: "P-007", buildUpId: "b2", x: 0.8, y: 0.1, width: 0.6, height: 1.2 },
    ];
    let n = 0;
    const copies = duplicate(board, { x: 1.4, y: 0 }, { taken: board, makeId: () => `new-${++n}` });
    expect(copies.map((p) => [p.id, p.code, p.buildUpId, round(p.x), p.y])).toEqual([
      ["new-1", "P-008", "b1", 1.5, 0.1],
      ["new-2", "P-009", "b2", 2.2, 0.1],
    ]);
    expect(board[0].x).toBe(0.1);
  });
});
