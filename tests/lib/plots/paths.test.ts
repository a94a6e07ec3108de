import { describe, expect, it } from "vitest";
import { areaPath, hatchPath, linePath, markerIndices, markerPath, splitRuns } from "@/lib/plots";

const mx = (x: number) => x * 10;
const my = (y: number) => 10 - y * 10;

describe("linePath", () => {
  it("draws a polyline with d3-shape, 2 decimals: M0,10L10,0", () => {
    expect(linePath([{ x: 0, y: 0 }, { x: 1, y: 1 }], mx, my)).toBe("M0,10L10,0");
    expect(linePath([{ x: 0, y: 0 }, { x: 1 / 3, y: 0 }], mx, my)).toBe("M0,10L3.33,10");
  });
  it("breaks the line at null, NaN and infinite values (gaps), and shows lone points as zero-length segments", () => {
    expect(linePath([{ x: 0, y: 0 }, { x: 1, y: NaN }, { x: 2, y: 1 }, { x: 3, y: null }], mx, my)).toBe("M0,10h0M20,0h0");
    expect(linePath([{ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 2, y: Infinity }, { x: 3, y: 1 }, { x: 4, y: 1 }], mx, my)).toBe("M0,10L10,10M30,0L40,0");
  });
  it("returns '' for empty data and for data with no drawable point", () => {
    expect(linePath([], mx, my)).toBe("");
    expect(linePath([{ x: null, y: 1 }, { x: 1, y: NaN }], mx, my)).toBe("");
  });
  it("draws a single point as a dot (M…h0)", () => {
    expect(linePath([{ x: 1, y: 0.5 }], mx, my)).toBe("M10,5h0");
  });
  it("skips points whose mapped value is not finite (log of 0 on a log axis)", () => {
    expect(linePath([{ x: 0, y: 1 }, { x: 10, y: 1 }, { x: 100, y: 1 }], Math.log10, my)).toBe("M1,0L2,0");
  });
  it("keeps huge values finite in the string (1e6 px)", () => {
    expect(linePath([{ x: 0, y: 0 }, { x: 1e5, y: 0 }], mx, my)).toBe("M0,10L1000000,10");
  });
  it("draws steps with curveStepAfter", () => {
    expect(linePath([{ x: 0, y: 0 }, { x: 1, y: 1 }], mx, my, { step: true })).toBe("M0,10L10,10L10,0");
  });
});

describe("areaPath", () => {
  it("closes the area down to the baseline: M0,0L10,0L10,10L0,10Z", () => {
    expect(areaPath([{ x: 0, y: 1 }, { x: 1, y: 1 }], mx, my, 10)).toBe("M0,0L10,0L10,10L0,10Z");
  });
  it("splits at gaps and is '' for empty data; a NaN baseline is a RangeError", () => {
    expect(areaPath([{ x: 0, y: 1 }, { x: 1, y: 1 }, { x: 2, y: null }, { x: 3, y: 1 }, { x: 4, y: 1 }], mx, my, 10)).toBe("M0,0L10,0L10,10L0,10ZM30,0L40,0L40,10L30,10Z");
    expect(areaPath([], mx, my, 10)).toBe("");
    expect(() => areaPath([], mx, my, NaN)).toThrow(RangeError);
  });
});

describe("splitRuns", () => {
  it("groups segments by the predicate and shares the joining points", () => {
    expect(splitRuns([1, 2, 3, 4], (_a, b) => b <= 2)).toEqual([
      { value: true, points: [1, 2] },
      { value: false, points: [2, 3, 4] },
    ]);
  });
  it("returns [] for empty data and one run for a single point", () => {
    expect(splitRuns([], () => true)).toEqual([]);
    expect(splitRuns([7], (a) => a > 5)).toEqual([{ value: true, points: [7] }]);
  });
});

describe("markerPath", () => {
  it("draws plus and cross as strokes of the given size", () => {
    expect(markerPath("plus", 8)).toBe("M-4,0H4M0,-4V4");
    expect(markerPath("cross", 8)).toBe("M-3.4,-3.4L3.4,3.4M-3.4,3.4L3.4,-3.4");
  });
  it("draws a circle of diameter 8 as two arcs of radius 4 (d3 symbolCircle, area π·4²)", () => {
    expect(markerPath("circle", 8)).toBe("M4,0A4,4,0,1,1,-4,0A4,4,0,1,1,4,0");
  });
  it("throws for a zero size and an unknown shape", () => {
    expect(() => markerPath("circle", 0)).toThrow(RangeError);
    expect(() => markerPath("hexagon" as never, 8)).toThrow(TypeError);
  });
});

describe("markerIndices", () => {
  it("spaces markers evenly: 101 points, 5 markers → 0, 25, 50, 75, 100", () => {
    expect(markerIndices(101, 5)).toEqual([0, 25, 50, 75, 100]);
  });
  it("shifts by a phase and drops positions past the end", () => {
    expect(markerIndices(101, 5, 0.5)).toEqual([13, 38, 63, 88]);
  });
  it("handles empty and single-point series", () => {
    expect(markerIndices(0, 5)).toEqual([]);
    expect(markerIndices(1, 5)).toEqual([0]);
    expect(markerIndices(10, 0)).toEqual([]);
  });
  it("rejects negative and fractional lengths", () => {
    expect(() => markerIndices(-1, 2)).toThrow(RangeError);
    expect(() => markerIndices(2.5, 2)).toThrow(RangeError);
  });
});

describe("hatchPath", () => {
  it("centres vertical lines: 10 × 4 px at 5 px spacing → x 2.5 and 7.5", () => {
    expect(hatchPath({ x: 0, y: 0, width: 10, height: 4 }, { angleDeg: 90, spacingPx: 5 })).toBe("M2.5,0V4M7.5,0V4");
  });
  it("draws horizontal lines offset by the rectangle's origin", () => {
    expect(hatchPath({ x: 5, y: 5, width: 4, height: 10 }, { angleDeg: 0, spacingPx: 5 })).toBe("M5,7.5H9M5,12.5H9");
  });
  it("clips 45° lines to the rectangle", () => {
    const d = hatchPath({ x: 0, y: 0, width: 10, height: 10 }, { angleDeg: 45, spacingPx: 5 });
    expect(d).toBe("M0,3.54L3.54,0M0.61,10L10,0.61M7.68,10L10,7.68");
    for (const n of d.match(/-?[\d.]+/g)!.map(Number)) expect(n >= 0 && n <= 10).toBe(true);
  });
  it("is '' for an empty rectangle and throws for a zero spacing", () => {
    expect(hatchPath({ x: 0, y: 0, width: 0, height: 10 }, { angleDeg: 45, spacingPx: 5 })).toBe("");
    expect(() => hatchPath({ x: 0, y: 0, width: 1, height: 1 }, { angleDeg: 45, spacingPx: 0 })).toThrow(RangeError);
  });
});
