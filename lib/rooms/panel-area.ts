/**
 * The area of one build-up, placed on one surface, that closes what the (treated) room still
 * lacks: the engine's panelAreaNeeded on the check's shortfall, with the covered finish's α,
 * since every m² of panel replaces a m² of that finish (lib/acoustics/reverberation.ts).
 */
import { type PanelArea, absorptionShortfall, panelAreaNeeded } from "@/lib/acoustics/reverberation";
import { roomSurfaces, upperLimits } from "./check";
import { type CheckInput, treatedAreas, validateCheckInput } from "./check-input";
import { type Issue, error, hasErrors, quote } from "./issues";
import { type OctaveRecord, octaveName } from "./octaves";

export interface PanelNeed extends PanelArea {
  /** m² of the surface still free of panels */
  available: number;
  /** whether the area needed fits on the surface */
  fits: boolean;
  /**
   * The octave where the panel absorbs less than the finish it covers and that this area would
   * push over its upper limit, with the most panel area that octave allows; null when none.
   */
  overshoot: { f: number; maxArea: number } | null;
  sentence: string;
}

export function panelAreaForRoom(
  input: CheckInput,
  panel: { surface: string; alpha: OctaveRecord },
  /** how the sentence quotes an area, m² → text (the person's units); m² unless given */
  area: (m2: number) => string = (m2) => quote(m2, "m²"),
): { ok: true; need: PanelNeed; issues: Issue[] } | { ok: false; issues: Issue[] } {
  const issues = validateCheckInput(input);
  const surface = input.surfaces.find((s) => s.key === panel.surface);
  if (!surface) issues.push(error("panel.surface", `no surface has the key "${panel.surface}"`));
  if (hasErrors(issues) || !surface) return { ok: false, issues };
  const method = input.method ?? "sabine";
  const room = { volume: input.volume, surfaces: roomSurfaces(input, true), air: input.air, method };
  const shortfall = absorptionShortfall({ ...room, target: upperLimits(input.target.perOctave) });
  const needed = panelAreaNeeded({ shortfall, panelAlpha: panel.alpha, coveredAlpha: surface.alpha });
  const available = Math.max(0, surface.area - (treatedAreas(input.treatments).get(surface.key) ?? 0));
  const fits = needed.area !== null && needed.area <= available * (1 + 1e-9);
  const overshoot = needed.area === null ? null : firstOvershoot(shortfall, panel.alpha, surface.alpha, needed.area);
  return { ok: true, need: { ...needed, available, fits, overshoot, sentence: sentence(needed, available, fits, overshoot, surface.name, area) }, issues };
}

/**
 * panelAreaNeeded looks only at the octaves that lack absorption. Where the panel absorbs less
 * than the finish it replaces, each m² takes (α_finish − α_panel) away, and an octave that is
 * within its limit now has only (existing − required) to spare. The tightest such octave is named.
 */
function firstOvershoot(
  bands: readonly { f: number; existing: number; required: number }[],
  panelAlpha: OctaveRecord,
  coveredAlpha: OctaveRecord,
  area: number,
): PanelNeed["overshoot"] {
  let tightest: PanelNeed["overshoot"] = null;
  for (const band of bands) {
    const loss = (coveredAlpha[String(band.f)] ?? 0) - (panelAlpha[String(band.f)] ?? 0);
    const spare = band.existing - band.required;
    if (!(loss > 0 && spare >= 0)) continue;
    const maxArea = spare / loss;
    if (area > maxArea * (1 + 1e-9) && (tightest === null || maxArea < tightest.maxArea)) tightest = { f: band.f, maxArea };
  }
  return tightest;
}

function sentence(area: PanelArea, available: number, fits: boolean, overshoot: PanelNeed["overshoot"], surfaceName: string, say: (m2: number) => string): string {
  if (area.area === null) {
    return `This build-up cannot close the shortfall at ${octaveName(area.limitingOctave as number)}: there it absorbs no more than the finish of ${surfaceName} it would cover.`;
  }
  if (area.area === 0) return "Nothing is lacking: no more panel area is needed.";
  const where = `${say(area.area)} of this build-up on ${surfaceName} closes the shortfall; ${octaveName(area.limitingOctave as number)} sets the area`;
  const problems = [
    ...(fits ? [] : [`only ${say(available)} of ${surfaceName} is free`]),
    ...(overshoot
      ? [`at ${octaveName(overshoot.f)} it absorbs less than the finish it covers, and more than ${say(overshoot.maxArea)} of it pushes that octave over its limit`]
      : []),
  ];
  return problems.length ? `${where}, but ${problems.join("; and ")}.` : `${where}.`;
}
