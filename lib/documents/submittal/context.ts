import type { SubmittalSnapshot } from "@/lib/submittals";
import type { Formatters } from "../format";

/** What every part of a document reads: the snapshot, its hash and the reader's formatters. */
export interface DocContext {
  s: SubmittalSnapshot;
  /** SHA-256 of the snapshot's canonical JSON */
  hash: string;
  f: Formatters;
}

export const buildUpOf = (s: SubmittalSnapshot, id: string) => s.buildUps.find((b) => b.id === id)!;
export const surfaceOf = (s: SubmittalSnapshot, key: string) => s.surfaces.find((x) => x.key === key);
export const surfaceName = (s: SubmittalSnapshot, key: string) => surfaceOf(s, key)?.name ?? key;

/** "LRA-24 · Rehearsal room · submittal revision A · snapshot 1a2b3c4d5e6f" */
export function footerText(c: Pick<DocContext, "s" | "hash">, what: string): string {
  const ref = c.s.project.reference ? `${c.s.project.reference} · ` : "";
  return `${ref}${c.s.room.name} · ${what} revision ${c.s.revision.letter} · snapshot ${c.hash.slice(0, 12)}`;
}

/** The surfaces that carry panels laid out on a board, in the room's order. */
export const laidOutSurfaces = (s: SubmittalSnapshot) => s.surfaces.filter((x) => s.placements.some((p) => p.surfaceKey === x.key));
