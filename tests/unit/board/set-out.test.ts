import { describe, expect, it } from "vitest";
import { panelSetOut, surfaceDimensions } from "@/lib/board/set-out";
import type { BoardSurface } from "@/lib/board/types";

// Wall B of the fictional rehearsal room: 9 m × 4.5 m, a 1.8 m door at 3.6 m, a window 1.2 m up.
const wall: BoardSurface = {
  width: 9,
  height: 4.5,
  openings: [
    { kind: "door", x: 3.6, y: 0, width: 1.8, height: 2.1 },
    { kind: "window", x: 6.5, y: 1.2, width: 1.5, height: 1.5 },
  ],
};

describe("set-out dimensions from the lower-left datum", () => {
  it("chain the openings' edges from the datum to the far end, under the overall width", () => {
    const dims = surfaceDimensions(wall);
    const chain = dims.filter((d) => d.kind === "opening").map((d) => [d.from, d.to]);
    // 0 → 3.6 (to the door), 3.6 → 5.4 (the door), 5.4 → 6.5, 6.5 → 8 (the window), 8 → 9.
    expect(chain).toEqual([
      [0, 3.6],
      [3.6, 5.4],
      [5.4, 6.5],
      [6.5, 8],
      [8, 9],
    ]);
    expect(dims.filter((d) => d.kind === "overall")).toEqual([
      { kind: "overall", axis: "x", from: 0, to: 9, at: 0, rows: 2 },
      { kind: "overall", axis: "y", from: 0, to: 4.5, at: 0, rows: 1 },
    ]);
  });

  it("give a raised opening's sill height from the floor, and none for a door", () => {
    expect(surfaceDimensions(wall).filter((d) => d.kind === "sill")).toEqual([{ kind: "sill", axis: "y", from: 0, to: 1.2, at: 7.25, rows: 0 }]);
  });

  it("keep the overall width next to the surface where there are no openings", () => {
    expect(surfaceDimensions({ width: 6, height: 3, openings: [] }).map((d) => [d.kind, d.axis, d.rows])).toEqual([
      ["overall", "x", 1],
      ["overall", "y", 1],
    ]);
  });

  it("set a panel out from the datum along the top and the right edge, with its size", () => {
    const dims = panelSetOut({ x: 1.25, y: 0.9, width: 0.6, height: 1.2 }, wall);
    // Across the top (y = 4.5 m, one row above): 0 → 1.25 (to the panel), 1.25 → 1.85 (its
    // width), extension lines from its top at 0.9 + 1.2 = 2.1 m. Up the right (x = 9 m): 0 →
    // 0.9 (to the panel), 0.9 → 2.1 (its height), extension lines from its right edge at 1.85 m.
    expect(dims.map(({ kind, axis, from, to, at, rows, witness }) => [kind, axis, from, +to.toFixed(12), at, rows, +witness!.toFixed(12)])).toEqual([
      ["set-out", "x", 0, 1.25, 4.5, -1, 2.1],
      ["size", "x", 1.25, 1.85, 4.5, -1, 2.1],
      ["set-out", "y", 0, 0.9, 9, -1, 1.85],
      ["size", "y", 0.9, 2.1, 9, -1, 1.85],
    ]);
  });

  it("leave out a set-out of nothing (a panel on the datum)", () => {
    expect(panelSetOut({ x: 0, y: 0, width: 0.6, height: 0.6 }, wall).map((d) => d.kind)).toEqual(["size", "size"]);
  });
});
