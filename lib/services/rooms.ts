import { and, asc, eq, inArray } from "drizzle-orm";
import { getDb, transaction, type Tx } from "@/db/client";
import { buildUp, opening, project, room, surface, treatment, type Room } from "@/db/schema";
import { roomFire, type BuildUpFire, type RoomFire } from "@/lib/fire";
import { roomFireSchema } from "@/lib/schemas/fire";
import { conflict, invalid, notFound } from "@/lib/errors";
import type { CheckResult } from "@/lib/rooms/check";
import { netArea, grossArea, roomVolume, type Surface } from "@/lib/rooms/geometry";
import type { Issue } from "@/lib/rooms/issues";
import type { Target } from "@/lib/rooms/targets";
import { parseInput } from "@/lib/schemas/parse";
import { roomSchemas, type RoomFields } from "@/lib/schemas/room";
import type { UnitPreference } from "@/lib/units";
import type { Actor } from "./actor";
import { authorize } from "./guard";
import { recordAudit } from "./audit";
import { materialLookup } from "./materials";
import { openPinCounts, placedPanels } from "./boards";
import { treatedArea } from "@/lib/board/treated-area";
import { checkStamps, StampedCache } from "./check-cache";
import { fieldsFromRows, geometryOf, panelAlphaOf, roomIssues, runCheck, surfacesFor, type PanelAlpha } from "@/lib/room-model";

export type RoomView = Omit<RoomFields, "surfaces"> & {
  id: string;
  projectId: string;
  version: number;
  updatedAt: string;
  volumeM3: number;
  surfaces: (RoomFields["surfaces"][number] & { grossArea: number; netArea: number })[];
  target: RoomFields["target"];
  targetResolved: Target | null;
  check: CheckResult;
  warnings: Issue[];
  /** panel area on the elevation boards that counts (inside the surface, net of openings, overlaps once), per surface and build-up */
  placed: { surfaceKey: string; buildUpId: string; area: number }[];
  openPins: number;
  /** the class the room requires (its own or the project's) against each build-up it uses */
  fire: RoomFire;
};

export type RoomSummary = Pick<RoomView, "id" | "name" | "use" | "volumeM3" | "version" | "updatedAt"> & {
  target: string | null;
  mean: { before: number | null; after: number | null; low: number | null; high: number | null; status: string } | null;
  treatedArea: number;
  openPins: number;
};

// Each build-up of the project evaluated once per request, for every room that uses it.
function projectPanels(projectId: string): Map<string, PanelAlpha> {
  return new Map(getDb().select().from(buildUp).where(eq(buildUp.projectId, projectId)).all().map((b) => [b.id, panelAlphaOf(b)]));
}

// What the fire findings need of the project: its default required class and each build-up's
// declared class, read once per request.
type ProjectFire = { required: string | null; buildUps: BuildUpFire[] };
function projectFire(projectId: string): ProjectFire {
  const db = getDb();
  return {
    required: db.select({ required: project.fireRequired }).from(project).where(eq(project.id, projectId)).get()?.required ?? null,
    buildUps: db
      .select({ id: buildUp.id, name: buildUp.name, fireStandard: buildUp.fireStandard, fireClass: buildUp.fireClass })
      .from(buildUp)
      .where(eq(buildUp.projectId, projectId))
      .orderBy(asc(buildUp.name))
      .all(),
  };
}

function loadRoom(projectId: string, roomId: string): Room {
  const row = getDb()
    .select()
    .from(room)
    .where(and(eq(room.id, roomId), eq(room.projectId, projectId)))
    .get();
  if (!row) throw notFound("Room");
  return row;
}

function storedFields(row: Room): RoomFields {
  const db = getDb();
  const surfaces = db.select().from(surface).where(eq(surface.roomId, row.id)).all();
  const openings = surfaces.length ? db.select().from(opening).where(inArray(opening.surfaceId, surfaces.map((s) => s.id))).all() : [];
  const treatments = db.select().from(treatment).where(eq(treatment.roomId, row.id)).all();
  return fieldsFromRows(row, surfaces, openings, treatments);
}

// Project-wide inputs of the check (panel band values, material lookup, pin counts) are read
// once per request and shared by every room it shows.
function view(
  row: Room,
  fields: RoomFields,
  panels: Map<string, PanelAlpha>,
  pins = openPinCounts(row.projectId),
  lookup = materialLookup(row.projectId),
  fire: ProjectFire = projectFire(row.projectId),
): RoomView {
  const surfaces = surfacesFor(fields);
  const bySurface = new Map(surfaces.map((s) => [s.key, s]));
  const placed = treatedArea(placedPanels(row.id).flatMap((b) => (bySurface.has(b.surfaceKey) ? [{ ...b, surface: bySurface.get(b.surfaceKey)! }] : [])));
  // The check counts both: treatment entered by area, and panels placed on the boards.
  const { check, target, issues } = runCheck({ fields, surfaces, treatments: [...fields.treatments, ...placed], panels, lookup });
  return {
    ...fields,
    id: row.id,
    projectId: row.projectId,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    volumeM3: roomVolume(geometryOf(fields)),
    surfaces: surfaces.map((s) => ({ ...s, name: s.name, openings: s.openings.map((o) => ({ ...o, name: o.name ?? "" })), grossArea: grossArea(s), netArea: netArea(s) })),
    targetResolved: target,
    check,
    placed,
    openPins: pins.get(row.id) ?? 0,
    fire: roomFire(
      { project: fire.required, room: row.fireRequired },
      fire.buildUps.filter((b) => fields.treatments.some((t) => t.buildUpId === b.id) || placed.some((p) => p.buildUpId === b.id)),
    ),
    warnings: [...issues, ...(check.ok ? check.issues.filter((i) => i.severity === "warning") : [])],
  };
}

// Each room's summary is kept by the stamps its check depends on (./check-cache.ts); the
// open-pin counts are read fresh. Build-ups are evaluated only if some room needs its check.
const summaries = new StampedCache<Omit<RoomSummary, "openPins">>(5000);
export const roomSummaryCacheStats = () => ({ ...summaries.stats });

export function listRooms(actor: Actor | null, projectId: string): RoomSummary[] {
  authorize(actor, projectId, "design.view");
  const stamps = checkStamps(projectId);
  const pins = openPinCounts(projectId);
  let inputs: { panels: Map<string, PanelAlpha>; lookup: ReturnType<typeof materialLookup> } | null = null;
  const shared = () => (inputs ??= { panels: projectPanels(projectId), lookup: materialLookup(projectId) });
  return getDb()
    .select()
    .from(room)
    .where(eq(room.projectId, projectId))
    .orderBy(asc(room.name))
    .all()
    .map((row) => ({ ...summaries.get(row.id, stamps.keyOf(row), () => summarize(row, shared().panels, shared().lookup)), openPins: pins.get(row.id) ?? 0 }));
}

function summarize(row: Room, panels: Map<string, PanelAlpha>, lookup: ReturnType<typeof materialLookup>): Omit<RoomSummary, "openPins"> {
  const v = view(row, storedFields(row), panels, new Map(), lookup);
  const mean = v.check.ok ? (v.check.mean ?? midFrequency(v.check.octaves)) : null;
  return {
    id: v.id,
    name: v.name,
    use: v.use,
    volumeM3: v.volumeM3,
    version: v.version,
    updatedAt: v.updatedAt,
    target: v.targetResolved?.label ?? null,
    mean: mean ? { before: mean.before, after: mean.after, low: mean.low, high: mean.high, status: mean.status } : null,
    treatedArea: [...v.treatments, ...v.placed].reduce((sum, t) => sum + t.area, 0),
  };
}

// Where the target names no mean (limits per octave, a common-practice range), the list shows
// the mean of the 500 Hz and 1 kHz octaves and the worst standing among the octaves it covers.
function midFrequency(octaves: Extract<CheckResult, { ok: true }>["octaves"]) {
  const mid = octaves.filter((o) => o.f === 500 || o.f === 1000);
  const mean = (pick: (o: (typeof mid)[number]) => number | null | undefined) => {
    const values = mid.map(pick).filter((x): x is number => typeof x === "number");
    return values.length === mid.length ? values.reduce((a, b) => a + b, 0) / values.length : null;
  };
  const judged = octaves.filter((o) => o.status === "over" || o.status === "under" || o.status === "within");
  const status = judged.some((o) => o.status === "over") ? "over" : judged.some((o) => o.status === "under") ? "under" : judged.length ? "within" : "no target";
  const highs = mid.map((o) => o.target.high).filter((x): x is number => x !== null);
  return { before: mean((o) => o.before?.sabine), after: mean((o) => o.after?.sabine), low: null, high: highs.length ? Math.min(...highs) : null, status };
}

export function getRoom(actor: Actor | null, projectId: string, roomId: string): RoomView {
  authorize(actor, projectId, "design.view");
  const row = loadRoom(projectId, roomId);
  return view(row, storedFields(row), projectPanels(projectId));
}

// What the room's numbers must satisfy together, in the person's units.
function validated(projectId: string, fields: RoomFields, units: UnitPreference): { surfaces: Surface[]; panels: Map<string, PanelAlpha> } {
  const panels = projectPanels(projectId);
  const surfaces = surfacesFor(fields);
  const errors = roomIssues(fields, surfaces, panels, materialLookup(projectId), units).filter((i) => i.severity === "error");
  if (errors.length) throw invalid(errors.map((e) => ({ field: e.field, message: e.message })));
  return { surfaces, panels };
}

function roomColumns(fields: RoomFields) {
  const shoebox = fields.shape === "shoebox";
  return {
    name: fields.name,
    use: fields.use,
    shape: fields.shape,
    length: shoebox ? fields.length : null,
    width: shoebox ? fields.width : null,
    height: shoebox ? fields.height : null,
    volume: roomVolume(geometryOf(fields)),
    temperature: fields.temperature,
    humidity: fields.humidity,
    pressure: fields.pressure,
    target: fields.target ? JSON.stringify(fields.target) : null,
  };
}

// Surfaces are kept by key (so their ids, and what hangs on them later, survive); openings
// and treatments are written anew with the room.
function writeChildren(tx: Tx, roomId: string, surfaces: Surface[], treatments: RoomFields["treatments"]) {
  const existing = new Map(tx.select().from(surface).where(eq(surface.roomId, roomId)).all().map((s) => [s.key, s]));
  const keep = new Set(surfaces.map((s) => s.key));
  for (const [key, row] of existing) if (!keep.has(key)) tx.delete(surface).where(eq(surface.id, row.id)).run();
  surfaces.forEach((s, position) => {
    const values = { key: s.key, name: s.name, kind: s.kind, width: s.width, height: s.height, finish: s.finish, position };
    const row = existing.get(s.key);
    const id = row
      ? (tx.update(surface).set(values).where(eq(surface.id, row.id)).run(), row.id)
      : tx.insert(surface).values({ roomId, ...values }).returning({ id: surface.id }).get().id;
    tx.delete(opening).where(eq(opening.surfaceId, id)).run();
    s.openings.forEach((o, i) =>
      tx.insert(opening).values({ surfaceId: id, kind: o.kind, name: o.name ?? "", x: o.x, y: o.y, width: o.width, height: o.height, material: o.material, position: i }).run(),
    );
  });
  tx.delete(treatment).where(eq(treatment.roomId, roomId)).run();
  for (const t of treatments) tx.insert(treatment).values({ roomId, surfaceKey: t.surfaceKey, buildUpId: t.buildUpId, area: t.area }).run();
}

export function createRoom(actor: Actor | null, projectId: string, raw: unknown): RoomView {
  const access = authorize(actor, projectId, "design.edit");
  const units = access.actor.unitPreference;
  const fields = parseInput(roomSchemas(units).create, raw);
  const { surfaces, panels } = validated(projectId, fields, units);
  const row = transaction((tx) => {
    const row = tx.insert(room).values({ projectId, ...roomColumns(fields) }).returning().get();
    writeChildren(tx, row.id, surfaces, fields.treatments);
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "room.created", subjectId: row.id, detail: { name: row.name } });
    return row;
  });
  return view(row, storedFields(row), panels);
}

export function updateRoom(actor: Actor | null, projectId: string, roomId: string, raw: unknown): RoomView {
  const access = authorize(actor, projectId, "design.edit");
  const current = loadRoom(projectId, roomId);
  const units = access.actor.unitPreference;
  const input = parseInput(roomSchemas(units).update, raw);
  const { version, ...fields } = input;
  const { surfaces, panels } = validated(projectId, fields, units);
  const row = transaction((tx) => {
    // Only the version the editor started from may be replaced, so two editors never
    // silently overwrite each other; a stale save changes nothing.
    const updated = tx
      .update(room)
      .set({ ...roomColumns(fields), version: version + 1 })
      .where(and(eq(room.id, roomId), eq(room.version, version)))
      .returning()
      .get();
    if (!updated) {
      throw conflict(`"${current.name}" was changed by someone else since you opened it (now version ${current.version}). Reload it to see their changes; nothing of yours was saved.`, "version");
    }
    writeChildren(tx, roomId, surfaces, fields.treatments);
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "room.updated", subjectId: roomId, detail: { version: updated.version } });
    return updated;
  });
  return view(row, storedFields(row), panels);
}

export function deleteRoom(actor: Actor | null, projectId: string, roomId: string): { id: string; deleted: true } {
  const access = authorize(actor, projectId, "design.edit");
  const current = loadRoom(projectId, roomId);
  transaction((tx) => {
    tx.delete(room).where(eq(room.id, roomId)).run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "room.deleted", subjectId: roomId, detail: { name: current.name } });
  });
  return { id: roomId, deleted: true };
}

// The class this room requires, overriding the project's default; null returns to the default.
export function setRoomFire(actor: Actor | null, projectId: string, roomId: string, raw: unknown): RoomView {
  const access = authorize(actor, projectId, "design.edit");
  const current = loadRoom(projectId, roomId);
  const { fireRequired } = parseInput(roomFireSchema, raw);
  transaction((tx) => {
    tx.update(room).set({ fireRequired }).where(eq(room.id, roomId)).run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "room.fire-required", subjectId: roomId, detail: { from: current.fireRequired, to: fireRequired } });
  });
  return getRoom(actor, projectId, roomId);
}
