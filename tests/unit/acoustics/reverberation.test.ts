import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { speedOfSound } from "@/lib/acoustics/air";
import { airAttenuationDbPerKm, airPowerAttenuation, atmosphereRelaxation } from "@/lib/acoustics/air-absorption";
import { OCTAVES } from "@/lib/acoustics/bands";
import {
  DECAY_CONSTANT,
  type RoomSurface,
  absorptionShortfall,
  eyringSeconds,
  panelAreaNeeded,
  reverberation,
  sabineSeconds,
} from "@/lib/acoustics/reverberation";

const MIDBANDS = [-4, -3, -2, -1, 0, 1, 2, 3].map((k) => 1000 * 10 ** ((3 * k) / 10));

describe("ISO 9613-1:1993 air absorption", () => {
  // The standard's equations (checked term by term against two public implementations of it);
  // values computed from them in numpy at the exact mid-band frequencies.
  const ATTENUATION: [number, number, number[]][] = [
    [10, 70, [0.122, 0.411, 1.043, 1.928, 3.658, 9.664, 32.77, 116.882]],
    [15, 20, [0.272, 0.647, 1.221, 2.704, 8.166, 28.191, 88.786, 201.761]],
    [15, 50, [0.142, 0.479, 1.217, 2.236, 4.164, 10.786, 36.22, 128.573]],
    [15, 80, [0.093, 0.343, 1.075, 2.399, 4.151, 8.313, 23.671, 82.831]],
    [20, 50, [0.123, 0.445, 1.318, 2.733, 4.665, 9.855, 29.419, 103.912]],
    [20, 70, [0.09, 0.339, 1.132, 2.798, 4.978, 9.016, 22.911, 76.621]],
    [30, 70, [0.065, 0.256, 0.963, 3.135, 7.407, 12.746, 23.058, 59.261]],
    [23, 50, [0.112, 0.418, 1.332, 3.043, 5.218, 9.906, 26.84, 92.055]],
  ];
  it.each(ATTENUATION)("%i °C, %i %% at the exact mid-band frequencies (dB/km)", (temperature, humidity, row) => {
    MIDBANDS.forEach((f, i) => expect(Math.abs(airAttenuationDbPerKm(f, { temperature, humidity }) - row[i])).toBeLessThan(6e-4));
  });

  it("20 °C, 50 %: h = 1.1530 %, frO = 35413.9 Hz, frN = 331.85 Hz, α(1 kHz) = 4.6647 dB/km", () => {
    const r = atmosphereRelaxation({ temperature: 20, humidity: 50 });
    expect(r.h).toBeCloseTo(1.153, 4);
    expect(r.frO).toBeCloseTo(35413.9, 1);
    expect(r.frN).toBeCloseTo(331.85, 2);
    expect(airAttenuationDbPerKm(1000, { temperature: 20, humidity: 50 })).toBeCloseTo(4.6647, 4);
  });

  it("rounded to 0.1 dB/km, 10 °C/70 % and 20 °C/70 % reproduce ISO 9613-2:1996 Table 2 rows (from memory)", () => {
    const rounded = (t: number, h: number) => MIDBANDS.map((f) => airAttenuationDbPerKm(f, { temperature: t, humidity: h })).map((v) => (v < 100 ? Number(v.toFixed(1)) : Math.round(v)));
    expect(rounded(10, 70)).toEqual([0.1, 0.4, 1.0, 1.9, 3.7, 9.7, 32.8, 117]);
    expect(rounded(20, 70).slice(0, 7)).toEqual([0.1, 0.3, 1.1, 2.8, 5.0, 9.0, 22.9]);
  });

  it("m = α/(10 lg e) in 1/m at 20 °C, 50 % (exact conversion, ISO 354:2003; values computed in numpy)", () => {
    const m = MIDBANDS.map((f) => airPowerAttenuation(f, { temperature: 20, humidity: 50 }));
    [2.828e-5, 1.025e-4, 3.035e-4, 6.294e-4, 1.074e-3, 2.269e-3, 6.774e-3, 2.393e-2].forEach((v, i) => expect(Math.abs(m[i] / v - 1)).toBeLessThan(2e-3));
  });
});

describe("Sabine and Eyring (Kuttruff, Room Acoustics, ch. 5; Eyring, JASA 1, 1930)", () => {
  it("24 ln10 / c, computed by hand", () => {
    [[331.3, 0.1668], [340, 0.16254], [343, 0.16111], [343.2, 0.16102], [344, 0.16065]].forEach(([c, k]) => expect(DECAY_CONSTANT / c).toBeCloseTo(k, 5));
  });

  // A room computed in numpy: 10 × 8 × 3 m, c = 343 m/s, m at the nominal band frequency.
  const V = 240;
  const S = 268;
  const A = 80 * 0.05 + 80 * 0.7 + 60 * 0.05 + 48 * 0.1;
  it("A = 67.80 m², ᾱ = 0.25299", () => {
    expect(A).toBeCloseTo(67.8, 10);
    expect(A / S).toBeCloseTo(0.25299, 5);
  });
  it("500 Hz, m = 6.2818e-4: Sabine 0.5653 s (0.5703 without air), Eyring 0.4909 s (0.4947)", () => {
    expect(sabineSeconds(V, A, 6.2818e-4, 343)).toBeCloseTo(0.5653, 4);
    expect(sabineSeconds(V, A, 0, 343)).toBeCloseTo(0.5703, 4);
    expect(eyringSeconds(V, S, A / S, 6.2818e-4, 343)).toBeCloseTo(0.4909, 4);
    expect(eyringSeconds(V, S, A / S, 0, 343)).toBeCloseTo(0.4947, 4);
  });
  it("4000 Hz, m = 6.8307e-3: Sabine 0.5200 s, Eyring 0.4564 s", () => {
    expect(sabineSeconds(V, A, 6.8307e-3, 343)).toBeCloseTo(0.52, 4);
    expect(eyringSeconds(V, S, A / S, 6.8307e-3, 343)).toBeCloseTo(0.4564, 4);
  });

  const flat = (a: number) => Object.fromEntries(["63", "125", "250", "500", "1000", "2000", "4000"].map((k) => [k, a]));
  const room: RoomSurface[] = [
    { area: 80, alpha: flat(0.05) },
    { area: 80, alpha: flat(0.7) },
    { area: 60, alpha: flat(0.05) },
    { area: 48, alpha: flat(0.1) },
  ];
  const air = { temperature: 20, humidity: 50 };

  it("reverberation() per octave with c(20 °C) and m at the exact mid-band frequency, computed here by hand", () => {
    const c = speedOfSound(20);
    for (const method of ["sabine", "eyring"] as const) {
      const out = reverberation({ volume: V, surfaces: room, air, method });
      expect(out.map((o) => o.f)).toEqual([63, 125, 250, 500, 1000, 2000, 4000]);
      out.forEach((o, i) => {
        const m = airPowerAttenuation(OCTAVES[i].centre, air);
        const absorption = method === "sabine" ? A : -S * Math.log(1 - A / S);
        expect(o.airM).toBe(m);
        expect(o.seconds).toBeCloseTo(((24 * Math.LN10) / c) * (V / (absorption + 4 * m * V)), 12);
      });
    }
  });

  it("octaves without a coefficient on every surface are left out (63 Hz optional)", () => {
    const without63 = room.map((s) => ({ ...s, alpha: { ...s.alpha, 63: undefined as unknown as number } }));
    expect(reverberation({ volume: V, surfaces: without63, air, method: "sabine" }).map((o) => o.f)).toEqual([125, 250, 500, 1000, 2000, 4000]);
  });

  it("the shortfall, once added, reaches the target exactly (Sabine and Eyring, property)", () => {
    const c = speedOfSound(20);
    fc.assert(
      fc.property(fc.constantFrom("sabine" as const, "eyring" as const), fc.double({ min: 0.2, max: 0.55, noNaN: true }), (method, target) => {
        const bands = absorptionShortfall({ volume: V, surfaces: room, air, method, target: flat(target) });
        expect(bands).toHaveLength(7);
        bands.forEach((band, i) => {
          const m = airPowerAttenuation(OCTAVES[i].centre, air);
          expect(band.existing).toBeCloseTo(A, 12);
          const treated = band.existing + band.shortfall;
          const t = method === "sabine" ? sabineSeconds(V, treated, m, c) : eyringSeconds(V, S, treated / S, m, c);
          if (band.shortfall > 0) expect(t).toBeCloseTo(target, 9);
          else expect(band.seconds).toBeLessThanOrEqual(target);
        });
      }),
      { numRuns: 30 },
    );
  });

  it("the panel area that supplies a shortfall: ΔA / (α_panel − α_finish), the largest octave sets it", () => {
    const result = panelAreaNeeded({
      shortfall: [
        { f: 125, shortfall: 10 },
        { f: 250, shortfall: 20 },
        { f: 500, shortfall: 0 },
      ],
      panelAlpha: { 125: 0.45, 250: 0.85, 500: 0.9 },
      coveredAlpha: 0.05,
    });
    expect(result.octaves.map((o) => o.f)).toEqual([125, 250, 500]);
    [25, 25, 0].forEach((area, i) => expect(result.octaves[i].area).toBeCloseTo(area, 12));
    expect(result.area).toBeCloseTo(25, 12);
    const none = panelAreaNeeded({ shortfall: [{ f: 125, shortfall: 5 }], panelAlpha: { 125: 0.04 }, coveredAlpha: { 125: 0.05 } });
    expect(none).toEqual({ area: null, limitingOctave: 125, octaves: [{ f: 125, area: null }] });
  });
});
