import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  checkPlacement,
  cornerTrapFootprints,
  firstReflections,
  listeningAreaSeats,
  reflectionPoint,
  reflectionZones,
  suggestPanels,
  surfaceSize,
} from "@/lib/reflections";

// Geometry checks are hand calculations (image-source method: mirror the source in the plane, the
// reflection point is where the straight line from the image to the receiver crosses the plane).
const ROOM = { lengthM: 6, widthM: 4, heightM: 2.5 };

describe("reflectionPoint", () => {
  it("symmetric speaker and seat → the point halfway between their projections on the wall — hand calculation (1e-12)", () => {
    const r = reflectionPoint(ROOM, [1, 1, 1.2], [3, 1, 1.2], "left")!;
    expect(r.point[0]).toBeCloseTo(2, 12);
    expect(r.point[1]).toBe(0);
    expect(r.point[2]).toBeCloseTo(1.2, 12);
    expect(r.u).toBeCloseTo(2, 12); // left wall: u = x, v = z
    expect(r.v).toBeCloseTo(1.2, 12);
    expect(r.reflectedPathM).toBeCloseTo(Math.hypot(2, 2), 12); // image (1, −1, 1.2) to (3, 1, 1.2)
    expect(r.incidenceDeg).toBeCloseTo(45, 10);
  });

  it("asymmetric case by similar triangles: speaker 1 m and seat 2 m from the left wall → x splits 1:2 — hand calculation", () => {
    const left = reflectionPoint(ROOM, [1, 1, 1.2], [4, 2, 1.2], "left")!;
    expect(left.point[0]).toBeCloseTo(1 + (3 * 1) / 3, 12); // 2.0
    const right = reflectionPoint(ROOM, [1, 1, 1.2], [4, 2, 1.2], "right")!; // distances 3 and 2 from y = 4
    expect(right.point[0]).toBeCloseTo(1 + (3 * 3) / 5, 12); // 2.8
    expect(right.point[1]).toBe(4);
    expect(right.u).toBeCloseTo(2.8, 12);
  });

  it("ceiling: distances 1.3 and 1.5 m → t = 1.3/2.8 along both x and y; path from image (1, 1, 3.8) — hand calculation", () => {
    const c = reflectionPoint(ROOM, [1, 1, 1.2], [4, 2, 1.0], "ceiling")!;
    const t = 1.3 / 2.8;
    expect(c.point[0]).toBeCloseTo(1 + 3 * t, 12); // 2.392857
    expect(c.point[1]).toBeCloseTo(1 + 1 * t, 12); // 1.464286
    expect(c.point[2]).toBe(2.5);
    expect(c.reflectedPathM).toBeCloseTo(Math.sqrt(9 + 1 + 2.8 ** 2), 12); // 4.2237
    expect(c.directPathM).toBeCloseTo(Math.sqrt(9 + 1 + 0.04), 12);
    expect(c.delayMs).toBeCloseTo(((c.reflectedPathM - c.directPathM) / 343) * 1000, 12);
  });

  it("front and rear walls and the floor use y, z / x, y as surface coordinates", () => {
    const f = reflectionPoint(ROOM, [1, 1, 1.2], [3, 2, 1.2], "front")!; // distances 1 and 3 → t = 1/4
    expect(f.point).toEqual([0, expect.closeTo(1.25, 12), expect.closeTo(1.2, 12)]);
    expect([f.u, f.v]).toEqual([expect.closeTo(1.25, 12), expect.closeTo(1.2, 12)]);
    const fl = reflectionPoint(ROOM, [1, 1, 1.2], [3, 1, 1.2], "floor")!;
    expect([fl.u, fl.v]).toEqual([expect.closeTo(2, 12), expect.closeTo(1, 12)]);
  });

  it("returns undefined when source and receiver both lie on the surface, and throws for a point outside the room", () => {
    expect(reflectionPoint(ROOM, [1, 0, 1], [2, 0, 1], "left")).toBeUndefined();
    expect(() => reflectionPoint(ROOM, [7, 1, 1], [2, 1, 1], "left")).toThrow(/source/);
    expect(() => reflectionPoint(ROOM, [1, 1, 1], [2, 1, 1], "wall" as never)).toThrow(TypeError);
  });

  it("property: the point lies inside the surface and the path through it equals the image-source distance (so it obeys the law of reflection)", () => {
    const p = fc.tuple(fc.double({ min: 0.01, max: 0.99, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }));
    fc.assert(
      fc.property(p, p, fc.constantFrom("front", "rear", "left", "right", "floor", "ceiling" as const), (a, b, surface) => {
        const s: [number, number, number] = [a[0] * 6, a[1] * 4, a[2] * 2.5];
        const r: [number, number, number] = [b[0] * 6, b[1] * 4, b[2] * 2.5];
        const hit = reflectionPoint(ROOM, s, r, surface)!;
        const size = surfaceSize(ROOM, surface);
        expect(hit.u).toBeGreaterThanOrEqual(-1e-9);
        expect(hit.u).toBeLessThanOrEqual(size.uM + 1e-9);
        expect(hit.v).toBeGreaterThanOrEqual(-1e-9);
        expect(hit.v).toBeLessThanOrEqual(size.vM + 1e-9);
        const d1 = Math.hypot(...hit.point.map((x, i) => x - s[i]!));
        const d2 = Math.hypot(...hit.point.map((x, i) => x - r[i]!));
        expect(d1 + d2).toBeCloseTo(hit.reflectedPathM, 9); // path via the point = image distance
      }),
      { seed: 6, numRuns: 200 },
    );
  });
});

describe("firstReflections", () => {
  it("lists speakers × seats × 6 surfaces", () => {
    const r = firstReflections(ROOM, {
      speakers: [{ id: "L", position: [0.5, 1, 1.2] }, { id: "R", position: [0.5, 3, 1.2] }],
      seats: [{ id: "s1", position: [3.5, 2, 1.1] }],
    });
    expect(r).toHaveLength(12);
    expect(r.filter((x) => x.speakerId === "L" && x.surface === "left")).toHaveLength(1);
  });
});

describe("reflectionZones", () => {
  it("one speaker, two seats on the left wall: bounding rectangle of the two points padded by the margin — hand calculation", () => {
    // speaker (1, 1, 1.2); seat a (3, 1, 1.2) → t = 1/2: x = 2, z = 1.2
    const zones = reflectionZones(ROOM, {
      speakers: [{ id: "L", position: [1, 1, 1.2] }],
      seats: [{ id: "a", position: [3, 1, 1.2] }, { id: "b", position: [5, 1, 1.0] }],
      marginM: 0.2,
      surfaces: ["left"],
    });
    expect(zones).toHaveLength(1);
    const z = zones[0]!;
    // seat b: distances 1 and 1 → t = 1/2: x = 3, z = 1.1
    expect(z.uMinM).toBeCloseTo(2 - 0.2, 12);
    expect(z.uMaxM).toBeCloseTo(3 + 0.2, 12);
    expect(z.vMinM).toBeCloseTo(1.1 - 0.2, 12);
    expect(z.vMaxM).toBeCloseTo(1.2 + 0.2, 12);
    expect(z.speakerIds).toEqual(["L"]);
  });

  it("clips the padded rectangle to the surface and merges overlapping rectangles of two speakers", () => {
    const zones = reflectionZones(ROOM, {
      speakers: [{ id: "L", position: [0.3, 1, 1.2] }, { id: "R", position: [0.3, 3, 1.2] }],
      seats: [{ id: "a", position: [0.4, 2, 1.2] }],
      marginM: 0.6,
      surfaces: ["front"],
    });
    // front wall points: L → y = 1 + (1·0.3/0.7) = 1.4286, R → 3 − 0.4286 = 2.5714; padded ±0.6 → 2.03 > 1.97, overlap → one zone
    expect(zones).toHaveLength(1);
    expect(zones[0]!.uMinM).toBeCloseTo(1 + 0.3 / 0.7 - 0.6, 12);
    expect(zones[0]!.uMaxM).toBeCloseTo(3 - 0.3 / 0.7 + 0.6, 12);
    expect(zones[0]!.speakerIds).toEqual(["L", "R"]);
    const clipped = reflectionZones(ROOM, { speakers: [{ id: "L", position: [0.3, 0.2, 2.4] }], seats: [{ id: "a", position: [0.3, 0.2, 2.4] }], marginM: 0.5, surfaces: ["front"] });
    expect(clipped[0]!.uMinM).toBe(0);
    expect(clipped[0]!.vMaxM).toBe(2.5);
  });

  it("listeningAreaSeats: the four corners at ear height cover the area exactly (the reflection point is a linear-fractional map of the seat, extreme at corners)", () => {
    const seats = listeningAreaSeats({ xMinM: 3, xMaxM: 4, yMinM: 1.5, yMaxM: 2.5, earHeightM: 1.1 });
    expect(seats.map((s) => s.position)).toEqual([[3, 1.5, 1.1], [3, 2.5, 1.1], [4, 1.5, 1.1], [4, 2.5, 1.1]]);
    const zones = reflectionZones(ROOM, { speakers: [{ id: "L", position: [0.5, 1, 1.2] }], seats, marginM: 0, surfaces: ["left"] });
    // interior seats stay within the corner-seat zone
    for (const x of [3.2, 3.5, 3.9]) for (const y of [1.6, 2, 2.4]) {
      const p = reflectionPoint(ROOM, [0.5, 1, 1.2], [x, y, 1.1], "left")!;
      expect(p.u).toBeGreaterThanOrEqual(zones[0]!.uMinM - 1e-12);
      expect(p.u).toBeLessThanOrEqual(zones[0]!.uMaxM + 1e-12);
    }
  });
});

describe("suggestPanels", () => {
  it("a 1.5 × 0.8 m zone takes three portrait 600 × 1200 panels rather than four landscape ones — hand calculation", () => {
    const s = suggestPanels(ROOM, [{ surface: "left", uMinM: 1, uMaxM: 2.5, vMinM: 0.8, vMaxM: 1.6, speakerIds: ["L"], pointCount: 2 }]);
    expect(s).toHaveLength(1);
    expect(s[0]!.count).toBe(3); // landscape ceil(1.5/1.2)·ceil(0.8/0.6) = 4; portrait ceil(1.5/0.6)·ceil(0.8/1.2) = 3
    expect(s[0]!.panel).toEqual({ widthM: 0.6, heightM: 1.2 });
    expect(s[0]!.centreHeightM).toBeCloseTo(1.2, 12); // centred on the zone's middle height
    expect(s[0]!.bottomHeightM).toBeCloseTo(0.6, 12);
    expect(s[0]!.placements).toHaveLength(3);
    expect(s[0]!.placements[0]).toMatchObject({ surface: "left", uM: expect.closeTo(0.85, 12), vM: expect.closeTo(0.6, 12), widthM: 0.6, heightM: 1.2 });
  });

  it("shifts a grid that would leave the surface back inside it, and suggests a rug, not panels, on the floor", () => {
    const s = suggestPanels(ROOM, [
      { surface: "left", uMinM: 0, uMaxM: 0.5, vMinM: 2.2, vMaxM: 2.5, speakerIds: ["L"], pointCount: 1 },
      { surface: "floor", uMinM: 1, uMaxM: 2, vMinM: 1, vMaxM: 2, speakerIds: ["L"], pointCount: 1 },
    ]);
    expect(s[0]!.placements[0]!.uM).toBe(0);
    expect(s[0]!.placements[0]!.vM + s[0]!.placements[0]!.heightM).toBeCloseTo(2.5, 12);
    expect(s[1]!.count).toBe(0);
    expect(s[1]!.note).toMatch(/rug/);
    expect(checkPlacement(ROOM, { items: s[0]!.placements, openings: [] })).toEqual([]);
  });
});

describe("checkPlacement", () => {
  const panel = (id: string, uM: number, vM: number, surface = "left" as const) => ({ id, surface, uM, vM, widthM: 1.2, heightM: 0.6 });

  it("accepts panels that touch edge to edge, inside the wall, away from the door", () => {
    expect(checkPlacement(ROOM, { items: [panel("a", 0, 1), panel("b", 1.2, 1)], openings: [{ id: "door", surface: "left", uM: 4, vM: 0, widthM: 0.9, heightM: 2.1 }] })).toEqual([]);
  });

  it("reports a panel past the wall's end, an overlap and one covering the door, with plain messages", () => {
    const problems = checkPlacement(ROOM, {
      items: [panel("a", 5.2, 1), panel("b", 1, 1), panel("c", 1.5, 1.3), panel("d", 3.5, 1)],
      openings: [{ id: "door", surface: "left", uM: 4, vM: 0, widthM: 0.9, heightM: 2.1 }],
    });
    expect(problems.map((p) => [p.kind, p.itemIds])).toEqual([
      ["outside-surface", ["a"]],
      ["covers-opening", ["d", "door"]],
      ["overlap", ["b", "c"]],
    ]);
    expect(problems[0]!.message).toMatch(/left wall/);
    expect(problems[0]!.message).toMatch(/0\.4 m/); // 5.2 + 1.2 − 6 = 0.4
  });

  it("keeps a clearance round openings when asked, and only compares items on the same surface", () => {
    const opening = { id: "window", surface: "left" as const, uM: 2.3, vM: 0.9, widthM: 1, heightM: 1 };
    expect(checkPlacement(ROOM, { items: [panel("a", 1, 1)], openings: [opening] })).toEqual([]); // ends at 2.2
    expect(checkPlacement(ROOM, { items: [panel("a", 1, 1)], openings: [opening], clearanceM: 0.15 }).map((p) => p.kind)).toEqual(["covers-opening"]);
    expect(checkPlacement(ROOM, { items: [panel("a", 1, 1), panel("b", 1, 1, "right" as never)], openings: [] })).toEqual([]);
  });

  it("cornerTrapFootprints: a front-left floor-to-ceiling trap of leg 0.424 m occupies that strip on the front and left walls; a panel there overlaps", () => {
    const f = cornerTrapFootprints(ROOM, { id: "t1", corner: "front-left", legM: 0.424 });
    expect(f).toEqual([
      { id: "t1", surface: "front", uM: 0, vM: 0, widthM: 0.424, heightM: 2.5 },
      { id: "t1", surface: "left", uM: 0, vM: 0, widthM: 0.424, heightM: 2.5 },
    ]);
    const rr = cornerTrapFootprints(ROOM, { id: "t2", corner: "rear-right", legM: 0.5 });
    expect(rr).toEqual([
      { id: "t2", surface: "rear", uM: 3.5, vM: 0, widthM: 0.5, heightM: 2.5 },
      { id: "t2", surface: "right", uM: 5.5, vM: 0, widthM: 0.5, heightM: 2.5 },
    ]);
    expect(checkPlacement(ROOM, { items: [...f, panel("p", 0.2, 1)], openings: [] }).map((p) => p.kind)).toEqual(["overlap"]);
  });
});
