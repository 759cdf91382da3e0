import { G, Line } from "@react-pdf/renderer";
import { COLOURS } from "../theme";
import { SvgText } from "./svg-text";

/**
 * A dimension line between two points on one axis, with end ticks and its value written along
 * it (rotated for a vertical one). `x`/`y` give the line's position across its axis.
 */
export function Dimension(props: { axis: "x"; from: number; to: number; y: number; label: string; size?: number } | { axis: "y"; from: number; to: number; x: number; label: string; size?: number }) {
  const size = props.size ?? 6.5;
  const stroke = { stroke: COLOURS.ink, strokeWidth: 0.5 };
  // A label wider than its span is written beyond the far end instead of over the ticks.
  const fits = Math.abs(props.to - props.from) > props.label.length * size * 0.55 + 4;
  if (props.axis === "x") {
    const { from, to, y, label } = props;
    return (
      <G>
        <Line x1={from} x2={to} y1={y} y2={y} {...stroke} />
        <Line x1={from} x2={from} y1={y - 3} y2={y + 3} {...stroke} />
        <Line x1={to} x2={to} y1={y - 3} y2={y + 3} {...stroke} />
        <SvgText x={fits ? (from + to) / 2 : Math.max(from, to) + 3} y={fits ? y - 2 : y + size / 3} anchor={fits ? "middle" : "start"} figures size={size} fill={COLOURS.ink}>
          {label}
        </SvgText>
      </G>
    );
  }
  const { from, to, x, label } = props;
  return (
    <G>
      <Line x1={x} x2={x} y1={from} y2={to} {...stroke} />
      <Line x1={x - 3} x2={x + 3} y1={from} y2={from} {...stroke} />
      <Line x1={x - 3} x2={x + 3} y1={to} y2={to} {...stroke} />
      {fits ? (
        <SvgText x={x - 2.5} y={(from + to) / 2} anchor="middle" figures size={size} fill={COLOURS.ink} rotate={-90}>
          {label}
        </SvgText>
      ) : (
        <SvgText x={x + 4} y={Math.min(from, to) - 2} figures size={size} fill={COLOURS.ink}>
          {label}
        </SvgText>
      )}
    </G>
  );
}

/**
 * Running dimensions from a datum: one tick per distinct position along a line, each labelled
 * with its distance from the datum (rotated so neighbours do not collide). Labels closer than
 * `minGap` to the last one written are left out; the ticks stay.
 */
export function RunningDimension(props: { axis: "x" | "y"; datum: number; at: readonly { pt: number; label: string }[]; line: number; minGap?: number }) {
  const { axis, datum, at, line } = props;
  const minGap = props.minGap ?? 7.5;
  const stroke = { stroke: COLOURS.ink, strokeWidth: 0.4 };
  const ends = [datum, ...at.map((a) => a.pt)];
  const lo = Math.min(...ends);
  const hi = Math.max(...ends);
  let last = -Infinity;
  const labelled = at.filter((a) => {
    if (Math.abs(a.pt - last) < minGap) return false;
    last = a.pt;
    return true;
  });
  return axis === "x" ? (
    <G>
      <Line x1={lo} x2={hi} y1={line} y2={line} {...stroke} />
      {ends.map((pt, i) => (
        <Line key={i} x1={pt} x2={pt} y1={line - 2.5} y2={line + 2.5} {...stroke} />
      ))}
      {labelled.map((a) => (
        <SvgText key={a.pt} x={a.pt + 2} y={line + 4} figures size={5.5} fill={COLOURS.ink} rotate={90}>
          {a.label}
        </SvgText>
      ))}
    </G>
  ) : (
    <G>
      <Line y1={lo} y2={hi} x1={line} x2={line} {...stroke} />
      {ends.map((pt, i) => (
        <Line key={i} y1={pt} y2={pt} x1={line - 2.5} x2={line + 2.5} {...stroke} />
      ))}
      {labelled.map((a) => (
        <SvgText key={a.pt} x={line - 4} y={a.pt - 2} anchor="end" figures size={5.5} fill={COLOURS.ink}>
          {a.label}
        </SvgText>
      ))}
    </G>
  );
}
