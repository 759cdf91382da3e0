import os from "node:os";
import path from "node:path";
import { afterEach, describe, expect, it, vi } from "vitest";
import { nextServerArgs } from "@/lib/cli/server-args";

// Defect 8: `npm run demo` and `npm run dev` listen on the loopback address unless told to
// listen wider; `next start` alone would listen on every interface.
describe("the address the demo and dev servers listen on", () => {
  const saved = { ...process.env };
  afterEach(() => {
    process.env = { ...saved };
    vi.resetModules();
  });

  async function hostFrom(value: string | undefined): Promise<string> {
    vi.resetModules();
    process.env = { ...saved, CAVITAS_DATA_DIR: path.join(os.tmpdir(), "cavitas-env-test"), BETTER_AUTH_SECRET: "x".repeat(40) };
    if (value === undefined) delete process.env.CAVITAS_HOST;
    else process.env.CAVITAS_HOST = value;
    const { env } = await import("@/lib/env");
    return env().host;
  }

  it("names the address the settings give, for both commands", () => {
    expect(nextServerArgs("demo", { port: 3000, host: "127.0.0.1" })).toEqual(["start", "--port", "3000", "--hostname", "127.0.0.1"]);
    expect(nextServerArgs("dev", { port: 3100, host: "0.0.0.0" })).toEqual(["dev", "--port", "3100", "--hostname", "0.0.0.0"]);
  });

  it("defaults to 127.0.0.1, and CAVITAS_HOST widens it", async () => {
    expect(await hostFrom(undefined)).toBe("127.0.0.1");
    expect(await hostFrom("0.0.0.0")).toBe("0.0.0.0");
  });
});
