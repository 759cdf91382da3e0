import type { Page } from "playwright-core";

export type Walk = { stops: number; withoutRing: string[]; trapped: boolean };

type Stop = { key: string; label: string; ring: boolean } | null;

/**
 * Tab through a screen as a keyboard user does, from the top: every element that takes the
 * focus must show it (an outline of at least 2 px), and the focus must keep moving: it may stay
 * on one element only while that element steps through its own items (the board's panels), at
 * most `itemsMax` presses. Ends where the focus leaves the page or comes round to the top again.
 * The page records each stop itself, so the walk costs one key press per stop.
 */
export async function keyboardWalk(page: Page, opts: { maxTabs?: number; itemsMax?: number } = {}): Promise<Walk> {
  const maxTabs = opts.maxTabs ?? 160;
  const itemsMax = opts.itemsMax ?? 60;
  await page.evaluate(() => {
    const w = window as unknown as { __walk: Stop[]; __walking?: boolean };
    w.__walk = [];
    const describe = (): Stop => {
      const el = document.activeElement as HTMLElement | null;
      if (!el || el === document.body) return null;
      const css = getComputedStyle(el);
      const path: string[] = [];
      for (let e: Element | null = el; e && e !== document.body; e = e.parentElement) path.unshift(`${e.tagName.toLowerCase()}:${Array.prototype.indexOf.call(e.parentElement?.children ?? [], e)}`);
      const label = (el.getAttribute("aria-label") ?? el.textContent ?? "").trim().slice(0, 40);
      return { key: path.join(">"), label: `${el.tagName.toLowerCase()} "${label}"`, ring: css.outlineStyle !== "none" && parseFloat(css.outlineWidth) >= 2 };
    };
    // After each Tab, once the page has moved the focus (and drawn it), note where it is. Once
    // per document: moving between screens keeps the document, and a second listener would
    // note every stop twice.
    if (!w.__walking) document.addEventListener("keyup", (e) => e.key === "Tab" && w.__walk.push(describe()), true);
    w.__walking = true;
    // Start from the top of the page, as after loading it.
    document.body.tabIndex = -1;
    document.body.focus();
    document.body.removeAttribute("tabindex");
  });
  let pressed = 0;
  while (pressed < maxTabs) {
    for (let i = 0; i < 10; i++, pressed++) await page.keyboard.press("Tab");
    const stops = await page.evaluate(() => (window as unknown as { __walk: Stop[] }).__walk);
    const walk = judge(stops, itemsMax);
    if (walk.done) return walk.result;
  }
  return judge(await page.evaluate(() => (window as unknown as { __walk: Stop[] }).__walk), itemsMax).result;
}

function judge(stops: Stop[], itemsMax: number): { done: boolean; result: Walk } {
  const seen = new Set<string>();
  const withoutRing: string[] = [];
  let last = "";
  let same = 0;
  let count = 0;
  for (const stop of stops) {
    if (!stop) {
      if (count > 0) return { done: true, result: { stops: count, withoutRing, trapped: false } }; // out of the page
      continue;
    }
    if (stop.key === last) {
      if (++same > itemsMax) return { done: true, result: { stops: count, withoutRing, trapped: true } };
      continue;
    }
    same = 0;
    if (seen.has(stop.key)) return { done: true, result: { stops: count, withoutRing, trapped: false } }; // round to the top
    seen.add(stop.key);
    last = stop.key;
    count++;
    if (!stop.ring) withoutRing.push(stop.label);
  }
  return { done: false, result: { stops: count, withoutRing, trapped: false } };
}
