/**
 * A panel's facing as the board draws it. Zoomed in, the holes or slots at true scale, only
 * those inside the visible part of the surface (so a close view of a large wall generates only
 * what is on screen); zoomed out, where a hole would be smaller than MIN_MARK_PX, an even tone
 * over the perforated field whose darkness is the open area, so that the switch from marks to
 * tone keeps the field's average darkness.
 */
import { type Facing, facingOpenArea } from "@/lib/acoustics/build-up";
import { type Borders, type HoleLayout, layoutPattern, type PatternLayout, type SlotDirection, type SlotLayout } from "./pattern-layout";
import type { Point, Rect } from "./types";

/** Below this size on screen a hole or slot is drawn as tone (common practice for legibility: about a pixel and a half). */
export const MIN_MARK_PX = 1.5;
/** The lightest tone drawn, so a micro-perforated field under 1 % open area still reads as perforated. */
export const MIN_TONE = 0.02;
/** At most this many marks for one panel in one frame; past it the field is drawn as tone. */
export const DEFAULT_MAX_MARKS = 100_000;

export interface Detail {
  mode: "marks" | "tone";
  /** a hole's diameter or a slot's width on screen, px */
  markPx: number;
  /** darkness of the tone, 0 (paper) to 1 (ink): the open area, at least MIN_TONE */
  tone: number;
}

export function visibleDetail(scalePxPerM: number, facing: Facing): Detail {
  const markPx = (facing.kind === "slots" ? facing.slotWidth : facing.holeDiameter) * scalePxPerM;
  const tone = Math.min(1, Math.max(MIN_TONE, facingOpenArea(facing)));
  return { mode: markPx >= MIN_MARK_PX ? "marks" : "tone", markPx, tone };
}

/**
 * Hole centres on the surface (x, y pairs, m from the datum) of a panel whose lower-left corner
 * is `at`, only the holes that reach into `clip`. `truncated` (and no centres) when more than
 * `maxMarks` would be visible.
 */
export function holeCentresIn(
  layout: HoleLayout,
  at: Point,
  clip: Rect,
  maxMarks = DEFAULT_MAX_MARKS,
): { centres: Float64Array; count: number; truncated: boolean } {
  const r = layout.holeDiameter / 2;
  const y0 = at.y + layout.firstY;
  const rowFrom = Math.max(0, Math.ceil((clip.y - r - y0) / layout.rowPitch));
  const rowTo = Math.min(layout.rows - 1, Math.floor((clip.y + clip.height + r - y0) / layout.rowPitch));
  const columns = (row: number) => {
    const odd = row % 2 === 1;
    const x0 = at.x + layout.firstX + (odd ? layout.oddShift : 0);
    const n = odd ? layout.columnsOdd : layout.columnsEven;
    const from = Math.max(0, Math.ceil((clip.x - r - x0) / layout.pitch));
    const to = Math.min(n - 1, Math.floor((clip.x + clip.width + r - x0) / layout.pitch));
    return { x0, from, to };
  };
  let count = 0;
  for (let row = rowFrom; row <= rowTo; row++) {
    const c = columns(row);
    if (c.to >= c.from) count += c.to - c.from + 1;
  }
  if (count > maxMarks) return { centres: new Float64Array(0), count, truncated: true };
  const centres = new Float64Array(2 * count);
  let k = 0;
  for (let row = rowFrom; row <= rowTo; row++) {
    const c = columns(row);
    const y = y0 + row * layout.rowPitch;
    for (let col = c.from; col <= c.to; col++) {
      centres[k++] = c.x0 + col * layout.pitch;
      centres[k++] = y;
    }
  }
  return { centres, count, truncated: false };
}

/**
 * The slots on the surface of a panel whose lower-left corner is `at`, cut to `clip`: x, y,
 * width, height of each visible piece, m from the datum.
 */
export function slotRectsIn(layout: SlotLayout, at: Point, clip: Rect): { rects: Float64Array; count: number } {
  const vertical = layout.direction === "vertical";
  const w = layout.slotWidth;
  const f = layout.field;
  // along: the slot's length; across: the direction in which slots repeat.
  const alongFrom = Math.max(vertical ? at.y + f.y : at.x + f.x, vertical ? clip.y : clip.x);
  const alongTo = Math.min(vertical ? at.y + f.y + f.height : at.x + f.x + f.width, vertical ? clip.y + clip.height : clip.x + clip.width);
  const c0 = (vertical ? at.x : at.y) + layout.first;
  const clipFrom = vertical ? clip.x : clip.y;
  const clipTo = vertical ? clip.x + clip.width : clip.y + clip.height;
  const from = Math.max(0, Math.ceil((clipFrom - w / 2 - c0) / layout.slotPitch));
  const to = Math.min(layout.slotCount - 1, Math.floor((clipTo + w / 2 - c0) / layout.slotPitch));
  const count = alongTo > alongFrom && to >= from ? to - from + 1 : 0;
  const rects = new Float64Array(4 * count);
  for (let i = 0; i < count; i++) {
    const lo = Math.max(clipFrom, c0 + (from + i) * layout.slotPitch - w / 2);
    const hi = Math.min(clipTo, c0 + (from + i) * layout.slotPitch + w / 2);
    rects[4 * i] = vertical ? lo : alongFrom;
    rects[4 * i + 1] = vertical ? alongFrom : lo;
    rects[4 * i + 2] = vertical ? hi - lo : alongTo - alongFrom;
    rects[4 * i + 3] = vertical ? alongTo - alongFrom : hi - lo;
  }
  return { rects, count };
}

export interface PanelPattern {
  layout: PatternLayout;
  /** the perforated field on the surface, m from the datum */
  field: Rect;
  detail: Detail;
  /** hole centres (x, y pairs) when holes are drawn */
  holes?: Float64Array;
  /** slot pieces (x, y, width, height) when slots are drawn */
  slots?: Float64Array;
}

/** Everything needed to draw one panel's facing in the current view. */
export function panelPattern(
  facing: Facing,
  panel: Rect,
  borders: Borders,
  view: { scale: number; clip: Rect; maxMarks?: number; slotDirection?: SlotDirection },
): PanelPattern {
  const layout = layoutPattern(facing, panel, borders, view.slotDirection);
  const field = { x: panel.x + layout.field.x, y: panel.y + layout.field.y, width: layout.field.width, height: layout.field.height };
  const detail = visibleDetail(view.scale, facing);
  if (detail.mode === "tone") return { layout, field, detail };
  if (layout.kind === "slots") return { layout, field, detail, slots: slotRectsIn(layout, panel, view.clip).rects };
  const holes = holeCentresIn(layout, panel, view.clip, view.maxMarks);
  if (holes.truncated) return { layout, field, detail: { ...detail, mode: "tone" } };
  return { layout, field, detail, holes: holes.centres };
}
