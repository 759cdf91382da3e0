/**
 * Field schemas shared by the contract's inputs: numbers with their unit in every message, so
 * that an error names the field and says what it wants.
 */
import { z } from "zod";

export const number = (unit: string) =>
  z.number({
    error: (issue) => (issue.input === undefined ? `required: a number in ${unit}` : `must be a number in ${unit}`),
  });

/** A positive quantity with an upper bound that catches unit mistakes (mm typed as m). */
export const positive = (unit: string, max: number) =>
  number(unit)
    .positive({ error: `must be greater than 0 ${unit}` })
    .max(max, { error: `must be at most ${max} ${unit} (inputs are in SI units)` });

export const between = (unit: string, min: number, max: number) =>
  number(unit)
    .min(min, { error: `must be at least ${min} ${unit}` })
    .max(max, { error: `must be at most ${max} ${unit}` });

export const oneOf = <const T extends readonly [string, ...string[]]>(values: T) =>
  z.enum(values, { error: `must be one of ${values.map((v) => `"${v}"`).join(", ")}` });

/** Absorption coefficient: not negative; ASTM C423 values may exceed 1. */
export const alpha = () => between("(absorption coefficient)", 0, 2);

/** ISO 9613-1 is stated for −20 … 50 °C and pressures below 200 kPa. */
export const temperature = () => between("°C", -20, 50);
export const pressure = () => between("Pa", 10_000, 200_000);
export const humidity = () => between("% relative humidity", 0, 100);

/** Air of the build-up or resonator: optional, 20 °C and 101 325 Pa by default. */
export const airSchema = z
  .strictObject({ temperature: temperature().optional(), pressure: pressure().optional() })
  .optional();

/** Air of a room: temperature and humidity required, pressure 101 325 Pa by default. */
export const atmosphereSchema = z.strictObject({
  temperature: temperature(),
  humidity: humidity(),
  pressure: pressure().optional(),
});
