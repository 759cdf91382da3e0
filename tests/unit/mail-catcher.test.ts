import nodemailer from "nodemailer";
import { afterAll, beforeAll, expect, it } from "vitest";
import { startMailCatcher, type MailCatcher } from "@/lib/mail/catcher";

// A real SMTP hop: nodemailer speaks SMTP to the catcher on loopback, and the message is read
// back over the catcher's HTTP interface.
let catcher: MailCatcher;
beforeAll(async () => {
  catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
});
afterAll(() => catcher.close());

it("catches a message sent over SMTP and lists it by recipient", async () => {
  const transport = nodemailer.createTransport({ host: "127.0.0.1", port: catcher.smtpPort, secure: false, ignoreTLS: true });
  await transport.sendMail({ from: "a@example.test", to: "Bea <b@example.test>", subject: "Hello", text: "Link: http://localhost/invite/abc" });
  const res = await fetch(`http://127.0.0.1:${catcher.httpPort}/messages?to=b@example.test`);
  const { messages } = (await res.json()) as { messages: { subject: string; text: string; to: string[] }[] };
  expect(messages).toHaveLength(1);
  expect(messages[0]).toMatchObject({ subject: "Hello", to: ["b@example.test"] });
  expect(messages[0].text).toContain("http://localhost/invite/abc");
  const none = await fetch(`http://127.0.0.1:${catcher.httpPort}/messages?to=c@example.test`);
  expect(((await none.json()) as { messages: unknown[] }).messages).toHaveLength(0);
  const page = await (await fetch(`http://127.0.0.1:${catcher.httpPort}/`)).text();
  expect(page).toContain('<a href="http://localhost/invite/abc">');
});
