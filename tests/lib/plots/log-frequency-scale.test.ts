import { describe, expect, it } from "vitest";
import { formatFrequencyHz, logDomainCovering, logFrequencyScale, logFrequencyTicks } from "@/lib/plots";

// Exact expectations: tick values are built from integers (m · 10^k), positions from d3 scaleLog
// (log-linear interpolation). Tolerance 1e-9 px where floating point enters.
const majors = (d: [number, number], r: [number, number]) => logFrequencyTicks(d, r).filter((t) => t.major).map((t) => t.label);

describe("logFrequencyTicks", () => {
  it("labels the 1-2-5 values of 20–20k Hz at 600 px: 20, 50, 100 … 10k, 20k", () => {
    expect(majors([20, 20000], [0, 600])).toEqual(["20", "50", "100", "200", "500", "1k", "2k", "5k", "10k", "20k"]);
  });
  it("keeps every 1…9 × 10^k inside the domain as a tick and leaves the minor ones unlabelled", () => {
    const ticks = logFrequencyTicks([20, 200], [0, 300]);
    expect(ticks.map((t) => t.value)).toEqual([20, 30, 40, 50, 60, 70, 80, 90, 100, 200]);
    expect(ticks.filter((t) => !t.major).every((t) => t.label === "")).toBe(true);
    expect(ticks.filter((t) => t.major).map((t) => t.label)).toEqual(["20", "50", "100", "200"]);
  });
  it("falls back to decades when 1-2-5 labels would sit closer than 34 px (20–20k Hz in 200 px)", () => {
    expect(majors([20, 20000], [0, 200])).toEqual(["100", "1k", "10k"]);
  });
  it("labels every mantissa in a domain narrower than one 1-2-5 step (30–80 Hz)", () => {
    expect(majors([30, 80], [0, 300])).toEqual(["30", "40", "50", "60", "70", "80"]);
  });
  it("maps the domain ends to the range ends and the decades proportionally (20–2000 Hz on 0–400 px)", () => {
    const ticks = logFrequencyTicks([20, 2000], [0, 400]);
    expect(ticks[0]).toEqual({ value: 20, pos: 0, label: "20", major: true });
    expect(ticks.find((t) => t.value === 200)!.pos).toBeCloseTo(200, 9);
    expect(ticks.at(-1)!.pos).toBeCloseTo(400, 9);
  });
  it("builds sub-hertz ticks exactly (0.3, not 0.30000000000000004)", () => {
    expect(logFrequencyTicks([0.2, 0.5], [0, 100]).map((t) => t.value)).toEqual([0.2, 0.3, 0.4, 0.5]);
  });
  it("handles huge frequencies (1 MHz–10 MHz)", () => {
    expect(majors([1e6, 1e7], [0, 300])).toEqual(["1M", "2M", "5M", "10M"]);
  });
  it("throws RangeError for a zero, negative, reversed or NaN domain", () => {
    expect(() => logFrequencyTicks([0, 100], [0, 1])).toThrow(RangeError);
    expect(() => logFrequencyTicks([-5, 100], [0, 1])).toThrow(RangeError);
    expect(() => logFrequencyTicks([100, 20], [0, 1])).toThrow(/0 < lowHz < highHz/);
    expect(() => logFrequencyTicks([20, NaN], [0, 1])).toThrow(RangeError);
  });
});

describe("logFrequencyScale", () => {
  it("maps the geometric middle of 20–20k Hz (632.456 Hz) to the middle of 0–600 px, within 1e-9 px", () => {
    const s = logFrequencyScale([20, 20000], [0, 600]);
    expect(s.map(Math.sqrt(20 * 20000))).toBeCloseTo(300, 9);
    expect(s.map(20)).toBe(0);
    expect(s.map(20000)).toBeCloseTo(600, 9);
    expect(s.invert(200)).toBeCloseTo(200, 9); // one decade per 200 px
  });
  it("maps a reversed range (y-style) and rejects a NaN range", () => {
    expect(logFrequencyScale([10, 100], [100, 0]).map(10)).toBe(100);
    expect(() => logFrequencyScale([10, 100], [0, NaN])).toThrow(RangeError);
  });
});

describe("logDomainCovering", () => {
  it("widens to the next 1-2-5 values: [22, 180] → [20, 200], [31.5, 8000] → [20, 10000]", () => {
    expect(logDomainCovering([22, 180])).toEqual([20, 200]);
    expect(logDomainCovering([31.5, 8000])).toEqual([20, 10000]);
  });
  it("keeps values already on 1-2-5 steps and widens a single value upward", () => {
    expect(logDomainCovering([50, 500])).toEqual([50, 500]);
    expect(logDomainCovering([100])).toEqual([100, 200]);
  });
  it("ignores zero, negative and non-finite values; undefined when none is left (empty data)", () => {
    expect(logDomainCovering([0, -3, NaN, 40, Infinity])).toEqual([20, 50]);
    expect(logDomainCovering([])).toBeUndefined();
    expect(logDomainCovering([0, NaN])).toBeUndefined();
  });
});

describe("formatFrequencyHz", () => {
  it("writes 20, 31.5, 125, 1k, 2.5k, 16k and 1M", () => {
    expect([20, 31.5, 125, 1000, 2500, 16000, 1e6].map(formatFrequencyHz)).toEqual(["20", "31.5", "125", "1k", "2.5k", "16k", "1M"]);
  });
  it("rounds to three significant figures and never writes -0", () => {
    expect(formatFrequencyHz(44.444)).toBe("44.4");
    expect(formatFrequencyHz(-0.0001)).toBe("0");
  });
  it("throws RangeError for NaN", () => {
    expect(() => formatFrequencyHz(NaN)).toThrow(RangeError);
  });
});
