/**
 * peakHz: the frequency of the maximum of the full model's normal-incidence absorption below the
 * cavity's quarter-wave frequency c/(4D). It is bracketed on a log grid (40 points over three
 * decades, 19 % apart: the two cells around the best point hold the maximum of a single-peaked
 * curve), where the evaluation's own band samples (3.3 % apart) stand in for the grid within
 * their range and points as dense continue above it, and refined by Brent's method at each local
 * maximum (the six highest), the highest refined value kept (parabolic steps safeguarded by golden sections;
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

const lnF = new Float64Array(GRID + 600);
const alphaAt = new Float64Array(GRID + 600);
/** Local maxima of the bracket refined, the highest first: the highest sampled may not be the highest. */
const MAX_CANDIDATES = 6;
const candidates = new Int32Array(MAX_CANDIDATES);

export function findPeak(model: LayeredModel, upper: number, known?: KnownAbsorption): Peak {
  const lower = upper / SPAN;
  const step = Math.log(SPAN) / (GRID - 1);
  const from = known && known.f.length ? known.f[0] : Infinity;
  const to = known && known.f.length ? known.f[known.f.length - 1] : -Infinity;
  // the bracket: the coarse grid below the known range, the known points within it, and above it
  // points as dense as the known ones (a narrow peak up there is not stepped over)
  let count = 0;
  let best = 0;
  let bestAlpha = -1;
  const take = (lf: number, alpha: number) => {
    if (count >= lnF.length) return;
    lnF[count] = lf;
    alphaAt[count] = alpha;
    if (alpha > bestAlpha) {
      bestAlpha = alpha;
      best = count;
    }
    count++;
  };
  const lnLower = Math.log(lower);
  const lnUpper = Math.log(upper);
  for (let i = 0; i < GRID - 1; i++) {
    const lf = lnLower + i * step;
    if (i > 0 && Math.exp(lf) >= from) break;
    take(lf, model.normalAbsorption(Math.exp(lf)));
  }
  if (known) {
    for (let j = 0; j < known.f.length; j++) if (known.f[j] > lower && known.f[j] < upper) take(known.lnF[j], known.alpha[j]);
  }
  if (to < upper) {
    const dense = known && known.lnF.length > 1 ? known.lnF[1] - known.lnF[0] : step;
    for (let lf = Math.max(Math.log(Math.max(to, lower)) + dense, lnF[count - 1] + dense); lf < lnUpper - 0.5 * dense; lf += dense) take(lf, model.normalAbsorption(Math.exp(lf)));
  }
  take(lnUpper, model.normalAbsorption(upper));
  // refine every local maximum (the highest few): a narrow peak's flank can sample lower than a
  // broad one's top, as the air column of a thick facing's holes gives next to the cavity's
  let found = 0;
  for (let i = 0; i < count; i++) {
    const local = (i === 0 || alphaAt[i] >= alphaAt[i - 1]) && (i === count - 1 || alphaAt[i] >= alphaAt[i + 1]);
    if (!local) continue;
    // keep the MAX_CANDIDATES highest, in any order
    if (found < MAX_CANDIDATES) candidates[found++] = i;
    else {
      let low = 0;
      for (let k = 1; k < found; k++) if (alphaAt[candidates[k]] < alphaAt[candidates[low]]) low = k;
      if (alphaAt[i] > alphaAt[candidates[low]]) candidates[low] = i;
    }
  }
  if (found === 0) candidates[found++] = best;
  let result = refine(model, candidates[0], count, lower, upper);
  for (let k = 1; k < found; k++) {
    const peak = refine(model, candidates[k], count, lower, upper);
    if (peak.alpha > result.alpha) result = peak;
  }
  return result;
}

/**
 * Brent's method on the two cells around bracket point i (the cell next to an end point too),
 * started from the bracket's own three points and their known values: its first step is the
 * parabola through them, and no point is evaluated twice.
 */
function refine(model: LayeredModel, i: number, count: number, lower: number, upper: number): Peak {
  const lo = Math.max(i - 1, 0);
  const hi = Math.min(i + 1, count - 1);
  const best = brentMinimum((lf) => -model.normalAbsorption(Math.exp(lf)), lnF[lo], lnF[hi], lnF[i], -alphaAt[i], -alphaAt[lo], -alphaAt[hi]);
  const x = best.x;
  if (lnF[hi] - x < 10 * TOLERANCE && i === count - 1) return { f: upper, alpha: model.normalAbsorption(upper), atLimit: true, atLowerLimit: false };
  if (x - lnF[lo] < 10 * TOLERANCE && i === 0) return { f: lower, alpha: model.normalAbsorption(lower), atLimit: false, atLowerLimit: true };
  return { f: Math.exp(x), alpha: -best.fx, atLimit: false, atLowerLimit: false };
}

/**
 * Brent's minimisation of g on [lo, hi] from a point x0 inside with g(x0) = f0 no greater than
 * the values flo, fhi at the ends (which serve as the first two earlier points).
 */
function brentMinimum(g: (x: number) => number, lo: number, hi: number, x0: number, f0: number, flo: number, fhi: number): { x: number; fx: number } {
  let a = lo;
  let b = hi;
  let x = x0;
  let fx = f0;
  // the earlier points: the better end, then the other
  let w = flo <= fhi ? lo : hi;
  let fw = flo <= fhi ? flo : fhi;
  let v = flo <= fhi ? hi : lo;
  let fv = flo <= fhi ? fhi : flo;
  let d = 0;
  // as if the step before last spanned the bracket: the first step may be the parabola
  let e = b - a;
  for (let iter = 0; iter < 100; iter++) {
    const xm = 0.5 * (a + b);
    if (Math.abs(x - xm) <= 2 * TOLERANCE - 0.5 * (b - a)) break;
    let golden = true;
    if (Math.abs(e) > TOLERANCE && x !== w && x !== v && w !== v) {
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
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  return { x, fx };
}
