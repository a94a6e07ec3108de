import { describe, expect, it } from "vitest";
import { modeTable, roomModes } from "../../../lib/modes/index";

describe("modeTable(room, { maxFrequencyHz, rt60Seconds, speedOfSound, wideGapHz })", () => {
  it("lists the modes of roomModes with the half-power bandwidth ln(10^6)/(2 pi T) ~= 2.2/T (Schroeder 1996, JASA)", () => {
    const room = { lengthM: 5, widthM: 4, heightM: 3 };
    const t = modeTable(room, { maxFrequencyHz: 120, rt60Seconds: 0.3 });
    const m = roomModes(room, { maxFrequencyHz: 120 });
    expect(t.rows.map(({ nx, ny, nz, frequencyHz, kind }) => ({ nx, ny, nz, frequencyHz, kind }))).toEqual(m);
    t.rows.forEach((r) => expect(r.bandwidthHz).toBeCloseTo(Math.log(1e6) / (2 * Math.PI * 0.3), 12));
    expect(t.bandwidthHz).toBeCloseTo(7.33, 2);
  });

  it("flags modes closer than the bandwidth as coincident (5 x 4 x 3 m, T = 0.3 s, B = 7.33 Hz: 54.91/57.17 Hz are 2.26 Hz apart; 34.30/42.88 are 8.58 Hz apart, by hand)", () => {
    const t = modeTable({ lengthM: 5, widthM: 4, heightM: 3 }, { maxFrequencyHz: 60, rt60Seconds: 0.3 });
    expect(t.rows.map((r) => r.frequencyHz.toFixed(2))).toEqual(["34.30", "42.88", "54.91", "57.17"]);
    expect(t.rows.map((r) => r.coincident)).toEqual([false, false, true, true]);
  });

  it("flags all three members of a cube's degenerate mode as coincident, with a zero gap between them", () => {
    const t = modeTable({ lengthM: 3, widthM: 3, heightM: 3 }, { maxFrequencyHz: 60, rt60Seconds: 10 });
    expect(t.rows).toHaveLength(3);
    expect(t.rows.every((r) => r.coincident)).toBe(true);
    expect(t.rows[1]!.gapBelowHz).toBeCloseTo(0, 12);
  });

  it("marks a wide gap where the spacing to the mode below exceeds wideGapHz (common practice; default 20 Hz): 7.2 x 5.1 x 2.7 m has 23.82 -> 33.63 -> 41.21 -> 47.64 -> 58.31 Hz", () => {
    const t = modeTable({ lengthM: 7.2, widthM: 5.1, heightM: 2.7 }, { maxFrequencyHz: 60, rt60Seconds: 0.4, wideGapHz: 9 });
    expect(t.rows[0]!.gapBelowHz).toBeNull();
    expect(t.rows.map((r) => r.wideGapBelow)).toEqual([false, true, false, false, true]);
    expect(t.wideGaps.map((g) => [g.fromHz.toFixed(2), g.toHz.toFixed(2)])).toEqual([["23.82", "33.63"], ["47.64", "58.31"]]);
    expect(t.verdict).toMatch(/gap/i);
  });
});
