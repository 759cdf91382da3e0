// A logarithmic frequency axis labelled at octave centres (product specification, section 10).
export const OCTAVE_TICKS = [63, 125, 250, 500, 1000, 2000, 4000];

export function logScale(fMin: number, fMax: number, x0: number, x1: number) {
  const a = Math.log10(fMin);
  const b = Math.log10(fMax);
  return (f: number) => x0 + ((Math.log10(f) - a) / (b - a)) * (x1 - x0);
}

export const hzLabel = (f: number) => (f >= 1000 ? `${f / 1000}k` : String(f));
