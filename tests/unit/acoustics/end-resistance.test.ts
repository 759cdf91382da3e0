import { describe, expect, it } from "vitest";
import { airProperties } from "@/lib/acoustics/air";
import { facingImpedance } from "@/lib/acoustics/facing-impedance";
import { LayeredModel } from "@/lib/acoustics/layered-model";
import { findPeak } from "@/lib/acoustics/peak";
import { holes } from "./helpers";

const air = airProperties();
/** R_s = ½·sqrt(2ηωρ0), the surface resistance of a face (Ingard, JASA 25(6), 1953). */
const rs = (f: number) => 0.5 * Math.sqrt(2 * air.eta * 2 * Math.PI * f * air.rho);

describe("end resistance: 4·R_s/ε for ordinary holes and slots, Maa's R_s/ε for micro-perforation", () => {
  // Ingard 1953 and Cox & D'Antonio, Acoustic Absorbers and Diffusers (2009), ch. 7, write the
  // end resistance of a hole as sqrt(8νω)ρ0/ε = 4·R_s/ε; Maa (JASA 104(5), 1998) as
  // (√2/32)·x·d/t times his r, which is R_s/ε. The same plate as both kinds differs by 3·R_s/ε.
  it.each([125, 500, 2000])("round holes against Maa's micro-perforation on the same plate at %i Hz: Δr = 3·R_s/(ε ρ0c)", (f) => {
    const plate = holes("round-holes", 0.005, 0.006, 0.0314);
    const ordinary = facingImpedance(plate, f, air);
    const maa = facingImpedance({ ...plate, kind: "micro-perforated" }, f, air);
    expect(ordinary.re - maa.re).toBeCloseTo((3 * rs(f)) / (0.0314 * air.z0), 12);
  });

  it("slots: the resistance at high frequency tends to the in-slit viscous term plus 4·R_s/ε", () => {
    // in-slit, worked by hand from Stinson's ρ_eff = ρ0/(1 − tanh λ/λ) for λ = s(1 + j)/√2 ≫ 1,
    // s = (w/2)·sqrt(ωρ0/η): 1/(1 − 1/λ) ≈ 1 + 1/λ + 1/λ², so Re(jωρ_eff t/ε) ≈
    // (t/ε)·sqrt(2ηωρ0)/w · (1 + √2/s)
    const w = 0.003;
    const t = 0.016;
    const eps = 0.15;
    const f = 4000;
    const z = facingImpedance({ kind: "slots", thickness: t, slotWidth: w, slotPitch: w / eps }, f, air);
    const s = (w / 2) * Math.sqrt((2 * Math.PI * f * air.rho) / air.eta);
    const inSlit = (((t / eps) * Math.sqrt(2 * air.eta * 2 * Math.PI * f * air.rho)) / w) * (1 + Math.SQRT2 / s);
    expect(Math.abs(z.re * air.z0 - (inSlit + (4 * rs(f)) / eps))).toBeLessThan(0.05);
  });

  it.each([
    // a thin plate, where the end resistance is most of the resistance: peak α about doubles
    { name: "3 mm holes, 1 mm plate, 3.14 %", plate: holes("round-holes", 0.003, 0.001, 0.0314), low: 1.7, high: 2.3 },
    // the 6 mm plate of the table above: the in-hole resistance is larger, α rises by about 40 %
    { name: "5 mm holes, 6 mm plate, 3.14 %", plate: holes("round-holes", 0.005, 0.006, 0.0314), low: 1.3, high: 1.5 },
  ])("a bare panel over 50 mm of air ($name): peak α rises $low–$high times, the peak moves by less than 0.2 %", ({ plate, low, high }) => {
    // α_n = 4r/((1 + r)² + (x − cot kD)²) over rigidly backed air (Maa 1998, eq. for α_n), here
    // with the engine's facing impedance and, for Maa's variant, 3·R_s/ε taken off its resistance
    const D = 0.05;
    const alpha = (f: number, maaEnds: boolean) => {
      const z = facingImpedance(plate, f, air);
      const r = z.re - (maaEnds ? (3 * rs(f)) / (0.0314 * air.z0) : 0);
      const x = z.im - 1 / Math.tan((2 * Math.PI * f * D) / air.c);
      return (4 * r) / ((1 + r) ** 2 + x * x);
    };
    const peak = (maaEnds: boolean) => {
      let best = { f: 0, a: 0 };
      for (let f = 100; f < 1700; f += 0.01) {
        const a = alpha(f, maaEnds);
        if (a > best.a) best = { f, a };
      }
      return best;
    };
    const ours = peak(false);
    const maa = peak(true);
    expect(ours.a / maa.a).toBeGreaterThan(low);
    expect(ours.a / maa.a).toBeLessThan(high);
    expect(Math.abs(ours.f / maa.f - 1)).toBeLessThan(0.002);
    // and the engine's own peak search on the lumped facing finds the same maximum
    const e = findPeak(new LayeredModel(plate, [{ kind: "air", thickness: D }], air, "lumped"), air.c / (4 * D));
    expect(Math.abs(e.f - ours.f)).toBeLessThan(0.02);
    expect(e.alpha).toBeCloseTo(ours.a, 6);
  });
});
