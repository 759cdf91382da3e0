import type { RoomFire } from "@/lib/fire";

const TONE = { flagged: "border-fault/50 bg-fault-soft/50", fine: "border-sage/50 bg-sage-soft/40" };

// Each build-up the room uses against the class it requires: what is missing, lower or not
// comparable is flagged; a flag, not an approval.
export function FireFindings({ fire, only }: { fire: RoomFire; only?: ReadonlySet<string> }) {
  const findings = only ? fire.findings.filter((f) => only.has(f.buildUpId)) : fire.findings;
  if (findings.length === 0) return <p className="text-sm text-ink-soft">No build-up is used here yet.</p>;
  return (
    <ul className="flex flex-col gap-1.5" data-testid="fire-findings">
      {findings.map((f) => (
        <li key={f.buildUpId} className={`rounded-sheet border-l-4 px-3 py-1.5 text-sm ${f.finding.flagged ? TONE.flagged : TONE.fine}`} data-flagged={f.finding.flagged || undefined}>
          <span className="font-semibold">{f.name}:</span> {f.finding.message}
        </li>
      ))}
    </ul>
  );
}

export const FIRE_DEFERRAL =
  "Declared classes come from the makers' test reports of the product as built. What a room requires depends on its occupancy, its place in the building, sprinklers and the jurisdiction: the governing code and the authority having jurisdiction decide.";
