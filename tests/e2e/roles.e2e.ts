import { afterEach, describe, expect, it } from "vitest";
import { Session, mailTo } from "./support/session";

// Each demo account signs in and sees its own projects, with its own role on each.
const ARTS = "Lantern Row Arts Centre refit (fictional)";
const LIBRARY = "Saltmarsh Library reading room (fictional)";

let open: Session[] = [];
async function session() {
  const s = await Session.open();
  open.push(s);
  return s;
}
afterEach(async () => {
  const closing = open;
  open = [];
  for (const s of closing) await s.close();
});

async function projectRoles(s: Session): Promise<Record<string, string>> {
  const rows = await s.page.locator('[data-testid="project-table"] tbody tr').all();
  const out: Record<string, string> = {};
  for (const row of rows) {
    const name = (await row.locator("a").textContent())!.trim();
    out[name] = (await row.locator("[data-role]").getAttribute("data-role"))!;
  }
  return out;
}

describe("each role at sign-in", () => {
  it("consultant: both projects as consultant, and can start a new one", async () => {
    const s = await session();
    await s.signIn("consultant@example.test");
    expect(await projectRoles(s)).toEqual({ [ARTS]: "consultant", [LIBRARY]: "consultant" });
    await s.screenshot("projects-consultant");
    await s.page.getByRole("button", { name: "New project" }).click();
    s.expectConsoleError(/status of 422/);
    await s.page.getByRole("button", { name: "Create project" }).click();
    await s.page.getByText("Enter a name.").waitFor();
    await s.page.getByLabel("Project name").fill("Harbour studio fit-out (fictional)");
    await s.page.getByLabel("Reference").fill("HSF-1");
    await s.page.getByRole("button", { name: "Create project" }).click();
    await s.page.getByRole("heading", { name: "Harbour studio fit-out (fictional)" }).waitFor();
    expect(await s.page.getByText("No rooms yet.").isVisible()).toBe(true);
  });

  it("architect: the arts centre only, rooms visible, no invitation form", async () => {
    const s = await session();
    await s.signIn("architect@example.test");
    expect(await projectRoles(s)).toEqual({ [ARTS]: "architect" });
    await s.page.getByRole("link", { name: ARTS }).click();
    await s.page.getByTestId("room-table").waitFor();
    expect(await s.page.getByTestId("room-table").textContent()).toContain("Rehearsal room");
    expect(await s.page.getByRole("button", { name: "Send invitation" }).count()).toBe(0);
    await s.screenshot("project-overview-architect");
  });

  it("installer: both projects as installer, drafts hidden, lengths in imperial units", async () => {
    const s = await session();
    await s.signIn("installer@example.test");
    expect(await projectRoles(s)).toEqual({ [ARTS]: "installer", [LIBRARY]: "installer" });
    expect(await s.page.getByText("imperial units").isVisible()).toBe(true);
    await s.page.getByRole("link", { name: ARTS }).click();
    await s.page.getByText("Design drafts are not shown to your role").waitFor();
    expect(await s.page.getByTestId("room-table").count()).toBe(0);
    expect(await s.page.getByTestId("may-do").textContent()).toContain("Download shop drawings");
    await s.screenshot("project-overview-installer");
  });

  it("client: the arts centre as client; a guessed project address is not found", async () => {
    const s = await session();
    await s.signIn("client@example.test");
    expect(await projectRoles(s)).toEqual({ [ARTS]: "client" });
    await s.page.getByRole("link", { name: ARTS }).click();
    await s.page.getByText("Design drafts are not shown to your role").waitFor();
    expect(await s.page.getByTestId("may-do").textContent()).toContain("Approve or return submittals");
    s.expectConsoleError(/status of 404/);
    const res = await s.page.goto(s.url("/projects/not-a-project-of-mine"));
    expect(res?.status()).toBe(404);
    await s.page.getByText("There is nothing at this address").waitFor();
  });

  it("firm administrator: sees the firm's accounts and invites a colleague", async () => {
    const s = await session();
    await s.signIn("admin@example.test");
    expect(await projectRoles(s)).toEqual({});
    await s.page.getByRole("link", { name: "Firm accounts" }).click();
    await s.page.getByTestId("firm-accounts").waitFor();
    const accounts = await s.page.getByTestId("firm-accounts").textContent();
    expect(accounts).toContain("Clara Consultant (fictional)");
    expect(accounts).not.toContain("Cleo Client");
    const colleague = `colleague.${Date.now()}@example.test`;
    await s.page.getByLabel("E-mail").fill(colleague);
    await s.page.getByRole("button", { name: "Send invitation" }).click();
    await s.page.getByText(`Invitation sent to ${colleague}.`).waitFor();
    expect((await mailTo(colleague))[0].subject).toContain("Lantern Acoustics Studio (fictional consultancy)");
    await s.screenshot("firm-accounts");
  });
});

describe("unit preference", () => {
  it("switching to imperial changes how every length is shown", async () => {
    const s = await session();
    await s.signIn("architect@example.test");
    await s.page.getByRole("link", { name: ARTS }).click();
    await s.page.getByTestId("room-table").waitFor();
    expect(await s.page.getByTestId("room-table").textContent()).toContain("12 m × 9 m × 4.5 m");
    await s.page.getByRole("link", { name: "Settings" }).click();
    await s.page.getByLabel("Imperial (in, ft)").check();
    await s.page.getByRole("button", { name: "Save settings" }).click();
    await s.page.getByText("Settings saved.").waitFor();
    await s.screenshot("settings");
    await s.page.getByRole("link", { name: "Projects" }).click();
    await s.page.getByRole("link", { name: ARTS }).click();
    await s.page.getByTestId("room-table").waitFor();
    // 12 m = 472.441 in = 39 ft 4 7/16 in to the nearest 1/16 in (1 in = 25.4 mm exactly, by
    // definition); 9 m = 29 ft 6.331 in → 6 5/16 in; 4.5 m = 14 ft 9.165 in → 9 3/16 in.
    expect(await s.page.getByTestId("room-table").textContent()).toContain("39 ft 4 7/16 in × 29 ft 6 5/16 in × 14 ft 9 3/16 in");
    // Put it back for the other tests that read metric values.
    await s.page.getByRole("link", { name: "Settings" }).click();
    await s.page.getByLabel("Metric (mm, m)").check();
    await s.page.getByRole("button", { name: "Save settings" }).click();
    await s.page.getByText("Settings saved.").waitFor();
  });
});
