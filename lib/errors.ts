// Typed domain errors. Services throw these; one function (lib/http/respond.ts) maps them
// to HTTP. The client sees the message and, for bad input, the field it concerns.
export type ErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "gone"
  | "invalid"
  | "too_many"
  | "bad_request"
  | "failed"
  | "too_large"
  | "unsupported_media";

export type FieldIssue = { field: string; message: string };

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly issues: FieldIssue[];

  constructor(code: ErrorCode, message: string, issues: FieldIssue[] = []) {
    super(message);
    this.code = code;
    this.issues = issues;
  }
}

export const unauthenticated = () => new AppError("unauthenticated", "Sign in to continue.");
export const forbidden = (message: string) => new AppError("forbidden", message);
export const notFound = (what: string) => new AppError("not_found", `${what} was not found.`);
export const conflict = (message: string, field?: string) =>
  new AppError("conflict", message, field ? [{ field, message }] : []);
export const gone = (message: string) => new AppError("gone", message);
export const invalid = (issues: FieldIssue[], message = "Some fields need attention.") =>
  new AppError("invalid", message, issues);

/** work on our side failed (a document that would not render); the message says what was kept */
export const failed = (message: string) => new AppError("failed", message);

/** a limit was reached; the message says how long to wait */
export const tooMany = (message: string) => new AppError("too_many", message);
export const tooLarge = (limitBytes: number, field?: string) => {
  const message = `The request is larger than this action accepts (${formatBytes(limitBytes)}). Nothing was changed.`;
  return new AppError("too_large", message, field ? [{ field, message }] : []);
};
export const unsupportedMedia = (expected: string) =>
  new AppError("unsupported_media", `Send this request as ${expected}. Nothing was changed.`);

function formatBytes(n: number): string {
  return n >= 1048576 ? `${Math.round(n / 1048576)} MB` : `${Math.round(n / 1024)} KB`;
}

export const STATUS: Record<ErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  invalid: 422,
  too_many: 429,
  bad_request: 400,
  failed: 500,
  too_large: 413,
  unsupported_media: 415,
};
