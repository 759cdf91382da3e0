import fs from "node:fs";
import path from "node:path";
import { inject, expect } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { newBrowserContext } from "./browser";

export const DEMO_PASSWORD = "cavity-demo-2026";
const SCREENS = path.join(process.cwd(), "tests", "e2e", "screens");

// A browser page with a strict watch on console errors and failed requests, plus helpers
// that act as a person would: type, click, read what the screen shows.
export class Session {
  readonly errors: string[] = [];
  private readonly expected: RegExp[] = [];
  private constructor(
    readonly context: BrowserContext,
    readonly page: Page,
    private readonly closeContext: () => Promise<void>,
  ) {
    page.on("console", (m) => {
      if (m.type() === "error") this.errors.push(m.text());
    });
    page.on("pageerror", (e) => this.errors.push(e.message));
  }

  static async open(): Promise<Session> {
    const { context, close } = await newBrowserContext();
    const page = context.pages()[0] ?? (await context.newPage());
    return new Session(context, page, close);
  }

  url(p: string) {
    return `${inject("baseUrl")}${p}`;
  }

  async goto(p: string) {
    await this.page.goto(this.url(p));
  }

  async signIn(email: string, password = DEMO_PASSWORD) {
    await this.goto("/sign-in");
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
    await this.page.waitForURL("**/projects");
  }

  async screenshot(name: string) {
    fs.mkdirSync(SCREENS, { recursive: true });
    await this.page.screenshot({ path: path.join(SCREENS, `${name}.png`), fullPage: true });
  }

  // A test that provokes a refusal on purpose declares the browser's log line for it.
  expectConsoleError(pattern: RegExp) {
    this.expected.push(pattern);
  }

  async close(opts: { allowErrors?: RegExp } = {}) {
    if (opts.allowErrors) this.expected.push(opts.allowErrors);
    const unexpected = this.errors.filter((e) => !this.expected.some((p) => p.test(e)));
    await this.closeContext();
    expect(unexpected, "console errors in the browser").toEqual([]);
  }
}

export async function mailTo(address: string): Promise<{ subject: string; text: string }[]> {
  const res = await fetch(`${inject("mailUrl")}/messages?to=${encodeURIComponent(address)}`);
  return ((await res.json()) as { messages: { subject: string; text: string }[] }).messages;
}
