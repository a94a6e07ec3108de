import { describe, expect, it } from "vitest";
import { multiSourceResponse, rankSeatPositions, populationStdDev, LEVEL_FLOOR_DB, logSpacedFrequencies } from "../../../lib/modes/index";
import { referenceLevelDb, refLogSpace, refPopulationStd } from "./reference";

const room = { lengthM: 6, widthM: 4.2, heightM: 2.8 };
const L: [number, number, number] = [6, 4.2, 2.8];
const base = { rt60Seconds: 0.4, maxModeFrequencyHz: 200 };

describe("multiSourceResponse(room, { sources, receivers, frequenciesHz, rt60Seconds, speedOfSound, maxModeFrequencyHz })", () => {
  it("matches the slow complex sum over sources with delay (e^{-j omega tau}) and polarity at several seats (CONTRACTS.md modal sum; 1e-9 dB)", () => {
    const sources = [
      { position: [0, 0, 0] as [number, number, number], delayMs: 0, polarity: 1 as const },
      { position: [6, 4.2, 0] as [number, number, number], delayMs: 3.2, polarity: -1 as const },
      { position: [3, 0, 0.3] as [number, number, number], delayMs: 0.7 },
    ];
    const receivers: [number, number, number][] = [[2, 2.1, 1.1], [4.4, 1.3, 1.2], [1.1, 3.5, 0.9]];
    const freqs = refLogSpace(15, 180, 29);
    const out = multiSourceResponse(room, { sources, receivers, frequenciesHz: freqs, ...base });
    expect(out).toHaveLength(3);
    out.forEach((lv, r) => freqs.forEach((f, i) => {
      expect(Math.abs(lv[i]! - referenceLevelDb(L, sources, receivers[r]!, f, 0.4, 200))).toBeLessThan(1e-9);
    }));
  });

  it("adds 20 log10 2 = 6.02 dB for two equal co-located sources in phase (linearity of the modal sum, by hand)", () => {
    const p: [number, number, number] = [0.5, 0.5, 0.2];
    const freqs = [30, 55, 90];
    const one = multiSourceResponse(room, { sources: [{ position: p }], receivers: [[3, 2, 1.2]], frequenciesHz: freqs, ...base })[0]!;
    const two = multiSourceResponse(room, { sources: [{ position: p }, { position: p }], receivers: [[3, 2, 1.2]], frequenciesHz: freqs, ...base })[0]!;
    freqs.forEach((_, i) => expect(two[i]! - one[i]!).toBeCloseTo(20 * Math.log10(2), 9));
  });

  it("reports an exact cancellation (equal sources in opposite polarity) at LEVEL_FLOOR_DB instead of -Infinity", () => {
    const p: [number, number, number] = [0.5, 0.5, 0.2];
    const lv = multiSourceResponse(room, { sources: [{ position: p }, { position: p, polarity: -1 }], receivers: [[3, 2, 1.2]], frequenciesHz: [40, 80], ...base })[0]!;
    expect(lv).toEqual([LEVEL_FLOOR_DB, LEVEL_FLOOR_DB]);
    expect(Number.isFinite(LEVEL_FLOOR_DB)).toBe(true);
  });

  it("cancels at f when an equal co-located source is delayed by half a period 1/(2f) (e^{-j pi} = -1, by hand)", () => {
    const p: [number, number, number] = [0.5, 0.5, 0.2];
    const f = 50;
    const one = multiSourceResponse(room, { sources: [{ position: p }], receivers: [[3, 2, 1.2]], frequenciesHz: [f], ...base })[0]![0]!;
    const pair = multiSourceResponse(room, { sources: [{ position: p }, { position: p, delayMs: 1000 / (2 * f) }], receivers: [[3, 2, 1.2]], frequenciesHz: [f], ...base })[0]![0]!;
    expect(pair).toBeLessThan(one - 200);
  });
});

describe("rankSeatPositions(room, { sources, seatYM, earHeightM, candidateXM, bandHz, frequencyCount, ... })", () => {
  it("scores each candidate by the population std-dev of its level over the band and ranks best (flattest) first", () => {
    const sources = [{ position: [0, 0, 0] as [number, number, number] }];
    const candidateXM = [1.5, 2.5, 3.0, 3.5, 4.5];
    const res = rankSeatPositions(room, { sources, seatYM: 2.1, earHeightM: 1.1, candidateXM, bandHz: { lowHz: 20, highHz: 120 }, frequencyCount: 64, ...base });
    const freqs = logSpacedFrequencies(20, 120, 64);
    expect(freqs[0]).toBeCloseTo(20, 12);
    expect(freqs[63]).toBeCloseTo(120, 12);
    expect(res.positions.map((p) => p.xM)).toEqual(candidateXM);
    res.positions.forEach((p) => {
      const lv = freqs.map((f) => referenceLevelDb(L, sources, [p.xM, 2.1, 1.1], f, 0.4, 200));
      expect(Math.abs(p.stdDevDb - refPopulationStd(lv))).toBeLessThan(1e-9);
    });
    const sorted = [...res.positions].sort((a, b) => a.stdDevDb - b.stdDevDb);
    expect(res.ranking.map((i) => res.positions[i]!.xM)).toEqual(sorted.map((p) => p.xM));
    expect(res.best).toEqual(sorted[0]);
    expect(res.worst).toEqual(sorted.at(-1));
    expect(res.verdict).toMatch(/best/i);
    expect(res.verdict).toContain(res.best.xM.toFixed(2));
  });

  it("gives mirror-equal scores at x and Lx - x for sources placed mirror-symmetrically in x (cos(n pi (L - x)/L) = (-1)^n cos(n pi x / L))", () => {
    const sources = [{ position: [0, 1, 0.2] as [number, number, number] }, { position: [6, 1, 0.2] as [number, number, number] }];
    const res = rankSeatPositions(room, { sources, seatYM: 3, earHeightM: 1.2, candidateCount: 9, ...base });
    const xs = res.positions.map((p) => p.xM);
    expect(xs).toHaveLength(9);
    for (let i = 0; i < 9; i++) {
      expect(xs[i]! + xs[8 - i]!).toBeCloseTo(6, 12);
      expect(res.positions[i]!.stdDevDb).toBeCloseTo(res.positions[8 - i]!.stdDevDb, 9);
    }
  });
});

describe("populationStdDev(values)", () => {
  it("divides by n, not n - 1 (population form): [2, 4, 4, 4, 5, 5, 7, 9] gives 2 (standard textbook example)", () => {
    expect(populationStdDev([2, 4, 4, 4, 5, 5, 7, 9])).toBeCloseTo(2, 14);
    expect(populationStdDev([3])).toBe(0);
  });
  it("throws a RangeError for an empty list or a non-finite value", () => {
    expect(() => populationStdDev([])).toThrow(RangeError);
    expect(() => populationStdDev([1, Number.NaN])).toThrow(RangeError);
  });
});
