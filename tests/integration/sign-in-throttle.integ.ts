import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { useTestEnvironment } from "../support/test-env";
import { makeUser, TEST_PASSWORD, uniqueEmail } from "../support/factories";
import { authPost, clearThrottle } from "../support/auth-requests";
import { LIMITS } from "@/lib/auth/limits";

// Sign-in throttling with no trusted proxy configured (the default): no forwarded header is
// believed, so a client cannot pick a fresh address per attempt; and each account has its
// own limit with a clear message and an expiry.

let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
beforeAll(async () => {
  envHandle = await useTestEnvironment();
});
afterAll(() => envHandle.cleanup());
beforeEach(() => clearThrottle());

const WRONG = "not-the-password-1";
const perAddress = LIMITS.signInPerAddress.max;
const perAccount = LIMITS.signInPerAccount.max;

describe("the per-address limit", () => {
  it("throttles fifty wrong passwords that each claim a different X-Forwarded-For", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 50; i++) {
      // A different address each time too, so only the address limit can stop them.
      const res = await authPost("/sign-in/email", { email: uniqueEmail("spray"), password: WRONG }, { "x-forwarded-for": `203.0.113.${i}` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, perAddress)).toEqual(Array(perAddress).fill(401));
    expect(statuses.slice(perAddress)).toEqual(Array(50 - perAddress).fill(429));
  });

  it("keeps its count in SQLite, so a new auth instance (a restart) carries on counting", async () => {
    const { getDb } = await import("@/db/client");
    const { throttle } = await import("@/db/schema");
    const hits = () => getDb().select().from(throttle).all().find((r) => r.key.startsWith("address:") && r.key.endsWith("|/sign-in/email"))?.hits;
    await authPost("/sign-in/email", { email: uniqueEmail("count"), password: WRONG });
    expect(hits()).toBe(1);
    (globalThis as unknown as { __cavitasAuth?: unknown }).__cavitasAuth = undefined;
    await authPost("/sign-in/email", { email: uniqueEmail("after-restart"), password: WRONG });
    expect(hits()).toBe(2);
  });
});

describe("the per-account limit", () => {
  it("locks an account after five wrong passwords, refuses even the right one, and says for how long", async () => {
    const u = await makeUser();
    for (let i = 1; i < perAccount; i++) {
      expect((await authPost("/sign-in/email", { email: u.email, password: WRONG }, { "x-forwarded-for": `198.51.100.${i}` })).status).toBe(401);
    }
    const fifth = await authPost("/sign-in/email", { email: u.email, password: WRONG });
    expect(fifth.status).toBe(429);
    expect(fifth.json.code).toBe("ACCOUNT_LOCKED");
    expect(fifth.json.message).toMatch(/paused for 15 minutes/);
    const right = await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD });
    expect(right.status).toBe(429);
    expect(right.json.message).toMatch(/reset your password/);
    expect(right.cookie).not.toMatch(/session_token/);
  });

  it("answers an address with no account exactly as one with an account", async () => {
    const u = await makeUser();
    const ghost = uniqueEmail("ghost");
    const answers = async (email: string) => {
      const out: unknown[] = [];
      for (let i = 0; i <= perAccount; i++) {
        const res = await authPost("/sign-in/email", { email, password: WRONG });
        out.push([res.status, res.json?.code, res.json?.message]);
      }
      return out;
    };
    expect(await answers(ghost)).toEqual(await answers(u.email));
  });

  it("lets the account in again once the lock has expired", async () => {
    const u = await makeUser();
    for (let i = 0; i < perAccount; i++) await authPost("/sign-in/email", { email: u.email, password: WRONG });
    expect((await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD })).status).toBe(429);
    const { getDb } = await import("@/db/client");
    const { throttle } = await import("@/db/schema");
    // Fifteen minutes pass (the lock's end moved into the past).
    getDb().update(throttle).set({ lockedUntil: Date.now() - 1000 }).where(eq(throttle.key, `sign-in:${u.email}`)).run();
    const res = await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.cookie).toMatch(/session_token/);
  });

  it("counts failures by address case-insensitively and forgets them after a right password", async () => {
    const u = await makeUser();
    for (let i = 1; i < perAccount; i++) await authPost("/sign-in/email", { email: u.email.toUpperCase(), password: WRONG });
    expect((await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD })).status).toBe(200);
    // The count restarted: four more wrong ones do not lock.
    for (let i = 1; i < perAccount; i++) expect((await authPost("/sign-in/email", { email: u.email, password: WRONG })).status).toBe(401);
  });
});
