import { create as contentDisposition } from "content-disposition";

// Headers for sending a stored file back. The name goes in `filename*=UTF-8''…` (RFC 6266
// with RFC 8187 encoding), which every current browser reads, and in a plain-ASCII `filename`
// for any that does not: "plan-é.png" falls back to "plan-e.png", "图纸.png" to "file.png".
// With `sha256`, also the Repr-Digest field (RFC 9530), so a client can check what it received;
// with `attachment`, the browser saves the file instead of showing it.
export function downloadHeaders(file: { name: string; mime: string; size: number; sha256?: string; attachment?: boolean }): Record<string, string> {
  return {
    "content-type": file.mime,
    "content-length": String(file.size),
    "content-disposition": contentDisposition(file.name, { type: file.attachment ? "attachment" : "inline", fallback: asciiFallback(file.name) }),
    "cache-control": "private, max-age=3600",
    "x-content-type-options": "nosniff",
    ...(file.sha256 && { "repr-digest": `sha-256=:${Buffer.from(file.sha256, "hex").toString("base64")}:` }),
  };
}

/** A stored file as the response to a download. */
export function downloadResponse(file: { bytes: Uint8Array | Buffer; name: string; mime: string; sha256?: string; attachment?: boolean }): Response {
  return new Response(new Uint8Array(file.bytes), { headers: downloadHeaders({ ...file, size: file.bytes.byteLength }) });
}

export function asciiFallback(name: string): string {
  const dot = name.lastIndexOf(".");
  const [base, ending] = dot > 0 ? [name.slice(0, dot), name.slice(dot)] : [name, ""];
  const plain = base
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[^\x20-\x7e]|["\\%]/g, "_")
    .replace(/_+/g, "_")
    .trim();
  return `${/[A-Za-z0-9]/.test(plain) ? plain : "file"}${ending.replace(/[^\x21-\x7e]|["\\%]/g, "")}`;
}
