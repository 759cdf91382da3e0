import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkAreas } from "@/lib/rooms/assemble";
import { checkRoom } from "@/lib/rooms/check";
import type { CheckInput } from "@/lib/rooms/check-input";
import { shoeboxSurfaces } from "@/lib/rooms/geometry";
import { MATERIALS } from "@/lib/rooms/materials-library";
import { panelAreaForRoom } from "@/lib/rooms/panel-area";
import { targetFor } from "@/lib/rooms/targets";

const finishes = MATERIALS.filter((m) => m.category !== "opening" && m.category !== "furnishing").map((m) => m.key);
const LABELS = ["63", "125", "250", "500", "1000", "2000", "4000"];

const room = fc.record({
  length: fc.double({ min: 4, max: 30, noNaN: true }),
  width: fc.double({ min: 3, max: 20, noNaN: true }),
  height: fc.double({ min: 2.4, max: 8, noNaN: true }),
  finish: fc.array(fc.constantFrom(...finishes), { minLength: 6, maxLength: 6 }),
  group: fc.constantFrom("A1" as const, "A2" as const, "A3" as const, "A4" as const, "A5" as const),
  method: fc.constantFrom("sabine" as const, "eyring" as const),
  surface: fc.constantFrom("wall-a", "ceiling", "floor"),
  panel: fc.array(fc.double({ min: 0.6, max: 1, noNaN: true }), { minLength: 7, maxLength: 7 }),
});

type RoomCase = typeof room extends fc.Arbitrary<infer T> ? T : never;

/** A shoebox room against a DIN 18041 target, the panel area it needs, and a way to apply it. */
function setUp(r: RoomCase) {
  const areas = checkAreas(shoeboxSurfaces(r).map((s, i) => ({ ...s, finish: r.finish[i], openings: [] })));
  const volume = r.length * r.width * r.height;
  const target = targetFor({ kind: "din-18041", group: r.group }, volume);
  const input: CheckInput = { volume, air: { temperature: 20, humidity: 50 }, ...areas, treatments: [], target, method: r.method };
  const alpha = Object.fromEntries(LABELS.map((k, i) => [k, r.panel[i]]));
  const need = panelAreaForRoom(input, { surface: r.surface, alpha });
  if (!need.ok) throw new Error(JSON.stringify(need.issues));
  const apply = (area: number) => {
    const after = checkRoom({ ...input, treatments: [{ surface: r.surface, area, alpha }] });
    if (!after.ok) throw new Error(JSON.stringify(after.issues));
    return after;
  };
  return { need: need.need, apply };
}

describe("the computed panel area closes the shortfall (property)", () => {
  it("after applying it no band is over and the limiting band sits on its upper limit", () => {
    let exercised = 0;
    fc.assert(
      fc.property(room, (r) => {
        const { need, apply } = setUp(r);
        fc.pre(need.area !== null && need.area > 0 && need.fits && need.overshoot === null);
        exercised++;
        const after = apply(need.area!);
        expect(after.octaves.filter((o) => o.status === "over").map((o) => o.f)).toEqual([]);
        const limiting = after.octaves.find((o) => o.f === need.limitingOctave)!;
        expect(limiting.after![r.method] / limiting.target.high! - 1).toBeCloseTo(0, 9);
      }),
      { numRuns: 200 },
    );
    expect(exercised).toBe(200);
  });

  it("an overshoot it reports is real: the area needed pushes that octave over, its maximum does not", () => {
    let exercised = 0;
    // A low-frequency panel (strong at 63–250 Hz, weak above) over a ceiling tile fixed to the
    // slab (weak in the bass, strong above 500 Hz): it supplies the bass the room lacks and takes
    // away treble the tile gave.
    const weak = fc
      .tuple(room, fc.array(fc.double({ min: 0.05, max: 0.3, noNaN: true }), { minLength: 4, maxLength: 4 }))
      .map(([r, treble]) => ({
        ...r,
        surface: "ceiling" as const,
        finish: [...r.finish.slice(0, 4), "mineral-tile-on-slab", r.finish[5]],
        panel: [...r.panel.slice(0, 3), ...treble],
      }));
    fc.assert(
      fc.property(weak, (r) => {
        const { need, apply } = setUp(r);
        fc.pre(need.area !== null && need.area > 0 && need.fits && need.overshoot !== null);
        exercised++;
        const { f, maxArea } = need.overshoot!;
        expect(apply(need.area!).octaves.find((o) => o.f === f)!.status).toBe("over");
        expect(apply(maxArea).octaves.find((o) => o.f === f)!.status).not.toBe("over");
      }),
      { numRuns: 50 },
    );
    expect(exercised).toBe(50);
  });
});
