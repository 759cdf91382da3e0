import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { LIMITS, MAX_SURFACES, nonFiniteErrors, nonFinitePaths, parseContractInput, runContract } from "@/lib/acoustics/contract";
import { arbitraryEvaluateInput } from "./arbitraries";

// Legal numbers that no panel is made of: each refused at its field with the reason, and no
// result of the contract is ever anything but finite numbers.
const panel = () => ({
  facing: { kind: "round-holes", thickness: 0.006, holeDiameter: 0.005, pitch: 0.025, grid: "square" },
  cavity: { depth: 0.05, partitioned: true },
  infill: null as unknown,
});

function refusal(command: string, json: unknown) {
  const result = runContract(command, json);
  if (result.ok) throw new Error(`expected a refusal, got ${JSON.stringify(result.output).slice(0, 200)}`);
  return result.errors;
}

describe("practical minimums, with the reason in the message", () => {
  const cases: [string, (p: ReturnType<typeof panel>) => unknown, string, RegExp][] = [
    ["a hole of 1e-300 m", (p) => ({ ...p, facing: { ...p.facing, holeDiameter: 1e-300 } }), "facing.holeDiameter", /at least 0.00005 m \(0.05 mm, about the finest laser-drilled/],
    ["a cavity of 5e-324 m", (p) => ({ ...p, cavity: { ...p.cavity, depth: 5e-324 } }), "cavity.depth", /at least 0.001 m \(1 mm: a facing closer to its backing is laminated/],
    ["a slot of 1 µm", () => ({ facing: { kind: "slots", thickness: 0.016, slotWidth: 1e-6, slotPitch: 0.02 }, cavity: { depth: 0.05, partitioned: true } }), "facing.slotWidth", /at least 0.0001 m \(0.1 mm/],
    ["a plate of 1 µm", (p) => ({ ...p, facing: { ...p.facing, thickness: 1e-6 } }), "facing.thickness", /film or membrane/],
    ["a pitch of 1e-200 m", (p) => ({ ...p, facing: { ...p.facing, holeDiameter: 1e-201, pitch: 1e-200 } }), "facing.pitch", /at least 0.0001 m/],
    ["an infill of 1e-9 m", (p) => ({ ...p, infill: { thickness: 1e-9, flowResistivity: 10000, position: "behind-facing", model: "miki" } }), "infill.thickness", /tissue or fleece/],
    ["a flow resistivity of 1e-300", (p) => ({ ...p, infill: { thickness: 0.02, flowResistivity: 1e-300, position: "behind-facing", model: "miki" } }), "infill.flowResistivity", /practically air/],
  ];
  it.each(cases)("evaluate refuses %s, naming %s", (_, make, field, message) => {
    const errors = refusal("evaluate", make(panel()));
    const hit = errors.find((e) => e.field === field);
    expect(hit, JSON.stringify(errors)).toBeDefined();
    expect(hit?.message).toMatch(message);
  });

  it("the resonator and the room have theirs", () => {
    expect(refusal("resonator", { neckArea: 1e-300, neckLength: 0.05, volume: 0.001, ends: "flanged-flanged" })[0]).toMatchObject({ field: "neckArea", message: expect.stringMatching(/a leak/) });
    expect(refusal("resonator", { neckArea: 1e-4, neckLength: 0.05, volume: 1e-300, ends: "none" })[0].field).toBe("volume");
    const surfaces = [{ area: 10, alpha: { 125: 0.1, 250: 0.1, 500: 0.1, 1000: 0.1, 2000: 0.1, 4000: 0.1 } }];
    expect(refusal("reverb", { volume: 1e-300, surfaces, air: { temperature: 20, humidity: 50 }, method: "sabine" })[0]).toMatchObject({ field: "volume", message: expect.stringMatching(/property of rooms/) });
  });

  it("each minimum itself is accepted (the limits are inclusive)", () => {
    const p = panel();
    const atLimits = { ...p, facing: { ...p.facing, thickness: LIMITS.facingThickness.min, holeDiameter: LIMITS.holeDiameter.min, pitch: LIMITS.pitch.min }, cavity: { depth: LIMITS.cavityDepth.min, partitioned: false }, infill: { thickness: LIMITS.infillThickness.min, flowResistivity: LIMITS.flowResistivity.min, position: "on-backing", model: "delany-bazley" } };
    expect(runContract("evaluate", atLimits).ok).toBe(true);
  });
});

describe("no result is ever anything but finite numbers", () => {
  it("evaluate over the whole accepted range, extremes included: every number finite, every α in [0, 1] (fast-check)", () => {
    fc.assert(
      fc.property(arbitraryEvaluateInput(LIMITS), (input) => {
        const result = runContract("evaluate", input);
        expect(result.ok, JSON.stringify(result)).toBe(true);
        if (!result.ok) return;
        expect(nonFinitePaths(result.output)).toEqual([]);
        const out = result.output as { thirdOctaves: { normal: number; diffuse: number }[] };
        for (const band of out.thirdOctaves) for (const v of [band.normal, band.diffuse]) expect(v >= 0 && v <= 1).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it("a result with NaN or ±Infinity anywhere is refused, naming the output fields", () => {
    expect(nonFinitePaths({ a: 1, b: [0.5, Number.NaN], c: { d: Number.POSITIVE_INFINITY, e: "x" } })).toEqual(["b.1", "c.d"]);
    const errors = nonFiniteErrors({ peakHz: Number.NaN, thirdOctaves: [{ f: 50, diffuse: Number.NEGATIVE_INFINITY }] });
    expect(errors).toHaveLength(1);
    expect(errors[0].message).toMatch(/no finite number for peakHz, thirdOctaves\.0\.diffuse/);
    expect(nonFiniteErrors({ ok: [1, 2, 3] })).toEqual([]);
  });
});

describe("list lengths", () => {
  const surface = { area: 1, alpha: { 125: 0.1, 250: 0.1, 500: 0.1, 1000: 0.1, 2000: 0.1, 4000: 0.1 } };
  const room = (n: number) => ({ volume: 240, surfaces: Array(n).fill(surface), air: { temperature: 20, humidity: 50 }, method: "sabine" });
  it(`reverb takes up to ${MAX_SURFACES} surfaces and refuses more, by the length alone`, () => {
    expect(runContract("reverb", room(MAX_SURFACES)).ok).toBe(true);
    const errors = refusal("reverb", room(200_000));
    expect(errors).toEqual([{ field: "surfaces", message: `must list at most ${MAX_SURFACES} surfaces with area and alpha` }]);
    // refused before any item is read: 200 000 bad items give one message, not 200 000
    expect(refusal("reverb", { ...room(0), surfaces: Array(200_000).fill({ wrong: true }) })).toHaveLength(1);
    expect(refusal("reverb", room(0))[0]).toEqual({ field: "surfaces", message: "must list at least one surface" });
  });
  it("an item is still checked field by field within the cap", () => {
    const errors = refusal("reverb", { ...room(2), surfaces: [surface, { ...surface, area: -1 }] });
    expect(errors[0].field).toBe("surfaces.1.area");
    expect(parseContractInput("reverb", room(3)).ok).toBe(true);
  });
});
