// A stored file as an HTTP response: its type, length and name, private caching, no sniffing,
// and, where its SHA-256 is known, the Repr-Digest field (RFC 9530) so a client can check it.
export function fileResponse(file: { bytes: Uint8Array | Buffer; mime: string; name: string; sha256?: string; download?: boolean }): Response {
  const name = file.name.replace(/["\\\r\n]/g, "_");
  const headers: Record<string, string> = {
    "content-type": file.mime,
    "content-length": String(file.bytes.byteLength),
    "content-disposition": `${file.download ? "attachment" : "inline"}; filename="${name}"`,
    "cache-control": "private, max-age=3600",
    "x-content-type-options": "nosniff",
  };
  if (file.sha256) headers["repr-digest"] = `sha-256=:${Buffer.from(file.sha256, "hex").toString("base64")}:`;
  return new Response(new Uint8Array(file.bytes), { headers });
}
