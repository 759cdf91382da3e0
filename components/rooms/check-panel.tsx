import type { CheckResult } from "@/lib/rooms/check";
import type { Target } from "@/lib/rooms/targets";
import { FOOT, type UnitPreference } from "@/lib/units";
import { hzLabel } from "@/components/charts/log-axis";
import { ReverbChart, ReverbLegend } from "@/components/charts/reverb-chart";
import { Notice } from "@/components/ui/notice";
import { Sheet } from "@/components/ui/sheet";
import { StatusBadge } from "./status-badge";

const s = (v: number | null | undefined) => (v === null || v === undefined ? "—" : v.toFixed(2));

// Absorption is an area: m² of a perfect absorber (metric sabins), or ft² (sabins).
const ABSORPTION = { metric: { unit: "m²", words: "m² of absorption (metric sabins)", per: 1 }, imperial: { unit: "ft²", words: "ft² of absorption (sabins)", per: FOOT * FOOT } };

// The Check: per octave the predicted time before and after treatment (Sabine and Eyring),
// the target with its band, the standing and the absorption still lacking, in a chart, a table
// and plain sentences.
export function CheckPanel({ check, target, units }: { check: CheckResult; target: Target | null; units: UnitPreference }) {
  const absorption = ABSORPTION[units];
  if (!check.ok) {
    return (
      <Notice tone="caution" title="The check cannot run until the room is complete">
        <ul className="mt-1 list-disc pl-5">
          {check.issues.filter((i) => i.severity === "error").map((i) => (
            <li key={`${i.field}-${i.message}`}>
              {i.field}: {i.message}
            </li>
          ))}
        </ul>
      </Notice>
    );
  }
  const points = check.octaves.map((o) => ({ f: o.f, before: o.before?.sabine ?? null, after: o.after?.sabine ?? null, low: o.target.low, high: o.target.high }));
  return (
    <div className="grid gap-6 xl:grid-cols-[1.25fr_1fr]">
      <Sheet title="Check: reverberation time" aside={<span className="text-xs text-ink-faint">Sabine; Eyring in the table</span>}>
        <ReverbChart points={points} treated={check.treated} />
        <div className="mt-3">
          <ReverbLegend treated={check.treated} />
        </div>
        <ul className="mt-5 flex flex-col gap-1.5 text-sm" data-testid="check-sentences">
          {check.sentences.map((line) => (
            <li key={line} className="flex gap-2">
              <span aria-hidden className="mt-2 h-1.5 w-1.5 shrink-0 rounded-full bg-copper" />
              {line}
            </li>
          ))}
        </ul>
      </Sheet>
      <div className="flex flex-col gap-6">
        <Sheet title="By octave">
          <table className="figures w-full text-xs" data-testid="check-table">
            <thead>
              <tr className="border-b border-ink/30 text-right text-[11px] text-ink-soft">
                <th className="py-1.5 text-left font-semibold">Hz</th>
                <th className="py-1.5 font-semibold">target s</th>
                <th className="py-1.5 font-semibold">before S / E</th>
                <th className="py-1.5 font-semibold">after S / E</th>
                <th className="py-1.5 font-semibold">lacks, {absorption.unit}</th>
                <th className="py-1.5 pl-2 text-left font-semibold">standing</th>
              </tr>
            </thead>
            <tbody>
              {check.octaves.map((o) => (
                <tr key={o.f} className="border-b border-ink/10 text-right" data-octave={o.f}>
                  <td className="py-1.5 text-left">{hzLabel(o.f)}</td>
                  <td className="py-1.5">
                    {o.target.low !== null || o.target.high !== null ? `${s(o.target.low)}–${s(o.target.high)}` : "—"}
                    {o.target.indicative && <sup title="indicative band">*</sup>}
                  </td>
                  <td className="py-1.5 text-ink-soft">{o.before ? `${s(o.before.sabine)} / ${s(o.before.eyring)}` : "no data"}</td>
                  <td className="py-1.5" data-testid={`after-${o.f}`}>
                    {o.after ? `${s(o.after.sabine)} / ${s(o.after.eyring)}` : "no data"}
                  </td>
                  <td className="py-1.5" data-testid={`lacks-${o.f}`}>
                    {o.after?.shortfall ? (o.after.shortfall / absorption.per).toFixed(1) : "—"}
                  </td>
                  <td className="py-1.5 pl-2 text-left">
                    <StatusBadge status={o.status} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-[11px] text-ink-faint">S = Sabine, E = Eyring, with air absorption (ISO 9613-1). Lacks: absorption the room still needs to reach the band&apos;s upper limit, in {absorption.words}.</p>
        </Sheet>
        {target && (
          <Sheet title="Target">
            <p className="text-sm font-medium" data-testid="target-label">
              {target.label}
            </p>
            {target.nominal !== null && <p className="figures mt-1 text-sm">{target.nominal.toFixed(2)} s</p>}
            <p className="mt-2 text-xs leading-relaxed text-ink-soft">{target.note}</p>
            {target.source && <p className="mt-2 text-[11px] text-ink-faint">Source: {target.source}. {target.provenance}</p>}
            {target.perOctave.some((b) => b.indicative) && <p className="mt-2 text-[11px] text-caution-deep">* indicative band: not from the standard&apos;s text; verify against the standard.</p>}
          </Sheet>
        )}
      </div>
    </div>
  );
}
