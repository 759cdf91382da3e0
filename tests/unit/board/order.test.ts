import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { orderByValue } from "@/lib/board/order";

const orderOf = (values: number[]) => {
  const out = new Int32Array(values.length);
  orderByValue(Float64Array.from(values), values.length, new Float64Array(values.length), out);
  return Array.from(out, (i) => values[i]);
};

describe("ordering by value", () => {
  it("sorts exactly, also values closer together than the packing's 0.1 µm", () => {
    expect(orderOf([2.8, 2.2 + 0.6, 0.1, -0.3, 2.80000001, 2.8000000001])).toEqual([-0.3, 0.1, 2.8, 2.8000000000000003, 2.8000000001, 2.80000001]);
  });

  it("falls back to a plain sort for values too large to pack", () => {
    expect(orderOf([1e12, -1e12, 3])).toEqual([-1e12, 3, 1e12]);
  });

  it("agrees with Array.prototype.sort (fast-check)", () => {
    const near = fc.tuple(fc.double({ min: -50, max: 50, noNaN: true }), fc.integer({ min: -3, max: 3 })).map(([v, k]) => v + k * 3e-8);
    fc.assert(
      fc.property(fc.array(fc.oneof(near, fc.constantFrom(0, 0.6, 2.8)), { maxLength: 200 }), (values) => {
        expect(orderOf(values)).toEqual([...values].sort((a, b) => a - b));
      }),
      { numRuns: 300 },
    );
  });
});
