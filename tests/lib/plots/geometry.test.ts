import { describe, expect, it } from "vitest";
import {
  absorptionGeometry, bandBarsGeometry, bandDomain, bandSlots, centreLevels, frequencyResponseGeometry, groupedBars, heatmapCellAt, heatmapGeometry,
  legendLayout, logFrequencyScale, modeSpectrumGeometry, seriesStyle, seriesTable, VERDICT_STYLE,
} from "@/lib/plots";

describe("seriesStyle", () => {
  it("gives ink solid circles first, then Okabe–Ito blue dashed squares, and wraps after eight", () => {
    expect(seriesStyle(0)).toEqual({ colour: "#1f2328", dash: "", marker: "circle" });
    expect(seriesStyle(1)).toEqual({ colour: "#0072B2", dash: "7 3", marker: "square" });
    expect(seriesStyle(8)).toEqual(seriesStyle(0));
    expect(() => seriesStyle(-1)).toThrow(RangeError);
  });
  it("gives every verdict a different shape as well as a colour", () => {
    const shapes = new Set(Object.values(VERDICT_STYLE).map((v) => v.marker));
    expect(shapes.size).toBe(3);
  });
});

describe("bandSlots / bandDomain / groupedBars", () => {
  it("tiles octave bands edge to edge on a log axis: 125 and 250 Hz share the 176.8 Hz edge", () => {
    const domain = bandDomain([125, 250], 1);
    expect(domain[0]).toBeCloseTo(125 / Math.SQRT2, 9);
    expect(domain[1]).toBeCloseTo(250 * Math.SQRT2, 9);
    const slots = bandSlots([125, 250], 1, logFrequencyScale(domain, [0, 200]));
    expect(slots[0]!.x0).toBeCloseTo(0, 9);
    expect(slots[0]!.x1).toBeCloseTo(100, 9);
    expect(slots[1]!.x0).toBeCloseTo(100, 9);
    expect(slots[1]!.x1).toBeCloseTo(200, 9);
    expect(slots[0]!.highHz).toBeCloseTo(slots[1]!.lowHz, 9);
  });
  it("centres third-octave slots on the exact base-2 mid-band (63 → 62.996 Hz, IEC 61260-1)", () => {
    const s = bandSlots([63], 3, logFrequencyScale([50, 80], [0, 100]))[0]!;
    expect(Math.sqrt(s.lowHz * s.highHz)).toBeCloseTo(1000 * 2 ** (-4), 6);
  });
  it("splits a slot into equal bars inside the padding", () => {
    expect(groupedBars({ x0: 0, x1: 100 }, 2, 0.1)).toEqual([{ x: 10, width: 40 }, { x: 50, width: 40 }]);
    expect(() => groupedBars({ x0: 0, x1: 1 }, 0)).toThrow(RangeError);
    expect(() => bandDomain([], 1)).toThrow(RangeError);
  });
});

describe("legendLayout", () => {
  it("wraps entries into rows at the available width", () => {
    const items = ["Untreated", "Panels", "Panels + corner traps"].map((label) => ({ label, colour: "#000", kind: "line" as const }));
    const wide = legendLayout(items, 1000);
    expect(wide.height).toBe(18);
    expect(wide.items.map((i) => i.y)).toEqual([9, 9, 9]);
    const narrow = legendLayout(items, 120);
    expect(narrow.items.map((i) => [i.x, i.y])).toEqual([[0, 9], [0, 27], [0, 45]]);
    expect(legendLayout([], 100)).toEqual({ items: [], width: 0, height: 0 });
  });
});

describe("seriesTable / centreLevels", () => {
  it("is wide when all series share x, long otherwise", () => {
    expect(seriesTable({ label: "f", unit: "Hz" }, { unit: "dB" }, [{ label: "A", x: [1, 2], y: [3, null] }, { label: "B", x: [1, 2], y: [5, 6] }]).rows).toEqual([[1, 3, 5], [2, null, 6]]);
    expect(seriesTable({ label: "f" }, {}, [{ label: "A", x: [1], y: [3] }, { label: "B", x: [2], y: [NaN] }]).rows).toEqual([["A", 1, 3], ["B", 2, null]]);
    expect(() => seriesTable({ label: "f" }, {}, [{ label: "A", x: [1], y: [] }])).toThrow(RangeError);
  });
  it("removes one common mean, keeps the differences and drops the −300 dB null floor", () => {
    expect(centreLevels([[1, 3, -300], [5]])).toEqual([[-2, 0, null], [2]]);
    expect(centreLevels([[-300]])).toEqual([[null]]);
    expect(centreLevels([])).toEqual([]);
  });
});

describe("frequencyResponseGeometry", () => {
  const series = [{ label: "Seat 1", frequenciesHz: [20, 200], levelsDb: [0, -10] }];
  it("maps the curve onto the plot area: 20 Hz at x 0, 200 Hz at the right edge", () => {
    const g = frequencyResponseGeometry({ series, levelDomainDb: [-10, 0] }, { width: 600, areaHeight: 200 });
    expect(g.area.height).toBe(200);
    expect(g.series[0]!.path).toBe(`M0,0L${Math.round(g.area.width * 100) / 100},200`);
    expect(g.xAxis.ticks.filter((t) => t.major).map((t) => t.label)).toEqual(["20", "50", "100", "200"]);
    expect(g.table.rows).toEqual([[20, 0], [200, -10]]);
  });
  it("shades a band and places the marker label right of its line", () => {
    const g = frequencyResponseGeometry({ series, shadedBand: { fromHz: 20, toHz: Math.sqrt(20 * 200), label: "below" }, markers: [{ value: Math.sqrt(20 * 200), label: "f" }] }, { width: 600 });
    expect(g.band!.x0).toBe(0);
    expect(g.band!.x1).toBeCloseTo(g.area.width / 2, 9); // the geometric middle of 20–200 Hz
    expect(g.markerLines[0]!.anchor).toBe("start");
    expect(g.markerLines[0]!.labelX).toBeCloseTo(g.markerLines[0]!.x + 4, 9);
  });
  it("stacks marker labels that would overlap into a second row", () => {
    const g = frequencyResponseGeometry({ series, markers: [{ value: 50, label: "first label" }, { value: 51, label: "second label" }] }, { width: 600 });
    expect(g.markerLines.map((m) => m.labelY)).toEqual([14, 28]);
  });
  it("draws empty data as an empty plot with a default domain, and gaps for −300 dB nulls", () => {
    const empty = frequencyResponseGeometry({ series: [] }, { width: 400 });
    expect(empty.series).toEqual([]);
    expect(empty.summary).toBe("No data.");
    const gap = frequencyResponseGeometry({ series: [{ label: "A", frequenciesHz: [20, 50, 100], levelsDb: [0, -300, 0] }] }, { width: 400 });
    expect(gap.series[0]!.path).toMatch(/^M[\d.]+,[\d.]+h0M[\d.]+,[\d.]+h0$/);
  });
  it("throws when a series has more levels than frequencies", () => {
    expect(() => frequencyResponseGeometry({ series: [{ label: "A", frequenciesHz: [20], levelsDb: [0, 1] }] }, { width: 400 })).toThrow(/series\[0\]/);
  });
});

describe("modeSpectrumGeometry", () => {
  const modes = [
    { nx: 1, ny: 0, nz: 0, frequencyHz: 29.6, kind: "axial" as const },
    { nx: 0, ny: 1, nz: 0, frequencyHz: 41.8, kind: "axial" as const },
    { nx: 1, ny: 1, nz: 0, frequencyHz: 51.2, kind: "tangential" as const },
    { nx: 1, ny: 1, nz: 1, frequencyHz: 85.0, kind: "oblique" as const },
    { nx: 2, ny: 1, nz: 1, frequencyHz: 85.0, kind: "oblique" as const },
  ];
  it("puts each kind in its lane and merges coincident modes into one stem with a count", () => {
    const g = modeSpectrumGeometry({ modes, bandwidthHz: 4 }, { width: 600 });
    expect(g.stems.map((s) => [s.kind, s.modes.length])).toEqual([["axial", 1], ["axial", 1], ["tangential", 1], ["oblique", 2]]);
    expect(g.stems[3]!.countLabel).toBe(true);
    expect(g.stems[0]!.yBottom).toBe(46);
    expect(g.stems[3]!.yBottom).toBe(138);
    const bar = g.stems[0]!.bar!;
    const x = logFrequencyScale([20, 100], [0, g.area.width]);
    expect(bar.x0).toBeCloseTo(x.map(27.6), 9);
    expect(bar.x1).toBeCloseTo(x.map(31.6), 9);
    expect(g.table.rows[0]).toEqual([29.6, "axial", 1, 0, 0]);
  });
  it("orders hover positions by x and supports a linear axis from 0 Hz", () => {
    const g = modeSpectrumGeometry({ modes, scale: "linear", domainHz: [0, 100] }, { width: 600 });
    expect([...g.hoverX].sort((a, b) => a - b)).toEqual(g.hoverX);
    expect(g.xAxis.ticks[0]).toMatchObject({ value: 0, pos: 0, label: "0" });
  });
  it("handles no modes and rejects a bad kind", () => {
    expect(modeSpectrumGeometry({ modes: [] }, { width: 300 }).summary).toBe("No room modes in range.");
    expect(() => modeSpectrumGeometry({ modes: [{ nx: 1, ny: 0, nz: 0, frequencyHz: 30, kind: "radial" as never }] }, { width: 300 })).toThrow(TypeError);
  });
});

describe("bandBarsGeometry", () => {
  const input = {
    bandsHz: [125, 250],
    scenarios: [{ label: "Baseline", values: [0.6, 0.3], verdicts: ["outside", "within"] as const }],
    target: [{ lowerS: 0.2, upperS: 0.4, targetS: 0.3 }, { lowerS: 0.2, upperS: 0.4, targetS: 0.3 }],
    yDomain: [0, 1] as const,
  };
  it("draws bars from the zero baseline to the value on the y scale", () => {
    const g = bandBarsGeometry(input, { width: 600, areaHeight: 200 });
    expect(g.bars.map((b) => [b.y, b.height])).toEqual([[80, 120], [140, 60]]);
    expect(g.verdictMarkers.map((m) => [m.verdict, m.shape, m.y])).toEqual([["outside", "cross", 72], ["within", "circle", 132]]);
  });
  it("shades the target region between 0.4 s (y 120) and 0.2 s (y 160), with continuous edges", () => {
    const g = bandBarsGeometry(input, { width: 600, areaHeight: 200 });
    expect(g.targetArea).toMatch(/^M0,120H[\d.]+V160H0Z/);
    expect(g.targetEdges.startsWith("M0,120H")).toBe(true);
    expect(g.targetEdges.match(/M/g)).toHaveLength(2);
  });
  it("draws stepped lines with gaps at missing values in steps mode", () => {
    const g = bandBarsGeometry({ ...input, mode: "steps", scenarios: [{ label: "A", values: [0.5, null] }] }, { width: 600, areaHeight: 200 });
    expect(g.bars).toEqual([]);
    expect(g.steps[0]!.path).toMatch(/^M0,100H[\d.]+$/);
  });
  it("writes a table with verdicts and target limits", () => {
    const g = bandBarsGeometry(input, { width: 600 });
    expect(g.table.columns.map((c) => c.label)).toEqual(["Band", "Baseline", "Baseline verdict", "Target lower", "Target upper"]);
    expect(g.table.rows[0]).toEqual([125, 0.6, "outside", 0.2, 0.4]);
  });
  it("rejects misaligned values and empty bands", () => {
    expect(() => bandBarsGeometry({ bandsHz: [125], scenarios: [{ label: "A", values: [1, 2] }] }, { width: 600 })).toThrow(/scenarios\[0\]/);
    expect(() => bandBarsGeometry({ bandsHz: [], scenarios: [] }, { width: 600 })).toThrow(RangeError);
  });
});

describe("absorptionGeometry", () => {
  const points = [
    { frequencyHz: 100, alpha: 0.1, withinModelRange: false },
    { frequencyHz: 200, alpha: 0.4, withinModelRange: true },
    { frequencyHz: 400, alpha: 0.8, withinModelRange: true },
  ];
  it("keeps the y axis at 0–1.0 and splits the line where the model's fitted range ends", () => {
    const g = absorptionGeometry({ builds: [{ label: "Panel", points }] }, { width: 600, areaHeight: 200 });
    expect(g.yAxis.ticks[0]!.label).toBe("0.0");
    expect(g.yAxis.ticks.at(-1)!.label).toBe("1.0");
    expect(g.builds[0]!.runs.map((r) => r.withinModelRange)).toEqual([false, true]);
    expect(g.builds[0]!.markers.map((m) => m.hollow)).toEqual([true, false, false]);
    expect(g.anyOutside).toBe(true);
    expect(g.legend.items.at(-1)!.label).toBe("outside the model's fitted range");
  });
  it("extends the axis below 0 and above 1 when α does (a model dip, a resonant peak)", () => {
    const g = absorptionGeometry({ builds: [{ label: "A", points: [{ frequencyHz: 100, alpha: -0.03, withinModelRange: false }, { frequencyHz: 200, alpha: 1.12, withinModelRange: true }] }] }, { width: 600 });
    expect(g.yAxis.ticks[0]!.value).toBeLessThan(0);
    expect(g.yAxis.ticks.at(-1)!.value).toBeGreaterThanOrEqual(1.2);
  });
  it("rejects NaN α", () => {
    expect(() => absorptionGeometry({ builds: [{ label: "A", points: [{ frequencyHz: 100, alpha: NaN, withinModelRange: true }] }] }, { width: 600 })).toThrow(/alpha/);
  });
});

describe("heatmapGeometry / heatmapCellAt", () => {
  const input = { lengthM: 4, widthM: 2, xM: [1, 3], yM: [0.5, 1.5], values: [1, 2, 3, 5], valueTitle: "Std-dev", valueUnit: "dB" };
  it("draws the plan to scale with cells indexed ix · gridY + iy", () => {
    const g = heatmapGeometry(input, { width: 400 });
    expect(g.area.height).toBeCloseTo(g.area.width / 2, 9);
    expect(g.cells.map((c) => [c.ix, c.iy, c.value])).toEqual([[0, 0, 1], [0, 1, 2], [1, 0, 3], [1, 1, 5]]);
    expect(g.cells[3]!.x + g.cells[3]!.width).toBeCloseTo(g.area.width, 1);
    expect(g.cells[0]!.fill).toBe(g.ramp.colour(1));
    expect(g.min).toEqual({ value: 1, ix: 0, iy: 0 });
    expect(g.max).toEqual({ value: 5, ix: 1, iy: 1 });
    expect(g.table.rows[1]).toEqual([1, 1.5, 2]);
  });
  it("caps the height and keeps the aspect ratio", () => {
    const g = heatmapGeometry({ ...input, lengthM: 2, widthM: 4, xM: [1], yM: [1, 3], values: [1, 2] }, { width: 1000, maxAreaHeight: 300 });
    expect(g.area.height).toBe(300);
    expect(g.area.width).toBe(150);
    expect(g.pxPerM).toBe(75);
  });
  it("maps a single cell and a flat field", () => {
    const g = heatmapGeometry({ ...input, xM: [2], yM: [1], values: [4] }, { width: 400 });
    expect(g.cells).toHaveLength(1);
    expect(g.ramp.domain).toEqual([3.5, 4.5]);
  });
  it("rejects a value count that does not match the grid", () => {
    expect(() => heatmapGeometry({ ...input, values: [1, 2, 3] }, { width: 400 })).toThrow(/gridX · gridY = 4/);
    expect(() => heatmapGeometry({ ...input, xM: [] }, { width: 400 })).toThrow(RangeError);
  });
  it("finds the cell under a point and nothing outside the area", () => {
    const g = { gridX: 2, gridY: 1, area: { x: 0, y: 0, width: 100, height: 50 } };
    expect(heatmapCellAt(g, 75, 10)).toEqual({ ix: 1, iy: 0 });
    expect(heatmapCellAt(g, 100, 50)).toEqual({ ix: 1, iy: 0 });
    expect(heatmapCellAt(g, -1, 10)).toBeUndefined();
    expect(heatmapCellAt(g, NaN, 10)).toBeUndefined();
  });
});
