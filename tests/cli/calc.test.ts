import { spawn } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { RATING_EXAMPLES, ratingsOf, thirdsOf } from "../unit/acoustics/fixtures";

// The calculation contract on the command line (docs/contract.md): one spawned process per
// case, run concurrently. Results on stdout with exit 0; refusals as JSON on stderr, exit 2.
const root = path.resolve(__dirname, "../..");
const dir = mkdtempSync(path.join(tmpdir(), "cavitas-calc-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface Run {
  code: number | null;
  stdout: string;
  stderr: string;
}

function run(args: string[], stdin?: string, command: string[] = [process.execPath, "--import", "tsx", "lib/cli/calc.ts"]): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn(command[0], [...command.slice(1), ...args], { cwd: root, env: { ...process.env, NO_COLOR: "1" } });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d) => (stdout += d));
    child.stderr.on("data", (d) => (stderr += d));
    child.on("error", reject);
    child.on("close", (code) => resolve({ code, stdout, stderr }));
    child.stdin.end(stdin ?? "");
  });
}

let files = 0;
function file(content: unknown): string {
  const name = path.join(dir, `input-${files++}.json`);
  writeFileSync(name, typeof content === "string" ? content : JSON.stringify(content));
  return name;
}

const buildUp = {
  facing: { kind: "round-holes", thickness: 0.006, holeDiameter: 0.005, pitch: 0.025, grid: "square" },
  cavity: { depth: 0.05, partitioned: true },
  infill: null,
};

function refusal(result: Run) {
  expect(result.code).toBe(2);
  expect(result.stdout).toBe("");
  expect(result.stderr).not.toMatch(/\n\s+at /); // no stack trace
  return JSON.parse(result.stderr);
}

// Each spawn costs about half a second of CPU (tsx transpiles on the fly); on a busy machine a
// case can take several seconds, hence the generous timeout.
describe.concurrent("npm run calc", { timeout: 90_000 }, () => {
  it("evaluate FILE: 5 mm holes at 25 mm, 6 mm plate over 50 mm (helmholtzHz 451.6 Hz with Fok's end correction, computed in numpy)", async () => {
    const result = await run(["evaluate", file(buildUp)]);
    expect(result.code).toBe(0);
    const out = JSON.parse(result.stdout);
    expect(out.openArea).toBeCloseTo(0.0314159, 6);
    expect(out.helmholtzHz).toBeCloseTo(451.6, 1);
    expect(out.thirdOctaves).toHaveLength(21);
    expect(out.octaves).toHaveLength(7);
    expect(out.warnings).toEqual([]);
  });

  it("rate - (standard input): a worked example computed from the rules of ISO 11654 and ASTM C423", async () => {
    const R2 = RATING_EXAMPLES[1];
    const result = await run(["rate", "-"], JSON.stringify({ thirdOctaves: thirdsOf(R2.third) }));
    expect(result.code).toBe(0);
    expect(JSON.parse(result.stdout)).toEqual(ratingsOf(R2));
  });

  it("resonator FILE: one flanged end and one free (Levine & Schwinger 1948): 120.45 Hz, computed in numpy", async () => {
    const result = await run(["resonator", file({ neckArea: Math.PI * 1e-4, neckLength: 0.05, volume: 0.001, ends: "flanged-free" })]);
    expect(result.code).toBe(0);
    expect(JSON.parse(result.stdout)).toEqual({ helmholtzHz: 120.45 });
  });

  it("reverb -: Sabine per octave, airM from ISO 9613-1 at the exact mid-band frequency", async () => {
    const alpha = { 63: 0.1, 125: 0.1, 250: 0.1, 500: 0.1, 1000: 0.1, 2000: 0.1, 4000: 0.1 };
    const input = { volume: 240, surfaces: [{ area: 268, alpha }], air: { temperature: 20, humidity: 50, pressure: 101325 }, method: "sabine" };
    const result = await run(["reverb", "-"], JSON.stringify(input));
    expect(result.code).toBe(0);
    const out = JSON.parse(result.stdout);
    expect(out.octaves.map((o: { f: number }) => o.f)).toEqual([63, 125, 250, 500, 1000, 2000, 4000]);
    expect(out.octaves[4].airM).toBeCloseTo(1.074e-3, 6); // ISO 9613-1 at 1 kHz, 20 °C, 50 %, computed in numpy
  });

  it("air FILE via the npm script itself: 4.6647 dB/km at 1 kHz, 20 °C, 50 % (ISO 9613-1, computed in numpy)", async () => {
    const result = await run(["--silent", "run", "calc", "--", "air", file({ f: 1000, temperature: 20, humidity: 50, pressure: 101325 })], undefined, ["npm"]);
    expect(result.code).toBe(0);
    expect(JSON.parse(result.stdout)).toEqual({ dbPerKm: 4.66473 });
  });

  const bad: [string, string, unknown][] = [
    ["a negative size", "cavity.depth", { ...buildUp, cavity: { depth: -0.05, partitioned: true } }],
    ["a hole as large as its pitch", "facing.holeDiameter", { ...buildUp, facing: { ...buildUp.facing, holeDiameter: 0.03 } }],
    ["an open area outside (0, 1)", "facing.slotWidth", { ...buildUp, facing: { kind: "slots", thickness: 0.016, slotWidth: 0.025, slotPitch: 0.02 } }],
    [
      "a cavity thinner than its infill",
      "infill.thickness",
      { ...buildUp, infill: { thickness: 0.08, flowResistivity: 10000, position: "on-backing", model: "miki" } },
    ],
    // legal numbers that once printed 56 nulls with exit 0
    ["a hole of 1e-300 m", "facing.holeDiameter", { ...buildUp, facing: { ...buildUp.facing, holeDiameter: 1e-300 } }],
    ["a cavity of 5e-324 m", "cavity.depth", { ...buildUp, cavity: { depth: 5e-324, partitioned: true } }],
  ];
  it.each(bad)("evaluate refuses %s: exit 2, naming %s", async (_, field, input) => {
    const body = refusal(await run(["evaluate", file(input)]));
    expect(body.error).toBe("invalid input");
    expect(body.issues.map((i: { field: string }) => i.field)).toContain(field);
    expect(body.issues.find((i: { field: string }) => i.field === field).message).toMatch(/must be/);
  });

  it("refuses invalid JSON on standard input: exit 2", async () => {
    const body = refusal(await run(["evaluate", "-"], "{ facing: "));
    expect(body.error).toBe("invalid JSON");
  });

  it("refuses an unknown command: exit 2", async () => {
    const body = refusal(await run(["simulate", file(buildUp)]));
    expect(body.error).toBe("unknown command");
    expect(body.message).toMatch(/evaluate, rate, resonator, reverb, air/);
  });

  it("refuses an unreadable file: exit 2", async () => {
    const body = refusal(await run(["air", path.join(dir, "missing.json")]));
    expect(body.error).toBe("unreadable file");
  });
});
