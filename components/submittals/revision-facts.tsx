import type { SubmittalView } from "@/lib/services/submittals";
import { formatArea, type UnitPreference } from "@/lib/units";
import { formatInstant } from "@/lib/documents/format";
import { StatusBadge } from "@/components/rooms/status-badge";
import { Sheet } from "@/components/ui/sheet";
import { TableHead } from "@/components/ui/table-head";

const OUTCOME = { approved: "Approved", "approved-as-noted": "Approved as noted", returned: "Returned for revision" } as const;
const dot = <span aria-hidden className="mt-2 h-1.5 w-1.5 shrink-0 rounded-full bg-copper" />;

export function DecisionBlock({ decision }: { decision: NonNullable<SubmittalView["decision"]> }) {
  return (
    <Sheet title="Decision">
      <p className="text-lg font-semibold" data-testid="decision-outcome">
        {OUTCOME[decision.outcome]}
      </p>
      <p className="mt-1 text-sm text-ink-soft">
        Signed &ldquo;{decision.signature}&rdquo; by {decision.by ?? "a former member"}, {formatInstant(decision.at)}, on the PDF with SHA-256
      </p>
      <p className="figures break-all text-xs text-ink">{decision.pdfSha256}</p>
      {decision.notes && (
        <blockquote className="mt-3 border-l-2 border-copper pl-3 text-sm" data-testid="decision-notes">
          {decision.notes}
        </blockquote>
      )}
    </Sheet>
  );
}

// What the revision holds, read from its snapshot: what changed, the schedule, the check's
// mean, the fire findings, and what the consultant confirmed when issuing it.
export function RevisionFacts({ view, units }: { view: SubmittalView; units: UnitPreference }) {
  return (
    <>
      <Sheet title={view.previous ? `What changed since revision ${view.previous.letter}` : "What changed"}>
        {view.changes === null ? (
          <p className="text-sm text-ink-soft">{view.snapshotSha256 ? "This is the room's first revision." : "Not issued yet."}</p>
        ) : view.changes.length === 0 ? (
          <p className="text-sm">Nothing a reader would see has changed.</p>
        ) : (
          <ul className="flex flex-col gap-1.5 text-sm" data-testid="change-list">
            {view.changes.map((line) => (
              <li key={line} className="flex gap-2">
                {dot}
                {line}
              </li>
            ))}
          </ul>
        )}
      </Sheet>
      {view.schedule.length > 0 && (
        <Sheet title="Panel schedule" aside={view.meanAfter && <span className="flex items-center gap-2 text-xs text-ink-soft">mean T after {view.meanAfter.seconds?.toFixed(2) ?? "—"} s <StatusBadge status={view.meanAfter.status} /></span>}>
          <table className="w-full text-sm" data-testid="schedule-table">
            <TableHead dense cells={[{ label: "Code" }, { label: "Build-up" }, { label: "Panels", numeric: true }, { label: "Area", numeric: true }]} />
            <tbody>
              {view.schedule.map((r) => (
                <tr key={r.buildUpId} className="border-b border-ink/10">
                  <td className="py-1.5 pr-3 font-medium">{r.code}</td>
                  <td className="py-1.5 pr-3">{r.name}</td>
                  <td className="figures py-1.5 pr-3 text-right">{r.count}</td>
                  <td className="figures py-1.5 text-right">{formatArea(r.area, units)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </Sheet>
      )}
      {view.fire.length > 0 && (
        <Sheet title="Fire classes">
          <ul className="flex flex-col gap-1.5 text-sm" data-testid="fire-findings">
            {view.fire.map((x) => (
              <li key={x.code} className={x.flagged ? "text-fault" : ""}>
                <span className="font-semibold">{x.code}</span> {x.name}: {x.message}
              </li>
            ))}
          </ul>
          <p className="mt-2 text-xs text-ink-soft">Declared classes as the manufacturers state them. The governing code and the authority having jurisdiction decide what is required.</p>
        </Sheet>
      )}
      {view.confirmed.length > 0 && (
        <Sheet title={`Confirmed at issue (${view.confirmed.length})`}>
          <ul className="flex flex-col gap-1 text-sm" data-testid="confirmed-items">
            {view.confirmed.map((i) => (
              <li key={i.key} className="flex gap-2">
                {dot}
                {i.message}
              </li>
            ))}
          </ul>
        </Sheet>
      )}
    </>
  );
}
