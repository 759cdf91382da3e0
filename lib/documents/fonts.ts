/**
 * The shipped fonts (fonts/, IBM Plex under the SIL Open Font Licence) registered with
 * @react-pdf/renderer, which embeds the glyphs it uses: Plex Sans for text, Plex Mono for
 * figures, codes and hashes. The Latin files lack Greek, so both fall back to the Greek file for
 * α and friends. Each .woff is handed over unwrapped (woff.ts). Registered once per process.
 */
import fs from "node:fs";
import path from "node:path";
import { Font } from "@react-pdf/renderer";
import { woffToSfnt } from "./woff";

export const SANS = ["Plex Sans", "Plex Sans Greek"];
/** numbers, codes and hashes */
export const FIGURES = ["Plex Mono", "Plex Sans Greek"];

let registered = false;

export function registerDocumentFonts(fontsDir = path.join(process.cwd(), "fonts")): void {
  if (registered) return;
  const file = (name: string) => {
    const woff = new Uint8Array(fs.readFileSync(path.join(fontsDir, `${name}.woff`)));
    return `data:font/ttf;base64,${Buffer.from(woffToSfnt(woff)).toString("base64")}`;
  };
  Font.register({
    family: "Plex Sans",
    fonts: [
      { src: file("ibm-plex-sans-latin-400-normal"), fontWeight: 400 },
      { src: file("ibm-plex-sans-latin-500-normal"), fontWeight: 500 },
      { src: file("ibm-plex-sans-latin-600-normal"), fontWeight: 600 },
    ],
  });
  Font.register({
    family: "Plex Sans Greek",
    fonts: [
      { src: file("ibm-plex-sans-greek-400-normal"), fontWeight: 400 },
      { src: file("ibm-plex-sans-greek-600-normal"), fontWeight: 600 },
    ],
  });
  Font.register({
    family: "Plex Mono",
    fonts: [
      { src: file("ibm-plex-mono-latin-400-normal"), fontWeight: 400 },
      { src: file("ibm-plex-mono-latin-500-normal"), fontWeight: 500 },
    ],
  });
  // Words are not hyphenated: codes, hashes and class names must never be split.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
