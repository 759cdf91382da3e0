/**
 * Changes to a board's placements that share every unchanged placement object with the list
 * before, so that undo history stays small and React can skip panels that did not change. Each
 * returns the very same array when nothing changes.
 */
import type { Placement, Rect } from "./types";

export function moveBy(list: readonly Placement[], ids: ReadonlySet<string>, dx: number, dy: number): readonly Placement[] {
  if ((dx === 0 && dy === 0) || ids.size === 0) return list;
  let changed = false;
  const next = list.map((p) => {
    if (!ids.has(p.id)) return p;
    changed = true;
    return { ...p, x: p.x + dx, y: p.y + dy };
  });
  return changed ? next : list;
}

/** Sets some of one placement's fields (a resize, numeric entry of position and size, another build-up). */
export function updatePlacement(
  list: readonly Placement[],
  id: string,
  fields: Partial<Rect & Pick<Placement, "buildUpId" | "code">>,
): readonly Placement[] {
  const i = list.findIndex((p) => p.id === id);
  if (i < 0) return list;
  const current = list[i];
  const keys = Object.keys(fields) as (keyof typeof fields)[];
  if (keys.every((k) => fields[k] === undefined || fields[k] === current[k])) return list;
  const next = list.slice();
  next[i] = { ...current, ...definedOnly(fields) };
  return next;
}

export function removePlacements(list: readonly Placement[], ids: ReadonlySet<string>): readonly Placement[] {
  const next = list.filter((p) => !ids.has(p.id));
  return next.length === list.length ? list : next;
}

export function addPlacements(list: readonly Placement[], added: readonly Placement[]): readonly Placement[] {
  return added.length === 0 ? list : [...list, ...added];
}

function definedOnly<T extends object>(fields: T): Partial<T> {
  return Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined)) as Partial<T>;
}
