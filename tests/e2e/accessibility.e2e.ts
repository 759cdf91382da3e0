import { afterAll, describe, expect, it } from "vitest";
import { Session, mailTo } from "./support/session";
import { audit, severe, summary, writeSummary } from "./support/axe";
import { keyboardWalk } from "./support/keyboard";

// Every screen, as every demo account reaches it by its links, audited by axe-core against
// WCAG 2.2 A and AA (no serious or critical violation anywhere) and walked with the Tab key
// (every stop shows its focus, and the focus never gets stuck). A summary per screen and role
// is printed and written to tests/e2e/screens/axe-summary.md.
const ARTS = "Lantern Row Arts Centre refit (fictional)";
/** A role's whole round of screens, on a machine shared with other work. */
const ROUND_MS = 300_000;

async function check(s: Session, screen: string, role: string) {
  const a = await audit(s.page, screen, role);
  expect.soft(severe(a), `${role} · ${screen}: ${JSON.stringify(severe(a), null, 1)}`).toEqual([]);
  a.keyboard = await keyboardWalk(s.page);
  expect.soft(a.keyboard.trapped, `${role} · ${screen}: the focus got stuck`).toBe(false);
  expect.soft(a.keyboard.withoutRing, `${role} · ${screen}: focus not shown`).toEqual([]);
}

async function openProject(s: Session) {
  await s.goto("/projects");
  await s.page.getByRole("link", { name: ARTS }).click();
  await s.page.waitForURL("**/projects/*");
}

async function designScreens(s: Session, role: string) {
  await openProject(s);
  await check(s, "Project overview", role);
  await s.page.getByRole("link", { name: "Rooms", exact: true }).click();
  await s.page.getByTestId("room-table").waitFor();
  await check(s, "Rooms", role);
  await s.page.getByRole("link", { name: "Rehearsal room" }).first().click();
  await s.page.waitForURL("**/rooms/*");
  await check(s, "Room and check", role);
  await s.page.getByTestId("board-links").getByRole("link", { name: /Wall A/ }).click();
  await s.page.waitForURL("**/board/**");
  await s.page.getByTestId("board-canvas").locator("canvas").first().waitFor();
  await s.page.getByTestId("board-canvas").focus();
  await s.page.keyboard.press("Tab");
  await s.page.getByTestId("selection-one").waitFor();
  await check(s, "Board (a panel selected)", role);
  await s.page.getByRole("link", { name: "Build-ups", exact: true }).click();
  await s.page.waitForURL("**/build-ups");
  await check(s, "Build-ups", role);
  await s.page.getByRole("main").getByRole("link", { name: /Bass panel, rehearsal room/ }).first().click();
  await s.page.waitForURL("**/build-ups/*");
  await check(s, "Bench", role);
}

// Submittals and the shop pack, on the demo's lecture room (revision A, approved as noted and
// partly installed by the seed), as each role reaches them.
async function submittalScreens(s: Session, role: string, shopPack: boolean) {
  await openProject(s);
  await s.page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: "Submittals" }).click();
  await s.page.getByTestId("submittal-rooms").waitFor();
  await check(s, "Submittals", role);
  await s.page.getByRole("link", { name: "Revision A of Lecture room" }).click();
  await s.page.getByRole("heading", { name: "Lecture room: revision A" }).waitFor();
  await check(s, "Submittal revision", role);
  if (!shopPack) return;
  await s.page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: "Shop pack" }).click();
  await s.page.getByTestId("shop-packs").waitFor();
  await check(s, "Shop pack", role);
  await s.page.getByRole("link", { name: "Panels and progress of Lecture room" }).click();
  await s.page.getByTestId("install-count").waitFor();
  await check(s, "Shop pack: panels and progress", role);
}

let sessions: Session[] = [];
async function signedIn(email: string) {
  const s = await Session.open();
  sessions.push(s);
  await s.signIn(email);
  return s;
}

afterAll(async () => {
  for (const s of sessions) await s.close({ allowErrors: /status of 404/ });
  sessions = [];
  console.log(`\naxe-core, WCAG 2.2 A and AA, per screen and role:\n${summary()}\n`);
  writeSummary();
});

describe("accessibility of every screen, for every role (axe-core, WCAG 2.2 AA)", () => {
  it("signed out: sign-in and the not-found page", async () => {
    const s = await Session.open();
    sessions.push(s);
    await s.goto("/sign-in");
    await check(s, "Sign in", "signed out");
    // The page names its manifest and icon, served from public/, and the brand mark loads.
    const manifest = await s.page.locator('link[rel="manifest"]').getAttribute("href");
    const served = await s.page.request.get(s.url(manifest!));
    expect(served.status()).toBe(200);
    expect(((await served.json()) as { icons: unknown[] }).icons).toHaveLength(3);
    expect(await s.page.locator('link[rel="icon"][type="image/svg+xml"]').getAttribute("href")).toBe("/icon.svg");
    expect(await s.page.locator('img[src="/icon.svg"]').evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
    await s.page.goto(s.url("/no-such-page"));
    await check(s, "Not found", "signed out");
  }, ROUND_MS);

  it("consultant", async () => {
    const s = await signedIn("consultant@example.test");
    await check(s, "Projects", "consultant");
    await designScreens(s, "consultant");
    await submittalScreens(s, "consultant", true);
    await s.goto("/settings");
    await check(s, "Settings", "consultant");
  }, ROUND_MS);

  it("invited, signed out: the invitation's sign-up page", async () => {
    const consultant = await signedIn("consultant@example.test");
    await openProject(consultant);
    const email = `axe.client.${Date.now()}@example.test`;
    await consultant.page.getByLabel("E-mail").fill(email);
    await consultant.page.getByLabel("Role").selectOption("client");
    await consultant.page.getByRole("button", { name: "Send invitation" }).click();
    await consultant.page.getByText(`Invitation sent to ${email}.`).waitFor();
    const link = /(https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+)/.exec((await mailTo(email))[0].text)![1];
    const s = await Session.open();
    sessions.push(s);
    await s.page.goto(link);
    await s.page.getByRole("heading", { name: /Join Lantern Row/ }).waitFor();
    await check(s, "Invitation sign-up", "invited");
  }, ROUND_MS);

  it("architect (read only)", async () => {
    const s = await signedIn("architect@example.test");
    await check(s, "Projects", "architect");
    await designScreens(s, "architect");
    await submittalScreens(s, "architect", false);
    await s.goto("/settings");
    await check(s, "Settings", "architect");
  }, ROUND_MS);

  it("installer", async () => {
    const s = await signedIn("installer@example.test");
    await check(s, "Projects", "installer");
    await openProject(s);
    await check(s, "Project overview", "installer");
    await submittalScreens(s, "installer", true);
    await s.goto("/settings");
    await check(s, "Settings", "installer");
  }, ROUND_MS);

  it("client", async () => {
    const s = await signedIn("client@example.test");
    await check(s, "Projects", "client");
    await openProject(s);
    await check(s, "Project overview", "client");
    await submittalScreens(s, "client", false);
    await s.goto("/settings");
    await check(s, "Settings", "client");
  }, ROUND_MS);

  it("firm administrator", async () => {
    const s = await signedIn("admin@example.test");
    await check(s, "Projects", "firm admin");
    await s.page.getByRole("link", { name: "Firm accounts" }).click();
    await s.page.getByTestId("firm-accounts").waitFor();
    await check(s, "Firm accounts", "firm admin");
    await s.goto("/settings");
    await check(s, "Settings", "firm admin");
  }, ROUND_MS);
});
