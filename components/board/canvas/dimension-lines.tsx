"use client";

import { Group, Line, Rect, Text } from "react-konva";
import type { DimensionLine } from "@/lib/board/set-out";
import { toScreen, type View } from "@/lib/board/view";
import { formatLength, type UnitPreference } from "@/lib/units";
import { INK, PAPER } from "./colours";

/** px between rows of dimension lines off the surface */
export const DIMENSION_ROW = 18;
const FONT = 11;
const TICK = 4;

/** Metric drawings dimension in millimetres throughout; imperial ones in feet and inches. */
export const dimensionText = (metres: number, units: UnitPreference) => formatLength(metres, units, { small: units === "metric" });

// Dimension lines drawn as a drawing sheet does: a thin line with slashes at its ends, the
// length written on it, and extension lines back to the surface for lines drawn off it.
export function DimensionLines({ lines, view, units, colour = INK }: { lines: readonly DimensionLine[]; view: View; units: UnitPreference; colour?: string }) {
  return (
    <Group listening={false}>
      {lines.map((d, i) => (
        <Dimension key={`${d.kind}-${d.axis}-${i}`} line={d} view={view} units={units} colour={colour} />
      ))}
    </Group>
  );
}

function Dimension({ line: d, view, units, colour }: { line: DimensionLine; view: View; units: UnitPreference; colour: string }) {
  const text = dimensionText(d.to - d.from, units);
  const labelWidth = text.length * 6.3 + 6;
  if (d.axis === "x") {
    const base = toScreen(view, { x: 0, y: d.at }).y;
    const y = base + d.rows * DIMENSION_ROW;
    const x0 = toScreen(view, { x: d.from, y: 0 }).x;
    const x1 = toScreen(view, { x: d.to, y: 0 }).x;
    const mid = (x0 + x1) / 2;
    return (
      <Group>
        {d.rows > 0 && <Extensions points={[x0, base + 3, x0, y + TICK, x1, base + 3, x1, y + TICK]} colour={colour} />}
        <Line points={[x0, y, x1, y]} stroke={colour} strokeWidth={0.8} />
        <Line points={[x0 - TICK, y + TICK, x0 + TICK, y - TICK]} stroke={colour} strokeWidth={1.2} />
        <Line points={[x1 - TICK, y + TICK, x1 + TICK, y - TICK]} stroke={colour} strokeWidth={1.2} />
        <Rect x={mid - labelWidth / 2} y={y - FONT - 4} width={labelWidth} height={FONT + 2} fill={PAPER} opacity={0.85} />
        <Text x={mid - labelWidth / 2} y={y - FONT - 3} width={labelWidth} align="center" text={text} fontSize={FONT} fill={colour} />
      </Group>
    );
  }
  const base = toScreen(view, { x: d.at, y: 0 }).x;
  const x = base - d.rows * DIMENSION_ROW;
  const y0 = toScreen(view, { x: 0, y: d.from }).y;
  const y1 = toScreen(view, { x: 0, y: d.to }).y;
  const mid = (y0 + y1) / 2;
  return (
    <Group>
      {d.rows > 0 && <Extensions points={[base - 3, y0, x - TICK, y0, base - 3, y1, x - TICK, y1]} colour={colour} />}
      <Line points={[x, y0, x, y1]} stroke={colour} strokeWidth={0.8} />
      <Line points={[x - TICK, y0 + TICK, x + TICK, y0 - TICK]} stroke={colour} strokeWidth={1.2} />
      <Line points={[x - TICK, y1 + TICK, x + TICK, y1 - TICK]} stroke={colour} strokeWidth={1.2} />
      <Rect x={x - FONT - 4} y={mid + labelWidth / 2} width={labelWidth} height={FONT + 2} rotation={-90} fill={PAPER} opacity={0.85} />
      <Text x={x - FONT - 3} y={mid + labelWidth / 2} width={labelWidth} rotation={-90} align="center" text={text} fontSize={FONT} fill={colour} />
    </Group>
  );
}

/** Two thin extension lines, each from the surface out to just past the dimension line. */
function Extensions({ points: p, colour }: { points: number[]; colour: string }) {
  return (
    <>
      <Line points={p.slice(0, 4)} stroke={colour} strokeWidth={0.5} opacity={0.6} />
      <Line points={p.slice(4, 8)} stroke={colour} strokeWidth={0.5} opacity={0.6} />
    </>
  );
}
