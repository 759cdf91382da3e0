import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { resizeRect } from "@/lib/board/resize";
import { snapMove, snapResize } from "@/lib/board/snap";
import { buildSnapIndex } from "@/lib/board/snap-index";
import type { BoardSurface, Placement } from "@/lib/board/types";

// A fictional wall, 6 × 3 m, with a window; one panel A already placed at (1, 1), 0.6 × 1.2 m.
const wall: BoardSurface = { width: 6, height: 3, openings: [{ id: "w", kind: "window", x: 3.5, y: 1, width: 1.5, height: 1.2 }] };
const a: Placement = { id: "a", code: "P-001", buildUpId: "b", x: 1, y: 1, width: 0.6, height: 1.2 };
const index = buildSnapIndex(wall, [a]);

describe("snapping a moved panel", () => {
  it("to another panel's edges within the tolerance, with a guide for each line it now sits on", () => {
    const { rect, dx, dy, guides } = snapMove({ x: 1.61, y: 1.005, width: 0.6, height: 0.6 }, index, { tolerance: 0.02 });
    expect(rect.x).toBeCloseTo(1.6, 12);
    expect(rect.y).toBeCloseTo(1, 12);
    expect([dx, dy].map((v) => Number(v.toFixed(9)))).toEqual([-0.01, -0.005]);
    // x = 1.6 is A's right edge: the guide runs from A's bottom (1.0) to A's top (2.2).
    // y = 1.0 is A's bottom and the window's sill: the guide runs from A's left (1.0) to the
    // window's right (5.0).
    expect(guides.map((g) => ({ ...g, at: +g.at.toFixed(9), from: +g.from.toFixed(9), to: +g.to.toFixed(9) }))).toEqual([
      { axis: "x", at: 1.6, from: 1, to: 2.2, sources: ["panel"] },
      { axis: "y", at: 1, from: 1, to: 5, sources: ["opening", "panel"] },
    ]);
  });

  it("leaves the panel where it is when nothing is within the tolerance", () => {
    const r = { x: 2.3, y: 0.35, width: 0.6, height: 0.6 };
    expect(snapMove(r, index, { tolerance: 0.02 })).toEqual({ rect: r, dx: 0, dy: 0, guides: [] });
  });

  it("to the grid when no object is near: both edges of a 600 mm panel land on a 300 mm grid", () => {
    const { rect, guides } = snapMove({ x: 2.105, y: 0.35, width: 0.6, height: 0.6 }, index, { tolerance: 0.02, module: 0.3 });
    expect(rect.x).toBeCloseTo(2.1, 12);
    // The grid guides span the whole surface height; y 0.35 and 0.95 are 50 mm from a grid line.
    expect(guides.map((g) => [g.axis, +g.at.toFixed(9), g.from, g.to, g.sources])).toEqual([
      ["x", 2.1, 0, 3, ["grid"]],
      ["x", 2.7, 0, 3, ["grid"]],
    ]);
  });

  it("an object line within the tolerance wins over a nearer grid line", () => {
    const b: Placement = { ...a, id: "b", x: 2.12, y: 2.4, height: 0.5 };
    const r = snapMove({ x: 2.105, y: 0.35, width: 0.6, height: 0.6 }, buildSnapIndex(wall, [a, b]), { tolerance: 0.02, module: 0.3 });
    expect(r.rect.x).toBeCloseTo(2.12, 12);
  });

  it("a grid set out from another origin: 1 ft (0.3048 m) from x = 0.1 m", () => {
    const r = snapMove({ x: 0.71, y: 0.4, width: 0.5, height: 0.5 }, index, { tolerance: 0.01, module: 0.3048, gridOrigin: { x: 0.1, y: 0 } });
    // Grid lines at 0.1 + 0.3048 k: 0.4048, 0.7096 (k = 2) … the left edge moves by −0.0004 m.
    expect(r.rect.x).toBeCloseTo(0.7096, 12);
  });

  it("centres to centres when asked: a 600 mm panel centred on the window (centre x = 4.25 m)", () => {
    const moving = { x: 3.96, y: 2.5, width: 0.6, height: 0.4 };
    expect(snapMove(moving, index, { tolerance: 0.02, centres: true }).rect.x).toBeCloseTo(3.95, 12);
    expect(snapMove(moving, index, { tolerance: 0.02 }).rect.x).toBe(3.96);
  });

  it("to the surface's edges and openings' edges", () => {
    const r = snapMove({ x: 0.012, y: 2.39, width: 0.6, height: 0.6 }, index, { tolerance: 0.02 });
    expect(r.rect.x).toBe(0);
    expect(r.rect.y).toBeCloseTo(2.4, 12);
    expect(r.guides.find((g) => g.axis === "x")!.sources).toEqual(["surface"]);
    const nearWindow = snapMove({ x: 2.885, y: 0.3, width: 0.6, height: 0.6 }, index, { tolerance: 0.02 });
    expect(nearWindow.rect.x).toBeCloseTo(2.9, 12);
    expect(nearWindow.guides[0].sources).toEqual(["opening"]);
  });

  it("a dragged panel is no target of its own: the index leaves out what is moving", () => {
    const own = buildSnapIndex(wall, [a], { exclude: new Set(["a"]) });
    expect(snapMove({ ...a, x: 1.005 }, own, { tolerance: 0.02 }).rect.x).toBe(1.005);
    expect(snapMove({ ...a, x: 1.005 }, index, { tolerance: 0.02 }).rect.x).toBe(1);
  });
});

describe("snapping a resize", () => {
  it("moves only the edges the handle moves", () => {
    const r = snapResize({ x: 0.4, y: 0.2, width: 1.195, height: 0.5 }, "right", index, { tolerance: 0.02, minSize: 0.02 });
    expect(r.rect).toEqual({ x: 0.4, y: 0.2, width: expect.closeTo(1.2, 12), height: 0.5 });
    expect(r.guides.map((g) => g.axis)).toEqual(["x"]);
    const corner = snapResize({ x: 1.61, y: 0.2, width: 0.5, height: 0.79 }, "top-left", index, { tolerance: 0.02, minSize: 0.02 });
    // Left edge 1.61 → A's right edge 1.6 (width grows to 0.51); top 0.99 → A's bottom 1.0.
    expect(corner.rect.x).toBeCloseTo(1.6, 12);
    expect(corner.rect.x + corner.rect.width).toBeCloseTo(2.11, 12);
    expect(corner.rect.y).toBe(0.2);
    expect(corner.rect.y + corner.rect.height).toBeCloseTo(1, 12);
  });

  it("does not snap an edge when that would make the panel smaller than the minimum", () => {
    const r = snapResize({ x: 1.59, y: 0.2, width: 0.015, height: 0.5 }, "left", index, { tolerance: 0.02, minSize: 0.02 });
    // Snapping the left edge to 1.6 would leave 5 mm.
    expect(r.rect.x).toBe(1.59);
  });

  it("a handle dragged past the far edge stops at the minimum size", () => {
    const start = { x: 1, y: 1, width: 0.6, height: 1.2 };
    expect(resizeRect(start, "left", 0.7, 0, 0.02)).toEqual({ x: 1.58, y: 1, width: expect.closeTo(0.02, 12), height: 1.2 });
    expect(resizeRect(start, "top-right", 0.1, -0.2, 0.02)).toEqual({ x: 1, y: 1, width: expect.closeTo(0.7, 12), height: expect.closeTo(1, 12) });
    expect(resizeRect(start, "top", 0, -5, 0.02)).toEqual({ x: 1, y: 1, width: 0.6, height: 0.02 });
    expect(resizeRect(start, "bottom", 0, -0.3, 0.02)).toEqual({ x: 1, y: 0.7, width: 0.6, height: expect.closeTo(1.5, 12) });
  });
});

const metres = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const rect = fc.record({ x: metres(-1, 7), y: metres(-1, 4), width: metres(0.02, 2), height: metres(0.02, 2) });
const others = fc.array(rect, { maxLength: 30 }).map((rs) => rs.map((r, i): Placement => ({ ...r, id: `p${i}`, buildUpId: "b" })));
const options = fc.record({
  tolerance: metres(0, 0.1),
  module: fc.option(metres(0.01, 1.2), { nil: undefined }),
  centres: fc.boolean(),
});

describe("properties (fast-check)", () => {
  it("a move never shifts the panel by more than the tolerance, nor changes its size", () => {
    fc.assert(
      fc.property(others, rect, options, (ps, r, o) => {
        const s = snapMove(r, buildSnapIndex(wall, ps), o);
        expect(Math.abs(s.dx)).toBeLessThanOrEqual(o.tolerance);
        expect(Math.abs(s.dy)).toBeLessThanOrEqual(o.tolerance);
        expect([s.rect.width, s.rect.height]).toEqual([r.width, r.height]);
        if (s.dx !== 0) expect(s.guides.some((g) => g.axis === "x")).toBe(true);
        if (s.dy !== 0) expect(s.guides.some((g) => g.axis === "y")).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("a resize moves only the handle's edges, each by at most the tolerance", () => {
    const handle = fc.constantFrom("left", "right", "bottom", "top", "bottom-left", "bottom-right", "top-left", "top-right" as const);
    fc.assert(
      fc.property(others, rect, options, handle, (ps, r, o, h) => {
        const s = snapResize(r, h, buildSnapIndex(wall, ps), { ...o, minSize: 0.02 }).rect;
        // A fixed edge stays put up to float rounding of x + width.
        const moved = (before: number, after: number, moves: boolean) =>
          moves ? expect(Math.abs(after - before)).toBeLessThanOrEqual(o.tolerance + 1e-12) : expect(after).toBeCloseTo(before, 12);
        moved(r.x, s.x, h.includes("left"));
        moved(r.x + r.width, s.x + s.width, h.includes("right"));
        moved(r.y, s.y, h.includes("bottom"));
        moved(r.y + r.height, s.y + s.height, h.includes("top"));
      }),
      { numRuns: 300 },
    );
  });
});
