import type { z } from "zod";

// A form's zod issues as { field: message }, the first message for each field.
export function fieldErrorsOf(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const field = String(issue.path[0] ?? "");
    if (field && !(field in out)) out[field] = issue.message;
  }
  return out;
}
