import fs from "node:fs";
import path from "node:path";
import * as fontkit from "fontkit";
import { describe, expect, it } from "vitest";
import { woffToSfnt } from "@/lib/documents/woff";

// Reference: fontkit (the font library @react-pdf uses) reading the same font from its .woff2
// file, an independent encoding of the same glyphs (W3C WOFF 2.0), against our unwrapping of
// the .woff file (W3C WOFF 1.0).
const FONTS = ["ibm-plex-sans-latin-400-normal", "ibm-plex-sans-latin-600-normal", "ibm-plex-sans-greek-400-normal", "ibm-plex-mono-latin-400-normal", "ibm-plex-mono-latin-500-normal"];
const read = (file: string) => new Uint8Array(fs.readFileSync(path.join(process.cwd(), "fonts", file)));
const open = (bytes: Uint8Array) => fontkit.create(Buffer.from(bytes)) as fontkit.Font;

describe("WOFF 1.0 unwrapped to SFNT", () => {
  it.each(FONTS)("%s: same glyphs, advances and outlines as its .woff2", (name) => {
    const sfnt = open(woffToSfnt(read(`${name}.woff`)));
    const reference = open(read(`${name}.woff2`));
    expect(sfnt.numGlyphs).toBe(reference.numGlyphs);
    expect(sfnt.postscriptName).toBe(reference.postscriptName);
    const sample = name.includes("greek") ? "αβγ ρσω" : "Hello 0123 Ø × – ·";
    const a = sfnt.layout(sample);
    const b = reference.layout(sample);
    expect(a.glyphs.map((g) => g.id)).toEqual(b.glyphs.map((g) => g.id));
    expect(a.positions.map((p) => p.xAdvance)).toEqual(b.positions.map((p) => p.xAdvance));
    expect(a.glyphs.map((g) => g.path.commands.length)).toEqual(b.glyphs.map((g) => g.path.commands.length));
  });

  it("refuses what is not WOFF 1.0", () => {
    expect(() => woffToSfnt(read("ibm-plex-mono-latin-400-normal.woff2"))).toThrow("not a WOFF 1.0 font");
  });
});
