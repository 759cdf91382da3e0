import { describe, expect, it } from "vitest";
import { FLANGED_END, fokPsi, roundHoleEndCorrection, slotEndCorrection } from "@/lib/acoustics/end-corrections";
import { roundHoleOpenArea, slotOpenArea } from "@/lib/acoustics/perforation";

describe("open area from the exact geometry (values computed from πd²/(4b²) and πd²/(2√3b²))", () => {
  it.each([
    [5, 25, 0.03142, 0.03628],
    [3, 10, 0.07069, 0.08162],
    [8, 16, 0.19635, 0.22672],
    [0.5, 5, 0.00785, 0.00907],
  ])("d = %f mm, b = %f mm", (d, b, square, staggered) => {
    expect(roundHoleOpenArea(d / 1000, b / 1000, "square")).toBeCloseTo(square, 5);
    expect(roundHoleOpenArea(d / 1000, b / 1000, "staggered")).toBeCloseTo(staggered, 5);
  });

  it("slots w = 3 mm at b = 20 mm give 0.15", () => {
    expect(slotOpenArea(0.003, 0.02)).toBeCloseTo(0.15, 10);
  });

  it("matches the trade handbooks' 0.8(d/b)² and 0.9(d/b)² to their rounding", () => {
    expect(roundHoleOpenArea(1, 4, "square") / (1 / 16)).toBeCloseTo(0.785, 3);
    expect(roundHoleOpenArea(1, 4, "staggered") / (1 / 16)).toBeCloseTo(0.907, 3);
  });
});

describe("end corrections", () => {
  it("Rayleigh's flanged end 8/(3π) = 0.8488 (Rayleigh, Theory of Sound, 1896)", () => {
    expect(FLANGED_END).toBeCloseTo(0.8488, 4);
  });

  // Fok's ψ(√ε) and δ/a = 0.8488ψ (Fok 1941, as used by Melling, JSV 29(1), 1973; the coefficients
  // as found in open duct-acoustics code implementing Melling's model), computed in numpy.
  it.each([
    [0.005, 0.9005, 0.7643],
    [0.01, 0.8594, 0.7295],
    [0.03, 0.7577, 0.6431],
    [0.05, 0.6887, 0.5846],
    [0.1, 0.5653, 0.4798],
    [0.16, 0.4586, 0.3893],
    [0.25, 0.3396, 0.2883],
  ])("Fok at ε = %f: ψ = %f, δ/a = %f", (eps, psi, delta) => {
    expect(fokPsi(Math.sqrt(eps))).toBeCloseTo(psi, 4);
    expect(roundHoleEndCorrection(2, eps)).toBeCloseTo(delta, 4);
  });

  // Smits & Kosten's slot correction per side, δ/w = (1/π)ln(1/sin(πε/2)) (Smits & Kosten 1951,
  // as used by Kristiansen & Vigran, Applied Acoustics 43, 1994), computed in numpy.
  it.each([
    [0.02, 1.1015],
    [0.05, 0.8102],
    [0.1, 0.5905],
    [0.15, 0.4631],
    [0.2, 0.3738],
    [0.3, 0.2514],
  ])("slot at ε = %f: δ/w = %f", (eps, ratio) => {
    expect(slotEndCorrection(1, eps)).toBeCloseTo(ratio, 4);
  });
});
