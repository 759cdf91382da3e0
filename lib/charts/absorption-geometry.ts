/**
 * Geometry of the absorption chart (SPEC section 10): a log frequency axis from 45 Hz to 5.6 kHz
 * labelled at octave centres, α from 0 to 1, or higher when a value exceeds 1 (ASTM values may),
 * grid lines every 0.2. Shared by the Bench screen and the documents.
 */
import { type ChartBox, pointList, valueScale } from "./box";
import { hzLabel, logScale, OCTAVE_TICKS } from "./log-axis";

export const ABSORPTION_RANGE_HZ = [45, 5600] as const;

export function absorptionGeometry(curves: readonly { points: readonly { f: number; value: number }[] }[], box: ChartBox) {
  const maxValue = Math.max(1, ...curves.flatMap((c) => c.points.map((p) => p.value)));
  const yMax = Math.ceil(maxValue * 10) / 10;
  const x = logScale(ABSORPTION_RANGE_HZ[0], ABSORPTION_RANGE_HZ[1], box.pad.left, box.width - box.pad.right);
  const y = valueScale(box, yMax);
  const grid = Array.from({ length: Math.round(yMax * 5) + 1 }, (_, i) => i * 0.2)
    .filter((v) => v <= yMax + 1e-9)
    .map((value) => ({ value, y: y(value), unity: value === 1 }));
  const octaves = OCTAVE_TICKS.map((f) => ({ f, x: x(f), text: hzLabel(f) }));
  // Negative values (a model artefact far from resonance) are drawn at 0.
  const line = (points: readonly { f: number; value: number }[]) => pointList(points.map((p) => ({ x: x(p.f), y: y(Math.max(0, p.value)) })));
  return { yMax, x, y, grid, octaves, line };
}
