import { describe, expect, it } from "vitest";
import { treatedArea } from "@/lib/board/treated-area";

const panel = (buildUpId: string, width: number, height: number) => ({ buildUpId, width, height });

describe("treated area per surface and build-up", () => {
  it("sums the panels' areas, by hand", () => {
    const lines = treatedArea([
      { surfaceKey: "wall-a", placements: [panel("perforated", 0.6, 1.2), panel("slotted", 0.6, 0.6), panel("perforated", 0.6, 1.2)] },
      { surfaceKey: "ceiling", placements: [panel("perforated", 1.2, 2.4)] },
      { surfaceKey: "wall-b", placements: [] },
    ]);
    // Wall A: 2 · 0.6 · 1.2 = 1.44 m² perforated, 0.36 m² slotted; ceiling 1.2 · 2.4 = 2.88 m².
    expect(lines.map((l) => [l.surfaceKey, l.buildUpId, +l.area.toFixed(12)])).toEqual([
      ["wall-a", "perforated", 1.44],
      ["wall-a", "slotted", 0.36],
      ["ceiling", "perforated", 2.88],
    ]);
  });

  it("merges a surface given twice", () => {
    const lines = treatedArea([
      { surfaceKey: "wall-a", placements: [panel("p", 1, 1)] },
      { surfaceKey: "wall-a", placements: [panel("p", 0.5, 1)] },
    ]);
    expect(lines).toEqual([{ surfaceKey: "wall-a", buildUpId: "p", area: 1.5 }]);
  });
});
