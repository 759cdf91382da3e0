import { G, Line, Polyline, Rect, Svg } from "@react-pdf/renderer";
import { absorptionGeometry } from "@/lib/charts/absorption-geometry";
import { COLOURS } from "../theme";
import { SvgText } from "./svg-text";

export type FigureCurve = { points: { f: number; value: number }[]; tone: "copper" | "faint"; dashed?: boolean };

/**
 * A build-up's absorption curve as vectors, with the Bench screen's geometry: log frequency axis
 * labelled at octave centres, α from 0 to 1 (higher if a value exceeds 1), markers in copper.
 */
export function AbsorptionFigure({ curves, markers, width = 250, height = 150 }: { curves: FigureCurve[]; markers: { f: number; label: string }[]; width?: number; height?: number }) {
  const pad = { left: 26, right: 8, top: 16, bottom: 22 };
  const g = absorptionGeometry(curves, { width, height, pad });
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Rect x={pad.left} y={pad.top} width={width - pad.left - pad.right} height={height - pad.top - pad.bottom} fill="#fffdf8" stroke={COLOURS.ink} strokeOpacity={0.35} strokeWidth={0.6} />
      {g.grid.map((l) => (
        <G key={l.value}>
          <Line x1={pad.left} x2={width - pad.right} y1={l.y} y2={l.y} stroke={COLOURS.ink} strokeOpacity={l.unity ? 0.3 : 0.1} strokeWidth={0.5} strokeDasharray={l.unity ? "3 2" : undefined} />
          <SvgText x={pad.left - 4} y={l.y + 2.3} anchor="end">
            {l.value.toFixed(1)}
          </SvgText>
        </G>
      ))}
      {g.octaves.map((o) => (
        <G key={o.f}>
          <Line x1={o.x} x2={o.x} y1={pad.top} y2={height - pad.bottom} stroke={COLOURS.ink} strokeOpacity={0.1} strokeWidth={0.5} />
          <SvgText x={o.x} y={height - pad.bottom + 9} anchor="middle">
            {o.text}
          </SvgText>
        </G>
      ))}
      <SvgText x={width - pad.right} y={height - 3} anchor="end">
        Hz
      </SvgText>
      <SvgText x={pad.left - 4} y={pad.top - 8} anchor="end">
        α
      </SvgText>
      {markers.map((m, i) => (
        <G key={`${m.label}-${i}`}>
          <Line x1={g.x(m.f)} x2={g.x(m.f)} y1={pad.top} y2={height - pad.bottom} stroke={COLOURS.copper} strokeWidth={0.6} strokeDasharray={i ? "1.5 1" : "1.5 2"} />
          <Line x1={width - pad.right - 78} x2={width - pad.right - 70} y1={pad.top + 6 + i * 8} y2={pad.top + 6 + i * 8} stroke={COLOURS.copper} strokeWidth={0.6} strokeDasharray={i ? "1.5 1" : "1.5 2"} />
          <SvgText x={width - pad.right - 67} y={pad.top + 8 + i * 8} size={6} fill={COLOURS.copperDeep}>
            {m.label}
          </SvgText>
        </G>
      ))}
      {curves.map((c, i) => (
        <Polyline key={i} points={g.line(c.points)} fill="none" stroke={c.tone === "copper" ? COLOURS.copper : COLOURS.inkFaint} strokeWidth={c.tone === "copper" ? 1.5 : 0.9} strokeDasharray={c.dashed ? "3 2" : undefined} />
      ))}
    </Svg>
  );
}
