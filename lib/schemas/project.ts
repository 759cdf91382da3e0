import { z } from "zod";
import { nameField } from "./common";

export const createProjectSchema = z.object({
  name: nameField,
  reference: z.string().trim().max(60, { error: "Keep the reference under 60 characters." }).optional().default(""),
  site: z.string().trim().max(200, { error: "Keep the site under 200 characters." }).optional().default(""),
});
export type CreateProjectInput = z.infer<typeof createProjectSchema>;
