/**
 * Field schemas shared by the contract's inputs: numbers with their unit in every message, so
 * that an error names the field and says what it wants. The practical limits of each quantity
 * live here, with the reason a person reads when a value is refused; the build-up schema of
 * the screens reuses the evaluate schema, so it refuses the same values with the same words.
 */
import { z } from "zod";

export const number = (unit: string) =>
  z.number({
    error: (issue) => (issue.input === undefined ? `required: a number in ${unit}` : `must be a number in ${unit}`),
  });

/** A practical range: below `min` the model or the object no longer makes sense (`why`). */
export interface Limit {
  unit: string;
  min: number;
  /** why nothing smaller is accepted */
  why: string;
  /** upper bound that catches unit mistakes (mm typed as m) */
  max: number;
}

/**
 * Practical minimums of the inputs. Values below them are legal numbers but no panel, room or
 * resonator is built that way, and some drive the models to numbers that are not numbers (a
 * hole of 1e-300 m): they are refused with the reason, never evaluated.
 */
export const LIMITS = {
  facingThickness: { unit: "m", min: 0.00005, max: 0.1, why: "0.05 mm: a thinner sheet is a film or membrane, outside the rigid-facing model" },
  holeDiameter: { unit: "m", min: 0.00005, max: 0.1, why: "0.05 mm, about the finest laser-drilled micro-perforation made" },
  pitch: { unit: "m", min: 0.0001, max: 0.5, why: "0.1 mm: holes cannot be set closer" },
  slotWidth: { unit: "m", min: 0.0001, max: 0.1, why: "0.1 mm, about the narrowest micro-slit made" },
  slotPitch: { unit: "m", min: 0.0002, max: 0.5, why: "0.2 mm: slots cannot be set closer" },
  cavityDepth: { unit: "m", min: 0.001, max: 2, why: "1 mm: a facing closer to its backing is laminated to it, not over a cavity" },
  infillThickness: { unit: "m", min: 0.001, max: 2, why: "1 mm: a thinner layer is a tissue or fleece, not a porous layer the models describe" },
  flowResistivity: { unit: "Pa·s/m²", min: 500, max: 1e7, why: "500 Pa·s/m²: a more open layer is practically air, far outside the porous models' data" },
  neckArea: { unit: "m²", min: 1e-6, max: 10, why: "1 mm²: a smaller neck is a leak, not a resonator neck" },
  neckRadius: { unit: "m", min: 0.0005, max: 10, why: "0.5 mm: a narrower neck is a leak, not a resonator neck" },
  resonatorVolume: { unit: "m³", min: 1e-6, max: 10_000, why: "1 cm³: a smaller volume is not a resonator's cavity" },
  roomVolume: { unit: "m³", min: 1, max: 1e6, why: "1 m³: reverberation time is a property of rooms, not of boxes" },
} as const satisfies Record<string, Limit>;

/** A quantity within a practical range, the reason named when it is too small. */
export const practical = (limit: Limit) =>
  number(limit.unit)
    .min(limit.min, { error: `must be at least ${limit.min} ${limit.unit} (${limit.why})` })
    .max(limit.max, { error: `must be at most ${limit.max} ${limit.unit} (inputs are in SI units)` });

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

/**
 * A list of at most `max` items, refused by its length before any item is read, so that a
 * body of 200 000 surfaces costs no more than one of 2000.
 */
export const boundedList = <T extends z.ZodType>(item: T, { min, max, what, tooFew }: { min: number; max: number; what: string; tooFew: string }) =>
  z
    .array(z.unknown(), { error: `must be a list of ${what}` })
    .min(min, { error: tooFew })
    .max(max, { error: `must list at most ${max} ${what}` })
    .pipe(z.array(item));

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
