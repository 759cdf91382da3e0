import { beforeAll, describe, expect, it } from "vitest";
import { octaveName } from "@/lib/rooms/octaves";
import { renderSubmittalPdf } from "@/lib/documents";
import { buildSnapshot, freezeSnapshot, type SubmittalSnapshot } from "@/lib/submittals";
import { BASS_SPEC, placementRow, smallRoomSource } from "../../support/submittal-rows";
import { pdfPages } from "../../support/pdf-text";

// Revision B of the small practice room: P-002 moved, P-003 removed, P-004 added, the bass
// panel's cavity cut from 200 to 150 mm, and the room now requires A2-s1,d0.
let a: SubmittalSnapshot;
let b: SubmittalSnapshot;
let text: string;

beforeAll(async () => {
  a = buildSnapshot(smallRoomSource());
  const src = smallRoomSource();
  src.placements = [src.placements[0], { ...src.placements[1], x: 1.3 }, placementRow("b-wall-a", "P-004", "bu-bass", { x: 2.6, y: 0.9 }, 3)];
  src.buildUps = src.buildUps.map((u) => (u.id === "bu-bass" ? { ...u, spec: JSON.stringify({ ...BASS_SPEC, cavity: { depth: 0.15, partitioned: true } }) } : u));
  src.fire = { project: "B-s1,d0", room: "A2-s1,d0" };
  src.revision = { letter: "B", issuedAt: "2026-03-09T10:00:00Z" };
  src.previous = { snapshot: a, hash: freezeSnapshot(a).hash };
  b = buildSnapshot(src);
  text = (await pdfPages(await renderSubmittalPdf(b))).join("\n");
}, 180_000);

describe("revision B's submittal lists what changed since A", () => {
  it("names the earlier revision and its snapshot on the cover", () => {
    expect(text).toContain(`PREVIOUS REVISION A, snapshot ${freezeSnapshot(a).hash}`);
    expect(text).toContain(`What changed since revision A Compared with revision A (snapshot ${freezeSnapshot(a).hash}).`);
  });

  it("lists the schedule's changed fields with both values", () => {
    expect(text).toContain("T1 Bass panel cavity depth 200 mm 150 mm");
    const helmholtz = b.changes!.schedule.changed[0].fields.find((f) => f.field === "helmholtzHz")!;
    expect(text).toContain(`T1 Bass panel Helmholtz estimate ${(helmholtz.before as number).toFixed(0)} Hz ${(helmholtz.after as number).toFixed(0)} Hz`);
  });

  it("lists panels added, removed and moved by code", () => {
    expect(text).toContain("Added: P-004 on Wall A (length).");
    expect(text).toContain("Removed: P-003 on Wall A (length).");
    expect(text).toContain("Moved: P-002 on Wall A (length).");
  });

  it("gives the check's octave values in both revisions, from the two snapshots", () => {
    if (!a.check.ok || !b.check.ok) throw new Error("the check should run");
    for (let i = 1; i < a.check.octaves.length; i++) {
      const before = a.check.octaves[i].after!.sabine;
      const after = b.check.octaves[i].after!.sabine;
      const f = a.check.octaves[i].f;
      const name = octaveName(f);
      const delta = after - before;
      expect(text).toContain(`${name} ${before.toFixed(2)} s ${after.toFixed(2)} s ${delta >= 0 ? "+" : "−"}${Math.abs(delta).toFixed(2)} s`);
    }
  });

  it("lists the room's changed requirement", () => {
    expect(text).toContain("required fire class B-s1,d0 A2-s1,d0");
  });
});

describe("a submittal in imperial units", () => {
  it("writes lengths in feet and inches through lib/units.ts", async () => {
    const text = (await pdfPages(await renderSubmittalPdf(a, { units: "imperial" }))).join("\n");
    // Wall A is 6 × 3 m: 6 / 0.0254 = 236.22 in, to the nearest sixteenth 236 1/4 in = 19 ft 8 1/4 in;
    // 3 m = 118.11 in, 118 1/8 in = 9 ft 10 1/8 in (the international inch, 25.4 mm exactly).
    expect(text).toContain("Wall A (length) 19 ft 8 1/4 in × 9 ft 10 1/8 in");
    // The open pin at 3 m, 2.5 m: 2.5 m = 98.425 in, to the nearest sixteenth 98 7/16 in = 8 ft 2 7/16 in.
    expect(text).toContain("Pin 1 on Wall A (length) at 9 ft 10 1/8 in, 8 ft 2 7/16 in from the datum");
    // Hole and pitch at a fabricator's precision: 8 mm = 0.31496 in and 40 mm = 1.57480 in, neither a
    // whole 64th, so decimal inches to 0.001 in.
    expect(text).toContain("Ø0.315 in holes at 1.575 in, square");
    expect(text).not.toMatch(/\d mm\b/);
  }, 120_000);
});
