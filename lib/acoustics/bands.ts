/**
 * Frequency bands (IEC 61260 base-ten bands; the averaging is Cavitas's own choice):
 * one-third octaves 50 Hz–5 kHz with exact centres fm = 1000·10^(k/10) and edges fm·10^(±1/20);
 * a band value is the mean over n frequencies at the log-midpoints of n equal log steps between
 * the edges (n = 7 by default); an octave value is the mean of its three one-third octaves.
 */

export const THIRD_OCTAVE_LABELS = [
  50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500,
  3150, 4000, 5000,
] as const;

export const OCTAVE_LABELS = [63, 125, 250, 500, 1000, 2000, 4000] as const;

/** The eighteen ISO 354 bands, 100–5000 Hz, that the ratings read. */
export const ISO_354_LABELS = THIRD_OCTAVE_LABELS.slice(3);

export const SAMPLES_PER_BAND = 7;

export interface Band {
  /** nominal centre, Hz */
  label: number;
  /** exact centre, Hz */
  centre: number;
  lower: number;
  upper: number;
}

/** k = −13 (50 Hz) … 7 (5 kHz) */
export const THIRD_OCTAVES: readonly Band[] = THIRD_OCTAVE_LABELS.map((label, i) => {
  const centre = 1000 * 10 ** ((i - 13) / 10);
  return { label, centre, lower: centre * 10 ** -0.05, upper: centre * 10 ** 0.05 };
});

/** Exact octave mid-band frequencies 1000·10^(3k/10), k = −4 … 2. */
export const OCTAVES: readonly Band[] = OCTAVE_LABELS.map((label, i) => {
  const centre = 1000 * 10 ** ((3 * (i - 4)) / 10);
  return { label, centre, lower: centre * 10 ** -0.15, upper: centre * 10 ** 0.15 };
});

/** Sample frequencies of a band: log-midpoints of n equal log steps between its edges. */
export function bandSamples(band: Band, n = SAMPLES_PER_BAND): number[] {
  const ratio = band.upper / band.lower;
  return Array.from({ length: n }, (_, i) => band.lower * ratio ** ((i + 0.5) / n));
}

const sampleCache = new Map<number, Float64Array>();

/** All sample frequencies of the one-third octaves, band after band. */
export function thirdOctaveSamples(n = SAMPLES_PER_BAND): Float64Array {
  const hit = sampleCache.get(n);
  if (hit) return hit;
  const out = Float64Array.from(THIRD_OCTAVES.flatMap((band) => bandSamples(band, n)));
  sampleCache.set(n, out);
  return out;
}

const logCache = new Map<number, Float64Array>();

/** ln f of thirdOctaveSamples(n), for searches on a log axis. */
export function thirdOctaveLogSamples(n = SAMPLES_PER_BAND): Float64Array {
  const hit = logCache.get(n);
  if (hit) return hit;
  const out = Float64Array.from(thirdOctaveSamples(n), Math.log);
  logCache.set(n, out);
  return out;
}

/** Means of consecutive groups of n values. */
export function bandMeans(values: ArrayLike<number>, n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i + n <= values.length; i += n) {
    let sum = 0;
    for (let j = 0; j < n; j++) sum += values[i + j];
    out.push(sum / n);
  }
  return out;
}

/** Octave values from the 21 one-third-octave values 50–5000 Hz: mean of each three. */
export function octavesFromThirds(thirds: ArrayLike<number>): number[] {
  return bandMeans(thirds, 3);
}
