import type { Page } from "playwright-core";

export type Walk = { stops: number; withoutRing: string[]; trapped: boolean };

/**
 * Tab through a screen as a keyboard user does, from the top: every element that takes the
 * focus must show it (an outline of at least 2 px), and the focus must keep moving: it may stay
 * on one element only while that element steps through its own items (the board's panels), at
 * most `itemsMax` presses. Stops at the first element met twice after leaving it.
 */
export async function keyboardWalk(page: Page, opts: { maxTabs?: number; itemsMax?: number } = {}): Promise<Walk> {
  const maxTabs = opts.maxTabs ?? 120;
  const itemsMax = opts.itemsMax ?? 60;
  // Start from the top of the page, as after loading it.
  await page.evaluate(() => {
    document.body.tabIndex = -1;
    document.body.focus();
    document.body.removeAttribute("tabindex");
  });
  const seen = new Set<string>();
  const withoutRing: string[] = [];
  let stops = 0;
  let same = 0;
  let last = "";
  for (let i = 0; i < maxTabs; i++) {
    await page.keyboard.press("Tab");
    const focused = await page.evaluate(() => {
      const el = document.activeElement as HTMLElement | null;
      if (!el || el === document.body) return null;
      const css = getComputedStyle(el);
      const path: string[] = [];
      for (let e: Element | null = el; e && e !== document.body; e = e.parentElement) path.unshift(`${e.tagName.toLowerCase()}${e.id ? `#${e.id}` : ""}:${Array.prototype.indexOf.call(e.parentElement?.children ?? [], e)}`);
      const label = (el.getAttribute("aria-label") ?? el.textContent ?? "").trim().slice(0, 40);
      return { key: path.join(">"), label: `${el.tagName.toLowerCase()} "${label}"`, ring: css.outlineStyle !== "none" && parseFloat(css.outlineWidth) >= 2 };
    });
    if (!focused) {
      if (stops > 0) break; // past the last element, into the browser's own controls
      continue;
    }
    if (focused.key === last) {
      if (++same > itemsMax) return { stops, withoutRing, trapped: true };
      continue;
    }
    same = 0;
    if (seen.has(focused.key)) break; // round again from the top
    seen.add(focused.key);
    last = focused.key;
    stops++;
    if (!focused.ring) withoutRing.push(focused.label);
  }
  return { stops, withoutRing, trapped: false };
}
