/**
 * The board's rules, checked live on every change (and every frame of a drag): panels that
 * overlap each other, panels over an opening, panels outside the surface, and panels nearer
 * than the project's edge clearance to a surface edge or an opening. Touching is not
 * overlapping: two panels sharing an edge (gap exactly 0) are fine. Every comparison allows
 * LENGTH_TOLERANCE of float noise.
 *
 * Overlaps are found by sweep and prune (sweep.ts); openings are few and are tested against
 * every panel, with a cheap rejection of those farther away than the clearance.
 */
import { compareLabels, formatMm, labelOf } from "./labels";
import { openingLabel } from "./opening-label";
import { distanceBetween, overlapX, overlapY } from "./rect";
import { forEachOverlap } from "./sweep";
import { type BoardOpening, type BoardSurface, LENGTH_TOLERANCE as TOL, type Placement } from "./types";

export const RULES = ["outside", "over-opening", "overlap", "clearance"] as const;
export type RuleName = (typeof RULES)[number];

export interface RuleBreak {
  rule: RuleName;
  /** the placements concerned, ordered by code (two for an overlap, one otherwise) */
  placementIds: string[];
  /** the opening concerned (over-opening, clearance to an opening), when it has an id */
  openingId?: string;
  /** clearance is a design preference of the project (amber); the others cannot be built (red) */
  severity: "error" | "warning";
  message: string;
}

export interface RuleOptions {
  /** the project's minimum distance from a panel to a surface edge or an opening, m; 0 for none */
  clearance: number;
}

interface Keyed {
  item: RuleBreak;
  labels: string[];
  openingIndex: number;
}

export function checkRules(surface: BoardSurface, placements: readonly Placement[], options: RuleOptions): RuleBreak[] {
  const found: Keyed[] = [];
  const clearance = options.clearance > TOL ? options.clearance : 0;
  const one = (item: RuleBreak | null, p: Placement, openingIndex = -1) => {
    if (item) found.push({ item, labels: [labelOf(p)], openingIndex });
  };
  for (const p of placements) {
    const gaps = edgeGaps(surface, p);
    const away = entirelyOutside(surface, p);
    one(away ? outsideBreak(p, `${labelOf(p)} lies entirely outside the surface`) : partlyOutside(p, gaps), p);
    if (!away) one(edgeClearance(p, gaps, clearance), p);
    for (let i = 0; i < surface.openings.length; i++) {
      const o = surface.openings[i];
      if (isNear(p, o, clearance)) one(openingBreak(p, o, clearance), p, i);
    }
  }
  forEachOverlap(placements, (a, b, ox, oy) => {
    const [first, second] = compareLabels(labelOf(a), labelOf(b)) <= 0 ? [a, b] : [b, a];
    const labels = [labelOf(first), labelOf(second)];
    const message = `${labels[0]} overlaps ${labels[1]} by ${formatMm(ox)} × ${formatMm(oy)} mm`;
    found.push({ item: { rule: "overlap", placementIds: [first.id, second.id], severity: "error", message }, labels, openingIndex: -1 });
  });
  // One order whatever the order of the input: by rule, then by the panels' codes, then openings.
  found.sort(
    (a, b) =>
      RULES.indexOf(a.item.rule) - RULES.indexOf(b.item.rule) ||
      compareLabels(a.labels[0], b.labels[0]) ||
      compareLabels(a.labels[1] ?? "", b.labels[1] ?? "") ||
      a.openingIndex - b.openingIndex,
  );
  return found.map((k) => k.item);
}

/** The breaks that concern each placement, for drawing them on the panels. */
export function rulesByPlacement(breaks: readonly RuleBreak[]): Map<string, RuleBreak[]> {
  const map = new Map<string, RuleBreak[]>();
  for (const b of breaks) {
    for (const id of b.placementIds) {
      const list = map.get(id);
      if (list) list.push(b);
      else map.set(id, [b]);
    }
  }
  return map;
}

interface EdgeGaps {
  left: number;
  right: number;
  bottom: number;
  top: number;
}

/** Clear distance from each side of the panel to the surface's edge; negative where it runs past. */
const edgeGaps = (s: BoardSurface, p: Placement): EdgeGaps => ({
  left: p.x,
  right: s.width - p.x - p.width,
  bottom: p.y,
  top: s.height - p.y - p.height,
});

const smallest = (g: EdgeGaps) => Math.min(g.left, g.right, g.bottom, g.top);

const SIDES = ["left", "right", "bottom", "top"] as const;

/** "120 mm past the right edge", … for the sides where `applies`; built only for panels that break a rule. */
function sideWords(gaps: EdgeGaps, applies: (gap: number) => boolean, words: (gap: number) => string): string[] {
  return SIDES.filter((side) => applies(gaps[side])).map((side) => `${words(gaps[side])} ${side} edge`);
}

const entirelyOutside = (s: BoardSurface, p: Placement) =>
  p.x >= s.width - TOL || p.x + p.width <= TOL || p.y >= s.height - TOL || p.y + p.height <= TOL;

const outsideBreak = (p: Placement, message: string): RuleBreak => ({ rule: "outside", placementIds: [p.id], severity: "error", message });

function partlyOutside(p: Placement, gaps: EdgeGaps): RuleBreak | null {
  if (smallest(gaps) >= -TOL) return null;
  const beyond = sideWords(gaps, (g) => g < -TOL, (g) => `${formatMm(-g)} mm past the`);
  return outsideBreak(p, `${labelOf(p)} runs ${joinWords(beyond)}`);
}

function edgeClearance(p: Placement, gaps: EdgeGaps, clearance: number): RuleBreak | null {
  if (clearance === 0 || smallest(gaps) >= clearance - TOL) return null;
  // A side past the edge is the outside rule's business; here only the sides still on the surface.
  const near = sideWords(gaps, (g) => g >= -TOL && g < clearance - TOL, (g) => (g <= TOL ? "touches the" : `is ${formatMm(g)} mm from the`));
  if (near.length === 0) return null;
  return { rule: "clearance", placementIds: [p.id], severity: "warning", message: `${labelOf(p)} ${joinWords(near)}${asksFor(clearance)}` };
}

const asksFor = (clearance: number) => `; the project asks for at least ${formatMm(clearance)} mm`;

/**
 * Cheap rejection of an opening at least the clearance away along either axis (with no clearance,
 * of every opening the panel does not overlap).
 */
const isNear = (p: Placement, o: BoardOpening, clearance: number) => -overlapX(p, o) < clearance - TOL && -overlapY(p, o) < clearance - TOL;

function openingBreak(p: Placement, o: BoardOpening, clearance: number): RuleBreak | null {
  const ox = overlapX(p, o);
  const oy = overlapY(p, o);
  const label = labelOf(p);
  const name = openingLabel(o);
  const concerns = { placementIds: [p.id], ...(o.id !== undefined ? { openingId: o.id } : {}) };
  if (ox > TOL && oy > TOL) {
    return { rule: "over-opening", ...concerns, severity: "error", message: `${label} covers ${formatMm(ox)} × ${formatMm(oy)} mm of ${name}` };
  }
  if (clearance === 0) return null;
  const gap = distanceBetween(p, o);
  if (gap >= clearance - TOL) return null;
  const where = gap <= TOL ? `touches ${name}` : `is ${formatMm(gap)} mm from ${name}`;
  return { rule: "clearance", ...concerns, severity: "warning", message: `${label} ${where}${asksFor(clearance)}` };
}

/** "a", "a and b", "a, b and c" */
function joinWords(parts: string[]): string {
  return parts.length < 2 ? parts.join("") : `${parts.slice(0, -1).join(", ")} and ${parts[parts.length - 1]}`;
}
