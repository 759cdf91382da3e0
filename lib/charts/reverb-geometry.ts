/**
 * Geometry of the reverberation chart (SPEC section 10): octaves evenly spaced along x (they are
 * evenly spaced on a log axis), seconds from 0 up to the next half second above every value,
 * the target band as one polygon between its lower and upper limits. Shared by the Check screen
 * and the submittal PDF, which only differ in how they paint it.
 */
import { type ChartBox, plotArea, pointList, valueScale } from "./box";
import { hzLabel } from "./log-axis";

export type ReverbPoint = { f: number; before: number | null; after: number | null; low: number | null; high: number | null };

export function reverbGeometry(points: readonly ReverbPoint[], box: ChartBox) {
  const values = points.flatMap((p) => [p.before, p.after, p.high].filter((v): v is number => v !== null));
  const yMax = Math.max(1, Math.ceil(Math.max(...values, 0) * 2) / 2);
  const step = plotArea(box).width / Math.max(1, points.length - 1);
  const x = (i: number) => box.pad.left + i * step;
  const y = valueScale(box, yMax);
  const ticks = Array.from({ length: Math.round(yMax / 0.5) + 1 }, (_, i) => ({ value: i * 0.5, y: y(i * 0.5) }));
  const line = (key: "before" | "after") =>
    pointList(points.flatMap((p, i) => (p[key] === null ? [] : [{ x: x(i), y: y(p[key] as number) }])));
  const banded = points.map((p, i) => ({ ...p, i })).filter((p) => p.low !== null || p.high !== null);
  const band =
    banded.length > 1
      ? pointList([...banded.map((p) => ({ x: x(p.i), y: y(p.high ?? yMax) })), ...[...banded].reverse().map((p) => ({ x: x(p.i), y: y(p.low ?? 0) }))])
      : null;
  const labels = points.map((p, i) => ({ f: p.f, x: x(i), text: hzLabel(p.f) }));
  return { yMax, x, y, ticks, before: line("before"), after: line("after"), band, labels };
}
