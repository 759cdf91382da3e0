import { AppError, tooLarge, unsupportedMedia } from "@/lib/errors";

// Request bodies, read with a ceiling: a declared Content-Length over the limit is refused
// before a byte is read, and a body without one is read only up to the limit. The route
// wrapper calls these after the session check, so a stranger's body is never read at all.

export const JSON_LIMIT = 256 * 1024;
// Deeper than any form of ours nests; far shallower than what would exhaust the stack of a
// validator walking it.
const MAX_JSON_DEPTH = 32;

export async function readBytes(req: Request, limit: number): Promise<Uint8Array<ArrayBuffer>> {
  const declared = req.headers.get("content-length");
  if (declared !== null) {
    if (!/^\d+$/.test(declared.trim())) throw new AppError("bad_request", "The request's Content-Length is not a number.");
    if (Number(declared) > limit) throw tooLarge(limit);
  }
  if (!req.body) return new Uint8Array(new ArrayBuffer(0));
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      // Stop pulling from the socket; what is left is never buffered.
      reader.cancel().catch(() => undefined);
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    bytes.set(c, at);
    at += c.byteLength;
  }
  return bytes;
}

const mediaType = (req: Request) => (req.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
const isJsonType = (type: string) => type === "application/json" || /^application\/[a-z0-9.+-]+\+json$/.test(type);

// A JSON body's text. A form post (text/plain, urlencoded, multipart) is refused with 415
// even when empty, since no page of ours sends one; no body and no type reads as "".
export async function readJsonText(req: Request, limit = JSON_LIMIT): Promise<string> {
  const type = mediaType(req);
  if (type && !isJsonType(type)) throw unsupportedMedia("JSON (Content-Type: application/json)");
  const bytes = await readBytes(req, limit);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("bad_request", "The request body is not valid UTF-8 text.");
  }
  if (text.trim() && !type) throw unsupportedMedia("JSON (Content-Type: application/json)");
  return text;
}

export async function readJsonBody(req: Request, limit = JSON_LIMIT): Promise<unknown> {
  const text = await readJsonText(req, limit);
  if (!text.trim()) return {};
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
  if (depthExceeds(value, MAX_JSON_DEPTH)) throw new AppError("bad_request", `The request body nests deeper than ${MAX_JSON_DEPTH} levels.`);
  return value;
}

// Room for the multipart framing and the other fields around an uploaded file.
const MULTIPART_OVERHEAD = 64 * 1024;

// A multipart upload, parsed only after its bytes were read within the file limit and the
// framing around it; a refusal names the file field, where the person chose the file.
export async function readFormBody(req: Request, fileLimit: number): Promise<FormData> {
  const limit = fileLimit + MULTIPART_OVERHEAD;
  const header = req.headers.get("content-type") ?? "";
  if (mediaType(req) !== "multipart/form-data") throw unsupportedMedia("multipart/form-data with the fields purpose and file");
  const bytes = await readBytes(req, limit).catch((e: unknown) => {
    throw e instanceof AppError && e.code === "too_large" ? tooLarge(fileLimit, "file") : e;
  });
  try {
    return await new Response(bytes, { headers: { "content-type": header } }).formData();
  } catch {
    throw new AppError("bad_request", "The upload is not well-formed multipart/form-data.");
  }
}

function depthExceeds(value: unknown, max: number): boolean {
  const stack: [unknown, number][] = [[value, 1]];
  while (stack.length) {
    const [v, depth] = stack.pop()!;
    if (v === null || typeof v !== "object") continue;
    if (depth > max) return true;
    for (const child of Array.isArray(v) ? v : Object.values(v)) stack.push([child, depth + 1]);
  }
  return false;
}

/** A file field of a multipart body: its name as sent and its bytes, or null bytes when none was sent. */
export async function uploadedFile(form: FormData, fallbackName: string, field = "file"): Promise<{ name: string; bytes: Uint8Array | null }> {
  const file = form.get(field);
  return { name: file instanceof File ? file.name : fallbackName, bytes: file instanceof Blob ? new Uint8Array(await file.arrayBuffer()) : null };
}
