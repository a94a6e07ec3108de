import { describe, expect, it } from "vitest";
import { LIMITS, POROUS_MATERIALS, porousMaterial, resistivityFromFibres } from "@/lib/porous";

describe("POROUS_MATERIALS — generic catalogue", () => {
  it("holds the four families in several densities", () => {
    const families = new Set(POROUS_MATERIALS.map((m) => m.family));
    expect([...families].sort()).toEqual(["glass-fibre", "mineral-wool", "open-cell-foam", "polyester-fibre"]);
    expect(POROUS_MATERIALS.filter((m) => m.family === "mineral-wool").length).toBeGreaterThanOrEqual(3);
    expect(POROUS_MATERIALS.filter((m) => m.family === "glass-fibre").length).toBeGreaterThanOrEqual(3);
  });
  it("every entry: unique id, min ≤ typical ≤ max inside the accepted σ range, a source and a caution", () => {
    expect(new Set(POROUS_MATERIALS.map((m) => m.id)).size).toBe(POROUS_MATERIALS.length);
    for (const m of POROUS_MATERIALS) {
      const s = m.flowResistivity;
      expect(s.min).toBeLessThanOrEqual(s.typical);
      expect(s.typical).toBeLessThanOrEqual(s.max);
      expect(s.min).toBeGreaterThanOrEqual(LIMITS.flowResistivity.min);
      expect(s.max).toBeLessThanOrEqual(LIMITS.flowResistivity.max);
      expect(m.densityKgM3.min).toBeLessThan(m.densityKgM3.max);
      expect(m.source.length).toBeGreaterThan(10);
      expect(m.caution.length).toBeGreaterThan(10);
    }
  });
  it("every σ range is marked 'from memory' honestly (no entry claims a table it was not read from)", () => {
    for (const m of POROUS_MATERIALS) expect(m.source).toMatch(/from memory/);
  });
  it("mineral and glass wool entries carry the fibre-handling and fire-code caution (DEVELOPERS.md safety)", () => {
    for (const m of POROUS_MATERIALS.filter((x) => x.family === "mineral-wool" || x.family === "glass-fibre")) {
      expect(m.caution).toMatch(/mask/);
      expect(m.caution).toMatch(/building codes/);
    }
  });
  it("fibrous entries overlap the Bies & Hansen (1980) estimate [from memory, moderate] for 4–9 µm fibres (fibre diameters: Doran, Construction Materials Pocket Book 1994, as quoted by a third-party page) over their density range", () => {
    for (const m of POROUS_MATERIALS.filter((x) => x.family === "mineral-wool" || x.family === "glass-fibre")) {
      const low = resistivityFromFibres(m.densityKgM3.min, 9e-6);
      const high = resistivityFromFibres(m.densityKgM3.max, 4e-6);
      // the estimate band [low, high] must overlap the catalogue range
      expect(high).toBeGreaterThan(m.flowResistivity.min);
      expect(low).toBeLessThan(m.flowResistivity.max);
    }
  });
  it("porousMaterial(id) finds an entry and returns undefined for an unknown id", () => {
    expect(porousMaterial("glass-fibre-32")?.family).toBe("glass-fibre");
    expect(porousMaterial("nope")).toBeUndefined();
  });
});
