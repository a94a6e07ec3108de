/** x = length 0..L (x = 0 front wall), y = width 0..W (y = 0 left wall), z = height 0..H (z = 0 floor), m. */
export interface Room {
  lengthM: number;
  widthM: number;
  heightM: number;
}

/** A point in the room, [x, y, z] in m. */
export type Point3 = readonly [number, number, number];

/** The six surfaces of a rectangular room. */
export type SurfaceId = "front" | "rear" | "left" | "right" | "floor" | "ceiling";

export const SURFACES: readonly SurfaceId[] = Object.freeze(["front", "rear", "left", "right", "floor", "ceiling"]);

/** Plain names for messages. */
export const SURFACE_NAMES: Readonly<Record<SurfaceId, string>> = Object.freeze({
  front: "front wall",
  rear: "rear wall",
  left: "left wall",
  right: "right wall",
  floor: "floor",
  ceiling: "ceiling",
});

/**
 * Each surface's plane (normal axis and its coordinate) and its own 2-D frame (u, v):
 * front/rear walls u = y, v = z; left/right walls u = x, v = z; floor/ceiling u = x, v = y.
 * On walls v is the height above the floor.
 */
export function surfaceFrame(room: Room, surface: SurfaceId): { axis: 0 | 1 | 2; at: number; uAxis: 0 | 1 | 2; vAxis: 0 | 1 | 2 } {
  switch (surface) {
    case "front":
      return { axis: 0, at: 0, uAxis: 1, vAxis: 2 };
    case "rear":
      return { axis: 0, at: room.lengthM, uAxis: 1, vAxis: 2 };
    case "left":
      return { axis: 1, at: 0, uAxis: 0, vAxis: 2 };
    case "right":
      return { axis: 1, at: room.widthM, uAxis: 0, vAxis: 2 };
    case "floor":
      return { axis: 2, at: 0, uAxis: 0, vAxis: 1 };
    case "ceiling":
      return { axis: 2, at: room.heightM, uAxis: 0, vAxis: 1 };
    default:
      throw new TypeError(`surface must be one of ${SURFACES.join(", ")}, got ${String(surface)}`);
  }
}

const dims = (room: Room) => [room.lengthM, room.widthM, room.heightM] as const;

/**
 * Extent of a surface in its own frame, m.
 * @example surfaceSize({ lengthM: 6, widthM: 4, heightM: 2.5 }, 'left') // { uM: 6, vM: 2.5 }
 */
export function surfaceSize(room: Room, surface: SurfaceId): { uM: number; vM: number } {
  checkRoom(room);
  const f = surfaceFrame(room, surface);
  const d = dims(room);
  return { uM: d[f.uAxis], vM: d[f.vAxis] };
}

function checkNumber(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== "number") throw new TypeError(`${field} must be a number, got ${typeof value}`);
  if (!Number.isFinite(value) || value < min || value > max) throw new RangeError(`${field} must be within ${min}…${max}, got ${value}`);
  return value;
}
export { checkNumber };

/** Checks room dimensions (0.5…100 m). */
export function checkRoom(room: Room): void {
  if (typeof room !== "object" || room === null) throw new TypeError("room must be an object");
  checkNumber(room.lengthM, "room.lengthM", 0.5, 100);
  checkNumber(room.widthM, "room.widthM", 0.5, 100);
  checkNumber(room.heightM, "room.heightM", 0.5, 100);
}

/** Checks that a point lies inside the room (boundary included). */
export function checkPoint(room: Room, p: Point3, field: string): void {
  if (!Array.isArray(p) || p.length !== 3) throw new TypeError(`${field} must be [x, y, z]`);
  const d = dims(room);
  ["x", "y", "z"].forEach((axis, i) => checkNumber(p[i], `${field}.${axis}`, 0, d[i]!));
}
