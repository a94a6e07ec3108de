import { describe, expect, it } from "vitest";
import { formatValue, linearScale } from "@/lib/plots";

describe("linearScale", () => {
  it("gives nice ticks 0.0 … 1.0 every 0.2 on [0, 1] mapped onto 0–100 px (exact)", () => {
    const s = linearScale([0, 1], [0, 100]);
    expect(s.ticks.map((t) => t.value)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(s.ticks.map((t) => t.label)).toEqual(["0.0", "0.2", "0.4", "0.6", "0.8", "1.0"]);
    expect(s.ticks.map((t) => t.pos)).toEqual([0, 20, 40, 60, 80, 100]);
  });
  it("nices [-12.3, 7.9] to [-15, 10] with a real minus sign in labels, on an inverted (y) range", () => {
    const s = linearScale([-12.3, 7.9], [200, 0]);
    expect(s.domain).toEqual([-15, 10]);
    expect(s.ticks.map((t) => t.label)).toEqual(["\u221215", "\u221210", "\u22125", "0", "5", "10"]);
    expect(s.map(-15)).toBe(200);
    expect(s.map(10)).toBe(0);
    expect(s.invert(100)).toBe(-2.5);
  });
  it("keeps the exact domain with nice: false", () => {
    const s = linearScale([0, 5.8], [0, 580], { nice: false });
    expect(s.domain).toEqual([0, 5.8]);
    expect(s.ticks.map((t) => t.value)).toEqual([0, 1, 2, 3, 4, 5]);
    expect(s.map(5.8)).toBe(580);
  });
  it("widens a single-point domain [3, 3] to [2, 4] and [1000, 1000] by 10 %", () => {
    expect(linearScale([3, 3], [0, 10], { nice: false }).domain).toEqual([2, 4]);
    expect(linearScale([1000, 1000], [0, 10], { nice: false }).domain).toEqual([900, 1100]);
  });
  it("labels huge values with SI prefixes: [0, 1e12] → 0, 200G … 1T", () => {
    expect(linearScale([0, 1e12], [0, 100]).ticks.map((t) => t.label)).toEqual(["0", "200G", "400G", "600G", "800G", "1T"]);
  });
  it("honours fixed decimals and never labels zero as −0", () => {
    const s = linearScale([-1, 1], [0, 100], { decimals: 2, count: 2 });
    expect(s.ticks.map((t) => t.label)).toEqual(["\u22121.00", "0.00", "1.00"]);
  });
  it("throws RangeError for NaN, reversed domains and a bad count", () => {
    expect(() => linearScale([NaN, 1], [0, 1])).toThrow(RangeError);
    expect(() => linearScale([2, 1], [0, 1])).toThrow(/min <= max/);
    expect(() => linearScale([0, 1], [0, 1], { count: 0 })).toThrow(/count/);
    expect(() => linearScale([0, 1], [0, Infinity])).toThrow(RangeError);
  });
});

describe("formatValue", () => {
  it("writes fixed decimals with U+2212 and no negative zero", () => {
    expect(formatValue(-3.14159, 1)).toBe("\u22123.1");
    expect(formatValue(-0.04, 1)).toBe("0.0");
    expect(formatValue(2, 2)).toBe("2.00");
    expect(formatValue(NaN, 1)).toBe("–");
  });
});
