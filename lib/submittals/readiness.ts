/**
 * What issuing a revision asks the consultant to confirm, read from the snapshot that would be
 * issued: board rules still broken (lib/board/rules.ts, with the project's edge clearance),
 * review pins still open, and fire findings that are flagged. Each item has a stable key, so a
 * confirmation names exactly what was seen, and something new that appears between looking and
 * issuing is asked about again rather than waved through.
 */
import { checkRules } from "@/lib/board/rules";
import type { BoardSurface } from "@/lib/board/types";
import type { SubmittalSnapshot } from "./snapshot";

export type ReadinessKind = "rule" | "pin" | "fire";

export interface ReadinessItem {
  key: string;
  kind: ReadinessKind;
  /** "error": a rule that cannot be built as drawn, or a fire class that is lower or missing */
  severity: "error" | "warning";
  message: string;
}

function surfaceOf(s: SubmittalSnapshot["surfaces"][number]): BoardSurface {
  return { width: s.width, height: s.height, openings: s.openings.map((o, i) => ({ ...o, id: `o${i}`, name: o.name || undefined })) };
}

export function readinessItems(s: SubmittalSnapshot): ReadinessItem[] {
  const rules = s.surfaces.flatMap((surface) => {
    const placements = s.placements.filter((p) => p.surfaceKey === surface.key);
    if (placements.length === 0) return [];
    return checkRules(surfaceOf(surface), placements, { clearance: s.project.edgeClearance }).map(
      (b): ReadinessItem => ({
        key: `rule:${surface.key}:${b.rule}:${b.placementIds.join("+")}:${b.openingId ?? ""}`,
        kind: "rule",
        severity: b.severity,
        message: `${surface.name}: ${b.message}`,
      }),
    );
  });
  const name = (key: string) => s.surfaces.find((x) => x.key === key)?.name ?? key;
  const pins = s.pins.map(
    (p): ReadinessItem => ({ key: `pin:${p.surfaceKey}:${p.number}`, kind: "pin", severity: "warning", message: `Pin ${p.number} on ${name(p.surfaceKey)} is open: "${p.body}"` }),
  );
  const buildUps = new Map(s.buildUps.map((b) => [b.id, b]));
  const fire = s.fire.findings
    .filter((f) => f.finding.flagged)
    .map((f): ReadinessItem => {
      const b = buildUps.get(f.buildUpId);
      return {
        key: `fire:${f.buildUpId}:${f.finding.status}`,
        kind: "fire",
        severity: f.finding.status === "lower" || f.finding.status === "missing" ? "error" : "warning",
        message: `${b ? `${b.code} ${b.name}` : "A build-up"}: ${f.finding.message}`,
      };
    });
  return [...rules, ...pins, ...fire];
}

/** The items not among the confirmed keys. */
export function unconfirmed(items: readonly ReadinessItem[], confirmed: readonly string[]): ReadinessItem[] {
  const seen = new Set(confirmed);
  return items.filter((i) => !seen.has(i.key));
}
