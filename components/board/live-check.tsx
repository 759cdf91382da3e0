import type { CheckResult } from "@/lib/rooms/check";
import { hzLabel } from "@/components/charts/log-axis";
import { StatusBadge } from "@/components/rooms/status-badge";

const s = (v: number | null | undefined) => (v === null || v === undefined ? "—" : v.toFixed(2));

// The room's check beside the board: it follows every move, resize and added panel.
export function LiveCheck({ check }: { check: CheckResult | null }) {
  if (!check || !check.ok) return <p className="text-xs text-ink-faint">The check needs a complete room model; see the room&apos;s page.</p>;
  return (
    <table className="figures w-full text-xs" data-testid="live-check">
      <thead>
        <tr className="border-b border-ink/30 text-right text-[11px] text-ink-soft">
          <th className="py-1 text-left font-semibold">Hz</th>
          <th className="py-1 font-semibold">target</th>
          <th className="py-1 font-semibold">T now</th>
          <th className="py-1 pl-2 text-left font-semibold" />
        </tr>
      </thead>
      <tbody>
        {check.octaves.map((o) => (
          <tr key={o.f} className="border-b border-ink/10 text-right" data-octave={o.f}>
            <td className="py-1 text-left">{hzLabel(o.f)}</td>
            <td className="py-1 text-ink-soft">{o.target.high !== null ? `≤ ${s(o.target.high)}` : "—"}</td>
            <td className="py-1" data-testid={`live-${o.f}`}>
              {s(o.after?.sabine)}
            </td>
            <td className="py-1 pl-2 text-left">
              <StatusBadge status={o.status} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
