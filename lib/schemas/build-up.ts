import { z } from "zod";
import { evaluateInputSchema } from "@/lib/acoustics/contract";
import { nameField } from "./common";

const metres = (label: string, min: number, max: number) =>
  z
    .number({ error: `Enter the ${label}.` })
    .refine(Number.isFinite, { error: `Enter the ${label} as a number.` })
    .refine((v) => v >= min && v <= max, { error: `The ${label} must be between ${min * 1000} mm and ${max * 1000} mm.` });

export const FIRE_STANDARDS = ["EN 13501-1", "ASTM E84", "other", "none"] as const;

// A panel build-up of a project's library. `spec` is the calculation contract's evaluate input,
// so the engine refuses exactly what the command line would, and the field is named the same.
export const buildUpFieldsSchema = z.object({
  name: nameField,
  spec: evaluateInputSchema,
  moduleWidth: metres("module width", 0.1, 3.6),
  moduleHeight: metres("module height", 0.1, 3.6),
  borderX: metres("side border", 0, 0.5),
  borderY: metres("top and bottom border", 0, 0.5),
  facingMaterial: z.string().trim().max(200, { error: "Keep the facing material under 200 characters." }).default(""),
  fireStandard: z.enum(FIRE_STANDARDS, { error: "Choose EN 13501-1, ASTM E84, other or none." }).default("none"),
  fireClass: z.string().trim().max(40, { error: "Keep the class under 40 characters, e.g. B-s1,d0 or Class A." }).default(""),
  fireReportId: z.string().max(64).nullable().default(null),
  notes: z.string().trim().max(2000, { error: "Keep the notes under 2000 characters." }).default(""),
});

function bordersFit(v: { moduleWidth: number; moduleHeight: number; borderX: number; borderY: number }, ctx: z.RefinementCtx) {
  if (2 * v.borderX >= v.moduleWidth) ctx.addIssue({ code: "custom", path: ["borderX"], message: "The side borders leave no perforated width on the module." });
  if (2 * v.borderY >= v.moduleHeight) ctx.addIssue({ code: "custom", path: ["borderY"], message: "The top and bottom borders leave no perforated height on the module." });
}

export const createBuildUpSchema = buildUpFieldsSchema.superRefine(bordersFit);
export const updateBuildUpSchema = buildUpFieldsSchema
  .extend({ version: z.number({ error: "Send the version you edited." }).int().positive() })
  .superRefine(bordersFit);

export type BuildUpFields = z.infer<typeof buildUpFieldsSchema>;
