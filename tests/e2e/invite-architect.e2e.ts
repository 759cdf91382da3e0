import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Session, mailTo } from "./support/session";

// The foundation's journey: a consultant invites an architect by e-mail; the architect
// follows the link from the delivered message, signs up and sees the project.
describe("invitation journey", () => {
  let consultant: Session;
  let architect: Session;
  const email = `new.architect.${Date.now()}@example.test`;

  beforeAll(async () => {
    consultant = await Session.open();
    architect = await Session.open();
  });
  afterAll(async () => {
    // The deliberately bad address was answered 422, which the browser logs.
    await consultant.close({ allowErrors: /status of 422/ });
    // The architect's page saw one refused sign-in on purpose, logged by the browser as a 401.
    await architect.close({ allowErrors: /status of 401/ });
  });

  it("consultant sends the invitation from the project overview", async () => {
    await consultant.signIn("consultant@example.test");
    await consultant.page.getByRole("link", { name: "Lantern Row Arts Centre refit (fictional)" }).click();
    await consultant.page.waitForURL("**/projects/*");
    await consultant.page.getByLabel("E-mail").fill("not an address");
    await consultant.page.getByRole("button", { name: "Send invitation" }).click();
    await expect.poll(() => consultant.page.getByRole("alert").first().textContent()).toContain("valid e-mail");

    await consultant.page.getByLabel("E-mail").fill(email);
    await consultant.page.getByLabel("Role").selectOption("architect");
    await consultant.page.getByLabel("Note (optional)").fill("Please review the rehearsal room walls.");
    await consultant.page.getByRole("button", { name: "Send invitation" }).click();
    await consultant.page.getByText(`Invitation sent to ${email}.`).waitFor();
    await expect.poll(() => consultant.page.getByTestId("open-invitations").textContent()).toContain(email);
    await consultant.screenshot("project-overview-consultant");
  });

  it("architect follows the link in the delivered e-mail, signs up and sees the project", async () => {
    const messages = await mailTo(email);
    expect(messages).toHaveLength(1);
    expect(messages[0].subject).toContain("Lantern Row Arts Centre refit (fictional)");
    expect(messages[0].text).toContain("Please review the rehearsal room walls.");
    const link = /(https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+)/.exec(messages[0].text)![1];

    await architect.page.goto(link);
    await architect.page.getByRole("heading", { name: /Join Lantern Row/ }).waitFor();
    await architect.screenshot("invitation-sign-up");
    await architect.page.getByLabel("Your name").fill("Nell Newcomer (fictional)");
    await architect.page.getByLabel("Password", { exact: true }).fill("short");
    await architect.page.getByLabel("Password again").fill("short");
    await architect.page.getByRole("button", { name: "Create account and join" }).click();
    await architect.page.getByText("Use at least 10 characters for the password.").waitFor();

    await architect.page.getByLabel("Password", { exact: true }).fill("drawing-board-42");
    await architect.page.getByLabel("Password again").fill("drawing-board-42");
    await architect.page.getByRole("button", { name: "Create account and join" }).click();
    await architect.page.waitForURL("**/projects/*");
    await architect.page.getByRole("heading", { name: "Lantern Row Arts Centre refit (fictional)" }).waitFor();
    const team = await architect.page.getByTestId("team-list").textContent();
    expect(team).toContain("Nell Newcomer (fictional)");
    expect(await architect.page.locator("main [data-role]").first().getAttribute("data-role")).toBe("architect");
    // An architect sees the rooms but is not offered the invitation form.
    expect(await architect.page.getByTestId("room-table").isVisible()).toBe(true);
    expect(await architect.page.getByRole("button", { name: "Send invitation" }).count()).toBe(0);

    // The link is spent: opening it again says so.
    await architect.page.goto(link);
    await architect.page.getByText("This invitation has already been used").waitFor();

    // And the new account signs in on its own.
    await architect.goto("/projects");
    await architect.page.getByRole("button", { name: "Sign out" }).click();
    await architect.page.waitForURL("**/sign-in");
    await architect.page.getByLabel("E-mail").fill(email);
    await architect.page.getByLabel("Password").fill("wrong-password-1");
    await architect.page.getByRole("button", { name: "Sign in" }).click();
    await architect.page.getByText("That e-mail and password do not match an account.").waitFor();
    await architect.page.getByLabel("Password").fill("drawing-board-42");
    await architect.page.getByRole("button", { name: "Sign in" }).click();
    await architect.page.waitForURL("**/projects");
    expect(await architect.page.getByTestId("project-table").textContent()).toContain("Lantern Row Arts Centre refit (fictional)");
  });
});
