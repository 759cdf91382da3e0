import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Session, mailTo } from "./support/session";

// The elevation board: a consultant lays out a wall around a door with an array, fixes the rule
// the board flags, and sees the check change; an architect pins a comment, the consultant gets
// the e-mail, replies and resolves; two editors of one board, the second told to reload.
const ARTS = "Lantern Row Arts Centre refit (fictional)";

async function openBoard(s: Session, room: string, surface: RegExp) {
  await s.goto("/projects");
  await s.page.getByRole("link", { name: ARTS }).click();
  await s.page.waitForURL("**/projects/*");
  await s.page.getByRole("link", { name: room }).first().click();
  await s.page.waitForURL("**/rooms/*");
  await s.page.getByTestId("board-links").getByRole("link", { name: surface }).click();
  await s.page.waitForURL("**/board/**");
  await s.page.getByTestId("board-canvas").locator("canvas").first().waitFor();
}

const savedVersion = async (s: Session) => {
  const text = (await s.page.getByTestId("board-save-state").textContent()) ?? "";
  return /saved, version (\d+)/.exec(text)?.[1] ?? null;
};

describe("elevation board", () => {
  let consultant: Session;
  let architect: Session;
  beforeAll(async () => {
    consultant = await Session.open();
    architect = await Session.open();
    await consultant.signIn("consultant@example.test");
    await architect.signIn("architect@example.test");
  });
  afterAll(async () => {
    await consultant.close();
    await architect.close();
  });

  it("lays out a wall around a door with an array, fixes the flagged rule, and the check changes", async () => {
    const page = consultant.page;
    await openBoard(consultant, "Rehearsal room", /Wall B/);
    expect(await page.getByTestId("rules-clear").isVisible()).toBe(true);
    const t125Before = Number(await page.getByTestId("live-125").textContent());
    await page.getByLabel("Build-up", { exact: true }).selectOption({ label: "Bass panel, rehearsal room" });
    await page.getByLabel("Columns").fill("6");
    await page.getByLabel("Rows").fill("1");
    await page.getByRole("button", { name: "Add array 6 × 1" }).click();
    // Six 600 mm panels at 25 mm gaps from the 50 mm clearance reach 3.775 m: into the door at 3.6 m.
    const rule = page.locator('[data-testid="rules"] [data-rule="over-opening"]');
    await rule.first().waitFor();
    expect(await rule.first().textContent()).toMatch(/P-006/);
    await consultant.screenshot("board-rule-flagged");
    await rule.first().click();
    expect(await page.getByTestId("selection-one").isVisible()).toBe(true);
    await page.getByRole("button", { name: "Delete panel" }).click();
    await page.getByTestId("rules-clear").waitFor();
    const t125After = Number(await page.getByTestId("live-125").textContent());
    expect(t125After).toBeLessThan(t125Before);
    await expect.poll(() => savedVersion(consultant), { timeout: 10_000 }).not.toBeNull();
    await page.reload();
    await page.getByTestId("board-canvas").locator("canvas").first().waitFor();
    expect(await page.getByTestId("board-save-state").locator("..").textContent()).toContain("5 panels");
    await consultant.screenshot("board-wall-b");
  });

  it("architect pins a comment; the consultant gets the e-mail, replies and resolves it", async () => {
    const page = architect.page;
    await openBoard(architect, "Rehearsal room", /Wall B/);
    expect(await page.getByRole("button", { name: "Add a panel" }).count()).toBe(0);
    await page.getByTestId("mode-pin").click();
    const box = (await page.getByTestId("board-canvas").boundingBox())!;
    await page.mouse.click(box.x + box.width * 0.75, box.y + box.height * 0.35);
    await page.getByLabel("Comment at this point").fill("Please keep the panels clear of the light switch here.");
    await page.getByRole("button", { name: "Place pin" }).click();
    await page.locator('[data-testid="pins"] li').filter({ hasText: "light switch" }).waitFor();

    const mail = (await mailTo("consultant@example.test")).find((m) => m.text.includes("light switch"));
    expect(mail, "the consultant's e-mail").toBeTruthy();
    expect(mail!.subject).toMatch(/^Pin \d+ on Rehearsal room, Wall B/);
    const link = /(https?:\/\/\S+\/board\/wall-b\?pin=\d+)/.exec(mail!.text)![1];

    await consultant.page.goto(link);
    const item = consultant.page.locator('[data-testid="pins"] li').filter({ hasText: "light switch" });
    await item.waitFor();
    await item.getByLabel(/Reply to pin/).fill("Moved the last panel 300 mm to the left.");
    await item.getByRole("button", { name: "Reply" }).click();
    await item.getByText("Moved the last panel 300 mm to the left.").waitFor();
    await item.getByRole("button", { name: "Resolve" }).click();
    await item.getByText(/resolved by Clara Consultant/).waitFor();
    const reply = (await mailTo("architect@example.test")).find((m) => m.text.includes("300 mm to the left"));
    expect(reply!.subject).toMatch(/^Reply on pin \d+/);
  });

  it("two editors of one board: the second save is refused and offers a reload, nothing lost", async () => {
    const a = consultant;
    const b = await Session.open();
    await b.signIn("consultant@example.test");
    await openBoard(a, "Lecture room", /Wall D/);
    await openBoard(b, "Lecture room", /Wall D/);
    const before = await savedVersion(a);
    await a.page.getByRole("button", { name: "Add a panel" }).click();
    await expect.poll(() => savedVersion(a), { timeout: 10_000 }).not.toBe(before);

    b.expectConsoleError(/status of 409/);
    await b.page.getByRole("button", { name: "Add a panel" }).click();
    await b.page.getByText("Someone else saved this board").waitFor({ timeout: 10_000 });
    await b.screenshot("board-conflict");
    await b.page.getByRole("button", { name: "Reload their version" }).click();
    await expect.poll(() => savedVersion(b)).toBe(await savedVersion(a));
    expect(await b.page.getByTestId("board-save-state").locator("..").textContent()).toContain("1 panel");
    await b.close();
  });
});
