import { spawnSync } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { useTestEnvironment } from "../support/test-env";
import { addMember, makeFirm, makeProject, makeUser } from "../support/factories";
import { call, signIn } from "../support/http";
import { PROJECT_ROLES } from "@/lib/roles";

// The calculation contract's HTTP routes: signed-in users only, the same JSON as the command
// line, and bad input answered 400 with the field named.
let envHandle: Awaited<ReturnType<typeof useTestEnvironment>>;
const cookies: Record<string, string> = {};

beforeAll(async () => {
  envHandle = await useTestEnvironment();
  const firm = makeFirm();
  const project = makeProject(firm.id);
  for (const role of PROJECT_ROLES) {
    const u = await makeUser({ firmId: role === "consultant" ? firm.id : null });
    addMember(project.id, u.id, role);
    cookies[role] = await signIn(u.email);
  }
});
afterAll(() => envHandle.cleanup());

const routes = {
  evaluate: () => import("@/app/api/v1/evaluate/route"),
  rate: () => import("@/app/api/v1/rate/route"),
  reverb: () => import("@/app/api/v1/reverb/route"),
};

// ISO 11654 / ASTM C423 worked example "R2_resonant_500" (computed from the standards' rules,
// computed from the standards' rules and traced by hand there): α_w 0.40(LM), class D,
// NRC 0.65, SAA 0.63.
const R2 = [0.3, 0.45, 0.6, 0.75, 0.85, 0.9, 0.88, 0.8, 0.7, 0.6, 0.52, 0.45, 0.4, 0.36, 0.33, 0.3, 0.28, 0.26];
const BANDS = [100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000];
const rateInput = { thirdOctaves: Object.fromEntries(BANDS.map((f, i) => [String(f), R2[i]])) };

const evaluateInput = {
  facing: { kind: "round-holes", thickness: 0.006, holeDiameter: 0.005, pitch: 0.025, grid: "square" },
  cavity: { depth: 0.05, partitioned: true },
  infill: null,
};

// A worked room, computed in numpy: 10 × 8 × 3 m, Sabine about 0.565 s at
// 500 Hz with air absorption at 20 °C / 50 % (there computed with c = 343 m/s and the nominal
// band frequency; we use c from the temperature and the exact mid-band frequency, so allow 1 %).
const flat = (a: number) => Object.fromEntries([125, 250, 500, 1000, 2000, 4000].map((f) => [String(f), a]));
const reverbInput = {
  volume: 240,
  surfaces: [
    { area: 80, alpha: flat(0.05) },
    { area: 80, alpha: flat(0.7) },
    { area: 60, alpha: flat(0.05) },
    { area: 48, alpha: flat(0.1) },
  ],
  air: { temperature: 20, humidity: 50, pressure: 101325 },
  method: "sabine",
};

function cli(command: string, input: unknown): unknown {
  const tsx = path.join(process.cwd(), "node_modules", "tsx", "dist", "cli.mjs");
  const r = spawnSync(process.execPath, [tsx, "lib/cli/calc.ts", command, "-"], { input: JSON.stringify(input), encoding: "utf8" });
  expect(r.status).toBe(0);
  return JSON.parse(r.stdout);
}

describe("calculation routes", () => {
  it("rate returns the ISO 11654 and ASTM C423 ratings of the worked example", async () => {
    const res = await call((await routes.rate()).POST, { method: "POST", cookie: cookies.client, body: rateInput });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ alphaW: 0.4, shape: "LM", class: "D", nrc: 0.65, saa: 0.63 });
    expect(res.json.alphaP).toEqual({ "125": 0.45, "250": 0.85, "500": 0.8, "1000": 0.5, "2000": 0.35, "4000": 0.3 });
  });

  it("reverb returns Sabine times per octave close to the worked room example", async () => {
    const res = await call((await routes.reverb()).POST, { method: "POST", cookie: cookies.installer, body: reverbInput });
    expect(res.status).toBe(200);
    const at500 = res.json.octaves.find((o: { f: number }) => o.f === 500);
    expect(at500.seconds).toBeGreaterThan(0.5653 * 0.99);
    expect(at500.seconds).toBeLessThan(0.5653 * 1.01);
  });

  it("evaluate, rate and reverb answer exactly what the command line prints", async () => {
    for (const [name, input] of [
      ["evaluate", evaluateInput],
      ["rate", rateInput],
      ["reverb", reverbInput],
    ] as const) {
      const res = await call((await routes[name]()).POST, { method: "POST", cookie: cookies.architect, body: input });
      expect(res.status).toBe(200);
      expect(res.json).toEqual(cli(name, input));
    }
  });

  it("every project role may calculate; no session gets 401", async () => {
    for (const name of Object.keys(routes) as (keyof typeof routes)[]) {
      const body = { evaluate: evaluateInput, rate: rateInput, reverb: reverbInput }[name];
      for (const role of PROJECT_ROLES) {
        expect((await call((await routes[name]()).POST, { method: "POST", cookie: cookies[role], body })).status).toBe(200);
      }
      const anon = await call((await routes[name]()).POST, { method: "POST", body });
      expect(anon.status).toBe(401);
    }
  });

  it.each([
    ["a negative plate thickness", { ...evaluateInput, facing: { ...evaluateInput.facing, thickness: -0.001 } }, "facing.thickness"],
    ["holes larger than their pitch", { ...evaluateInput, facing: { ...evaluateInput.facing, holeDiameter: 0.03 } }, "facing.holeDiameter"],
    [
      "a cavity thinner than its infill",
      { ...evaluateInput, infill: { thickness: 0.08, flowResistivity: 10000, position: "on-backing", model: "miki" } },
      "infill.thickness",
    ],
    // legal numbers that once answered 200 with 56 nulls
    ["a hole of 1e-300 m", { ...evaluateInput, facing: { ...evaluateInput.facing, holeDiameter: 1e-300 } }, "facing.holeDiameter"],
    ["a cavity of 5e-324 m", { ...evaluateInput, cavity: { depth: 5e-324, partitioned: true } }, "cavity.depth"],
  ])("evaluate refuses %s with 400 naming the field", async (_what, body, field) => {
    const res = await call((await routes.evaluate()).POST, { method: "POST", cookie: cookies.consultant, body });
    expect(res.status).toBe(400);
    expect(res.json.error.issues.map((i: { field: string }) => i.field)).toContain(field);
    expect(JSON.stringify(res.json)).not.toMatch(/null/);
  });

  it("reverb refuses one surface more than its cap of 2000 with 400 naming the list", async () => {
    const surface = { area: 1, alpha: flat(0.1) };
    const res = await call((await routes.reverb()).POST, { method: "POST", cookie: cookies.consultant, body: { ...reverbInput, surfaces: Array(2001).fill(surface) } });
    expect(res.status).toBe(400);
    expect(res.json.error.issues).toEqual([{ field: "surfaces", message: expect.stringMatching(/at most 2000/) }]);
  });

  it("reverb refuses 200 000 surfaces (16 MB) by the size of the body, 413, before any is read", async () => {
    const surface = { area: 1, alpha: flat(0.1) };
    const res = await call((await routes.reverb()).POST, { method: "POST", cookie: cookies.consultant, body: { ...reverbInput, surfaces: Array(200_000).fill(surface) } });
    expect(res.status).toBe(413);
    expect(res.json.error.message).toMatch(/larger than this action accepts/);
  });

  it("rate refuses an absorption value that is not a number, naming the band", async () => {
    const res = await call((await routes.rate()).POST, {
      method: "POST",
      cookie: cookies.consultant,
      body: { thirdOctaves: { ...rateInput.thirdOctaves, "500": "lots" } },
    });
    expect(res.status).toBe(400);
    expect(res.json.error.issues[0].field).toBe("thirdOctaves.500");
  });

  it("answers 400 to a body that is not JSON", async () => {
    const res = await call((await routes.reverb()).POST, { method: "POST", cookie: cookies.consultant, rawBody: "volume=240" });
    expect(res.status).toBe(400);
    expect(res.json.error.message).toMatch(/not valid JSON/);
  });
});
