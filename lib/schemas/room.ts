import { z } from "zod";

/** Room sizes this product accepts: a booth of half a metre up to a 100 m hall (metres). */
export const ROOM_DIMENSION_LIMITS_M = { min: 0.5, max: 100 } as const;

const dimension = (label: string) =>
  z
    .number({ error: `${label} must be a number of metres` })
    .finite(`${label} must be a finite number`)
    .min(ROOM_DIMENSION_LIMITS_M.min, `${label} must be at least ${ROOM_DIMENSION_LIMITS_M.min} m`)
    .max(ROOM_DIMENSION_LIMITS_M.max, `${label} must be at most ${ROOM_DIMENSION_LIMITS_M.max} m`);

// The fields without defaults: an update must never fill an absent field with its default.
const roomFields = z.object({
  name: z.string().trim().min(1, "Give the room a name").max(120, "Name must be at most 120 characters"),
  lengthM: dimension("Length").describe("Inside length in metres (x axis)"),
  widthM: dimension("Width").describe("Inside width in metres (y axis)"),
  heightM: dimension("Height").describe("Inside height in metres (z axis)"),
  temperatureC: z.number().finite().min(-20, "Air temperature must be at least −20 °C").max(50, "Air temperature must be at most 50 °C"),
  humidityPct: z.number().finite().min(0, "Humidity must be 0–100 %").max(100, "Humidity must be 0–100 %"),
  notes: z.string().trim().max(5000, "Notes must be at most 5000 characters"),
});

/** A room's basic description, in SI units (the form converts feet and inches before sending). */
export const roomInputSchema = roomFields.extend({
  temperatureC: roomFields.shape.temperatureC.default(20),
  humidityPct: roomFields.shape.humidityPct.default(50),
  notes: roomFields.shape.notes.default(""),
});
export type RoomInput = z.infer<typeof roomInputSchema>;

/** A partial update: only the fields sent change. */
export const roomUpdateSchema = roomFields.partial().extend({
  version: z.number().int().positive().describe("The version you read; a stale version gets 409"),
});
export type RoomUpdate = z.infer<typeof roomUpdateSchema>;
