/**
 * Evaluation of a build-up: open area, lumped and full-model resonance, one-third-octave and
 * octave absorption at normal and diffuse (field) incidence, and the warnings that apply.
 * This is the fast core that the contract, the tuning bench and the design assistant call.
 */
import { airProperties } from "./air";
import { OCTAVE_LABELS, SAMPLES_PER_BAND, THIRD_OCTAVE_LABELS, bandMeans, octavesFromThirds, thirdOctaveLogSamples, thirdOctaveSamples } from "./bands";
import { type BuildUp, cavityLayers, effectiveThickness, facingOpenArea } from "./build-up";
import { type CavityCache, cavityTable, facingTable, fillFromTable } from "./cavity-cache";
import { lumpedPanelHz } from "./helmholtz";
import { DEFAULT_ANGLES, FIELD_INCIDENCE_LIMIT_DEG, fieldQuadrature } from "./incidence";
import { LayeredModel } from "./layered-model";
import { findPeak } from "./peak";
import { clampNegative, fillSpectrum, spectrumGrid } from "./spectrum";
import { type Warning, buildUpWarnings } from "./warnings";

export interface EvaluateOptions {
  /**
   * Gauss–Legendre points of the field-incidence integral of a partitioned cavity (16); given,
   * an open cavity takes the same fixed rule in place of its resonance-resolving one
   */
  angles?: number;
  /** upper limit of the field-incidence integral in degrees (78; 90 gives Paris' integral) */
  maxAngleDeg?: number;
  /** frequencies averaged per one-third octave (7) */
  samplesPerBand?: number;
  /** search the full-model peak (true); a sweep may skip it */
  peak?: boolean;
  /** keep cavity tables between evaluations that differ only in the facing */
  cavityCache?: CavityCache;
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

export function evaluateBuildUp(buildUp: BuildUp, options: EvaluateOptions = {}): Evaluation {
  const air = airProperties(buildUp.air);
  const n = options.samplesPerBand ?? SAMPLES_PER_BAND;
  const freqs = thirdOctaveSamples(n);
  const q = fieldQuadrature(options.angles ?? DEFAULT_ANGLES, options.maxAngleDeg ?? FIELD_INCIDENCE_LIMIT_DEG);
  const model = new LayeredModel(buildUp.facing, cavityLayers(buildUp.cavity, buildUp.infill), air);
  const grid = spectrumGrid(freqs, q, buildUp.cavity.partitioned, options.angles === undefined);
  if (options.cavityCache) {
    const table = options.cavityCache.table(buildUp.cavity, buildUp.infill, air, grid, () => cavityTable(model, grid));
    const facing = options.cavityCache.facing(buildUp.facing, air, grid, () => facingTable(model.facing, grid));
    fillFromTable(model, table, grid, facing);
  } else {
    fillSpectrum(model, grid);
  }
  const { normal, diffuse } = grid;
  // the band samples bracket the peak search within their range (before negatives are set to 0)
  const known = { f: freqs, lnF: thirdOctaveLogSamples(n), alpha: Float64Array.from(normal) };
  const clamped = Math.max(clampNegative(normal), clampNegative(diffuse));

  const normalBands = bandMeans(normal, n);
  const diffuseBands = bandMeans(diffuse, n);
  const normalOctaves = octavesFromThirds(normalBands);
  const diffuseOctaves = octavesFromThirds(diffuseBands);

  const openArea = facingOpenArea(buildUp.facing);
  const helmholtzHz = lumpedPanelHz(openArea, effectiveThickness(buildUp.facing), buildUp.cavity.depth, air.c);
  const quarterWaveHz = air.c / (4 * buildUp.cavity.depth);
  const peak = options.peak === false ? null : findPeak(model, quarterWaveHz, known);

  return {
    openArea,
    helmholtzHz,
    peakHz: peak ? peak.f : null,
    peakAlpha: peak ? peak.alpha : null,
    quarterWaveHz,
    thirdOctaves: THIRD_OCTAVE_LABELS.map((f, i) => ({ f, normal: normalBands[i], diffuse: diffuseBands[i] })),
    octaves: OCTAVE_LABELS.map((f, i) => ({ f, normal: normalOctaves[i], diffuse: diffuseOctaves[i] })),
    warnings: buildUpWarnings({ buildUp, air, helmholtzHz, peak, clampedUpToHz: clamped >= 0 ? freqs[clamped] : null }),
  };
}
