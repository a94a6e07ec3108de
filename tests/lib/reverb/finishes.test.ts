import { describe, expect, it } from "vitest";
import { FINISHES, finishAlpha } from "@/lib/reverb";

describe("FINISHES — built-in table of common room finishes", () => {
  it("holds the finishes the issue names (drywall, plaster, concrete, carpet, wood floor, vinyl, glass, curtains, seats, ceiling tile)", () => {
    const ids = FINISHES.map((f) => f.id);
    for (const id of [
      "painted-drywall-on-studs", "plaster-on-masonry", "concrete-poured", "carpet-on-pad", "wood-floor",
      "vinyl-on-concrete", "glass-window", "heavy-curtains", "upholstered-seating", "acoustic-ceiling-tile",
    ]) expect(ids).toContain(id);
    expect(new Set(ids).size).toBe(ids.length);
  });
  it("every α lies in 0…1 and every row names its source, marked 'from memory' honestly", () => {
    for (const f of FINISHES) {
      for (const a of f.alpha125to4k) {
        expect(a).toBeGreaterThanOrEqual(0);
        expect(a).toBeLessThanOrEqual(1);
      }
      expect(f.source).toMatch(/from memory/);
    }
  });
  it("gypsum board on studs absorbs most at 125 Hz (panel resonance) — the shape handbook tables show", () => {
    const a = FINISHES.find((f) => f.id === "painted-drywall-on-studs")!.alpha125to4k;
    expect(a[0]).toBe(Math.max(...a));
  });
});

describe("finishAlpha(id, frequencyHz)", () => {
  it("returns the tabulated value at nominal and exact octave centres", () => {
    expect(finishAlpha("carpet-on-pad", 500)).toEqual({ alpha: 0.57, extended: false });
    expect(finishAlpha("carpet-on-pad", 501.187)).toEqual({ alpha: 0.57, extended: false });
  });
  it("holds the end values at 63 Hz and 8000 Hz and flags them as extended", () => {
    expect(finishAlpha("painted-drywall-on-studs", 63)).toEqual({ alpha: 0.29, extended: true });
    expect(finishAlpha("painted-drywall-on-studs", 8000)).toEqual({ alpha: 0.09, extended: true });
  });
  it("interpolates in log-frequency between octaves (one-third octaves): 353.6 Hz is halfway 250→500", () => {
    expect(finishAlpha("carpet-on-pad", 250 * Math.SQRT2).alpha).toBeCloseTo((0.24 + 0.57) / 2, 12);
  });
  it("rejects an unknown id with a RangeError naming 'finish'", () => {
    expect(() => finishAlpha("marble-hall", 500)).toThrow(/finish/);
  });
});
