import { interpolateCividis, interpolateViridis, color, hcl } from "d3";
import { describe, expect, it } from "vitest";
import { NO_VALUE_COLOUR, colourLegendTicks, colourRamp } from "@/lib/plots";

// Reference: d3-scale-chromatic's own interpolators (the general-purpose library the ramp wraps).
const hex = (c: string) => color(c)!.formatHex();

describe("colourRamp", () => {
  it("runs light → dark as values rise (highIsDark default): 0 → cividis(1), 10 → cividis(0)", () => {
    const r = colourRamp([0, 10]);
    expect(r.colour(0)).toBe(hex(interpolateCividis(1)));
    expect(r.colour(10)).toBe(hex(interpolateCividis(0)));
    expect(r.colour(10)).toBe("#002051");
    expect(r.colour(2.5)).toBe(hex(interpolateCividis(0.75)));
  });
  it("maps the other way with highIsDark: false, and offers viridis", () => {
    expect(colourRamp([0, 10], { highIsDark: false }).colour(10)).toBe(hex(interpolateCividis(1)));
    expect(colourRamp([0, 1], { name: "viridis", highIsDark: false }).colour(0.5)).toBe(hex(interpolateViridis(0.5)));
  });
  it("is monotonic in lightness, so a grey print keeps the order (21 steps)", () => {
    const r = colourRamp([0, 20]);
    const l = Array.from({ length: 21 }, (_, i) => hcl(r.colour(i)).l);
    for (let i = 1; i < l.length; i++) expect(l[i]!).toBeLessThan(l[i - 1]!);
  });
  it("clamps values outside the domain and greys out non-finite values", () => {
    const r = colourRamp([0, 10]);
    expect(r.colour(-5)).toBe(r.colour(0));
    expect(r.colour(1e300)).toBe(r.colour(10));
    expect(r.colour(NaN)).toBe(NO_VALUE_COLOUR);
  });
  it("maps a flat domain [3, 3] to the ramp's middle and widens the legend domain to [2.5, 3.5]", () => {
    const r = colourRamp([3, 3]);
    expect(r.colour(3)).toBe(hex(interpolateCividis(0.5)));
    expect(r.domain).toEqual([2.5, 3.5]);
  });
  it("gives 11 legend stops from offset 0 to 1 matching the colour at each offset", () => {
    const r = colourRamp([0, 10]);
    expect(r.stops).toHaveLength(11);
    expect(r.stops[0]).toEqual({ offset: 0, colour: r.colour(0) });
    expect(r.stops[10]).toEqual({ offset: 1, colour: r.colour(10) });
  });
  it("throws for NaN or reversed domains and bad ramp names", () => {
    expect(() => colourRamp([NaN, 1])).toThrow(RangeError);
    expect(() => colourRamp([2, 1])).toThrow(RangeError);
    expect(() => colourRamp([0, 1], { name: "rainbow" as never })).toThrow(TypeError);
  });
});

describe("colourLegendTicks", () => {
  it("places ticks on the exact domain across the bar (no nicing): [0, 10] on 100 px", () => {
    const t = colourLegendTicks(colourRamp([0, 10]), 100);
    expect(t.map((x) => x.pos)).toEqual([0, 20, 40, 60, 80, 100]);
    expect(t.map((x) => x.label)).toEqual(["0", "2", "4", "6", "8", "10"]);
  });
  it("throws for a zero-length bar", () => {
    expect(() => colourLegendTicks(colourRamp([0, 1]), 0)).toThrow(RangeError);
  });
});
