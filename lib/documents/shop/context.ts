import type { SubmittalSnapshot } from "@/lib/submittals";
import type { SubmittalDecision } from "../decision";
import type { Formatters, UnitPreference } from "../format";

export interface ShopPackInput {
  snapshot: SubmittalSnapshot;
  /** SHA-256 of the submittal PDF, as stored when the revision was issued */
  submittalPdfHash: string;
  /** the client's approval (approved, or approved as noted) */
  approval: SubmittalDecision;
  units?: UnitPreference;
}

export interface ShopContext {
  s: SubmittalSnapshot;
  hash: string;
  pdfHash: string;
  approval: SubmittalDecision;
  f: Formatters;
}

/** The sheet's drawing area on A3 landscape, inside the margins and left of the title block (pt). */
export const SHEET = { width: 1190.55, height: 841.89, margin: 24, titleBlock: 186, gap: 14 } as const;
export const DRAWING_AREA = {
  width: SHEET.width - 2 * SHEET.margin - SHEET.titleBlock - SHEET.gap,
  height: SHEET.height - 2 * SHEET.margin,
};
