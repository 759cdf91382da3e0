import { describe, expect, it } from "vitest";
import { runEvaluate, type EvaluateInput } from "@/lib/acoustics/contract";
import { fieldsFromRows, runCheck, surfacesFor } from "@/lib/room-model";
import { octaveAlphaFromBands } from "@/lib/rooms/octaves";
import { findMaterial } from "@/lib/rooms/materials-library";
import { buildSnapshot, freezeSnapshot, readSnapshot, type SnapshotPattern } from "@/lib/submittals";
import { BASS_SPEC, SLOT_SPEC, smallRoomSource } from "../../support/submittal-rows";

const mm = (m: number) => Math.round(m * 1e7) / 1e4;

describe("buildSnapshot of a small room", () => {
  const snapshot = buildSnapshot(smallRoomSource());

  it("keeps only the build-ups the room uses, coded by name", () => {
    expect(snapshot.buildUps.map((b) => [b.code, b.name])).toEqual([
      ["T1", "Bass panel"],
      ["T2", "Slotted panel"],
    ]);
  });

  it("schedules each build-up's count and area (worked by hand)", () => {
    // Three 0.6 × 1.2 m bass panels: 3 · 0.72 = 2.16 m²; the slotted panel is 10 m² by area only.
    expect(snapshot.schedule).toEqual([
      { buildUpId: "bu-bass", code: "T1", name: "Bass panel", count: 3, placedArea: 2.16, areaOnly: 0, area: 2.16, surfaces: ["wall-a"] },
      { buildUpId: "bu-slot", code: "T2", name: "Slotted panel", count: 0, placedArea: 0, areaOnly: 10, area: 10, surfaces: ["ceiling"] },
    ]);
  });

  it("lays out the holes of a 600 × 1200 mm panel with 40 mm borders, Ø8 mm at 40 mm square (worked by hand)", () => {
    const t1 = snapshot.panelTypes[0];
    const p = t1.pattern as Extract<SnapshotPattern, { kind: "holes" }>;
    // Field 520 × 1120 mm. Columns floor((520 − 8) / 40) + 1 = 13; rows floor((1120 − 8) / 40) + 1 = 28.
    expect([t1.code, t1.count, p.columnsEven, p.rows, p.holeCount]).toEqual(["T1", 3, 13, 28, 364]);
    // 13 holes span 12 · 40 + 8 = 488 mm of 520: 16 mm spare each side, first centre 40 + 16 + 4 = 60 mm;
    // 28 rows span 27 · 40 + 8 = 1088 mm of 1120: the same 16 mm, first row at 60 mm.
    expect([mm(p.firstX), mm(p.firstY)]).toEqual([60, 60]);
    // Open area over the whole panel: 364 · π · 8² / 4 = 18 296.6 mm² of 720 000 mm² = 0.025 412.
    expect(t1.panelOpenArea).toBeCloseTo(0.025412, 6);
  });

  it("lays out a slotted module that is not placed, at its module size (worked by hand)", () => {
    const t2 = snapshot.panelTypes[1];
    const p = t2.pattern as Extract<SnapshotPattern, { kind: "slots" }>;
    // 600 × 2400 mm, borders 30 / 50 mm: field 540 × 2300 mm. Slots 4 mm at 32 mm:
    // floor((540 − 4) / 32) + 1 = 17; span 16 · 32 + 4 = 516 mm, 12 mm spare each side,
    // first slot's centre line at 30 + 12 + 2 = 44 mm; each slot runs the field's 2300 mm.
    expect([t2.code, t2.count, p.slotCount, mm(p.first), mm(p.slotLength)]).toEqual(["T2", 0, 17, 44, 2300]);
    // 17 · 4 · 2300 = 156 400 mm² of 1 440 000 mm² = 0.108 611.
    expect(t2.panelOpenArea).toBeCloseTo(0.108611, 6);
  });

  it("gives each placement its type, set-out from the surface's datum and size", () => {
    expect(snapshot.placements.map((p) => [p.code, p.surfaceKey, p.type, p.x, p.y, p.width, p.height])).toEqual([
      ["P-001", "wall-a", "T1", 0.5, 0.9, 0.6, 1.2],
      ["P-002", "wall-a", "T1", 1.2, 0.9, 0.6, 1.2],
      ["P-003", "wall-a", "T1", 1.9, 1.5, 0.6, 1.2],
    ]);
  });

  it("carries the engine's evaluation of each build-up", () => {
    expect(snapshot.buildUps[0].evaluation).toEqual(runEvaluate(BASS_SPEC as EvaluateInput));
    expect(snapshot.buildUps[1].evaluation).toEqual(runEvaluate(SLOT_SPEC as EvaluateInput));
  });

  it("carries the same check the Check screen runs on the same rows", () => {
    const src = smallRoomSource();
    const fields = fieldsFromRows(src.room, src.surfaces, src.openings, src.treatments);
    const bass = { name: "Bass panel", alpha: octaveAlphaFromBands(runEvaluate(BASS_SPEC as EvaluateInput).octaves) };
    const slot = { name: "Slotted panel", alpha: octaveAlphaFromBands(runEvaluate(SLOT_SPEC as EvaluateInput).octaves) };
    const { check } = runCheck({
      fields,
      surfaces: surfacesFor(fields),
      treatments: [...fields.treatments, { surfaceKey: "wall-a", buildUpId: "bu-bass", area: 3 * 0.72 }],
      panels: new Map([
        ["bu-bass", bass],
        ["bu-slot", slot],
      ]),
      lookup: (key) => findMaterial(key)?.alpha,
    });
    if (!check.ok || !snapshot.check.ok) throw new Error("the check should run");
    expect(snapshot.check.treated).toBe(true);
    // 63 Hz has no data (the library's finishes give no value there): null in both.
    expect(snapshot.check.octaves[0].after).toBeNull();
    expect(check.octaves[0].after).toBeNull();
    snapshot.check.octaves.slice(1).forEach((o, i) => {
      const direct = check.octaves[i + 1];
      expect(o.f).toBe(direct.f);
      expect(o.after!.sabine).toBeCloseTo(direct.after!.sabine, 9);
      expect(o.before!.eyring).toBeCloseTo(direct.before!.eyring, 9);
      expect(o.status).toBe(direct.status);
    });
  });

  it("flags fire classes against the project's required class", () => {
    expect(snapshot.fire.required).toBe("B-s1,d0");
    expect(snapshot.fire.requiredFrom).toBe("project");
    expect(snapshot.fire.findings.map((f) => [f.buildUpId, f.finding.status])).toEqual([
      ["bu-bass", "lower"],
      ["bu-slot", "missing"],
    ]);
  });

  it("notes the cautions: a treated ceiling and a wall panel whose top is above 2.4 m", () => {
    // P-003: 1.5 + 1.2 = 2.7 m; P-001 and P-002 top out at 0.9 + 1.2 = 2.1 m.
    expect(snapshot.cautions).toEqual({ ceilings: ["ceiling"], highLevelPanels: ["P-003"], highLevel: 2.4 });
  });

  it("lists open pins only, with their authors", () => {
    expect(snapshot.pins).toEqual([{ surfaceKey: "wall-a", number: 1, x: 3, y: 2.5, body: "Smoke detector above: keep clear.", author: "Alex Architect (fictional)" }]);
  });

  it("is the same snapshot, with the same hash, whatever order the rows come in", () => {
    const src = smallRoomSource();
    const shuffled = {
      ...src,
      surfaces: [...src.surfaces].reverse(),
      placements: [...src.placements].reverse(),
      buildUps: [...src.buildUps].reverse(),
      pins: [...src.pins].reverse(),
    };
    expect(freezeSnapshot(buildSnapshot(shuffled)).hash).toBe(freezeSnapshot(snapshot).hash);
  });

  it("reads back from its stored text to the same value", () => {
    const frozen = freezeSnapshot(snapshot);
    expect(frozen.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(readSnapshot(frozen.json)).toEqual(snapshot);
    expect(() => readSnapshot(frozen.json.replace('"version":1', '"version":99'))).toThrow("version 99 cannot be read");
  });

  it("changes its hash when a value changes", () => {
    const src = smallRoomSource();
    src.placements[0] = { ...src.placements[0], x: 0.51 };
    expect(freezeSnapshot(buildSnapshot(src)).hash).not.toBe(freezeSnapshot(snapshot).hash);
  });
});
