/**
 * Octave-band records of the rooms domain: values keyed by nominal octave label ("63" … "4000"),
 * the labels and exact mid-band frequencies coming from the engine (IEC 61260 base-ten bands,
 * lib/acoustics/bands.ts). 63 Hz is optional throughout: few finishes have a known value there.
 */
import { z } from "zod";
import { OCTAVE_LABELS } from "@/lib/acoustics/bands";

export const OCTAVE_KEYS = OCTAVE_LABELS.map(String) as readonly string[];
/** The octaves every record must give; 63 Hz may be left out. */
export const REQUIRED_OCTAVE_KEYS = OCTAVE_KEYS.filter((key) => key !== "63");

/** Values by nominal octave label, 125–4000 Hz required, 63 Hz optional. */
export type OctaveRecord = Record<string, number>;

/** A zod object with one bounded number per octave, each message naming what it wants. */
export function octaveRecordSchema(what: string, min: number, max: number, options: { positive?: boolean } = {}) {
  const value = (label: string) => {
    let n = z.number({ error: (issue) => (issue.input === undefined ? `required: ${what} at ${label} Hz` : `must be a number (${what})`) });
    n = options.positive ? n.gt(min, { error: `must be greater than ${min} (${what})` }) : n.min(min, { error: `must be at least ${min} (${what})` });
    return n.max(max, { error: `must be at most ${max} (${what})` });
  };
  return z.strictObject(Object.fromEntries(OCTAVE_KEYS.map((key) => [key, key === "63" ? value(key).optional() : value(key)])));
}

/** "125 Hz", "1 kHz", "4 kHz": how an octave is named in sentences and tables. */
export function octaveName(f: number): string {
  return f >= 1000 ? `${f / 1000} kHz` : `${f} Hz`;
}

/**
 * The octave diffuse α of a build-up as a record, from lib/acoustics evaluateBuildUp's
 * `octaves` ([{ f, diffuse }]), ready to be a treatment of the check.
 */
export function octaveAlphaFromBands(octaves: readonly { f: number; diffuse: number }[]): OctaveRecord {
  return Object.fromEntries(octaves.map((band) => [String(band.f), band.diffuse]));
}
