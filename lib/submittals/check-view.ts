/**
 * The reverberation check and its target as a snapshot stores them: the values documents show,
 * copied field by field into the snapshot's own format (lib/submittals/snapshot.ts), so a later
 * change to the check's types does not change what a stored snapshot means.
 */
import type { CheckResult, RoomState } from "@/lib/rooms/check";
import type { Target } from "@/lib/rooms/targets";
import type { SnapshotCheck, SnapshotRoomState, SnapshotTarget } from "./snapshot";

const state = (s: RoomState | null): SnapshotRoomState | null => (s ? { sabine: s.sabine, eyring: s.eyring, status: s.status, shortfall: s.shortfall } : null);

export function snapshotCheck(check: CheckResult): SnapshotCheck {
  if (!check.ok) return { ok: false, issues: check.issues.map((i) => ({ field: i.field, message: i.message })) };
  return {
    ok: true,
    method: check.method,
    treated: check.treated,
    octaves: check.octaves.map((o) => ({
      f: o.f,
      target: { seconds: o.target.seconds, low: o.target.low, high: o.target.high, indicative: o.target.indicative },
      before: state(o.before),
      after: state(o.after),
      status: o.status,
    })),
    mean: check.mean
      ? { octaves: [...check.mean.octaves], nominal: check.mean.nominal, low: check.mean.low, high: check.mean.high, before: check.mean.before, after: check.mean.after, status: check.mean.status }
      : null,
    sentences: [...check.sentences],
  };
}

export function snapshotTarget(t: Target): SnapshotTarget {
  return { label: t.label, source: t.source, provenance: t.provenance, note: t.note, kind: t.kind, nominal: t.nominal, warnings: [...t.warnings] };
}
