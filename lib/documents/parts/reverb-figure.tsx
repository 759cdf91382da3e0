import { Circle, G, Line, Polygon, Polyline, Rect, Svg } from "@react-pdf/renderer";
import { reverbGeometry, type ReverbPoint } from "@/lib/charts/reverb-geometry";
import { COLOURS } from "../theme";
import { SvgText } from "./svg-text";

/**
 * Reverberation time per octave against the target band, drawn as vectors with the same
 * geometry as the Check screen's chart: the band shaded, before treatment dashed, after in copper.
 */
export function ReverbFigure({ points, treated, width = 515, height = 210 }: { points: ReverbPoint[]; treated: boolean; width?: number; height?: number }) {
  const pad = { left: 34, right: 12, top: 18, bottom: 24 };
  const g = reverbGeometry(points, { width, height, pad });
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Rect x={pad.left} y={pad.top} width={width - pad.left - pad.right} height={height - pad.top - pad.bottom} fill="#fffdf8" stroke={COLOURS.ink} strokeOpacity={0.35} strokeWidth={0.6} />
      {g.ticks.map((t) => (
        <G key={t.value}>
          <Line x1={pad.left} x2={width - pad.right} y1={t.y} y2={t.y} stroke={COLOURS.ink} strokeOpacity={0.1} strokeWidth={0.5} />
          <SvgText x={pad.left - 5} y={t.y + 2.5} anchor="end" size={7}>
            {t.value.toFixed(1)}
          </SvgText>
        </G>
      ))}
      <SvgText x={pad.left - 5} y={pad.top - 9} anchor="end" size={7}>
        s
      </SvgText>
      {g.band && <Polygon points={g.band} fill={COLOURS.copperSoft} fillOpacity={0.6} stroke={COLOURS.copper} strokeOpacity={0.35} strokeWidth={0.5} />}
      {g.labels.map((l) => (
        <SvgText key={l.f} x={l.x} y={height - pad.bottom + 11} anchor="middle" size={7}>
          {l.text}
        </SvgText>
      ))}
      <SvgText x={width - pad.right} y={height - 3} anchor="end" size={7}>
        Hz
      </SvgText>
      {g.before && <Polyline points={g.before} fill="none" stroke={COLOURS.inkSoft} strokeWidth={1} strokeDasharray="4 3" />}
      {treated && g.after && <Polyline points={g.after} fill="none" stroke={COLOURS.copper} strokeWidth={1.8} />}
      {points.map((p, i) => {
        const v = treated ? p.after : p.before;
        return v === null ? null : <Circle key={p.f} cx={g.x(i)} cy={g.y(v)} r={2.2} fill={treated ? COLOURS.copper : COLOURS.inkSoft} />;
      })}
    </Svg>
  );
}

/** The legend under the reverberation figure, as plain marks and words. */
export function ReverbLegendMarks({ treated }: { treated: boolean }) {
  return (
    <Svg width={300} height={12} viewBox="0 0 300 12">
      <Rect x={0} y={2} width={14} height={8} fill={COLOURS.copperSoft} stroke={COLOURS.copper} strokeOpacity={0.4} strokeWidth={0.5} />
      <SvgText x={18} y={9} size={7}>
        target band
      </SvgText>
      <Line x1={80} x2={96} y1={6} y2={6} stroke={COLOURS.inkSoft} strokeWidth={1} strokeDasharray="4 3" />
      <SvgText x={100} y={9} size={7}>
        before treatment
      </SvgText>
      {treated && <Line x1={175} x2={191} y1={6} y2={6} stroke={COLOURS.copper} strokeWidth={1.8} />}
      {treated && (
        <SvgText x={195} y={9} size={7}>
          after treatment
        </SvgText>
      )}
    </Svg>
  );
}
