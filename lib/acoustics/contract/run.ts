/**
 * The contract's calculations: each takes a parsed input and returns the output object exactly
 * as the command line prints it and the API sends it. Numbers are rounded for people (α to
 * four decimals, Hz to two, seconds to three, attenuation to six significant digits); the
 * ratings of `evaluate` are computed from the printed one-third-octave values, so `rate` on
 * them gives the same result.
 */
import { airAttenuationDbPerKm } from "../air-absorption";
import { ISO_354_LABELS } from "../bands";
import type { BuildUp, Facing } from "../build-up";
import { evaluateBuildUp } from "../evaluate";
import { resonatorHz } from "../helmholtz";
import { type Ratings, rateThirdOctaves } from "../ratings";
import { reverberation } from "../reverberation";
import type { Warning } from "../warnings";
import type { AirInput, EvaluateInput, RateInput, ResonatorInput, ReverbInput } from "./schemas";

const fixed = (x: number, digits: number) => Number(x.toFixed(digits));
const significant = (x: number, digits: number) => Number(x.toPrecision(digits));
const alpha = (x: number) => fixed(x, 4);
const hz = (x: number) => fixed(x, 2);

export interface EvaluateOutput {
  openArea: number;
  helmholtzHz: number;
  peakHz: number;
  thirdOctaves: { f: number; normal: number; diffuse: number }[];
  octaves: { f: number; diffuse: number }[];
  ratings: Ratings;
  warnings: Warning[];
}

export function toBuildUp(input: EvaluateInput): BuildUp {
  const f = input.facing;
  const facing: Facing =
    f.kind === "slots"
      ? { kind: "slots", thickness: f.thickness, slotWidth: f.slotWidth, slotPitch: f.slotPitch }
      : { kind: f.kind, thickness: f.thickness, holeDiameter: f.holeDiameter, pitch: f.pitch, grid: f.grid };
  return { facing, cavity: input.cavity, infill: input.infill ?? null, air: input.air };
}

export function runEvaluate(input: EvaluateInput): EvaluateOutput {
  const result = evaluateBuildUp(toBuildUp(input));
  const thirdOctaves = result.thirdOctaves.map((b) => ({ f: b.f, normal: alpha(b.normal), diffuse: alpha(b.diffuse) }));
  const iso = Object.fromEntries(
    thirdOctaves.filter((b) => (ISO_354_LABELS as readonly number[]).includes(b.f)).map((b) => [String(b.f), b.diffuse]),
  );
  return {
    openArea: significant(result.openArea, 6),
    helmholtzHz: hz(result.helmholtzHz),
    peakHz: hz(result.peakHz ?? result.quarterWaveHz),
    thirdOctaves,
    octaves: result.octaves.map((b) => ({ f: b.f, diffuse: alpha(b.diffuse) })),
    ratings: rateThirdOctaves(iso),
    warnings: result.warnings,
  };
}

export function runRate(input: RateInput): Ratings {
  return rateThirdOctaves(input.thirdOctaves);
}

export function runResonator(input: ResonatorInput): { helmholtzHz: number } {
  return { helmholtzHz: hz(resonatorHz(input)) };
}

export function runReverb(input: ReverbInput): { octaves: { f: number; seconds: number; airM: number }[] } {
  const octaves = reverberation({
    volume: input.volume,
    surfaces: input.surfaces.map((s) => ({ area: s.area, alpha: s.alpha as Record<string, number> })),
    air: input.air,
    method: input.method,
  });
  return { octaves: octaves.map((o) => ({ f: o.f, seconds: fixed(o.seconds, 3), airM: significant(o.airM, 6) })) };
}

export function runAir(input: AirInput): { dbPerKm: number } {
  return { dbPerKm: significant(airAttenuationDbPerKm(input.f, input), 6) };
}
