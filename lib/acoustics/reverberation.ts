/**
 * Reverberation time per octave:
 *   Sabine (Kuttruff, Room Acoustics, ch. 5): T = (24 ln10 / c)·V / (A + 4mV), A = Σ S_i α_i
 *   Eyring (JASA 1, 217, 1930):               T = (24 ln10 / c)·V / (−S ln(1 − ᾱ) + 4mV)
 * with c from the room's temperature and m from ISO 9613-1 at the exact mid-band frequency
 * 1000·10^(3k/10) of each octave.
 */
import { speedOfSound } from "./air";
import { type AtmosphereInput, airPowerAttenuation } from "./air-absorption";

export type { AtmosphereInput } from "./air-absorption";
import { OCTAVES } from "./bands";

export const DECAY_CONSTANT = 24 * Math.LN10;

export type ReverbMethod = "sabine" | "eyring";

export interface RoomSurface {
  /** m² */
  area: number;
  /** absorption coefficient by nominal octave label ("125" … "4000"; "63" optional) */
  alpha: Record<string, number>;
}

export interface RoomInput {
  /** m³ */
  volume: number;
  surfaces: RoomSurface[];
  air: AtmosphereInput;
  method: ReverbMethod;
}

export interface ReverbBand {
  /** nominal octave, Hz */
  f: number;
  seconds: number;
  /** power attenuation of air, 1/m */
  airM: number;
}

export function sabineSeconds(volume: number, absorption: number, m: number, c: number): number {
  return (DECAY_CONSTANT / c) * (volume / (absorption + 4 * m * volume));
}

export function eyringSeconds(volume: number, surfaceArea: number, meanAlpha: number, m: number, c: number): number {
  if (meanAlpha >= 1) return 0;
  return (DECAY_CONSTANT / c) * (volume / (-surfaceArea * Math.log(1 - meanAlpha) + 4 * m * volume));
}

/** The octaves for which every surface gives a coefficient, in order. */
export function roomOctaves(surfaces: RoomSurface[]) {
  return OCTAVES.filter((band) => surfaces.every((s) => Number.isFinite(s.alpha[String(band.label)])));
}

function octaveSums(room: RoomInput) {
  const c = speedOfSound(room.air.temperature);
  const surfaceArea = room.surfaces.reduce((sum, s) => sum + s.area, 0);
  return roomOctaves(room.surfaces).map((band) => {
    const key = String(band.label);
    const absorption = room.surfaces.reduce((sum, s) => sum + s.area * s.alpha[key], 0);
    const m = airPowerAttenuation(band.centre, room.air);
    return { f: band.label, absorption, surfaceArea, m, c };
  });
}

export function reverberation(room: RoomInput): ReverbBand[] {
  return octaveSums(room).map(({ f, absorption, surfaceArea, m, c }) => ({
    f,
    seconds:
      room.method === "sabine"
        ? sabineSeconds(room.volume, absorption, m, c)
        : eyringSeconds(room.volume, surfaceArea, absorption / surfaceArea, m, c),
    airM: m,
  }));
}

export interface ShortfallBand {
  f: number;
  targetSeconds: number;
  seconds: number;
  /** Σ S α of the room as it is, m² */
  existing: number;
  /** Σ S α that reaches the target with the same method, m² */
  required: number;
  /** required − existing where positive, else 0, m² */
  shortfall: number;
}

/**
 * The absorption a room lacks per octave against target times (s, by nominal octave label).
 * Eyring's required absorption is turned back into Σ S α through ᾱ = 1 − exp(−A_e/S), so that
 * panels replacing part of a finish add S_panel·(α_panel − α_finish) under either method.
 */
export function absorptionShortfall(room: RoomInput & { target: Record<string, number> }): ShortfallBand[] {
  const times = reverberation(room);
  return octaveSums(room).flatMap(({ f, absorption, surfaceArea, m, c }, i) => {
    const targetSeconds = room.target[String(f)];
    if (!Number.isFinite(targetSeconds)) return [];
    const needed = (DECAY_CONSTANT * room.volume) / (c * targetSeconds) - 4 * m * room.volume;
    const required =
      needed <= 0 ? 0 : room.method === "sabine" ? needed : surfaceArea * (1 - Math.exp(-needed / surfaceArea));
    return [{ f, targetSeconds, seconds: times[i].seconds, existing: absorption, required, shortfall: Math.max(0, required - absorption) }];
  });
}

export interface PanelArea {
  /** panel area that closes every shortfall, m²; null when some octave cannot be closed */
  area: number | null;
  /** the octave that sets the area */
  limitingOctave: number | null;
  octaves: { f: number; area: number | null }[];
}

/**
 * Panel area that supplies the shortfall: each m² of panel replaces a m² of the finish it
 * covers and adds (α_panel − α_finish) of absorption, with the panel's octave diffuse α.
 */
export function panelAreaNeeded(input: {
  shortfall: Pick<ShortfallBand, "f" | "shortfall">[];
  panelAlpha: Record<string, number>;
  coveredAlpha: Record<string, number> | number;
}): PanelArea {
  const covered = (f: number) => (typeof input.coveredAlpha === "number" ? input.coveredAlpha : input.coveredAlpha[String(f)] ?? 0);
  const octaves = input.shortfall.map(({ f, shortfall }) => {
    if (shortfall <= 0) return { f, area: 0 };
    const gain = (input.panelAlpha[String(f)] ?? 0) - covered(f);
    return { f, area: gain > 0 ? shortfall / gain : null };
  });
  const stuck = octaves.find((o) => o.area === null);
  if (stuck) return { area: null, limitingOctave: stuck.f, octaves };
  let limiting: { f: number; area: number } | null = null;
  for (const o of octaves) if (o.area !== null && o.area > (limiting?.area ?? 0)) limiting = { f: o.f, area: o.area };
  return { area: limiting?.area ?? 0, limitingOctave: limiting?.f ?? null, octaves };
}
