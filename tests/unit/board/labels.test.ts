import { describe, expect, it } from "vitest";
import { compareLabels, formatCode, formatMm, nextCode, nextCodes, parseCode } from "@/lib/board/labels";

describe("placement codes", () => {
  it("are P- and at least three digits, and grow past 999", () => {
    expect([formatCode(1), formatCode(12), formatCode(999), formatCode(1000)]).toEqual(["P-001", "P-012", "P-999", "P-1000"]);
    expect([parseCode("P-012"), parseCode(" P-1000 "), parseCode("P12"), parseCode("Q-001"), parseCode("P-")]).toEqual([12, 1000, null, null, null]);
  });

  it("the next code follows the highest in use; a deleted panel's code is not handed out again", () => {
    expect(nextCode([])).toBe("P-001");
    expect(nextCode(["P-001", "P-003", undefined, "custom"])).toBe("P-004");
    expect(nextCodes(["P-009"], 3)).toEqual(["P-010", "P-011", "P-012"]);
  });

  it("sort by their number, other labels after them", () => {
    expect(["P-010", "wall panel", "P-002", "P-1000", "P-099"].sort(compareLabels)).toEqual(["P-002", "P-010", "P-099", "P-1000", "wall panel"]);
  });
});

describe("lengths in messages", () => {
  it("read in millimetres to a tenth, never as 0 when there is something", () => {
    expect([formatMm(0.04), formatMm(1.2), formatMm(0.0495), formatMm(0.0361), formatMm(0), formatMm(2e-6)]).toEqual(["40", "1200", "49.5", "36.1", "0", "<0.1"]);
  });
});
