/**
 * The change list between two revisions in words, in the reader's units: shared by the
 * submittal PDF's changes section and the Submittals screen, so both say the same thing.
 */
import type { ChangeList, PlacementRef, SubmittalSnapshot } from "@/lib/submittals";
import { FIRE_STATUS_WORDS, type Formatters, formatChange } from "./format";

const MAX_CODES = 40;
const surfaceName = (s: SubmittalSnapshot, key: string) => s.surfaces.find((x) => x.key === key)?.name ?? key;

/** "P-001, P-002 and P-007 on Wall A (length)", at most MAX_CODES codes named per surface. */
function codesBySurface(s: SubmittalSnapshot, refs: readonly PlacementRef[]): string[] {
  const bySurface = new Map<string, string[]>();
  for (const r of refs) bySurface.set(r.surfaceKey, [...(bySurface.get(r.surfaceKey) ?? []), r.code]);
  return [...bySurface].map(([key, codes]) => {
    const named = codes.slice(0, MAX_CODES).join(", ");
    const more = codes.length > MAX_CODES ? ` and ${codes.length - MAX_CODES} more` : "";
    return `${named}${more} on ${surfaceName(s, key)}`;
  });
}

export type ScheduleChangeRow = { code: string; name: string; what: string; before: string; after: string };

export function scheduleChangeRows(ch: ChangeList, f: Formatters): ScheduleChangeRow[] {
  const brief = (r: { count: number; area: number }) => `${f.count(r.count)} panels, ${f.area(r.area)}`;
  return [
    ...ch.schedule.added.map((r) => ({ code: r.code, name: r.name, what: "added", before: "none", after: brief(r) })),
    ...ch.schedule.removed.map((r) => ({ code: r.code, name: r.name, what: "removed", before: brief(r), after: "none" })),
    ...ch.schedule.changed.flatMap((r) => r.fields.map((x) => ({ code: r.code, name: r.name, what: x.label, before: formatChange(x.before, x.kind, f), after: formatChange(x.after, x.kind, f) }))),
  ];
}

/** "Added: P-031 on Wall A." and the like, for panels added, removed, moved, resized or given another build-up. */
export function placementChangeLines(s: SubmittalSnapshot, ch: ChangeList): string[] {
  const changed = (what: "moved" | "resized" | "build-up") => ch.placements.changed.filter((p) => p.what.includes(what));
  return [
    ...codesBySurface(s, ch.placements.added).map((t) => `Added: ${t}.`),
    ...codesBySurface(s, ch.placements.removed).map((t) => `Removed: ${t}.`),
    ...codesBySurface(s, changed("moved")).map((t) => `Moved: ${t}.`),
    ...codesBySurface(s, changed("resized")).map((t) => `Resized: ${t}.`),
    ...codesBySurface(s, changed("build-up")).map((t) => `Another build-up: ${t}.`),
  ];
}

export function fireChangeLines(ch: ChangeList): string[] {
  const words = (x: keyof typeof FIRE_STATUS_WORDS | null) => (x ? FIRE_STATUS_WORDS[x] : "not in the schedule");
  return ch.fire.map((x) => `${x.code} ${x.name}: ${words(x.before)}, now ${words(x.after)}.`);
}

/** The whole change list as short sentences for a screen; null for a first revision. */
export function changeSentences(s: SubmittalSnapshot, f: Formatters): string[] | null {
  const ch = s.changes;
  if (!ch) return null;
  const timed = ch.check.filter((c) => f.seconds(c.before) !== f.seconds(c.after));
  return [
    ...scheduleChangeRows(ch, f).map((r) => `${r.code} ${r.name}: ${r.what}${r.what === "added" || r.what === "removed" ? "" : `, ${r.before} → ${r.after}`}${r.what === "added" ? `, ${r.after}` : ""}.`),
    ...placementChangeLines(s, ch),
    ...(timed.length ? [`Predicted reverberation time after treatment: ${timed.map((c) => `${f.octave(c.f)} ${f.seconds(c.before)} → ${f.seconds(c.after)}`).join("; ")}.`] : []),
    ...ch.room.map((r) => `The room's ${r.label}: ${formatChange(r.before, r.kind, f)} → ${formatChange(r.after, r.kind, f)}.`),
    ...fireChangeLines(ch),
    ...(ch.pins.before !== ch.pins.after ? [`Open review pins: ${ch.pins.before} → ${ch.pins.after}.`] : []),
  ];
}
