/**
 * peakHz (REFERENCES.md section 0): the frequency of the maximum of the full model's
 * normal-incidence absorption below the cavity's quarter-wave frequency c/(4D), found on a log
 * grid (80 points over three decades, 9 % apart) and refined by golden-section search over the
 * two cells around the best grid point, which holds the maximum of a single-peaked curve.
 */
import type { LayeredModel } from "./layered-model";

const GRID = 80;
const SPAN = 1000;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

export interface Peak {
  f: number;
  alpha: number;
  /** true when the maximum is at the upper limit: no peak below c/(4D) */
  atLimit: boolean;
}

export function findPeak(model: LayeredModel, upper: number): Peak {
  const lower = upper / SPAN;
  const step = Math.log(SPAN) / (GRID - 1);
  let best = 0;
  let bestAlpha = -1;
  for (let i = 0; i < GRID; i++) {
    const alpha = model.normalAbsorption(lower * Math.exp(i * step));
    if (alpha > bestAlpha) {
      bestAlpha = alpha;
      best = i;
    }
  }
  if (best === GRID - 1) return { f: upper, alpha: bestAlpha, atLimit: true };
  // golden section on log f over the neighbouring grid cells
  let a = Math.log(lower) + Math.max(best - 1, 0) * step;
  let b = Math.log(lower) + (best + 1) * step;
  let x1 = b - GOLDEN * (b - a);
  let x2 = a + GOLDEN * (b - a);
  let f1 = model.normalAbsorption(Math.exp(x1));
  let f2 = model.normalAbsorption(Math.exp(x2));
  while (b - a > 1e-6) {
    if (f1 < f2) {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + GOLDEN * (b - a);
      f2 = model.normalAbsorption(Math.exp(x2));
    } else {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - GOLDEN * (b - a);
      f1 = model.normalAbsorption(Math.exp(x1));
    }
  }
  const f = Math.exp(0.5 * (a + b));
  return { f, alpha: model.normalAbsorption(f), atLimit: false };
}
