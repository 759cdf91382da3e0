import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkRules, rulesByPlacement } from "@/lib/board/rules";
import { forEachOverlap } from "@/lib/board/sweep";
import type { BoardSurface, Placement } from "@/lib/board/types";

// A fictional wall, 6 × 3 m, with a door and a named window.
const wall: BoardSurface = {
  width: 6,
  height: 3,
  openings: [
    { id: "door-1", kind: "door", x: 1, y: 0, width: 1, height: 2.1 },
    { id: "window-1", kind: "window", name: "Window to the yard", x: 3.5, y: 1, width: 1.5, height: 1.2 },
  ],
};

const panel = (code: string, x: number, y: number, width = 0.6, height = 1.2): Placement => ({
  id: `id-${code}`,
  code,
  buildUpId: "b1",
  x,
  y,
  width,
  height,
});

const messages = (ps: Placement[], clearance = 0, surface = wall) => checkRules(surface, ps, { clearance }).map((b) => b.message);

describe("overlap", () => {
  it("names both panels and the overlap's size, by hand: 2.2 + 0.6 − 2.76 = 0.04 m wide, 1.2 m high", () => {
    const breaks = checkRules(wall, [panel("P-013", 2.76, 0.5), panel("P-012", 2.2, 0.5)], { clearance: 0 });
    expect(breaks).toEqual([
      { rule: "overlap", placementIds: ["id-P-012", "id-P-013"], severity: "error", message: "P-012 overlaps P-013 by 40 × 1200 mm" },
    ]);
  });

  it("touching edges (gap exactly 0, up to float noise) are not an overlap", () => {
    // 2.2 + 0.6 is 2.8000000000000003 in floating point: a 3e-16 m "overlap" is noise.
    expect(messages([panel("P-001", 2.2, 0.5), panel("P-002", 2.8, 0.5)])).toEqual([]);
    expect(messages([panel("P-001", 2.2, 0.5), panel("P-002", 2.2, 1.7)])).toEqual([]);
  });

  it("an overlap of just over the micrometre tolerance counts", () => {
    expect(messages([panel("P-001", 2.2, 0.5), panel("P-002", 2.8 - 2e-6, 0.5)])).toEqual(["P-001 overlaps P-002 by <0.1 × 1200 mm"]);
  });
});

describe("over an opening", () => {
  it("says how much of the door the panel covers: 0.3 × 0.3 m of a door 2.1 m high", () => {
    const [b] = checkRules(wall, [panel("P-007", 0.7, 1.8, 0.6, 0.6)], { clearance: 0 });
    expect(b).toEqual({ rule: "over-opening", placementIds: ["id-P-007"], openingId: "door-1", severity: "error", message: "P-007 covers 300 × 300 mm of the door" });
  });

  it("uses the opening's own name when it has one", () => {
    expect(messages([panel("P-008", 4.9, 2, 0.6, 0.6)])).toEqual(["P-008 covers 100 × 200 mm of Window to the yard"]);
  });
});

describe("outside the surface", () => {
  it("says by how much, side by side", () => {
    expect(messages([panel("P-004", 5.6, 0.5)])).toEqual(["P-004 runs 200 mm past the right edge"]);
    expect(messages([panel("P-005", -0.1, 2.5, 0.6, 0.6)])).toEqual(["P-005 runs 100 mm past the left edge and 100 mm past the top edge"]);
    expect(messages([panel("P-006", 7, 0.5)])).toEqual(["P-006 lies entirely outside the surface"]);
  });

  it("a panel flush with the surface's edges is inside", () => {
    expect(messages([panel("P-001", 0, 0, 0.6, 3), panel("P-002", 5.4, 1.8)])).toEqual([]);
  });
});

describe("edge clearance", () => {
  it("to the surface's edges, in the project's words", () => {
    const [b] = checkRules(wall, [panel("P-004", 0.02, 0.5)], { clearance: 0.05 });
    expect(b).toEqual({
      rule: "clearance",
      placementIds: ["id-P-004"],
      severity: "warning",
      message: "P-004 is 20 mm from the left edge; the project asks for at least 50 mm",
    });
    expect(messages([panel("P-003", 0, 0.03, 0.6, 0.6)], 0.05)).toEqual([
      "P-003 touches the left edge and is 30 mm from the bottom edge; the project asks for at least 50 mm",
    ]);
  });

  it("to an opening, straight across: a panel 30 mm right of the door's jamb (door right edge at 2.0 m)", () => {
    const [b] = checkRules(wall, [panel("P-009", 2.03, 0.5)], { clearance: 0.05 });
    expect(b).toMatchObject({ rule: "clearance", openingId: "door-1", message: "P-009 is 30 mm from the door; the project asks for at least 50 mm" });
    expect(messages([panel("P-011", 2, 0.5)], 0.05)).toEqual(["P-011 touches the door; the project asks for at least 50 mm"]);
  });

  it("to an opening's corner, diagonally: √(20² + 30²) = 36.1 mm; √(30² + 40²) = 50 mm is enough", () => {
    // The window's top-right corner is at (5.0, 2.2).
    expect(messages([panel("P-010", 5.02, 2.23, 0.5, 0.5)], 0.05)).toEqual([
      "P-010 is 36.1 mm from Window to the yard; the project asks for at least 50 mm",
    ]);
    expect(messages([panel("P-010", 5.03, 2.24, 0.5, 0.5)], 0.05)).toEqual([]);
  });

  it("exactly the clearance away is enough, and a clearance of 0 asks for nothing", () => {
    expect(messages([panel("P-001", 0.05, 0.05, 0.6, 0.6)], 0.05)).toEqual([]);
    expect(messages([panel("P-001", 0, 0, 0.6, 0.6)], 0)).toEqual([]);
  });

  it("a side past the edge is an outside break, not a clearance break; the other sides still count", () => {
    expect(messages([panel("P-002", -0.1, 0.01, 0.6, 0.6)], 0.05)).toEqual([
      "P-002 runs 100 mm past the left edge",
      "P-002 is 10 mm from the bottom edge; the project asks for at least 50 mm",
    ]);
  });
});

describe("the list", () => {
  it("is ordered by rule, then by code, and groups the breaks by placement for drawing", () => {
    const ps = [panel("P-010", 2.2, 0.5), panel("P-002", 2.5, 0.5), panel("P-001", 5.8, 0.5), panel("P-003", 0.9, 0.5)];
    const breaks = checkRules(wall, ps, { clearance: 0 });
    expect(breaks.map((b) => b.message)).toEqual([
      "P-001 runs 400 mm past the right edge",
      "P-003 covers 500 × 1200 mm of the door",
      "P-002 overlaps P-010 by 300 × 1200 mm",
    ]);
    const byPlacement = rulesByPlacement(breaks);
    expect(byPlacement.get("id-P-002")!.map((b) => b.rule)).toEqual(["overlap"]);
    expect(byPlacement.get("id-P-010")).toBe(byPlacement.get("id-P-010"));
    expect([...byPlacement.keys()].sort()).toEqual(["id-P-001", "id-P-002", "id-P-003", "id-P-010"]);
  });
});

// Whole millimetres, so that touching edges and exact clearances come up often.
const mm = (min: number, max: number) => fc.integer({ min, max }).map((v) => v / 1000);
const arbitraryPanel = fc.record({ x: mm(-300, 6200), y: mm(-300, 3200), width: mm(20, 1500), height: mm(20, 1500) });
const arbitraryBoard = fc.array(arbitraryPanel, { minLength: 0, maxLength: 40 }).map((rects) =>
  rects.map((r, i): Placement => ({ ...r, id: `id-${i}`, code: `P-${String(i + 1).padStart(3, "0")}`, buildUpId: "b1" })),
);

describe("properties (fast-check)", () => {
  it("the result does not depend on the order of the placements", () => {
    fc.assert(
      fc.property(
        arbitraryBoard.chain((ps) => fc.tuple(fc.constant(ps), fc.shuffledSubarray(ps, { minLength: ps.length }))),
        mm(0, 100),
        ([ps, shuffled], clearance) => {
          expect(checkRules(wall, shuffled, { clearance })).toEqual(checkRules(wall, ps, { clearance }));
        },
      ),
      { numRuns: 200 },
    );
  });

  it("an overlap is symmetric: the same break for (a, b) as for (b, a)", () => {
    fc.assert(
      fc.property(arbitraryBoard.filter((ps) => ps.length >= 2), (ps) => {
        const [a, b] = ps;
        const overlaps = (list: Placement[]) => checkRules(wall, list, { clearance: 0 }).filter((x) => x.rule === "overlap");
        expect(overlaps([a, b])).toEqual(overlaps([b, a]));
      }),
    );
  });

  it("the sweep finds exactly the pairs that testing every pair finds", () => {
    fc.assert(
      fc.property(arbitraryBoard, (ps) => {
        const swept: string[] = [];
        forEachOverlap(ps, (a, b) => swept.push([a.id, b.id].sort().join("+")));
        const every: string[] = [];
        for (let i = 0; i < ps.length; i++) {
          for (let j = i + 1; j < ps.length; j++) {
            const [a, b] = [ps[i], ps[j]];
            const ox = Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x);
            const oy = Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y);
            if (ox > 1e-6 && oy > 1e-6) every.push([a.id, b.id].sort().join("+"));
          }
        }
        expect(swept.sort()).toEqual(every.sort());
      }),
      { numRuns: 300 },
    );
  });
});
