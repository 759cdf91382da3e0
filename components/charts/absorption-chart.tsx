import { absorptionGeometry } from "@/lib/charts/absorption-geometry";

export type CurveTone = "copper" | "ink" | "faint" | "sage";
/** solid, dashed or dotted: curves told apart by their line as well as their colour */
export type CurveLine = "solid" | "dashed" | "dotted";
export type Curve = { id: string; label: string; tone: CurveTone; line?: CurveLine; /** @deprecated use line */ dashed?: boolean; points: { f: number; value: number }[] };
const lineOf = (c: Curve): CurveLine => c.line ?? (c.dashed ? "dashed" : "solid");
export type Marker = { f: number; label: string };

const STROKE: Record<CurveTone, string> = { copper: "#b0602f", ink: "#1a2740", faint: "#7c8598", sage: "#3f7a4a" };
const DASH: Record<CurveLine, string | undefined> = { solid: undefined, dashed: "7 4", dotted: "1.5 3.5" };

// Absorption against frequency: log axis 50 Hz – 5 kHz labelled at octave centres, α from 0 to
// 1 (or higher, if a value exceeds 1, as ASTM values may). Drawn in Cavitas's own sheet style;
// the geometry is shared with the documents (lib/charts/absorption-geometry.ts).
export function AbsorptionChart({ curves, markers = [], height = 300 }: { curves: Curve[]; markers?: Marker[]; height?: number }) {
  const width = 720;
  const pad = { left: 44, right: 16, top: 18, bottom: 34 };
  const { x, grid, octaves, line } = absorptionGeometry(curves, { width, height, pad });
  return (
    <svg viewBox={`0 0 ${width} ${height}`} className="w-full" role="img" aria-label="Absorption coefficient by frequency" data-testid="absorption-chart">
      <rect x={pad.left} y={pad.top} width={width - pad.left - pad.right} height={height - pad.top - pad.bottom} fill="#fffdf8" stroke="#1a2740" strokeOpacity="0.35" />
      {grid.map((g) => (
        <g key={g.value}>
          <line x1={pad.left} x2={width - pad.right} y1={g.y} y2={g.y} stroke="#1a2740" strokeOpacity={g.unity ? 0.3 : 0.08} strokeDasharray={g.unity ? "4 3" : undefined} />
          <text x={pad.left - 8} y={g.y + 4} textAnchor="end" fontSize="11" fill="#44506a" className="figures">
            {g.value.toFixed(1)}
          </text>
        </g>
      ))}
      {octaves.map((o) => (
        <g key={o.f}>
          <line x1={o.x} x2={o.x} y1={pad.top} y2={height - pad.bottom} stroke="#1a2740" strokeOpacity="0.1" />
          <text x={o.x} y={height - pad.bottom + 16} textAnchor="middle" fontSize="11" fill="#44506a" className="figures">
            {o.text}
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
          strokeWidth={c.tone === "copper" ? 2.4 : lineOf(c) === "dotted" ? 2.6 : 1.6}
          strokeDasharray={DASH[lineOf(c)]}
          strokeLinecap={lineOf(c) === "dotted" ? "round" : undefined}
          strokeLinejoin="round"
          points={line(c.points)}
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
          <svg width="24" height="8" aria-hidden>
            <line x1="1" x2="23" y1="4" y2="4" stroke={STROKE[c.tone]} strokeWidth="2.4" strokeDasharray={DASH[lineOf(c)]} strokeLinecap={lineOf(c) === "dotted" ? "round" : undefined} />
          </svg>
          {c.label}
        </li>
      ))}
    </ul>
  );
}
