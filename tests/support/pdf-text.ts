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
    const text = content.items.map((item) => ("str" in item ? item.str : "")).join(" ");
    pages.push(text.replace(/\s+/g, " ").trim());
  }
  await doc.destroy();
  return pages;
}
