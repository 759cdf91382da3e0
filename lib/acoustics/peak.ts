/**
 * peakHz: the frequency of the maximum of the full model's normal-incidence absorption below the
 * cavity's quarter-wave frequency c/(4D). It is bracketed on a log grid (40 points over three
 * decades, 19 % apart: the two cells around the best point hold the maximum of a single-peaked
 * curve), where the evaluation's own band samples (3.3 % apart) stand in for the grid within
 * their range, and refined by Brent's method (parabolic steps safeguarded by golden sections;
 * Brent, Algorithms for Minimization without Derivatives, 1973).
 */
import type { LayeredModel } from "./layered-model";

const GRID = 40;
const SPAN = 1000;
/** absolute tolerance on ln f */
const TOLERANCE = 1e-8;
const CGOLD = (3 - Math.sqrt(5)) / 2;

export interface Peak {
  f: number;
  alpha: number;
  /** true when the maximum is at the upper limit: no peak below c/(4D) */
  atLimit: boolean;
  /** true when the maximum is at the lower end of the search, c/(4D)/1000: the peak, if any, lies below it */
  atLowerLimit: boolean;
}

/** Normal-incidence absorption already computed, at ascending frequencies (and their logarithms). */
export interface KnownAbsorption {
  f: ArrayLike<number>;
  lnF: ArrayLike<number>;
  alpha: ArrayLike<number>;
}

const lnF = new Float64Array(GRID + 400);

export function findPeak(model: LayeredModel, upper: number, known?: KnownAbsorption): Peak {
  const lower = upper / SPAN;
  const step = Math.log(SPAN) / (GRID - 1);
  const from = known && known.f.length ? known.f[0] : Infinity;
  const to = known && known.f.length ? known.f[known.f.length - 1] : -Infinity;
  // the bracket: grid points outside the known range, known points inside (lower, upper)
  let count = 0;
  let best = 0;
  let bestAlpha = -1;
  const take = (lf: number, alpha: number) => {
    lnF[count] = lf;
    if (alpha > bestAlpha) {
      bestAlpha = alpha;
      best = count;
    }
    count++;
  };
  let j = 0;
  for (let i = 0; i < GRID; i++) {
    const f = i === GRID - 1 ? upper : lower * Math.exp(i * step);
    if (i > 0 && i < GRID - 1 && f >= from && f <= to) continue;
    // known points below this grid point come first
    while (known && j < known.f.length && known.f[j] < f) {
      if (known.f[j] > lower && known.f[j] < upper && count + 2 < lnF.length) take(known.lnF[j], known.alpha[j]);
      j++;
    }
    take(Math.log(f), model.normalAbsorption(f));
  }
  // the best point at the limit still leaves the cell next to it to search
  const a = lnF[Math.max(best - 1, 0)];
  const b = lnF[Math.min(best + 1, count - 1)];
  const x = brentMinimum((lf) => -model.normalAbsorption(Math.exp(lf)), a, b);
  if (b - x < 10 * TOLERANCE && best === count - 1) return { f: upper, alpha: model.normalAbsorption(upper), atLimit: true, atLowerLimit: false };
  if (x - a < 10 * TOLERANCE && best === 0) return { f: lower, alpha: model.normalAbsorption(lower), atLimit: false, atLowerLimit: true };
  const f = Math.exp(x);
  return { f, alpha: model.normalAbsorption(f), atLimit: false, atLowerLimit: false };
}

/** Brent's minimisation of g on [a, b]. */
function brentMinimum(g: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  let x = a + CGOLD * (b - a);
  let w = x;
  let v = x;
  let fx = g(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  for (let iter = 0; iter < 100; iter++) {
    const xm = 0.5 * (a + b);
    if (Math.abs(x - xm) <= 2 * TOLERANCE - 0.5 * (b - a)) break;
    let golden = true;
    if (Math.abs(e) > TOLERANCE) {
      // parabola through x, w, v
      const r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      q = Math.abs(q);
      if (Math.abs(p) < Math.abs(0.5 * q * e) && p > q * (a - x) && p < q * (b - x)) {
        e = d;
        d = p / q;
        const u = x + d;
        if (u - a < 2 * TOLERANCE || b - u < 2 * TOLERANCE) d = xm >= x ? TOLERANCE : -TOLERANCE;
        golden = false;
      }
    }
    if (golden) {
      e = x >= xm ? a - x : b - x;
      d = CGOLD * e;
    }
    const u = Math.abs(d) >= TOLERANCE ? x + d : x + (d >= 0 ? TOLERANCE : -TOLERANCE);
    const fu = g(u);
    if (fu <= fx) {
      if (u >= x) a = x;
      else b = x;
      [v, w, x] = [w, x, u];
      [fv, fw, fx] = [fw, fx, fu];
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        [v, w] = [w, u];
        [fv, fw] = [fw, fu];
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  return x;
}
