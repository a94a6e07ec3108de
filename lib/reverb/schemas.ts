import { z } from "zod";
import { absorberObjectSchema } from "@/lib/porous";
import { FINISH_IDS } from "./finishes";
import { REVERB_LIMITS as L } from "./validate";

// zod schemas for every public input of lib/reverb; the functions check the same bounds.

/** Band set. */
export const bandSetSchema = z.enum(["octave", "third-octave"]).describe("Octave bands 63…8000 Hz or one-third octaves 50…10 000 Hz");
/** Room volume, m³. */
export const volumeM3Schema = z.number().min(L.volumeM3.min).max(L.volumeM3.max).describe("Room volume in m³");
/** Air temperature, °C. */
export const temperatureCSchema = z.number().min(L.temperatureC.min).max(L.temperatureC.max).describe("Air temperature in °C (−20…50)");
/** Relative humidity, %. */
export const relativeHumidityPctSchema = z.number().min(0).max(100).describe("Relative humidity in % (0…100)");
/** Static pressure, kPa. */
export const pressureKPaSchema = z.number().min(L.pressureKPa.min).max(L.pressureKPa.max).describe("Static pressure in kPa");
/** Absorption coefficient of a tabulated surface, 0…1. */
export const alphaSchema = z.number().min(0).max(1).describe("Absorption coefficient (0…1)");
/** Formula. */
export const formulaSchema = z.enum(["sabine", "eyring"]).describe("Sabine or Eyring reverberation formula");

/** A surface of the contract's reverberationTime. */
export const surfaceSchema = z
  .object({ areaM2: z.number().min(L.areaM2.min).max(L.areaM2.max).describe("Area in m²"), alpha: z.array(alphaSchema).min(1).max(L.maxBands) })
  .meta({ id: "Surface", description: "A surface with α per band, aligned with bandsHz" });

/** Arguments of reverberationTime. */
export const reverberationInputSchema = z
  .object({
    volumeM3: volumeM3Schema,
    surfaces: z.array(surfaceSchema).min(1).max(L.maxSurfaces),
    bandsHz: z.array(z.number().min(L.bandHz.min).max(L.bandHz.max)).min(1).max(L.maxBands),
    formula: formulaSchema,
    speedOfSound: z.number().min(L.speedOfSound.min).max(L.speedOfSound.max).default(343),
    airAttenuation: z.array(z.number().min(0).max(1)).optional().describe("Intensity attenuation m of the air per band, 1/m"),
    extraAbsorptionM2: z.array(z.number().min(0).max(L.extraAbsorptionM2.max)).optional(),
  })
  .superRefine((v, ctx) => {
    const n = v.bandsHz.length;
    v.surfaces.forEach((s, i) => {
      if (s.alpha.length !== n) ctx.addIssue({ code: "custom", path: ["surfaces", i, "alpha"], message: `needs ${n} values, one per band` });
    });
    for (const key of ["airAttenuation", "extraAbsorptionM2"] as const) {
      const a = v[key];
      if (a && a.length !== n) ctx.addIssue({ code: "custom", path: [key], message: `needs ${n} values, one per band` });
    }
  });

/** A room surface by built-in finish or by its own α per band. */
export const roomSurfaceSchema = z
  .union([
    z.object({
      areaM2: z.number().min(L.areaM2.min).max(L.areaM2.max).describe("Area in m²"),
      finish: z.enum(FINISH_IDS as [string, ...string[]]).describe("A built-in finish"),
      label: z.string().max(80).optional(),
    }),
    z.object({
      areaM2: z.number().min(L.areaM2.min).max(L.areaM2.max).describe("Area in m²"),
      alpha: z.array(alphaSchema).min(1).max(L.maxBands).describe("α per band of the chosen band set"),
      label: z.string().max(80).optional(),
    }),
  ])
  .meta({ id: "RoomSurface", description: "A room surface: a built-in finish or its own α per band" });

/** Treatment added to a room. */
export const treatmentSchema = z
  .object({
    objects: z.array(absorberObjectSchema).max(100).optional().describe("Panels and corner traps"),
    extraAbsorptionM2: z.array(z.number().min(0).max(L.extraAbsorptionM2.max)).optional().describe("Other added absorption area per band, m²"),
  })
  .meta({ id: "Treatment", description: "Absorbing objects and other added absorption" });

const roomShape = {
  volumeM3: volumeM3Schema,
  surfaces: z.array(roomSurfaceSchema).min(1).max(L.maxSurfaces),
  bands: bandSetSchema.default("octave"),
  formula: formulaSchema.default("eyring"),
  temperatureC: temperatureCSchema.default(20),
  relativeHumidityPct: relativeHumidityPctSchema.default(50),
  pressureKPa: pressureKPaSchema.default(101.325),
  treatment: treatmentSchema.optional(),
};

// Volumes and areas must be consistent: no closed surface encloses V with less area than a sphere,
// S ≥ (36π)^(1/3)·V^(2/3) (isoperimetric inequality).
function checkRoom(v: { volumeM3: number; surfaces: { areaM2: number; alpha?: number[] }[]; bands: string; treatment?: { extraAbsorptionM2?: number[] } }, ctx: z.RefinementCtx) {
  const n = v.bands === "octave" ? 8 : 24;
  v.surfaces.forEach((s, i) => {
    if (s.alpha && s.alpha.length !== n) ctx.addIssue({ code: "custom", path: ["surfaces", i, "alpha"], message: `needs ${n} values for ${v.bands} bands` });
  });
  const extra = v.treatment?.extraAbsorptionM2;
  if (extra && extra.length !== n) ctx.addIssue({ code: "custom", path: ["treatment", "extraAbsorptionM2"], message: `needs ${n} values for ${v.bands} bands` });
  const total = v.surfaces.reduce((s, x) => s + x.areaM2, 0);
  const minimum = Math.cbrt(36 * Math.PI) * v.volumeM3 ** (2 / 3);
  if (total < minimum) {
    ctx.addIssue({
      code: "custom",
      path: ["surfaces"],
      message: `total surface ${total.toFixed(1)} m² cannot enclose ${v.volumeM3} m³ (at least ${minimum.toFixed(1)} m²): list every surface of the room`,
    });
  }
}

/** Body of `POST /api/v1/reverb/predict`. */
export const reverbPredictRequestSchema = z
  .object(roomShape)
  .superRefine(checkRoom)
  .meta({ id: "ReverbPredictRequest", description: "Predict the reverberation time per band of a room with its finishes and treatment" });
export type ReverbPredictRequest = z.infer<typeof reverbPredictRequestSchema>;

/** A reverberation target. */
export const reverbTargetSchema = z
  .discriminatedUnion("kind", [
    z.object({ kind: z.literal("listening-room") }).describe("ITU-R BS.1116 / EBU Tech 3276 target Tm = 0.25 (V/100)^(1/3) s with its mask"),
    z
      .object({
        kind: z.literal("small-room"),
        lowerS: z.number().min(0.05).max(5).default(0.2).describe("Lower edge of the band, s"),
        upperS: z.number().min(0.05).max(5).default(0.4).describe("Upper edge of the band, s"),
      })
      .refine((t) => t.upperS > t.lowerS, { message: "upperS must exceed lowerS", path: ["upperS"] })
      .describe("Flat band, common practice for home theatres and control rooms: roughly 0.2–0.4 s"),
  ])
  .meta({ id: "ReverbTarget" });

/** Body of `POST /api/v1/reverb/target`. */
export const reverbTargetRequestSchema = z
  .object({
    ...roomShape,
    target: reverbTargetSchema,
    nearMarginS: z.number().min(0).max(1).default(0.05).describe("How far outside the band still counts as 'near', s"),
  })
  .superRefine(checkRoom)
  .meta({ id: "ReverbTargetRequest", description: "Compare a room's predicted reverberation with a target and size the absorption to add" });
export type ReverbTargetRequest = z.infer<typeof reverbTargetRequestSchema>;
