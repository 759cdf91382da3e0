/**
 * From the stored rows of one room (as db/schema defines them) to its submittal snapshot. The
 * numbers come from the same code as the Check and the Board: lib/room-model.ts for the
 * reverberation check (treatments by area plus panels placed on the boards, as the rooms service
 * counts them), the contract's runEvaluate for each build-up, lib/board for treated area and
 * hole layouts, lib/fire for the fire findings. A service only has to load the rows and call
 * buildSnapshot; nothing here reads a database or the clock.
 */
import packageJson from "@/package.json";
import { MODEL_LIMITS } from "@/lib/acoustics/warnings";
import { runEvaluate, type EvaluateInput, type EvaluateOutput } from "@/lib/acoustics/contract";
import { treatedArea } from "@/lib/board/treated-area";
import { compareLabels } from "@/lib/board/labels";
import { fireFinding, requiredFireClass } from "@/lib/fire";
import { fieldsFromRows, geometryOf, runCheck, surfacesFor, type PanelAlpha } from "@/lib/room-model";
import { grossArea, netArea, roomVolume } from "@/lib/rooms/geometry";
import { octaveAlphaFromBands, type OctaveRecord } from "@/lib/rooms/octaves";
import type { BuildUp, Opening, Pin, Placement, Project, Room, Surface, Treatment } from "@/db/schema";
import { canonicalValue } from "./canonical";
import { diffSnapshots } from "./changes";
import { snapshotCheck, snapshotTarget } from "./check-view";
import { panelTypes, typeCodeOf } from "./panel-types";
import { SNAPSHOT_FORMAT, SNAPSHOT_VERSION, type ScheduleRow, type SnapshotBuildUp, type SnapshotPlacement, type SnapshotSurface, type SubmittalSnapshot } from "./snapshot";

/** The engine's version as snapshots record it: the app's version, which every engine change bumps. */
export const ENGINE_VERSION = `cavitas ${packageJson.version}`;

/**
 * A wall panel whose top edge is higher than this above the floor is "high-level" and gets the
 * fixing caution (SAFETY.md). A Cavitas threshold, a little above a door head; not from a code.
 */
export const HIGH_LEVEL_TOP = 2.4;

export interface MaterialInfo {
  name: string;
  alpha: OctaveRecord;
  /** where the values come from, as the library or the project material says */
  source?: string;
}

export interface SnapshotSource {
  project: Pick<Project, "id" | "name" | "reference" | "site" | "edgeClearance">;
  room: Room;
  surfaces: Surface[];
  openings: Opening[];
  treatments: Treatment[];
  /** the project's build-ups (those the room does not use are left out of the snapshot) */
  buildUps: BuildUp[];
  /** the boards of the room's surfaces and their placements */
  boards: { id: string; surfaceId: string }[];
  placements: Placement[];
  /** the pins of those boards; resolved ones are left out */
  pins: Pin[];
  /** a finish or opening material by key: the project's own first, then the library */
  materials: (key: string) => MaterialInfo | undefined;
  /** required fire class as entered for the project and for this room (the room's wins) */
  fire: { project: string | null; room: string | null };
  consultant: { name: string; firm: string | null; email?: string | null };
  revision: { letter: string; issuedAt: Date | string | null };
  previous?: { snapshot: SubmittalSnapshot; hash: string } | null;
  /** user id → name, for the authors of open pins */
  people?: ReadonlyMap<string, string>;
  /** attachment id → file name, for fire test reports */
  attachments?: ReadonlyMap<string, string>;
  engineVersion?: string;
}

function buildUpsInUse(source: SnapshotSource, used: Set<string>): { rows: SnapshotBuildUp[]; results: Map<string, EvaluateOutput> } {
  const chosen = source.buildUps.filter((b) => used.has(b.id)).sort((a, b) => compareLabels(a.name, b.name) || compareLabels(a.id, b.id));
  const results = new Map<string, EvaluateOutput>();
  const rows = chosen.map((b, i): SnapshotBuildUp => {
    const spec = JSON.parse(b.spec) as EvaluateInput;
    const evaluation = runEvaluate(spec);
    results.set(b.id, evaluation);
    return {
      id: b.id,
      code: `T${i + 1}`,
      name: b.name,
      spec,
      module: { width: b.moduleWidth, height: b.moduleHeight },
      borders: { x: b.borderX, y: b.borderY },
      facingMaterial: b.facingMaterial,
      notes: b.notes,
      fire: { standard: b.fireStandard, declared: b.fireClass, report: b.fireReportId ? (source.attachments?.get(b.fireReportId) ?? "test report on file") : null },
      evaluation,
    };
  });
  return { rows, results };
}

function scheduleOf(buildUps: SnapshotBuildUp[], placements: SnapshotPlacement[], areaOnly: SubmittalSnapshot["areaTreatments"], surfaceOrder: string[]): ScheduleRow[] {
  return buildUps.map((b) => {
    const mine = placements.filter((p) => p.buildUpId === b.id);
    const byArea = areaOnly.filter((t) => t.buildUpId === b.id);
    const placedArea = mine.reduce((sum, p) => sum + p.width * p.height, 0);
    const areaOnlySum = byArea.reduce((sum, t) => sum + t.area, 0);
    const on = new Set([...mine.map((p) => p.surfaceKey), ...byArea.map((t) => t.surfaceKey)]);
    return { buildUpId: b.id, code: b.code, name: b.name, count: mine.length, placedArea, areaOnly: areaOnlySum, area: placedArea + areaOnlySum, surfaces: surfaceOrder.filter((k) => on.has(k)) };
  });
}

export function buildSnapshot(source: SnapshotSource): SubmittalSnapshot {
  const { room } = source;
  const fields = fieldsFromRows(room, source.surfaces, source.openings, source.treatments);
  const surfaces = surfacesFor(fields);
  const surfaceOrder = surfaces.map((s) => s.key);
  const keyOfSurfaceId = new Map(source.surfaces.map((s) => [s.id, s.key]));
  const keyOfBoard = new Map(source.boards.map((b) => [b.id, keyOfSurfaceId.get(b.surfaceId)]));
  const order = (key: string) => surfaceOrder.indexOf(key);

  const rawPlacements = source.placements
    .map((p) => ({ p, surfaceKey: keyOfBoard.get(p.boardId) }))
    .filter((x): x is { p: Placement; surfaceKey: string } => x.surfaceKey !== undefined && surfaceOrder.includes(x.surfaceKey))
    .sort((a, b) => order(a.surfaceKey) - order(b.surfaceKey) || a.p.position - b.p.position || compareLabels(a.p.code, b.p.code));
  const used = new Set([...rawPlacements.map((x) => x.p.buildUpId), ...fields.treatments.map((t) => t.buildUpId)]);
  const { rows: buildUps, results } = buildUpsInUse(source, used);

  const types = panelTypes(
    buildUps,
    rawPlacements.map((x) => x.p),
  );
  const placements: SnapshotPlacement[] = rawPlacements.map(({ p, surfaceKey }) => ({
    id: p.id,
    code: p.code,
    surfaceKey,
    buildUpId: p.buildUpId,
    type: typeCodeOf(types, p),
    x: p.x,
    y: p.y,
    width: p.width,
    height: p.height,
  }));

  // The check counts what can exist (inside the surface, net of openings, overlaps once), as
  // the room screen and the server's saved check do.
  const shapeOf = new Map(surfaces.map((s) => [s.key, s]));
  const placed = treatedArea(surfaceOrder.map((key) => ({ surfaceKey: key, surface: shapeOf.get(key)!, placements: placements.filter((p) => p.surfaceKey === key) })));
  const panels = new Map<string, PanelAlpha>(buildUps.map((b) => [b.id, { name: b.name, alpha: octaveAlphaFromBands(results.get(b.id)!.octaves) }]));
  const lookup = (key: string) => source.materials(key)?.alpha;
  const { check, target, issues } = runCheck({ fields, surfaces, treatments: [...fields.treatments, ...placed], panels, lookup });
  const materialRef = (key: string) => ({ key, name: source.materials(key)?.name ?? key });

  const snapshotSurfaces: SnapshotSurface[] = surfaces.map((s) => ({
    key: s.key,
    name: s.name,
    kind: s.kind,
    width: s.width,
    height: s.height,
    grossArea: grossArea(s),
    netArea: netArea(s),
    finish: materialRef(s.finish),
    openings: s.openings.map((o) => ({ kind: o.kind, name: o.name ?? "", x: o.x, y: o.y, width: o.width, height: o.height, material: materialRef(o.material) })),
  }));
  const materialKeys = [...new Set(surfaces.flatMap((s) => [s.finish, ...s.openings.map((o) => o.material)]))].sort();
  const materials = materialKeys.flatMap((key) => {
    const m = source.materials(key);
    return m ? [{ key, name: m.name, alpha: { ...m.alpha }, source: m.source ?? "" }] : [];
  });
  const areaTreatments = fields.treatments.map((t) => ({ surfaceKey: t.surfaceKey, buildUpId: t.buildUpId, area: t.area }));
  const { required, from: requiredFrom } = requiredFireClass(source.fire);
  const kindOf = new Map(snapshotSurfaces.map((s) => [s.key, s.kind]));
  const ceilings = surfaceOrder.filter((k) => kindOf.get(k) === "ceiling" && (placements.some((p) => p.surfaceKey === k) || areaTreatments.some((t) => t.surfaceKey === k)));

  const draft: SubmittalSnapshot = {
    format: SNAPSHOT_FORMAT,
    version: SNAPSHOT_VERSION,
    engine: { version: source.engineVersion ?? ENGINE_VERSION, limits: [...MODEL_LIMITS] },
    revision: {
      letter: source.revision.letter,
      issuedAt: source.revision.issuedAt === null ? null : new Date(source.revision.issuedAt).toISOString(),
      previous: source.previous ? { letter: source.previous.snapshot.revision.letter, hash: source.previous.hash } : null,
    },
    consultant: { name: source.consultant.name, firm: source.consultant.firm, email: source.consultant.email ?? null },
    project: { id: source.project.id, name: source.project.name, reference: source.project.reference, site: source.project.site, edgeClearance: source.project.edgeClearance },
    room: {
      id: room.id,
      name: room.name,
      use: room.use,
      shape: room.shape,
      length: room.shape === "shoebox" ? room.length : null,
      width: room.shape === "shoebox" ? room.width : null,
      height: room.shape === "shoebox" ? room.height : null,
      volume: roomVolume(geometryOf(fields)),
      air: { temperature: room.temperature, humidity: room.humidity, pressure: room.pressure },
    },
    target: target ? snapshotTarget(target) : null,
    surfaces: snapshotSurfaces,
    materials,
    buildUps,
    panelTypes: types,
    placements,
    areaTreatments,
    schedule: scheduleOf(buildUps, placements, areaTreatments, surfaceOrder),
    check: snapshotCheck(check),
    fire: {
      required,
      requiredFrom,
      findings: buildUps.map((b) => ({ buildUpId: b.id, finding: fireFinding({ standard: b.fire.standard, declared: b.fire.declared, required }) })),
    },
    pins: source.pins
      .filter((p) => p.resolvedAt === null && keyOfBoard.get(p.boardId) !== undefined)
      .map((p) => ({ surfaceKey: keyOfBoard.get(p.boardId)!, number: p.number, x: p.x, y: p.y, body: p.body, author: (p.authorId && source.people?.get(p.authorId)) || null }))
      .sort((a, b) => order(a.surfaceKey) - order(b.surfaceKey) || a.number - b.number),
    cautions: {
      ceilings,
      highLevelPanels: placements.filter((p) => kindOf.get(p.surfaceKey) === "wall" && p.y + p.height > HIGH_LEVEL_TOP + 1e-9).map((p) => p.code),
      highLevel: HIGH_LEVEL_TOP,
    },
    warnings: [...issues, ...(check.ok ? check.issues.filter((i) => i.severity === "warning") : [])].map((i) => ({ field: i.field, message: i.message })),
    changes: null,
  };
  // The stored form: what JSON.parse of the canonical text gives back, so a snapshot rendered
  // straight after issue and one read back from the database are the same value.
  const normalised = canonicalValue(draft) as unknown as SubmittalSnapshot;
  if (!source.previous) return normalised;
  return canonicalValue({ ...normalised, changes: diffSnapshots(source.previous.snapshot, normalised) }) as unknown as SubmittalSnapshot;
}
