/** A chart's drawing area: the whole figure and the padding around its plot, in the drawing's own units. */
export interface ChartBox {
  width: number;
  height: number;
  pad: { left: number; right: number; top: number; bottom: number };
}

/** The plot's rectangle inside the box. */
export const plotArea = (box: ChartBox) => ({
  x: box.pad.left,
  y: box.pad.top,
  width: box.width - box.pad.left - box.pad.right,
  height: box.height - box.pad.top - box.pad.bottom,
});

/** A value axis from 0 (bottom of the plot) to `max` (top). */
export const valueScale = (box: ChartBox, max: number) => (v: number) => box.pad.top + (1 - v / max) * (box.height - box.pad.top - box.pad.bottom);

/** "x,y x,y …" for an SVG polyline or polygon, to a tenth of a unit. */
export const pointList = (points: readonly { x: number; y: number }[]) => points.map((p) => `${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(" ");
