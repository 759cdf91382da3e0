/**
 * What a moving panel can snap to, as sorted line lists built once when a drag starts: every
 * vertical line (x) and horizontal line (y) of the other panels, the openings and the surface,
 * with the stretch each line covers (for drawing the guide). Each pointer move then costs a
 * binary search per moving edge, O(log n), and allocates nothing until a snap is found.
 */
import { orderByValue } from "./order";
import type { BoardSurface, Placement } from "./types";

export const SNAP_SOURCES = ["surface", "opening", "panel", "grid"] as const;
export type SnapSource = (typeof SNAP_SOURCES)[number];

/** Lines along one axis, sorted by position; lo..hi is the stretch each covers on the other axis. */
export interface SnapLines {
  readonly position: Float64Array;
  readonly lo: Float64Array;
  readonly hi: Float64Array;
  /** index into SNAP_SOURCES */
  readonly source: Uint8Array;
}

export interface SnapIndex {
  readonly surface: { width: number; height: number };
  /** vertical lines: left and right edges */
  readonly x: SnapLines;
  /** horizontal lines: bottom and top edges */
  readonly y: SnapLines;
  /** centre lines, for snapping a panel's centre to another's or an opening's */
  readonly xCentre: SnapLines;
  readonly yCentre: SnapLines;
}

export interface SnapIndexOptions {
  /** placements that are moving (the selection being dragged) and so are no targets */
  exclude?: ReadonlySet<string>;
  panels?: boolean;
  openings?: boolean;
  surface?: boolean;
}

class LineCollector {
  private readonly entries: number[] = [];
  add(position: number, lo: number, hi: number, source: SnapSource) {
    this.entries.push(position, lo, hi, SNAP_SOURCES.indexOf(source));
  }
  build(): SnapLines {
    const n = this.entries.length / 4;
    const e = this.entries;
    const positions = new Float64Array(n);
    for (let i = 0; i < n; i++) positions[i] = e[4 * i];
    const order = new Int32Array(n);
    orderByValue(positions, n, new Float64Array(n), order);
    const lines = { position: new Float64Array(n), lo: new Float64Array(n), hi: new Float64Array(n), source: new Uint8Array(n) };
    for (let to = 0; to < n; to++) {
      const from = order[to];
      lines.position[to] = e[4 * from];
      lines.lo[to] = e[4 * from + 1];
      lines.hi[to] = e[4 * from + 2];
      lines.source[to] = e[4 * from + 3];
    }
    return lines;
  }
}

export function buildSnapIndex(surface: BoardSurface, placements: readonly Placement[], options: SnapIndexOptions = {}): SnapIndex {
  const x = new LineCollector();
  const y = new LineCollector();
  const xc = new LineCollector();
  const yc = new LineCollector();
  const addRect = (r: { x: number; y: number; width: number; height: number }, source: SnapSource) => {
    const r1 = r.x + r.width;
    const t1 = r.y + r.height;
    x.add(r.x, r.y, t1, source);
    x.add(r1, r.y, t1, source);
    y.add(r.y, r.x, r1, source);
    y.add(t1, r.x, r1, source);
    xc.add(r.x + r.width / 2, r.y, t1, source);
    yc.add(r.y + r.height / 2, r.x, r1, source);
  };
  if (options.surface !== false) addRect({ x: 0, y: 0, width: surface.width, height: surface.height }, "surface");
  if (options.openings !== false) for (const o of surface.openings) addRect(o, "opening");
  if (options.panels !== false) {
    for (const p of placements) if (!options.exclude?.has(p.id)) addRect(p, "panel");
  }
  return { surface: { width: surface.width, height: surface.height }, x: x.build(), y: y.build(), xCentre: xc.build(), yCentre: yc.build() };
}

/** Index of the first line at or after `value` (lines.position.length when none). */
export function lowerBound(lines: SnapLines, value: number): number {
  const p = lines.position;
  let lo = 0;
  let hi = p.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (p[mid] < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Signed distance from `value` to the nearest line (target − value); Infinity when there are none. */
export function nearestOffset(lines: SnapLines, value: number): number {
  const i = lowerBound(lines, value);
  const p = lines.position;
  const after = i < p.length ? p[i] - value : Infinity;
  const before = i > 0 ? p[i - 1] - value : -Infinity;
  return after <= -before ? after : before;
}
