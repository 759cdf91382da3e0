/**
 * Reverberation-time targets by room use: DIN 18041:2016 group A, ANSI/ASA S12.60-2010 Part 1,
 * a common-practice range, or values entered by hand. Each target names its source and
 * provenance in the data, so screens and documents can print them.
 */
import { OCTAVE_LABELS } from "@/lib/acoustics/bands";
import { DIN_FORMULAS, DIN_MEAN_OCTAVES, DIN_TOLERANCE_RATIOS, dinTsoll } from "./din-18041";
import type { TargetSpec } from "./target-spec";

export interface TargetBand {
  /** nominal octave, Hz */
  f: number;
  /** the target centre; for a limit-type target the upper limit; null: nothing said here */
  seconds: number | null;
  low: number | null;
  high: number | null;
  /** the band's shape at this octave is recalled, not verified */
  indicative: boolean;
}

export interface Target {
  spec: TargetSpec;
  label: string;
  source: string;
  provenance: string;
  note: string;
  kind: "band" | "limit";
  /** the single-number target (DIN's T_soll, ANSI's limit, …), s; null when there is none */
  nominal: number | null;
  /** octaves whose mean the guidance compares with `nominal`, if it says so */
  meanOf: readonly number[] | null;
  warnings: string[];
  perOctave: TargetBand[];
}

/** Where the DIN tolerance band comes from, said wherever it is shown. */
export const DIN_BAND_PROVENANCE = "indicative, not from the standard's text (as two independent open implementations of the 2016 edition give it)";

const silent = (f: number): TargetBand => ({ f, seconds: null, low: null, high: null, indicative: false });

function din(spec: Extract<TargetSpec, { kind: "din-18041" }>, volume: number): Target {
  const formula = DIN_FORMULAS[spec.group];
  const sign = formula.offset < 0 ? "−" : "+";
  const expression = `${formula.slope}·lg(V/m³) ${sign} ${Math.abs(formula.offset).toFixed(2)}`;
  const base = {
    spec,
    label: `DIN 18041 group ${spec.group} (${formula.use})`,
    source: `DIN 18041:2016-03, room group ${spec.group}: T_soll = ${expression}${spec.group === "A5" ? " (2.0 s from 10 000 m³)" : ""}, rounded to two decimals`,
    provenance: `formula: published (DIN 18041:2016-03, as quoted in a manufacturer's building-physics guide and cross-checked); tolerance band: ${DIN_BAND_PROVENANCE}`,
    kind: "band" as const,
    meanOf: DIN_MEAN_OCTAVES,
  };
  const musicNote =
    spec.group === "A1" ? " No separate music range of the 2016 edition was found, so the music group's low-frequency band shape is not verified: the range for the other uses is shown." : "";
  const bandNote = `The tolerance band per octave is indicative: not found in the standard's text; the range is the one two independent open implementations of the 2016 edition give for every group A use.${musicNote} The 2016 targets are, from memory, for the occupied room (about 80 % occupancy).`;
  if (!(volume > 0)) {
    return { ...base, nominal: null, note: bandNote, warnings: ["DIN 18041 targets need the room's volume."], perOctave: OCTAVE_LABELS.map(silent) };
  }
  const tsoll = dinTsoll(spec.group, volume);
  const warnings = tsoll.warning ? [tsoll.warning] : [];
  if (tsoll.seconds <= 0) {
    warnings.push(`The ${spec.group} formula gives no positive reverberation time for a room this small; enter a target by hand.`);
    return { ...base, nominal: null, note: bandNote, warnings, perOctave: OCTAVE_LABELS.map(silent) };
  }
  const t = tsoll.seconds;
  return {
    ...base,
    nominal: t,
    note: `T_soll = ${t.toFixed(2)} s for V = ${Number(volume.toPrecision(4))} m³, compared with the mean of the 500 Hz and 1 kHz octaves (from memory). ${bandNote}`,
    warnings,
    perOctave: OCTAVE_LABELS.map((f) => {
      const ratio = DIN_TOLERANCE_RATIOS[String(f)];
      return { f, seconds: t, low: ratio.low * t, high: ratio.high * t, indicative: true };
    }),
  };
}

/** ANSI/ASA S12.60-2010/Part 1 core learning spaces. */
export const ANSI_S12_60_LIMITS = [
  { upTo: 283, seconds: 0.6 },
  { upTo: 566, seconds: 0.7 },
] as const;
const ANSI_OCTAVES: readonly number[] = [500, 1000, 2000];

function ansi(spec: Extract<TargetSpec, { kind: "ansi-s12-60" }>, volume: number): Target {
  const limit = volume > 0 ? ANSI_S12_60_LIMITS.find((step) => volume <= step.upTo) : undefined;
  const conditions = "Applies at 500 Hz, 1 kHz and 2 kHz in the unoccupied, furnished room.";
  const note = !(volume > 0)
    ? `${conditions} The limit depends on the room's volume, which is missing.`
    : limit
      ? `RT60 at most ${limit.seconds.toFixed(1)} s for a core learning space of ${Number(volume.toPrecision(4))} m³. ${conditions}`
      : `The standard sets no limit for core learning spaces above 566 m³ (20 000 ft³); its annex gives guidance only. Enter a target by hand. ${conditions}`;
  return {
    spec,
    label: "ANSI/ASA S12.60 Part 1 (classrooms)",
    source:
      "ANSI/ASA S12.60-2010/Part 1, core learning spaces: RT60 ≤ 0.6 s up to 283 m³ (10 000 ft³), ≤ 0.7 s for 283–566 m³ (20 000 ft³)",
    provenance: "published (the limits as four independent summaries of the standard agree on them; the standard's table itself was not read)",
    note,
    kind: "limit",
    nominal: limit?.seconds ?? null,
    meanOf: null,
    warnings: [],
    perOctave: OCTAVE_LABELS.map((f) =>
      limit && ANSI_OCTAVES.includes(f) ? { f, seconds: limit.seconds, low: null, high: limit.seconds, indicative: false } : silent(f),
    ),
  };
}

const COMMON_PRACTICE_WORDS = { office: "offices", "open-plan": "open-plan spaces", restaurant: "restaurants" } as const;
/** 0.4–0.8 s, a rule of thumb of the trade with no single source, read at mid frequencies. */
export const COMMON_PRACTICE_RANGE = { low: 0.4, high: 0.8, octaves: [500, 1000, 2000] as readonly number[] };

function commonPractice(spec: Extract<TargetSpec, { kind: "common-practice" }>): Target {
  const { low, high, octaves } = COMMON_PRACTICE_RANGE;
  const centre = (low + high) / 2;
  return {
    spec,
    label: `Common practice for ${COMMON_PRACTICE_WORDS[spec.use]}`,
    source: "none: a rule of thumb of the trade",
    provenance: "common practice",
    note: `${low}–${high} s, a rule of thumb for offices, open-plan spaces and restaurants with no single published source. Read here at 500 Hz, 1 kHz and 2 kHz; it says nothing about the other octaves.`,
    kind: "band",
    nominal: centre,
    meanOf: null,
    warnings: [],
    perOctave: OCTAVE_LABELS.map((f) => (octaves.includes(f) ? { f, seconds: centre, low, high, indicative: false } : silent(f))),
  };
}

function manual(spec: Extract<TargetSpec, { kind: "manual" }>): Target {
  return {
    spec,
    label: "Entered by hand",
    source: "entered by the consultant",
    provenance: "entered by hand",
    note: "Each value entered is the longest reverberation time allowed at that octave.",
    kind: "limit",
    nominal: null,
    meanOf: null,
    warnings: [],
    perOctave: OCTAVE_LABELS.map((f) => {
      const seconds: number | undefined = spec.seconds[String(f)];
      return seconds === undefined ? silent(f) : { f, seconds, low: null, high: seconds, indicative: false };
    }),
  };
}

/** The target of a room of `volume` m³, per octave 63 Hz–4 kHz. */
export function targetFor(spec: TargetSpec, volume: number): Target {
  switch (spec.kind) {
    case "din-18041":
      return din(spec, volume);
    case "ansi-s12-60":
      return ansi(spec, volume);
    case "common-practice":
      return commonPractice(spec);
    case "manual":
      return manual(spec);
  }
}
