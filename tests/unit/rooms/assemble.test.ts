import { describe, expect, it } from "vitest";
import { checkAreas } from "@/lib/rooms/assemble";
import { type Surface, shoeboxSurfaces } from "@/lib/rooms/geometry";
import { findMaterial } from "@/lib/rooms/materials-library";

const box = { length: 10, width: 8, height: 3 };

function room(finish: (key: string) => string, openings: Surface["openings"] = []): Surface[] {
  return shoeboxSurfaces(box).map((s) => ({ ...s, finish: finish(s.key), openings: s.key === "wall-b" ? openings : [] }));
}

describe("from surfaces to the check's areas", () => {
  it("takes each surface at its net area with its finish's α, and each opening at its own area", () => {
    const door = { kind: "door" as const, width: 1, height: 2.1, x: 1, y: 0, material: "timber-door" };
    const vent = { kind: "vent" as const, name: "Louvre", width: 0.5, height: 0.4, x: 6, y: 2.4, material: "open-opening" };
    const { surfaces, openings, issues } = checkAreas(room(() => "plaster-on-masonry", [door, vent]));
    expect(issues).toEqual([]);
    // Wall B: 8·3 − 1·2.1 − 0.5·0.4 = 24 − 2.1 − 0.2 = 21.7 m²
    expect(surfaces.find((s) => s.key === "wall-b")!.area).toBeCloseTo(21.7, 12);
    expect(surfaces.find((s) => s.key === "wall-a")!.area).toBe(30);
    expect(surfaces[0].alpha).toEqual(findMaterial("plaster-on-masonry")!.alpha);
    expect(openings.map((o) => [o.name, o.area, o.alpha["500"]])).toEqual([
      ["Door on Wall B (width)", 2.1, findMaterial("timber-door")!.alpha["500"]],
      ["Louvre on Wall B (width)", 0.2, 1],
    ]);
    // Openings stay part of the room's boundary: 268 m² in all.
    const total = surfaces.reduce((sum, s) => sum + s.area, 0) + openings.reduce((sum, o) => sum + o.area, 0);
    expect(total).toBeCloseTo(268, 12);
  });

  it("names the field of a finish or an opening material it cannot find", () => {
    const { issues } = checkAreas(
      room((key) => (key === "ceiling" ? "acoustic-plaster-x" : "painted-concrete"), [{ kind: "window", width: 1, height: 1, x: 1, y: 1, material: "stained-glass" }]),
    );
    expect(issues.map((i) => [i.field, i.message])).toEqual([
      ["surfaces.4.finish", 'no material has the key "acoustic-plaster-x"'],
      ["surfaces.1.openings.0.material", 'no material has the key "stained-glass"'],
    ]);
  });

  it("looks project materials up first when given a lookup", () => {
    const report = { "125": 0.3, "250": 0.7, "500": 0.9, "1000": 0.95, "2000": 0.9, "4000": 0.85 };
    const lookup = (key: string) => (key === "pm-1" ? report : findMaterial(key)?.alpha);
    const { surfaces, issues } = checkAreas(room((key) => (key === "ceiling" ? "pm-1" : "painted-concrete")), lookup);
    expect(issues).toEqual([]);
    expect(surfaces.find((s) => s.key === "ceiling")!.alpha).toBe(report);
  });
});
