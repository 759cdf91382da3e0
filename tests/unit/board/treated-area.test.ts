import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { countSurface, treatedArea } from "@/lib/board/treated-area";
import type { BoardOpening } from "@/lib/board/types";

const panel = (buildUpId: string, x: number, y: number, width: number, height: number) => ({ buildUpId, x, y, width, height });
const wall = (width: number, height: number, openings: BoardOpening[] = []) => ({ width, height, openings });
const round = (m2: number) => +m2.toFixed(9);
const accountOf = (c: ReturnType<typeof countSurface>) => Object.fromEntries(Object.entries(c.account).map(([k, v]) => [k, round(v)]));

// Every expected value below is worked by hand from the rectangles' corners.
describe("treated area: only what can exist counts", () => {
  it("panels clear of each other and of the edges count at their full size", () => {
    const lines = treatedArea([
      { surfaceKey: "wall-a", surface: wall(8, 3), placements: [panel("perforated", 0, 0, 0.6, 1.2), panel("slotted", 1, 0, 0.6, 0.6), panel("perforated", 2, 0, 0.6, 1.2)] },
      { surfaceKey: "ceiling", surface: wall(8, 6), placements: [panel("perforated", 1, 1, 1.2, 2.4)] },
      { surfaceKey: "wall-b", surface: wall(6, 3), placements: [] },
    ]);
    // Wall A: 2 · 0.6 · 1.2 = 1.44 m² perforated, 0.6 · 0.6 = 0.36 m² slotted; ceiling 1.2 · 2.4 = 2.88 m².
    expect(lines.map((l) => [l.surfaceKey, l.buildUpId, round(l.area)])).toEqual([
      ["wall-a", "perforated", 1.44],
      ["wall-a", "slotted", 0.36],
      ["ceiling", "perforated", 2.88],
    ]);
  });

  it("two panels overlapping by half count the overlap once", () => {
    // 1 × 1 at x = 0 and 1 × 1 at x = 0.5: the union is 1.5 × 1 = 1.5 m², 0.5 m² is a second layer.
    const c = countSurface(wall(4, 3), [panel("a", 0, 0, 1, 1), panel("a", 0.5, 0, 1, 1)]);
    expect(accountOf(c)).toEqual({ placed: 2, counted: 1.5, outside: 0, overlapping: 0.5, overOpenings: 0 });
  });

  it("an overlap of two build-ups belongs to the panel on top (the later one)", () => {
    // A at (0, 0) and B at (0.5, 0.5), both 1 × 1: they share 0.5 × 0.5 = 0.25 m², which B
    // covers; A keeps 1 − 0.25 = 0.75 m², B its full 1 m².
    const c = countSurface(wall(4, 3), [panel("A", 0, 0, 1, 1), panel("B", 0.5, 0.5, 1, 1)]);
    expect([...c.byBuildUp].map(([k, v]) => [k, round(v)])).toEqual([
      ["A", 0.75],
      ["B", 1],
    ]);
    expect(round(c.account.overlapping)).toBe(0.25);
  });

  it("three panels stacked on one spot count one panel", () => {
    const c = countSurface(wall(4, 3), [panel("a", 1, 1, 0.6, 1.2), panel("a", 1, 1, 0.6, 1.2), panel("a", 1, 1, 0.6, 1.2)]);
    // 0.72 m² each: 2.16 placed, 0.72 counted, two layers of 0.72 = 1.44 left out.
    expect(accountOf(c)).toEqual({ placed: 2.16, counted: 0.72, outside: 0, overlapping: 1.44, overOpenings: 0 });
  });

  it("dragging a panel onto two others takes its area out of the count", () => {
    const row = [panel("a", 0, 0, 0.6, 1.2), panel("a", 0.6, 0, 0.6, 1.2)];
    const apart = countSurface(wall(4, 3), [...row, panel("a", 2, 0, 0.6, 1.2)]);
    const across = countSurface(wall(4, 3), [...row, panel("a", 0.3, 0, 0.6, 1.2)]);
    // Apart: 3 · 0.72 = 2.16 m². Across the joint of the first two: it adds nothing new.
    expect(round(apart.account.counted)).toBe(2.16);
    expect(round(across.account.counted)).toBe(1.44);
    expect(round(across.account.overlapping)).toBe(0.72);
  });

  it("the part of a panel over a door is not counted", () => {
    // Door 1 m wide, 2.1 m high at x = 1; a 2 × 1 panel at (0.5, 1.5) shares x 1–2 (1 m) and
    // y 1.5–2.1 (0.6 m) with it: 0.6 m² over the door, 2 − 0.6 = 1.4 m² counted.
    const door: BoardOpening = { kind: "door", x: 1, y: 0, width: 1, height: 2.1 };
    const c = countSurface(wall(4, 3, [door]), [panel("a", 0.5, 1.5, 2, 1)]);
    expect(accountOf(c)).toEqual({ placed: 2, counted: 1.4, outside: 0, overlapping: 0, overOpenings: 0.6 });
  });

  it("the part of a panel past the surface's edge is not counted", () => {
    // A 1 × 1 panel at (3.5, 2.5) on a 4 × 3 wall keeps 0.5 × 0.5 = 0.25 m² on the wall.
    const c = countSurface(wall(4, 3), [panel("a", 3.5, 2.5, 1, 1)]);
    expect(accountOf(c)).toEqual({ placed: 1, counted: 0.25, outside: 0.75, overlapping: 0, overOpenings: 0 });
  });

  it("a build-up wholly over an opening gives no line (the check refuses a line of 0 m²)", () => {
    const window: BoardOpening = { kind: "window", x: 1, y: 1, width: 2, height: 1.5 };
    const lines = treatedArea([{ surfaceKey: "wall-a", surface: wall(4, 3, [window]), placements: [panel("a", 1.2, 1.2, 0.6, 0.6), panel("b", 0, 0, 0.5, 0.5)] }]);
    expect(lines.map((l) => [l.buildUpId, round(l.area)])).toEqual([["b", 0.25]]);
  });

  it("merges a surface given twice, counting overlaps across both", () => {
    const lines = treatedArea([
      { surfaceKey: "wall-a", surface: wall(4, 3), placements: [panel("p", 0, 0, 1, 1)] },
      { surfaceKey: "wall-a", surface: wall(4, 3), placements: [panel("p", 0.5, 0, 1, 1)] },
    ]);
    expect(lines.map((l) => round(l.area))).toEqual([1.5]);
  });
});

// An independent count: on a board of 0.1 m cells, every rectangle with corners on the cells
// is a set of whole cells, so the area that can exist is the number of cells on the surface,
// covered by a panel and by no opening, times 0.01 m²; the owner of a cell is the last panel
// over it. Brute force, no slabs.
describe("treated area against a cell count", () => {
  const CELL = 0.1;
  const rect = (maxX: number, maxY: number) =>
    fc.record({ x: fc.integer({ min: -5, max: maxX }), y: fc.integer({ min: -5, max: maxY }), w: fc.integer({ min: 1, max: 12 }), h: fc.integer({ min: 1, max: 12 }) });
  it("agrees per build-up, and every square metre placed is accounted for", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ r: rect(30, 20), b: fc.constantFrom("a", "b", "c") }), { maxLength: 12 }),
        fc.array(rect(30, 20), { maxLength: 3 }),
        (panels, openings) => {
          const W = 30;
          const H = 20;
          const byCell = new Map<string, number>();
          const cellOwner = (cx: number, cy: number) => {
            let owner: string | null = null;
            for (const p of panels) if (cx >= p.r.x && cx < p.r.x + p.r.w && cy >= p.r.y && cy < p.r.y + p.r.h) owner = p.b;
            return owner;
          };
          const inOpening = (cx: number, cy: number) => openings.some((o) => cx >= o.x && cx < o.x + o.w && cy >= o.y && cy < o.y + o.h);
          for (let cx = 0; cx < W; cx++)
            for (let cy = 0; cy < H; cy++) {
              const owner = cellOwner(cx, cy);
              if (owner && !inOpening(cx, cy)) byCell.set(owner, (byCell.get(owner) ?? 0) + 1);
            }
          const c = countSurface(
            { width: W * CELL, height: H * CELL, openings: openings.map((o) => ({ kind: "door" as const, x: o.x * CELL, y: o.y * CELL, width: o.w * CELL, height: o.h * CELL })) },
            panels.map((p) => panel(p.b, p.r.x * CELL, p.r.y * CELL, p.r.w * CELL, p.r.h * CELL)),
          );
          for (const b of ["a", "b", "c"]) expect(c.byBuildUp.get(b) ?? 0).toBeCloseTo((byCell.get(b) ?? 0) * CELL * CELL, 9);
          const { placed, counted, outside, overlapping, overOpenings } = c.account;
          expect(counted + outside + overlapping + overOpenings).toBeCloseTo(placed, 9);
        },
      ),
      { numRuns: 300 },
    );
  });
});
