import type { EvaluateOutput } from "@/lib/acoustics/contract";

/** ISO 11654 reports αp at 125 Hz; its reference curve, and so αw, starts at 250 Hz. */
const UNRATED_OCTAVE = "125";

const pct = (x: number) => `${(x * 100).toFixed(2)} %`;
const hz = (x: number) => `${Math.round(x)} Hz`;

function Row({ label, value, testId, strong }: { label: string; value: string; testId?: string; strong?: boolean }) {
  return (
    <div className="flex items-baseline justify-between gap-3 border-b border-ink/10 py-1.5">
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd data-testid={testId} className={`figures text-sm ${strong ? "font-semibold text-copper-deep" : ""}`}>
        {value}
      </dd>
    </div>
  );
}

export function RatingsPanel({ result, stale }: { result: EvaluateOutput; stale: boolean }) {
  const r = result.ratings;
  return (
    <div className={stale ? "opacity-50" : ""} aria-live="polite">
      <dl>
        <Row label="Open area" value={pct(result.openArea)} testId="open-area" />
        <Row label="Lumped resonance" value={hz(result.helmholtzHz)} testId="helmholtz-hz" />
        <Row label="Peak (normal incidence)" value={hz(result.peakHz)} testId="peak-hz" strong />
        <Row label="αw" value={`${r.alphaW.toFixed(2)}${r.shape ? ` (${r.shape})` : ""}`} testId="alpha-w" strong />
        <Row label="Absorption class" value={r.class} testId="absorption-class" />
        <Row label="NRC" value={r.nrc.toFixed(2)} testId="nrc" />
        <Row label="SAA" value={r.saa.toFixed(2)} testId="saa" />
      </dl>
      <table className="mt-4 w-full text-xs">
        <caption className="mb-1 text-left text-xs text-ink-soft">αp by octave (ISO 11654)</caption>
        <tbody>
          <tr>
            {Object.keys(r.alphaP).map((f) => (
              <th key={f} className="figures font-normal text-ink-faint">
                {Number(f) >= 1000 ? `${Number(f) / 1000}k` : f}
              </th>
            ))}
          </tr>
          <tr>
            {Object.entries(r.alphaP).map(([f, v]) => (
              <td key={f} className={`figures text-center ${f === UNRATED_OCTAVE ? "text-ink-soft" : ""}`} data-testid={`alpha-p-${f}`}>
                {v.toFixed(2)}
                {f === UNRATED_OCTAVE && <sup aria-hidden>†</sup>}
              </td>
            ))}
          </tr>
        </tbody>
      </table>
      <p className="mt-1 text-[11px] text-ink-faint">† 125 Hz is reported with the others but takes no part in αw, its shape letters or the class.</p>
    </div>
  );
}

export function WarningsList({ warnings }: { warnings: EvaluateOutput["warnings"] }) {
  if (warnings.length === 0) return <p className="text-xs text-ink-faint">No model warnings for these inputs.</p>;
  return (
    <ul className="flex flex-col gap-2" data-testid="engine-warnings">
      {warnings.map((w) => (
        <li key={w.code} className="rounded-sheet border-l-4 border-caution bg-caution-soft/60 px-3 py-2 text-xs text-ink">
          {w.message}
        </li>
      ))}
    </ul>
  );
}
