/**
 * Checks of a room's geometry and air that return every issue at once, each naming its field
 * as a dotted path ("surfaces.2.openings.0.width") so a form can mark the box that is wrong.
 */
import { type Opening, type RoomGeometry, type Shoebox, type Surface, grossArea, roomVolume } from "./geometry";
import { sayIn, type Say } from "@/lib/units";
import { type Issue, at, error, warning } from "./issues";

/** Messages quote quantities in the person's units; metric unless told. */
const METRIC = sayIn("metric");

/** Slack for rounding when openings touch an edge or each other, m. */
const EDGE_SLACK = 1e-9;

const mustBePositive = (field: string, value: number, zero: string): Issue[] =>
  Number.isFinite(value) ? (value > 0 ? [] : [error(field, `must be greater than ${zero}`)]) : [error(field, "must be a number")];

export function validateShoebox(box: Shoebox, prefix = "", say: Say = METRIC): Issue[] {
  return (["length", "width", "height"] as const).flatMap((side) => mustBePositive(at(prefix, side), box[side], say.length(0)));
}

const OPENING_WORDS: Record<Opening["kind"], string> = { door: "door", window: "window", glazing: "glazing", vent: "vent", other: "opening" };

function openingFits(opening: Opening, surface: Surface, field: string, say: Say): Issue[] {
  const word = OPENING_WORDS[opening.kind];
  const sized = [...mustBePositive(at(field, "width"), opening.width, say.length(0)), ...mustBePositive(at(field, "height"), opening.height, say.length(0))];
  if (sized.length > 0 || !(surface.width > 0 && surface.height > 0)) return sized;
  const issues: Issue[] = [];
  const axes = [
    { size: "width", pos: "x", across: "wide", start: "left", end: "right" },
    { size: "height", pos: "y", across: "high", start: "bottom", end: "top" },
  ] as const;
  for (const axis of axes) {
    const length = opening[axis.size];
    const room = surface[axis.size];
    const pos = opening[axis.pos];
    if (length > room + EDGE_SLACK) {
      issues.push(error(at(field, axis.size), `the ${word} is ${say.length(length)} ${axis.across}, more than ${surface.name} (${say.length(room)})`));
    } else if (!Number.isFinite(pos)) {
      issues.push(error(at(field, axis.pos), "must be a number"));
    } else if (pos < -EDGE_SLACK) {
      issues.push(error(at(field, axis.pos), `must be at least ${say.length(0)}: it is measured from the ${axis.start} edge of ${surface.name}`));
    } else if (pos + length > room + EDGE_SLACK) {
      issues.push(
        error(
          at(field, axis.pos),
          `the ${word} runs ${say.length(pos + length - room)} past the ${axis.end} edge of ${surface.name}: ${axis.pos} + ${axis.size} must be at most ${say.length(room)}`,
        ),
      );
    }
  }
  return issues;
}

/** Two rectangles overlap when they share some area; touching edges is fine. */
function overlaps(a: Opening, b: Opening): boolean {
  return a.x < b.x + b.width - EDGE_SLACK && b.x < a.x + a.width - EDGE_SLACK && a.y < b.y + b.height - EDGE_SLACK && b.y < a.y + a.height - EDGE_SLACK;
}

export function validateSurfaces(surfaces: readonly Surface[], prefix = "surfaces", say: Say = METRIC): Issue[] {
  if (surfaces.length === 0) return [error(prefix, "list at least one surface")];
  return surfaces.flatMap((surface, i) => {
    const field = at(prefix, i);
    const issues = [...mustBePositive(at(field, "width"), surface.width, say.length(0)), ...mustBePositive(at(field, "height"), surface.height, say.length(0))];
    surface.openings.forEach((opening, j) => {
      issues.push(...openingFits(opening, surface, at(field, "openings", j), say));
      const earlier = surface.openings.slice(0, j).findIndex((other) => overlaps(other, opening));
      if (earlier >= 0) {
        const other = surface.openings[earlier];
        issues.push(
          error(
            at(field, "openings", j),
            `overlaps the ${OPENING_WORDS[other.kind]} at x ${say.length(other.x)}, y ${say.length(other.y)} on ${surface.name}: openings may touch but not overlap`,
          ),
        );
      }
    });
    return issues;
  });
}

export interface AirSpec {
  /** °C */
  temperature: number;
  /** relative humidity, % */
  humidity: number;
  /** Pa */
  pressure?: number;
}

export function validateAir(air: AirSpec, prefix = "", say: Say = METRIC): Issue[] {
  const issues: Issue[] = [];
  const inRange = (field: string, value: number, min: number, max: number, range: string, why: string) => {
    if (!Number.isFinite(value)) issues.push(error(at(prefix, field), "must be a number"));
    else if (value < min || value > max) issues.push(error(at(prefix, field), `must be between ${range}${why}`));
  };
  // −10…50 °C: the range of occupied rooms, inside ISO 9613-1's stated −20…50 °C.
  inRange("temperature", air.temperature, -10, 50, `${say.temperature(-10)} and ${say.temperature(50)}`, " for an occupied room");
  inRange("humidity", air.humidity, 0, 100, "0 and 100 % relative humidity", "");
  // The contract's pressure range (lib/acoustics/contract/fields.ts), so both refuse alike.
  if (air.pressure !== undefined) inRange("pressure", air.pressure, 10_000, 200_000, "10000 and 200000 Pa", "");
  return issues;
}

/**
 * Of all closed shapes of volume V the sphere has the least surface, S = (36π)^(1/3)·V^(2/3)
 * ≈ 4.836·V^(2/3) (the isoperimetric inequality), so surfaces adding up to less cannot enclose
 * the volume: a surface is missing or the volume is wrong. Far above it the room is very flat
 * or thin, or the volume was mistyped: a cube has S/V^(2/3) = 6, a 10 × 8 × 3 m room 6.9, a room
 * 30 times wider than it is high about 20 (our threshold, a judgement, not a standard). Sabine
 * and Eyring assume a diffuse sound field, which such shapes do not have.
 */
export const SPHERE_AREA_FACTOR = Math.cbrt(36 * Math.PI);
export const FLAT_ROOM_FACTOR = 20;

export function validateVolumeForSurfaces(volume: number, surfaces: readonly { width: number; height: number }[], field = "volume", say: Say = METRIC): Issue[] {
  const positive = mustBePositive(field, volume, say.volume(0));
  if (positive.length > 0) return positive;
  const area = surfaces.reduce((sum, s) => sum + (grossArea(s) > 0 ? grossArea(s) : 0), 0);
  const least = SPHERE_AREA_FACTOR * volume ** (2 / 3);
  if (area < least * (1 - 1e-9)) {
    return [
      error(
        field,
        `a closed room of ${say.volume(volume)} has at least ${say.area(least)} of surface (as a sphere); the surfaces listed add up to ${say.area(area)}. Check the volume and that every surface is listed.`,
      ),
    ];
  }
  if (area > FLAT_ROOM_FACTOR * volume ** (2 / 3)) {
    return [
      warning(
        field,
        `the surfaces add up to ${say.area(area)} for only ${say.volume(volume)}: the room is very flat or thin, or the volume is mistyped. Sabine and Eyring assume a diffuse sound field and are unreliable in such a shape.`,
      ),
    ];
  }
  return [];
}

export interface RoomModel {
  geometry: RoomGeometry;
  surfaces: Surface[];
  air: AirSpec;
}

/** Every issue of a room: dimensions, surfaces and openings, the volume against them, the air. */
export function validateRoom(room: RoomModel, say: Say = METRIC): Issue[] {
  const shape = room.geometry.kind === "shoebox" ? validateShoebox(room.geometry, "", say) : [];
  const surfaces = validateSurfaces(room.surfaces, "surfaces", say);
  // A shoebox has no volume box to mark: its height is what makes it flat.
  const field = room.geometry.kind === "shoebox" ? "height" : "volume";
  const fit = shape.length === 0 && room.surfaces.length > 0 ? validateVolumeForSurfaces(roomVolume(room.geometry), room.surfaces, field, say) : [];
  return [...shape, ...surfaces, ...fit, ...validateAir(room.air, "", say)];
}
