import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, Session, mailTo } from "./support/session";

// The firm administrator disables a colleague (signed out at once, told why at sign-in) and
// re-enables them; a consultant removes a member who joined by invitation.
const ARTS = "Lantern Row Arts Centre refit (fictional)";

describe("accounts managed by others", () => {
  let admin: Session;
  let consultant: Session;
  let newcomer: Session;
  const email = `short.stay.${Date.now()}@example.test`;

  beforeAll(async () => {
    [admin, consultant, newcomer] = await Promise.all([Session.open(), Session.open(), Session.open()]);
  });
  afterAll(async () => {
    await admin.close();
    // The disabled consultant's refused sign-in (403) and their page losing its session (401).
    await consultant.close({ allowErrors: /status of (401|403)/ });
    // The removed member's project is not found any more.
    await newcomer.close({ allowErrors: /status of 404/ });
  });

  it("the administrator disables the consultant, who is signed out and told why", async () => {
    await consultant.signIn("consultant@example.test");
    await admin.signIn("admin@example.test");
    await admin.page.getByRole("link", { name: "Firm accounts" }).click();
    const row = admin.page.getByTestId("account-consultant@example.test");
    await row.getByRole("button", { name: "Disable…" }).click();
    await admin.page.getByText("They are signed out at once").waitFor();
    await admin.screenshot("firm-accounts-confirm-disable");
    await admin.page.getByRole("button", { name: "Disable the account" }).click();
    await row.getByText(/^Disabled/).waitFor();
    await admin.screenshot("firm-accounts-disabled");
    expect((await mailTo("consultant@example.test")).map((m) => m.subject)).toContain(
      "Your Lantern Acoustics Studio (fictional consultancy) account on Cavitas was disabled",
    );

    await consultant.page.reload();
    await consultant.page.waitForURL("**/sign-in");
    await consultant.page.getByLabel("E-mail").fill("consultant@example.test");
    await consultant.page.getByLabel("Password").fill(DEMO_PASSWORD);
    await consultant.page.getByRole("button", { name: "Sign in" }).click();
    await consultant.page.getByText("This account has been disabled by your firm administrator.", { exact: false }).waitFor();
    await consultant.screenshot("sign-in-disabled");
  });

  it("re-enables the account, and the consultant signs in again", async () => {
    await admin.page.getByTestId("account-consultant@example.test").getByRole("button", { name: "Re-enable" }).click();
    await admin.page.getByTestId("account-consultant@example.test").getByText("Active").waitFor();
    await consultant.signIn("consultant@example.test");
  });

  it("a consultant removes a member who joined by invitation; the last consultant cannot be removed", async () => {
    await consultant.page.getByRole("link", { name: ARTS }).click();
    await consultant.page.getByLabel("E-mail").fill(email);
    await consultant.page.getByLabel("Role").selectOption("client");
    await consultant.page.getByRole("button", { name: "Send invitation" }).click();
    await consultant.page.getByText(`Invitation sent to ${email}.`).waitFor();
    const link = /(https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+)/.exec((await mailTo(email))[0].text)![1];

    await newcomer.page.goto(link);
    await newcomer.page.getByLabel("Your name").fill("Sol Shortstay (fictional)");
    await newcomer.page.getByLabel("Password", { exact: true }).fill("short-stay-2026");
    await newcomer.page.getByLabel("Password again").fill("short-stay-2026");
    await newcomer.page.getByRole("button", { name: "Create account and join" }).click();
    await newcomer.page.waitForURL("**/projects/*");
    const projectUrl = newcomer.page.url();

    await consultant.page.reload();
    const team = consultant.page.getByTestId("team-list");
    await team.getByText("Sol Shortstay (fictional)").waitFor();
    // Clara is the arts centre's only consultant: no remove button beside her.
    expect(await team.getByRole("button", { name: "Remove Clara Consultant (fictional) from the project" }).count()).toBe(0);
    await team.getByRole("button", { name: "Remove Sol Shortstay (fictional) from the project" }).click();
    await consultant.screenshot("project-team-confirm-remove");
    await team.getByRole("button", { name: "Remove from project" }).click();
    await expect.poll(() => team.textContent()).not.toContain("Sol Shortstay");
    expect((await mailTo(email)).map((m) => m.subject)).toContain(`You were removed from ${ARTS} on Cavitas`);

    const res = await newcomer.page.goto(projectUrl);
    expect(res?.status()).toBe(404);
  });
});
