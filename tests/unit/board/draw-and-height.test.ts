import { describe, expect, it } from "vitest";
import { snapDrawnPanel } from "@/lib/board/draw";
import { HIGH_ON_WALL, panelsHighOnWall } from "@/lib/board/high-panels";
import { resizeByKey, stepSelection } from "@/lib/board/selection";
import { canvasHeightFor } from "@/lib/board/view";
import type { Placement } from "@/lib/board/types";

describe("a drawn panel", () => {
  it("snaps its corner to the grid and its size to whole modules", () => {
    // Drawn 618.1 × 1,209.3 mm from (0.317, 0.588) on a 300 mm grid, module 600 × 1200 mm.
    const r = snapDrawnPanel({ x: 0.317, y: 0.588, width: 0.6181, height: 1.2093 }, { width: 0.6, height: 1.2 }, 0.3);
    expect(r.x).toBeCloseTo(0.3, 12);
    expect(r.y).toBeCloseTo(0.6, 12);
    expect(r.width).toBeCloseTo(0.6, 12);
    expect(r.height).toBeCloseTo(1.2, 12);
  });

  it("is never smaller than one module, and takes two where the box is nearer two", () => {
    const r = snapDrawnPanel({ x: 0, y: 0, width: 0.1, height: 2.0 }, { width: 0.6, height: 1.2 }, 0.3);
    expect([r.width, r.height]).toEqual([0.6, 2.4]);
  });
});

describe("panels high on a wall", () => {
  const p = (id: string, y: number, height: number): Placement => ({ id, buildUpId: "b", x: 0, y, width: 0.6, height });
  it("are those whose top edge is above the line, on walls only", () => {
    const list = [p("low", 0.9, 1.2), p("at-line", 1.2, 1.2), p("high", 1.5, 1.2)];
    expect(HIGH_ON_WALL).toBe(2.4);
    // Tops at 2.1 m, exactly 2.4 m (not above) and 2.7 m.
    expect(panelsHighOnWall("wall", list).map((q) => q.id)).toEqual(["high"]);
    expect(panelsHighOnWall("ceiling", list)).toEqual([]);
  });
});

describe("the keyboard on the board", () => {
  const p = (id: string, x: number, y: number): Placement => ({ id, buildUpId: "b", x, y, width: 0.6, height: 0.6 });
  const board = [p("bl", 0.2, 0.2), p("br", 0.9, 0.2), p("tl", 0.2, 0.9), p("tr", 0.9, 0.9)];
  it("Tab steps through the panels and then lets the focus leave the board", () => {
    expect(stepSelection(board, null, 1)).toBe("tl");
    expect(stepSelection(board, "tr", 1)).toBe("bl");
    expect(stepSelection(board, "br", 1)).toBeNull();
    expect(stepSelection(board, "tl", -1)).toBeNull();
    expect(stepSelection(board, null, -1)).toBe("br");
  });

  it("Alt+arrows resize from the lower-left corner, never below the smallest panel", () => {
    const steps = { step: 0.01, largeStep: 0.3 };
    const wider = resizeByKey(board, new Set(["bl"]), "ArrowRight", false, steps, 0.02);
    expect(wider[0]).toMatchObject({ x: 0.2, y: 0.2, width: 0.61, height: 0.6 });
    expect(wider[1]).toBe(board[1]);
    const lower = resizeByKey(board, new Set(["bl"]), "ArrowDown", true, steps, 0.02);
    expect(lower[0].height).toBeCloseTo(0.3, 12);
    const floor = resizeByKey(board, new Set(["bl"]), "ArrowLeft", true, { step: 0.01, largeStep: 5 }, 0.02);
    expect(floor[0].width).toBe(0.02);
  });
});

describe("the canvas's height", () => {
  const limits = { min: 360, max: 780, margin: 64 };
  it("shows a long wall across the width without empty bands above and below", () => {
    // 16.5 m × 4.5 m across 800 px: (800 − 128) · 4.5 / 16.5 + 128 = 311.3 px, raised to the 360 px floor.
    expect(canvasHeightFor({ width: 16.5, height: 4.5 }, 800, limits)).toBe(360);
    // 12 m × 9 m: 672 · 0.75 + 128 = 632 px.
    expect(canvasHeightFor({ width: 12, height: 9 }, 800, limits)).toBe(632);
    // A tall surface gets all the height the window allows.
    expect(canvasHeightFor({ width: 3, height: 9 }, 800, limits)).toBe(780);
  });
});
