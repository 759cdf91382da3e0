/**
 * The elevation board's logic: pure TypeScript, no React, Konva, Next or database. Lengths in
 * metres, coordinates from the surface's lower-left datum with y up (view.ts turns them into
 * screen pixels).
 */
export * from "./arrays";
export * from "./drag-baseline";
export * from "./drag-benchmark";
export * from "./edits";
export * from "./history";
export * from "./labels";
export * from "./opening-label";
export * from "./order";
export * from "./pattern";
export * from "./pattern-layout";
export * from "./rect";
export * from "./resize";
export * from "./rules";
export * from "./selection";
export * from "./snap";
export * from "./snap-index";
export * from "./sweep";
export * from "./treated-area";
export * from "./types";
export * from "./view";
