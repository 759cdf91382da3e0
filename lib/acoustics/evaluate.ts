/**
 * Evaluation of a build-up: open area, lumped and full-model resonance, one-third-octave and
 * octave absorption at normal and diffuse (field) incidence, and the warnings that apply.
 * This is the fast core that the contract, the tuning bench and the design assistant call.
 */
import { airProperties } from "./air";
import { OCTAVE_LABELS, SAMPLES_PER_BAND, THIRD_OCTAVE_LABELS, bandMeans, octavesFromThirds, thirdOctaveSamples } from "./bands";
import { type BuildUp, cavityLayers, effectiveThickness, facingOpenArea } from "./build-up";
import { lumpedPanelHz } from "./helmholtz";
import { DEFAULT_ANGLES, FIELD_INCIDENCE_LIMIT_DEG, type Quadrature, fieldQuadrature, locallyReactingField, obliqueAbsorption } from "./incidence";
import { LayeredModel } from "./layered-model";
import { findPeak } from "./peak";
import { type Warning, buildUpWarnings } from "./warnings";

export interface EvaluateOptions {
  /** Gauss–Legendre points of the field-incidence integral (16) */
  angles?: number;
  /** upper limit of the field-incidence integral in degrees (78; 90 gives Paris' integral) */
  maxAngleDeg?: number;
  /** frequencies averaged per one-third octave (7) */
  samplesPerBand?: number;
  /** search the full-model peak (true); a sweep may skip it */
  peak?: boolean;
}

export interface BandValue {
  /** nominal centre, Hz */
  f: number;
  normal: number;
  diffuse: number;
}

export interface Evaluation {
  openArea: number;
  helmholtzHz: number;
  /** null when the peak search was skipped */
  peakHz: number | null;
  peakAlpha: number | null;
  quarterWaveHz: number;
  thirdOctaves: BandValue[];
  octaves: BandValue[];
  warnings: Warning[];
}

export function buildUpModel(buildUp: BuildUp): LayeredModel {
  return new LayeredModel(buildUp.facing, cavityLayers(buildUp.cavity, buildUp.infill), airProperties(buildUp.air));
}

/**
 * Normal and field-incidence absorption at the given frequencies. A partitioned cavity is
 * locally reacting: its normal-incidence impedance serves every angle, computed once per
 * frequency. An open cavity reacts extendedly: every layer is evaluated at each angle.
 */
export function fillSpectrum(
  model: LayeredModel,
  locallyReacting: boolean,
  frequencies: ArrayLike<number>,
  q: Quadrature,
  normal: Float64Array,
  diffuse: Float64Array,
): void {
  for (let k = 0; k < frequencies.length; k++) {
    model.setFrequency(frequencies[k]);
    model.impedance(1, 0);
    normal[k] = obliqueAbsorption(model.zr, model.zi, 1);
    if (locallyReacting) {
      diffuse[k] = locallyReactingField(model.zr, model.zi, q);
      continue;
    }
    let sum = 0;
    for (let i = 0; i < q.n; i++) {
      const cos = q.cos[i];
      model.impedance(cos, q.sin2[i]);
      sum += q.weight[i] * obliqueAbsorption(model.zr, model.zi, cos);
    }
    diffuse[k] = sum;
  }
}

/** Absorption of a build-up at arbitrary frequencies (for curves). */
export function absorptionSpectrum(
  buildUp: BuildUp,
  frequencies: ArrayLike<number>,
  options: Pick<EvaluateOptions, "angles" | "maxAngleDeg"> = {},
): { normal: Float64Array; diffuse: Float64Array } {
  const q = fieldQuadrature(options.angles ?? DEFAULT_ANGLES, options.maxAngleDeg ?? FIELD_INCIDENCE_LIMIT_DEG);
  const normal = new Float64Array(frequencies.length);
  const diffuse = new Float64Array(frequencies.length);
  fillSpectrum(buildUpModel(buildUp), buildUp.cavity.partitioned, frequencies, q, normal, diffuse);
  return { normal, diffuse };
}

export function evaluateBuildUp(buildUp: BuildUp, options: EvaluateOptions = {}): Evaluation {
  const air = airProperties(buildUp.air);
  const n = options.samplesPerBand ?? SAMPLES_PER_BAND;
  const freqs = thirdOctaveSamples(n);
  const q = fieldQuadrature(options.angles ?? DEFAULT_ANGLES, options.maxAngleDeg ?? FIELD_INCIDENCE_LIMIT_DEG);
  const model = new LayeredModel(buildUp.facing, cavityLayers(buildUp.cavity, buildUp.infill), air);
  const normal = new Float64Array(freqs.length);
  const diffuse = new Float64Array(freqs.length);
  fillSpectrum(model, buildUp.cavity.partitioned, freqs, q, normal, diffuse);

  const normalBands = bandMeans(normal, n);
  const diffuseBands = bandMeans(diffuse, n);
  const normalOctaves = octavesFromThirds(normalBands);
  const diffuseOctaves = octavesFromThirds(diffuseBands);

  const openArea = facingOpenArea(buildUp.facing);
  const helmholtzHz = lumpedPanelHz(openArea, effectiveThickness(buildUp.facing), buildUp.cavity.depth, air.c);
  const quarterWaveHz = air.c / (4 * buildUp.cavity.depth);
  const peak = options.peak === false ? null : findPeak(model, quarterWaveHz);

  return {
    openArea,
    helmholtzHz,
    peakHz: peak ? peak.f : null,
    peakAlpha: peak ? peak.alpha : null,
    quarterWaveHz,
    thirdOctaves: THIRD_OCTAVE_LABELS.map((f, i) => ({ f, normal: normalBands[i], diffuse: diffuseBands[i] })),
    octaves: OCTAVE_LABELS.map((f, i) => ({ f, normal: normalOctaves[i], diffuse: diffuseOctaves[i] })),
    warnings: buildUpWarnings(buildUp, air, helmholtzHz, peak),
  };
}
