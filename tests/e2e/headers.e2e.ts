import http from "node:http";
import type { AddressInfo } from "node:net";
import { afterEach, describe, expect, inject, it } from "vitest";
import { Session } from "./support/session";

// Defect 7: security headers on the production build. Pages carry a Content-Security-Policy
// whose nonce is on every script Next.js renders (and on nothing else), no page can be framed,
// and every response says nosniff and keeps its path to itself.

let open: Session[] = [];
afterEach(async () => {
  const closing = open;
  open = [];
  for (const s of closing) await s.close();
});

const base = () => inject("baseUrl");

describe("security headers", () => {
  it("gives each page a policy with a fresh nonce, carried by every script tag", async () => {
    const first = await fetch(`${base()}/sign-in`);
    const second = await fetch(`${base()}/sign-in`);
    const policy = first.headers.get("content-security-policy")!;
    expect(policy).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
    expect(policy).toContain("frame-ancestors 'none'");
    expect(policy).toContain("object-src 'none'");
    expect(policy).not.toMatch(/script-src[^;]*'unsafe-(inline|eval)'/);
    const nonce = /'nonce-([^']+)'/.exec(policy)![1];
    expect(second.headers.get("content-security-policy")).not.toContain(nonce);
    const html = await first.text();
    const scripts = html.match(/<script\b[^>]*>/g) ?? [];
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag, tag).toContain(`nonce="${nonce}"`);
    expect(first.headers.get("x-frame-options")).toBe("DENY");
    expect(first.headers.get("x-content-type-options")).toBe("nosniff");
    expect(first.headers.get("referrer-policy")).toBe("same-origin");
  });

  it("gives API answers a policy that runs and loads nothing, and a request id", async () => {
    for (const path of ["/api/health", "/api/v1/me"]) {
      const res = await fetch(`${base()}${path}`);
      expect(res.headers.get("content-security-policy"), path).toMatch(/^default-src 'none'; frame-ancestors 'none'/);
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("x-request-id")).toMatch(/^[0-9a-f-]{36}$/);
    }
  });

  it("refuses to show a signed-in page inside another page of the same site", async () => {
    const s = await Session.open();
    open.push(s);
    await s.signIn("consultant@example.test");
    // Another port of the same host is the same site: the session cookie goes with the frame.
    const framing = http.createServer((_req, res) => {
      res.setHeader("content-type", "text/html");
      res.end(`<!doctype html><title>framing</title><iframe id="app" src="${base()}/projects" width="800" height="600"></iframe>`);
    });
    await new Promise<void>((r) => framing.listen(0, "127.0.0.1", () => r()));
    const port = (framing.address() as AddressInfo).port;
    try {
      s.expectConsoleError(/Refused to (display|frame)|frame-ancestors|X-Frame-Options/i);
      await s.page.goto(`http://localhost:${port}/`);
      await s.page.waitForLoadState("load");
      const frame = s.page.frames().find((f) => f !== s.page.mainFrame())!;
      expect(await frame.locator("text=Projects").count()).toBe(0);
      expect(await frame.locator("[data-testid='project-table']").count()).toBe(0);
    } finally {
      framing.close();
    }
  });

  it("runs every signed-in screen of a project with no policy violation in the console", async () => {
    const s = await Session.open();
    open.push(s);
    await s.page.addInitScript(() =>
      document.addEventListener("securitypolicyviolation", (e) => console.error(`policy violation: ${e.violatedDirective} ${e.blockedURI}`)),
    );
    await s.signIn("consultant@example.test");
    // Each screen loaded as a document, since the policy applies to document loads.
    await s.page.getByRole("link", { name: "Saltmarsh Library reading room (fictional)" }).click();
    await s.page.waitForURL(/\/projects\/[^/]+$/);
    const project = new URL(s.page.url()).pathname;
    await s.goto(`${project}/rooms`);
    const room = (await s.page.getByTestId("rooms-table").locator("a").first().getAttribute("href"))!;
    for (const screen of [room, `${room}/board/wall-a`, `${project}/build-ups`, "/settings"]) {
      await s.goto(screen);
      await s.page.waitForLoadState("networkidle");
    }
    // Session.close fails the test on any console error, violations included.
  });
});
