import { createHash } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Session, mailTo } from "./support/session";
import { pdfPages } from "../support/pdf-text";
import { hasExif, photoWithLocation } from "../support/submittals";

// The submittal journey across four accounts: the consultant issues revision A of the
// rehearsal room; the client returns it with notes; the consultant takes a panel off the
// board and issues B (A superseded, B's cover lists the change); the client approves; the
// installer downloads the shop pack, checks its SHA-256 against the record, and marks three
// panels installed, one with a site photo; the consultant sees the progress. The mail catcher
// is read back at each step.
const ARTS = "Lantern Row Arts Centre refit (fictional)";
const ROOM = "Rehearsal room";
const RETURN = /^Return for revision/;
const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

async function mailsAbout(address: string, subject: string, count = 1) {
  await expect.poll(async () => (await mailTo(address)).filter((m) => m.subject === subject).length, { timeout: 15_000 }).toBeGreaterThanOrEqual(count);
  return (await mailTo(address)).filter((m) => m.subject === subject);
}

async function openSubmittals(s: Session) {
  await s.goto("/projects");
  await s.page.getByRole("link", { name: ARTS }).click();
  await s.page.waitForURL("**/projects/*");
  await s.page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: "Submittals" }).click();
  await s.page.getByTestId("submittal-rooms").waitFor();
}

async function issueNext(s: Session, letter: string) {
  await openSubmittals(s);
  await s.page.getByRole("button", { name: `Issue revision ${letter} of ${ROOM}` }).click();
  const panel = s.page.getByTestId("issue-panel");
  await panel.getByRole("button", { name: `Issue revision ${letter}` }).waitFor();
  // Everything it asks about is confirmed (and so recorded with the revision).
  for (const box of await panel.getByTestId("confirm-items").getByRole("checkbox").all()) await box.check();
  await panel.getByRole("button", { name: `Issue revision ${letter}` }).click();
  await s.page.waitForURL("**/submittals/*", { timeout: 60_000 });
  await s.page.getByRole("heading", { name: `${ROOM}: revision ${letter}` }).waitFor();
}

async function openRevision(s: Session, letter: string) {
  await openSubmittals(s);
  await s.page.getByRole("link", { name: `Revision ${letter} of ${ROOM}` }).click();
  await s.page.getByRole("heading", { name: `${ROOM}: revision ${letter}` }).waitFor();
}

async function decide(s: Session, outcome: RegExp, notes: string) {
  const form = s.page.getByTestId("decision-form");
  await form.getByLabel(outcome).check();
  if (notes) await form.getByLabel(/^Notes/).fill(notes);
  await form.getByLabel("Type your full name to sign").fill("Cleo Client");
  await form.getByRole("button", { name: "Sign and send" }).click();
  await s.page.getByTestId("decision-outcome").waitFor({ timeout: 60_000 });
}

/** The bytes of a document the signed-in page links to, fetched with its session. */
async function fetchBytes(s: Session, url: string) {
  const res = await s.page.request.get(s.url(url));
  expect(res.status()).toBe(200);
  return new Uint8Array(await res.body());
}

describe("submittals across four accounts", () => {
  let consultant: Session;
  let client: Session;
  let installer: Session;
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "cavitas-e2e-photo-"));
  beforeAll(async () => {
    consultant = await Session.open();
    client = await Session.open();
    installer = await Session.open();
    await consultant.signIn("consultant@example.test");
    await client.signIn("client@example.test");
    await installer.signIn("installer@example.test");
  });
  afterAll(async () => {
    for (const s of [consultant, client, installer]) await s?.close();
    fs.rmSync(tmp, { recursive: true, force: true });
  });

  it("the consultant issues revision A; the architect and the client are told, the installer is not", async () => {
    await issueNext(consultant, "A");
    const page = consultant.page;
    expect(await page.getByTestId("revision-meta").textContent()).toContain("issued, awaiting decision");
    const pdfHash = (await page.getByTestId("document-submittal").locator("code").textContent())!;
    expect(pdfHash).toMatch(/^[0-9a-f]{64}$/);
    expect(await page.getByTestId("confirmed-items").locator("li").count()).toBeGreaterThan(0);
    await consultant.screenshot("submittal-issued-a");
    const subject = `Submittal issued: ${ROOM}, revision A (${ARTS})`;
    for (const who of ["architect@example.test", "client@example.test"]) expect((await mailsAbout(who, subject))[0].text).toContain(pdfHash);
    expect((await mailTo("installer@example.test")).filter((m) => m.subject.includes(`${ROOM}, revision A`))).toEqual([]);
  });

  it("the client reads the issued PDF and returns A with notes; the consultant gets the notes", async () => {
    await openRevision(client, "A");
    const page = client.page;
    const pdfHash = (await page.getByTestId("document-submittal").locator("code").textContent())!;
    const pdf = await fetchBytes(client, (await page.getByTestId("document-submittal").getByRole("link", { name: /^Open/ }).getAttribute("href"))!);
    expect(sha256(pdf)).toBe(pdfHash);
    // The PDF opens in the browser's own viewer, in a new tab, at the address of the stored file.
    const [viewer] = await Promise.all([client.context.waitForEvent("page"), page.getByTestId("read-pdf").click()]);
    await viewer.waitForLoadState();
    expect(viewer.url()).toBe(client.url((await page.getByTestId("read-pdf").getAttribute("href"))!));
    await viewer.close();
    // The signature must be typed: sending without it is refused at its field.
    await page.getByTestId("decision-form").getByLabel(RETURN).check();
    await page.getByTestId("decision-form").getByLabel(/^Notes/).fill("Keep the top row clear of the fire alarm sounder.");
    client.expectConsoleError(/status of 422/);
    await page.getByRole("button", { name: "Sign and send" }).click();
    await page.getByText("Type your full name to sign.", { exact: true }).waitFor();
    await decide(client, RETURN, "Keep the top row clear of the fire alarm sounder.");
    expect(await page.getByTestId("decision-notes").textContent()).toBe("Keep the top row clear of the fire alarm sounder.");
    await client.screenshot("submittal-returned-a");
    const [mail] = await mailsAbout("consultant@example.test", `Submittal returned for revision: ${ROOM}, revision A (${ARTS})`);
    expect(mail.text).toContain("Their notes: Keep the top row clear of the fire alarm sounder.");
  });

  let removed = "";
  it("the consultant takes a panel off the board and issues B: A is superseded, and B's cover lists the change", async () => {
    const page = consultant.page;
    await consultant.goto("/projects");
    await page.getByRole("link", { name: ARTS }).click();
    await page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: "Rooms" }).click();
    await page.getByTestId("rooms-table").getByRole("link", { name: ROOM }).click();
    await page.getByTestId("board-links").getByRole("link", { name: /Wall A/ }).click();
    await page.getByTestId("board-canvas").locator("canvas").first().waitFor();
    await page.getByTestId("board-canvas").focus();
    await page.keyboard.press("Tab");
    await page.getByTestId("selection-one").waitFor();
    removed = await page.getByTestId("selection-one").getByLabel("Panel code").inputValue();
    expect(removed).toMatch(/^P-\d{3}$/);
    const version = async () => /saved, version (\d+)/.exec((await page.getByTestId("board-save-state").textContent()) ?? "")?.[1] ?? null;
    const before = await version();
    await page.getByRole("button", { name: "Delete panel" }).click();
    await expect.poll(version, { timeout: 15_000 }).not.toBe(before);
    await expect.poll(version, { timeout: 15_000 }).not.toBeNull();

    await issueNext(consultant, "B");
    expect(await page.getByTestId("change-list").textContent()).toContain(`Removed: ${removed} on Wall A (length).`);
    const pdfUrl = (await page.getByTestId("document-submittal").getByRole("link", { name: /^Open/ }).getAttribute("href"))!;
    const cover = (await pdfPages(await fetchBytes(consultant, pdfUrl))).join("\n");
    expect(cover).toContain("What changed since revision A");
    expect(cover).toContain(`Removed: ${removed} on Wall A (length).`);
    await openSubmittals(consultant);
    const rowA = page.getByTestId("submittal-rooms").locator('tr[data-letter="A"]').filter({ has: page.getByRole("link", { name: `Revision A of ${ROOM}` }) });
    expect(await rowA.locator("[data-state]").getAttribute("data-state")).toBe("superseded");
    await mailsAbout("client@example.test", `Submittal issued: ${ROOM}, revision B (${ARTS})`);
  });

  it("the client approves B; the consultant is told, and the installer is sent the shop pack's link and hash", async () => {
    await openRevision(client, "B");
    await decide(client, /^Approve Build it as issued/, "");
    expect(await client.page.getByTestId("decision-outcome").textContent()).toBe("Approved");
    await mailsAbout("consultant@example.test", `Submittal approved: ${ROOM}, revision B (${ARTS})`);
    const [ready] = await mailsAbout("installer@example.test", `Ready to build: ${ROOM}, revision B (${ARTS})`);
    expect(ready.text).toMatch(/\/projects\/[^/]+\/shop-pack\/[^/\s]+/);
    expect(ready.text).toMatch(/SHA-256 [0-9a-f]{64}/);
  });

  it("the installer downloads the shop pack, checks it against the record, and marks three panels installed, one with a photo", async () => {
    const page = installer.page;
    await installer.goto("/projects");
    await page.getByRole("link", { name: ARTS }).click();
    await page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: "Shop pack" }).click();
    const card = page.getByTestId("shop-packs").locator("section").filter({ hasText: `${ROOM}, revision B` });
    const recorded = (await card.getByTestId("pack-sha256").textContent())!;
    const [download] = await Promise.all([page.waitForEvent("download"), card.getByTestId("pack-link").click()]);
    const zip = new Uint8Array(fs.readFileSync((await download.path())!));
    expect(download.suggestedFilename()).toBe("lra-24_rehearsal-room_rev-B_shop-pack_imperial.zip");
    expect(sha256(zip)).toBe(recorded);
    const [ready] = await mailsAbout("installer@example.test", `Ready to build: ${ROOM}, revision B (${ARTS})`);
    expect(ready.text).toContain(recorded);

    await card.getByRole("link", { name: /Panels and progress/ }).click();
    await page.getByTestId("install-count").waitFor();
    // Codes repeat from one board to the next: the panels of wall A are named with their wall.
    const wallA = page.getByRole("list", { name: "Panels on Wall A (length)" });
    const rows = wallA.getByTestId("panel-row");
    const codes = await Promise.all([0, 1, 2].map(async (i) => (await rows.nth(i).getAttribute("data-code"))!));
    for (const code of codes) {
      await wallA.getByRole("button", { name: `Mark installed ${code} on Wall A (length)` }).click();
      await wallA.locator(`[data-testid="panel-row"][data-code="${code}"][data-installed]`).waitFor();
    }
    const photo = path.join(tmp, "site.jpg");
    fs.writeFileSync(photo, await photoWithLocation());
    await wallA.getByLabel(`Add photo of ${codes[0]} on Wall A (length)`).setInputFiles(photo);
    const link = wallA.getByRole("link", { name: `Photo of ${codes[0]} on Wall A (length)` });
    await link.waitFor();
    const stored = await fetchBytes(installer, (await link.getAttribute("href"))!);
    expect(hasExif(stored)).toBe(false);
    expect(await page.getByTestId("install-count").textContent()).toMatch(/^3 of \d+ panels installed$/);
    expect(await page.locator('[data-testid="elevation-wall-a"] [data-installed]').count()).toBe(3);
    await installer.screenshot("shop-pack-installing");
  });

  it("the consultant sees the progress on Submittals and the installed panels on the board", async () => {
    const page = consultant.page;
    await openSubmittals(consultant);
    expect(await page.getByTestId("progress-table").locator(`tr[data-room="${ROOM}"]`).getByTestId("room-progress").textContent()).toMatch(/^3 of \d+$/);
    await page.getByRole("navigation", { name: "Project" }).getByRole("link", { name: "Rooms" }).click();
    await page.getByTestId("rooms-table").waitFor();
    await page.getByTestId("rooms-table").getByRole("link", { name: ROOM }).click();
    await page.getByTestId("board-links").getByRole("link", { name: /Wall A/ }).click();
    await page.getByTestId("board-canvas").locator("canvas").first().waitFor();
    expect(await page.getByTestId("installed-note").textContent()).toContain("3 panels are marked installed on site (revision B)");
    await consultant.screenshot("board-installed");
  });
});
