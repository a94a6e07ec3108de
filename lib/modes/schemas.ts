/**
 * zod schemas for every public input of lib/modes. The request schemas are JSON request bodies that
 * wrap a function's arguments (`{ room, ...options }`), parsed by the API routes
 * POST /api/v1/modes, /api/v1/modes/response, /api/v1/modes/flatness-map and by the forms; their
 * descriptions feed the OpenAPI document through zod 4's `z.toJSONSchema`. Bounds come from limits.ts,
 * the same ones the functions check, so a body that parses is accepted by the function.
 */
import { z } from "zod";
import { LIMITS } from "./limits";

const dimension = (axis: string, name: string) =>
  z.number().positive().max(LIMITS.maxDimensionM).describe(`Room ${name} along ${axis}, m: finite, > 0 and <= ${LIMITS.maxDimensionM}`);

/**
 * A rectangular room, m (x = length, y = width, z = height).
 * @example rectRoomSchema.parse({ lengthM: 5, widthM: 4, heightM: 3 })
 */
export const rectRoomSchema = z
  .object({ lengthM: dimension("x", "length"), widthM: dimension("y", "width"), heightM: dimension("z", "height") })
  .describe("Rectangular room with rigid walls; dimensions in metres (x = length, y = width, z = height)")
  .meta({ examples: [{ lengthM: 7.2, widthM: 5.1, heightM: 2.7 }] });

/** A point [x, y, z], m; inside-the-room checks are made by the request schemas. */
export const pointSchema = z
  .tuple([z.number(), z.number(), z.number()])
  .describe("Position [x, y, z] in metres from the corner at the origin; must lie inside the room (walls included)");

export const frequencySchema = z.number().min(LIMITS.minFrequencyHz).max(LIMITS.maxFrequencyHz).describe("Frequency, Hz, 1..1000");

export const frequenciesSchema = z
  .array(frequencySchema)
  .min(1)
  .max(LIMITS.maxFrequencies)
  .describe(`Frequencies to evaluate, Hz: 1..${LIMITS.maxFrequencies} values, each in [1, 1000]`);

export const rt60Schema = z.number().min(LIMITS.minRt60Seconds).max(LIMITS.maxRt60Seconds).describe("Reverberation time RT60, s, 0.05..10: sets the modal damping");

export const speedOfSoundSchema = z
  .number()
  .min(LIMITS.minSpeedOfSound)
  .max(LIMITS.maxSpeedOfSound)
  .default(343)
  .describe("Speed of sound, m/s, 200..500 (default 343)");

const maxModeFrequencySchema = frequencySchema.describe("Every mode up to this frequency, Hz, enters the modal sum (required)");
const gridSchema = (axis: string) => z.number().int().min(1).max(LIMITS.maxGrid).describe(`Cells along ${axis}, 1..${LIMITS.maxGrid}`);

/** One source (subwoofer) of the multi-source sums. */
export const soundSourceSchema = z
  .object({
    position: pointSchema,
    delayMs: z.number().min(0).max(LIMITS.maxDelayMs).optional().describe("Signal delay, ms, 0..1000 (default 0)"),
    polarity: z.union([z.literal(1), z.literal(-1)]).optional().describe("Polarity +1 (default) or -1"),
  })
  .describe("A source driven by the common signal, with optional delay and polarity");

type Pt = [number, number, number];
type Room = z.infer<typeof rectRoomSchema>;

/** Adds an issue for each coordinate of `p` outside the room, at path [...path, axis]. */
function insideRoom(ctx: z.RefinementCtx, room: Room, p: Pt, path: (string | number)[]) {
  const dims = [room.lengthM, room.widthM, room.heightM];
  p.forEach((v, a) => {
    if (!(Number.isFinite(v) && v >= 0 && v <= dims[a]!))
      ctx.addIssue({ code: "custom", path: [...path, a], message: `must lie inside the room: 0 <= ${"xyz"[a]} <= ${dims[a]} m` });
  });
}

function heightInside(ctx: z.RefinementCtx, room: Room, h: number, path: string) {
  if (h > room.heightM) ctx.addIssue({ code: "custom", path: [path], message: `must lie inside the room: 0 <= z <= ${room.heightM} m` });
}

/**
 * Body of POST /api/v1/modes: the arguments of roomModes (rt60Seconds optional, for a mode table).
 * @example modesRequestSchema.parse({ room: { lengthM: 5, widthM: 4, heightM: 3 }, maxFrequencyHz: 100 }) // speedOfSound 343 added
 */
export const modesRequestSchema = z
  .object({
    room: rectRoomSchema,
    maxFrequencyHz: frequencySchema.describe("List every mode up to this frequency, Hz (inclusive)"),
    speedOfSound: speedOfSoundSchema,
    rt60Seconds: rt60Schema.optional().describe("Optional RT60, s: adds the modal bandwidth and coincidence flags (mode table)"),
  })
  .describe("Room modes up to a frequency: roomModes(room, { maxFrequencyHz, speedOfSound })");

/**
 * Body of POST /api/v1/modes/response: the arguments of modalResponse.
 * @example modalResponseRequestSchema.parse({ room, source: [0, 0, 0], receiver: [5, 4, 3], frequenciesHz: [34.3],
 *   rt60Seconds: 0.5, maxModeFrequencyHz: 200 })
 */
export const modalResponseRequestSchema = z
  .object({
    room: rectRoomSchema,
    source: pointSchema.describe("Source position [x, y, z], m"),
    receiver: pointSchema.describe("Receiver position [x, y, z], m"),
    frequenciesHz: frequenciesSchema,
    rt60Seconds: rt60Schema,
    speedOfSound: speedOfSoundSchema,
    maxModeFrequencyHz: maxModeFrequencySchema,
  })
  .superRefine((b, ctx) => {
    insideRoom(ctx, b.room, b.source, ["source"]);
    insideRoom(ctx, b.room, b.receiver, ["receiver"]);
  })
  .describe("Modal response between a source and a receiver: modalResponse(room, options), levels in dB");

/** Body of a multi-source response request: the arguments of multiSourceResponse. */
export const multiSourceResponseRequestSchema = z
  .object({
    room: rectRoomSchema,
    sources: z.array(soundSourceSchema).min(1).max(LIMITS.maxSources).describe(`1..${LIMITS.maxSources} sources`),
    receivers: z.array(pointSchema).min(1).max(LIMITS.maxReceivers).describe(`1..${LIMITS.maxReceivers} receiver positions (seats)`),
    frequenciesHz: frequenciesSchema,
    rt60Seconds: rt60Schema,
    speedOfSound: speedOfSoundSchema,
    maxModeFrequencyHz: maxModeFrequencySchema,
  })
  .superRefine((b, ctx) => {
    b.sources.forEach((s, i) => insideRoom(ctx, b.room, s.position, ["sources", i, "position"]));
    b.receivers.forEach((r, i) => insideRoom(ctx, b.room, r, ["receivers", i]));
  })
  .describe("Levels at several seats for several sources driven together: multiSourceResponse(room, options)");

const gridFields = {
  room: rectRoomSchema,
  heightM: z.number().min(0).describe("Listening height of the grid, m (0..room height)"),
  gridX: gridSchema("x (length)"),
  gridY: gridSchema("y (width)"),
  frequenciesHz: frequenciesSchema,
  rt60Seconds: rt60Schema,
  speedOfSound: speedOfSoundSchema,
  maxModeFrequencyHz: maxModeFrequencySchema,
};

/**
 * Body of POST /api/v1/modes/flatness-map: the arguments of flatnessMap (without the callbacks).
 * @example flatnessMapRequestSchema.parse({ room, source: [0.3, 0.3, 0.3], heightM: 1.2, gridX: 72, gridY: 51,
 *   frequenciesHz: logSpacedFrequencies(20, 120, 96), rt60Seconds: 0.4, maxModeFrequencyHz: 200 })
 */
export const flatnessMapRequestSchema = z
  .object({ ...gridFields, source: pointSchema.describe("Source position [x, y, z], m") })
  .superRefine((b, ctx) => {
    insideRoom(ctx, b.room, b.source, ["source"]);
    heightInside(ctx, b.room, b.heightM, "heightM");
  })
  .describe("Flatness map: population std-dev of the level over frequency at each grid cell, flatnessMap(room, options)");

/** Body of a multi-source flatness map request: the arguments of multiSourceFlatnessMap. */
export const multiSourceFlatnessMapRequestSchema = z
  .object({ ...gridFields, sources: z.array(soundSourceSchema).min(1).max(LIMITS.maxSources).describe(`1..${LIMITS.maxSources} sources`) })
  .superRefine((b, ctx) => {
    b.sources.forEach((s, i) => insideRoom(ctx, b.room, s.position, ["sources", i, "position"]));
    heightInside(ctx, b.room, b.heightM, "heightM");
  })
  .describe("Flatness map for several sources driven together: multiSourceFlatnessMap(room, options)");

/** Body of a seat-ranking request: the arguments of rankSeatPositions. */
export const seatRankingRequestSchema = z
  .object({
    room: rectRoomSchema,
    sources: z.array(soundSourceSchema).min(1).max(LIMITS.maxSources).describe(`1..${LIMITS.maxSources} sources`),
    seatYM: z.number().min(0).describe("Seat position across the width, m"),
    earHeightM: z.number().min(0).describe("Ear height, m"),
    candidateXM: z.array(z.number().min(0)).min(1).max(400).optional().describe("Candidate positions along the length, m"),
    candidateCount: z.number().int().min(1).max(400).optional().describe("Evenly spaced candidates when candidateXM is absent (default 20)"),
    bandHz: z.object({ lowHz: frequencySchema, highHz: frequencySchema }).optional().describe("Band judged, Hz (default 20..120)"),
    frequencyCount: z.number().int().min(2).max(LIMITS.maxFrequencies).optional().describe("Log-spaced frequencies across the band (default 96)"),
    rt60Seconds: rt60Schema,
    speedOfSound: speedOfSoundSchema,
    maxModeFrequencyHz: maxModeFrequencySchema.optional(),
  })
  .superRefine((b, ctx) => {
    b.sources.forEach((s, i) => insideRoom(ctx, b.room, s.position, ["sources", i, "position"]));
    if (b.seatYM > b.room.widthM) ctx.addIssue({ code: "custom", path: ["seatYM"], message: `must lie inside the room: 0 <= y <= ${b.room.widthM} m` });
    heightInside(ctx, b.room, b.earHeightM, "earHeightM");
    b.candidateXM?.forEach((x, i) => {
      if (x > b.room.lengthM) ctx.addIssue({ code: "custom", path: ["candidateXM", i], message: `must lie inside the room: 0 <= x <= ${b.room.lengthM} m` });
    });
    if (b.bandHz && !(b.bandHz.highHz > b.bandHz.lowHz)) ctx.addIssue({ code: "custom", path: ["bandHz", "highHz"], message: "must be above lowHz" });
  })
  .describe("Ranking of seat positions along the length by bass flatness: rankSeatPositions(room, options)");

export type ModesRequest = z.infer<typeof modesRequestSchema>;
export type ModalResponseRequest = z.infer<typeof modalResponseRequestSchema>;
export type MultiSourceResponseRequest = z.infer<typeof multiSourceResponseRequestSchema>;
export type FlatnessMapRequest = z.infer<typeof flatnessMapRequestSchema>;
export type MultiSourceFlatnessMapRequest = z.infer<typeof multiSourceFlatnessMapRequestSchema>;
export type SeatRankingRequest = z.infer<typeof seatRankingRequestSchema>;
