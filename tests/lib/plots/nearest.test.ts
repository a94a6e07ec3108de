import { describe, expect, it } from "vitest";
import { nearestIndex, nearestIndexOn } from "@/lib/plots";

describe("nearestIndex", () => {
  const xs = [10, 20, 40, 80];
  it("finds the nearest value by binary search", () => {
    expect(nearestIndex(xs, 29)).toBe(1);
    expect(nearestIndex(xs, 31)).toBe(2);
    expect(nearestIndex(xs, 79)).toBe(3);
  });
  it("picks the lower index on a tie (30 is as far from 20 as from 40)", () => {
    expect(nearestIndex(xs, 30)).toBe(1);
  });
  it("returns an exact match, the first of equal values", () => {
    expect(nearestIndex(xs, 40)).toBe(2);
    expect(nearestIndex([1, 2, 2, 2, 3], 2)).toBe(1);
  });
  it("clamps to the ends outside the range, including ±Infinity-sized values", () => {
    expect(nearestIndex(xs, -1e300)).toBe(0);
    expect(nearestIndex(xs, 1e300)).toBe(3);
  });
  it("returns undefined for empty data and non-finite x; 0 for a single point", () => {
    expect(nearestIndex([], 5)).toBeUndefined();
    expect(nearestIndex(xs, NaN)).toBeUndefined();
    expect(nearestIndex(xs, Infinity)).toBeUndefined();
    expect(nearestIndex([42], -7)).toBe(0);
  });
  it("works on typed arrays and agrees with a linear scan on 1000 random probes", () => {
    const sorted = Float64Array.from({ length: 257 }, (_, i) => i * i * 0.37);
    let seed = 7;
    const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 25000 - 500;
    for (let k = 0; k < 1000; k++) {
      const x = rand();
      let best = 0;
      for (let i = 1; i < sorted.length; i++) if (Math.abs(sorted[i]! - x) < Math.abs(sorted[best]! - x)) best = i;
      expect(nearestIndex(sorted, x)).toBe(best);
    }
  });
});

describe("nearestIndexOn", () => {
  it("compares on a log axis: 400 Hz is nearer 1 kHz than 100 Hz", () => {
    expect(nearestIndex([100, 1000], 400)).toBe(0);
    expect(nearestIndexOn([100, 1000], 400, Math.log10)).toBe(1);
  });
});
