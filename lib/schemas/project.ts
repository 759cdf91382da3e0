import { z } from "zod";
import { nameField } from "./common";
import { requiredFireClassField } from "./fire";

export const createProjectSchema = z.object({
  name: nameField,
  reference: z.string().trim().max(60, { error: "Keep the reference under 60 characters." }).optional().default(""),
  site: z.string().trim().max(200, { error: "Keep the site under 200 characters." }).optional().default(""),
});
export type CreateProjectInput = z.infer<typeof createProjectSchema>;

export const updateProjectSchema = z
  .object({
    name: nameField.optional(),
    reference: z.string().trim().max(60, { error: "Keep the reference under 60 characters." }).optional(),
    site: z.string().trim().max(200, { error: "Keep the site under 200 characters." }).optional(),
    // Least distance from a panel to a surface edge or an opening on the elevation boards.
    edgeClearance: z
      .number({ error: "Enter the clearance as a length." })
      .refine((v) => Number.isFinite(v) && v >= 0 && v <= 1, { error: "The edge clearance must be between 0 and 1000 mm." })
      .optional(),
    // The fire class every room of the project requires unless the room names its own.
    fireRequired: requiredFireClassField.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { error: "Nothing to change." });
