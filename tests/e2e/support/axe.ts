import fs from "node:fs";
import path from "node:path";
import AxeBuilder from "@axe-core/playwright";
import type { Page } from "playwright-core";

// axe-core (Deque's accessibility engine, from the registry) run on a screen as it stands, with
// the WCAG 2.0, 2.1 and 2.2 A and AA rules. Each audit is kept for a summary per screen and role.
export const WCAG_TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"];

export type Audit = {
  screen: string;
  role: string;
  violations: { id: string; impact: string; nodes: number; targets: string[] }[];
  passes: number;
  /** rules axe could not decide and leaves to a person */
  incomplete: string[];
  /** where, and why axe could not decide */
  review: string[];
  /** the keyboard walk of the same screen (support/keyboard.ts) */
  keyboard?: { stops: number; withoutRing: string[]; trapped: boolean };
};

export const audits: Audit[] = [];

export async function audit(page: Page, screen: string, role: string): Promise<Audit> {
  await page.waitForLoadState("networkidle");
  // axe cannot judge text contrast over a background image, and the page's drafting grid is one
  // (1 px lines of ink at 3.5 % over the paper): for the audit the paper is plain, so every
  // text's contrast is measured instead of being left "to review".
  // Through the CSS object model: the page's Content-Security-Policy refuses an injected <style>.
  await page.evaluate(() => document.body.style.setProperty("background-image", "none", "important"));
  const result = await new AxeBuilder({ page }).withTags(WCAG_TAGS).analyze();
  await page.evaluate(() => document.body.style.removeProperty("background-image"));
  const a: Audit = {
    screen,
    role,
    violations: result.violations.map((v) => ({ id: v.id, impact: v.impact ?? "unknown", nodes: v.nodes.length, targets: v.nodes.slice(0, 5).map((n) => `${n.target.join(" ")} ${contrastOf(n)}`.trim()) })),
    passes: result.passes.length,
    incomplete: result.incomplete.map((r) => r.id),
    review: result.incomplete.flatMap((r) => r.nodes.slice(0, 5).map((n) => `${r.id}: ${n.target.join(" ")}: ${n.any.map((c) => c.message).join("; ")}`)),
  };
  audits.push(a);
  return a;
}

export const severe = (a: Audit) => a.violations.filter((v) => v.impact === "serious" || v.impact === "critical");

/** One line per screen and role, printed and written beside the screenshots. */
export function summary(list: readonly Audit[] = audits): string {
  const lines = list.map((a) => {
    const count = (impact: string) => a.violations.filter((v) => v.impact === impact).length;
    const found = a.violations.length ? a.violations.map((v) => `${v.id} (${v.impact}, ${v.nodes})`).join(", ") : "none";
    return `| ${a.role} | ${a.screen} | ${count("critical")} | ${count("serious")} | ${count("moderate")} | ${count("minor")} | ${a.passes} | ${a.incomplete.join(", ") || "none"} | ${found} | ${keys(a)} |`;
  });
  return [
    "| role | screen | critical | serious | moderate | minor | rules passed | to review by hand | violations | keyboard |",
    "| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |",
    ...lines,
  ].join("\n");
}

const keys = (a: Audit) =>
  a.keyboard ? `${a.keyboard.stops} stops${a.keyboard.withoutRing.length ? `, ${a.keyboard.withoutRing.length} without a focus ring` : ", all with a focus ring"}${a.keyboard.trapped ? ", TRAPPED" : ""}` : "";

export function writeSummary(file = path.join(process.cwd(), "tests", "e2e", "screens", "axe-summary.md")) {
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const review = audits.flatMap((a) => a.review.map((r) => `- ${a.role} · ${a.screen} · ${r}`));
  fs.writeFileSync(file, `# axe-core ${WCAG_TAGS.join(", ")}\n\n${summary()}\n\n## Left for review by hand\n\n${review.join("\n") || "nothing"}\n`);
}

/** For a contrast finding, the colours and ratio axe measured, to say what to change. */
function contrastOf(node: { any: { data?: unknown }[] }): string {
  const d = node.any.find((c) => c.data && typeof c.data === "object" && "contrastRatio" in (c.data as object))?.data as { fgColor: string; bgColor: string; contrastRatio: number } | undefined;
  return d ? `(${d.fgColor} on ${d.bgColor}: ${d.contrastRatio})` : "";
}
