/**
 * Atmospheric absorption of pure tones, ISO 9613-1:1993: the relaxation frequencies of oxygen
 * and nitrogen and the attenuation coefficient, as the standard gives them.
 * T in K, T0 = 293.15 K, T01 = 273.16 K, p_r = 101.325 kPa, humidity h_r in %.
 */
import { KELVIN, STANDARD_PRESSURE } from "./air";

const T0 = 293.15;
const T01 = 273.16;

export interface AtmosphereInput {
  /** °C */
  temperature: number;
  /** relative humidity, % */
  humidity: number;
  /** Pa */
  pressure?: number;
}

/** Molar concentration of water vapour h (%) and the relaxation frequencies of O2 and N2 (Hz). */
export function atmosphereRelaxation(atmosphere: AtmosphereInput): { h: number; frO: number; frN: number } {
  const t = atmosphere.temperature + KELVIN;
  const pa = (atmosphere.pressure ?? STANDARD_PRESSURE) / STANDARD_PRESSURE;
  const psat = 10 ** (-6.8346 * (T01 / t) ** 1.261 + 4.6151);
  const h = (atmosphere.humidity * psat) / pa;
  const tr = t / T0;
  const frO = pa * (24 + (4.04e4 * h * (0.02 + h)) / (0.391 + h));
  const frN = pa * tr ** -0.5 * (9 + 280 * h * Math.exp(-4.17 * (tr ** (-1 / 3) - 1)));
  return { h, frO, frN };
}

/** Attenuation coefficient α in dB/m at frequency f (Hz). */
export function airAttenuationDbPerM(f: number, atmosphere: AtmosphereInput): number {
  const t = atmosphere.temperature + KELVIN;
  const pa = (atmosphere.pressure ?? STANDARD_PRESSURE) / STANDARD_PRESSURE;
  const tr = t / T0;
  const { frO, frN } = atmosphereRelaxation(atmosphere);
  const f2 = f * f;
  const classical = (1.84e-11 / pa) * tr ** 0.5;
  const oxygen = (0.01275 * Math.exp(-2239.1 / t)) / (frO + f2 / frO);
  const nitrogen = (0.1068 * Math.exp(-3352 / t)) / (frN + f2 / frN);
  return 8.686 * f2 * (classical + tr ** -2.5 * (oxygen + nitrogen));
}

/** In dB/km, as the air command prints it. */
export function airAttenuationDbPerKm(f: number, atmosphere: AtmosphereInput): number {
  return 1000 * airAttenuationDbPerM(f, atmosphere);
}

/**
 * Power attenuation coefficient m in 1/m for the 4mV term of the reverberation formulae:
 * m = α / (10·lg e) (ISO 354:2003 with α from ISO 9613-1).
 */
export function airPowerAttenuation(f: number, atmosphere: AtmosphereInput): number {
  return airAttenuationDbPerM(f, atmosphere) / (10 * Math.LOG10E);
}
