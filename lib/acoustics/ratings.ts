/**
 * Single-number ratings from one-third-octave absorption coefficients, computed in integer
 * hundredths so that no rounding rule depends on floating point.
 *
 * ISO 11654:1997: practical coefficient α_p per octave 125–4000 Hz = mean of its three
 * one-third octaves to two decimals, then to the nearest 0.05, capped at 1.00 (clause 4); the
 * 125 Hz value is reported but takes no part in the rating. The reference curve (0.80, 1.00,
 * 1.00, 1.00, 0.90 at 250–4000 Hz) is shifted in 0.05 steps until the unfavourable deviations
 * sum to ≤ 0.10; α_w = shifted curve at 500 Hz; shape indicators L/M/H where α_p exceeds the
 * curve by ≥ 0.25; classes A–E (Annex B).
 * ASTM C423: NRC = mean of 250, 500, 1000, 2000 Hz to the nearest 0.05 (ties round half up, a
 * Cavitas choice: C423 does not settle it); SAA = mean of the twelve bands 200–2500 Hz to the
 * nearest 0.01 (ties up). ASTM values are not capped.
 */
import { ISO_354_LABELS } from "./bands";

export type ThirdOctaveValues = Record<string, number>;

/** Octaves with a practical coefficient α_p (ISO 11654 clause 4). */
export const ALPHA_P_LABELS = [125, 250, 500, 1000, 2000, 4000] as const;
/** Octaves of the reference curve, which set α_w and the shape indicators (125 Hz does not). */
export const WEIGHTED_LABELS = [250, 500, 1000, 2000, 4000] as const;
const REFERENCE_CURVE = [80, 100, 100, 100, 90];
const NRC_LABELS = [250, 500, 1000, 2000];
const SAA_LABELS = [200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500];
const SHAPE = ["L", "M", "M", "H", "H"];

export type AbsorptionClass = "A" | "B" | "C" | "D" | "E" | "not classified";

export interface Ratings {
  alphaP: Record<string, number>;
  alphaW: number;
  /** shape indicators, e.g. "LM"; empty when none */
  shape: string;
  class: AbsorptionClass;
  nrc: number;
  saa: number;
}

/** Values in micro-units as exact integers. */
const micro = (x: number) => Math.round(x * 1e6);

/** round(sum/(count·unit)) half up, with sum in micro-units and unit in micro-units. */
function roundMean(sumMicro: number, count: number, unitMicro: number): number {
  return Math.floor((2 * sumMicro + count * unitMicro) / (2 * count * unitMicro));
}

function sumMicro(values: ThirdOctaveValues, labels: readonly number[]): number {
  return labels.reduce((sum, label) => sum + micro(values[String(label)]), 0);
}

/** α_p in hundredths of the octave centred on label (ISO 11654 clause 4). */
export function practicalHundredths(values: ThirdOctaveValues, label: number): number {
  const i = ISO_354_LABELS.indexOf(label as (typeof ISO_354_LABELS)[number]);
  const three = ISO_354_LABELS.slice(i - 1, i + 2);
  const mean = roundMean(sumMicro(values, three), 3, 1e4);
  return Math.min(100, 5 * Math.round(mean / 5));
}

export function absorptionClass(alphaWHundredths: number): AbsorptionClass {
  if (alphaWHundredths >= 90) return "A";
  if (alphaWHundredths >= 80) return "B";
  if (alphaWHundredths >= 60) return "C";
  if (alphaWHundredths >= 30) return "D";
  if (alphaWHundredths >= 15) return "E";
  return "not classified";
}

/** Rate the eighteen ISO 354 one-third octaves 100–5000 Hz (keys are nominal labels). */
export function rateThirdOctaves(values: ThirdOctaveValues): Ratings {
  const alphaP = ALPHA_P_LABELS.map((label) => practicalHundredths(values, label));
  const practical = WEIGHTED_LABELS.map((label) => alphaP[ALPHA_P_LABELS.indexOf(label)]);
  let shift = 0;
  const unfavourable = (s: number) =>
    practical.reduce((sum, p, i) => sum + Math.max(0, REFERENCE_CURVE[i] + s - p), 0);
  while (unfavourable(shift) > 10) shift -= 5;
  const alphaW = REFERENCE_CURVE[1] + shift;
  const shape = [...new Set(practical.flatMap((p, i) => (p - (REFERENCE_CURVE[i] + shift) >= 25 ? [SHAPE[i]] : [])))].join("");
  return {
    alphaP: Object.fromEntries(ALPHA_P_LABELS.map((label, i) => [String(label), alphaP[i] / 100])),
    alphaW: alphaW / 100,
    shape,
    class: absorptionClass(alphaW),
    nrc: (5 * roundMean(sumMicro(values, NRC_LABELS), 4, 5e4)) / 100,
    saa: roundMean(sumMicro(values, SAA_LABELS), 12, 1e4) / 100,
  };
}
