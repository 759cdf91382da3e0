/**
 * Properties of air.
 *
 * Speed of sound and density from the ideal gas law (Kinsler et al., Fundamentals of Acoustics,
 * ch. 5): c = sqrt(γ R T), ρ = p / (R T), γ = 1.4, R = 287.05 J/(kg·K).
 * Dynamic viscosity by Sutherland's law (Sutherland 1893; constants as in White, Viscous Fluid
 * Flow): η = 1.458e-6 · T^1.5 / (T + 110.4).
 */

export const GAMMA = 1.4;
export const GAS_CONSTANT = 287.05;
export const KELVIN = 273.15;
export const STANDARD_PRESSURE = 101_325;
export const DEFAULT_TEMPERATURE = 20;

export interface AirConditions {
  /** °C */
  temperature?: number;
  /** Pa */
  pressure?: number;
}

export interface Air {
  /** °C */
  temperature: number;
  /** Pa */
  pressure: number;
  /** speed of sound, m/s */
  c: number;
  /** density, kg/m³ */
  rho: number;
  /** dynamic viscosity, Pa·s */
  eta: number;
  /** characteristic impedance ρc, Pa·s/m */
  z0: number;
}

export function speedOfSound(temperature: number): number {
  return Math.sqrt(GAMMA * GAS_CONSTANT * (temperature + KELVIN));
}

export function airDensity(temperature: number, pressure: number): number {
  return pressure / (GAS_CONSTANT * (temperature + KELVIN));
}

export function airViscosity(temperature: number): number {
  const t = temperature + KELVIN;
  return (1.458e-6 * t ** 1.5) / (t + 110.4);
}

export function airProperties(input: AirConditions = {}): Air {
  const temperature = input.temperature ?? DEFAULT_TEMPERATURE;
  const pressure = input.pressure ?? STANDARD_PRESSURE;
  const c = speedOfSound(temperature);
  const rho = airDensity(temperature, pressure);
  return { temperature, pressure, c, rho, eta: airViscosity(temperature), z0: rho * c };
}
