import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { env } from "@/lib/env";
import { invalid } from "@/lib/errors";

// Uploads on disk: type checked by content (magic bytes, never the name or the browser's
// claim), size-limited, stored under the data folder by the SHA-256 of the content, so the
// same file uploaded twice is kept once and a stored file can never be overwritten.

export type UploadKind = "pdf" | "png" | "jpeg" | "webp" | "zip";

const MIME: Record<UploadKind, string> = { pdf: "application/pdf", png: "image/png", jpeg: "image/jpeg", webp: "image/webp", zip: "application/zip" };
const EXT: Record<UploadKind, string> = { pdf: "pdf", png: "png", jpeg: "jpg", webp: "webp", zip: "zip" };

export function sniff(bytes: Uint8Array): UploadKind | null {
  const starts = (sig: number[], offset = 0) => sig.every((b, i) => bytes[offset + i] === b);
  if (starts([0x25, 0x50, 0x44, 0x46, 0x2d])) return "pdf"; // %PDF-
  if (starts([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "png";
  if (starts([0xff, 0xd8, 0xff])) return "jpeg";
  if (starts([0x52, 0x49, 0x46, 0x46]) && starts([0x57, 0x45, 0x42, 0x50], 8)) return "webp"; // RIFF....WEBP
  if (starts([0x50, 0x4b, 0x03, 0x04])) return "zip"; // PK\3\4, a local file header
  return null;
}

export const mimeOf = (kind: UploadKind) => MIME[kind];

// The endings a person may have given each type; any other is replaced or added to.
const ENDINGS: Record<UploadKind, readonly string[]> = { pdf: ["pdf"], png: ["png"], jpeg: ["jpg", "jpeg", "jpe"], webp: ["webp"], zip: ["zip"] };
const KNOWN_ENDINGS = new Set(Object.values(ENDINGS).flat());
const MAX_NAME = 120;

// A person's file name, made safe to keep and to send back: no control, direction-override or
// path characters, at most 120 characters, and an ending true to the content (a PDF sent as
// "plan.png" is kept as "plan.pdf"; "notes.txt" holding a PDF as "notes.txt.pdf").
export function fileNameFor(name: string, kind: UploadKind): string {
  const cleaned = name
    .replace(/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g, "")
    .normalize("NFC")
    .replace(/[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069]/g, "")
    .replace(/[\\/]/g, "_")
    .trim();
  const match = /^(.*)\.([A-Za-z0-9]{1,8})$/.exec(cleaned);
  const ending = match?.[2].toLowerCase();
  const base = match && ending && KNOWN_ENDINGS.has(ending) ? match[1] : cleaned;
  const keep = ending && ENDINGS[kind].includes(ending) ? ending : EXT[kind];
  const short = Array.from(base.replace(/^[.\s]+/, "")).slice(0, MAX_NAME).join("").trim();
  return `${short || "upload"}.${keep}`;
}

const WORDS: Record<UploadKind, string> = { pdf: "PDF", png: "PNG", jpeg: "JPEG", webp: "WebP", zip: "zip archive" };

export type StoredFile = { sha256: string; kind: UploadKind; mime: string; size: number };

export function storeFile(bytes: Uint8Array, allowed: readonly UploadKind[], field = "file"): StoredFile {
  const limit = env().uploadLimitBytes;
  if (bytes.byteLength === 0) throw invalid([{ field, message: "The file is empty." }]);
  if (bytes.byteLength > limit) {
    throw invalid([{ field, message: `The file is ${(bytes.byteLength / 1048576).toFixed(1)} MB; the limit is ${(limit / 1048576).toFixed(0)} MB.` }]);
  }
  const kind = sniff(bytes);
  if (!kind || !allowed.includes(kind)) {
    const want = allowed.map((k) => WORDS[k]).join(" or ");
    throw invalid([{ field, message: `This file is not a ${want} (its content was checked, not its name).` }]);
  }
  return writeContent(bytes, kind);
}

/**
 * A document Cavitas made itself (a submittal PDF, a shop pack), stored like an upload but
 * without the upload limit; its type is still read from its content.
 */
export function storeGenerated(bytes: Uint8Array, kind: "pdf" | "zip"): StoredFile {
  if (sniff(bytes) !== kind) throw new Error(`a generated ${WORDS[kind]} does not start like one`);
  return writeContent(bytes, kind);
}

function writeContent(bytes: Uint8Array, kind: UploadKind): StoredFile {
  const sha256 = crypto.createHash("sha256").update(bytes).digest("hex");
  const target = storedPath(sha256, kind);
  if (!fs.existsSync(target)) {
    fs.mkdirSync(path.dirname(target), { recursive: true });
    const tmp = `${target}.${process.pid}.${Date.now()}.tmp`;
    fs.writeFileSync(tmp, bytes, { flag: "wx" });
    fs.renameSync(tmp, target);
  }
  return { sha256, kind, mime: MIME[kind], size: bytes.byteLength };
}

export function storedPath(sha256: string, kind: UploadKind): string {
  if (!/^[0-9a-f]{64}$/.test(sha256)) throw new Error("not a content hash");
  return path.join(env().dataDir, "uploads", sha256.slice(0, 2), `${sha256}.${EXT[kind]}`);
}

export function kindOfMime(mime: string): UploadKind | null {
  const found = (Object.keys(MIME) as UploadKind[]).find((k) => MIME[k] === mime);
  return found ?? null;
}

export function readStoredFile(sha256: string, mime: string): Buffer {
  const kind = kindOfMime(mime);
  if (!kind) throw new Error(`unknown stored type ${mime}`);
  return fs.readFileSync(storedPath(sha256, kind));
}
