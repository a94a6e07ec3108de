import { describe, expect, it } from "vitest";
import { flatnessMap, multiSourceFlatnessMap, modalResponse, populationStdDev } from "../../../lib/modes/index";
import { referenceLevelDb, refLogSpace, refPopulationStd } from "./reference";

describe("flatnessMap(room, { source, heightM, gridX, gridY, frequenciesHz, rt60Seconds, speedOfSound, maxModeFrequencyHz })", () => {
  const L: [number, number, number] = [7.2, 5.1, 2.7];
  const room = { lengthM: 7.2, widthM: 5.1, heightM: 2.7 };
  const freqs = refLogSpace(15, 250, 23);

  for (const [gx, gy] of [[6, 4], [7, 5], [1, 1], [2, 3]] as [number, number][]) {
    it(`matches a slow per-cell evaluation of the contract formula on a ${gx} x ${gy} grid (cell centres, index ix*gridY + iy, population std-dev; 1e-9 dB)`, () => {
      const source: [number, number, number] = [0.35, 4.6, 0.3];
      const res = flatnessMap(room, { source, heightM: 1.1, gridX: gx, gridY: gy, frequenciesHz: freqs, rt60Seconds: 0.45, maxModeFrequencyHz: 300 });
      expect(res.xM).toHaveLength(gx);
      expect(res.yM).toHaveLength(gy);
      expect(res.stdDevDb).toBeInstanceOf(Float64Array);
      expect(res.stdDevDb).toHaveLength(gx * gy);
      for (let ix = 0; ix < gx; ix++) {
        expect(res.xM[ix]).toBeCloseTo(((ix + 0.5) * 7.2) / gx, 12);
        for (let iy = 0; iy < gy; iy++) {
          const y = ((iy + 0.5) * 5.1) / gy;
          const x = ((ix + 0.5) * 7.2) / gx;
          const lv = freqs.map((f) => referenceLevelDb(L, [{ position: source }], [x, y, 1.1], f, 0.45, 300));
          expect(Math.abs(res.stdDevDb[ix * gy + iy]! - refPopulationStd(lv))).toBeLessThan(1e-9);
        }
      }
      res.yM.forEach((y, iy) => expect(y).toBeCloseTo(((iy + 0.5) * 5.1) / gy, 12));
    });
  }

  it("matches the slow per-cell evaluation in a 20 x 15 x 3 m room with modes up to 250 Hz, where more than eight mode indices share a row of the sum (1e-9 dB)", () => {
    const big = { lengthM: 20, widthM: 15, heightM: 3 };
    const source: [number, number, number] = [1.3, 14.2, 0.4];
    const fr = refLogSpace(20, 200, 7);
    const res = flatnessMap(big, { source, heightM: 1.2, gridX: 5, gridY: 6, frequenciesHz: fr, rt60Seconds: 0.8, maxModeFrequencyHz: 250 });
    for (let ix = 0; ix < 5; ix++)
      for (let iy = 0; iy < 6; iy++) {
        const lv = fr.map((f) => referenceLevelDb([20, 15, 3], [{ position: source }], [res.xM[ix]!, res.yM[iy]!, 1.2], f, 0.8, 250));
        expect(Math.abs(res.stdDevDb[ix * 6 + iy]! - refPopulationStd(lv))).toBeLessThan(1e-9);
      }
  });

  it("agrees with populationStdDev(modalResponse(...)) at every cell (the two public paths agree; 1e-9 dB)", () => {
    const source: [number, number, number] = [7.2, 0, 2.7];
    const opts = { frequenciesHz: refLogSpace(20, 120, 40), rt60Seconds: 0.3, maxModeFrequencyHz: 200 };
    const res = flatnessMap(room, { source, heightM: 2.7, gridX: 5, gridY: 4, ...opts });
    for (let ix = 0; ix < 5; ix++)
      for (let iy = 0; iy < 4; iy++) {
        const lv = modalResponse(room, { source, receiver: [res.xM[ix]!, res.yM[iy]!, 2.7], ...opts });
        expect(Math.abs(res.stdDevDb[ix * 4 + iy]! - populationStdDev(lv))).toBeLessThan(1e-9);
      }
  });

  it("gives the same map when another map is computed from inside its onProgress callback (scratch arrays are not shared with a nested call)", () => {
    const opts = { source: [0.35, 4.6, 0.3] as [number, number, number], heightM: 1.1, gridX: 12, gridY: 10, frequenciesHz: freqs, rt60Seconds: 0.45, maxModeFrequencyHz: 300 };
    const plain = flatnessMap(room, opts);
    let inner: Float64Array | undefined;
    const nested = flatnessMap(room, { ...opts, onProgress: () => { inner = flatnessMap(room, { ...opts, gridX: 3, gridY: 2 }).stdDevDb; } });
    expect(Array.from(nested.stdDevDb)).toEqual(Array.from(plain.stdDevDb));
    expect(Array.from(inner!)).toEqual(Array.from(flatnessMap(room, { ...opts, gridX: 3, gridY: 2 }).stdDevDb));
  });

  it("reports progress in (0, 1], ending at 1, and stops with an AbortError-named Error when the signal is aborted", () => {
    const seen: number[] = [];
    flatnessMap(room, { source: [1, 1, 1], heightM: 1.2, gridX: 10, gridY: 8, frequenciesHz: freqs, rt60Seconds: 0.5, maxModeFrequencyHz: 200, onProgress: (p: number) => seen.push(p) });
    expect(seen.length).toBeGreaterThan(1);
    seen.forEach((p, i) => { expect(p).toBeGreaterThan(0); expect(p).toBeLessThanOrEqual(1); if (i) expect(p).toBeGreaterThanOrEqual(seen[i - 1]!); });
    expect(seen.at(-1)).toBe(1);
    const signal = { aborted: false };
    let calls = 0;
    expect(() =>
      flatnessMap(room, { source: [1, 1, 1], heightM: 1.2, gridX: 10, gridY: 8, frequenciesHz: freqs, rt60Seconds: 0.5, maxModeFrequencyHz: 200, signal, onProgress: () => { calls++; signal.aborted = true; } }),
    ).toThrow(expect.objectContaining({ name: "AbortError" }));
    expect(calls).toBe(1);
  });
});

describe("multiSourceFlatnessMap(room, { sources, ... })", () => {
  const L: [number, number, number] = [5, 4, 3];
  const room = { lengthM: 5, widthM: 4, heightM: 3 };
  it("matches a slow per-cell complex sum over two sources with delay and polarity (CONTRACTS.md modal sum, e^{-j omega tau} per source; 1e-9 dB)", () => {
    const sources = [
      { position: [0, 0, 0] as [number, number, number] },
      { position: [5, 4, 0] as [number, number, number], delayMs: 2.5, polarity: -1 as const },
    ];
    const freqs = refLogSpace(20, 160, 17);
    const res = multiSourceFlatnessMap(room, { sources, heightM: 1.2, gridX: 5, gridY: 6, frequenciesHz: freqs, rt60Seconds: 0.6, maxModeFrequencyHz: 250 });
    for (let ix = 0; ix < 5; ix++)
      for (let iy = 0; iy < 6; iy++) {
        const lv = freqs.map((f) => referenceLevelDb(L, sources, [res.xM[ix]!, res.yM[iy]!, 1.2], f, 0.6, 250));
        expect(Math.abs(res.stdDevDb[ix * 6 + iy]! - refPopulationStd(lv))).toBeLessThan(1e-9);
      }
  });
});
