import { describe, expect, it } from "vitest";
import { roomModes, type RoomMode } from "../../../lib/modes/index";
import { bruteForceModes } from "./reference";

const key = (m: { nx: number; ny: number; nz: number }) => `${m.nx},${m.ny},${m.nz}`;

describe("roomModes(room, { maxFrequencyHz, speedOfSound })", () => {
  it("gives 45.0 Hz for the first axial length mode of a 3.81 m (12.5 ft) room at c = 343 (Rayleigh's equation by hand: 343 / (2 * 3.81) = 45.01 Hz)", () => {
    const modes = roomModes({ lengthM: 3.81, widthM: 3.0, heightM: 2.4 }, { maxFrequencyHz: 50, speedOfSound: 343 });
    const m100 = modes.find((m) => m.nx === 1 && m.ny === 0 && m.nz === 0);
    expect(m100).toBeDefined();
    expect(m100!.frequencyHz).toBeCloseTo(45.0, 1); // tolerance 0.05 Hz
    expect(m100!.frequencyHz).toBeCloseTo(343 / (2 * 3.81), 10);
    expect(m100!.kind).toBe("axial");
    expect(modes[0]).toEqual(m100); // the longest dimension gives the lowest mode
  });

  it("lists a 3 m cube's degenerate modes three at a time (Rayleigh's equation by hand: c/(2L) = 57.17 Hz, x sqrt2 = 80.85 Hz, x sqrt3 = 99.02 Hz, x 2 = 114.33 Hz)", () => {
    const modes = roomModes({ lengthM: 3, widthM: 3, heightM: 3 }, { maxFrequencyHz: 115 });
    const f0 = 343 / 6;
    const groups = [
      { f: f0, n: 3, kind: "axial" },
      { f: f0 * Math.SQRT2, n: 3, kind: "tangential" },
      { f: f0 * Math.sqrt(3), n: 1, kind: "oblique" },
      { f: 2 * f0, n: 3, kind: "axial" },
    ];
    expect(modes).toHaveLength(10);
    let i = 0;
    for (const g of groups) {
      for (let k = 0; k < g.n; k++, i++) {
        expect(modes[i]!.frequencyHz).toBeCloseTo(g.f, 9);
        expect(modes[i]!.kind).toBe(g.kind);
      }
    }
    expect(f0).toBeCloseTo(57.17, 2);
  });

  it("matches REFERENCES.md for 5 x 4 x 3 m at c = 343: first modes 34.30, 42.88, 54.91, 57.17, 66.67 Hz and 13/39/76/230 modes up to 100/150/200/300 Hz ([calc] cross-check)", () => {
    const room = { lengthM: 5, widthM: 4, heightM: 3 };
    const first = roomModes(room, { maxFrequencyHz: 67 }).map((m) => m.frequencyHz);
    expect(first).toHaveLength(5);
    // REFERENCES.md gives two decimals: tolerance half a unit of the last one (42.875 rounds to 42.88).
    [34.3, 42.88, 54.91, 57.17, 66.67].forEach((f, i) => expect(Math.abs(first[i]! - f)).toBeLessThanOrEqual(0.005 + 1e-9));
    const counts = [100, 150, 200, 300].map((f) => roomModes(room, { maxFrequencyHz: f }).length);
    expect(counts).toEqual([13, 39, 76, 230]);
  });

  it("is ascending and complete: the same set as a brute-force enumeration in the test (Rayleigh's equation)", () => {
    for (const L of [[5, 4, 3], [7.2, 5.1, 2.7], [2.1, 9.7, 3.3], [1, 1, 1]] as [number, number, number][]) {
      const fMax = 260;
      const modes = roomModes({ lengthM: L[0], widthM: L[1], heightM: L[2] }, { maxFrequencyHz: fMax });
      for (let i = 1; i < modes.length; i++) expect(modes[i]!.frequencyHz).toBeGreaterThanOrEqual(modes[i - 1]!.frequencyHz);
      const ref = bruteForceModes(L, fMax);
      expect(modes.length).toBe(ref.length);
      const got = new Map(modes.map((m) => [key(m), m]));
      for (const r of ref) {
        const m = got.get(key(r));
        expect(m, key(r)).toBeDefined();
        expect(m!.frequencyHz).toBeCloseTo(r.f, 9);
        const nonZero = [r.nx, r.ny, r.nz].filter((n) => n > 0).length;
        expect(m!.kind).toBe(["", "axial", "tangential", "oblique"][nonZero]);
      }
      expect(modes.some((m) => m.nx === 0 && m.ny === 0 && m.nz === 0)).toBe(false);
    }
  });

  it("includes a mode exactly at maxFrequencyHz (inclusive bound, CONTRACTS.md)", () => {
    const room = { lengthM: 3.43, widthM: 2, heightM: 1.5 };
    const f1 = roomModes(room, { maxFrequencyHz: 60 })[0]!.frequencyHz; // 343 / (2 * 3.43) = 50 Hz by hand
    expect(f1).toBeCloseTo(50, 9);
    const modes: RoomMode[] = roomModes(room, { maxFrequencyHz: f1 });
    expect(modes.map(key)).toEqual(["1,0,0"]);
  });

  it("scales with the speed of sound (Rayleigh's equation is linear in c)", () => {
    const room = { lengthM: 5, widthM: 4, heightM: 3 };
    const a = roomModes(room, { maxFrequencyHz: 100, speedOfSound: 343 });
    const b = roomModes(room, { maxFrequencyHz: (100 * 400) / 343, speedOfSound: 400 });
    expect(b.length).toBe(a.length);
    b.forEach((m, i) => expect(m.frequencyHz).toBeCloseTo((400 / 343) * a[i]!.frequencyHz, 9));
  });

  it("returns an empty list when maxFrequencyHz is below the first mode", () => {
    expect(roomModes({ lengthM: 5, widthM: 4, heightM: 3 }, { maxFrequencyHz: 30 })).toEqual([]);
  });
});
