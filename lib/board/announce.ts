/**
 * What the board says to assistive technology (an aria-live region) after each change: the
 * selected panel's set-out, the rules it breaks, and where the room's check now stands. Short
 * sentences, in the person's units, so a screen reader user hears what a sighted user sees.
 */
import type { CheckResult } from "@/lib/rooms/check";
import { octaveName } from "@/lib/rooms/octaves";
import { formatArea, formatLength, type UnitPreference } from "@/lib/units";
import type { RuleBreak } from "./rules";
import type { AreaAccount } from "./treated-area";
import type { BoardSurface, Placement } from "./types";

const NOTICEABLE_M2 = 0.005;

export function selectionAnnouncement(selected: readonly Placement[], units: UnitPreference): string {
  if (selected.length === 0) return "No panel selected.";
  if (selected.length > 1) return `${selected.length} panels selected.`;
  const p = selected[0];
  const len = (m: number) => formatLength(m, units, { scale: "panel" });
  return `${p.code ?? "Panel"} selected: ${len(p.width)} wide, ${len(p.height)} high, ${len(p.x)} from the left, ${len(p.y)} above the datum.`;
}

export function rulesAnnouncement(breaks: readonly RuleBreak[]): string {
  if (breaks.length === 0) return "Every panel keeps the rules.";
  const first = breaks.slice(0, 3).map((b) => b.message.replace(/\.$/, ""));
  const more = breaks.length > 3 ? `; and ${breaks.length - 3} more` : "";
  return `${breaks.length} ${breaks.length === 1 ? "rule is" : "rules are"} broken: ${first.join("; ")}${more}.`;
}

/** The area not counted, in words, or "" when all of it counts. */
export function notCountedWords(account: AreaAccount, units: UnitPreference): string {
  const parts: string[] = [];
  if (account.overOpenings > NOTICEABLE_M2) parts.push(`${formatArea(account.overOpenings, units)} over openings`);
  if (account.overlapping > NOTICEABLE_M2) parts.push(`${formatArea(account.overlapping, units)} where panels overlap (counted once)`);
  if (account.outside > NOTICEABLE_M2) parts.push(`${formatArea(account.outside, units)} past the surface's edges`);
  return parts.join(", ");
}

export function checkAnnouncement(check: CheckResult | null, account: AreaAccount, units: UnitPreference): string {
  if (!check || !check.ok) return "The check needs a complete room model.";
  const judged = check.octaves.filter((o) => o.status === "within" || o.status === "over" || o.status === "under");
  const within = judged.filter((o) => o.status === "within").length;
  const off = judged
    .filter((o) => o.status !== "within" && o.after)
    .map((o) => `${octaveName(o.f)} ${o.status === "over" ? "too long" : "too short"} at ${o.after!.sabine.toFixed(2)} s`);
  const notCounted = notCountedWords(account, units);
  return [
    `Check: ${within} of ${judged.length} octaves within the target${off.length ? `; ${off.join(", ")}` : ""}.`,
    `${formatArea(account.counted, units)} of panels counted on this board${notCounted ? `; not counted: ${notCounted}` : ""}.`,
  ].join(" ");
}

/** The surface in words, for the canvas's description: its size and where its openings are. */
export function surfaceDescription(name: string, surface: BoardSurface, units: UnitPreference): string {
  const len = (m: number) => formatLength(m, units, { scale: "panel" });
  const openings = surface.openings.map(
    (o) => `${o.name || o.kind}, ${len(o.width)} wide and ${len(o.height)} high, ${len(o.x)} from the left and ${len(o.y)} above the datum`,
  );
  return `${name}, ${len(surface.width)} wide and ${len(surface.height)} high, measured from its lower-left corner. ${openings.length ? `Openings: ${openings.join("; ")}.` : "No openings."}`;
}
