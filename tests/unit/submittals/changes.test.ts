import { describe, expect, it } from "vitest";
import { buildSnapshot, diffSnapshots, freezeSnapshot, isUnchanged } from "@/lib/submittals";
import { BASS_SPEC, placementRow, smallRoomSource } from "../../support/submittal-rows";

// Revision A: three bass panels on wall A and 10 m² of slotted panels on the ceiling.
// Revision B: P-002 moved 100 mm right, P-003 removed, P-004 added, the bass panel's cavity cut
// from 200 to 150 mm, 12 m² on the ceiling instead of 10, and the room requires A2-s1,d0.
function revisions() {
  const a = smallRoomSource();
  const first = buildSnapshot(a);
  const b = smallRoomSource();
  b.placements = [
    b.placements[0],
    { ...b.placements[1], x: 1.3 },
    placementRow("b-wall-a", "P-004", "bu-bass", { x: 2.6, y: 0.9 }, 3),
  ];
  b.buildUps = b.buildUps.map((u) => (u.id === "bu-bass" ? { ...u, spec: JSON.stringify({ ...BASS_SPEC, cavity: { depth: 0.15, partitioned: true } }) } : u));
  b.treatments = [{ ...b.treatments[0], area: 12 }];
  b.fire = { project: "B-s1,d0", room: "A2-s1,d0" };
  b.revision = { letter: "B", issuedAt: "2026-03-09T10:00:00Z" };
  b.previous = { snapshot: first, hash: freezeSnapshot(first).hash };
  return { first, second: buildSnapshot(b) };
}

describe("the change list from revision A to B", () => {
  const { first, second } = revisions();
  const changes = second.changes!;

  it("is carried by the later snapshot, naming the earlier revision and its hash", () => {
    expect(first.changes).toBeNull();
    expect([changes.from, changes.to]).toEqual(["A", "B"]);
    expect(second.revision.previous).toEqual({ letter: "A", hash: freezeSnapshot(first).hash });
  });

  it("lists panels added, removed and moved by their codes", () => {
    expect(changes.placements).toEqual({
      added: [{ code: "P-004", surfaceKey: "wall-a" }],
      removed: [{ code: "P-003", surfaceKey: "wall-a" }],
      changed: [{ code: "P-002", surfaceKey: "wall-a", what: ["moved"] }],
    });
  });

  it("lists schedule rows changed, field by field, with no rows added or removed", () => {
    expect(changes.schedule.added).toEqual([]);
    expect(changes.schedule.removed).toEqual([]);
    const bass = changes.schedule.changed.find((r) => r.code === "T1")!;
    const fields = bass.fields.map((f) => f.field);
    expect(bass.fields.find((f) => f.field === "cavity.depth")).toEqual({ field: "cavity.depth", label: "cavity depth", kind: "length", before: 0.2, after: 0.15 });
    // A shallower cavity moves the resonance up: the engine's Helmholtz estimate changes with it.
    expect(fields).toContain("helmholtzHz");
    // Still three panels of the same size: count and area unchanged.
    expect(fields).not.toContain("count");
    expect(fields).not.toContain("area");
    const slot = changes.schedule.changed.find((r) => r.code === "T2")!;
    expect(slot.fields).toEqual([{ field: "area", label: "area", kind: "area", before: 10, after: 12 }]);
  });

  it("gives the check's predicted time per octave in both revisions", () => {
    expect(changes.check.map((c) => c.f)).toEqual([63, 125, 250, 500, 1000, 2000, 4000]);
    if (!first.check.ok || !second.check.ok) throw new Error("the check should run");
    const at125 = changes.check.find((c) => c.f === 125)!;
    expect(at125.before).toBe(first.check.octaves[1].after!.sabine);
    expect(at125.after).toBe(second.check.octaves[1].after!.sabine);
    expect(at125.after).not.toBe(at125.before);
  });

  it("lists the room's inputs that changed", () => {
    expect(changes.room).toEqual([{ field: "fire.required", label: "required fire class", kind: "text", before: "B-s1,d0", after: "A2-s1,d0" }]);
  });

  it("lists fire findings only where their standing changed", () => {
    // T1 (B-s2,d0) is lower than both requirements; T2 declares nothing in either revision.
    expect(changes.fire).toEqual([]);
    expect(changes.pins).toEqual({ before: 1, after: 1 });
  });

  it("between a revision and itself is empty", () => {
    const same = diffSnapshots(first, first);
    expect(isUnchanged(same)).toBe(true);
    expect(same.check.every((c) => c.before === c.after)).toBe(true);
    expect(isUnchanged(changes)).toBe(false);
  });
});
