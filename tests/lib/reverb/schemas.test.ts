import { describe, expect, it } from "vitest";
import { z } from "zod";
import {
  evaluateTarget,
  predictReverberation,
  reverberationInputSchema,
  reverberationTime,
  reverbPredictRequestSchema,
  reverbTargetRequestSchema,
} from "@/lib/reverb";

const room = {
  volumeM3: 32,
  surfaces: [
    { areaM2: 48, finish: "painted-drywall-on-studs" },
    { areaM2: 13.3, finish: "carpet-on-pad" },
  ],
};
const issuesAt = (r: { success: boolean; error?: z.ZodError }) => (r.error ? r.error.issues.map((i) => i.path.join(".")) : []);

describe("reverbPredictRequestSchema", () => {
  it("parses a room with defaults (octave, Eyring, 20 °C, 50 %) that predictReverberation accepts", () => {
    const r = reverbPredictRequestSchema.parse(room);
    expect(r.bands).toBe("octave");
    expect(r.formula).toBe("eyring");
    expect(r.temperatureC).toBe(20);
    expect(predictReverberation(r).bands).toHaveLength(8);
  });
  it("rejects temperature 60 °C, humidity −1 %, an unknown finish and α > 1 with the field's path", () => {
    expect(issuesAt(reverbPredictRequestSchema.safeParse({ ...room, temperatureC: 60 }))).toContain("temperatureC");
    expect(issuesAt(reverbPredictRequestSchema.safeParse({ ...room, relativeHumidityPct: -1 }))).toContain("relativeHumidityPct");
    expect(reverbPredictRequestSchema.safeParse({ ...room, surfaces: [{ areaM2: 70, finish: "gold-leaf" }] }).success).toBe(false);
    expect(reverbPredictRequestSchema.safeParse({ ...room, surfaces: [{ areaM2: 70, alpha: [1.2, 0, 0, 0, 0, 0, 0, 0] }] }).success).toBe(false);
  });
  it("rejects an α list that does not match the band set", () => {
    const r = reverbPredictRequestSchema.safeParse({ ...room, surfaces: [...room.surfaces, { areaM2: 2, alpha: [0.1, 0.2] }] });
    expect(issuesAt(r)).toContain("surfaces.2.alpha");
  });
  it("rejects surfaces too small to enclose the volume (isoperimetric bound S ≥ (36π)^(1/3) V^(2/3))", () => {
    // 32 m³ needs at least 48.7 m² (a sphere); 20 m² cannot be the whole room
    expect(issuesAt(reverbPredictRequestSchema.safeParse({ volumeM3: 32, surfaces: [{ areaM2: 20, finish: "carpet-on-pad" }] }))).toContain("surfaces");
    expect(reverbPredictRequestSchema.safeParse({ volumeM3: 32, surfaces: [{ areaM2: 49, finish: "carpet-on-pad" }] }).success).toBe(true);
  });
  it("accepts panel and corner-trap treatment objects", () => {
    const r = reverbPredictRequestSchema.parse({
      ...room,
      treatment: {
        objects: [
          { kind: "panel", widthM: 0.6, heightM: 1.2, count: 6, layers: [{ kind: "porous", thicknessM: 0.05, flowResistivity: 15_000, model: "miki" }] },
          { kind: "corner-trap", depthM: 0.4, lengthM: 2.4, orientation: "floor-to-ceiling", flowResistivity: 10_000, model: "miki", count: 2 },
        ],
      },
    });
    const p = predictReverberation(r);
    expect(p.bands.every((b) => Number.isFinite(b.timeS) && b.timeS > 0)).toBe(true);
  });
  it("converts to JSON Schema for the OpenAPI document", () => {
    const json = JSON.stringify(z.toJSONSchema(reverbPredictRequestSchema, { io: "input" }));
    expect(json).toMatch(/Relative humidity/);
  });
});

describe("reverbTargetRequestSchema", () => {
  it("parses a small-room target with defaults and evaluateTarget runs on it", () => {
    const r = reverbTargetRequestSchema.parse({ ...room, target: { kind: "small-room" } });
    expect(r.target).toEqual({ kind: "small-room", lowerS: 0.2, upperS: 0.4 });
    expect(r.nearMarginS).toBe(0.05);
    expect(evaluateTarget(r, r.target, r.nearMarginS).comparison).toHaveLength(8);
  });
  it("rejects a band whose upper edge is not above its lower edge, and an unknown kind", () => {
    expect(reverbTargetRequestSchema.safeParse({ ...room, target: { kind: "small-room", lowerS: 0.4, upperS: 0.3 } }).success).toBe(false);
    expect(reverbTargetRequestSchema.safeParse({ ...room, target: { kind: "concert-hall" } }).success).toBe(false);
  });
  it("converts to JSON Schema", () => {
    expect(() => z.toJSONSchema(reverbTargetRequestSchema, { io: "input" })).not.toThrow();
  });
});

describe("reverberationInputSchema", () => {
  it("parses the contract's arguments and reverberationTime accepts them; alpha length is checked per band", () => {
    const ok = reverberationInputSchema.parse({ volumeM3: 100, surfaces: [{ areaM2: 100, alpha: [0.2] }], bandsHz: [500], formula: "sabine" });
    expect(reverberationTime(ok)[0]).toBeGreaterThan(0);
    expect(reverberationInputSchema.safeParse({ volumeM3: 100, surfaces: [{ areaM2: 100, alpha: [0.2, 0.3] }], bandsHz: [500], formula: "sabine" }).success).toBe(false);
  });
});
