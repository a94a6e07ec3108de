/**
 * zod schemas of a room's workspace: its six surfaces (with openings), listening positions and
 * sources, scenarios, treatment items and the firm's build library. One set of schemas for the API
 * route handlers, the server actions and the forms (react-hook-form through @hookform/resolvers).
 * Field rules of the engines are reused, never re-declared: layers from lib/porous, finishes and the
 * reverberation target from lib/reverb.
 *
 * ## Coordinates (metres, SI throughout; the forms convert feet and inches before sending)
 * The room is a box with its origin in the front-left floor corner, as in lib/modes:
 *   x along the length: x = 0 is the FRONT wall (where the screen / main speakers are), x = L the REAR wall;
 *   y along the width:  y = 0 is the LEFT wall (seen from the seats looking to the front), y = W the RIGHT wall;
 *   z up the height:    z = 0 is the FLOOR, z = H the CEILING.
 * A point on a surface (an opening, a hung panel) is given in that surface's own plane by (u, v):
 *   front and rear walls:  u = y (0…W), v = z (0…H)
 *   left and right walls:  u = x (0…L), v = z (0…H)
 *   floor and ceiling:     u = x (0…L), v = y (0…W)
 * A rectangle on a surface (opening or item face) spans `widthM` along u and `heightM` along v.
 * Openings give their lower-u, lower-v corner (uM, vM); item placements give the face's centre.
 *
 * Inside-the-room checks need the room's dimensions: the schemas here check shape and bounds, and
 * `positionInsideRoomIssues` / the query functions check placement against the stored room
 * server-side (inside one transaction with the write).
 */
import { z } from "zod";
import { cornerTrapObjectSchema, layersSchema, panelObjectSchema, POROUS_MATERIALS } from "@/lib/porous";
import { FINISH_IDS, OCTAVE_BANDS_HZ, reverbTargetSchema } from "@/lib/reverb";

const text = (max: number, label: string) => z.string().trim().max(max, `${label} must be at most ${max} characters`);
const name = (label: string) => text(120, label).min(1, `Give the ${label.toLowerCase()} a name`);
const notes = text(5000, "Notes");
const version = z.number().int().positive().describe("The version you read; a stale version gets 409");
const metres = (label: string, max = 100) =>
  z.number({ error: `${label} must be a number of metres` }).finite(`${label} must be a finite number`).min(0, `${label} must be at least 0 m`).max(max, `${label} must be at most ${max} m`);
const size = (label: string, min: number, max: number) =>
  z.number({ error: `${label} must be a number of metres` }).finite(`${label} must be a finite number`).min(min, `${label} must be at least ${min} m`).max(max, `${label} must be at most ${max} m`);

// ---------------------------------------------------------------------------------------------
// Surfaces and openings

/** The six surfaces of a rectangular room (see the coordinate convention above). */
export const SURFACE_IDS = ["front", "rear", "left", "right", "floor", "ceiling"] as const;
export type SurfaceId = (typeof SURFACE_IDS)[number];
export const SURFACE_LABEL: Record<SurfaceId, string> = {
  front: "Front wall (x = 0)",
  rear: "Rear wall (x = L)",
  left: "Left wall (y = 0)",
  right: "Right wall (y = W)",
  floor: "Floor (z = 0)",
  ceiling: "Ceiling (z = H)",
};
export const surfaceIdSchema = z.enum(SURFACE_IDS).describe("front (x = 0), rear (x = L), left (y = 0), right (y = W), floor (z = 0) or ceiling (z = H)");

/** Octave bands of the custom α, Hz (lib/reverb OCTAVE_BANDS_HZ: 63…8000). */
export const ALPHA_BANDS_HZ = OCTAVE_BANDS_HZ;

export const finishIdSchema = z.enum(FINISH_IDS as [string, ...string[]], { error: "Choose one of the built-in finishes" }).describe("A built-in finish of lib/reverb FINISHES");

/** Custom α, one per octave band 63…8000 Hz (8 values, each 0…1). */
export const customAlphaSchema = z
  .array(z.number({ error: "α must be a number" }).finite().min(0, "α must be at least 0").max(1, "α must be at most 1"))
  .length(ALPHA_BANDS_HZ.length, `Give ${ALPHA_BANDS_HZ.length} values of α, one per octave band 63…8000 Hz`)
  .describe("Random-incidence α per octave band 63, 125, 250, 500, 1000, 2000, 4000, 8000 Hz");

/** A surface's covering: a built-in finish or its own α per band. */
export const surfaceFinishSchema = z
  .discriminatedUnion("kind", [
    z.object({ kind: z.literal("finish"), finishId: finishIdSchema }),
    z.object({ kind: z.literal("custom"), alpha: customAlphaSchema, description: text(200, "Description").default("") }),
  ])
  .describe("A built-in finish, or custom α per octave band");
export type SurfaceFinish = z.infer<typeof surfaceFinishSchema>;

export const OPENING_KINDS = ["door", "window", "opening"] as const;
export const openingSchema = z
  .object({
    kind: z.enum(OPENING_KINDS).describe("door, window, or an open passage"),
    label: text(80, "Label").default(""),
    uM: metres("u").describe("Lower corner along the surface's u axis, m (see the convention)"),
    vM: metres("v").describe("Lower corner along the surface's v axis, m"),
    widthM: size("Width", 0.05, 100).describe("Extent along u, m"),
    heightM: size("Height", 0.05, 100).describe("Extent along v, m"),
    finishId: finishIdSchema.nullable().default(null).describe("Finish of the opening's own area (e.g. wood-door, glass-window); null keeps the surface's finish"),
  })
  .describe("A door, window or opening on a surface: a rectangle in the surface's (u, v) plane");
export type Opening = z.infer<typeof openingSchema>;

export const surfaceInputSchema = z.object({
  surface: surfaceIdSchema,
  finish: surfaceFinishSchema,
  openings: z.array(openingSchema).max(12, "At most 12 openings per surface").default([]),
});
export type SurfaceInput = z.infer<typeof surfaceInputSchema>;

/** Body of PUT /rooms/{roomId}/surfaces: all six surfaces at once, with the room's version. */
export const surfacesInputSchema = z
  .object({
    version,
    surfaces: z.array(surfaceInputSchema).length(6, "Give all six surfaces: front, rear, left, right, floor, ceiling"),
  })
  .superRefine((v, ctx) => {
    const seen = new Set<string>();
    v.surfaces.forEach((s, i) => {
      if (seen.has(s.surface)) ctx.addIssue({ code: "custom", path: ["surfaces", i, "surface"], message: `${s.surface} is listed twice` });
      seen.add(s.surface);
    });
  })
  .describe("The six surfaces of the room with their finishes and openings");
export type SurfacesInput = z.infer<typeof surfacesInputSchema>;

/** The in-plane extent (u, v) of a surface for a room, m. */
export function surfaceExtentM(surface: SurfaceId, room: { lengthM: number; widthM: number; heightM: number }): { uM: number; vM: number } {
  switch (surface) {
    case "front":
    case "rear":
      return { uM: room.widthM, vM: room.heightM };
    case "left":
    case "right":
      return { uM: room.lengthM, vM: room.heightM };
    case "floor":
    case "ceiling":
      return { uM: room.lengthM, vM: room.widthM };
  }
}

// ---------------------------------------------------------------------------------------------
// Listening positions and sources

export const POSITION_KINDS = ["seat", "main-speaker", "subwoofer"] as const;
export type PositionKind = (typeof POSITION_KINDS)[number];
export const POSITION_LIMITS = { maxSeats: 64, maxSources: 16, maxDelayMs: 1000 } as const;

const xyz = {
  xM: metres("x").describe("Distance from the front wall, m (0…L)"),
  yM: metres("y").describe("Distance from the left wall, m (0…W)"),
  zM: metres("z").describe("Height above the floor, m (0…H)"),
};
const sourceFields = {
  delayMs: z.number().finite().min(0, "Delay must be at least 0 ms").max(POSITION_LIMITS.maxDelayMs, `Delay must be at most ${POSITION_LIMITS.maxDelayMs} ms`).describe("Signal delay, ms"),
  polarity: z.union([z.literal(1), z.literal(-1)], { error: "Polarity is +1 or −1" }).describe("Polarity +1 or −1"),
  drivesBass: z.boolean().describe("Whether this source plays the low end (enters the modal response at the seats)"),
};

const seatInput = z.object({ kind: z.literal("seat"), name: name("Seat"), ...xyz, isMain: z.boolean().default(false).describe("The main listening position (one per room)") });
const sourceInput = z.object({
  kind: z.enum(["main-speaker", "subwoofer"]),
  name: name("Source"),
  ...xyz,
  delayMs: sourceFields.delayMs.default(0),
  polarity: sourceFields.polarity.default(1),
  drivesBass: sourceFields.drivesBass.default(true),
});

/** Body of POST /rooms/{roomId}/positions: a seat or a source, with the room's version. */
export const positionInputSchema = z
  .discriminatedUnion("kind", [seatInput.extend({ version }), sourceInput.extend({ version })])
  .describe("A listening position (seat) or a source (main speaker, subwoofer); coordinates in m inside the room");
export type PositionInput = z.infer<typeof positionInputSchema>;

/** Body of PATCH /rooms/{roomId}/positions/{positionId}: only the fields sent change. */
export const positionUpdateSchema = z
  .object({
    name: name("Position").optional(),
    ...{ xM: xyz.xM.optional(), yM: xyz.yM.optional(), zM: xyz.zM.optional() },
    isMain: z.boolean().optional().describe("Seats only"),
    delayMs: sourceFields.delayMs.optional().describe("Sources only"),
    polarity: sourceFields.polarity.optional().describe("Sources only"),
    drivesBass: sourceFields.drivesBass.optional().describe("Sources only"),
    version,
  })
  .describe("A partial change of a position; `version` is the room's version");
export type PositionUpdate = z.infer<typeof positionUpdateSchema>;

/** Body of a move (the plan view's drag): the new coordinates and the room's version. */
export const positionMoveSchema = z.object({ ...xyz, version });
export type PositionMove = z.infer<typeof positionMoveSchema>;

export const positionRenameSchema = z.object({ name: name("Position"), version });

/** `?version=` of a DELETE. */
export const versionOnlySchema = z.object({ version: z.coerce.number().int().positive("Send the version you read") });

/**
 * Issues for a point outside the room (walls included), at [...path, "xM"|"yM"|"zM"]: the same rule as
 * lib/modes `checkPoint`, so a saved position is always accepted by the modal sums.
 */
export function positionInsideRoomIssues(
  p: { xM?: number; yM?: number; zM?: number },
  room: { lengthM: number; widthM: number; heightM: number },
  path: (string | number)[] = [],
): { path: (string | number)[]; message: string }[] {
  const out: { path: (string | number)[]; message: string }[] = [];
  const check = (v: number | undefined, max: number, key: string, axis: string) => {
    if (v !== undefined && !(v >= 0 && v <= max)) out.push({ path: [...path, key], message: `must lie inside the room: 0 ≤ ${axis} ≤ ${max} m` });
  };
  check(p.xM, room.lengthM, "xM", "x");
  check(p.yM, room.widthM, "yM", "y");
  check(p.zM, room.heightM, "zM", "z");
  return out;
}

// ---------------------------------------------------------------------------------------------
// Builds (the firm's library) and treatment items

export const POROUS_MATERIAL_IDS = POROUS_MATERIALS.map((m) => m.id) as [string, ...string[]];
const materialId = z.enum(POROUS_MATERIAL_IDS).nullable().default(null).describe("The generic material of lib/porous POROUS_MATERIALS it is built from (for cautions); null when not stated");

const trap = cornerTrapObjectSchema.shape;
const panel = panelObjectSchema.shape;

/** Porous panel build: a layer stack of lib/porous on the wall or spaced off it. */
export const porousPanelBuildSchema = z.object({ kind: z.literal("porous-panel"), layers: layersSchema, materialId });
/** Porous corner trap build (lib/porous cornerTrapAbsorption, without its run length and count). */
export const cornerTrapBuildSchema = z.object({
  kind: z.literal("corner-trap"),
  depthM: trap.depthM,
  orientation: trap.orientation,
  flowResistivity: trap.flowResistivity,
  model: trap.model,
  facingFlowResistance: trap.facingFlowResistance,
  materialId,
});
/** Membrane (panel) absorber: a limp panel of mass m over a closed cavity (lib/porous resonatorAbsorptionEstimate). */
export const membraneBuildSchema = z.object({
  kind: z.literal("membrane"),
  massKgM2: z.number().finite().min(0.1, "Panel mass must be at least 0.1 kg/m²").max(200, "Panel mass must be at most 200 kg/m²").describe("Panel surface mass, kg/m²"),
  cavityDepthM: size("Cavity depth", 0.005, 1),
  resistanceRatio: z.number().finite().min(0.01).max(10).default(0.2).describe("Assumed series resistance r′ over ρ₀c (0.1…0.25 with porous fill in the cavity, common practice)"),
});
/** Perforated-panel (distributed Helmholtz) absorber over a cavity. */
export const perforatedBuildSchema = z.object({
  kind: z.literal("perforated"),
  openAreaRatio: z.number().finite().min(0.001).max(0.5).describe("Open-area ratio ε"),
  plateThicknessM: size("Plate thickness", 0.0005, 0.1),
  holeDiameterM: size("Hole diameter", 0.0005, 0.05),
  cavityDepthM: size("Cavity depth", 0.005, 1),
  resistanceRatio: z.number().finite().min(0.01).max(10).default(0.5).describe("Assumed series resistance r′ over ρ₀c"),
});

/** What an absorber is made of, without its size: what the library stores. */
export const buildSpecSchema = z
  .discriminatedUnion("kind", [porousPanelBuildSchema, cornerTrapBuildSchema, membraneBuildSchema, perforatedBuildSchema])
  .describe("An absorber design: porous panel (layer stack), porous corner trap, membrane or perforated-panel resonator");
export type BuildSpec = z.infer<typeof buildSpecSchema>;
export type BuildKind = BuildSpec["kind"];
export const BUILD_KINDS = ["porous-panel", "corner-trap", "membrane", "perforated"] as const satisfies readonly BuildKind[];

const face = { widthM: panel.widthM, heightM: panel.heightM };
/** A build with its size: what one treatment item absorbs with. */
export const itemSpecSchema = z
  .discriminatedUnion("kind", [
    porousPanelBuildSchema.extend({ ...face, exposedSides: z.boolean().default(false).describe("Count the panel's sides as absorbing (free-hanging or spaced off)") }),
    cornerTrapBuildSchema.extend({ lengthM: trap.lengthM }),
    membraneBuildSchema.extend(face),
    perforatedBuildSchema.extend(face),
  ])
  .describe("An absorber with its size: face width × height (panels, resonators) or run length (corner traps)");
export type ItemSpec = z.infer<typeof itemSpecSchema>;

export const VERTICAL_CORNERS = ["front-left", "front-right", "rear-left", "rear-right"] as const;
export const CEILING_EDGES = ["front-ceiling", "rear-ceiling", "left-ceiling", "right-ceiling"] as const;

/** Where one unit of an item sits. */
export const placementSchema = z
  .discriminatedUnion("kind", [
    z.object({ kind: z.literal("surface"), surface: surfaceIdSchema, uM: metres("u"), vM: metres("v") }).describe("On a surface; (u, v) is the centre of the face"),
    z.object({ kind: z.literal("corner"), corner: z.enum([...VERTICAL_CORNERS, ...CEILING_EDGES]) }).describe("In a vertical corner (floor-to-ceiling) or along a wall–ceiling edge"),
  ])
  .describe("Placement of one unit");
export type Placement = z.infer<typeof placementSchema>;

const itemFields = z.object({
  name: name("Item"),
  spec: itemSpecSchema,
  count: z.number().int("Count must be a whole number").min(1, "Count must be at least 1").max(1000, "Count must be at most 1000"),
  placements: z.array(placementSchema).max(1000).describe("Where the units sit (up to `count`; fewer means some are not placed yet)"),
  unitCost: z.number().finite().min(0, "Unit cost must be at least 0").max(1_000_000, "Unit cost must be at most 1 000 000").describe("Cost of one unit, in the firm's currency"),
  unitMassKg: z.number().finite().min(0).max(2000).nullable().describe("Mass of one unit, kg (drives the heavy-fixing caution); null when not known"),
  buildId: z.uuid("Choose a build of the library").nullable().describe("The library build it was made from, if any"),
  notes,
});

function placementsFit(v: { count?: number; placements?: Placement[]; spec?: ItemSpec }, ctx: z.RefinementCtx) {
  if (v.spec?.kind === "corner-trap" && v.count !== undefined && v.count > 100)
    ctx.addIssue({ code: "custom", path: ["count"], message: "at most 100 corner traps in one item" });
  if (v.placements && v.count !== undefined && v.placements.length > v.count)
    ctx.addIssue({ code: "custom", path: ["placements"], message: `at most ${v.count} placements for ${v.count} unit(s)` });
  if (v.spec && v.placements) {
    const isTrap = v.spec.kind === "corner-trap";
    v.placements.forEach((p, i) => {
      if (isTrap && p.kind !== "corner") ctx.addIssue({ code: "custom", path: ["placements", i, "kind"], message: "a corner trap sits in a corner" });
      if (!isTrap && p.kind !== "surface") ctx.addIssue({ code: "custom", path: ["placements", i, "kind"], message: "a panel or resonator hangs on a surface" });
    });
  }
}

/** Body of POST /scenarios/{scenarioId}/items: a new item, with the scenario's version. */
export const treatmentItemInputSchema = itemFields
  .extend({
    placements: itemFields.shape.placements.default([]),
    count: itemFields.shape.count.default(1),
    unitCost: itemFields.shape.unitCost.default(0),
    unitMassKg: itemFields.shape.unitMassKg.default(null),
    buildId: itemFields.shape.buildId.default(null),
    notes: notes.default(""),
    version,
  })
  .superRefine(placementsFit)
  .describe("A treatment item of a scenario; `version` is the scenario's version");
export type TreatmentItemInput = z.infer<typeof treatmentItemInputSchema>;

/** Body of PATCH /scenarios/{scenarioId}/items/{itemId}: only the fields sent change. */
export const treatmentItemUpdateSchema = itemFields
  .partial()
  .extend({ version })
  .superRefine(placementsFit)
  .describe("A partial change of a treatment item; `version` is the scenario's version");
export type TreatmentItemUpdate = z.infer<typeof treatmentItemUpdateSchema>;

/** A body holding only the version you read (a delete by server action). */
export const versionSchema = z.object({ version });
/** Body of a removal of an item: the scenario's version. */
export const scenarioVersionSchema = versionSchema;

/** Issues for placements that do not fit the room (surface extent, corner kind, trap length). */
export function placementIssues(
  item: { spec: ItemSpec; placements: readonly Placement[] },
  room: { lengthM: number; widthM: number; heightM: number },
  path: (string | number)[] = [],
): { path: (string | number)[]; message: string }[] {
  const out: { path: (string | number)[]; message: string }[] = [];
  const s = item.spec;
  item.placements.forEach((p, i) => {
    if (p.kind === "surface") {
      if (s.kind === "corner-trap") return;
      const ext = surfaceExtentM(p.surface, room);
      if (p.uM - s.widthM / 2 < -1e-9 || p.uM + s.widthM / 2 > ext.uM + 1e-9)
        out.push({ path: [...path, "placements", i, "uM"], message: `the ${s.widthM} m wide face must fit on the ${p.surface} surface (0 ≤ u ≤ ${ext.uM} m)` });
      if (p.vM - s.heightM / 2 < -1e-9 || p.vM + s.heightM / 2 > ext.vM + 1e-9)
        out.push({ path: [...path, "placements", i, "vM"], message: `the ${s.heightM} m high face must fit on the ${p.surface} surface (0 ≤ v ≤ ${ext.vM} m)` });
    } else if (s.kind === "corner-trap") {
      const vertical = (VERTICAL_CORNERS as readonly string[]).includes(p.corner);
      if (s.orientation === "floor-to-ceiling" && !vertical) out.push({ path: [...path, "placements", i, "corner"], message: "a floor-to-ceiling trap stands in a vertical corner" });
      if (s.orientation === "wall-ceiling" && vertical) out.push({ path: [...path, "placements", i, "corner"], message: "a wall–ceiling trap runs along a ceiling edge" });
      const edge = vertical ? room.heightM : p.corner === "front-ceiling" || p.corner === "rear-ceiling" ? room.widthM : room.lengthM;
      if (s.lengthM > edge + 1e-9) out.push({ path: [...path, "spec", "lengthM"], message: `the trap (${s.lengthM} m) is longer than its corner (${edge} m)` });
    }
  });
  return out;
}

// ---------------------------------------------------------------------------------------------
// Scenarios

/** The reverberation target of a scenario (lib/reverb reverbTargetSchema): BS.1116 listening room or the small-room band. */
export const scenarioTargetSchema = reverbTargetSchema;
export type ScenarioTarget = z.infer<typeof scenarioTargetSchema>;
export const DEFAULT_TARGET: ScenarioTarget = { kind: "small-room", lowerS: 0.2, upperS: 0.4 };

/** Body of POST /rooms/{roomId}/scenarios. */
export const scenarioInputSchema = z
  .object({
    name: name("Scenario"),
    notes: notes.default(""),
    target: scenarioTargetSchema.default(DEFAULT_TARGET),
    copyFromScenarioId: z.uuid("Choose a scenario of this room").nullable().default(null).describe("Start from a copy of this scenario's items and target"),
  })
  .describe("A new scenario (a named treatment variant) of a room");
export type ScenarioInput = z.infer<typeof scenarioInputSchema>;

/** Body of PATCH /scenarios/{scenarioId}: rename, notes, target, archive/unarchive. */
export const scenarioUpdateSchema = z
  .object({
    name: name("Scenario").optional(),
    notes: notes.optional(),
    target: scenarioTargetSchema.optional(),
    archived: z.boolean().optional().describe("Archive (true) or bring back (false); the baseline cannot be archived"),
    version,
  })
  .describe("A partial change of a scenario");
export type ScenarioUpdate = z.infer<typeof scenarioUpdateSchema>;

/** Body of POST /scenarios/{scenarioId}/duplicate. */
export const scenarioDuplicateSchema = z.object({ name: name("Scenario").optional().describe("Name of the copy (default: “… (copy)”)") });
export type ScenarioDuplicate = z.infer<typeof scenarioDuplicateSchema>;

// ---------------------------------------------------------------------------------------------
// Library builds

const buildFields = z.object({ name: name("Build"), spec: buildSpecSchema, notes });
/** Body of POST /builds. */
export const buildInputSchema = buildFields.extend({ notes: notes.default("") }).describe("A named build of the firm's library");
export type BuildInput = z.infer<typeof buildInputSchema>;
/** Body of PATCH /builds/{buildId}. */
export const buildUpdateSchema = buildFields.partial().extend({ version }).describe("A partial change of a library build");
export type BuildUpdate = z.infer<typeof buildUpdateSchema>;

/** Issues for openings that do not fit their surface, or cover more than it. */
export function openingIssues(
  surface: SurfaceId,
  openings: readonly Opening[],
  room: { lengthM: number; widthM: number; heightM: number },
  path: (string | number)[] = [],
): { path: (string | number)[]; message: string }[] {
  const ext = surfaceExtentM(surface, room);
  const out: { path: (string | number)[]; message: string }[] = [];
  let area = 0;
  openings.forEach((o, i) => {
    area += o.widthM * o.heightM;
    if (o.uM + o.widthM > ext.uM + 1e-9) out.push({ path: [...path, i, "widthM"], message: `must fit on the ${surface} surface: u + width ≤ ${ext.uM} m` });
    if (o.vM + o.heightM > ext.vM + 1e-9) out.push({ path: [...path, i, "heightM"], message: `must fit on the ${surface} surface: v + height ≤ ${ext.vM} m` });
  });
  if (area > ext.uM * ext.vM + 1e-9) out.push({ path, message: `the openings cover more than the ${surface} surface (${(ext.uM * ext.vM).toFixed(2)} m²)` });
  return out;
}
