import { describe, expect, it } from "vitest";
import { MATERIALS, MATERIAL_CATEGORIES, findMaterial, materialAlphaSchema, materialsFor } from "@/lib/rooms/materials-library";

const REQUIRED = ["125", "250", "500", "1000", "2000", "4000"];

describe("materials library", () => {
  it("holds about 35–45 finishes with unique kebab-case keys", () => {
    expect(MATERIALS.length).toBeGreaterThanOrEqual(35);
    expect(MATERIALS.length).toBeLessThanOrEqual(45);
    const keys = MATERIALS.map((m) => m.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const key of keys) expect(key).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
  });

  it("keeps every key rooms may already store, so no saved room loses its finish", () => {
    const stored = [
      "painted-concrete", "unpainted-concrete", "concrete-block-unpainted", "concrete-block-painted", "plaster-on-masonry",
      "brick-unglazed", "brick-painted", "gypsum-board-on-studs", "gypsum-board-ceiling", "plywood-on-battens", "ceramic-tile",
      "glass-large-pane", "window-glass", "timber-door", "timber-floor-on-joists", "parquet-on-concrete", "vinyl-on-concrete",
      "carpet-thin-on-concrete", "carpet-heavy-on-underlay", "timber-stage", "mineral-fibre-ceiling-tile", "heavy-curtain",
      "seating-upholstered-empty", "audience-upholstered", "open-opening",
    ];
    for (const key of stored) expect(findMaterial(key), key).toBeDefined();
    expect(findMaterial("no-such-finish")).toBeUndefined();
  });

  it.each(MATERIALS.map((m) => [m.key, m] as const))("%s: α in [0, 1] at 125–4000 Hz, no 63 Hz value unless known, a category and a source", (_key, m) => {
    expect(MATERIAL_CATEGORIES).toContain(m.category);
    expect(m.name.length).toBeGreaterThan(0);
    for (const label of REQUIRED) {
      expect(m.alpha[label], label).toBeGreaterThanOrEqual(0);
      expect(m.alpha[label], label).toBeLessThanOrEqual(1);
    }
    for (const label of Object.keys(m.alpha)) expect([...REQUIRED, "63"]).toContain(label);
    // no table gives these rows a 63 Hz value: only the opening, by definition, has one
    if (m.provenance !== "by definition") expect(m.alpha["63"]).toBeUndefined();
    expect(m.source.length).toBeGreaterThan(20);
  });

  it("a published value names its book, edition, table and pages, the source the book credits, and says it was transcribed", () => {
    for (const m of MATERIALS.filter((x) => x.provenance === "published, as transcribed")) {
      expect(m.citation, m.key).not.toBeNull();
      expect(m.citation!.work).toMatch(/\d(st|nd|rd|th) ed\., .*\d{4}$/);
      expect(m.citation!.table).toMatch(/Table/);
      expect(m.source).toContain(m.citation!.work);
      expect(m.source).toMatch(/as transcribed/);
    }
  });

  it("says where a value is recalled: only a few finishes with no published row, each saying so", () => {
    const recalled = MATERIALS.filter((m) => m.provenance === "from memory");
    expect(recalled.map((m) => m.key).sort()).toEqual(["carpet-thin-on-concrete", "ceramic-tile", "timber-stage"]);
    for (const m of recalled) {
      expect(m.citation).toBeNull();
      expect(m.source).toMatch(/No published value was found .* from memory/);
    }
  });

  // Spot checks against the printed tables (typed here from them, as transcribed): Cox &
  // D'Antonio, Acoustic Absorbers and Diffusers, 3rd ed. (2017), App. A, and Long,
  // Architectural Acoustics, 2nd ed. (2014), Table 7.1, and Bies, Hansen & Howard, Engineering
  // Noise Control, 5th ed. (2017), Table 6.2.
  it.each([
    ["plaster-on-masonry", [0.013, 0.015, 0.02, 0.03, 0.04, 0.05], /after Harris \(1991\)/],
    ["concrete-block-unpainted", [0.36, 0.44, 0.31, 0.29, 0.39, 0.25], /after Harris \(1991\)/],
    ["gypsum-board-ceiling", [0.08, 0.11, 0.05, 0.03, 0.02, 0.03], /after Lynge \(2001\); Fasold & Winkler \(1976\)/],
    ["heavy-curtain", [0.14, 0.35, 0.55, 0.77, 0.7, 0.6], /after Beranek \(1954\)/],
    ["audience-upholstered", [0.41, 0.58, 0.8, 0.9, 0.92, 0.89], /Davies, Orlowski & Lam \(1994\)/],
    ["mineral-fibre-ceiling-tile", [0.68, 0.76, 0.6, 0.65, 0.82, 0.76], /Long, Architectural Acoustics, 2nd ed\..*Table 7\.1/],
    ["mineral-tile-suspended-500", [0.75, 0.7, 0.65, 0.85, 0.85, 0.9], /Engineering Noise Control, 5th ed\..*Table 6\.2/],
  ] as const)("%s keeps the printed row", (key, six, source) => {
    const m = findMaterial(key)!;
    expect(REQUIRED.map((label) => m.alpha[label])).toEqual(six);
    expect(m.source).toMatch(source);
  });

  it("an opening to a large space absorbs everything: α = 1 in every band, 63 Hz included", () => {
    const opening = findMaterial("open-opening")!;
    expect(Object.values(opening.alpha)).toEqual([1, 1, 1, 1, 1, 1, 1]);
    expect(opening.alpha["63"]).toBe(1);
  });

  it("offers a surface its own finishes and those for any surface", () => {
    const floors = materialsFor("floor").map((m) => m.key);
    expect(floors).toContain("vinyl-on-concrete");
    expect(floors).toContain("ceramic-tile");
    expect(floors).not.toContain("window-glass");
  });
});

describe("materialAlphaSchema (project materials from a test report)", () => {
  const report = { "125": 0.3, "250": 0.7, "500": 1.05, "1000": 1.1, "2000": 0.95, "4000": 0.9 };

  it("accepts every library α and ASTM-style values above 1", () => {
    for (const m of MATERIALS) expect(materialAlphaSchema.safeParse(m.alpha).success, m.key).toBe(true);
    expect(materialAlphaSchema.parse(report)).toEqual(report);
  });

  it("keeps 63 Hz optional", () => {
    expect(materialAlphaSchema.safeParse({ ...report, "63": 0.1 }).success).toBe(true);
  });

  it.each([
    ["above 1.5", { ...report, "500": 1.6 }, "500", /at most 1.5/],
    ["negative", { ...report, "2000": -0.01 }, "2000", /at least 0/],
    ["a missing required octave", { ...report, "125": undefined }, "125", /required: .* at 125 Hz/],
    ["a 63 Hz value that is not a number", { ...report, "63": "0.2" }, "63", /must be a number/],
    ["an octave we do not use", { ...report, "8000": 0.9 }, "", /.+/],
  ])("refuses %s, naming the octave", (_what, input, field, message) => {
    const parsed = materialAlphaSchema.safeParse(input);
    expect(parsed.success).toBe(false);
    const issue = parsed.error!.issues[0];
    if (field) expect(issue.path).toEqual([field]);
    else expect(issue.code).toBe("unrecognized_keys");
    expect(issue.message).toMatch(message);
  });
});
