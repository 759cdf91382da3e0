/**
 * WOFF 1.0 to plain SFNT (TrueType/OpenType) bytes, in memory (W3C WOFF File Format 1.0,
 * 2012, sections 3–5: a 44-byte header, a 20-byte directory entry per table, each table
 * zlib-compressed unless compression would not make it smaller). The shipped .woff files stay
 * as they are; the PDF renderer is handed the same font unwrapped, because fontkit re-inflates a
 * WOFF table on every glyph it reads (slow), fails on Plex Mono's .woff (it reads the empty
 * glyphs at the end of the glyf table past the inflated table's end) and embeds a .woff2's
 * glyphs with empty outlines.
 */
import { inflateSync } from "node:zlib";

const WOFF_SIGNATURE = 0x774f4646; // "wOFF"

export function woffToSfnt(woff: Uint8Array): Uint8Array {
  const src = new DataView(woff.buffer, woff.byteOffset, woff.byteLength);
  if (src.getUint32(0) !== WOFF_SIGNATURE) throw new Error("not a WOFF 1.0 font");
  const flavor = src.getUint32(4);
  const numTables = src.getUint16(12);
  const tables = Array.from({ length: numTables }, (_, i) => {
    const at = 44 + 20 * i;
    const offset = src.getUint32(at + 4);
    const compLength = src.getUint32(at + 8);
    const origLength = src.getUint32(at + 12);
    const stored = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? new Uint8Array(inflateSync(stored)) : stored;
    if (data.length !== origLength) throw new Error("a WOFF table does not inflate to its stated length");
    return { tag: src.getUint32(at), checksum: src.getUint32(at + 16), data };
  });
  const pad4 = (n: number) => (n + 3) & ~3;
  const headerSize = 12 + 16 * numTables;
  const total = tables.reduce((sum, t) => sum + pad4(t.data.length), headerSize);
  const out = new Uint8Array(total);
  const dst = new DataView(out.buffer);
  // Offset table (OpenType spec, "Organization of an OpenType font").
  const power = 2 ** Math.floor(Math.log2(numTables));
  dst.setUint32(0, flavor);
  dst.setUint16(4, numTables);
  dst.setUint16(6, power * 16);
  dst.setUint16(8, Math.log2(power));
  dst.setUint16(10, numTables * 16 - power * 16);
  let offset = headerSize;
  tables.forEach((t, i) => {
    const at = 12 + 16 * i;
    dst.setUint32(at, t.tag);
    dst.setUint32(at + 4, t.checksum);
    dst.setUint32(at + 8, offset);
    dst.setUint32(at + 12, t.data.length);
    out.set(t.data, offset);
    offset += pad4(t.data.length);
  });
  return out;
}
