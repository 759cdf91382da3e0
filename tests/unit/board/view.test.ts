import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fitToView, panBy, pinchZoomFactor, rectToScreen, toScreen, toWorld, type View, visibleArea, wheelZoomFactor, zoomAt } from "@/lib/board/view";

const view: View = { scale: 100, offsetX: 50, offsetY: 400 };

describe("metres to pixels", () => {
  it("puts the datum at the offset and flips y: up the surface is up the screen", () => {
    expect(toScreen(view, { x: 0, y: 0 })).toEqual({ x: 50, y: 400 });
    expect(toScreen(view, { x: 2, y: 3 })).toEqual({ x: 250, y: 100 });
    expect(toWorld(view, { x: 250, y: 100 })).toEqual({ x: 2, y: 3 });
  });

  it("a rect is drawn from its top-left corner on screen", () => {
    // A 0.6 × 1.2 m panel at (1, 0.5): top at 0.5 + 1.2 = 1.7 m → 400 − 170 = 230 px.
    expect(rectToScreen(view, { x: 1, y: 0.5, width: 0.6, height: 1.2 })).toEqual({ x: 150, y: 230, width: 60, height: 120 });
  });

  it("the visible area of an 800 × 600 px viewport, in metres", () => {
    // x from −50/100 = −0.5 m, 8 m wide; y from (400 − 600)/100 = −2 m, 6 m high.
    expect(visibleArea(view, { width: 800, height: 600 })).toEqual({ x: -0.5, y: -2, width: 8, height: 6 });
  });
});

describe("zoom and pan", () => {
  it("zooming keeps the point under the pointer where it is", () => {
    const anchor = { x: 300, y: 250 };
    const before = toWorld(view, anchor);
    const zoomed = zoomAt(view, 2, anchor);
    expect(zoomed.scale).toBe(200);
    const after = toScreen(zoomed, before);
    expect(after.x).toBeCloseTo(300, 9);
    expect(after.y).toBeCloseTo(250, 9);
  });

  it("stays within the limits", () => {
    expect(zoomAt(view, 1e6, { x: 0, y: 0 }, { minScale: 10, maxScale: 1000 }).scale).toBe(1000);
    expect(zoomAt(view, 1e-6, { x: 0, y: 0 }, { minScale: 10, maxScale: 1000 }).scale).toBe(10);
  });

  it("wheel, pinch and pan", () => {
    expect(wheelZoomFactor(-400)).toBe(2);
    expect(wheelZoomFactor(0)).toBe(1);
    expect(wheelZoomFactor(400)).toBe(0.5);
    expect(pinchZoomFactor(100, 150)).toBe(1.5);
    expect(pinchZoomFactor(0, 150)).toBe(1);
    expect(panBy(view, 10, -20)).toEqual({ scale: 100, offsetX: 60, offsetY: 380 });
  });

  it("fits a 6 × 3 m wall into 800 × 600 px with 20 px clear, centred", () => {
    // Room for 760 × 560 px: scale = min(760/6, 560/3) = 126.67 px/m; the wall is 760 × 380 px.
    const fit = fitToView({ width: 6, height: 3 }, { width: 800, height: 600 }, 20);
    expect(fit.scale).toBeCloseTo(760 / 6, 9);
    const topLeft = toScreen(fit, { x: 0, y: 3 });
    const bottomRight = toScreen(fit, { x: 6, y: 0 });
    expect([topLeft.x, topLeft.y, bottomRight.x, bottomRight.y].map((v) => +v.toFixed(9))).toEqual([20, 110, 780, 490]);
  });
});

describe("properties (fast-check)", () => {
  const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
  const arbitraryView = fc.record({ scale: finite(2, 40_000), offsetX: finite(-1e5, 1e5), offsetY: finite(-1e5, 1e5) });
  const point = fc.record({ x: finite(-100, 100), y: finite(-100, 100) });

  it("screen and surface round trip", () => {
    fc.assert(
      fc.property(arbitraryView, point, (v, p) => {
        const back = toWorld(v, toScreen(v, p));
        expect(back.x).toBeCloseTo(p.x, 6);
        expect(back.y).toBeCloseTo(p.y, 6);
      }),
    );
  });

  it("the anchor of a zoom does not move on screen", () => {
    fc.assert(
      fc.property(arbitraryView, fc.record({ x: finite(0, 2000), y: finite(0, 1200) }), finite(0.1, 10), (v, anchor, factor) => {
        const fixed = toScreen(zoomAt(v, factor, anchor), toWorld(v, anchor));
        expect(Math.abs(fixed.x - anchor.x)).toBeLessThan(1e-6 * Math.max(1, Math.abs(v.offsetX)));
        expect(Math.abs(fixed.y - anchor.y)).toBeLessThan(1e-6 * Math.max(1, Math.abs(v.offsetY)));
      }),
    );
  });
});
