import { z } from "zod";
import { formatFireClass, parseFireClass } from "@/lib/fire";

/**
 * A required fire class as the consultant types it, in either system; stored as Cavitas prints
 * it (so what is shown can be typed back). Empty clears it.
 */
export const requiredFireClassField = z
  .string({ error: "Enter a class, for example B-s1,d0 or Class A, or leave it empty." })
  .trim()
  .max(60, { error: "Keep the class under 60 characters, e.g. B-s1,d0 or Class A." })
  .nullable()
  .transform((text, ctx) => {
    if (!text) return null;
    const parsed = parseFireClass(text);
    if (!parsed.ok) {
      ctx.addIssue({ code: "custom", message: parsed.message });
      return z.NEVER;
    }
    return formatFireClass(parsed.value);
  });

export const roomFireSchema = z.object({ fireRequired: requiredFireClassField });
