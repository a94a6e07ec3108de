import { z } from "zod";

// zod schemas of lib/build-sheet inputs for the API; the functions check the same bounds.

const m = (min: number, max: number, what: string) => z.number().min(min).max(max).describe(`${what}, m`);
const density = z.number().min(5).max(300).describe("Fill density, kg/m³");

/** A framed porous panel. */
export const panelBuildSchema = z
  .object({
    kind: z.literal("panel"),
    faceWidthM: m(0.1, 3, "Face width"),
    faceHeightM: m(0.1, 3, "Face height"),
    insulationThicknessM: m(0.01, 0.5, "Porous slab thickness"),
    airGapM: m(0, 0.5, "Air gap behind the slab inside the frame").default(0),
    insulationDensityKgM3: density,
  })
  .meta({ id: "PanelBuild" });

/** A porous corner trap. */
export const cornerTrapBuildSchema = z
  .object({
    kind: z.literal("corner-trap"),
    depthM: m(0.05, 1, "Perpendicular depth from the face to the corner"),
    lengthM: m(0.1, 10, "Run length"),
    orientation: z.enum(["floor-to-ceiling", "wall-ceiling"]),
    insulationDensityKgM3: density,
  })
  .meta({ id: "CornerTrapBuild" });

/** A membrane or perforated (Helmholtz) trap. */
export const membraneTrapBuildSchema = z
  .object({
    kind: z.literal("membrane-trap"),
    faceWidthM: m(0.1, 3, "Face width"),
    faceHeightM: m(0.1, 3, "Face height"),
    cavityDepthM: m(0.01, 0.5, "Cavity depth"),
    fillThicknessM: m(0, 0.5, "Porous fill in the cavity"),
    faceSheetThicknessM: m(0.001, 0.05, "Face sheet thickness"),
    faceSheetDensityKgM3: z.number().min(100).max(3000).describe("Face sheet density, kg/m³"),
    insulationDensityKgM3: density,
    perforation: z.object({ holeDiameterM: m(0.001, 0.05, "Hole diameter"), openAreaRatio: z.number().min(0.001).max(0.5) }).optional(),
  })
  .refine((b) => b.fillThicknessM <= b.cavityDepthM, { message: "fillThicknessM must not exceed cavityDepthM", path: ["fillThicknessM"] })
  .meta({ id: "MembraneTrapBuild" });

/** Any build. */
export const buildSchema = z.union([panelBuildSchema, cornerTrapBuildSchema, membraneTrapBuildSchema]).meta({ id: "Build" });

/** Body of a build-sheet request. */
export const buildSheetJobSchema = z
  .object({
    items: z.array(z.object({ label: z.string().max(80).optional(), build: buildSchema, count: z.number().int().min(1).max(1000) })).min(1).max(200),
    lumber: z.object({ thicknessM: m(0.005, 0.1, "Section thickness"), widthM: m(0.01, 0.5, "Section width"), densityKgM3: z.number().min(100).max(1500).default(500) }),
    stockBoards: z.array(z.object({ lengthM: m(0.3, 12, "Stock length"), price: z.number().min(0).max(1e6).optional() })).min(1).max(10),
    kerfM: m(0, 0.02, "Saw kerf").default(0.003),
    slab: z.object({ lengthM: m(0.1, 5, "Slab length"), widthM: m(0.1, 5, "Slab width"), thicknessM: m(0.005, 0.5, "Slab thickness"), price: z.number().min(0).max(1e6).optional() }),
    fabric: z.object({ wrapM: m(0, 0.3, "Wrap allowance").default(0.05), pricePerM2: z.number().min(0).max(1e6).optional(), massKgM2: z.number().min(0).max(5).optional() }),
    sheet: z.object({ lengthM: m(0.1, 5, "Sheet length"), widthM: m(0.1, 5, "Sheet width"), price: z.number().min(0).max(1e6).optional() }).optional(),
    fixings: z.object({ screwPrice: z.number().min(0).max(1e4).optional(), cleatPrice: z.number().min(0).max(1e4).optional(), bracketPrice: z.number().min(0).max(1e4).optional() }).optional(),
    units: z.enum(["metric", "imperial"]).default("metric"),
  })
  .meta({ id: "BuildSheetJob", description: "Builds and counts of a job, with the firm's stock sizes and price list" });
export type BuildSheetJobRequest = z.infer<typeof buildSheetJobSchema>;
