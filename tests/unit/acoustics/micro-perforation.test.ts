import { describe, expect, it } from "vitest";
import { airProperties } from "@/lib/acoustics/air";
import { facingImpedance } from "@/lib/acoustics/facing-impedance";
import { findPeak } from "@/lib/acoustics/peak";
import { buildUpModel } from "@/lib/acoustics/spectrum";
import { NOMINAL, holes, overAir } from "./helpers";

// Maa's micro-perforated panel (Maa, JASA 104(5) 1998, mass term 1/sqrt(9 + x²/2); Noise Control
// Eng. J. 29(3) 1987). Every value below was computed from Maa's formulas in numpy, not by this
// engine; the printed form of the formulas is from memory. Tolerances: the printed rounding.
const air = airProperties();

interface MaaSet {
  name: string;
  d: number;
  eps: number;
  D: number;
  x500: number;
  z500: number[];
  r0: number;
  peak: number[];
  zeroReactance: number;
  half: number[];
  /** α_n at the nominal one-third-octave centres 100–5000 Hz */
  table: number[];
}
const set = (...v: [string, number, number, number, number, number[], number, number[], number, number[], number[]]): MaaSet => {
  const [name, d, eps, D, x500, z500, r0, peak, zeroReactance, half, table] = v;
  return { name, d, eps, D, x500, z500, r0, peak, zeroReactance, half, table };
};

// name, d, ε, D, x(500 Hz), z(500 Hz), r(f→0), peak [Hz, α], zero-reactance f0, α ≥ 0.5 band, table
const SETS = [
  set("M1", 0.2e-3, 0.01, 0.06, 1.4443, [0.7694, 0.3964], 0.702, [881.53, 0.98775], 878.53, [412.2, 1810.7],
    [0.0347, 0.0541, 0.0882, 0.1364, 0.2088, 0.3187, 0.477, 0.6601, 0.8503, 0.9751, 0.9664, 0.8383, 0.6195, 0.4026, 0.1623, 0.9099, 0.3475, 0.154]),
  set("M2", 0.4e-3, 0.005, 0.1, 2.8886, [0.8779, 1.5564], 0.702, [381.97, 0.99314], 381.17, [212.1, 712.3],
    [0.1051, 0.168, 0.2824, 0.4459, 0.6719, 0.9093, 0.9881, 0.8469, 0.6147, 0.4059, 0.2641, 0.1604, 0.0473, 0.2074, 0.0865, 0.0426, 0.0456, 0.0192]),
  set("M3", 0.5e-3, 0.01, 0.05, 3.6108, [0.378, 0.9628], 0.2808, [708.13, 0.82111], 701.21, [501.0, 1028.8],
    [0.0107, 0.0173, 0.0298, 0.0493, 0.0835, 0.1486, 0.2784, 0.4976, 0.7691, 0.7675, 0.5303, 0.3279, 0.1927, 0.1206, 0.0729, 0.0275, 0.0854, 0.0379]),
];

/** Bisection for a sign change of g on [lo, hi]. */
function root(g: (f: number) => number, lo: number, hi: number): number {
  const s = Math.sign(g(lo));
  for (let i = 0; i < 100; i++) {
    const mid = 0.5 * (lo + hi);
    if (Math.sign(g(mid)) === s) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe.each(SETS)("Maa micro-perforated panel $name (computed in numpy)", (set) => {
  const facing = holes("micro-perforated", set.d, set.d, set.eps);
  const model = buildUpModel(overAir(facing, set.D));

  it("perforation constant and panel impedance at 500 Hz", () => {
    expect((set.d / 2) * Math.sqrt((2 * Math.PI * 500 * air.rho) / air.eta)).toBeCloseTo(set.x500, 4);
    const z = facingImpedance(facing, 500, air);
    expect(z.re).toBeCloseTo(set.z500[0], 4);
    expect(z.im).toBeCloseTo(set.z500[1], 4);
  });

  it("low-frequency resistance 32ηt/(ερ0cd²)", () => {
    expect(facingImpedance(facing, 1e-6, air).re).toBeCloseTo(set.r0, 4);
  });

  it("first peak of normal-incidence absorption below c/(4D) (peakHz)", () => {
    const peak = findPeak(model, air.c / (4 * set.D));
    expect(Math.abs(peak.f - set.peak[0])).toBeLessThan(0.01);
    expect(peak.alpha).toBeCloseTo(set.peak[1], 5);
  });

  it("zero-reactance frequency: ωm = cot(ωD/c), solved here by bisection on the facing impedance", () => {
    const g = (f: number) => facingImpedance(facing, f, air).im - 1 / Math.tan((2 * Math.PI * f * set.D) / air.c);
    expect(Math.abs(root(g, 10, air.c / (4 * set.D) - 1) - set.zeroReactance)).toBeLessThan(0.01);
  });

  it("α ≥ 0.5 band edges", () => {
    const g = (f: number) => model.normalAbsorption(f) - 0.5;
    expect(Math.abs(root(g, 20, set.peak[0]) - set.half[0])).toBeLessThan(0.06);
    expect(Math.abs(root(g, set.peak[0], 2 * set.half[1]) - set.half[1])).toBeLessThan(0.06);
  });

  it("normal-incidence absorption at the nominal one-third-octave centres 100–5000 Hz", () => {
    NOMINAL.forEach((f, i) => expect(Math.abs(model.normalAbsorption(f) - set.table[i])).toBeLessThan(6e-5));
  });
});
