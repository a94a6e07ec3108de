import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { flatnessMap, modalResponse, roomModes, multiSourceResponse } from "../../../lib/modes/index";

const room = { lengthM: 5, widthM: 4, heightM: 3 };
const ok = { source: [1, 1, 1] as [number, number, number], receiver: [4, 3, 2] as [number, number, number], frequenciesHz: [40, 80], rt60Seconds: 0.5, maxModeFrequencyHz: 150 };
const grid = { source: [1, 1, 1] as [number, number, number], heightM: 1.2, gridX: 4, gridY: 3, frequenciesHz: [40, 80], rt60Seconds: 0.5, maxModeFrequencyHz: 150 };

describe("argument checks (documented: RangeError for a bad value, TypeError for a wrong type; the message names the field)", () => {
  const cases: [string, () => unknown, ErrorConstructor, RegExp][] = [
    ["negative length", () => roomModes({ ...room, lengthM: -5 }, { maxFrequencyHz: 100 }), RangeError, /^room\.lengthM must be a finite number in \(0, 100\] m/],
    ["NaN width", () => roomModes({ ...room, widthM: Number.NaN }, { maxFrequencyHz: 100 }), RangeError, /room\.widthM/],
    ["huge height", () => roomModes({ ...room, heightM: 1e6 }, { maxFrequencyHz: 100 }), RangeError, /room\.heightM/],
    ["string length", () => roomModes({ ...room, lengthM: "5" as unknown as number }, { maxFrequencyHz: 100 }), TypeError, /room\.lengthM/],
    ["missing room", () => roomModes(undefined as unknown as typeof room, { maxFrequencyHz: 100 }), TypeError, /room/],
    ["maxFrequencyHz 0", () => roomModes(room, { maxFrequencyHz: 0 }), RangeError, /maxFrequencyHz/],
    ["too many modes", () => roomModes({ lengthM: 100, widthM: 100, heightM: 100 }, { maxFrequencyHz: 1000 }), RangeError, /maxFrequencyHz/],
    ["speed of sound", () => roomModes(room, { maxFrequencyHz: 100, speedOfSound: -343 }), RangeError, /speedOfSound/],
    ["source outside", () => modalResponse(room, { ...ok, source: [5.01, 1, 1] }), RangeError, /^source\[0\] must lie inside the room/],
    ["receiver z outside", () => modalResponse(room, { ...ok, receiver: [1, 1, -0.1] }), RangeError, /receiver\[2\]/],
    ["receiver wrong length", () => modalResponse(room, { ...ok, receiver: [1, 1] as unknown as [number, number, number] }), TypeError, /receiver/],
    ["frequency 0.5 Hz", () => modalResponse(room, { ...ok, frequenciesHz: [40, 0.5] }), RangeError, /frequenciesHz\[1\]/],
    ["frequency NaN", () => modalResponse(room, { ...ok, frequenciesHz: [Number.NaN] }), RangeError, /frequenciesHz\[0\]/],
    ["empty frequencies", () => modalResponse(room, { ...ok, frequenciesHz: [] }), RangeError, /frequenciesHz/],
    ["too many frequencies", () => modalResponse(room, { ...ok, frequenciesHz: new Array(2001).fill(50) }), RangeError, /frequenciesHz/],
    ["rt60 too short", () => modalResponse(room, { ...ok, rt60Seconds: 0.01 }), RangeError, /rt60Seconds/],
    ["rt60 too long", () => modalResponse(room, { ...ok, rt60Seconds: 11 }), RangeError, /rt60Seconds/],
    ["missing maxModeFrequencyHz", () => modalResponse(room, { ...ok, maxModeFrequencyHz: undefined as unknown as number }), TypeError, /maxModeFrequencyHz/],
    ["grid too large", () => flatnessMap(room, { ...grid, gridX: 401 }), RangeError, /gridX/],
    ["grid not an integer", () => flatnessMap(room, { ...grid, gridY: 2.5 }), RangeError, /gridY/],
    ["height above the ceiling", () => flatnessMap(room, { ...grid, heightM: 3.5 }), RangeError, /heightM/],
    ["polarity 0", () => multiSourceResponse(room, { ...ok, sources: [{ position: [1, 1, 1], polarity: 0 as 1 }], receivers: [[2, 2, 2]] }), RangeError, /sources\[0\]\.polarity/],
    ["no sources", () => multiSourceResponse(room, { ...ok, sources: [], receivers: [[2, 2, 2]] }), RangeError, /sources/],
    ["flatness map needing too much memory (limits.ts)", () => flatnessMap({ lengthM: 0.1, widthM: 100, heightM: 0.1 }, { ...grid, source: [0, 0, 0], heightM: 0, gridX: 1, gridY: 1, frequenciesHz: new Array(2000).fill(50), maxModeFrequencyHz: 1000 }), RangeError, /^maxModeFrequencyHz/],
    ["flatness map needing too much time (limits.ts)", () => flatnessMap({ lengthM: 2, widthM: 100, heightM: 2 }, { ...grid, source: [0, 0, 0], heightM: 1, gridX: 400, gridY: 400, frequenciesHz: new Array(2000).fill(50), maxModeFrequencyHz: 250 }), RangeError, /^gridX, gridY/],
    ["multi-source response needing too much time (limits.ts)", () => multiSourceResponse({ lengthM: 20, widthM: 20, heightM: 10 }, { ...ok, sources: [{ position: [0, 0, 0] }], receivers: new Array(400).fill([1, 1, 1]), frequenciesHz: new Array(2000).fill(50), maxModeFrequencyHz: 400 }), RangeError, /^maxModeFrequencyHz/],
    ["negative delay", () => multiSourceResponse(room, { ...ok, sources: [{ position: [1, 1, 1], delayMs: -1 }], receivers: [[2, 2, 2]] }), RangeError, /sources\[0\]\.delayMs/],
  ];
  for (const [what, call, type, msg] of cases) {
    it(`throws ${type.name} for ${what}`, () => {
      expect(call).toThrow(type);
      expect(call).toThrow(msg);
    });
  }

  it("accepts positions exactly on the walls (0 <= x <= Lx, inclusive)", () => {
    expect(() => modalResponse(room, { ...ok, source: [0, 0, 0], receiver: [5, 4, 3] })).not.toThrow();
  });
});

describe("property tests (fast-check)", () => {
  const dim = fc.double({ min: 0.5, max: 30, noNaN: true });
  const roomArb = fc.record({ lengthM: dim, widthM: dim, heightM: dim });

  it("roomModes never gives NaN or Infinity and stays ascending for random valid rooms", () => {
    fc.assert(fc.property(roomArb, fc.double({ min: 1, max: 150, noNaN: true }), (r, f) => {
      const m = roomModes(r, { maxFrequencyHz: f });
      return m.every((x, i) => Number.isFinite(x.frequencyHz) && x.frequencyHz <= f && (i === 0 || x.frequencyHz >= m[i - 1]!.frequencyHz));
    }), { numRuns: 200 });
  });

  it("modalResponse never gives NaN or Infinity for random rooms, positions and frequencies", () => {
    const arb = roomArb.chain((r) => {
      const pos = fc.tuple(fc.double({ min: 0, max: r.lengthM, noNaN: true }), fc.double({ min: 0, max: r.widthM, noNaN: true }), fc.double({ min: 0, max: r.heightM, noNaN: true }));
      return fc.record({
        r: fc.constant(r), s: pos, p: pos,
        f: fc.array(fc.double({ min: 1, max: 1000, noNaN: true }), { minLength: 1, maxLength: 8 }),
        t: fc.double({ min: 0.05, max: 10, noNaN: true }),
        fm: fc.double({ min: 1, max: 120, noNaN: true }),
      });
    });
    fc.assert(fc.property(arb, ({ r, s, p, f, t, fm }) => {
      const lv = modalResponse(r, { source: s, receiver: p, frequenciesHz: f, rt60Seconds: t, maxModeFrequencyHz: fm });
      return lv.length === f.length && lv.every(Number.isFinite);
    }), { numRuns: 150 });
  });

  it("swapping length and width permutes the modes: (nx, ny, nz) -> (ny, nx, nz) at the same frequency (Rayleigh's equation is symmetric)", () => {
    fc.assert(fc.property(roomArb, fc.double({ min: 20, max: 120, noNaN: true }), (r, f) => {
      const a = roomModes(r, { maxFrequencyHz: f });
      const b = roomModes({ lengthM: r.widthM, widthM: r.lengthM, heightM: r.heightM }, { maxFrequencyHz: f });
      if (a.length !== b.length) return false;
      const map = new Map(b.map((m) => [`${m.nx},${m.ny},${m.nz}`, m.frequencyHz]));
      return a.every((m) => {
        const g = map.get(`${m.ny},${m.nx},${m.nz}`);
        return g !== undefined && Math.abs(g - m.frequencyHz) <= 1e-9 * m.frequencyHz;
      });
    }), { numRuns: 200 });
  });

  it("bad numbers anywhere in the room throw a RangeError naming the field", () => {
    const bad = fc.oneof(fc.constant(Number.NaN), fc.constant(Number.POSITIVE_INFINITY), fc.constant(Number.NEGATIVE_INFINITY), fc.double({ max: 0, noNaN: true }), fc.double({ min: 100.0001, max: 1e300, noNaN: true }));
    const field = fc.constantFrom("lengthM", "widthM", "heightM") as fc.Arbitrary<"lengthM" | "widthM" | "heightM">;
    fc.assert(fc.property(bad, field, (v, k) => {
      try { roomModes({ ...room, [k]: v }, { maxFrequencyHz: 100 }); return false; } catch (e) {
        return e instanceof RangeError && e.message.startsWith(`room.${k} `);
      }
    }));
  });

  it("positions outside the room throw a RangeError naming the coordinate", () => {
    const arb = fc.tuple(fc.integer({ min: 0, max: 2 }), fc.oneof(fc.double({ min: -1e6, max: -1e-9, noNaN: true }), fc.double({ min: 1e-9, max: 1e6, noNaN: true })));
    fc.assert(fc.property(arb, ([axis, off]) => {
      const dims = [5, 4, 3];
      const p: [number, number, number] = [1, 1, 1];
      p[axis] = off < 0 ? off : dims[axis]! + off;
      try { modalResponse(room, { ...ok, receiver: p }); return false; } catch (e) {
        return e instanceof RangeError && e.message.startsWith(`receiver[${axis}] `);
      }
    }));
  });
});
