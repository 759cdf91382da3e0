// Shared by the server (lib/services/rooms.ts) and the room screen, which runs the same check
// live in the browser while the room is edited. Pure: no database or framework imports.
import { runEvaluate, type EvaluateInput } from "@/lib/acoustics/contract";
import type { BuildUp, Opening as OpeningRow, Room, Surface as SurfaceRow, Treatment } from "@/db/schema";
import { checkAreas, type MaterialLookup } from "@/lib/rooms/assemble";
import { checkRoom, type CheckResult } from "@/lib/rooms/check";
import type { CheckInput, CheckTreatment } from "@/lib/rooms/check-input";
import { grossArea, netArea, roomVolume, shoeboxSurfaces, type RoomGeometry, type Surface } from "@/lib/rooms/geometry";
import type { Issue } from "@/lib/rooms/issues";
import { octaveAlphaFromBands } from "@/lib/rooms/octaves";
import { defaultTargetSpec, type TargetSpec } from "@/lib/rooms/target-spec";
import { targetFor, type Target } from "@/lib/rooms/targets";
import { validateRoom } from "@/lib/rooms/validation";
import type { RoomFields } from "@/lib/schemas/room";
import { sayIn, type UnitPreference } from "@/lib/units";

// From stored rows or editor input to the room domain (lib/rooms) and back: the geometry, its
// surfaces with openings, the target and the reverberation check.

export const DEFAULT_FINISH = { wall: "plaster-on-masonry", ceiling: "gypsum-board-ceiling", floor: "vinyl-on-concrete" } as const;

export function geometryOf(fields: Pick<RoomFields, "shape" | "length" | "width" | "height" | "volume">): RoomGeometry {
  return fields.shape === "shoebox"
    ? { kind: "shoebox", length: fields.length ?? 0, width: fields.width ?? 0, height: fields.height ?? 0 }
    : { kind: "free", volume: fields.volume ?? 0 };
}

// A shoebox's six surfaces follow its dimensions; what the person chose for each (finish,
// openings) is kept by the surface's key.
export function surfacesFor(fields: RoomFields): Surface[] {
  const given = new Map(fields.surfaces.map((s) => [s.key, s]));
  if (fields.shape === "free") {
    return fields.surfaces.map((s) => ({ ...s, openings: s.openings.map((o) => ({ ...o, name: o.name || undefined })) }));
  }
  return shoeboxSurfaces(geometryOf(fields) as Extract<RoomGeometry, { kind: "shoebox" }>).map((shape) => {
    const mine = given.get(shape.key);
    return {
      ...shape,
      finish: mine?.finish ?? DEFAULT_FINISH[shape.kind],
      openings: (mine?.openings ?? []).map((o) => ({ ...o, name: o.name || undefined })),
    };
  });
}

export function resolveTarget(spec: TargetSpec | null, use: RoomFields["use"], volume: number): Target | null {
  const chosen = spec ?? defaultTargetSpec(use);
  return chosen ? targetFor(chosen, volume) : null;
}

const NO_TARGET: Target = {
  spec: { kind: "manual", seconds: {} },
  label: "No target chosen",
  source: "",
  provenance: "",
  note: "Choose a target for this room's use, or enter one by hand.",
  kind: "band",
  nominal: null,
  meanOf: null,
  warnings: [],
  perOctave: [],
};

export type TreatmentLine = { surfaceKey: string; buildUpId: string; area: number };

export function panelAlphaOf(b: Pick<BuildUp, "name" | "spec">): PanelAlpha {
  return { name: b.name, alpha: octaveAlphaFromBands(runEvaluate(JSON.parse(b.spec) as EvaluateInput).octaves) };
}

// A build-up as the check needs it: its name and octave diffuse α.
export type PanelAlpha = { name: string; alpha: Record<string, number> };

type CheckArgs = {
  fields: RoomFields;
  surfaces: Surface[];
  treatments: TreatmentLine[];
  panels: Map<string, PanelAlpha>;
  lookup: MaterialLookup;
};

export function checkInputFor(args: CheckArgs): { input: CheckInput; target: Target | null; issues: Issue[] } {
  const { fields, surfaces, lookup } = args;
  const volume = roomVolume(geometryOf(fields));
  const target = resolveTarget(fields.target, fields.use, volume);
  const areas = checkAreas(surfaces, lookup);
  const treatments: CheckTreatment[] = args.treatments.map((t) => {
    const panel = args.panels.get(t.buildUpId);
    return { name: panel?.name, surface: t.surfaceKey, area: t.area, alpha: panel?.alpha ?? {} };
  });
  const input: CheckInput = {
    volume,
    air: { temperature: fields.temperature, humidity: fields.humidity, pressure: fields.pressure },
    surfaces: areas.surfaces,
    openings: areas.openings,
    treatments,
    target: target ?? NO_TARGET,
  };
  return { input, target, issues: areas.issues };
}

export function runCheck(args: CheckArgs): { check: CheckResult; target: Target | null; issues: Issue[] } {
  const { input, target, issues } = checkInputFor(args);
  return { check: checkRoom(input), target, issues };
}

export function roomIssues(fields: RoomFields, surfaces: Surface[], panels: ReadonlyMap<string, unknown>, lookup: MaterialLookup, units: UnitPreference = "metric"): Issue[] {
  const say = sayIn(units);
  const air = { temperature: fields.temperature, humidity: fields.humidity, pressure: fields.pressure };
  const issues: Issue[] = validateRoom({ geometry: geometryOf(fields), surfaces, air }, say);
  if (fields.shape === "free" && surfaces.length === 0) issues.push({ field: "surfaces", message: "List the room's surfaces (walls, ceiling, floor).", severity: "error" });
  const keys = new Set<string>();
  surfaces.forEach((s, i) => {
    if (keys.has(s.key)) issues.push({ field: `surfaces.${i}.key`, message: "Two surfaces have the same key.", severity: "error" });
    keys.add(s.key);
  });
  const bySurface = new Map(surfaces.map((s) => [s.key, s]));
  const placed = new Map<string, number>();
  fields.treatments.forEach((t, i) => {
    if (!panels.has(t.buildUpId)) issues.push({ field: `treatments.${i}.buildUpId`, message: "That build-up is not in this project's library.", severity: "error" });
    const s = bySurface.get(t.surfaceKey);
    if (!s) {
      issues.push({ field: `treatments.${i}.surfaceKey`, message: "That surface is not in this room.", severity: "error" });
      return;
    }
    if (!(t.area > 0)) issues.push({ field: `treatments.${i}.area`, message: `The treated area must be greater than ${say.area(0)}.`, severity: "error" });
    const total = (placed.get(s.key) ?? 0) + t.area;
    placed.set(s.key, total);
    if (total > netArea(s) + 1e-9) {
      issues.push({
        field: `treatments.${i}.area`,
        message: `${say.area(total)} of panels on ${s.name} is more than its ${say.area(netArea(s))} without openings.`,
        severity: "error",
      });
    }
  });
  const resolved = checkAreas(surfaces, lookup).issues;
  return [...issues, ...resolved];
}

// Stored rows back to the editor's shape.
export function fieldsFromRows(room: Room, surfaces: SurfaceRow[], openings: OpeningRow[], treatments: Treatment[]): RoomFields {
  return {
    name: room.name,
    use: room.use,
    shape: room.shape,
    length: room.length,
    width: room.width,
    height: room.height,
    volume: room.shape === "free" ? room.volume : null,
    temperature: room.temperature,
    humidity: room.humidity,
    pressure: room.pressure,
    target: room.target ? (JSON.parse(room.target) as TargetSpec) : null,
    surfaces: [...surfaces]
      .sort((a, b) => a.position - b.position)
      .map((s) => ({
        key: s.key,
        name: s.name,
        kind: s.kind,
        width: s.width,
        height: s.height,
        finish: s.finish,
        openings: openings
          .filter((o) => o.surfaceId === s.id)
          .sort((a, b) => a.position - b.position)
          .map((o) => ({ kind: o.kind, name: o.name, x: o.x, y: o.y, width: o.width, height: o.height, material: o.material })),
      })),
    treatments: treatments.map((t) => ({ surfaceKey: t.surfaceKey, buildUpId: t.buildUpId, area: t.area })),
  };
}

export const surfaceAreas = (s: Surface) => ({ gross: grossArea(s), net: netArea(s) });
