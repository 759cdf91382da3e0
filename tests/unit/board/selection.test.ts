import { describe, expect, it } from "vitest";
import { rectFromCorners } from "@/lib/board/rect";
import { cycleSelection, DEFAULT_NUDGE, hitTest, marqueeSelect, nudge, nudgeOffset, readingOrder, toggleSelection } from "@/lib/board/selection";
import type { Placement } from "@/lib/board/types";

// Two rows of two panels, 0.6 × 0.6 m at 0.1 m gaps: bottom row y 0.2, top row y 0.9.
const p = (id: string, x: number, y: number): Placement => ({ id, buildUpId: "b", x, y, width: 0.6, height: 0.6 });
const board = [p("bl", 0.2, 0.2), p("br", 0.9, 0.2), p("tl", 0.2, 0.9), p("tr", 0.9, 0.9)];

describe("marquee", () => {
  it("selects the panels wholly inside it, dragged in any direction", () => {
    // From (1.6, 0.1) up-left to (0.1, 0.95): both bottom panels lie inside; the top ones
    // (from y 0.9) reach into it by 50 mm only, and a touching marquee would have taken them.
    expect([...marqueeSelect(board, rectFromCorners({ x: 1.6, y: 0.1 }, { x: 0.1, y: 0.95 }))]).toEqual(["bl", "br"]);
    // Half of a panel inside is not enough.
    expect([...marqueeSelect(board, rectFromCorners({ x: 0, y: 0 }, { x: 1.2, y: 0.85 }))]).toEqual(["bl"]);
  });

  it("a marquee drawn exactly on a panel's edges selects it", () => {
    expect([...marqueeSelect(board, { x: 0.9, y: 0.9, width: 0.6, height: 0.6 })]).toEqual(["tr"]);
  });
});

describe("clicks", () => {
  it("pick the topmost panel under the pointer, nothing on bare surface", () => {
    const stacked = [...board, { ...p("over", 0.5, 0.5), width: 1 }];
    expect(hitTest(stacked, { x: 0.55, y: 0.6 })).toBe("over");
    expect(hitTest(stacked, { x: 0.3, y: 0.3 })).toBe("bl");
    expect(hitTest(stacked, { x: 0.85, y: 0.3 })).toBeNull();
  });

  it("shift-click toggles a panel in and out of the selection", () => {
    const once = toggleSelection(new Set(["bl"]), "tr");
    expect([...once]).toEqual(["bl", "tr"]);
    expect([...toggleSelection(once, "bl")]).toEqual(["tr"]);
  });
});

describe("keyboard", () => {
  it("arrow keys nudge the selection, up the surface for ArrowUp, a larger step with shift", () => {
    expect(nudgeOffset("ArrowUp", false)).toEqual({ x: 0, y: DEFAULT_NUDGE.step });
    expect(nudgeOffset("ArrowLeft", true, { step: 0.001, largeStep: 0.3 })).toEqual({ x: -0.3, y: 0 });
    expect(nudgeOffset("a", false)).toBeNull();
    const moved = nudge(board, new Set(["br", "tr"]), "ArrowRight", false, { step: 0.005, largeStep: 0.05 });
    expect(moved.map((q) => q.x)).toEqual([0.2, 0.905, 0.2, 0.905]);
    expect(nudge(board, new Set(["br"]), "Enter", false)).toBe(board);
  });

  it("Tab goes through the panels as an elevation is read: top row first, left to right", () => {
    expect(readingOrder(board).map((q) => q.id)).toEqual(["tl", "tr", "bl", "br"]);
    expect(cycleSelection(board, null, 1)).toBe("tl");
    expect(cycleSelection(board, null, -1)).toBe("br");
    expect(cycleSelection(board, "tr", 1)).toBe("bl");
    expect(cycleSelection(board, "br", 1)).toBe("tl");
    expect(cycleSelection(board, "tl", -1)).toBe("br");
    expect(cycleSelection([], null, 1)).toBeNull();
  });
});
