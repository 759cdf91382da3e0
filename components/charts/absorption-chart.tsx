import { hzLabel, logScale, OCTAVE_TICKS } from "./log-axis";

export type CurveTone = "copper" | "ink" | "faint" | "sage";
export type Curve = { id: string; label: string; tone: CurveTone; dashed?: boolean; points: { f: number; value: number }[] };
export type Marker = { f: number; label: string };

const STROKE: Record<CurveTone, string> = { copper: "#b0602f", ink: "#1a2740", faint: "#7c8598", sage: "#4f6f52" };

// Absorption against frequency: log axis 50 Hz – 5 kHz labelled at octave centres, α from 0 to
// 1 (or higher, if a value exceeds 1, as ASTM values may). Drawn in Cavitas's own sheet style.
export function AbsorptionChart({ curves, markers = [], height = 300 }: { curves: Curve[]; markers?: Marker[]; height?: number }) {
  const width = 720;
  const pad = { left: 44, right: 16, top: 18, bottom: 34 };
  const maxValue = Math.max(1, ...curves.flatMap((c) => c.points.map((p) => p.value)));
  const yMax = Math.ceil(maxValue * 10) / 10;
  const x = logScale(45, 5600, pad.left, width - pad.right);
  const y = (v: number) => pad.top + (1 - v / yMax) * (height - pad.top - pad.bottom);
  const gridValues = Array.from({ length: Math.round(yMax * 5) + 1 }, (_, i) => i * 0.2).filter((v) => v <= yMax + 1e-9);
  return (
    <svg viewBox={`0 0 ${width} ${height}`} className="w-full" role="img" aria-label="Absorption coefficient by frequency" data-testid="absorption-chart">
      <rect x={pad.left} y={pad.top} width={width - pad.left - pad.right} height={height - pad.top - pad.bottom} fill="#fffdf8" stroke="#1a2740" strokeOpacity="0.35" />
      {gridValues.map((v) => (
        <g key={v}>
          <line x1={pad.left} x2={width - pad.right} y1={y(v)} y2={y(v)} stroke="#1a2740" strokeOpacity={v === 1 ? 0.3 : 0.08} strokeDasharray={v === 1 ? "4 3" : undefined} />
          <text x={pad.left - 8} y={y(v) + 4} textAnchor="end" fontSize="11" fill="#44506a" className="figures">
            {v.toFixed(1)}
          </text>
        </g>
      ))}
      {OCTAVE_TICKS.map((f) => (
        <g key={f}>
          <line x1={x(f)} x2={x(f)} y1={pad.top} y2={height - pad.bottom} stroke="#1a2740" strokeOpacity="0.1" />
          <text x={x(f)} y={height - pad.bottom + 16} textAnchor="middle" fontSize="11" fill="#44506a" className="figures">
            {hzLabel(f)}
          </text>
        </g>
      ))}
      <text x={width - pad.right} y={height - 4} textAnchor="end" fontSize="10" fill="#566075">
        Hz
      </text>
      <text x={pad.left - 8} y={pad.top - 6} textAnchor="end" fontSize="12" fill="#44506a">
        α
      </text>
      {markers.map((m, i) => (
        <g key={`${m.label}-${i}`} data-testid="chart-marker">
          <line x1={x(m.f)} x2={x(m.f)} y1={pad.top} y2={height - pad.bottom} stroke="#b0602f" strokeWidth="1" strokeDasharray="2 3" />
          <text x={x(m.f) + 4} y={pad.top + 12 + i * 13} fontSize="10.5" fill="#8a4520">
            {m.label}
          </text>
        </g>
      ))}
      {curves.map((c) => (
        <polyline
          key={c.id}
          data-curve={c.id}
          fill="none"
          stroke={STROKE[c.tone]}
          strokeWidth={c.tone === "copper" ? 2.4 : 1.6}
          strokeDasharray={c.dashed ? "6 4" : undefined}
          strokeLinejoin="round"
          points={c.points.map((p) => `${x(p.f).toFixed(1)},${y(Math.max(0, p.value)).toFixed(1)}`).join(" ")}
        />
      ))}
    </svg>
  );
}

export function ChartLegend({ curves }: { curves: Curve[] }) {
  return (
    <ul className="flex flex-wrap gap-4 text-xs text-ink-soft">
      {curves.map((c) => (
        <li key={c.id} className="flex items-center gap-2">
          <svg width="22" height="8" aria-hidden>
            <line x1="0" x2="22" y1="4" y2="4" stroke={STROKE[c.tone]} strokeWidth="2.4" strokeDasharray={c.dashed ? "5 3" : undefined} />
          </svg>
          {c.label}
        </li>
      ))}
    </ul>
  );
}
