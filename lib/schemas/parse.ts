import type { z } from "zod";
import { invalid, type FieldIssue } from "@/lib/errors";

// Turn zod issues into field-named messages ("email", "facing.pitch").
export function fieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ field: i.path.map(String).join(".") || "(input)", message: i.message }));
}

export function parseInput<S extends z.ZodType>(schema: S, raw: unknown): z.infer<S> {
  const result = schema.safeParse(raw);
  if (!result.success) throw invalid(fieldIssues(result.error));
  return result.data;
}
