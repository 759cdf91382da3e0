import { describe, expect, it } from "vitest";
import { MATERIALS, MATERIAL_CATEGORIES, findMaterial, materialAlphaSchema, materialsFor } from "@/lib/rooms/materials-library";

const REQUIRED = ["125", "250", "500", "1000", "2000", "4000"];

describe("materials library", () => {
  it("holds about 20–25 finishes with unique kebab-case keys", () => {
    expect(MATERIALS.length).toBeGreaterThanOrEqual(20);
    expect(MATERIALS.length).toBeLessThanOrEqual(25);
    const keys = MATERIALS.map((m) => m.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const key of keys) expect(key).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
  });

  it("covers the finishes a consultant reaches for first", () => {
    const wanted = [
      "painted-concrete", "unpainted-concrete", "plaster-on-masonry", "brick-unglazed", "gypsum-board-on-studs",
      "glass-large-pane", "window-glass", "timber-floor-on-joists", "vinyl-on-concrete", "carpet-thin-on-concrete",
      "carpet-heavy-on-underlay", "plywood-on-battens", "timber-door", "mineral-fibre-ceiling-tile", "heavy-curtain",
      "open-opening", "audience-upholstered", "seating-upholstered-empty", "timber-stage", "ceramic-tile",
    ];
    for (const key of wanted) expect(findMaterial(key), key).toBeDefined();
    expect(findMaterial("no-such-finish")).toBeUndefined();
  });

  it.each(MATERIALS.map((m) => [m.key, m] as const))("%s: α in [0, 1] at 125–4000 Hz (63 Hz only if known), a category and a provenance", (_key, m) => {
    expect(MATERIAL_CATEGORIES).toContain(m.category);
    expect(m.name.length).toBeGreaterThan(0);
    for (const label of REQUIRED) {
      expect(m.alpha[label], label).toBeGreaterThanOrEqual(0);
      expect(m.alpha[label], label).toBeLessThanOrEqual(1);
    }
    for (const label of Object.keys(m.alpha)) expect([...REQUIRED, "63"]).toContain(label);
    if ("63" in m.alpha) expect(m.alpha["63"]).toBeGreaterThanOrEqual(0);
    expect(["typical, from memory", "published", "by definition"]).toContain(m.provenance);
    expect(m.source.length).toBeGreaterThan(20);
  });

  it("says honestly that recalled values are recalled: a source without a table is never 'published'", () => {
    for (const m of MATERIALS) {
      if (m.provenance === "typical, from memory") expect(m.source).toMatch(/from memory/);
      if (m.provenance === "published") expect(m.source).toMatch(/Table/);
    }
    // Only the idealised opening is not a recalled value.
    expect(MATERIALS.filter((m) => m.provenance !== "typical, from memory").map((m) => m.key)).toEqual(["open-opening"]);
  });

  it("an opening to a large space absorbs everything: α = 1 in every band, 63 Hz included", () => {
    const opening = findMaterial("open-opening")!;
    expect(Object.values(opening.alpha)).toEqual([1, 1, 1, 1, 1, 1, 1]);
    expect(opening.alpha["63"]).toBe(1);
  });

  it("heavy carpet on underlay absorbs at least as much as thin carpet in every band (more pile, more absorption)", () => {
    const thin = findMaterial("carpet-thin-on-concrete")!;
    const heavy = findMaterial("carpet-heavy-on-underlay")!;
    for (const label of REQUIRED) expect(heavy.alpha[label]).toBeGreaterThanOrEqual(thin.alpha[label]);
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
