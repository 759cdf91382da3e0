/**
 * Where a result leaves a model's validity, say so. Each warning has a stable code for the
 * interface and a sentence for people.
 */
import type { Air } from "./air";
import { type BuildUp, effectiveThickness, facingOpenArea } from "./build-up";
import { THIRD_OCTAVES } from "./bands";
import { cotRootHz } from "./helmholtz";

export interface Warning {
  code: string;
  message: string;
}

/** Limits of every prediction; shown with results, not repeated as warnings. */
export const MODEL_LIMITS = [
  "rigid facing: no panel vibration",
  "infinite panel: no edge or size effects",
  "predictions are estimates, not laboratory measurements",
] as const;

/** The lumped estimate holds for small open area (Cox & D'Antonio ch. 7). */
export const LUMPED_OPEN_AREA_LIMIT = 0.2;
/** Warn when the lumped f0 lies this much above the exact root of ωt'/(εc) = cot(ωD/c), which it always exceeds. */
export const LUMPED_OVERESTIMATE_LIMIT = 0.05;
/** Fok's ψ is fitted up to √ε ≈ 0.5 (Fok 1941, as used by Melling, JSV 29(1), 1973). */
export const FOK_OPEN_AREA_LIMIT = 0.25;
/** Maa's theory is for sub-millimetre holes (Maa 1998). */
export const MAA_MAX_HOLE = 1e-3;
/** Maa's end correction has no interaction term; it overstates the mass as ε grows. */
export const MAA_MAX_OPEN_AREA = 0.05;
/** Delany & Bazley's data range, 0.01 < ρ0 f/σ < 1 (Delany & Bazley 1970). */
export const DB_RANGE = [0.01, 1] as const;

const percent = (x: number) => `${(100 * x).toFixed(1)} %`;
const hz = (f: number) => `${f.toPrecision(4)} Hz`;

export function buildUpWarnings({
  buildUp,
  air,
  helmholtzHz,
  peak,
  clampedUpToHz,
}: {
  buildUp: BuildUp;
  air: Air;
  helmholtzHz: number;
  peak: { f: number; atLimit: boolean; atLowerLimit: boolean } | null;
  /** highest sample frequency where a negative absorption was set to 0, or null */
  clampedUpToHz: number | null;
}): Warning[] {
  const out: Warning[] = [];
  const { facing, cavity, infill } = buildUp;
  const eps = facingOpenArea(facing);
  if (eps > LUMPED_OPEN_AREA_LIMIT) {
    out.push({
      code: "lumped-open-area",
      message: `open area ${percent(eps)} is above about 20 %: the lumped Helmholtz estimate (helmholtzHz) is not reliable there`,
    });
  }
  const root = cotRootHz(eps, effectiveThickness(facing), cavity.depth, air.c);
  if (helmholtzHz > root * (1 + LUMPED_OVERESTIMATE_LIMIT)) {
    out.push({
      code: "lumped-overestimate",
      message: `helmholtzHz ${hz(helmholtzHz)} is ${percent(helmholtzHz / root - 1)} above the exact cavity root ${hz(root)}: the lumped estimate assumes a cavity much shallower than the wavelength (here kD = ${((2 * Math.PI * helmholtzHz * cavity.depth) / air.c).toFixed(2)} at helmholtzHz) and overestimates for large open area or deep cavity; use peakHz`,
    });
  }
  if (facing.kind === "round-holes" && eps > FOK_OPEN_AREA_LIMIT) {
    out.push({
      code: "end-correction-range",
      message: `open area ${percent(eps)} is above 25 %: Fok's hole-interaction correction is extrapolated`,
    });
  }
  if (facing.kind === "micro-perforated") {
    if (facing.holeDiameter > MAA_MAX_HOLE) {
      out.push({
        code: "maa-hole-size",
        message: `hole diameter ${(facing.holeDiameter * 1000).toFixed(2)} mm is above 1 mm: Maa's micro-perforation theory is for sub-millimetre holes; choose round-holes`,
      });
    }
    if (eps > MAA_MAX_OPEN_AREA) {
      out.push({
        code: "maa-open-area",
        message: `open area ${percent(eps)} is above 5 %: Maa's end correction 0.85d has no hole-interaction term and overstates the mass`,
      });
    }
  }
  if (infill) {
    const lowest = THIRD_OCTAVES[0].lower;
    const highest = THIRD_OCTAVES[THIRD_OCTAVES.length - 1].upper;
    const fLow = (DB_RANGE[0] * infill.flowResistivity) / air.rho;
    const fHigh = (DB_RANGE[1] * infill.flowResistivity) / air.rho;
    if (lowest < fLow || highest > fHigh) {
      const name = infill.model === "miki" ? "Miki's model (fitted on the same data)" : "Delany–Bazley";
      const from = Math.max(fLow, lowest);
      const to = Math.min(fHigh, highest);
      const within = from < to ? `only from ${hz(from)} to ${hz(to)}` : "at no frequency of the bands";
      out.push({
        code: "porous-range",
        message: `flow resistivity ${infill.flowResistivity} Pa·s/m²: ${name} is within its data range 0.01 < ρ0f/σ < 1 ${within}; values outside are extrapolated`,
      });
    }
  }
  if (clampedUpToHz !== null) {
    out.push({
      code: "negative-absorption",
      message: `the porous model gives a non-physical negative absorption (an impedance with negative real part) up to ${hz(clampedUpToHz)}; it is set to 0 there. Delany–Bazley does this for thin layers at low frequencies; Miki's model avoids it inside its data range`,
    });
  }
  if (peak?.atLimit) {
    out.push({
      code: "no-peak",
      message: `normal-incidence absorption rises up to the quarter-wave frequency c/(4D) = ${hz(peak.f)}: no resonance peak below it, peakHz is that limit`,
    });
  }
  if (peak?.atLowerLimit) {
    out.push({
      code: "peak-below-range",
      message: `normal-incidence absorption is highest at the lower end of the peak search, c/(4D)/1000 = ${hz(peak.f)}: any resonance lies below it and peakHz is that limit, not a peak; the facing's resistance or mass is far outside what panels are made with`,
    });
  }
  return out;
}
