/**
 * What changed between two revisions of a room's submittal: schedule rows added, removed or
 * changed (field by field), panels added, removed, moved or resized, the check's predicted
 * reverberation time per octave before (the earlier revision) and after (this one), the room's
 * own inputs, the fire findings and the open pins. Values stay raw (metres, hertz, seconds) with
 * a kind that says how to print them, so each document formats them in its reader's units.
 */
import type { FireStatus } from "@/lib/fire";
import type { ScheduleRow, SnapshotBuildUp, SubmittalSnapshot } from "./snapshot";

export type ChangeValueKind = "text" | "length" | "area" | "volume" | "count" | "hz" | "alpha" | "ratio" | "flow" | "celsius" | "percent";
export type ChangeValue = string | number | boolean | null;

export interface FieldChange {
  field: string;
  label: string;
  kind: ChangeValueKind;
  before: ChangeValue;
  after: ChangeValue;
}

export interface ScheduleRowBrief {
  buildUpId: string;
  code: string;
  name: string;
  count: number;
  area: number;
}

export interface PlacementRef {
  code: string;
  surfaceKey: string;
}

export interface ChangeList {
  from: string;
  to: string;
  schedule: { added: ScheduleRowBrief[]; removed: ScheduleRowBrief[]; changed: (ScheduleRowBrief & { fields: FieldChange[] })[] };
  placements: { added: PlacementRef[]; removed: PlacementRef[]; changed: (PlacementRef & { what: ("moved" | "resized" | "build-up")[] })[] };
  /** the predicted time after treatment, by each revision's method, s */
  check: { f: number; before: number | null; after: number | null; statusBefore: string; statusAfter: string }[];
  mean: { before: number | null; after: number | null } | null;
  room: FieldChange[];
  fire: { buildUpId: string; code: string; name: string; before: FireStatus | null; after: FireStatus | null }[];
  pins: { before: number; after: number };
}

type Entry = [field: string, label: string, kind: ChangeValueKind, value: ChangeValue];

function buildUpEntries(b: SnapshotBuildUp, row: ScheduleRow): Entry[] {
  const f = b.spec.facing;
  const holes = f.kind !== "slots";
  const infill = b.spec.infill ?? null;
  const e = b.evaluation;
  return [
    ["name", "name", "text", b.name],
    ["facing.kind", "facing", "text", f.kind],
    ["facing.thickness", "plate thickness", "length", f.thickness],
    ["facing.holeDiameter", "hole diameter", "length", holes ? f.holeDiameter : null],
    ["facing.pitch", "pitch", "length", holes ? f.pitch : null],
    ["facing.grid", "grid", "text", holes ? f.grid : null],
    ["facing.slotWidth", "slot width", "length", holes ? null : f.slotWidth],
    ["facing.slotPitch", "slot pitch", "length", holes ? null : f.slotPitch],
    ["cavity.depth", "cavity depth", "length", b.spec.cavity.depth],
    ["cavity.partitioned", "cavity", "text", b.spec.cavity.partitioned ? "partitioned" : "open"],
    ["infill.thickness", "infill thickness", "length", infill?.thickness ?? null],
    ["infill.flowResistivity", "infill flow resistivity", "flow", infill?.flowResistivity ?? null],
    ["module.width", "module width", "length", b.module.width],
    ["module.height", "module height", "length", b.module.height],
    ["borders.x", "side border", "length", b.borders.x],
    ["borders.y", "top and bottom border", "length", b.borders.y],
    ["openArea", "open area", "ratio", e.openArea],
    ["helmholtzHz", "Helmholtz estimate", "hz", e.helmholtzHz],
    ["peakHz", "peak", "hz", e.peakHz],
    ["alphaW", "αw", "alpha", e.ratings.alphaW],
    ["shape", "shape indicators", "text", e.ratings.shape],
    ["class", "absorption class", "text", e.ratings.class],
    ["nrc", "NRC", "alpha", e.ratings.nrc],
    ["fire", "declared fire class", "text", b.fire.declared],
    ["count", "panels", "count", row.count],
    ["area", "area", "area", row.area],
  ];
}

function changedFields(before: Entry[], after: Entry[]): FieldChange[] {
  const old = new Map(before.map((e) => [e[0], e]));
  return after.flatMap(([field, label, kind, value]) => {
    const was = old.get(field)?.[3] ?? null;
    return was === value ? [] : [{ field, label, kind, before: was, after: value }];
  });
}

const brief = (r: ScheduleRow): ScheduleRowBrief => ({ buildUpId: r.buildUpId, code: r.code, name: r.name, count: r.count, area: r.area });

function scheduleChanges(a: SubmittalSnapshot, b: SubmittalSnapshot): ChangeList["schedule"] {
  const before = new Map(a.schedule.map((r) => [r.buildUpId, r]));
  const after = new Map(b.schedule.map((r) => [r.buildUpId, r]));
  const buildUpOf = (s: SubmittalSnapshot, id: string) => s.buildUps.find((x) => x.id === id)!;
  const changed = b.schedule.flatMap((row) => {
    const old = before.get(row.buildUpId);
    if (!old) return [];
    const fields = changedFields(buildUpEntries(buildUpOf(a, old.buildUpId), old), buildUpEntries(buildUpOf(b, row.buildUpId), row));
    return fields.length ? [{ ...brief(row), fields }] : [];
  });
  return {
    added: b.schedule.filter((r) => !before.has(r.buildUpId)).map(brief),
    removed: a.schedule.filter((r) => !after.has(r.buildUpId)).map(brief),
    changed,
  };
}

function placementChanges(a: SubmittalSnapshot, b: SubmittalSnapshot): ChangeList["placements"] {
  // Panels are matched by surface and code: the code is what drawings print, and codes are never reused.
  const key = (p: PlacementRef) => `${p.surfaceKey}\u0000${p.code}`;
  const before = new Map(a.placements.map((p) => [key(p), p]));
  const after = new Set(b.placements.map(key));
  const ref = (p: PlacementRef): PlacementRef => ({ code: p.code, surfaceKey: p.surfaceKey });
  const changed = b.placements.flatMap((p) => {
    const old = before.get(key(p));
    if (!old) return [];
    const what: ("moved" | "resized" | "build-up")[] = [];
    if (old.x !== p.x || old.y !== p.y) what.push("moved");
    if (old.width !== p.width || old.height !== p.height) what.push("resized");
    if (old.buildUpId !== p.buildUpId) what.push("build-up");
    return what.length ? [{ ...ref(p), what }] : [];
  });
  return { added: b.placements.filter((p) => !before.has(key(p))).map(ref), removed: a.placements.filter((p) => !after.has(key(p))).map(ref), changed };
}

function predicted(s: SubmittalSnapshot): Map<number, { seconds: number | null; status: string }> {
  if (!s.check.ok) return new Map();
  const method = s.check.method;
  return new Map(s.check.octaves.map((o) => [o.f, { seconds: o.after ? o.after[method] : null, status: o.status }]));
}

function checkChanges(a: SubmittalSnapshot, b: SubmittalSnapshot): ChangeList["check"] {
  const before = predicted(a);
  const after = predicted(b);
  const octaves = [...new Set([...before.keys(), ...after.keys()])].sort((x, y) => x - y);
  return octaves.map((f) => ({
    f,
    before: before.get(f)?.seconds ?? null,
    after: after.get(f)?.seconds ?? null,
    statusBefore: before.get(f)?.status ?? "no data",
    statusAfter: after.get(f)?.status ?? "no data",
  }));
}

function roomEntries(s: SubmittalSnapshot): Entry[] {
  const r = s.room;
  return [
    ["room.name", "room name", "text", r.name],
    ["room.use", "use", "text", r.use],
    ["room.length", "length", "length", r.length],
    ["room.width", "width", "length", r.width],
    ["room.height", "height", "length", r.height],
    ["room.volume", "volume", "volume", r.volume],
    ["room.air.temperature", "air temperature", "celsius", r.air.temperature],
    ["room.air.humidity", "relative humidity", "percent", r.air.humidity],
    ["target", "target", "text", s.target?.label ?? null],
    ["fire.required", "required fire class", "text", s.fire.required],
    ...s.surfaces.flatMap((surface): Entry[] => [
      [`surfaces.${surface.key}.finish`, `${surface.name}: finish`, "text", surface.finish.name],
      [`surfaces.${surface.key}.openings`, `${surface.name}: openings`, "count", surface.openings.length],
    ]),
  ];
}

function fireChanges(a: SubmittalSnapshot, b: SubmittalSnapshot): ChangeList["fire"] {
  const status = (s: SubmittalSnapshot) => new Map(s.fire.findings.map((f) => [f.buildUpId, f.finding.status]));
  const before = status(a);
  const after = status(b);
  const names = new Map([...a.buildUps, ...b.buildUps].map((x) => [x.id, x]));
  const ids = [...new Set([...before.keys(), ...after.keys()])];
  return ids
    .filter((id) => before.get(id) !== after.get(id))
    .map((id) => ({ buildUpId: id, code: names.get(id)!.code, name: names.get(id)!.name, before: before.get(id) ?? null, after: after.get(id) ?? null }));
}

/** The change list from revision `a` to the later revision `b` of the same room. */
export function diffSnapshots(a: SubmittalSnapshot, b: SubmittalSnapshot): ChangeList {
  const mean = a.check.ok && b.check.ok && (a.check.mean || b.check.mean) ? { before: a.check.mean?.after ?? null, after: b.check.mean?.after ?? null } : null;
  return {
    from: a.revision.letter,
    to: b.revision.letter,
    schedule: scheduleChanges(a, b),
    placements: placementChanges(a, b),
    check: checkChanges(a, b),
    mean,
    room: changedFields(roomEntries(a), roomEntries(b)),
    fire: fireChanges(a, b),
    pins: { before: a.pins.length, after: b.pins.length },
  };
}

/** True when nothing a reader would see has changed (the check's values aside). */
export function isUnchanged(c: ChangeList): boolean {
  const { schedule, placements } = c;
  return (
    !schedule.added.length && !schedule.removed.length && !schedule.changed.length && !placements.added.length && !placements.removed.length && !placements.changed.length && !c.room.length && !c.fire.length
  );
}
