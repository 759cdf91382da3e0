import { AppError, STATUS } from "@/lib/errors";
import { errorFields, log } from "@/lib/log";
import { currentRequestId } from "./request-log";

// The one place where domain errors become HTTP responses. Unknown errors are logged with the
// request's id and answered with a plain 500: never a stack trace, a database message or a
// file path to the client, only the id to quote.
export function errorResponse(e: unknown): Response {
  if (e instanceof AppError) {
    return Response.json({ error: { code: e.code, message: e.message, issues: e.issues } }, { status: STATUS[e.code] });
  }
  const requestId = currentRequestId();
  log.error("unexpected error", { requestId, ...errorFields(e) });
  const ref = requestId ? ` (reference ${requestId})` : "";
  return Response.json({ error: { code: "internal", message: `Something went wrong on our side${ref}. Nothing was changed.`, issues: [] } }, { status: 500 });
}
