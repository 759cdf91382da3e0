/**
 * The built-in library of room finishes, with octave-band absorption coefficients 125–4000 Hz.
 *
 * Each value is a published one, with its source in the data so that screens and documents can
 * print it: the book, edition, table and printed pages, the original source the book credits for
 * the row, and the row as the book describes it. The figures were read in open transcriptions of
 * the printed tables, not in the printed books, and say so ("as transcribed"). A finish for which
 * no published row was found keeps a value recalled from memory, and says that instead.
 *
 * 63 Hz: none of these tables gives a 63 Hz value for these rows, so none is given ("no data"),
 * rather than extrapolated. Real products vary widely (mounting, thickness, air space, paint): use
 * a test report of the actual product as a project material where it matters. The opening to a
 * large space is α = 1 by definition (sound that leaves does not come back).
 */
import { z } from "zod";
import { octaveRecordSchema, type OctaveRecord } from "./octaves";

export const MATERIAL_CATEGORIES = ["wall", "floor", "ceiling", "opening", "furnishing", "any"] as const;
export type MaterialCategory = (typeof MATERIAL_CATEGORIES)[number];

export type MaterialProvenance = "published, as transcribed" | "from memory" | "by definition";

/** Where a published row was printed. */
export interface Citation {
  /** the book: authors, title, edition, publisher and year */
  work: string;
  /** where in the book: appendix or table, and printed pages */
  table: string;
  /** the original source the book credits for the row, if it names one */
  credited: string | null;
  /** the row as the transcription of the table names the finish */
  row: string;
}

export interface Material {
  /** stable kebab-case key, stored with surfaces and openings */
  key: string;
  name: string;
  category: MaterialCategory;
  /** absorption coefficient by nominal octave label, "125" … "4000" (and "63" where known) */
  alpha: OctaveRecord;
  /** one line for screens and documents: the citation, or why there is none */
  source: string;
  /** the same, short enough for a line under a field: "Cox & D'Antonio 2017, App. A, after Harris (1991)" */
  short: string;
  provenance: MaterialProvenance;
  citation: Citation | null;
}

/**
 * Octave α of a project material (a consultant's own, e.g. from an ISO 354 or ASTM C423 test
 * report): 125–4000 Hz required, 63 Hz optional, each in [0, 1.5] since reverberation-room
 * (Sabine) coefficients of real products can exceed 1.
 */
export const materialAlphaSchema = octaveRecordSchema("absorption coefficient, 0 to 1.5", 0, 1.5);
export type MaterialAlpha = z.infer<typeof materialAlphaSchema>;

interface Work {
  work: string;
  table: string;
  /** author, year and place, for a line on screen */
  short: string;
}

const COX: Work = {
  work: "T. J. Cox & P. D'Antonio, Acoustic Absorbers and Diffusers, 3rd ed., CRC Press 2017",
  table: "Appendix A, Table of absorption coefficients, pp. 475–479",
  short: "Cox & D'Antonio 2017, App. A",
};
const LONG: Work = {
  work: "M. Long, Architectural Acoustics, 2nd ed., Academic Press 2014",
  table: "Table 7.1 (ASTM C423, mounting E400: 400 mm air space)",
  short: "Long 2014, Table 7.1",
};
const BIES: Work = {
  work: "D. A. Bies, C. H. Hansen & C. Q. Howard, Engineering Noise Control, 5th ed., 2017",
  table: "Table 6.2",
  short: "Bies, Hansen & Howard 2017, Table 6.2",
};

/** "Book, table, after its credited source: "row" (as transcribed)". */
export function citationText(c: Citation): string {
  return `${c.work}, ${c.table}${c.credited ? `, after ${c.credited}` : ""}: "${c.row}" (as transcribed from the printed table)`;
}

/** α at 125, 250, 500, 1000, 2000, 4000 Hz, in that order. */
type Six = readonly [number, number, number, number, number, number];

const octaves = (six: Six): OctaveRecord => Object.fromEntries(["125", "250", "500", "1000", "2000", "4000"].map((label, i) => [label, six[i]]));

function published(key: string, name: string, category: MaterialCategory, six: Six, from: Work, credited: string | null, row: string): Material {
  const citation: Citation = { work: from.work, table: from.table, credited, row };
  const short = `${from.short}${credited ? `, after ${credited}` : ""}`;
  return { key, name, category, alpha: octaves(six), source: citationText(citation), short, provenance: "published, as transcribed", citation };
}

const NOT_FOUND = "No published value was found for this finish: a typical handbook figure recalled from memory, not checked against a table";

function recalled(key: string, name: string, category: MaterialCategory, six: Six, note: string): Material {
  return { key, name, category, alpha: octaves(six), source: `${NOT_FOUND}. ${note}`, short: "from memory: no published value found", provenance: "from memory", citation: null };
}

export const MATERIALS: readonly Material[] = [
  // hard surfaces
  published("painted-concrete", "Concrete, smooth, painted or glazed", "any", [0.01, 0.01, 0.01, 0.02, 0.02, 0.02], COX, "Lynge (2001); Bobran (1973)", "smooth concrete, painted or glazed"),
  published("unpainted-concrete", "Concrete, smooth, unpainted", "any", [0.01, 0.01, 0.02, 0.02, 0.02, 0.05], COX, "Lynge (2001); Bobran (1973)", "smooth concrete, unpainted"),
  published("rough-concrete", "Concrete, rough", "any", [0.02, 0.03, 0.03, 0.03, 0.04, 0.07], COX, "ISO/TR 11690-3 (1997)", "rough concrete"),
  published("concrete-block-unpainted", "Concrete block, coarse, unpainted", "wall", [0.36, 0.44, 0.31, 0.29, 0.39, 0.25], COX, "Harris (1991)", "concrete block, coarse (unpainted)"),
  published("concrete-block-painted", "Concrete block, painted", "wall", [0.1, 0.05, 0.06, 0.07, 0.09, 0.08], COX, "Harris (1991); Everest (2001); Young (1959)", "concrete block, painted"),
  published("plaster-on-masonry", "Plaster, smooth, on brick or tile", "any", [0.013, 0.015, 0.02, 0.03, 0.04, 0.05], COX, "Harris (1991)", "smooth plaster on brick or tile"),
  published("lime-cement-plaster", "Lime cement plaster", "any", [0.02, 0.02, 0.03, 0.04, 0.05, 0.05], COX, "Bobran (1973)", "lime cement plaster"),
  published("painted-plaster", "Plaster, painted", "any", [0.02, 0.02, 0.02, 0.02, 0.02, 0.02], COX, "Kristensen (1984); Lynge (2001)", "painted plaster"),
  published("brick-unglazed", "Brick, unglazed, unpainted", "wall", [0.03, 0.03, 0.03, 0.04, 0.05, 0.07], COX, "Harris (1991)", "brick, unglazed"),
  published("brick-painted", "Brick, unglazed, painted", "wall", [0.01, 0.01, 0.02, 0.02, 0.02, 0.03], COX, "Harris (1991)", "brick, unglazed, painted"),
  recalled("ceramic-tile", "Ceramic tile, glazed", "any", [0.01, 0.01, 0.01, 0.02, 0.02, 0.02], "Glazed tile or similar hard sealed stone on a solid backing; the published rows for smooth painted or glazed concrete give the same figures."),
  published("water-surface", "Water surface (pool)", "floor", [0.01, 0.01, 0.01, 0.01, 0.02, 0.02], COX, "Knudsen & Harris (1953)", "water surface (pool)"),
  // boards and panelling
  published("gypsum-board-on-studs", "Gypsum board 12.7 mm nailed to studs", "wall", [0.29, 0.1, 0.05, 0.04, 0.07, 0.09], COX, "Harris (1991)", "gypsum board 12.7 mm nailed to studs"),
  published("gypsum-board-ceiling", "Plasterboard 13 mm on frame, 100 mm empty cavity", "any", [0.08, 0.11, 0.05, 0.03, 0.02, 0.03], COX, "Lynge (2001); Fasold & Winkler (1976)", "plasterboard 13 mm on frame, 100 mm empty cavity"),
  published("plasterboard-mineral-wool", "Plasterboard 13 mm on frame, 100 mm cavity with mineral wool", "any", [0.3, 0.12, 0.08, 0.06, 0.06, 0.05], COX, "Lynge (2001); Fasold & Winkler (1976)", "plasterboard 13 mm on frame, 100 mm cavity with mineral wool"),
  published("plasterboard-double-steel-frame", "2 × 13 mm plasterboard on steel frame, 50 mm mineral wool, painted", "any", [0.15, 0.1, 0.06, 0.04, 0.04, 0.05], COX, "Lynge (2001); Petersen (1983)", "2 × 13 mm plasterboard on steel frame, 50 mm mineral wool, painted"),
  published("plywood-on-battens", "Plywood panelling 10 mm", "wall", [0.28, 0.22, 0.17, 0.09, 0.1, 0.11], COX, "Harris (1991); PTB", "plywood panelling 10 mm"),
  published("wood-panelling-air-space", "Wood panelling 9.5–12.7 mm over 50–100 mm air space", "wall", [0.3, 0.25, 0.2, 0.17, 0.15, 0.1], COX, "Beranek (1954)", "wood panelling 9.5–12.7 mm, 50–100 mm air space"),
  // ceilings
  published("mineral-fibre-ceiling-tile", "Mineral-fibre ceiling tile 16 mm, suspended 400 mm", "ceiling", [0.68, 0.76, 0.6, 0.65, 0.82, 0.76], LONG, null, "standard mineral fibre, 5/8 in"),
  published("mineral-fibre-tile-19mm", "Mineral-fibre ceiling tile 19 mm, suspended 400 mm", "ceiling", [0.72, 0.84, 0.7, 0.79, 0.76, 0.81], LONG, null, "standard mineral fibre, 3/4 in"),
  published("mineral-tile-on-slab", "Mineral tile 13 mm fixed to the slab", "ceiling", [0.1, 0.25, 0.7, 0.85, 0.7, 0.6], BIES, null, "13 mm mineral tile fixed to the slab"),
  published("mineral-tile-suspended-500", "Mineral tile 13 mm suspended 500 mm below the slab", "ceiling", [0.75, 0.7, 0.65, 0.85, 0.85, 0.9], BIES, null, "13 mm mineral tile suspended 500 mm below"),
  // openings
  published("glass-large-pane", "Glass, large heavy panes", "opening", [0.18, 0.06, 0.04, 0.03, 0.02, 0.02], COX, "Harris (1991); Everest (2001); Young (1959)", "glass, large heavy panes"),
  published("window-glass", "Glass, ordinary window", "opening", [0.35, 0.25, 0.18, 0.12, 0.07, 0.04], COX, "Harris (1991); PTB", "glass, ordinary window"),
  published("double-glazing", "Double glazing, 2–3 mm panes, gap over 30 mm", "opening", [0.15, 0.05, 0.03, 0.03, 0.02, 0.02], COX, "Lynge (2001); Fasold & Winkler (1976)", "double glazing, 2–3 mm panes, > 30 mm gap"),
  published("timber-door", "Door, solid timber", "opening", [0.14, 0.1, 0.06, 0.08, 0.1, 0.1], COX, "Lynge (2001); Bobran (1973)", "solid timber door"),
  {
    key: "open-opening",
    name: "Open doorway or vent to a large space",
    category: "opening",
    alpha: { "63": 1, "125": 1, "250": 1, "500": 1, "1000": 1, "2000": 1, "4000": 1 },
    source:
      "Idealisation: sound passing through an opening into a much larger space or outdoors does not come back, so the opening absorbs all of it (α = 1 in every band). An opening into a small or reverberant neighbouring room returns some sound and absorbs less.",
    short: "by definition: α = 1",
    provenance: "by definition",
    citation: null,
  },
  // floors
  published("timber-floor-on-joists", "Floor boards on joists", "floor", [0.15, 0.2, 0.1, 0.1, 0.1, 0.1], COX, "Fry (1987)", "floor boards on joists"),
  published("wood-floor", "Wood floor", "floor", [0.15, 0.11, 0.1, 0.07, 0.06, 0.07], COX, "Harris (1991)", "wood floor"),
  published("parquet-on-concrete", "Parquet in asphalt on concrete", "floor", [0.04, 0.04, 0.07, 0.06, 0.06, 0.07], COX, "Beranek (1954)", "parquet in asphalt on concrete"),
  published("vinyl-on-concrete", "Linoleum or vinyl stuck to concrete", "floor", [0.02, 0.02, 0.03, 0.04, 0.04, 0.05], COX, "Lynge (2001); Petersen (1983)", "linoleum or vinyl stuck to concrete"),
  recalled("timber-stage", "Timber stage floor", "floor", [0.4, 0.3, 0.2, 0.17, 0.15, 0.1], "Boarded stage or platform over a large air space."),
  published("carpet-heavy-on-concrete", "Carpet, heavy, on concrete", "floor", [0.02, 0.06, 0.14, 0.37, 0.6, 0.65], COX, "Harris (1991)", "heavy carpet on concrete"),
  recalled("carpet-thin-on-concrete", "Carpet, thin, glued to concrete", "floor", [0.02, 0.04, 0.08, 0.2, 0.35, 0.4], "Low-pile carpet glued to a slab, no underlay."),
  published("carpet-thin-on-underlay", "Carpet, thin (6 mm), on underlay", "floor", [0.03, 0.09, 0.2, 0.54, 0.7, 0.72], COX, "Parkin, Humphreys & Cowell (1979)", "thin (6 mm) carpet on underlay"),
  published("carpet-heavy-on-underlay", "Carpet, thick (9 mm), on underlay", "floor", [0.08, 0.08, 0.3, 0.6, 0.75, 0.8], COX, "Harris (1991)", "thick (9 mm) carpet on underlay"),
  // furnishings
  published("heavy-curtain", "Heavy velour curtain 0.61 kg/m², draped to half its area", "furnishing", [0.14, 0.35, 0.55, 0.77, 0.7, 0.6], COX, "Beranek (1954)", "heavy velour curtain 0.61 kg/m², draped to half area"),
  published("seating-upholstered-empty", "Upholstered seating, empty (per m² of seating)", "furnishing", [0.44, 0.6, 0.77, 0.89, 0.82, 0.7], COX, "Bies & Hansen (1996)", "upholstered seating, unoccupied (per m² of seating)"),
  published("audience-upholstered", "Audience in theatre seats (per m² of seating)", "furnishing", [0.41, 0.58, 0.8, 0.9, 0.92, 0.89], COX, "Beranek (1954); Davies, Orlowski & Lam (1994)", "occupied theatre seating (per m² of seating)"),
];

const BY_KEY = new Map(MATERIALS.map((material) => [material.key, material]));

export function findMaterial(key: string): Material | undefined {
  return BY_KEY.get(key);
}

/** The library's finishes that suit a surface or opening (those for any surface included). */
export function materialsFor(category: MaterialCategory): Material[] {
  return MATERIALS.filter((material) => material.category === category || material.category === "any");
}
