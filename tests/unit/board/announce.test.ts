import { describe, expect, it } from "vitest";
import { checkAnnouncement, notCountedWords, rulesAnnouncement, selectionAnnouncement, surfaceDescription } from "@/lib/board/announce";
import type { CheckResult } from "@/lib/rooms/check";
import type { RuleBreak } from "@/lib/board/rules";

const account = { placed: 2.16, counted: 1.44, outside: 0, overlapping: 0.36, overOpenings: 0.36 };

describe("what the board announces", () => {
  it("a selected panel's size and set-out, in the person's units", () => {
    const p = { id: "a", code: "P-004", buildUpId: "b", x: 0.3, y: 0.9, width: 0.6, height: 0.45 };
    expect(selectionAnnouncement([p], "metric")).toBe("P-004 selected: 600 mm wide, 450 mm high, 300 mm from the left, 900 mm above the datum.");
    expect(selectionAnnouncement([], "metric")).toBe("No panel selected.");
    expect(selectionAnnouncement([p, { ...p, id: "b" }], "imperial")).toBe("2 panels selected.");
  });

  it("the rules, the first three in full", () => {
    const b = (message: string): RuleBreak => ({ rule: "overlap", placementIds: [], severity: "error", message });
    expect(rulesAnnouncement([])).toBe("Every panel keeps the rules.");
    expect(rulesAnnouncement([b("P-001 overlaps P-002."), b("two"), b("three"), b("four")])).toBe("4 rules are broken: P-001 overlaps P-002; two; three; and 1 more.");
  });

  it("what was not counted, and nothing when all counts", () => {
    expect(notCountedWords(account, "metric")).toBe("0.4 m² over openings, 0.4 m² where panels overlap (counted once)");
    expect(notCountedWords({ ...account, overlapping: 0, overOpenings: 0 }, "metric")).toBe("");
  });

  it("the check: octaves within the target, the ones that are not, and the area counted", () => {
    const octave = (f: number, status: "within" | "over" | "under" | "no target", sabine: number) => ({
      f,
      target: { low: null, high: null },
      before: null,
      after: { sabine, eyring: sabine, status, excess: 0, shortfall: null },
      status,
    });
    const check = { ok: true, method: "sabine", treated: true, mean: null, sentences: [], issues: [], octaves: [octave(63, "no target", 2), octave(125, "over", 1.42), octave(250, "within", 1)] } as unknown as CheckResult;
    expect(checkAnnouncement(check, account, "metric")).toBe(
      "Check: 1 of 2 octaves within the target; 125 Hz too long at 1.42 s. 1.4 m² of panels counted on this board; not counted: 0.4 m² over openings, 0.4 m² where panels overlap (counted once).",
    );
    expect(checkAnnouncement({ ok: false, issues: [] }, account, "metric")).toBe("The check needs a complete room model.");
  });
});

describe("the surface in words", () => {
  it("gives its size and each opening's set-out from the datum", () => {
    expect(surfaceDescription("Wall B", { width: 0.9, height: 0.45, openings: [{ kind: "door", name: "Door", x: 0.3, y: 0, width: 0.2, height: 0.4 }] }, "metric")).toBe(
      "Wall B, 900 mm wide and 450 mm high, measured from its lower-left corner. Openings: Door, 200 mm wide and 400 mm high, 300 mm from the left and 0 mm above the datum.",
    );
  });
});
