import { describe, expect, it } from "vitest";
import {
  evaluateInputSchema,
  parseContractInput,
  runAir,
  runEvaluate,
  runRate,
  runResonator,
  runReverb,
} from "@/lib/acoustics/contract";
import { RATING_EXAMPLES, ratingsOf, thirdsOf } from "./fixtures";

// The calculation contract (docs/contract.md): one schema per input, errors name the field as a dotted path.
const evaluateInput = () => ({
  facing: { kind: "round-holes", thickness: 0.006, holeDiameter: 0.005, pitch: 0.025, grid: "square" },
  cavity: { depth: 0.05, partitioned: false },
  infill: { thickness: 0.025, flowResistivity: 10000, position: "behind-facing", model: "miki" },
});

function errorsOf(command: string, json: unknown) {
  const result = parseContractInput(command, json);
  if (result.ok) throw new Error("expected the input to be refused");
  return result.errors;
}

function valueOf<C extends "evaluate" | "rate" | "resonator" | "reverb" | "air">(command: C, json: unknown) {
  const result = parseContractInput(command, json);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.value;
}

describe("evaluate", () => {
  it("returns exactly the output keys of the contract (docs/contract.md), as plain JSON numbers", () => {
    const out = runEvaluate(valueOf("evaluate", evaluateInput()));
    expect(Object.keys(out)).toEqual(["openArea", "helmholtzHz", "peakHz", "thirdOctaves", "octaves", "ratings", "warnings"]);
    expect(out.thirdOctaves).toHaveLength(21);
    expect(Object.keys(out.thirdOctaves[0])).toEqual(["f", "normal", "diffuse"]);
    expect(out.thirdOctaves.map((b) => b.f)).toEqual([50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000]);
    expect(out.octaves.map((b) => Object.keys(b))).toEqual(Array(7).fill(["f", "diffuse"]));
    expect(Object.keys(out.ratings)).toEqual(["alphaP", "alphaW", "shape", "class", "nrc", "saa"]);
    expect(Object.keys(out.ratings.alphaP)).toEqual(["125", "250", "500", "1000", "2000", "4000"]);
    expect(JSON.parse(JSON.stringify(out))).toEqual(out);
    expect(out.openArea).toBeCloseTo(0.0314159, 7);
    expect(out.helmholtzHz).toBeCloseTo(451.6, 1); // (c/2π)·sqrt(ε/(D·t')) with Fok's 2δ, computed in numpy
  });

  it("its ratings are those of `rate` on its own printed diffuse one-third octaves 100–5000 Hz", () => {
    const out = runEvaluate(valueOf("evaluate", evaluateInput()));
    const thirdOctaves = Object.fromEntries(out.thirdOctaves.filter((b) => b.f >= 100).map((b) => [String(b.f), b.diffuse]));
    expect(runRate(valueOf("rate", { thirdOctaves }))).toEqual(out.ratings);
  });

  it("air is optional (20 °C, 101 325 Pa) and infill may be left out (none)", () => {
    const { infill: _, ...bare } = evaluateInput();
    const parsed = valueOf("evaluate", bare);
    expect(parsed.infill).toBeNull();
    const same = valueOf("evaluate", { ...bare, infill: null, air: { temperature: 20, pressure: 101325 } });
    expect(runEvaluate(parsed)).toEqual(runEvaluate(same));
  });

  it("accepts the other facing kind's fields and ignores them", () => {
    const input = evaluateInput();
    const withSlots = { ...input, facing: { ...input.facing, slotWidth: null, slotPitch: 0.02 } };
    expect(runEvaluate(valueOf("evaluate", withSlots))).toEqual(runEvaluate(valueOf("evaluate", input)));
  });

  const refusals: [string, (i: ReturnType<typeof evaluateInput>) => unknown, string, RegExp][] = [
    ["negative size", (i) => ({ ...i, facing: { ...i.facing, thickness: -0.001 } }), "facing.thickness", /at least 0.00005 m \(0.05 mm: a thinner sheet is a film/],
    ["hole as large as the pitch", (i) => ({ ...i, facing: { ...i.facing, holeDiameter: 0.025 } }), "facing.holeDiameter", /smaller than the pitch/],
    [
      "open area outside (0, 1)",
      (i) => ({ ...i, facing: { kind: "slots", thickness: 0.016, slotWidth: 0.03, slotPitch: 0.02 } }),
      "facing.slotWidth",
      /open area .* between 0 and 1/,
    ],
    ["cavity thinner than its infill", (i) => ({ ...i, cavity: { ...i.cavity, depth: 0.02 } }), "infill.thickness", /cavity/],
    ["unknown facing kind", (i) => ({ ...i, facing: { ...i.facing, kind: "holes" } }), "facing.kind", /must be one of/],
    ["missing field", (i) => ({ ...i, cavity: { depth: 0.05 } }), "cavity.partitioned", /required/],
    ["misspelt field", (i) => ({ ...i, facing: { ...i.facing, holeDiamter: 0.005 } }), "facing.holeDiamter", /unknown field/],
    ["string for a number", (i) => ({ ...i, cavity: { ...i.cavity, depth: "50 mm" } }), "cavity.depth", /number in m/],
    ["millimetres typed as metres", (i) => ({ ...i, cavity: { ...i.cavity, depth: 50 } }), "cavity.depth", /at most 2 m/],
    ["unknown grid", (i) => ({ ...i, facing: { ...i.facing, grid: "hex" } }), "facing.grid", /"square", "staggered"/],
    ["air outside ISO 9613-1's range", (i) => ({ ...i, air: { temperature: 80 } }), "air.temperature", /at most 50/],
    ["not an object", () => 42, "", /expected object/],
  ];
  it.each(refusals)("refuses %s, naming %s", (_, make, field, message) => {
    const errors = errorsOf("evaluate", make(evaluateInput()));
    const hit = errors.find((e) => e.field === field);
    expect(hit, JSON.stringify(errors)).toBeDefined();
    expect(hit?.message).toMatch(message);
  });

  it("the same schema is exported for the HTTP routes", () => {
    expect(evaluateInputSchema.safeParse(evaluateInput()).success).toBe(true);
  });
});

describe("warnings where a model leaves its validity", () => {
  const warn = (input: unknown) => runEvaluate(valueOf("evaluate", input)).warnings.map((w) => w.code);
  const holes = (d: number, b: number, t: number, kind = "round-holes") => ({ kind, thickness: t, holeDiameter: d, pitch: b, grid: "square" });
  it("lumped estimate above about 20 % open area, and Fok's correction extrapolated above 25 %", () => {
    expect(warn({ facing: holes(0.008, 0.014, 0.01), cavity: { depth: 0.05, partitioned: true } })).toEqual(
      expect.arrayContaining(["lumped-open-area", "end-correction-range"]),
    );
  });
  it("lumped estimate overestimating for large ε and D (8 mm holes at 16 mm over 100 mm: 17 % above the cot root, computed in numpy)", () => {
    expect(warn({ facing: holes(0.008, 0.016, 0.0125), cavity: { depth: 0.1, partitioned: true } })).toContain("lumped-overestimate");
    expect(warn({ facing: holes(0.005, 0.025, 0.006), cavity: { depth: 0.05, partitioned: true } })).toEqual([]);
  });
  it("holes too large for Maa's theory", () => {
    expect(warn({ facing: holes(0.002, 0.02, 0.001, "micro-perforated"), cavity: { depth: 0.05, partitioned: true } })).toContain("maa-hole-size");
  });
  it("a maximum at the lower end of the peak search, c/(4D)/1000, is warned of, as a missing peak is", () => {
    // the finest holes on the widest pitch: all resistance, no resonance
    const out = runEvaluate(valueOf("evaluate", { facing: holes(0.00005, 0.5, 0.001, "micro-perforated"), cavity: { depth: 0.05, partitioned: true } }));
    const w = out.warnings.find((x) => x.code === "peak-below-range");
    expect(w?.message).toMatch(/lower end of the peak search/);
    // c/(4D)/1000 at 20 °C for D = 50 mm: 343.232/0.2/1000 = 1.716 Hz
    expect(out.peakHz).toBeCloseTo(1.72, 2);
    expect(warn({ facing: holes(0.005, 0.025, 0.006), cavity: { depth: 0.05, partitioned: true } })).not.toContain("peak-below-range");
  });
  it("Delany–Bazley outside 0.01 < ρ0f/σ < 1", () => {
    const input = { ...evaluateInput(), infill: { thickness: 0.05, flowResistivity: 30000, position: "on-backing", model: "delany-bazley" } };
    const out = runEvaluate(valueOf("evaluate", input));
    const w = out.warnings.find((x) => x.code === "porous-range");
    expect(w?.message).toMatch(/only from 249\.\d Hz to 5623 Hz/);
  });
});

describe("rate, resonator, reverb, air", () => {
  const R2 = RATING_EXAMPLES[1];
  const rateInput = { thirdOctaves: thirdsOf(R2.third) };

  it("rate: a worked example of ISO 11654 and ASTM C423, computed from their rules", () => {
    expect(runRate(valueOf("rate", rateInput))).toEqual(ratingsOf(R2));
  });
  it("rate refuses a missing band and a negative coefficient", () => {
    const { 125: _, ...missing } = rateInput.thirdOctaves;
    expect(errorsOf("rate", { thirdOctaves: missing })[0].field).toBe("thirdOctaves.125");
    expect(errorsOf("rate", { thirdOctaves: { ...rateInput.thirdOctaves, 500: -0.1 } })[0].field).toBe("thirdOctaves.500");
  });

  it("resonator: 10 mm neck radius, 50 mm long, 1 L, both ends flanged (Rayleigh): 118.31 Hz, computed in numpy", () => {
    const out = runResonator(valueOf("resonator", { neckArea: Math.PI * 1e-4, neckLength: 0.05, volume: 0.001, ends: "flanged-flanged" }));
    expect(out).toEqual({ helmholtzHz: 118.31 });
  });
  it("resonator refuses a neck of no length without end corrections", () => {
    expect(errorsOf("resonator", { neckArea: 1e-4, neckLength: 0, volume: 0.001, ends: "none" })[0].field).toBe("neckLength");
  });

  const surfaces = [
    { area: 80, alpha: { 125: 0.05, 250: 0.05, 500: 0.05, 1000: 0.05, 2000: 0.05, 4000: 0.05 } },
    { area: 80, alpha: { 125: 0.7, 250: 0.7, 500: 0.7, 1000: 0.7, 2000: 0.7, 4000: 0.7 } },
  ];
  it("reverb: octaves 125–4000 Hz with seconds and airM", () => {
    const out = runReverb(valueOf("reverb", { volume: 240, surfaces, air: { temperature: 20, humidity: 50, pressure: 101325 }, method: "sabine" }));
    expect(out.octaves.map((o) => o.f)).toEqual([125, 250, 500, 1000, 2000, 4000]);
    expect(Object.keys(out.octaves[0])).toEqual(["f", "seconds", "airM"]);
    expect(out.octaves[4].airM).toBeCloseTo(2.269e-3, 6); // ISO 9613-1 at 1995.3 Hz, 20 °C, 50 %, computed in numpy
  });
  it("reverb refuses a 63 Hz value on some surfaces only, and Eyring with ᾱ ≥ 1", () => {
    const partial = [{ ...surfaces[0], alpha: { ...surfaces[0].alpha, 63: 0.05 } }, surfaces[1]];
    expect(errorsOf("reverb", { volume: 240, surfaces: partial, air: { temperature: 20, humidity: 50 }, method: "sabine" })[0].field).toBe("surfaces.1.alpha.63");
    const dead = surfaces.map((s) => ({ ...s, alpha: Object.fromEntries(Object.keys(s.alpha).map((k) => [k, 1])) }));
    const e = errorsOf("reverb", { volume: 240, surfaces: dead, air: { temperature: 20, humidity: 50 }, method: "eyring" });
    expect(e[0].field).toBe("surfaces");
    expect(e[0].message).toMatch(/below 1/);
  });

  it("air: ISO 9613-1 at f exactly as given (20 °C, 50 %, 1 kHz: 4.6647 dB/km, computed in numpy)", () => {
    expect(runAir(valueOf("air", { f: 1000, temperature: 20, humidity: 50, pressure: 101325 }))).toEqual({ dbPerKm: 4.66473 });
  });
  it("air refuses humidity above 100 %", () => {
    expect(errorsOf("air", { f: 1000, temperature: 20, humidity: 120, pressure: 101325 })[0].field).toBe("humidity");
  });

  it("an unknown command is refused by the same parser", () => {
    expect(errorsOf("simulate", {})[0].message).toMatch(/unknown command "simulate"/);
  });
});
