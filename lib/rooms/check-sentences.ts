/** The check's result in plain sentences, with units, for the Check screen and the submittal. */
import type { ReverbMethod } from "@/lib/acoustics/reverberation";
import type { CheckMean, CheckOctave } from "./check";
import { octaveName } from "./octaves";

const seconds = (s: number) => `${s.toFixed(2)} s`;
// Absorption is an area of perfect absorber; "m² sabins" would mix a metric area with the
// imperial unit's name.
const absorption = (a: number) => `${a.toFixed(1)} m² of absorption (metric sabins)`;

/** A run of neighbouring octaves as named in a list: "250 Hz to 2 kHz" from three on, else each. */
function runNames(run: number[]): string[] {
  return run.length >= 3 ? [`${octaveName(run[0])} to ${octaveName(run[run.length - 1])}`] : run.map(octaveName);
}

/** Octaves with the same status, split where a different status comes between them. */
function runs(octaves: CheckOctave[], status: CheckOctave["status"]): number[][] {
  const out: number[][] = [];
  let current: number[] = [];
  for (const o of octaves) {
    if (o.status === status) current.push(o.f);
    else if (current.length) (out.push(current), (current = []));
  }
  if (current.length) out.push(current);
  return out;
}

function listOf(parts: string[]): string {
  return parts.length <= 1 ? parts.join("") : `${parts.slice(0, -1).join(", ")} and ${parts[parts.length - 1]}`;
}

export function checkSentences(result: {
  octaves: CheckOctave[];
  mean: CheckMean | null;
  treated: boolean;
  kind: "band" | "limit";
  method: ReverbMethod;
}): string[] {
  const room = result.treated ? "the treated room" : "the room";
  const allows = result.kind === "limit" ? "the limit allows" : "the target band allows";
  const sentences: string[] = [];
  for (const o of result.octaves) {
    const state = o.after;
    if (!state) continue;
    if (state.status === "over") {
      const lack = state.shortfall !== null && state.shortfall > 0 ? `; it lacks ${absorption(state.shortfall)}` : "";
      sentences.push(`At ${octaveName(o.f)} ${room} rings ${seconds(state.excess)} longer than ${allows}${lack}.`);
    } else if (state.status === "under") {
      sentences.push(`At ${octaveName(o.f)} ${room} rings ${seconds(-state.excess)} shorter than ${allows}: it has more absorption there than the target wants.`);
    }
  }
  const within = runs(result.octaves, "within");
  const inside = result.kind === "limit" ? "within the limit" : "within the target band";
  for (const run of within) sentences.push(`${listOf(runNames(run))} ${run.length === 1 ? "is" : "are"} ${inside}.`);
  const silent = runs(result.octaves, "no target");
  if (silent.length) sentences.push(`The target says nothing at ${listOf(silent.flatMap(runNames))}.`);
  const missing = runs(result.octaves, "no data");
  if (missing.length) sentences.push(`No result at ${listOf(missing.flatMap(runNames))}: not every finish has a coefficient there.`);
  const mean = result.mean;
  if (mean && mean.after !== null) {
    const verdict = mean.status === "within" ? "within" : mean.status === "over" ? "above" : "below";
    const band = mean.low !== null && mean.high !== null ? `: ${verdict} the band ${mean.low.toFixed(2)}–${seconds(mean.high)}` : "";
    sentences.push(`The mean of ${listOf(mean.octaves.map(octaveName))} is ${seconds(mean.after)} against a target of ${seconds(mean.nominal)}${band}.`);
  }
  sentences.push(`Times by ${result.method === "sabine" ? "Sabine's" : "Eyring's"} formula; the other is shown beside them.`);
  return sentences;
}
