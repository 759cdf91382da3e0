import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runEvaluate } from "@/lib/acoustics/contract";
import { Session } from "./support/session";

// Issue journey: a consultant creates a room from scratch, sees its check, creates and tunes
// a build-up on the bench until the 125 Hz octave meets its target, with the numbers on the
// screen checked against the engine's (run here, in the test process, on the same inputs).
describe("room, check and bench", () => {
  let s: Session;
  let roomUrl = "";
  let projectUrl = "";

  beforeAll(async () => {
    s = await Session.open();
    await s.signIn("consultant@example.test");
  });
  afterAll(() => s.close());

  const status = (f: number) => s.page.locator(`[data-testid="check-table"] tr[data-octave="${f}"] [data-status]`).getAttribute("data-status");

  it("creates a room from scratch and shows its check", async () => {
    const page = s.page;
    await page.getByRole("link", { name: "Lantern Row Arts Centre refit (fictional)" }).click();
    await page.waitForURL("**/projects/*");
    projectUrl = page.url();
    await page.getByRole("link", { name: "Rooms", exact: true }).click();
    await page.waitForURL("**/rooms");
    await page.getByRole("button", { name: "New room" }).click();
    await page.getByLabel("Room name").fill("Studio 3 (e2e)");
    await page.getByLabel("Use").selectOption("music");
    for (const [label, value] of [["Length", "8 m"], ["Width", "6 m"], ["Height", "3500 mm"]]) {
      await page.getByLabel(label, { exact: true }).fill(value);
      await page.getByLabel(label, { exact: true }).press("Enter");
    }
    await page.getByRole("button", { name: "Create room" }).click();
    await page.waitForURL("**/rooms/*");
    roomUrl = page.url();
    await page.getByTestId("check-table").waitFor();
    expect(await page.getByTestId("room-meta").textContent()).toContain("168 m³");
    expect(await status(125)).toBe("over");
    expect(await page.getByTestId("check-sentences").textContent()).toMatch(/At 125 Hz the room rings .* longer than the target band allows/);
    await s.screenshot("check-new-room");
  });

  it("refuses a bad length at the field, keeping the saved room", async () => {
    const page = s.page;
    const field = page.getByTestId("room-length").getByRole("textbox");
    await field.fill("8 kg");
    await field.press("Enter");
    await page.getByTestId("room-length").getByText("is not a length").waitFor();
    await field.fill("8 m");
    await field.press("Enter");
  });

  it("tunes a new build-up on the bench, and the screen shows the engine's numbers", async () => {
    const page = s.page;
    await page.goto(`${projectUrl}/build-ups`);
    await page.getByRole("button", { name: "New build-up" }).click();
    await page.waitForURL(/build-ups\/[^/]+$/);
    await page.getByLabel("Name", { exact: true }).fill("Studio bass panel (e2e)");
    for (const [label, value] of [["Pitch", "40 mm"], ["Cavity depth", "200 mm"]]) {
      await page.getByLabel(label, { exact: true }).fill(value);
      await page.getByLabel(label, { exact: true }).press("Enter");
    }
    await page.getByLabel("Infill", { exact: true }).selectOption("porous");
    const spec = {
      facing: { kind: "round-holes" as const, thickness: 0.016, holeDiameter: 0.008, pitch: 0.04, grid: "square" as const },
      cavity: { depth: 0.2, partitioned: true },
      infill: { thickness: 0.05, flowResistivity: 10000, position: "behind-facing" as const, model: "miki" as const },
      air: { temperature: 20, pressure: 101325 },
    };
    const engine = runEvaluate(spec);
    await expect.poll(() => page.getByTestId("peak-hz").textContent()).toBe(`${Math.round(engine.peakHz)} Hz`);
    const r = engine.ratings;
    expect(await page.getByTestId("alpha-w").textContent()).toBe(`${r.alphaW.toFixed(2)}${r.shape ? ` (${r.shape})` : ""}`);
    expect(await page.getByTestId("nrc").textContent()).toBe(r.nrc.toFixed(2));
    expect(await page.getByTestId("open-area").textContent()).toBe(`${(engine.openArea * 100).toFixed(2)} %`);
    const at125 = engine.thirdOctaves.find((b) => b.f === 125)!;
    expect(await page.getByTestId("diffuse-125").textContent()).toBe(at125.diffuse.toFixed(2));
    await s.screenshot("bench");
    await page.getByRole("button", { name: "Save build-up" }).click();
    await expect.poll(() => page.getByTestId("save-state").textContent()).toContain("Saved, version 2");
  });

  it("places the build-up by area and brings 125 Hz within its target", async () => {
    const page = s.page;
    await page.goto(roomUrl);
    await page.getByTestId("check-table").waitFor();
    await page.getByRole("button", { name: "+ Add treated area" }).click();
    const row = page.locator('[data-treatment="0"]');
    await row.getByLabel("Treated surface").selectOption({ label: "Wall A (length)" });
    await row.getByLabel("Build-up").selectOption({ label: "Studio bass panel (e2e)" });
    await row.getByLabel("Panel area").fill("15");
    await expect.poll(() => status(125)).toBe("within");
    await page.getByRole("button", { name: "Save room" }).click();
    await expect.poll(() => page.getByTestId("room-meta").textContent()).toContain("saved, version 2");

    // The screen's numbers are the server's: read the saved room through the API.
    const roomId = roomUrl.split("/rooms/")[1];
    const projectId = projectUrl.split("/projects/")[1];
    const res = await page.request.get(s.url(`/api/v1/projects/${projectId}/rooms/${roomId}`));
    const saved = await res.json();
    const octave = saved.check.octaves.find((o: { f: number }) => o.f === 125);
    expect(octave.status).toBe("within");
    expect(await page.getByTestId("after-125").textContent()).toBe(`${octave.after.sabine.toFixed(2)} / ${octave.after.eyring.toFixed(2)}`);
    await s.screenshot("check-treated-room");
  });
});
