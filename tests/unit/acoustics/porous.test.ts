import { describe, expect, it } from "vitest";
import { airProperties } from "@/lib/acoustics/air";
import { LayeredModel } from "@/lib/acoustics/layered-model";
import { porousCharacteristics } from "@/lib/acoustics/porous";
import { NOMINAL } from "./helpers";

// Delany & Bazley, Applied Acoustics 3 (1970) 105–116, and Miki, J. Acoust. Soc. Jpn (E) 11(1)
// (1990) 19–24. Miki's coefficients as found in a public implementation of his paper; Delany &
// Bazley's the universally reproduced ones (the citation's details from memory). Check values
// computed from these formulas in numpy, air at 20 °C.
const air = airProperties();

describe("characteristic impedance and wavenumber at 1 kHz (computed in numpy)", () => {
  it.each([
    ["delany-bazley", 10000, [1.28172, -0.4097, 1.4304, -0.66598]],
    ["miki", 10000, [1.29956, -0.45855, 1.4523, -0.66393]],
    ["delany-bazley", 20000, [1.4751, -0.68049, 1.69918, -1.00595]],
    ["miki", 20000, [1.46422, -0.71062, 1.69417, -1.01896]],
  ] as const)("%s, σ = %i Pa·s/m²", (model, sigma, expected) => {
    const out = new Float64Array(4);
    porousCharacteristics(model, sigma, 1000, air.rho, out);
    expected.forEach((v, i) => expect(out[i]).toBeCloseTo(v, 5));
  });

  it("Miki's printed form 1 + 5.50(10³f/σ)^−0.632 … converts exactly to 0.0699 … (Miki 1990)", () => {
    expect(5.5 * 1000 ** -0.632).toBeCloseTo(0.0699, 4);
    expect(8.43 * 1000 ** -0.632).toBeCloseTo(0.1071, 4);
    expect(7.81 * 1000 ** -0.618).toBeCloseTo(0.1093, 4);
    expect(11.41 * 1000 ** -0.618).toBeCloseTo(0.1597, 4);
  });
});

describe("50 mm rigidly backed layer, normal incidence (computed in numpy: Zs = −j Zc cot(kc d))", () => {
  const LAYER = {
    "delany-bazley 10000": [0.0151, 0.034, 0.0667, 0.1108, 0.1724, 0.2581, 0.3713, 0.4964, 0.6364, 0.7763, 0.8853, 0.9597, 0.9943, 0.9863, 0.9578, 0.942, 0.9734, 0.9994],
    "miki 10000": [0.0454, 0.0655, 0.0971, 0.1372, 0.1917, 0.2671, 0.3684, 0.4848, 0.6217, 0.7657, 0.8825, 0.9629, 0.9971, 0.9817, 0.943, 0.9245, 0.9709, 0.9987],
    "delany-bazley 20000": [0.0166, 0.0399, 0.0818, 0.1397, 0.2219, 0.3347, 0.4765, 0.6194, 0.7587, 0.8733, 0.9426, 0.9747, 0.975, 0.9578, 0.9443, 0.9557, 0.9853, 0.9896],
    "miki 20000": [0.0574, 0.085, 0.1293, 0.1859, 0.262, 0.3634, 0.4902, 0.6204, 0.7518, 0.865, 0.9364, 0.9701, 0.9689, 0.9476, 0.9312, 0.9463, 0.9819, 0.9826],
  };
  it.each(Object.entries(LAYER))("%s", (key, expected) => {
    const [model, sigma] = key.split(" ") as ["delany-bazley" | "miki", string];
    const layer = new LayeredModel(null, [{ kind: "porous", thickness: 0.05, flowResistivity: Number(sigma), model }], air);
    NOMINAL.forEach((f, i) => expect(Math.abs(layer.normalAbsorption(f) - expected[i])).toBeLessThan(6e-5));
  });
});
