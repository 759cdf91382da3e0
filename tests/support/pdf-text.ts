/**
 * The text of a PDF page by page, read back with Mozilla's PDF.js (pdfjs-dist, its legacy build
 * for Node): what a reader's viewer would find, not what our renderer meant to write.
 */
import path from "node:path";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

// Only needed for fonts a PDF does not embed (ours embeds all); set so PDF.js does not warn.
const standardFontDataUrl = `${path.join(process.cwd(), "node_modules/pdfjs-dist/standard_fonts")}/`;

export async function pdfPages(bytes: Uint8Array): Promise<string[]> {
  // PDF.js takes ownership of the buffer it is given: hand it a copy.
  const doc = await getDocument({ data: bytes.slice(), isEvalSupported: false, disableFontFace: true, useSystemFonts: false, standardFontDataUrl }).promise;
  const pages: string[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const page = await doc.getPage(n);
    const content = await page.getTextContent();
    // Runs that touch on one line are one word (the renderer splits a hash where digits meet
    // letters); anything further apart is separated by a space.
    let text = "";
    let end: { x: number; y: number } | null = null;
    for (const item of content.items) {
      if (!("str" in item)) continue;
      const [x, y] = [item.transform[4], item.transform[5]];
      const touching = end !== null && Math.abs(y - end.y) < 0.5 && Math.abs(x - end.x) < 0.5;
      text += (touching ? "" : " ") + item.str;
      end = { x: x + item.width, y };
    }
    pages.push(text.replace(/\s+/g, " ").trim());
  }
  await doc.destroy();
  return pages;
}
