import { Circle, G, Line, Rect, Svg } from "@react-pdf/renderer";
import { rectToScreen, toScreen } from "@/lib/board/view";
import type { SnapshotPin, SnapshotPlacement, SnapshotSurface } from "@/lib/submittals";
import type { Formatters } from "../format";
import { centredView, chooseScale, scaleBar, type Scale } from "../scale";
import { COLOURS } from "../theme";
import { Dimension, RunningDimension } from "./dimension";
import { SvgText } from "./svg-text";

const margins = (setOut: boolean) => (setOut ? { left: 62, right: 12, top: 12, bottom: 84 } : { left: 30, right: 12, top: 12, bottom: 46 });

/** The scale a surface will be drawn at in a figure of `width` × `height` pt. */
export function elevationScale(surface: Pick<SnapshotSurface, "width" | "height">, width: number, height: number, setOut = false): Scale {
  const m = margins(setOut);
  return chooseScale(surface, { width: width - m.left - m.right, height: height - m.top - m.bottom });
}

/** Distinct values, to a tenth of a millimetre, in order. */
const distinct = (values: number[]) => [...new Map(values.map((v) => [Math.round(v * 10_000), v])).values()].sort((a, b) => a - b);

/**
 * A surface seen face on, to scale: its outline, openings (dashed, crossed, named), the panels
 * with their codes and types, open review pins, the overall dimensions, the datum at the
 * lower-left corner and a scale bar; with `setOut`, running dimensions from the datum to every
 * panel's left and bottom edge. Placed with the board's own view arithmetic
 * (lib/board/view.ts), so the drawing and the Board put every panel in the same place.
 */
export function ElevationFigure(props: {
  surface: SnapshotSurface;
  placements: readonly SnapshotPlacement[];
  pins?: readonly SnapshotPin[];
  width: number;
  height: number;
  f: Formatters;
  sheet: string;
  setOut?: boolean;
}) {
  const { surface, placements, pins = [], width, height, f, setOut = false } = props;
  const m = margins(setOut);
  const box = { width: width - m.left - m.right, height: height - m.top - m.bottom };
  const scale = elevationScale(surface, width, height, setOut);
  const v = centredView(surface, box, scale);
  const at = (r: { x: number; y: number; width: number; height: number }) => {
    const s = rectToScreen(v, r);
    return { x: s.x + m.left, y: s.y + m.top, width: s.width, height: s.height };
  };
  const outline = at({ x: 0, y: 0, width: surface.width, height: surface.height });
  const bottom = outline.y + outline.height;
  const bar = scaleBar(scale, Math.min(160, box.width / 2));
  return (
    <Svg width={width} height={height} viewBox={`0 0 ${width} ${height}`}>
      <Rect x={outline.x} y={outline.y} width={outline.width} height={outline.height} fill="#fffdf8" stroke={COLOURS.ink} strokeWidth={1.2} />
      {surface.openings.map((o, i) => {
        const r = at(o);
        return (
          <G key={`o${i}`}>
            <Rect x={r.x} y={r.y} width={r.width} height={r.height} fill={COLOURS.paperDeep} stroke={COLOURS.ink} strokeWidth={0.6} strokeDasharray="3 2" />
            <Line x1={r.x} y1={r.y} x2={r.x + r.width} y2={r.y + r.height} stroke={COLOURS.ink} strokeOpacity={0.35} strokeWidth={0.4} />
            <Line x1={r.x + r.width} y1={r.y} x2={r.x} y2={r.y + r.height} stroke={COLOURS.ink} strokeOpacity={0.35} strokeWidth={0.4} />
            <SvgText x={r.x + 2.5} y={r.y + 7}>{o.name || o.kind}</SvgText>
          </G>
        );
      })}
      {placements.map((p) => {
        const r = at(p);
        const codeSize = Math.min(6, r.width / 4.2, r.height / 1.6);
        return (
          <G key={`${p.surfaceKey}-${p.code}`}>
            <Rect x={r.x} y={r.y} width={r.width} height={r.height} fill="#efe9dc" stroke={COLOURS.ink} strokeWidth={0.6} />
            {codeSize >= 3 && (
              <SvgText x={r.x + r.width / 2} y={r.y + r.height / 2 + codeSize / 3} anchor="middle" figures size={codeSize} fill={COLOURS.ink}>
                {p.code}
              </SvgText>
            )}
            {codeSize >= 3 && r.height > 3.2 * codeSize && (
              <SvgText x={r.x + r.width / 2} y={r.y + r.height / 2 + codeSize * 1.5} anchor="middle" size={codeSize * 0.8}>
                {p.type}
              </SvgText>
            )}
          </G>
        );
      })}
      {pins.map((pin) => {
        const s = toScreen(v, pin);
        return (
          <G key={`pin${pin.number}`}>
            <Circle cx={s.x + m.left} cy={s.y + m.top} r={4.5} fill={COLOURS.copper} stroke="#fffdf8" strokeWidth={0.8} />
            <SvgText x={s.x + m.left} y={s.y + m.top + 2} anchor="middle" size={5.5} weight={600} fill="#fffdf8">
              {String(pin.number)}
            </SvgText>
          </G>
        );
      })}
      {/* datum: the lower-left corner every set-out is measured from */}
      <Circle cx={outline.x} cy={bottom} r={2.2} fill={COLOURS.ink} />
      <SvgText x={outline.x + 4} y={bottom - 3}>datum 0,0</SvgText>
      {setOut && (
        <RunningDimension axis="x" datum={outline.x} line={bottom + 10} at={distinct(placements.map((p) => p.x)).map((x) => ({ pt: at({ x, y: 0, width: 0, height: 0 }).x, label: f.panel(x) }))} />
      )}
      {setOut && (
        <RunningDimension axis="y" datum={bottom} line={outline.x - 10} at={distinct(placements.map((p) => p.y)).map((y) => ({ pt: at({ x: 0, y, width: 0, height: 0 }).y, label: f.panel(y) }))} />
      )}
      <Dimension axis="x" from={outline.x} to={outline.x + outline.width} y={bottom + (setOut ? 48 : 12)} label={f.panel(surface.width)} />
      <Dimension axis="y" from={outline.y} to={bottom} x={outline.x - (setOut ? 48 : 12)} label={f.panel(surface.height)} />
      <ScaleBarMarks x={m.left} y={height - 14} bar={bar} f={f} />
      <SvgText x={width - m.right} y={height - 6} anchor="end">
        {`Scale 1:${scale.denominator} when printed at 100 % on ${props.sheet}`}
      </SvgText>
    </Svg>
  );
}

export function ScaleBarMarks({ x, y, bar, f }: { x: number; y: number; bar: ReturnType<typeof scaleBar>; f: Formatters }) {
  const step = bar.pt / bar.divisions;
  return (
    <G>
      {Array.from({ length: bar.divisions }, (_, i) => (
        <Rect key={i} x={x + i * step} y={y - 3} width={step} height={3} fill={i % 2 ? "#fffdf8" : COLOURS.ink} stroke={COLOURS.ink} strokeWidth={0.4} />
      ))}
      <SvgText x={x} y={y + 7} figures size={6}>
        0
      </SvgText>
      <SvgText x={x + bar.pt} y={y + 7} anchor="middle" figures size={6}>
        {bar.metres >= 1 ? f.len(bar.metres) : f.panel(bar.metres)}
      </SvgText>
    </G>
  );
}
