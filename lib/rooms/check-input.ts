/**
 * The input of the reverberation check and its validation. Treatments are panels of one
 * build-up on one surface; they replace the finish they cover, so their area comes off that
 * surface's net area and may not exceed it.
 */
import type { AtmosphereInput } from "@/lib/acoustics/air-absorption";
import type { ReverbMethod } from "@/lib/acoustics/reverberation";
import { type Issue, at, error, quote } from "./issues";
import { REQUIRED_OCTAVE_KEYS, type OctaveRecord } from "./octaves";
import type { Target } from "./targets";
import { validateAir } from "./validation";

export interface CheckSurface {
  key: string;
  name: string;
  /** net area, openings taken out, m² */
  area: number;
  /** the finish's α by octave label */
  alpha: OctaveRecord;
}

export interface CheckOpening {
  name: string;
  area: number;
  alpha: OctaveRecord;
}

export interface CheckTreatment {
  name?: string;
  /** key of the surface it covers */
  surface: string;
  /** m² of panels */
  area: number;
  /** the build-up's octave diffuse α (lib/acoustics evaluateBuildUp, octaves[].diffuse) */
  alpha: OctaveRecord;
}

export interface CheckInput {
  /** m³ */
  volume: number;
  air: AtmosphereInput;
  surfaces: CheckSurface[];
  openings: CheckOpening[];
  treatments: CheckTreatment[];
  target: Target;
  /** the formula that sets the status and the shortfall (Sabine by default); both are reported */
  method?: ReverbMethod;
}

function alphaIssues(alpha: OctaveRecord, field: string): Issue[] {
  return REQUIRED_OCTAVE_KEYS.flatMap((key) => {
    const value = alpha[key];
    if (!Number.isFinite(value)) return [error(at(field, "alpha", key), `required: the absorption coefficient at ${key} Hz`)];
    return value < 0 ? [error(at(field, "alpha", key), "must be at least 0")] : [];
  });
}

function areaIssues(area: number, field: string, positive: boolean): Issue[] {
  if (!Number.isFinite(area)) return [error(at(field, "area"), "must be a number in m²")];
  if (positive ? area > 0 : area >= 0) return [];
  return [error(at(field, "area"), positive ? "must be greater than 0 m²" : "must be at least 0 m²")];
}

/** Panel area already placed on each surface, m². */
export function treatedAreas(treatments: readonly CheckTreatment[]): Map<string, number> {
  const sums = new Map<string, number>();
  for (const t of treatments) sums.set(t.surface, (sums.get(t.surface) ?? 0) + t.area);
  return sums;
}

export function validateCheckInput(input: CheckInput): Issue[] {
  const issues: Issue[] = [];
  if (!(input.volume > 0)) issues.push(error("volume", "must be greater than 0 m³"));
  issues.push(...validateAir({ humidity: input.air.humidity, temperature: input.air.temperature, pressure: input.air.pressure }, "air"));
  input.surfaces.forEach((s, i) => issues.push(...areaIssues(s.area, at("surfaces", i), false), ...alphaIssues(s.alpha, at("surfaces", i))));
  input.openings.forEach((o, i) => issues.push(...areaIssues(o.area, at("openings", i), false), ...alphaIssues(o.alpha, at("openings", i))));
  const bySurface = new Map(input.surfaces.map((s) => [s.key, s]));
  const placed = new Map<string, number>();
  input.treatments.forEach((t, i) => {
    const field = at("treatments", i);
    issues.push(...areaIssues(t.area, field, true), ...alphaIssues(t.alpha, field));
    const surface = bySurface.get(t.surface);
    if (!surface) {
      issues.push(error(at(field, "surface"), `no surface has the key "${t.surface}"`));
      return;
    }
    const sum = (placed.get(t.surface) ?? 0) + (Number.isFinite(t.area) ? t.area : 0);
    placed.set(t.surface, sum);
    // A little slack so that panels filling a surface exactly are not refused for rounding.
    if (sum > surface.area * (1 + 1e-9) + 1e-9) {
      issues.push(
        error(
          at(field, "area"),
          `the panels on ${surface.name} add up to ${quote(sum, "m²")}, more than its ${quote(surface.area, "m²")} (openings taken out)`,
        ),
      );
    }
  });
  const total = input.surfaces.reduce((sum, s) => sum + s.area, 0) + input.openings.reduce((sum, o) => sum + o.area, 0);
  if (!(total > 0)) issues.push(error("surfaces", "list at least one surface with an area"));
  return issues;
}
