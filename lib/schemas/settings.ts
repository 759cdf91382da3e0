import { z } from "zod";
import { nameField } from "./common";

export const UNIT_PREFERENCES = ["metric", "imperial"] as const;

export const updateSettingsSchema = z
  .object({
    name: nameField.optional(),
    unitPreference: z.enum(UNIT_PREFERENCES, { error: "Choose metric or imperial." }).optional(),
  })
  .refine((v) => v.name !== undefined || v.unitPreference !== undefined, {
    error: "Nothing to change: send a name or a unit preference.",
  });
export type UpdateSettingsInput = z.infer<typeof updateSettingsSchema>;
