import { z } from "zod";
import { reverbTargetSchema, roomSurfaceSchema } from "@/lib/reverb";

// zod schemas of the sizer's input (shared by the function's own checks and the API).

const fillSchema = z.object({
  flowResistivity: z.number().min(500).max(200_000).describe("Airflow resistivity σ, Pa·s/m²"),
  densityKgM3: z.number().min(5).max(300).describe("Bulk density, kg/m³"),
  model: z.enum(["delany-bazley", "miki"]),
});
const id = z.string().min(1).max(60);
const name = z.string().min(1).max(200);

/** A candidate build of the catalogue. */
export const candidateSchema = z
  .union([
    z.object({ id, name, kind: z.literal("corner-trap"), orientation: z.literal("floor-to-ceiling"), depthM: z.number().min(0.05).max(1), fill: fillSchema }),
    z.object({ id, name, kind: z.literal("corner-trap"), orientation: z.literal("wall-ceiling"), depthM: z.number().min(0.05).max(1), segmentLengthM: z.number().min(0.3).max(5), fill: fillSchema }),
    z.object({
      id,
      name,
      kind: z.literal("panel"),
      faceWidthM: z.number().min(0.1).max(3),
      faceHeightM: z.number().min(0.1).max(3),
      insulationThicknessM: z.number().min(0.01).max(0.5),
      airGapM: z.number().min(0).max(0.5),
      fill: fillSchema,
    }),
    z.object({
      id,
      name,
      kind: z.literal("membrane-trap"),
      faceWidthM: z.number().min(0.1).max(3),
      faceHeightM: z.number().min(0.1).max(3),
      cavityDepthM: z.number().min(0.01).max(0.5),
      fillThicknessM: z.number().min(0).max(0.5),
      sheet: z.object({ thicknessM: z.number().min(0.001).max(0.05), densityKgM3: z.number().min(100).max(3000) }),
      resistanceRatio: z.number().min(0.01).max(10),
      fill: fillSchema,
      perforation: z.object({ holeDiameterM: z.number().min(0.0005).max(0.05), openAreaRatio: z.number().min(0.001).max(0.5) }).optional(),
    }),
  ])
  .meta({ id: "SizerCandidate", description: "A build the sizer may propose" });

/** Material prices. */
export const materialPricesSchema = z
  .object({
    lumberPerM3: z.number().min(0).max(1e6),
    insulationPerM3: z.number().min(0).max(1e6),
    fabricPerM2: z.number().min(0).max(1e5),
    sheetPerM2: z.number().min(0).max(1e5),
    screwEach: z.number().min(0).max(1e3),
    cleatEach: z.number().min(0).max(1e4),
    bracketEach: z.number().min(0).max(1e4),
  })
  .meta({ id: "MaterialPrices", description: "Prices per material in the firm's currency" });

/** The user's limits. */
export const sizerLimitsSchema = z
  .object({
    maxDepthM: z.number().min(0).max(2).describe("Largest distance any item may stand out from its wall, m"),
    verticalCorners: z
      .array(z.enum(["front-left", "front-right", "rear-left", "rear-right"]))
      .max(4)
      .refine((a) => new Set(a).size === a.length, { message: "each corner at most once" }),
    ceilingEdges: z
      .array(z.object({ edge: z.enum(["front", "rear", "left", "right"]), lengthM: z.number().min(0).max(100) }))
      .max(4)
      .refine((a) => new Set(a.map((e) => e.edge)).size === a.length, { message: "each edge at most once" }),
    wallAreaM2: z.number().min(0).max(10_000).describe("Free wall area for panels and membrane traps, m²"),
    budget: z.number().min(0).max(1e9).optional(),
    maxItems: z.number().int().min(0).max(10_000).optional(),
  })
  .meta({ id: "SizerLimits" });

const bands8 = z.array(z.number().min(0).max(100_000)).length(8).describe("One value per octave band 63…8000 Hz, m²");
const point = z.tuple([z.number().min(0), z.number().min(0), z.number().min(0)]);

/** Input of sizeTreatment. */
export const sizerInputSchema = z
  .object({
    room: z.object({ lengthM: z.number().min(1).max(100), widthM: z.number().min(1).max(100), heightM: z.number().min(1).max(20) }),
    surfaces: z.array(roomSurfaceSchema).min(1).max(200),
    temperatureC: z.number().min(-20).max(50).optional(),
    relativeHumidityPct: z.number().min(0).max(100).optional(),
    formula: z.enum(["sabine", "eyring"]).optional(),
    currentTreatmentM2: bands8.optional(),
    target: reverbTargetSchema,
    aim: z.enum(["target", "upper-edge"]).optional(),
    objective: z.enum(["depth", "count", "cost"]),
    limits: sizerLimitsSchema,
    catalogue: z.array(candidateSchema).min(1).max(200).optional(),
    prices: materialPricesSchema.optional(),
    seat: z.object({ source: point, receiver: point }).optional(),
  })
  .superRefine((v, ctx) => {
    v.surfaces.forEach((s, i) => {
      if ("alpha" in s && s.alpha.length !== 8) ctx.addIssue({ code: "custom", path: ["surfaces", i, "alpha"], message: "needs 8 values, one per octave band 63…8000 Hz" });
    });
    const total = v.surfaces.reduce((a, s) => a + s.areaM2, 0);
    const box = 2 * (v.room.lengthM * v.room.widthM + v.room.lengthM * v.room.heightM + v.room.widthM * v.room.heightM);
    if (total < 0.5 * box) ctx.addIssue({ code: "custom", path: ["surfaces"], message: `the surfaces add up to ${total.toFixed(1)} m², far less than the room's ${box.toFixed(1)} m²: list every surface` });
    if (v.seat) {
      for (const key of ["source", "receiver"] as const) {
        const p = v.seat[key];
        if (p[0] > v.room.lengthM || p[1] > v.room.widthM || p[2] > v.room.heightM) ctx.addIssue({ code: "custom", path: ["seat", key], message: "must lie inside the room" });
      }
    }
  })
  .meta({ id: "SizerInput", description: "Room, scenario treatment, target, objective, limits and catalogue for bass-trap sizing" });
export type SizerInputRequest = z.infer<typeof sizerInputSchema>;

/** Body of `POST /api/v1/sizer`: size on top of a stored scenario of a room. */
export const sizerRequestSchema = z
  .object({
    roomId: z.uuid().describe("The room"),
    scenarioId: z.uuid().describe("A scenario of that room: its treatment is the starting point and its target the default"),
    objective: z.enum(["depth", "count", "cost"]),
    limits: sizerLimitsSchema,
    aim: z.enum(["target", "upper-edge"]).default("target"),
    target: reverbTargetSchema.optional().describe("Overrides the scenario's target"),
    catalogue: z.array(candidateSchema).min(1).max(200).optional().describe("Builds to choose from (default: the generic catalogue)"),
    prices: materialPricesSchema.optional().describe("Material prices (default: the demo prices)"),
  })
  .meta({ id: "SizerRequest", description: "Bass-trap sizing for a room's scenario: objective, limits and optionally catalogue, prices and target" });
export type SizerRequest = z.infer<typeof sizerRequestSchema>;
