/**
 * Documents rendered from a submittal snapshot alone: the submittal PDF, the decision record,
 * the shop drawing, the facing patterns as SVG, the cut list and placement schedule as CSV, and
 * the shop pack that bundles them. Same snapshot, same inputs: same bytes.
 */
export { cutListCsv, placementScheduleCsv } from "./csv";
export { DECISION_OUTCOMES, type DecisionOutcome, OUTCOME_WORDS, requireApproval, type SubmittalDecision } from "./decision";
export { type DecisionRecordInput, renderDecisionRecordPdf } from "./decision-record";
export { formatters, type UnitPreference } from "./format";
export { facingPatternSvg } from "./pattern-svg";
export { cutList, placementRows } from "./quantities";
export { buildShopPack, documentBaseName, type ShopPack, type ShopPackFile } from "./shop-pack";
export type { ShopPackInput } from "./shop/context";
export { renderShopDrawingPdf } from "./shop/document";
export { renderSubmittalPdf } from "./submittal/document";
export { changeSentences } from "./change-words";
