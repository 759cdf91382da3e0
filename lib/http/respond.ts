import { AppError, STATUS } from "@/lib/errors";

// The one place where domain errors become HTTP responses. Unknown errors are logged and
// answered with a plain 500: never a stack trace or a database message to the client.
export function errorResponse(e: unknown): Response {
  if (e instanceof AppError) {
    return Response.json({ error: { code: e.code, message: e.message, issues: e.issues } }, { status: STATUS[e.code] });
  }
  console.error(e);
  return Response.json({ error: { code: "internal", message: "Something went wrong on our side. Nothing was changed.", issues: [] } }, { status: 500 });
}
