import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { parseLength } from "@/lib/units";
import { Session } from "./support/session";

// The board as drawn and as worked by keyboard: set-out in the person's units, a canvas that
// uses its space, the live check counting only what can exist, refusals at their field, pins
// on panels. The lecture room's Wall C (14 m × 3.2 m, sixteen 600 × 2400 mm panels from
// x = 0.6 m at 200 mm gaps, 400 mm above the floor) is the board; other tests leave it alone.
const ARTS = "Lantern Row Arts Centre refit (fictional)";

async function openWallC(s: Session) {
  await s.goto("/projects");
  await s.page.getByRole("link", { name: ARTS }).click();
  await s.page.waitForURL("**/projects/*");
  await s.page.getByRole("link", { name: "Lecture room" }).first().click();
  await s.page.waitForURL("**/rooms/*");
  await s.page.getByTestId("board-links").getByRole("link", { name: /Wall C/ }).click();
  await s.page.waitForURL("**/board/**");
  await s.page.getByTestId("board-canvas").locator("canvas").first().waitFor();
  await s.page.waitForFunction(() => (window as unknown as { Konva?: { stages: unknown[] } }).Konva?.stages.length);
}

/** Every text the canvas draws, read from Konva's own stage. */
const canvasTexts = (page: Page) =>
  page.evaluate(() => {
    const k = (window as unknown as { Konva: { stages: { find: (s: string) => { text: () => string }[] }[] } }).Konva;
    return k.stages[0].find("Text").map((t) => t.text());
  });

/** A panel's middle on the page, from its Konva group. */
const panelCentre = (page: Page, index: number) =>
  page.evaluate((i) => {
    const k = (window as unknown as { Konva: { stages: { find: (s: string) => { getClientRect: () => { x: number; y: number; width: number; height: number } }[]; container: () => HTMLElement }[] } }).Konva;
    const stage = k.stages[0];
    const r = stage.find(".panel")[i].getClientRect();
    const box = stage.container().getBoundingClientRect();
    return { x: box.x + r.x + r.width / 2, y: box.y + r.y + r.height / 2 };
  }, index);

const savedVersion = async (page: Page) => /saved, version (\d+)/.exec((await page.getByTestId("board-save-state").textContent()) ?? "")?.[1] ?? null;

describe("the board, drawn and worked by keyboard", () => {
  let s: Session;
  beforeAll(async () => {
    s = await Session.open();
    await s.signIn("consultant@example.test");
    await openWallC(s);
  });
  afterAll(async () => s.close());

  it("draws the 14 m wall across the canvas, which fills its column", async () => {
    const sizes = await s.page.evaluate(() => {
      const k = (window as unknown as { Konva: { stages: { width: () => number; height: () => number; findOne: (s: string) => { width: () => number } }[] } }).Konva;
      const stage = k.stages[0];
      const column = document.querySelector('[data-testid="board-canvas"]')!.parentElement!.parentElement!.clientWidth;
      return { stage: stage.width(), height: stage.height(), surface: stage.findOne(".surface").width(), column };
    });
    expect(sizes.stage).toBeGreaterThanOrEqual(sizes.column - 4);
    // The fitted wall spans the canvas less its margins (it used about 120 px of 600 before).
    expect(sizes.surface / sizes.stage).toBeGreaterThan(0.8);
    expect(sizes.height).toBeGreaterThanOrEqual(360);
  });

  it("names the panels high on the wall with the caution on fixings", async () => {
    // Their tops are 0.4 + 2.4 = 2.8 m above the floor.
    const caution = s.page.getByTestId("high-panels");
    expect(await caution.textContent()).toMatch(/P-001, P-002.*can fall on people below/);
  });

  it("Tab steps through the panels in the board and then leaves it", async () => {
    const page = s.page;
    await page.getByTestId("board-canvas").focus();
    await page.keyboard.press("Tab");
    await expect.poll(() => page.getByTestId("announce-selection").textContent()).toMatch(/^P-001 selected: 600 mm wide, 2400 mm high, 600 mm from the left, 400 mm above the datum\.$/);
    for (let i = 0; i < 15; i++) await page.keyboard.press("Tab");
    expect(await page.getByTestId("selection-one").getByLabel("Panel code").inputValue()).toBe("P-016");
    expect(await page.evaluate(() => document.activeElement?.getAttribute("data-testid"))).toBe("board-canvas");
    await page.keyboard.press("Tab");
    expect(await page.evaluate(() => document.activeElement?.getAttribute("data-testid"))).not.toBe("board-canvas");
  });

  it("keys pressed faster than the screen redraws each count (a held arrow key)", async () => {
    const page = s.page;
    await page.getByTestId("board-canvas").focus();
    await page.keyboard.press("Escape");
    await page.keyboard.press("Tab");
    // Five presses in one task, before React can redraw between them: P-001 goes 5 × 10 mm right.
    await page.getByTestId("board-canvas").evaluate((el) => {
      for (let i = 0; i < 5; i++) el.dispatchEvent(new KeyboardEvent("keydown", { key: "ArrowRight", bubbles: true }));
    });
    await expect.poll(() => page.getByTestId("announce-selection").textContent()).toMatch(/^P-001 selected: .* 650 mm from the left/);
    for (let i = 0; i < 5; i++) await page.keyboard.press("Control+z");
    await expect.poll(() => page.getByTestId("announce-selection").textContent()).toMatch(/ 600 mm from the left/);
  });

  it("moving a panel across two others by keyboard takes the overlap out of the check", async () => {
    const page = s.page;
    // 16 × 0.6 × 2.4 = 23.04 m² placed and counted.
    expect(await page.getByTestId("area-counted").textContent()).toMatch(/^23 m² of this board's 23 m² of panels counted\.$/);
    await page.getByTestId("board-canvas").focus();
    await page.keyboard.press("Escape");
    for (let i = 0; i < 3; i++) await page.keyboard.press("Tab");
    // P-003 from x = 2.2 m, four grid modules (300 mm) left to 1.0 m: over P-001 (to 1.2 m) and
    // P-002 (from 1.4 m) by 0.2 m each, 2 × 0.2 × 2.4 = 0.96 m² a second layer: 22.08 m² count.
    for (let i = 0; i < 4; i++) await page.keyboard.press("Shift+ArrowLeft");
    await expect.poll(() => page.getByTestId("area-not-counted").textContent()).toBe("Not counted: 1 m² where panels overlap (counted once).");
    expect(await page.getByTestId("area-counted").textContent()).toMatch(/^22.1 m² of this board's 23 m²/);
    expect(await page.locator('[data-testid="rules"] [data-rule="overlap"]').count()).toBe(2);
    // Alt+arrow resizes from the lower-left corner.
    await page.keyboard.press("Alt+ArrowUp");
    await expect.poll(() => page.getByTestId("announce-selection").textContent()).toMatch(/P-003 selected: 600 mm wide, 2410 mm high, 1000 mm from the left/);
    await page.keyboard.press("Control+z");
    await page.keyboard.press("Control+z");
    for (let i = 0; i < 4; i++) await page.keyboard.press("Control+z");
    await page.getByTestId("rules-clear").waitFor();
    expect(await page.getByTestId("area-not-counted").count()).toBe(0);
  });

  it("a width of 0 is refused at the Width field with the server's words, and not sent again", async () => {
    const page = s.page;
    await expect.poll(() => savedVersion(page), { timeout: 10_000 }).not.toBeNull();
    const refusals: number[] = [];
    page.on("response", (r) => r.request().method() === "PUT" && r.url().includes("/boards/") && r.status() === 422 && refusals.push(r.status()));
    s.expectConsoleError(/status of 422/);
    await page.getByTestId("board-canvas").focus();
    await page.keyboard.press("Escape");
    await page.keyboard.press("Tab");
    const width = page.getByTestId("panel-width");
    await width.getByRole("textbox").fill("0 mm");
    await width.getByRole("textbox").press("Enter");
    await width.getByText(/at least 20 mm/).waitFor({ timeout: 10_000 });
    await page.waitForTimeout(4000);
    expect(refusals.length).toBeLessThanOrEqual(1);
    if (refusals.length === 1) expect(await page.getByTestId("save-refusal").textContent()).toMatch(/P-001\s*Width: The panel's width must be at least 20 mm/);
    await width.getByRole("textbox").fill("600 mm");
    await width.getByRole("textbox").press("Enter");
    await expect.poll(() => savedVersion(page), { timeout: 10_000 }).not.toBeNull();
    expect(await page.getByTestId("save-refusal").count()).toBe(0);
  });

  it("a pin goes on a panel, and a comment too long is refused under the field", async () => {
    const page = s.page;
    s.expectConsoleError(/status of 422/);
    await page.getByTestId("mode-pin").click();
    const at = await panelCentre(page, 7);
    await page.mouse.click(at.x, at.y);
    await page.getByLabel(/Comment at this point \(on panel P-008\)/).fill("x".repeat(2500));
    await page.getByRole("button", { name: "Place pin" }).click();
    await page.getByText(/Keep the comment to 2000 characters/).waitFor();
    await page.getByLabel(/Comment at this point/).fill("Check the fixing rail behind P-008 clears the conduit.");
    await page.getByRole("button", { name: "Place pin" }).click();
    await page.locator('[data-testid="pins"] li').filter({ hasText: "fixing rail behind P-008" }).waitFor();
  });
});

describe("the board in imperial units", () => {
  let s: Session;
  beforeAll(async () => {
    s = await Session.open();
    await s.signIn("consultant@example.test");
    await setUnits(s, "Imperial (in, ft)");
  });
  afterAll(async () => {
    await setUnits(s, "Metric (mm, m)");
    await s.close();
  });

  it("dimensions the wall and the selected panel's set-out in feet and inches", async () => {
    await openWallC(s);
    await s.page.getByTestId("board-canvas").focus();
    await s.page.keyboard.press("Tab");
    await s.page.waitForTimeout(300);
    const texts = await canvasTexts(s.page);
    expect(texts.filter((t) => /\d\s*(mm|m)\b/.test(t))).toEqual([]);
    // Each length the drawing shows reads back, through the app's parser, as the stored length
    // to within half the 1/8 in the drawing writes to: the wall's 14 m, P-001's 0.6 m from the
    // left and 0.4 m above the floor, and its 2.4 m height.
    const lengths = texts.flatMap((t) => {
      const read = parseLength(t);
      return read.ok ? [read.metres] : [];
    });
    for (const expected of [14, 0.6, 0.4, 2.4]) expect(lengths.some((m) => Math.abs(m - expected) <= 0.0254 / 16 + 1e-9), `${expected} m among ${texts.join(" | ")}`).toBe(true);
    await s.screenshot("board-imperial-set-out");
  });
});

async function setUnits(s: Session, label: string) {
  await s.goto("/settings");
  await s.page.getByLabel(label).check();
  await s.page.getByRole("button", { name: "Save settings" }).click();
  await s.page.getByText("Settings saved.").waitFor();
}
