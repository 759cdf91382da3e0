import { describe, expect, it } from "vitest";
import { benchmarkBoard, runDragBenchmark } from "@/lib/board/drag-benchmark";
import { checkRules } from "@/lib/board/rules";

// The benchmark reports times for the screen's end-to-end benchmark; here only what it works on.
describe("the drag benchmark's board", () => {
  it("is 500 distinct, non-overlapping panels on the surface, with breaks near the openings to word", () => {
    const { surface, placements } = benchmarkBoard(500);
    expect(placements).toHaveLength(500);
    expect(new Set(placements.map((p) => p.code)).size).toBe(500);
    const breaks = checkRules(surface, placements, { clearance: 0.05 });
    expect(breaks.filter((b) => b.rule === "overlap" || b.rule === "outside")).toEqual([]);
    expect(breaks.some((b) => b.rule === "over-opening")).toBe(true);
  });

  it("runs the frames asked for and reports each stage", () => {
    const r = runDragBenchmark({ count: 50, frames: 5 });
    expect([r.placements, r.frames]).toEqual([50, 5]);
    expect(Object.keys(r.msPerFrame)).toEqual(["snap", "rules", "area", "total"]);
  });
});
