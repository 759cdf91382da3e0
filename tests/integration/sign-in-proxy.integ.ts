import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { useTestEnvironment } from "../support/test-env";
import { makeUser, TEST_PASSWORD, uniqueEmail } from "../support/factories";
import { authPost, clearThrottle } from "../support/auth-requests";
import { LIMITS } from "@/lib/auth/limits";

// Behind a configured reverse proxy (CAVITAS_TRUSTED_PROXIES), the client is the right-most
// address in X-Forwarded-For that is not a trusted proxy: what a client writes to the left of
// it is ignored, and clients behind the same proxy keep separate buckets.

const PROXY = "10.0.0.2";
let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
beforeAll(async () => {
  envHandle = await useTestEnvironment();
  process.env.CAVITAS_TRUSTED_PROXIES = `${PROXY}, 10.9.0.0/16`;
});
afterAll(() => envHandle.cleanup());
beforeEach(() => clearThrottle());

const perAddress = LIMITS.signInPerAddress.max;
const via = (...hops: string[]) => ({ "x-forwarded-for": [...hops, PROXY].join(", ") });

describe("sign-in behind a trusted proxy", () => {
  it("throttles an attacker whatever they put in front, while another client behind the proxy still signs in", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < perAddress + 10; i++) {
      const res = await authPost("/sign-in/email", { email: uniqueEmail("spray"), password: "wrong-password-1" }, via(`192.0.2.${i}`, "198.51.100.66"));
      statuses.push(res.status);
    }
    expect(statuses.filter((s) => s === 429)).toHaveLength(10);
    const victim = await makeUser();
    const res = await authPost("/sign-in/email", { email: victim.email, password: TEST_PASSWORD }, via("198.51.100.7"));
    expect(res.status).toBe(200);
  });

  it("skips every trusted hop, CIDR ranges included, and records the client's address on the session", async () => {
    const u = await makeUser();
    const res = await authPost("/sign-in/email", { email: u.email, password: TEST_PASSWORD }, via("203.0.113.9", "10.9.4.1"));
    expect(res.status).toBe(200);
    const { getDb } = await import("@/db/client");
    const { session } = await import("@/db/schema");
    const [s] = getDb().select().from(session).where(eq(session.userId, u.id)).all();
    expect(s.ipAddress).toBe("203.0.113.9");
  });

  it("refuses a configuration entry that is not an address or a range", async () => {
    const { env } = await import("@/lib/env");
    const before = process.env.CAVITAS_TRUSTED_PROXIES;
    process.env.CAVITAS_TRUSTED_PROXIES = "proxy.example.test";
    // env() is cached; a fresh module instance reads the environment again.
    const { vi } = await import("vitest");
    vi.resetModules();
    const fresh = await import("@/lib/env");
    expect(() => fresh.env()).toThrow(/CAVITAS_TRUSTED_PROXIES.*IP address or a CIDR range/s);
    process.env.CAVITAS_TRUSTED_PROXIES = before;
    expect(env().trustedProxies).toEqual([PROXY, "10.9.0.0/16"]);
  });
});
