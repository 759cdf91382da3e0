/**
 * npm run bench: time per full evaluation (21 one-third octaves × 7 frequencies, field
 * incidence, peak search) of typical build-ups, against a plain mathjs implementation of the
 * same formulas measured in the same run, and a sweep of 10,000 candidate build-ups for the
 * design assistant. A benchmark, not a test: nothing here fails.
 *
 * The engine is timed as it runs: a partitioned cavity by the fixed 16-point rule, an open one
 * by its resonance-resolving rule (lib/acoustics/field-incidence.ts). The mathjs route uses the
 * fixed 16-point rule throughout, so the agreement column compares it with the engine on that
 * same rule; the open-cavity rule's accuracy is checked against an adaptive quadrature in the
 * unit tests.
 */
import { type BuildUp } from "@/lib/acoustics/build-up";
import { CavityCache } from "@/lib/acoustics/cavity-cache";
import { type EvaluateOptions, evaluateBuildUp } from "@/lib/acoustics/evaluate";
import { OpenFieldRunner, buildUpModel } from "@/lib/acoustics/spectrum";
import { thirdOctaveSamples } from "@/lib/acoustics/bands";
import { baselineEvaluate } from "./baseline-mathjs";
import { benchCases } from "./cases";
import { sweepCandidates, sweepDescription } from "./sweep";

function timePerCall(fn: () => void, minMs: number, minCalls: number): number {
  let calls = 0;
  const start = performance.now();
  let elapsed = 0;
  while (elapsed < minMs || calls < minCalls) {
    fn();
    calls++;
    elapsed = performance.now() - start;
  }
  return elapsed / calls;
}

function maxDifference(b: BuildUp): { alpha: number; peakHz: number } {
  const fast = evaluateBuildUp(b, { angles: 16 });
  const slow = baselineEvaluate(b);
  let alpha = 0;
  fast.thirdOctaves.forEach((band, i) => {
    alpha = Math.max(alpha, Math.abs(band.normal - slow.thirds[i].normal), Math.abs(band.diffuse - slow.thirds[i].diffuse));
  });
  return { alpha, peakHz: Math.abs((fast.peakHz ?? 0) - slow.peakHz) };
}

const fmt = (ms: number) => (ms < 1 ? `${(ms * 1000).toFixed(0)} µs` : `${ms.toFixed(1)} ms`);

/** Angles per frequency of the open-cavity rule: its base nodes and those added at narrow resonances. */
function openAngles(b: BuildUp): string {
  if (b.cavity.partitioned) return "field incidence: fixed 16-point rule (partitioned)";
  const model = buildUpModel(b);
  const runner = new OpenFieldRunner(model, 78);
  const freqs = thirdOctaveSamples();
  let base = 0;
  let extra = 0;
  for (const f of freqs) {
    model.setFrequency(f);
    runner.value(f);
    base += runner.rule(f).n;
    extra += runner.extra;
  }
  return `field incidence: ${(base / freqs.length).toFixed(1)} base + ${(extra / freqs.length).toFixed(1)} added angles per frequency (open cavity)`;
}

console.log("Cavitas acoustics benchmark (one core; full evaluation: 147 frequencies, field incidence, peak search)\n");
const ratios: number[] = [];
for (const { name, buildUp } of benchCases) {
  for (let i = 0; i < 200; i++) evaluateBuildUp(buildUp);
  baselineEvaluate(buildUp);
  const fast = timePerCall(() => evaluateBuildUp(buildUp), 500, 200);
  const slow = timePerCall(() => baselineEvaluate(buildUp), 1500, 3);
  const diff = maxDifference(buildUp);
  ratios.push(slow / fast);
  console.log(`${name}
  engine ${fmt(fast)} per evaluation; mathjs baseline ${fmt(slow)}; ratio ${(slow / fast).toFixed(0)}×; max |Δα| ${diff.alpha.toExponential(1)} (same 16-point rule), |ΔpeakHz| ${diff.peakHz.toExponential(1)} Hz
  ${openAngles(buildUp)}\n`);
}
console.log(`smallest ratio ${Math.min(...ratios).toFixed(0)}× (goal ≥ 40×)\n`);

const candidates = sweepCandidates();
function sweep(options: EvaluateOptions): { seconds: number; best: number } {
  for (const c of candidates.slice(0, 300)) evaluateBuildUp(c, options);
  const start = performance.now();
  let best = 0;
  for (const c of candidates) best = Math.max(best, evaluateBuildUp(c, options).octaves[2].diffuse);
  return { seconds: (performance.now() - start) / 1000, best };
}
const plain = sweep({});
const cached = sweep({ cavityCache: new CavityCache() });
console.log(`sweep of ${candidates.length} candidate build-ups (${sweepDescription}), full evaluation each:
  every cavity computed anew: ${plain.seconds.toFixed(2)} s
  with a cavity cache (the facing changes, the cavity repeats): ${cached.seconds.toFixed(2)} s (goal < 2 s)
  best 250 Hz octave diffuse α ${plain.best.toFixed(4)} / ${cached.best.toFixed(4)}`);
