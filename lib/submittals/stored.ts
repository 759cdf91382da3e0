/**
 * A snapshot as it is stored: its canonical JSON text and that text's SHA-256, and the way back
 * from the text to the snapshot, refusing a format this version of Cavitas cannot render.
 */
import { canonicalJson, sha256Hex } from "./canonical";
import { SNAPSHOT_FORMAT, SNAPSHOT_VERSION, type SubmittalSnapshot } from "./snapshot";

export interface FrozenSnapshot {
  json: string;
  /** SHA-256 of `json`, 64 hex digits */
  hash: string;
}

export function freezeSnapshot(snapshot: SubmittalSnapshot): FrozenSnapshot {
  const json = canonicalJson(snapshot);
  return { json, hash: sha256Hex(json) };
}

export function readSnapshot(json: string): SubmittalSnapshot {
  const value = JSON.parse(json) as Partial<SubmittalSnapshot>;
  if (value?.format !== SNAPSHOT_FORMAT) throw new Error("This is not a Cavitas submittal snapshot.");
  if (value.version !== SNAPSHOT_VERSION) throw new Error(`Snapshot format version ${value.version} cannot be read by this version of Cavitas (it reads version ${SNAPSHOT_VERSION}).`);
  return value as SubmittalSnapshot;
}
