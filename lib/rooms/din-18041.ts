/**
 * DIN 18041:2016-03 "Hörsamkeit in Räumen", room group A.
 *
 * Formulas, validity ranges and the rule "T_soll stated mathematically rounded to two decimals"
 * as a plasterboard manufacturer's building-physics guide quotes the 2016 edition, cross-checked
 * with an independent implementation and with a published sports-hall table that the A5 formula
 * reproduces; cite the standard itself. The frequency tolerance band (the standard's figures)
 * was not found in the standard's text or a manufacturer's guide: the range below is the one two
 * independent open implementations of the 2016 edition give, the same for every group A use, so
 * it is marked "indicative" everywhere it is shown until someone checks it against the standard.
 * That T_soll is compared with the mean of the 500 Hz and 1 kHz octaves is from memory.
 */

export const DIN_GROUPS = ["A1", "A2", "A3", "A4", "A5"] as const;
export type DinGroup = (typeof DIN_GROUPS)[number];

interface GroupFormula {
  use: string;
  /** T_soll = slope·lg(V/m³) + offset */
  slope: number;
  offset: number;
  /** validity of the formula, min ≤ V < max, m³ */
  min: number;
  max: number;
}

export const DIN_FORMULAS: Record<DinGroup, GroupFormula> = {
  A1: { use: "music", slope: 0.45, offset: 0.07, min: 30, max: 1000 },
  A2: { use: "speech and lectures", slope: 0.37, offset: -0.14, min: 50, max: 5000 },
  A3: { use: "teaching and communication", slope: 0.32, offset: -0.17, min: 30, max: 5000 },
  A4: { use: "inclusive teaching and communication", slope: 0.26, offset: -0.14, min: 30, max: 500 },
  A5: { use: "sport", slope: 0.75, offset: -1.0, min: 200, max: 10_000 },
};

/** A5 above its formula's range: a fixed 2.0 s for V ≥ 10 000 m³. */
const SPORT_LARGE_HALL = { from: 10_000, seconds: 2.0 };

/** Round half up to two decimals; the small nudge keeps 0.865 from landing on 0.86499… */
export function roundToHundredths(x: number): number {
  return Math.round(x * 100 + 1e-9) / 100;
}

export interface DinTsoll {
  /** unrounded formula value, s */
  exact: number;
  /** T_soll as the standard states it, rounded to two decimals, s */
  seconds: number;
  /** set when the volume lies outside the formula's validity range */
  warning: string | null;
}

export function dinTsoll(group: DinGroup, volume: number): DinTsoll {
  const formula = DIN_FORMULAS[group];
  if (group === "A5" && volume >= SPORT_LARGE_HALL.from) {
    return { exact: SPORT_LARGE_HALL.seconds, seconds: SPORT_LARGE_HALL.seconds, warning: null };
  }
  const exact = formula.slope * Math.log10(volume) + formula.offset;
  const inRange = volume >= formula.min && volume < formula.max;
  const warning = inRange
    ? null
    : `DIN 18041 states the ${group} formula for ${formula.min} m³ ≤ V < ${formula.max} m³; this room is ${formatVolume(volume)}, so the value is an extrapolation.`;
  return { exact, seconds: roundToHundredths(exact), warning };
}

function formatVolume(volume: number): string {
  return `${Number(volume.toPrecision(4))} m³`;
}

/**
 * Tolerance band of T/T_soll per octave, indicative: 0.8–1.2 from 250 Hz to 2 kHz, 0.65–1.45 at
 * 125 Hz and 0.5–1.7 at 63 Hz, 0.65–1.2 at 4 kHz, as two independent open implementations of
 * DIN 18041:2016 give it for every group A use. No separate 2016 range for music (A1) was found
 * (the 2004 edition had one), so A1 uses the same.
 */
export const DIN_TOLERANCE_RATIOS: Record<string, { low: number; high: number }> = {
  "63": { low: 0.5, high: 1.7 },
  "125": { low: 0.65, high: 1.45 },
  "250": { low: 0.8, high: 1.2 },
  "500": { low: 0.8, high: 1.2 },
  "1000": { low: 0.8, high: 1.2 },
  "2000": { low: 0.8, high: 1.2 },
  "4000": { low: 0.65, high: 1.2 },
};

/** The octaves whose mean DIN 18041 compares with T_soll (from memory). */
export const DIN_MEAN_OCTAVES = [500, 1000] as const;
