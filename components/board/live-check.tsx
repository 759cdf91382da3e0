import type { CheckResult } from "@/lib/rooms/check";
import type { AreaAccount } from "@/lib/board/treated-area";
import { notCountedWords } from "@/lib/board/announce";
import { formatArea, type UnitPreference } from "@/lib/units";
import { hzLabel } from "@/components/charts/log-axis";
import { StatusBadge } from "@/components/rooms/status-badge";

const s = (v: number | null | undefined) => (v === null || v === undefined ? "—" : v.toFixed(2));

// The room's check beside the board: it follows every move, resize and added panel, and says
// how much of this board's panel area it counts and why the rest is left out.
export function LiveCheck({ check, account, units }: { check: CheckResult | null; account: AreaAccount; units: UnitPreference }) {
  const notCounted = notCountedWords(account, units);
  return (
    <div className="flex flex-col gap-3">
      {!check || !check.ok ? (
        <p className="text-xs text-ink-soft">The check needs a complete room model; see the room&apos;s page.</p>
      ) : (
        <table className="figures w-full text-xs" data-testid="live-check">
          <caption className="sr-only">Reverberation time per octave with this board&apos;s panels, against the target</caption>
          <thead>
            <tr className="border-b border-ink/30 text-right text-[11px] text-ink-soft">
              <th scope="col" className="py-1 text-left font-semibold">
                Hz
              </th>
              <th scope="col" className="py-1 font-semibold">
                target
              </th>
              <th scope="col" className="py-1 font-semibold">
                T now
              </th>
              <th scope="col" className="py-1 pl-2 text-left font-semibold">
                <span className="sr-only">standing</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {check.octaves.map((o) => (
              <tr key={o.f} className="border-b border-ink/10 text-right" data-octave={o.f}>
                <th scope="row" className="py-1 text-left font-normal">
                  {hzLabel(o.f)}
                </th>
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
      )}
      <p className="text-xs text-ink-soft" data-testid="area-counted">
        {account.placed === 0 ? (
          "No panels on this board yet."
        ) : (
          <>
            <span className="figures">{formatArea(account.counted, units)}</span> of this board&apos;s <span className="figures">{formatArea(account.placed, units)}</span> of panels counted.
          </>
        )}
        {notCounted && (
          <span className="mt-1 block font-medium text-ink" data-testid="area-not-counted">
            Not counted: {notCounted}.
          </span>
        )}
      </p>
    </div>
  );
}
