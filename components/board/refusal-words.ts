import { ApiError } from "@/lib/queries/api";

/** A refusal's words for one field: the server's message for it, else its first or general one. */
export function refusalFor(error: unknown, field: string): string | null {
  if (!error) return null;
  if (error instanceof ApiError) return error.fieldMessage(field) ?? error.issues[0]?.message ?? error.message;
  return error instanceof Error ? error.message : "That did not work; try again.";
}
