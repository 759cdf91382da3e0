/**
 * The built-in library of common room finishes, with octave-band absorption coefficients
 * 125–4000 Hz (63 Hz only where a value is known).
 *
 * Provenance, honestly: every finish value below is a typical handbook figure recalled from
 * memory, not copied from a table we could check, so each carries "typical, from memory".
 * Real products vary widely (mounting, thickness, air space, paint); use a test report of the
 * actual product as a project material where it matters. The one exception is the opening to a
 * large space, whose α = 1 is the usual idealisation (sound that leaves does not come back).
 */
import { z } from "zod";
import { octaveRecordSchema, type OctaveRecord } from "./octaves";

export const MATERIAL_CATEGORIES = ["wall", "floor", "ceiling", "opening", "furnishing", "any"] as const;
export type MaterialCategory = (typeof MATERIAL_CATEGORIES)[number];

/** "published" only with the exact table named in `source`. */
export type MaterialProvenance = "typical, from memory" | "published" | "by definition";

export interface Material {
  /** stable kebab-case key, stored with surfaces and openings */
  key: string;
  name: string;
  category: MaterialCategory;
  /** absorption coefficient by nominal octave label, "125" … "4000" (and "63" where known) */
  alpha: OctaveRecord;
  source: string;
  provenance: MaterialProvenance;
}

/**
 * Octave α of a project material (a consultant's own, e.g. from an ISO 354 or ASTM C423 test
 * report): 125–4000 Hz required, 63 Hz optional, each in [0, 1.5] since reverberation-room
 * (Sabine) coefficients of real products can exceed 1.
 */
export const materialAlphaSchema = octaveRecordSchema("absorption coefficient, 0 to 1.5", 0, 1.5);
export type MaterialAlpha = z.infer<typeof materialAlphaSchema>;

const RECALLED = "Typical handbook value, recalled from memory and not checked against a published table";

/** α at 125, 250, 500, 1000, 2000, 4000 Hz, in that order. */
type Six = readonly [number, number, number, number, number, number];

function typical(key: string, name: string, category: MaterialCategory, six: Six, note: string): Material {
  const alpha = Object.fromEntries(["125", "250", "500", "1000", "2000", "4000"].map((label, i) => [label, six[i]]));
  return { key, name, category, alpha, source: `${RECALLED}. ${note}`, provenance: "typical, from memory" };
}

export const MATERIALS: readonly Material[] = [
  typical("painted-concrete", "Concrete, smooth, painted", "any", [0.01, 0.01, 0.01, 0.02, 0.02, 0.02], "Poured concrete, sealed by paint."),
  typical("unpainted-concrete", "Concrete, smooth, unpainted", "any", [0.01, 0.02, 0.04, 0.06, 0.08, 0.1], "Fair-faced poured concrete."),
  typical("concrete-block-unpainted", "Concrete block, coarse, unpainted", "wall", [0.36, 0.44, 0.31, 0.29, 0.39, 0.25], "Open-textured block; paint closes the pores and removes most of this."),
  typical("concrete-block-painted", "Concrete block, painted", "wall", [0.1, 0.05, 0.06, 0.07, 0.09, 0.08], "Block wall with paint filling the surface pores."),
  typical("plaster-on-masonry", "Plaster on masonry", "any", [0.01, 0.02, 0.02, 0.03, 0.04, 0.05], "Gypsum or lime plaster, smooth finish, on brick or block."),
  typical("brick-unglazed", "Brick, unglazed, unpainted", "wall", [0.03, 0.03, 0.03, 0.04, 0.05, 0.07], "Exposed brickwork."),
  typical("brick-painted", "Brick, painted", "wall", [0.01, 0.01, 0.02, 0.02, 0.02, 0.03], "Exposed brickwork, painted."),
  typical("gypsum-board-on-studs", "Gypsum board on studs", "wall", [0.29, 0.1, 0.05, 0.04, 0.07, 0.09], "One layer of about 12.5 mm board on studs with an air space; the low-frequency value is panel resonance and depends on the build."),
  typical("gypsum-board-ceiling", "Gypsum board ceiling, suspended", "ceiling", [0.15, 0.11, 0.04, 0.04, 0.07, 0.08], "Closed (unperforated) board on a suspension grid."),
  typical("plywood-on-battens", "Plywood panelling on battens", "wall", [0.28, 0.22, 0.17, 0.09, 0.1, 0.11], "About 10 mm plywood over an air space on battens."),
  typical("ceramic-tile", "Ceramic tile, glazed", "any", [0.01, 0.01, 0.01, 0.02, 0.02, 0.02], "Glazed tile or similar hard sealed stone on a solid backing."),
  typical("glass-large-pane", "Glass, large heavy pane", "opening", [0.18, 0.06, 0.04, 0.03, 0.02, 0.02], "Large sheets of thick glass or glazed screens."),
  typical("window-glass", "Window, ordinary glass", "opening", [0.35, 0.25, 0.18, 0.12, 0.07, 0.04], "Ordinary window glass in frames; the low-frequency value is pane resonance."),
  typical("timber-door", "Door, solid timber", "opening", [0.14, 0.1, 0.06, 0.08, 0.1, 0.1], "Solid or heavy timber door, closed."),
  typical("timber-floor-on-joists", "Timber floor on joists", "floor", [0.15, 0.11, 0.1, 0.07, 0.06, 0.07], "Boards on joists with a void beneath."),
  typical("parquet-on-concrete", "Parquet on concrete", "floor", [0.04, 0.04, 0.07, 0.06, 0.06, 0.07], "Wood blocks or strip laid directly on a concrete slab."),
  typical("vinyl-on-concrete", "Vinyl or linoleum on concrete", "floor", [0.02, 0.03, 0.03, 0.03, 0.03, 0.02], "Resilient sheet or tile bonded to a slab."),
  typical("carpet-thin-on-concrete", "Carpet, thin, on concrete", "floor", [0.02, 0.04, 0.08, 0.2, 0.35, 0.4], "Low-pile carpet glued to a slab, no underlay."),
  typical("carpet-heavy-on-underlay", "Carpet, heavy, on underlay", "floor", [0.08, 0.24, 0.57, 0.69, 0.71, 0.73], "Heavy carpet on a foam or felt underlay."),
  typical("timber-stage", "Timber stage floor", "floor", [0.4, 0.3, 0.2, 0.17, 0.15, 0.1], "Boarded stage or platform over a large air space."),
  typical("mineral-fibre-ceiling-tile", "Mineral-fibre ceiling tile, suspended", "ceiling", [0.45, 0.6, 0.7, 0.8, 0.85, 0.85], "Ordinary lay-in acoustic tile about 15 mm thick on a grid with a deep void; products range widely."),
  typical("heavy-curtain", "Heavy curtain, draped", "furnishing", [0.14, 0.35, 0.55, 0.72, 0.7, 0.65], "Heavy velour gathered to about half its flat width, hung clear of the wall; area is the curtain's drawn area."),
  typical("seating-upholstered-empty", "Upholstered seating, empty", "furnishing", [0.49, 0.66, 0.8, 0.88, 0.82, 0.7], "Per m² of floor covered by the seating block, not per seat."),
  typical("audience-upholstered", "Audience in upholstered seats", "furnishing", [0.6, 0.74, 0.88, 0.96, 0.93, 0.85], "Per m² of floor covered by the seated audience, not per person."),
  {
    key: "open-opening",
    name: "Open doorway or vent to a large space",
    category: "opening",
    alpha: { "63": 1, "125": 1, "250": 1, "500": 1, "1000": 1, "2000": 1, "4000": 1 },
    source:
      "Idealisation: sound passing through an opening into a much larger space or outdoors does not come back, so the opening absorbs all of it (α = 1 in every band). An opening into a small or reverberant neighbouring room returns some sound and absorbs less.",
    provenance: "by definition",
  },
];

const BY_KEY = new Map(MATERIALS.map((material) => [material.key, material]));

export function findMaterial(key: string): Material | undefined {
  return BY_KEY.get(key);
}

/** The library's finishes that suit a surface or opening (those for any surface included). */
export function materialsFor(category: MaterialCategory): Material[] {
  return MATERIALS.filter((material) => material.category === category || material.category === "any");
}
