import { describe, expect, it } from "vitest";
import { z } from "zod";
import fc from "fast-check";
import {
  absorberObjectSchema,
  absorberRatingRequestSchema,
  absorberSpectrumRequestSchema,
  absorptionSpectrum,
  layersSchema,
  objectAbsorptionAreaM2,
  rateAbsorber,
} from "@/lib/porous";

const panel = { kind: "porous", thicknessM: 0.05, flowResistivity: 15_000, model: "miki" };

describe("absorberSpectrumRequestSchema", () => {
  it("parses a valid body and defaults incidence to 'random'", () => {
    const r = absorberSpectrumRequestSchema.parse({ layers: [panel], frequenciesHz: [125, 250] });
    expect(r.incidence).toBe("random");
    expect(absorptionSpectrum(r.layers, r)).toHaveLength(2);
  });
  it("rejects out-of-range fields with the path of the field", () => {
    const bad = (body: unknown, path: (string | number)[]) => {
      const r = absorberSpectrumRequestSchema.safeParse(body);
      expect(r.success).toBe(false);
      expect(r.error!.issues.map((i) => i.path)).toContainEqual(path);
    };
    bad({ layers: [{ ...panel, thicknessM: 0 }], frequenciesHz: [125] }, ["layers", 0, "thicknessM"]);
    bad({ layers: [{ ...panel, thicknessM: 1.5 }], frequenciesHz: [125] }, ["layers", 0, "thicknessM"]);
    bad({ layers: [{ ...panel, flowResistivity: 100 }], frequenciesHz: [125] }, ["layers", 0, "flowResistivity"]);
    bad({ layers: [panel], frequenciesHz: [5] }, ["frequenciesHz", 0]);
    bad({ layers: [panel], frequenciesHz: [125], incidence: { angleDeg: 90 } }, ["incidence", "angleDeg"]);
    bad({ layers: [panel, { kind: "resistive-sheet", flowResistance: 100 }], frequenciesHz: [125] }, ["layers", 1]);
    bad({ layers: [], frequenciesHz: [125] }, ["layers"]);
  });
  it("converts to JSON Schema with descriptions (z.toJSONSchema, for the OpenAPI document)", () => {
    const json = JSON.stringify(z.toJSONSchema(absorberSpectrumRequestSchema, { io: "input" }));
    expect(json).toMatch(/Airflow resistivity/);
    expect(json).toMatch(/Paris/);
  });
});

describe("absorberRatingRequestSchema + rateAbsorber", () => {
  it("accepts a stack or 15 measured values, not both, and rates either", () => {
    const a = absorberRatingRequestSchema.parse({ layers: [panel] });
    const b = absorberRatingRequestSchema.parse({ thirdOctaveAlpha: new Array(15).fill(0.85) });
    expect(absorberRatingRequestSchema.safeParse({ layers: [panel], thirdOctaveAlpha: new Array(15).fill(0.85) }).success).toBe(false);
    expect(absorberRatingRequestSchema.safeParse({ thirdOctaveAlpha: [0.5] }).success).toBe(false);
    expect(rateAbsorber(a).thirdOctaves).toHaveLength(15);
    expect(rateAbsorber(b).iso11654.absorptionClass).toBe("B");
  });
  it("converts to JSON Schema", () => {
    expect(() => z.toJSONSchema(absorberRatingRequestSchema, { io: "input" })).not.toThrow();
  });
});

describe("absorberObjectSchema + objectAbsorptionAreaM2", () => {
  it("parses a panel set and a corner trap with defaults and computes their areas", () => {
    const p = absorberObjectSchema.parse({ kind: "panel", widthM: 0.6, heightM: 1.2, layers: [panel] });
    const t = absorberObjectSchema.parse({
      kind: "corner-trap", depthM: 0.4, lengthM: 2.4, orientation: "floor-to-ceiling", flowResistivity: 10_000, model: "miki",
    });
    expect(p.kind === "panel" && p.count).toBe(1);
    expect(objectAbsorptionAreaM2(p, [500])[0]).toBeGreaterThan(0);
    expect(objectAbsorptionAreaM2(t, [125])[0]).toBeGreaterThan(0);
  });
});

describe("layersSchema and absorptionSpectrum agree on what is valid (fast-check)", () => {
  it("any stack the schema accepts runs without throwing; any it rejects makes the function throw", () => {
    const num = fc.oneof(fc.double({ min: -1, max: 2e6, noNaN: false }), fc.constantFrom(0, 0.001, 1, 500, 500_000, 20_000));
    const layer = fc.oneof(
      fc.record({ kind: fc.constant("porous"), thicknessM: num, flowResistivity: num, model: fc.constantFrom("miki", "delany-bazley") }),
      fc.record({ kind: fc.constant("air"), thicknessM: num }),
      fc.record({ kind: fc.constant("resistive-sheet"), flowResistance: num }),
    );
    fc.assert(
      fc.property(fc.array(layer, { minLength: 0, maxLength: 4 }), (layers) => {
        const ok = layersSchema.safeParse(layers).success;
        let threw = false;
        try {
          absorptionSpectrum(layers as never, { frequenciesHz: [500], incidence: "normal" });
        } catch {
          threw = true;
        }
        return ok === !threw;
      }),
      { numRuns: 500 },
    );
  });
});
