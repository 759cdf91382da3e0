/**
 * Cavitas's look on paper (SPEC section 10): a warm off-white ground, ink-dark navy for lines and
 * text, one copper accent for resonance peaks and what is being pointed at, amber and red only for
 * rule breaks and failures. The same colours as the screens (tailwind.config.ts).
 */
import { StyleSheet } from "@react-pdf/renderer";
import { FIGURES, SANS } from "./fonts";

export const COLOURS = {
  paper: "#fbf8f1",
  paperDeep: "#f1ebdf",
  rule: "#d9cfbb",
  ink: "#1a2740",
  inkSoft: "#44506a",
  inkFaint: "#7c8598",
  copper: "#b0602f",
  copperSoft: "#e9c8b0",
  copperDeep: "#8a4520",
  caution: "#c98a12",
  cautionSoft: "#f5e3b8",
  fault: "#a8281f",
  faultSoft: "#f3d3cf",
  sage: "#4f6f52",
  sageSoft: "#d9e4d6",
} as const;

export const styles = StyleSheet.create({
  // No lineHeight here: @react-pdf resolves a page's lineHeight against the page's own font size
  // and passes the result down, so large headings would overlap the line below them.
  page: { backgroundColor: COLOURS.paper, color: COLOURS.ink, fontFamily: SANS, fontSize: 8.5, paddingTop: 36, paddingBottom: 48, paddingHorizontal: 40 },
  h1: { fontSize: 20, fontWeight: 600, marginBottom: 6 },
  h2: { fontSize: 13, fontWeight: 600, marginBottom: 6, marginTop: 4 },
  h3: { fontSize: 10, fontWeight: 600, marginBottom: 4, marginTop: 8 },
  kicker: { fontSize: 7.5, fontWeight: 600, letterSpacing: 1.2, color: COLOURS.copperDeep, textTransform: "uppercase", marginBottom: 3 },
  body: { fontSize: 8.5, marginBottom: 4 },
  small: { fontSize: 7.5, color: COLOURS.inkSoft },
  soft: { color: COLOURS.inkSoft },
  figures: { fontFamily: FIGURES },
  label: { fontSize: 7, fontWeight: 600, color: COLOURS.inkSoft, textTransform: "uppercase", letterSpacing: 0.6 },
  rule: { borderBottomWidth: 0.75, borderBottomColor: COLOURS.rule, marginVertical: 8 },
  footer: { position: "absolute", bottom: 20, left: 40, right: 40, flexDirection: "row", justifyContent: "space-between", fontSize: 7, color: COLOURS.inkFaint, borderTopWidth: 0.5, borderTopColor: COLOURS.rule, paddingTop: 5 },
});
