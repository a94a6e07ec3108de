import { describe, expect, it } from "vitest";
import {
  BUILD_SHEET_CAUTIONS,
  buildQuantities,
  buildSheet,
  fabricCutSize,
  framePieces,
  optimiseCuts,
  piecesPerSheet,
  presentBuildSheet,
  presentLength,
  triangleLayersPerSlab,
  type BuildSheetJob,
} from "@/lib/build-sheet";

// All expected values below are worked by hand from the dimensions (hand calculation); rules of thumb
// (screw counts, cleat counts, wrap allowance) are marked common practice.

const LUMBER = { thicknessM: 0.019, widthM: 0.1, densityKgM3: 500 };
const PANEL = { kind: "panel" as const, faceWidthM: 0.6, faceHeightM: 1.2, insulationThicknessM: 0.1, insulationDensityKgM3: 40 };

const JOB: BuildSheetJob = {
  items: [{ label: "side-wall panel", build: PANEL, count: 1 }],
  lumber: LUMBER,
  stockBoards: [{ lengthM: 2.4, price: 6 }],
  kerfM: 0.003,
  slab: { lengthM: 1.2, widthM: 0.6, thicknessM: 0.05, price: 4 },
  fabric: { wrapM: 0.05, pricePerM2: 10, massKgM2: 0.3 },
  sheet: { lengthM: 2.44, widthM: 1.22, price: 20 },
  fixings: { screwPrice: 0.05, cleatPrice: 3, bracketPrice: 2 },
};

describe("framePieces", () => {
  it("a 1200 × 600 × 100 mm panel from 19 × 100 mm lumber: two 1200 mm sides and two 562 mm ends (600 − 2×19) — hand calculation", () => {
    const p = framePieces(PANEL, LUMBER);
    expect(p).toHaveLength(2);
    expect(p[0]).toMatchObject({ label: "side", count: 2 });
    expect(p[0]!.lengthM).toBeCloseTo(1.2, 12);
    expect(p[1]).toMatchObject({ label: "end", count: 2 });
    expect(p[1]!.lengthM).toBeCloseTo(0.562, 12);
  });

  it("adds one centre rail when the side exceeds 1.2 m (common practice) and two retaining slats behind the slab when there is an air gap", () => {
    const p = framePieces({ ...PANEL, faceHeightM: 1.8, insulationThicknessM: 0.05, airGapM: 0.05 }, LUMBER);
    expect(p.map((x) => [x.label, x.count])).toEqual([
      ["side", 2],
      ["end", 2],
      ["centre rail", 1],
      ["retaining slat", 2],
    ]);
    expect(p[2]!.lengthM).toBeCloseTo(0.562, 12);
  });

  it("refuses a frame deeper than the lumber is wide, naming the field", () => {
    expect(() => framePieces({ ...PANEL, insulationThicknessM: 0.1, airGapM: 0.1 }, LUMBER)).toThrow(/lumber\.widthM/);
  });

  it("corner trap 300 mm deep, 2.4 m tall: two 2.4 m stiles and face rails of 2·0.3 − 2·0.019 = 0.562 m at the ends and every ≤ 1.2 m (3 rails) — hand calculation", () => {
    const p = framePieces({ kind: "corner-trap", depthM: 0.3, lengthM: 2.4, orientation: "floor-to-ceiling", insulationDensityKgM3: 35 }, LUMBER);
    expect(p.map((x) => [x.label, x.count])).toEqual([
      ["stile", 2],
      ["face rail", 3],
    ]);
    expect(p[0]!.lengthM).toBeCloseTo(2.4, 12);
    expect(p[1]!.lengthM).toBeCloseTo(0.562, 12);
  });
});

describe("optimiseCuts", () => {
  it("packs 2 × 1200 and 2 × 562 mm with 3 mm kerf into two 2.4 m boards by first-fit decreasing — hand calculation", () => {
    const r = optimiseCuts([{ label: "side", lengthM: 1.2, count: 2 }, { label: "end", lengthM: 0.562, count: 2 }], [{ lengthM: 2.4 }], 0.003);
    expect(r.boards).toHaveLength(2);
    // board 1: 1.203 + 0.565 + 0.565 = 2.333 m used, 0.067 m offcut; board 2: 1.203 used (2 × 1.203 > 2.4)
    expect(r.boards[0]!.cuts.map((c) => c.lengthM)).toEqual([1.2, 0.562, 0.562]);
    expect(r.boards[0]!.usedM).toBeCloseTo(2.333, 12);
    expect(r.boards[0]!.offcutM).toBeCloseTo(0.067, 12);
    expect(r.boards[1]!.cuts.map((c) => c.lengthM)).toEqual([1.2]);
    expect(r.countsByLength).toEqual([{ lengthM: 2.4, count: 2 }]);
  });

  it("kerf matters: 6 sides + 6 ends need 6 boards with 3 mm kerf but 5 without — hand calculation", () => {
    const pieces = [{ label: "side", lengthM: 1.2, count: 6 }, { label: "end", lengthM: 0.562, count: 6 }];
    expect(optimiseCuts(pieces, [{ lengthM: 2.4 }], 0.003).boards).toHaveLength(6); // 1 side per board, ends 2 per remainder
    expect(optimiseCuts(pieces, [{ lengthM: 2.4 }], 0).boards).toHaveLength(5); // 2 sides per board ×3, ends 4 + 2
  });

  it("takes the shortest stock length that holds each board's cuts", () => {
    const r = optimiseCuts([{ label: "stile", lengthM: 2.5, count: 1 }, { label: "rail", lengthM: 0.5, count: 1 }], [{ lengthM: 2.4 }, { lengthM: 3.0 }, { lengthM: 3.6 }], 0.003);
    // FFD: 2.503 opens a board of the longest stock (3.6 m); 0.503 fits its 1.097 m rest; 3.006 m used → the
    // shortest stock holding it is 3.6 m (3.0 < 3.006)
    expect(r.boards).toHaveLength(1);
    expect(r.boards[0]!.stockLengthM).toBe(3.6);
  });

  it("throws a RangeError for a piece longer than every stock length, and returns nothing for no pieces", () => {
    expect(() => optimiseCuts([{ label: "stile", lengthM: 2.5, count: 1 }], [{ lengthM: 2.4 }], 0.003)).toThrow(RangeError);
    expect(optimiseCuts([], [{ lengthM: 2.4 }], 0.003).boards).toEqual([]);
  });
});

describe("slabs, fabric and sheets", () => {
  it("piecesPerSheet: a 1162 × 562 mm fill fits once in a 1200 × 600 slab, a 562 × 562 twice; a 700 × 700 not at all — hand calculation", () => {
    expect(piecesPerSheet(1.162, 0.562, { lengthM: 1.2, widthM: 0.6 })).toBe(1);
    expect(piecesPerSheet(0.562, 0.562, { lengthM: 1.2, widthM: 0.6 })).toBe(2);
    expect(piecesPerSheet(0.7, 0.7, { lengthM: 1.2, widthM: 0.6 })).toBe(0);
  });

  it("triangleLayersPerSlab: legs 0.3·√2 = 0.424 m → 2 × 1 squares → 4 triangles per 1200 × 600 slab — hand calculation", () => {
    expect(triangleLayersPerSlab(0.3 * Math.SQRT2, { lengthM: 1.2, widthM: 0.6 })).toBe(4);
    expect(triangleLayersPerSlab(0.45 * Math.SQRT2, { lengthM: 1.2, widthM: 0.6 })).toBe(0); // 0.636 m > 0.6 m: pieced
  });

  it("fabricCutSize: face plus the frame depth on each side plus a 50 mm wrap each side (common practice): 1500 × 900 mm = 1.35 m² — hand calculation", () => {
    const f = fabricCutSize(0.6, 1.2, 0.1, 0.05);
    expect(f.widthM).toBeCloseTo(0.9, 12);
    expect(f.heightM).toBeCloseTo(1.5, 12);
    expect(f.areaM2).toBeCloseTo(1.35, 12);
  });
});

describe("buildQuantities", () => {
  it("panel 1200 × 600 × 100 mm: frame 3.524 m of 19 × 100, fill 0.065304 m³, fabric 1.35 m², 8 screws, weight 6.365 kg — hand calculation", () => {
    const q = buildQuantities(PANEL, { lumber: LUMBER, fabric: JOB.fabric });
    expect(q.frameLengthM).toBeCloseTo(3.524, 12);
    expect(q.insulationVolumeM3).toBeCloseTo(0.562 * 1.162 * 0.1, 12);
    expect(q.fabricAreaM2).toBeCloseTo(1.35, 12);
    expect(q.screws).toBe(8); // 2 per frame joint × 4 joints (common practice)
    // wood 3.524 × 0.019 × 0.1 × 500 = 3.3478; fill 0.0653044 × 40 = 2.612176; fabric 1.35 × 0.3 = 0.405
    expect(q.weightKg).toBeCloseTo(3.3478 + 2.612176 + 0.405, 9);
    expect(q.cleats).toBe(2); // max(2, ceil(6.4 kg / 10 kg)) (common practice)
  });

  it("corner trap 300 × 2.4 m: fill D²·ℓ = 0.216 m³ (right-isosceles section of legs D√2), fabric (0.6 + 0.1) × (2.4 + 0.1) m — hand calculation", () => {
    const q = buildQuantities({ kind: "corner-trap", depthM: 0.3, lengthM: 2.4, orientation: "floor-to-ceiling", insulationDensityKgM3: 35 }, { lumber: LUMBER, fabric: JOB.fabric });
    expect(q.insulationVolumeM3).toBeCloseTo(0.216, 12);
    expect(q.fabricAreaM2).toBeCloseTo(0.7 * 2.5, 12);
    expect(q.brackets).toBe(4); // tip restraint: max(1, ceil(2.4/1.2)) per wall × 2 walls (common practice)
  });

  it("membrane trap 600 × 1200, 9 mm sheet at 750 kg/m³ over a 134 mm cavity: sheet 0.72 m², 6.75 kg/m², sheet screws every 150 mm round the edge (24) — hand calculation", () => {
    const q = buildQuantities(
      { kind: "membrane-trap", faceWidthM: 0.6, faceHeightM: 1.2, cavityDepthM: 0.134, fillThicknessM: 0.05, faceSheetThicknessM: 0.009, faceSheetDensityKgM3: 750, insulationDensityKgM3: 35 },
      { lumber: { ...LUMBER, widthM: 0.15 }, fabric: JOB.fabric },
    );
    expect(q.sheetAreaM2).toBeCloseTo(0.72, 12);
    expect(q.fabricAreaM2).toBe(0);
    expect(q.screws).toBe(8 + 24); // 3.6 m perimeter / 0.15 m
    // wood 3.524 × 0.019 × 0.134 × 500; fill 0.562·1.162·0.05·35; sheet 0.72·0.009·750
    expect(q.weightKg).toBeCloseTo(3.524 * 0.019 * 0.134 * 500 + 0.562 * 1.162 * 0.05 * 35 + 0.72 * 0.009 * 750, 9);
  });
});

describe("buildSheet", () => {
  it("three panels: 6 boards of 2.4 m, 6 slabs (2 layers of 50 mm each), 4.05 m² fabric, cost 6·6 + 6·4 + 4.05·10 + 24·0.05 + 6·3 — hand calculation", () => {
    const s = buildSheet({ ...JOB, items: [{ label: "side-wall panel", build: PANEL, count: 3 }] });
    expect(s.totals.boards).toEqual([{ lengthM: 2.4, count: 6 }]);
    expect(s.builds[0]!.slabs).toBe(6);
    expect(s.totals.slabs).toBe(6);
    expect(s.totals.fabricAreaM2).toBeCloseTo(4.05, 12);
    expect(s.totals.screws).toBe(24);
    expect(s.totals.cleats).toBe(6);
    expect(s.totals.cost.total).toBeCloseTo(36 + 24 + 40.5 + 1.2 + 18, 9);
    expect(s.totals.weightKg).toBeCloseTo(3 * (3.3478 + 2.612176 + 0.405), 9);
  });

  it("corner trap fill of 300 mm depth and 2.4 m: 24 layers of 100 mm triangles, 4 per slab → 6 slabs — hand calculation", () => {
    const s = buildSheet({
      ...JOB,
      slab: { lengthM: 1.2, widthM: 0.6, thicknessM: 0.1, price: 4 },
      stockBoards: [{ lengthM: 2.4, price: 6 }, { lengthM: 3.0, price: 8 }],
      items: [{ build: { kind: "corner-trap", depthM: 0.3, lengthM: 2.4, orientation: "floor-to-ceiling", insulationDensityKgM3: 35 }, count: 1 }],
    });
    expect(s.builds[0]!.slabs).toBe(6);
  });

  it("a corner trap too deep for whole triangles is pieced by volume with 15 % waste (common practice): D 0.45, ℓ 2.4 → ceil(0.486·1.15/0.072) = 8 slabs — hand calculation", () => {
    const s = buildSheet({
      ...JOB,
      slab: { lengthM: 1.2, widthM: 0.6, thicknessM: 0.1, price: 4 },
      stockBoards: [{ lengthM: 2.4, price: 6 }, { lengthM: 3.0, price: 8 }], // a 2.4 m stile plus kerf needs the 3.0 m stock
      items: [{ build: { kind: "corner-trap", depthM: 0.45, lengthM: 2.4, orientation: "floor-to-ceiling", insulationDensityKgM3: 35 }, count: 1 }],
    });
    expect(s.builds[0]!.slabs).toBe(8); // 0.45² · 2.4 = 0.486 m³; × 1.15 = 0.5589; / 0.072 = 7.76
    expect(s.builds[0]!.notes.join(" ")).toMatch(/pieced/);
  });

  it("always carries the cautions: fibres, fire rating, fixings into structure, wiring and pipes, loud signals, local codes", () => {
    const s = buildSheet(JOB);
    const text = s.cautions.join(" ");
    for (const word of [/gloves/, /eye protection/, /respirator|dust mask/, /extraction|outdoors/, /fire/, /heat sources|light fittings/, /anchors rated/, /wiring and pipes/, /hearing/, /local building codes/, /licensed professional/]) {
      expect(text).toMatch(word);
    }
    expect(BUILD_SHEET_CAUTIONS.length).toBeGreaterThanOrEqual(5);
  });

  it("rejects an empty job and a zero count", () => {
    expect(() => buildSheet({ ...JOB, items: [] })).toThrow(RangeError);
    expect(() => buildSheet({ ...JOB, items: [{ build: PANEL, count: 0 }] })).toThrow(/count/);
  });
});

describe("presentLength / presentBuildSheet", () => {
  it("metric mm and imperial inches to the nearest 1/16 in (1 in = 25.4 mm exactly, 1959 agreement)", () => {
    expect(presentLength(0.562, "metric")).toBe("562 mm");
    expect(presentLength(0.562, "imperial")).toBe("22 1/8 in"); // 22.126 in
    expect(presentLength(1.2, "imperial")).toBe("47 1/4 in"); // 47.244 in
    expect(presentLength(0.0254 * 24, "imperial")).toBe("24 in");
  });

  it("converts the sheet only at the edge: same counts, lengths in inches, areas in ft², weight in lb", () => {
    const s = buildSheet(JOB);
    const p = presentBuildSheet(s, "imperial");
    expect(p.builds[0]!.cutList[1]).toMatchObject({ label: "end", count: 2, length: "22 1/8 in" });
    expect(p.totals.fabricArea).toBe(`${(1.35 / 0.09290304).toFixed(1)} ft²`);
    expect(p.totals.weight).toBe(`${(s.totals.weightKg / 0.45359237).toFixed(1)} lb`);
    expect(presentBuildSheet(s, "metric").totals.weight).toBe(`${s.totals.weightKg.toFixed(1)} kg`);
  });
});
