import { z } from "zod";
import { LIMITS } from "./limits";

// zod schemas for every public input of lib/porous, with the bounds of LIMITS (the functions check
// the same bounds). Descriptions feed the OpenAPI document through z.toJSONSchema.

/** Frequency in Hz, 10…20 000. */
export const frequencyHzSchema = z
  .number()
  .min(LIMITS.frequencyHz.min)
  .max(LIMITS.frequencyHz.max)
  .describe("Frequency in Hz (10…20 000)");

/** A list of frequencies, 1…2000 values. */
export const frequenciesHzSchema = z
  .array(frequencyHzSchema)
  .min(1)
  .max(LIMITS.maxFrequencies)
  .describe("Frequencies in Hz at which to evaluate, in the order wanted");

const thicknessM = z
  .number()
  .min(LIMITS.thicknessM.min)
  .max(LIMITS.thicknessM.max)
  .describe("Layer thickness in metres (0.001…1)");

/** A porous layer. */
export const porousLayerSchema = z
  .object({
    kind: z.literal("porous"),
    thicknessM,
    flowResistivity: z
      .number()
      .min(LIMITS.flowResistivity.min)
      .max(LIMITS.flowResistivity.max)
      .describe("Airflow resistivity σ in Pa·s/m² (500…500 000)"),
    model: z.enum(["delany-bazley", "miki"]).describe("Impedance model: Delany–Bazley (1970) or Miki (1990)"),
  })
  .meta({ id: "PorousLayer", description: "A layer of fibrous or open-cell porous material" });

/** An air gap. */
export const airLayerSchema = z
  .object({ kind: z.literal("air"), thicknessM })
  .meta({ id: "AirLayer", description: "An air gap (spacing off the wall)" });

/** A thin limp facing in series. */
export const resistiveSheetSchema = z
  .object({
    kind: z.literal("resistive-sheet"),
    flowResistance: z
      .number()
      .min(LIMITS.flowResistance.min)
      .max(LIMITS.flowResistance.max)
      .describe("Flow resistance R of the sheet in Pa·s/m (0…20 000)"),
  })
  .meta({ id: "ResistiveSheet", description: "A thin limp facing (fabric, tissue) acting as a series resistance" });

/** One layer of a stack. */
export const layerSchema = z.discriminatedUnion("kind", [porousLayerSchema, airLayerSchema, resistiveSheetSchema]);

/** A stack front to back on a rigid wall; a resistive sheet may not be the last layer. */
export const layersSchema = z
  .array(layerSchema)
  .min(1)
  .max(LIMITS.maxLayers)
  .superRefine((layers, ctx) => {
    if (layers.length > 0 && layers[layers.length - 1]!.kind === "resistive-sheet") {
      ctx.addIssue({
        code: "custom",
        path: [layers.length - 1],
        message: "a resistive sheet cannot sit directly on the rigid wall (put a porous or air layer behind it)",
      });
    }
  })
  .meta({ id: "LayerStack", description: "Layers listed front to back; a rigid wall is behind the last one" });

/** Incidence of the sound. */
export const incidenceSchema = z
  .union([
    z.enum(["normal", "random", "field"]),
    z.object({
      angleDeg: z.number().min(LIMITS.angleDeg.min).max(LIMITS.angleDeg.max).describe("Angle from the normal in degrees (0…89.9)"),
    }),
  ])
  .meta({
    id: "Incidence",
    description: "'normal' (0°), an oblique angle, 'random' (Paris integral 0–90°) or 'field' (0–78°)",
  });

/** Air properties. */
export const airSchema = z
  .object({
    densityKgM3: z.number().min(LIMITS.densityKgM3.min).max(LIMITS.densityKgM3.max).describe("Air density ρ₀ in kg/m³"),
    speedOfSound: z.number().min(LIMITS.speedOfSound.min).max(LIMITS.speedOfSound.max).describe("Speed of sound c in m/s"),
  })
  .meta({ id: "Air", description: "Air properties; default ρ₀ = 1.204 kg/m³, c = 343 m/s (20 °C)" });

/** Body of `POST /api/v1/absorbers/spectrum`: the arguments of absorptionSpectrum. */
export const absorberSpectrumRequestSchema = z
  .object({
    layers: layersSchema,
    frequenciesHz: frequenciesHzSchema,
    incidence: incidenceSchema.default("random"),
    air: airSchema.optional(),
  })
  .meta({ id: "AbsorberSpectrumRequest", description: "Absorption spectrum of a layer stack on a rigid wall" });
export type AbsorberSpectrumRequest = z.infer<typeof absorberSpectrumRequestSchema>;

/** 15 one-third-octave absorption coefficients 200…5000 Hz. */
export const thirdOctaveAlphaSchema = z
  .array(z.number().min(-0.2).max(1.5))
  .length(15)
  .describe("Absorption coefficients at the 15 one-third-octave bands 200…5000 Hz (measured values may exceed 1)");

/**
 * Body of `POST /api/v1/absorbers/rating`: either a stack (rated from its modelled random-incidence α)
 * or 15 measured one-third-octave coefficients.
 */
export const absorberRatingRequestSchema = z
  .union([
    z.object({ layers: layersSchema, air: airSchema.optional() }).strict(),
    z.object({ thirdOctaveAlpha: thirdOctaveAlphaSchema }).strict(),
  ])
  .meta({
    id: "AbsorberRatingRequest",
    description: "ISO 11654 (αp, αw, indicators, class) and ASTM C423 (NRC, SAA) of a stack or of measured one-third-octave α",
  });
export type AbsorberRatingRequest = z.infer<typeof absorberRatingRequestSchema>;

/** A panel object (see panelAbsorption). */
export const panelObjectSchema = z
  .object({
    kind: z.literal("panel"),
    widthM: z.number().min(0.05).max(10).describe("Face width in metres"),
    heightM: z.number().min(0.05).max(10).describe("Face height in metres"),
    layers: layersSchema,
    count: z.number().int().min(1).max(1000).default(1).describe("Number of identical panels"),
    exposedSides: z.boolean().default(false).describe("Count the panel's sides (perimeter × thickness) as absorbing"),
  })
  .meta({ id: "PanelObject", description: "Flat porous panels; the diffraction edge effect is not included" });

/** A corner trap object (see cornerTrapAbsorption). */
export const cornerTrapObjectSchema = z
  .object({
    kind: z.literal("corner-trap"),
    depthM: z.number().min(0.05).max(1).describe("Perpendicular depth from the face to the corner in metres"),
    lengthM: z.number().min(0.1).max(20).describe("Run length in metres (room height for floor-to-ceiling)"),
    orientation: z.enum(["floor-to-ceiling", "wall-ceiling"]),
    flowResistivity: z.number().min(LIMITS.flowResistivity.min).max(LIMITS.flowResistivity.max).describe("Fill σ in Pa·s/m²"),
    model: z.enum(["delany-bazley", "miki"]),
    facingFlowResistance: z.number().min(LIMITS.flowResistance.min).max(LIMITS.flowResistance.max).optional(),
    count: z.number().int().min(1).max(100).default(1),
  })
  .meta({ id: "CornerTrapObject", description: "Triangular porous corner trap, right-isosceles section" });

/** Any absorbing object of the treatment. */
export const absorberObjectSchema = z.discriminatedUnion("kind", [panelObjectSchema, cornerTrapObjectSchema]);
export type AbsorberObject = z.infer<typeof absorberObjectSchema>;
