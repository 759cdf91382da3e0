import { describe, expect, it } from "vitest";
import { buildSnapshot, readinessItems, unconfirmed } from "@/lib/submittals";
import { changeSentences, formatters } from "@/lib/documents";
import { placementRow, smallRoomSource } from "../../support/submittal-rows";

// What issuing asks the consultant to confirm, read from the snapshot it would freeze, on the
// small hand-made room of tests/support/submittal-rows.ts: an open pin on wall A, the bass panel
// declared B-s2,d0 where B-s1,d0 is required (smoke class s2 is worse than s1, EN 13501-1), the
// slotted panel with no class declared.
describe("what issuing asks to be confirmed", () => {
  it("lists the open pin and the two fire flags, each under a stable key", () => {
    const items = readinessItems(buildSnapshot(smallRoomSource()));
    expect(items.map((i) => [i.key, i.kind, i.severity])).toEqual([
      ["pin:wall-a:1", "pin", "warning"],
      ["fire:bu-bass:lower", "fire", "error"],
      ["fire:bu-slot:missing", "fire", "error"],
    ]);
    expect(items[0].message).toBe('Pin 1 on Wall A (length) is open: "Smoke detector above: keep clear."');
    expect(items[1].message).toMatch(/^T1 Bass panel: Declared B-s2,d0 is lower than the required B-s1,d0/);
  });

  it("adds a board rule that is broken, with the panels it concerns in its key", () => {
    const source = smallRoomSource();
    // P-004 (x 1.5 to 2.1 m, y 0.9 to 2.1 m) laid over P-002 (x 1.2 to 1.8 m at the same height)
    // and over the corner of P-003 (x from 1.9 m, y from 1.5 m).
    source.placements = [...source.placements, placementRow("b-wall-a", "P-004", "bu-bass", { x: 1.5, y: 0.9 }, 3)];
    const rules = readinessItems(buildSnapshot(source)).filter((i) => i.kind === "rule");
    expect(rules.map((r) => [r.key, r.severity])).toEqual([
      ["rule:wall-a:overlap:pl-b-wall-a-P-002+pl-b-wall-a-P-004:", "error"],
      ["rule:wall-a:overlap:pl-b-wall-a-P-003+pl-b-wall-a-P-004:", "error"],
    ]);
    expect(rules[0].message).toMatch(/^Wall A \(length\): .*P-002.*P-004/);
  });

  it("asks again about anything not among the confirmed keys", () => {
    const items = readinessItems(buildSnapshot(smallRoomSource()));
    expect(unconfirmed(items, ["pin:wall-a:1", "fire:bu-bass:lower"]).map((i) => i.key)).toEqual(["fire:bu-slot:missing"]);
    expect(unconfirmed(items, items.map((i) => i.key))).toEqual([]);
  });
});

describe("the change list in sentences, as the Submittals screen shows it", () => {
  it("names the moved and the added panel on their surface, and the schedule's new count", () => {
    const a = buildSnapshot(smallRoomSource());
    const next = smallRoomSource();
    next.revision = { letter: "B", issuedAt: "2026-03-09T09:00:00Z" };
    next.placements = next.placements.map((p) => (p.code === "P-002" ? { ...p, y: 0.5 } : p)).concat(placementRow("b-wall-a", "P-004", "bu-bass", { x: 2.6, y: 0.9 }, 3));
    const b = buildSnapshot({ ...next, previous: { snapshot: a, hash: "a".repeat(64) } });
    const lines = changeSentences(b, formatters("metric"))!;
    expect(lines).toContain("Added: P-004 on Wall A (length).");
    expect(lines).toContain("Moved: P-002 on Wall A (length).");
    expect(lines).toContain("T1 Bass panel: panels, 3 → 4.");
    expect(changeSentences(a, formatters("metric"))).toBeNull();
  });
});
