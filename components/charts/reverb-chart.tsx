import { reverbGeometry, type ReverbPoint } from "@/lib/charts/reverb-geometry";

export type { ReverbPoint };

const BOX = { width: 720, pad: { left: 48, right: 20, top: 18, bottom: 34 } };

// Reverberation time per octave: the target band shaded, the room before treatment in a
// faint dashed line, after treatment in copper. The geometry is shared with the submittal PDF
// (lib/charts/reverb-geometry.ts).
export function ReverbChart({ points, treated, height = 280 }: { points: ReverbPoint[]; treated: boolean; height?: number }) {
  const { width, pad } = BOX;
  const { x, y, ticks, before, after, band, labels } = reverbGeometry(points, { ...BOX, height });
  return (
    <svg viewBox={`0 0 ${width} ${height}`} className="w-full" role="img" aria-label="Reverberation time by octave against the target" data-testid="reverb-chart">
      <rect x={pad.left} y={pad.top} width={width - pad.left - pad.right} height={height - pad.top - pad.bottom} fill="#fffdf8" stroke="#1a2740" strokeOpacity="0.35" />
      {ticks.map((t) => (
        <g key={t.value}>
          <line x1={pad.left} x2={width - pad.right} y1={t.y} y2={t.y} stroke="#1a2740" strokeOpacity="0.08" />
          <text x={pad.left - 8} y={t.y + 4} textAnchor="end" fontSize="11" fill="#44506a" className="figures">
            {t.value.toFixed(1)}
          </text>
        </g>
      ))}
      <text x={pad.left - 8} y={pad.top - 6} textAnchor="end" fontSize="11" fill="#44506a">
        s
      </text>
      {band && <polygon points={band} fill="#e9c8b0" fillOpacity="0.55" stroke="#b0602f" strokeOpacity="0.35" data-testid="target-band" />}
      {labels.map((l) => (
        <text key={l.f} x={l.x} y={height - pad.bottom + 16} textAnchor="middle" fontSize="11" fill="#44506a" className="figures">
          {l.text}
        </text>
      ))}
      <text x={width - pad.right} y={height - 4} textAnchor="end" fontSize="10" fill="#566075">
        Hz
      </text>
      <polyline points={before} fill="none" stroke="#44506a" strokeWidth="1.6" strokeDasharray="5 4" data-curve="before" />
      {treated && <polyline points={after} fill="none" stroke="#b0602f" strokeWidth="2.6" data-curve="after" />}
      {points.map((p, i) =>
        (treated ? p.after : p.before) === null ? null : (
          <circle key={p.f} cx={x(i)} cy={y((treated ? p.after : p.before) as number)} r="3.5" fill={treated ? "#b0602f" : "#44506a"} />
        ),
      )}
    </svg>
  );
}

export function ReverbLegend({ treated }: { treated: boolean }) {
  return (
    <ul className="flex flex-wrap gap-5 text-xs text-ink-soft">
      <li className="flex items-center gap-2">
        <span className="inline-block h-3 w-5 border border-copper/40 bg-copper-soft/60" /> target band
      </li>
      <li className="flex items-center gap-2">
        <svg width="22" height="8" aria-hidden>
          <line x1="0" x2="22" y1="4" y2="4" stroke="#44506a" strokeWidth="1.6" strokeDasharray="5 3" />
        </svg>
        before treatment
      </li>
      {treated && (
        <li className="flex items-center gap-2">
          <svg width="22" height="8" aria-hidden>
            <line x1="0" x2="22" y1="4" y2="4" stroke="#b0602f" strokeWidth="2.6" />
          </svg>
          after treatment
        </li>
      )}
    </ul>
  );
}
