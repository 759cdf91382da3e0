import { z } from "zod";
import { formatLength, type LengthScale, type UnitPreference } from "@/lib/units";

/**
 * A plausible range of a length, m, with the reason a practitioner would give for it. `above`
 * excludes the minimum itself (a size must be more than zero).
 */
export type LengthLimits = { min: number; max: number; above?: boolean; why: string };

/** A length in metres within its limits; each message names the field and speaks the person's units. */
export function lengthField(what: string, limits: LengthLimits, units: UnitPreference = "metric", scale: LengthScale = "room") {
  const say = (m: number) => formatLength(m, units, { scale });
  return z.number({ error: `Enter the ${what} as a length.` }).superRefine((v, ctx) => {
    const message = lengthRefusal(what, v, limits, say);
    if (message) ctx.addIssue({ code: "custom", message });
  });
}

/** Why a length is refused, or null: not a number, negative, or outside its plausible range. */
export function lengthRefusal(what: string, v: number, limits: LengthLimits, say: (m: number) => string): string | null {
  const { min, max, above = false, why } = limits;
  const The = `The ${what}`;
  if (!Number.isFinite(v)) return `Enter the ${what} as a number.`;
  if (v < 0 && min >= 0) return `${The} cannot be negative (${say(v)}).`;
  if (above ? v <= min : v < min) return `${The} must be ${above ? "more than" : "at least"} ${say(min)} (${say(v)} was given): ${why}.`;
  if (v > max) return `${The} must be at most ${say(max)} (${say(v)} was given): ${why}.`;
  return null;
}
