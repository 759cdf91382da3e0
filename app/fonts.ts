import localFont from "next/font/local";

// Fonts ship with the app (IBM Plex, SIL Open Font License; see fonts/OFL-ibm-plex.txt).
// The Greek face is a separate file so that α and other symbols render in the same type.
export const textFont = localFont({
  src: [
    { path: "../fonts/ibm-plex-sans-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/ibm-plex-sans-latin-500-normal.woff2", weight: "500", style: "normal" },
    { path: "../fonts/ibm-plex-sans-latin-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-text",
  display: "swap",
});

export const greekFont = localFont({
  src: [
    { path: "../fonts/ibm-plex-sans-greek-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/ibm-plex-sans-greek-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-greek",
  display: "swap",
});

export const figureFont = localFont({
  src: [
    { path: "../fonts/ibm-plex-mono-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/ibm-plex-mono-latin-500-normal.woff2", weight: "500", style: "normal" },
  ],
  variable: "--font-figures",
  display: "swap",
});
