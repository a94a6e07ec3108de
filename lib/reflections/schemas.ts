import { z } from "zod";

// zod schemas of lib/reflections inputs for the API; the functions check the same bounds.

const len = (what: string) => z.number().min(0.5).max(100).describe(`${what}, m`);
/** Room box: x = length (x = 0 front wall), y = width (y = 0 left wall), z = height (z = 0 floor). */
export const reflectionRoomSchema = z.object({ lengthM: len("Length"), widthM: len("Width"), heightM: len("Height") }).meta({ id: "ReflectionRoom" });
export const point3Schema = z.tuple([z.number().min(0).max(100), z.number().min(0).max(100), z.number().min(0).max(100)]).describe("[x, y, z] in m");
export const surfaceIdSchema = z.enum(["front", "rear", "left", "right", "floor", "ceiling"]);
export const positionSchema = z.object({ id: z.string().min(1).max(40), position: point3Schema });
export const placedItemSchema = z
  .object({ id: z.string().min(1).max(40), surface: surfaceIdSchema, uM: z.number().min(-100).max(100), vM: z.number().min(-100).max(100), widthM: z.number().min(0.001).max(100), heightM: z.number().min(0.001).max(100) })
  .meta({ id: "PlacedItem", description: "A rectangle on a surface: lower corner (u, v) and size, in the surface's own frame" });

/** Body of a reflections request. */
export const reflectionsRequestSchema = z
  .object({
    room: reflectionRoomSchema,
    speakers: z.array(positionSchema).min(1).max(16),
    seats: z.array(positionSchema).max(64).default([]),
    listeningArea: z.object({ xMinM: z.number().min(0), xMaxM: z.number().min(0), yMinM: z.number().min(0), yMaxM: z.number().min(0), earHeightM: z.number().min(0) }).optional(),
    marginM: z.number().min(0).max(2).default(0.2),
    surfaces: z.array(surfaceIdSchema).min(1).max(6).optional(),
    panel: z.object({ widthM: z.number().min(0.1).max(5), heightM: z.number().min(0.1).max(5) }).default({ widthM: 1.2, heightM: 0.6 }),
    openings: z.array(placedItemSchema).max(50).default([]),
    clearanceM: z.number().min(0).max(2).default(0),
  })
  .refine((v) => v.seats.length > 0 || v.listeningArea !== undefined, { message: "give seats or a listening area", path: ["seats"] })
  .meta({ id: "ReflectionsRequest", description: "First reflection points, zones over a listening area, a suggested panel set and its placement checks" });
export type ReflectionsRequest = z.infer<typeof reflectionsRequestSchema>;

/** Body of `POST /api/v1/reflections`: reflection points, zones, panels and checks for a stored room. */
export const roomReflectionsRequestSchema = z
  .object({
    roomId: z.uuid().describe("The room: its main speakers, seats and openings are used"),
    listeningArea: z
      .object({ xMinM: z.number().min(0).max(100), xMaxM: z.number().min(0).max(100), yMinM: z.number().min(0).max(100), yMaxM: z.number().min(0).max(100), earHeightM: z.number().min(0).max(100) })
      .optional()
      .describe("A listening area used instead of the room's seats (its four corners at ear height)"),
    marginM: z.number().min(0).max(2).default(0.2).describe("Padding round the reflection points, m"),
    surfaces: z.array(surfaceIdSchema).min(1).max(6).optional(),
    panel: z.object({ widthM: z.number().min(0.1).max(5), heightM: z.number().min(0.1).max(5) }).default({ widthM: 1.2, heightM: 0.6 }),
    items: z.array(placedItemSchema).max(200).default([]).describe("Further panels or trap footprints to check together with the suggested panels"),
    clearanceM: z.number().min(0).max(2).default(0),
  })
  .meta({ id: "RoomReflectionsRequest", description: "First reflection points, zones, a suggested panel set and placement checks for a room" });
export type RoomReflectionsRequest = z.infer<typeof roomReflectionsRequestSchema>;
