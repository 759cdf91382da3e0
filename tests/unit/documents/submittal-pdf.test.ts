import { beforeAll, describe, expect, it } from "vitest";
import { octaveName } from "@/lib/rooms/octaves";
import { renderSubmittalPdf } from "@/lib/documents";
import { treatedArea } from "@/lib/board/treated-area";
import { fieldsFromRows, panelAlphaOf, runCheck, surfacesFor } from "@/lib/room-model";
import { runEvaluate, type EvaluateInput } from "@/lib/acoustics/contract";
import { buildSnapshot, freezeSnapshot, readSnapshot, type SnapshotSource, type SubmittalSnapshot } from "@/lib/submittals";
import { demoRehearsalSource } from "../../support/demo-room";
import { sameBytes } from "../../support/bytes";
import { pdfPages } from "../../support/pdf-text";

// The demo rehearsal room, seeded into a real temporary SQLite database and read back as rows.
let source: SnapshotSource;
let snapshot: SubmittalSnapshot;
let pdf: Uint8Array;
let text: string;

beforeAll(async () => {
  source = await demoRehearsalSource();
  snapshot = buildSnapshot(source);
  pdf = await renderSubmittalPdf(snapshot);
  text = (await pdfPages(pdf)).join("\n");
}, 180_000);

/** The check as the Check screen runs it on the same rows (lib/room-model.ts), not through the snapshot. */
function checkFromRows() {
  const fields = fieldsFromRows(source.room, source.surfaces, source.openings, source.treatments);
  const keyOf = new Map(source.surfaces.map((s) => [s.id, s.key]));
  const surfaces = surfacesFor(fields);
  const shapeOf = new Map(surfaces.map((s) => [s.key, s]));
  const boards = source.boards.map((b) => ({ surfaceKey: keyOf.get(b.surfaceId)!, surface: shapeOf.get(keyOf.get(b.surfaceId)!)!, placements: source.placements.filter((p) => p.boardId === b.id) }));
  const panels = new Map(source.buildUps.map((b) => [b.id, panelAlphaOf(b)]));
  const { check } = runCheck({ fields, surfaces, treatments: [...fields.treatments, ...treatedArea(boards)], panels, lookup: (key) => source.materials(key)?.alpha });
  if (!check.ok) throw new Error("the demo room's check should run");
  return check;
}

describe("the submittal PDF of the demo rehearsal room", () => {
  it("is the same file, byte for byte, when rendered again from the snapshot read back from its stored text", async () => {
    const stored = freezeSnapshot(snapshot);
    const again = await renderSubmittalPdf(readSnapshot(stored.json));
    expect(again.length).toBe(pdf.length);
    expect(sameBytes(again, pdf)).toBe(true);
  }, 120_000);

  it("prints the snapshot's hash, the revision and the issue date on the cover", () => {
    const hash = freezeSnapshot(snapshot).hash;
    expect(text).toContain(`SNAPSHOT SHA-256 ${hash}`);
    expect(text).toContain("Rehearsal room Issued for the client's decision, 2 March 2026, 10:15 UTC");
    expect(text).toContain("REVISION A");
    expect(text).toContain("CONSULTANT Clara Consultant (fictional), Lantern Acoustics Studio (fictional consultancy)");
  });

  it("prints the check's octave values as the engine computes them from the same rows", () => {
    const check = checkFromRows();
    for (const o of check.octaves) {
      const name = octaveName(o.f);
      const band = o.target.low !== null && o.target.high !== null ? `${o.target.low.toFixed(2)} to ${o.target.high.toFixed(2)} s` : "–";
      const s = (v: number | undefined) => (v === undefined ? "–" : `${v.toFixed(2)} s`);
      expect(text).toContain(`${name} ${band} ${s(o.before?.sabine)} ${s(o.after?.sabine)} ${s(o.after?.eyring)}`);
    }
    // The demo room has no 63 Hz data; its 125 Hz boom is treated into the band.
    expect(text).toContain("63 Hz 0.64 to 2.18 s – – – no data");
  });

  it("prints each schedule row as the snapshot holds it and the engine computes it", () => {
    for (const row of snapshot.schedule) {
      const b = source.buildUps.find((x) => x.id === row.buildUpId)!;
      const e = runEvaluate(JSON.parse(b.spec) as EvaluateInput);
      const area = `${Number(row.area.toFixed(1)).toLocaleString("en-GB")} m²`;
      const hz = (f: number) => (f >= 1000 ? `${(f / 1000).toFixed(2)} kHz` : `${f.toFixed(0)} Hz`);
      expect(text).toContain(`${row.code} ${b.name}`);
      expect(text).toContain(`${(e.openArea * 100).toFixed(2)} % ${hz(e.helmholtzHz)} ${hz(e.peakHz)}`);
      expect(text).toMatch(new RegExp(`${e.ratings.alphaW.toFixed(2)} \\( ?${e.ratings.shape}\\) ${e.ratings.class} ${e.ratings.nrc.toFixed(2)} ${row.count} ${area}`));
    }
    // By hand from the seed: 2 rows × 15 bass panels of 0.6 × 1.2 m = 21.6 m² placed, plus 14.4 m² by area.
    expect(snapshot.schedule[0]).toMatchObject({ code: "T1", name: "Bass panel, rehearsal room", count: 30, area: 36 });
  });

  it("says which build-up falls short of the required fire class, and defers to the code", () => {
    expect(text).toContain("T1 Bass panel, rehearsal room B-s2,d0 (EN 13501-1) none on file B-s1,d0 lower than required");
    expect(text).toContain("T1: Declared B-s2,d0 is lower than the required B-s1,d0: smoke class s2 against s1.");
    expect(text).toContain("the governing code and the authority having jurisdiction");
  });

  it("cautions about the ceiling panels and the high-level wall panels", () => {
    expect(text).toContain("High-level panels: P-016, P-017");
    expect(text).toMatch(/Panels on the ceiling; wall panels whose top is above 2\.4 m: P-016/);
  });

  it("draws the treated elevation to scale with its panel codes", () => {
    expect(text).toContain("Wall A (length)");
    expect(text).toContain("Scale 1:50 when printed at 100 % on A4");
    for (const code of ["P-001", "P-015", "P-030"]) expect(text).toContain(code);
  });
});
