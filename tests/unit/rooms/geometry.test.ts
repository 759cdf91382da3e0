import { describe, expect, it } from "vitest";
import { type Opening, type Surface, grossArea, netArea, roomVolume, shoeboxSurfaces, totalArea } from "@/lib/rooms/geometry";
import { validateAir, validateRoom, validateShoebox, validateSurfaces, validateVolumeForSurfaces } from "@/lib/rooms/validation";

const door = (over: Partial<Opening> = {}): Opening => ({ kind: "door", width: 1, height: 2.1, x: 1, y: 0, material: "timber-door", ...over });

function surfacesOf(box: { length: number; width: number; height: number }, openings: Record<string, Opening[]> = {}): Surface[] {
  return shoeboxSurfaces(box).map((s) => ({ ...s, finish: "painted-concrete", openings: openings[s.key] ?? [] }));
}

describe("shoebox surfaces", () => {
  it("10 × 8 × 3 m: six surfaces with stable keys and plain names, 268 m² in all", () => {
    const surfaces = shoeboxSurfaces({ length: 10, width: 8, height: 3 });
    expect(surfaces.map((s) => [s.key, s.name, s.kind, s.width, s.height])).toEqual([
      ["wall-a", "Wall A (length)", "wall", 10, 3],
      ["wall-b", "Wall B (width)", "wall", 8, 3],
      ["wall-c", "Wall C (length)", "wall", 10, 3],
      ["wall-d", "Wall D (width)", "wall", 8, 3],
      ["ceiling", "Ceiling", "ceiling", 10, 8],
      ["floor", "Floor", "floor", 10, 8],
    ]);
    // By hand: 2·(10·8) + 2·(10·3) + 2·(8·3) = 160 + 60 + 48 = 268 m².
    expect(totalArea(surfaces)).toBe(268);
    expect(surfaces.map(grossArea)).toEqual([30, 24, 30, 24, 80, 80]);
    expect(roomVolume({ kind: "shoebox", length: 10, width: 8, height: 3 })).toBe(240);
    expect(roomVolume({ kind: "free", volume: 512 })).toBe(512);
  });

  it("keeps the keys when the dimensions change, so finishes stay attached", () => {
    const keys = (box: { length: number; width: number; height: number }) => shoeboxSurfaces(box).map((s) => s.key);
    expect(keys({ length: 12, width: 9, height: 4.5 })).toEqual(keys({ length: 10, width: 8, height: 3 }));
  });

  it("subtracts openings from their surface's area", () => {
    const [, wallB] = surfacesOf({ length: 10, width: 8, height: 3 }, {
      "wall-b": [door(), { kind: "window", width: 2, height: 1.2, x: 4, y: 1, material: "window-glass" }],
    });
    // 8·3 − 1·2.1 − 2·1.2 = 24 − 2.1 − 2.4 = 19.5 m²
    expect(netArea(wallB)).toBeCloseTo(19.5, 12);
    expect(netArea({ ...wallB, openings: [] })).toBe(24);
  });
});

describe("validation names the field of every issue", () => {
  it("refuses dimensions that are not positive", () => {
    expect(validateShoebox({ length: 0, width: -1, height: Number.NaN })).toEqual([
      { field: "length", message: "must be greater than 0 m", severity: "error" },
      { field: "width", message: "must be greater than 0 m", severity: "error" },
      { field: "height", message: "must be a number", severity: "error" },
    ]);
    const surfaces = surfacesOf({ length: 10, width: 8, height: 3 });
    surfaces[2].width = 0;
    expect(validateSurfaces(surfaces).map((i) => i.field)).toEqual(["surfaces.2.width"]);
    expect(validateSurfaces([])).toEqual([{ field: "surfaces", message: "list at least one surface", severity: "error" }]);
  });

  const onWallB = (opening: Opening, also: Opening[] = []) => validateSurfaces(surfacesOf({ length: 10, width: 8, height: 3 }, { "wall-b": [...also, opening] }));

  it.each([
    ["wider than its surface", door({ width: 9, x: 0 }), "surfaces.1.openings.0.width", /9 m wide, more than Wall B \(width\) \(8 m\)/],
    ["higher than its surface", door({ height: 3.2 }), "surfaces.1.openings.0.height", /3.2 m high, more than Wall B/],
    ["with no width", door({ width: 0 }), "surfaces.1.openings.0.width", /greater than 0 m/],
    ["left of the surface", door({ x: -0.2 }), "surfaces.1.openings.0.x", /at least 0 m.*left edge/],
    ["past the right edge", door({ x: 7.5 }), "surfaces.1.openings.0.x", /runs 0.5 m past the right edge of Wall B \(width\)/],
    ["below the floor", door({ y: -0.1 }), "surfaces.1.openings.0.y", /bottom edge/],
    ["past the top edge", door({ y: 1 }), "surfaces.1.openings.0.y", /runs 0.1 m past the top edge/],
  ])("an opening %s", (_what, opening, field, message) => {
    const issues = onWallB(opening);
    expect(issues.map((i) => i.field)).toEqual([field]);
    expect(issues[0].message).toMatch(message);
    expect(issues[0].severity).toBe("error");
  });

  it("refuses overlapping openings and lets openings touch", () => {
    const overlapping = onWallB(door({ x: 1.5 }), [door()]);
    expect(overlapping.map((i) => i.field)).toEqual(["surfaces.1.openings.1"]);
    expect(overlapping[0].message).toMatch(/overlaps the door at x 1 m, y 0 m on Wall B \(width\)/);
    expect(onWallB(door({ x: 2 }), [door()])).toEqual([]);
    expect(onWallB({ kind: "window", width: 1, height: 0.9, x: 1, y: 2.1, material: "window-glass" }, [door()])).toEqual([]);
  });

  it("accepts an opening that fills its surface exactly", () => {
    expect(onWallB(door({ width: 8, height: 3, x: 0, y: 0 }))).toEqual([]);
  });

  it.each([
    [{ temperature: 20, humidity: 120 }, "humidity", /between 0 and 100 % relative humidity/],
    [{ temperature: 20, humidity: -1 }, "humidity", /between 0 and 100/],
    [{ temperature: -20, humidity: 50 }, "temperature", /between -10 °C and 50 °C/],
    [{ temperature: 60, humidity: 50 }, "temperature", /between -10 °C and 50 °C/],
    [{ temperature: 20, humidity: 50, pressure: 1013 }, "pressure", /between 10000 and 200000 Pa/],
  ])("refuses air %j", (air, field, message) => {
    const issues = validateAir(air);
    expect(issues.map((i) => i.field)).toEqual([field]);
    expect(issues[0].message).toMatch(message);
  });

  it("accepts the ends of the air ranges and prefixes the field when asked", () => {
    expect(validateAir({ temperature: -10, humidity: 0 })).toEqual([]);
    expect(validateAir({ temperature: 50, humidity: 100, pressure: 101_325 })).toEqual([]);
    expect(validateAir({ temperature: 20, humidity: 101 }, "air")[0].field).toBe("air.humidity");
  });
});

describe("a volume must fit the surfaces listed", () => {
  const squares = (n: number, side: number) => Array.from({ length: n }, () => ({ width: side, height: side }));

  it("refuses a volume that is not positive", () => {
    expect(validateVolumeForSurfaces(0, squares(6, 1)).map((i) => i.field)).toEqual(["volume"]);
  });

  it("refuses surfaces smaller than a sphere of that volume could have (isoperimetric inequality)", () => {
    // V = 1000 m³: the least surface is (36π)^(1/3)·1000^(2/3) = 4.836·100 ≈ 483.6 m².
    const issues = validateVolumeForSurfaces(1000, squares(4, 10));
    expect(issues).toHaveLength(1);
    expect(issues[0]).toMatchObject({ field: "volume", severity: "error" });
    expect(issues[0].message).toMatch(/at least 483.6 m² of surface/);
    expect(issues[0].message).toMatch(/add up to 400 m²/);
    // A cube of 1000 m³ has 600 m², above the bound: fine.
    expect(validateVolumeForSurfaces(1000, squares(6, 10))).toEqual([]);
  });

  it("warns when the volume is tiny for the surfaces (a very flat room or a mistyped volume)", () => {
    // 268 m² against 24 m³ (a digit lost from 240): S/V^(2/3) = 268/8.32 ≈ 32 > 20.
    const surfaces = shoeboxSurfaces({ length: 10, width: 8, height: 3 });
    const issues = validateVolumeForSurfaces(24, surfaces);
    expect(issues).toHaveLength(1);
    expect(issues[0]).toMatchObject({ field: "volume", severity: "warning" });
    expect(validateVolumeForSurfaces(240, surfaces)).toEqual([]);
  });

  it("checks a whole room at once", () => {
    const surfaces = surfacesOf({ length: 10, width: 8, height: 3 }, { "wall-a": [door({ x: 9.5 })] });
    const issues = validateRoom({ geometry: { kind: "free", volume: 2400 }, surfaces, air: { temperature: 20, humidity: 150 } });
    expect(issues.map((i) => i.field)).toEqual(["surfaces.0.openings.0.x", "volume", "humidity"]);
    const fine = validateRoom({ geometry: { kind: "shoebox", length: 10, width: 8, height: 3 }, surfaces: surfacesOf({ length: 10, width: 8, height: 3 }), air: { temperature: 20, humidity: 50 } });
    expect(fine).toEqual([]);
  });
});
