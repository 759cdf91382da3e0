/**
 * The few complex operations the engine needs outside its hot loops, on (re, im) pairs written
 * into a scratch object, so that nothing is allocated per call.
 */

export interface Complex {
  re: number;
  im: number;
}

/** Principal square root: non-negative real part, imaginary part of the sign of z's. */
export function csqrt(re: number, im: number, out: Complex): void {
  const m = Math.hypot(re, im);
  if (m === 0) {
    out.re = 0;
    out.im = 0;
    return;
  }
  if (re >= 0) {
    const r = Math.sqrt(0.5 * (m + re));
    out.re = r;
    out.im = im / (2 * r);
  } else {
    const i = (im < 0 ? -1 : 1) * Math.sqrt(0.5 * (m - re));
    out.re = im / (2 * i);
    out.im = i;
  }
}

/** tan(a + jb) = (sin 2a + j sinh 2b) / (cos 2a + cosh 2b); ±j where |b| is large. */
export function ctan(a: number, b: number, out: Complex): void {
  if (b > 20 || b < -20) {
    out.re = 0;
    out.im = b > 0 ? 1 : -1;
    return;
  }
  const e = Math.exp(2 * b);
  const ie = 1 / e;
  const g = 1 / (Math.cos(2 * a) + 0.5 * (e + ie));
  out.re = g * Math.sin(2 * a);
  out.im = g * 0.5 * (e - ie);
}
