/**
 * Absorption spectra of a build-up at normal and field incidence. A partitioned cavity is
 * locally reacting: its normal-incidence impedance serves every angle, computed once per
 * frequency. An open cavity reacts extendedly: every layer is evaluated at each angle.
 */
import { airProperties } from "./air";
import { type BuildUp, cavityLayers } from "./build-up";
import { DEFAULT_ANGLES, FIELD_INCIDENCE_LIMIT_DEG, type Quadrature, fieldQuadrature, locallyReactingField, obliqueAbsorption } from "./incidence";
import { LayeredModel } from "./layered-model";

export function buildUpModel(buildUp: BuildUp): LayeredModel {
  return new LayeredModel(buildUp.facing, cavityLayers(buildUp.cavity, buildUp.infill), airProperties(buildUp.air));
}

/** Where a spectrum is computed and where it goes. */
export interface SpectrumGrid {
  frequencies: ArrayLike<number>;
  q: Quadrature;
  locallyReacting: boolean;
  normal: Float64Array;
  diffuse: Float64Array;
}

export function spectrumGrid(frequencies: ArrayLike<number>, q: Quadrature, locallyReacting: boolean): SpectrumGrid {
  return { frequencies, q, locallyReacting, normal: new Float64Array(frequencies.length), diffuse: new Float64Array(frequencies.length) };
}

export function fillSpectrum(model: LayeredModel, grid: SpectrumGrid): void {
  const { frequencies, q, normal, diffuse } = grid;
  for (let k = 0; k < frequencies.length; k++) {
    model.setFrequency(frequencies[k]);
    model.impedance();
    normal[k] = obliqueAbsorption(model.zr, model.zi, 1);
    diffuse[k] = grid.locallyReacting ? locallyReactingField(model.zr, model.zi, q) : model.fieldAbsorption(q);
  }
}

/** Below this a negative value is rounding, not the model. */
const ROUNDING = -1e-9;

/**
 * Delany & Bazley's model can give a thin rigidly backed layer an impedance with negative real
 * part at low frequencies, even inside its data range, and so a negative absorption (the defect
 * Miki 1990 set out to remove); Miki's model does so only far below its range (f/σ ≪ 0.01).
 * Negative values are set to 0; the index of the highest frequency where the value was more
 * than rounding is returned (−1 if none) so that the caller can warn.
 */
export function clampNegative(values: Float64Array): number {
  let last = -1;
  for (let k = 0; k < values.length; k++) {
    if (values[k] < 0) {
      if (values[k] < ROUNDING) last = k;
      values[k] = 0;
    }
  }
  return last;
}

/** Absorption of a build-up at arbitrary frequencies (for curves). */
export function absorptionSpectrum(
  buildUp: BuildUp,
  frequencies: ArrayLike<number>,
  options: { angles?: number; maxAngleDeg?: number } = {},
): { normal: Float64Array; diffuse: Float64Array } {
  const q = fieldQuadrature(options.angles ?? DEFAULT_ANGLES, options.maxAngleDeg ?? FIELD_INCIDENCE_LIMIT_DEG);
  const grid = spectrumGrid(frequencies, q, buildUp.cavity.partitioned);
  fillSpectrum(buildUpModel(buildUp), grid);
  clampNegative(grid.normal);
  clampNegative(grid.diffuse);
  return { normal: grid.normal, diffuse: grid.diffuse };
}
