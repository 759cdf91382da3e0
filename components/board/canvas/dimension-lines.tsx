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
/** a little more than the widest figure of the 11 px text font, per character */
const CHAR = 6.3;

/** Metric drawings dimension in millimetres throughout; imperial ones in feet and inches. */
export const dimensionText = (metres: number, units: UnitPreference) => formatLength(metres, units, { scale: "panel" });

type Label = "inside" | "lifted" | "after";

/**
 * Where each line's figure goes: on the line where it fits; where it does not, a row further
 * out for the first of a chain (beside the datum, where the canvas may end) and past the
 * line's end for the others, so that neighbours in one chain do not write over each other.
 */
function labelPlaces(lines: readonly DimensionLine[], view: View, units: UnitPreference): Label[] {
  const firstOfChain = new Map<string, number>();
  lines.forEach((d, i) => {
    const key = `${d.axis}|${d.at}|${d.rows}`;
    const first = firstOfChain.get(key);
    if (first === undefined || d.from < lines[first].from) firstOfChain.set(key, i);
  });
  return lines.map((d, i) => {
    const room = (d.to - d.from) * view.scale - 6;
    if (dimensionText(d.to - d.from, units).length * CHAR + 6 <= room) return "inside";
    return firstOfChain.get(`${d.axis}|${d.at}|${d.rows}`) === i ? "lifted" : "after";
  });
}

// Dimension lines drawn as a drawing sheet does: a thin line with slashes at its ends, the
// length written on it, and extension lines back to what it measures when drawn off it.
export function DimensionLines({ lines, view, units, colour = INK }: { lines: readonly DimensionLine[]; view: View; units: UnitPreference; colour?: string }) {
  const places = labelPlaces(lines, view, units);
  return (
    <Group listening={false}>
      {lines.map((d, i) => (
        <Dimension key={`${d.kind}-${d.axis}-${i}`} line={d} view={view} units={units} colour={colour} label={places[i]} />
      ))}
    </Group>
  );
}

function Dimension({ line: d, view, units, colour, label }: { line: DimensionLine; view: View; units: UnitPreference; colour: string; label: Label }) {
  const text = dimensionText(d.to - d.from, units);
  const width = text.length * CHAR + 6;
  // Off the surface, rows grow away from it: down or left for positive rows, up or right for negative.
  const outward = Math.sign(d.rows);
  if (d.axis === "x") {
    const witness = toScreen(view, { x: 0, y: d.witness ?? d.at }).y;
    const y = toScreen(view, { x: 0, y: d.at }).y + d.rows * DIMENSION_ROW;
    const x0 = toScreen(view, { x: d.from, y: 0 }).x;
    const x1 = toScreen(view, { x: d.to, y: 0 }).x;
    const left = label === "after" ? x1 + TICK + 2 : (x0 + x1) / 2 - width / 2;
    // Lifted: one figure's height further from the surface (rows off it) or up (rows on it).
    const lift = label === "lifted" ? (outward > 0 ? FONT + 4 : -(FONT + 4)) : 0;
    return (
      <Group>
        {outward !== 0 && <Extensions colour={colour} lines={[[x0, witness + 3 * outward, x0, y + TICK * outward], [x1, witness + 3 * outward, x1, y + TICK * outward]]} />}
        <Line points={[x0, y, x1, y]} stroke={colour} strokeWidth={0.8} />
        <Line points={[x0 - TICK, y + TICK, x0 + TICK, y - TICK]} stroke={colour} strokeWidth={1.2} />
        <Line points={[x1 - TICK, y + TICK, x1 + TICK, y - TICK]} stroke={colour} strokeWidth={1.2} />
        <Rect x={left} y={y - FONT - 4 + lift} width={width} height={FONT + 2} fill={PAPER} opacity={0.85} />
        <Text x={left} y={y - FONT - 3 + lift} width={width} align="center" text={text} fontSize={FONT} fill={colour} />
      </Group>
    );
  }
  const witness = toScreen(view, { x: d.witness ?? d.at, y: 0 }).x;
  const x = toScreen(view, { x: d.at, y: 0 }).x - d.rows * DIMENSION_ROW;
  const y0 = toScreen(view, { x: 0, y: d.from }).y;
  const y1 = toScreen(view, { x: 0, y: d.to }).y;
  // A figure turned to read upwards: its box runs from `bottom` up by its width.
  const bottom = label === "after" ? y1 - TICK - 2 : (y0 + y1) / 2 + width / 2;
  // Lifted: one figure's height further from the surface (left for rows off it on the left,
  // right for rows on its right side).
  const lift = label === "lifted" ? (outward > 0 ? -(FONT + 4) : FONT + 4) : 0;
  return (
    <Group>
      {outward !== 0 && <Extensions colour={colour} lines={[[witness - 3 * outward, y0, x - TICK * outward, y0], [witness - 3 * outward, y1, x - TICK * outward, y1]]} />}
      <Line points={[x, y0, x, y1]} stroke={colour} strokeWidth={0.8} />
      <Line points={[x - TICK, y0 + TICK, x + TICK, y0 - TICK]} stroke={colour} strokeWidth={1.2} />
      <Line points={[x - TICK, y1 + TICK, x + TICK, y1 - TICK]} stroke={colour} strokeWidth={1.2} />
      <Rect x={x - FONT - 4 + lift} y={bottom} width={width} height={FONT + 2} rotation={-90} fill={PAPER} opacity={0.85} />
      <Text x={x - FONT - 3 + lift} y={bottom} width={width} rotation={-90} align="center" text={text} fontSize={FONT} fill={colour} />
    </Group>
  );
}

/** Thin extension lines, each from what is measured out to just past the dimension line. */
function Extensions({ lines, colour }: { lines: number[][]; colour: string }) {
  return (
    <>
      {lines.map((points, i) => (
        <Line key={i} points={points} stroke={colour} strokeWidth={0.5} opacity={0.6} />
      ))}
    </>
  );
}
