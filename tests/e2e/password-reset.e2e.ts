import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO_PASSWORD, Session, mailTo } from "./support/session";

// A person who forgot their password asks for a link, reads the e-mail in the local catcher,
// sets a new password and signs in with it; then, from the settings page, changes it back
// (the old one is needed), sees their devices and signs out everywhere.
describe("password reset journey", () => {
  const email = "client@example.test";
  const fresh = "acoustic-ceiling-77";
  let s: Session;

  beforeAll(async () => {
    s = await Session.open();
  });
  afterAll(async () => {
    // Refusals provoked on purpose: the old password (401), a wrong current password (422).
    await s.close({ allowErrors: /status of (401|422)/ });
  });

  it("asks for a link from the sign-in page and gets the same answer as for any address", async () => {
    await s.goto("/sign-in");
    await s.page.getByRole("link", { name: "Forgot your password?" }).click();
    await s.page.waitForURL("**/forgot-password");
    await s.page.getByRole("button", { name: "Send me a link" }).click();
    await s.page.getByText("Enter a valid e-mail address").waitFor();
    await s.page.getByLabel("E-mail").fill(email);
    await s.screenshot("forgot-password");
    await s.page.getByRole("button", { name: "Send me a link" }).click();
    await s.page.getByText("If an account uses that address, a link to set a new password is on its way.").waitFor();
    await s.screenshot("forgot-password-sent");
  });

  it("follows the e-mailed link, sets a new password, and signs in with it", async () => {
    await expect.poll(async () => (await mailTo(email)).filter((m) => m.subject === "Set a new Cavitas password").length, { timeout: 10_000 }).toBe(1);
    const mail = (await mailTo(email)).find((m) => m.subject === "Set a new Cavitas password")!;
    const link = /(https?:\/\/\S+\/reset-password\/[A-Za-z0-9_%-]+)/.exec(mail.text)![1];

    await s.page.goto(link);
    await s.page.getByRole("heading", { name: "Set a new password" }).waitFor();
    await s.page.getByLabel("New password", { exact: true }).fill("short");
    await s.page.getByLabel("New password again").fill("short");
    await s.page.getByRole("button", { name: "Set the new password" }).click();
    await s.page.getByText("Use at least 10 characters for the password.").waitFor();
    await s.screenshot("reset-password");
    await s.page.getByLabel("New password", { exact: true }).fill(fresh);
    await s.page.getByLabel("New password again").fill(fresh);
    await s.page.getByRole("button", { name: "Set the new password" }).click();
    await s.page.waitForURL("**/sign-in?reset=done");
    await s.page.getByText("Your new password is set. Sign in with it.").waitFor();

    // The old password no longer works; the new one does.
    await s.page.getByLabel("E-mail").fill(email);
    await s.page.getByLabel("Password").fill(DEMO_PASSWORD);
    await s.page.getByRole("button", { name: "Sign in" }).click();
    await s.page.getByText("That e-mail and password do not match an account.").waitFor();
    await s.page.getByLabel("Password").fill(fresh);
    await s.page.getByRole("button", { name: "Sign in" }).click();
    await s.page.waitForURL("**/projects");
    expect((await mailTo(email)).map((m) => m.subject)).toContain("Your Cavitas password was changed");

    // The link is spent, and its page says so before anything is typed.
    await s.page.goto(link);
    await s.page.getByText("This link no longer works").waitFor();
    expect(await s.page.getByLabel("New password", { exact: true }).count()).toBe(0);
    await s.screenshot("reset-password-spent");
  });

  it("changes the password back in the settings, with the current one, and signs out everywhere", async () => {
    await s.goto("/settings");
    await s.page.getByTestId("session-list").getByText("this device").waitFor();
    await s.page.getByLabel("Current password").fill("not-my-password");
    await s.page.getByLabel("New password", { exact: true }).fill(DEMO_PASSWORD);
    await s.page.getByLabel("New password again").fill(DEMO_PASSWORD);
    await s.page.getByRole("button", { name: "Change password" }).click();
    await s.page.getByText("That is not your current password.").waitFor();
    await s.page.getByLabel("Current password").fill(fresh);
    await s.page.getByRole("button", { name: "Change password" }).click();
    await s.page.getByText(/^Password changed\./).waitFor();
    await s.screenshot("settings-password-sessions");

    await s.page.getByRole("button", { name: "Sign out everywhere" }).click();
    await s.page.getByRole("button", { name: "Yes, sign out everywhere" }).click();
    await s.page.waitForURL("**/sign-in");
    expect((await mailTo(email)).map((m) => m.subject)).toContain("You were signed out of Cavitas everywhere");
    await s.signIn(email);
  });
});
