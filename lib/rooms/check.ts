/**
 * The reverberation check of a room: Sabine and Eyring times
 * per octave 63 Hz–4 kHz before and after treatment, against the target, with the absorption
 * the treated room still lacks. The numbers come from the engine (lib/acoustics reverberation:
 * Sabine and Eyring, air absorption by ISO 9613-1 at the exact mid-band frequencies); this file
 * only assembles the room, compares and words the result.
 */
import { OCTAVE_LABELS } from "@/lib/acoustics/bands";
import { type ReverbMethod, type RoomSurface, absorptionShortfall, reverberation } from "@/lib/acoustics/reverberation";
import { type CheckInput, treatedAreas, validateCheckInput } from "./check-input";
import { checkSentences } from "./check-sentences";
import { type Issue, hasErrors } from "./issues";
import type { TargetBand } from "./targets";

export type BandStatus = "within" | "over" | "under" | "no target";

export interface RoomState {
  /** s */
  sabine: number;
  eyring: number;
  /** by the check's method */
  status: BandStatus;
  /** s outside the band by the check's method: > 0 over the upper limit, < 0 under the lower, else 0 */
  excess: number;
  /** m² sabins (Σ S·α) lacking to reach the band's upper limit; null where it has none */
  shortfall: number | null;
}

export interface CheckOctave {
  f: number;
  target: TargetBand;
  /** null: no data (some finish has no coefficient at this octave) */
  before: RoomState | null;
  after: RoomState | null;
  /** after treatment; "no data" where it cannot be computed */
  status: BandStatus | "no data";
}

export interface CheckMean {
  octaves: readonly number[];
  nominal: number;
  low: number | null;
  high: number | null;
  before: number | null;
  after: number | null;
  status: BandStatus | "no data";
}

export type CheckResult =
  | { ok: true; method: ReverbMethod; treated: boolean; octaves: CheckOctave[]; mean: CheckMean | null; sentences: string[]; issues: Issue[] }
  | { ok: false; issues: Issue[] };

/** Relative slack, so that a room brought exactly to a limit counts as within it. */
const SLACK = 1e-9;

export function bandStatus(seconds: number, band: Pick<TargetBand, "low" | "high">): { status: BandStatus; excess: number } {
  if (band.low === null && band.high === null) return { status: "no target", excess: 0 };
  if (band.high !== null && seconds > band.high * (1 + SLACK)) return { status: "over", excess: seconds - band.high };
  if (band.low !== null && seconds < band.low * (1 - SLACK)) return { status: "under", excess: seconds - band.low };
  return { status: "within", excess: 0 };
}

/** The room's surfaces as the engine takes them: treated area comes off the finish it covers. */
export function roomSurfaces(input: CheckInput, treated: boolean): RoomSurface[] {
  const openings = input.openings.map(({ area, alpha }) => ({ area, alpha }));
  if (!treated) return [...input.surfaces.map(({ area, alpha }) => ({ area, alpha })), ...openings];
  const covered = treatedAreas(input.treatments);
  return [
    ...input.surfaces.map((s) => ({ area: Math.max(0, s.area - (covered.get(s.key) ?? 0)), alpha: s.alpha })),
    ...openings,
    ...input.treatments.map(({ area, alpha }) => ({ area, alpha })),
  ];
}

/** Upper limits of the target by octave label, the times the shortfall is measured against. */
export function upperLimits(bands: readonly TargetBand[]): Record<string, number> {
  return Object.fromEntries(bands.filter((b) => b.high !== null).map((b) => [String(b.f), b.high as number]));
}

function roomStates(input: CheckInput, treated: boolean, method: ReverbMethod): Map<number, RoomState> {
  const room = { volume: input.volume, surfaces: roomSurfaces(input, treated), air: input.air };
  const sabine = reverberation({ ...room, method: "sabine" });
  const eyring = reverberation({ ...room, method: "eyring" });
  const shortfall = new Map(absorptionShortfall({ ...room, method, target: upperLimits(input.target.perOctave) }).map((b) => [b.f, b.shortfall]));
  const states = new Map<number, RoomState>();
  sabine.forEach((band, i) => {
    const target = input.target.perOctave.find((b) => b.f === band.f);
    const times = { sabine: band.seconds, eyring: eyring[i].seconds };
    const { status, excess } = target ? bandStatus(times[method], target) : { status: "no target" as const, excess: 0 };
    states.set(band.f, { ...times, status, excess, shortfall: shortfall.get(band.f) ?? null });
  });
  return states;
}

function meanOf(octaves: CheckOctave[], which: "before" | "after", method: ReverbMethod, over: readonly number[]): number | null {
  const times = over.map((f) => octaves.find((o) => o.f === f)?.[which]?.[method]);
  return times.every((t): t is number => t !== undefined) ? times.reduce((a, b) => a + b, 0) / times.length : null;
}

/** The single-number comparison a guideline asks for (DIN 18041: the mean of 500 Hz and 1 kHz). */
function checkMean(input: CheckInput, octaves: CheckOctave[], method: ReverbMethod): CheckMean | null {
  const { meanOf: over, nominal } = input.target;
  if (!over || nominal === null) return null;
  const bands = input.target.perOctave.filter((b) => over.includes(b.f));
  const lows = bands.map((b) => b.low).filter((v): v is number => v !== null);
  const highs = bands.map((b) => b.high).filter((v): v is number => v !== null);
  const band = { low: lows.length ? Math.max(...lows) : null, high: highs.length ? Math.min(...highs) : null };
  const after = meanOf(octaves, "after", method, over);
  return { octaves: over, nominal, ...band, before: meanOf(octaves, "before", method, over), after, status: after === null ? "no data" : bandStatus(after, band).status };
}

export function checkRoom(input: CheckInput): CheckResult {
  const issues = validateCheckInput(input);
  if (hasErrors(issues)) return { ok: false, issues };
  const method = input.method ?? "sabine";
  const before = roomStates(input, false, method);
  const after = roomStates(input, true, method);
  const octaves = OCTAVE_LABELS.map((f): CheckOctave => {
    const target = input.target.perOctave.find((b) => b.f === f) ?? { f, seconds: null, low: null, high: null, indicative: false };
    const state = after.get(f) ?? null;
    return { f, target, before: before.get(f) ?? null, after: state, status: state?.status ?? "no data" };
  });
  const treated = input.treatments.length > 0;
  const mean = checkMean(input, octaves, method);
  const warnings = input.target.warnings.map((message) => ({ field: "target", message, severity: "warning" as const }));
  return { ok: true, method, treated, octaves, mean, sentences: checkSentences({ octaves, mean, treated, kind: input.target.kind, method }), issues: [...issues, ...warnings] };
}
