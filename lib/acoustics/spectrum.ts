/**
 * Absorption spectra of a build-up at normal and field incidence. A partitioned cavity is
 * locally reacting: its normal-incidence impedance serves every angle, computed once per
 * frequency, and a fixed 16-point rule integrates the smooth result to 10⁻⁶. An open cavity
 * reacts extendedly: every layer is evaluated at each angle, by the rule of field-incidence.ts,
 * which resolves the narrow oblique resonances to 0.002 of an adaptive quadrature.
 */
import { airProperties } from "./air";
import { type BuildUp, cavityLayers } from "./build-up";
import { type BaseRule, type OpenCavityField, airCavity, openCavityField } from "./field-incidence";
import { DEFAULT_ANGLES, FIELD_INCIDENCE_LIMIT_DEG, type Quadrature, fieldQuadrature, locallyReactingField, obliqueAbsorption } from "./incidence";
import { LayeredModel } from "./layered-model";

export function buildUpModel(buildUp: BuildUp): LayeredModel {
  return new LayeredModel(buildUp.facing, cavityLayers(buildUp.cavity, buildUp.infill), airProperties(buildUp.air));
}

/** Where a spectrum is computed and where it goes. */
export interface SpectrumGrid {
  frequencies: ArrayLike<number>;
  /** the fixed rule: for a locally reacting cavity, or an open one when `adaptive` is false */
  q: Quadrature;
  locallyReacting: boolean;
  /** open cavity by the resonance-resolving rule (true unless a fixed rule was asked for) */
  adaptive: boolean;
  normal: Float64Array;
  diffuse: Float64Array;
}

export function spectrumGrid(frequencies: ArrayLike<number>, q: Quadrature, locallyReacting: boolean, adaptive = true): SpectrumGrid {
  return { frequencies, q, locallyReacting, adaptive, normal: new Float64Array(frequencies.length), diffuse: new Float64Array(frequencies.length) };
}

/** Cavity impedances at the base rule's nodes, shared as the integrator's scratch is. */
let scratchRe = new Float64Array(64);
let scratchIm = new Float64Array(64);

/** The open-cavity field integral at the model's current frequency. */
export class OpenFieldRunner {
  private readonly field: OpenCavityField;
  private readonly cavityAt: (cos: Float64Array, sin2: Float64Array, n: number, re: Float64Array, im: Float64Array) => void;
  /** with a cavity table, the cavity is set to the frequency only when the rule needs more angles */
  private pending = 0;

  constructor(
    private readonly model: LayeredModel,
    maxAngleDeg: number,
  ) {
    this.field = openCavityField(maxAngleDeg);
    this.cavityAt = (cos, sin2, n, re, im) => {
      if (this.pending) {
        model.setCavityFrequency(this.pending);
        this.pending = 0;
      }
      model.cavityImpedances(cos, sin2, n, re, im, 0);
    };
  }

  /** The base rule at frequency f (its nodes depend on the cavity alone). */
  rule(f: number): BaseRule {
    return this.field.rule((2 * Math.PI * f) / this.model.c, this.model.depth);
  }

  /** The field value at f, after model.setFrequency(f). */
  value(f: number): number {
    const rule = this.rule(f);
    if (scratchRe.length < rule.n) {
      scratchRe = new Float64Array(rule.n);
      scratchIm = new Float64Array(rule.n);
    }
    if (this.model.airOnly === null) this.model.cavityImpedances(rule.cos, rule.sin2, rule.n, scratchRe, scratchIm, 0);
    else airCavity(this.phase(f), rule.cos, rule.n, scratchRe, scratchIm, 0);
    return this.integrate(f, rule, scratchRe, scratchIm, 0);
  }

  /**
   * The field value at f, after the facing's at(f) alone, from cavity impedances at the rule's
   * nodes kept in a table (re, im from offset): the cavity is set to the frequency only if the
   * rule needs more angles.
   */
  fromTable(f: number, re: Float64Array, im: Float64Array, offset: number): number {
    this.pending = f;
    const value = this.integrate(f, this.rule(f), re, im, offset);
    this.pending = 0;
    return value;
  }

  /** 2·k·D: the cavity's phase per unit of u, exact for air alone and a bound with infill */
  private phase(f: number): number {
    return (4 * Math.PI * f * this.model.depth) / this.model.c;
  }

  private integrate(f: number, rule: BaseRule, re: Float64Array, im: Float64Array, offset: number): number {
    const phase = this.phase(f);
    return this.field.value(rule, re, im, offset, this.model.facing, this.cavityAt, this.model.airOnly === null ? null : phase, phase);
  }

  /** evaluations beyond the base rule at the last frequency */
  get extra(): number {
    return this.field.extra;
  }
}

export function fillSpectrum(model: LayeredModel, grid: SpectrumGrid): void {
  const { frequencies, q, normal, diffuse } = grid;
  const open = !grid.locallyReacting && grid.adaptive ? new OpenFieldRunner(model, q.maxAngleDeg) : null;
  for (let k = 0; k < frequencies.length; k++) {
    model.setFrequency(frequencies[k]);
    model.impedance();
    normal[k] = obliqueAbsorption(model.zr, model.zi, 1);
    if (grid.locallyReacting) diffuse[k] = locallyReactingField(model.zr, model.zi, q);
    else diffuse[k] = open ? open.value(frequencies[k]) : model.fieldAbsorption(q);
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
  const grid = spectrumGrid(frequencies, q, buildUp.cavity.partitioned, options.angles === undefined);
  fillSpectrum(buildUpModel(buildUp), grid);
  clampNegative(grid.normal);
  clampNegative(grid.diffuse);
  return { normal: grid.normal, diffuse: grid.diffuse };
}
