/**
 * From a room's surfaces (geometry, finish keys, openings) to the check's areas and α: each
 * surface at its net area with its finish, each opening at its own area with its material.
 * Materials are looked up in the built-in library unless the caller passes its own lookup
 * (project materials first, then the library).
 */
import type { CheckOpening, CheckSurface } from "./check-input";
import { type Surface, grossArea, netArea } from "./geometry";
import { type Issue, at, error } from "./issues";
import { findMaterial } from "./materials-library";
import type { OctaveRecord } from "./octaves";

export type MaterialLookup = (key: string) => OctaveRecord | undefined;

const library: MaterialLookup = (key) => findMaterial(key)?.alpha;

const OPENING_NAMES = { door: "Door", window: "Window", glazing: "Glazing", vent: "Vent", other: "Opening" } as const;

export function checkAreas(
  surfaces: readonly Surface[],
  lookup: MaterialLookup = library,
): { surfaces: CheckSurface[]; openings: CheckOpening[]; issues: Issue[] } {
  const issues: Issue[] = [];
  const resolve = (key: string, field: string): OctaveRecord => {
    const alpha = lookup(key);
    if (!alpha) issues.push(error(field, `no material has the key "${key}"`));
    return alpha ?? {};
  };
  const checkSurfaces = surfaces.map((s, i) => ({ key: s.key, name: s.name, area: netArea(s), alpha: resolve(s.finish, at("surfaces", i, "finish")) }));
  const openings = surfaces.flatMap((s, i) =>
    s.openings.map((o, j) => ({
      name: `${o.name ?? OPENING_NAMES[o.kind]} on ${s.name}`,
      area: grossArea(o),
      alpha: resolve(o.material, at("surfaces", i, "openings", j, "material")),
    })),
  );
  return { surfaces: checkSurfaces, openings, issues };
}
