/**
 * Drawing to scale on paper. A PDF point is 1/72 in, so one metre is 72 / 0.0254 ≈ 2834.6 pt at
 * 1:1; a drawing at 1:n prints true when the sheet is printed at 100 %. Scales come from the
 * usual architectural series, the largest that fits the space given.
 */
import type { View } from "@/lib/board/view";

export const PT_PER_M = 72 / 0.0254;
export const DRAWING_SCALES = [1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000, 2000] as const;

export interface Scale {
  /** the n of 1:n */
  denominator: number;
  /** points per metre on the sheet */
  ptPerM: number;
}

export const scaleOf = (denominator: number): Scale => ({ denominator, ptPerM: PT_PER_M / denominator });

/** The largest scale of the series at which `size` (m) fits in `box` (pt). */
export function chooseScale(size: { width: number; height: number }, box: { width: number; height: number }): Scale {
  const fits = DRAWING_SCALES.find((n) => size.width * (PT_PER_M / n) <= box.width && size.height * (PT_PER_M / n) <= box.height);
  return scaleOf(fits ?? DRAWING_SCALES[DRAWING_SCALES.length - 1]);
}

/**
 * The board's view (lib/board/view.ts: screenX = offsetX + x·scale, screenY = offsetY − y·scale)
 * that draws `size` at `scale`, centred in `box`, so the documents place rectangles with the
 * board's own rectToScreen.
 */
export function centredView(size: { width: number; height: number }, box: { width: number; height: number }, scale: Scale): View {
  return { scale: scale.ptPerM, offsetX: (box.width - size.width * scale.ptPerM) / 2, offsetY: (box.height + size.height * scale.ptPerM) / 2 };
}

const BAR_LENGTHS = [0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.25, 0.5, 1, 2, 5, 10, 20, 50];

/** A scale bar of a round length no longer than `maxPt`, in four equal divisions. */
export function scaleBar(scale: Scale, maxPt: number): { metres: number; pt: number; divisions: number } {
  const metres = [...BAR_LENGTHS].reverse().find((m) => m * scale.ptPerM <= maxPt) ?? BAR_LENGTHS[0];
  return { metres, pt: metres * scale.ptPerM, divisions: 4 };
}
