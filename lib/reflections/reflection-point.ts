import { checkNumber, checkPoint, checkRoom, surfaceFrame, type Point3, type Room, type SurfaceId } from "./geometry";

/** A first-order reflection point. */
export interface ReflectionPoint {
  surface: SurfaceId;
  point: [number, number, number];
  /** coordinates in the surface's own frame (see surfaceFrame), m */
  u: number;
  v: number;
  /** source → point → receiver, equal to the image-source distance, m */
  reflectedPathM: number;
  directPathM: number;
  /** arrival of the reflection after the direct sound, ms */
  delayMs: number;
  /** angle of incidence from the surface normal, degrees */
  incidenceDeg: number;
}

/**
 * First-order reflection point on one surface by the image-source method: mirror the source in the
 * surface's plane; the point is where the line from the image to the receiver crosses the plane.
 * With distances d_s, d_r of source and receiver from the plane the crossing is at
 * t = d_s/(d_s + d_r) along source → receiver in the in-plane coordinates (similar triangles;
 * e.g. Kuttruff, Room Acoustics, image sources [from memory, high]). `undefined` when both lie on the plane.
 * @param source, receiver [x, y, z] in m inside the room; @param speedOfSound m/s (default 343)
 * @example reflectionPoint({ lengthM: 6, widthM: 4, heightM: 2.5 }, [1, 1, 1.2], [3, 1, 1.2], 'left')?.point // [2, 0, 1.2]
 */
export function reflectionPoint(room: Room, source: Point3, receiver: Point3, surface: SurfaceId, speedOfSound = 343): ReflectionPoint | undefined {
  checkRoom(room);
  const f = surfaceFrame(room, surface);
  checkPoint(room, source, "source");
  checkPoint(room, receiver, "receiver");
  checkNumber(speedOfSound, "speedOfSound", 250, 450);
  const ds = Math.abs(source[f.axis] - f.at);
  const dr = Math.abs(receiver[f.axis] - f.at);
  if (ds + dr === 0) return undefined;
  const t = ds / (ds + dr); // similar triangles: the crossing divides the in-plane run in ds : dr
  const point: [number, number, number] = [0, 0, 0];
  for (const axis of [0, 1, 2] as const) point[axis] = axis === f.axis ? f.at : source[axis] + t * (receiver[axis] - source[axis]);
  let inPlane2 = 0;
  let direct2 = 0;
  for (const axis of [0, 1, 2] as const) {
    direct2 += (receiver[axis] - source[axis]) ** 2;
    if (axis !== f.axis) inPlane2 += (receiver[axis] - source[axis]) ** 2;
  }
  const reflectedPathM = Math.sqrt(inPlane2 + (ds + dr) ** 2); // |receiver − image|
  const directPathM = Math.sqrt(direct2);
  return {
    surface,
    point,
    u: point[f.uAxis],
    v: point[f.vAxis],
    reflectedPathM,
    directPathM,
    delayMs: ((reflectedPathM - directPathM) / speedOfSound) * 1000,
    incidenceDeg: (Math.atan2(Math.sqrt(inPlane2), ds + dr) * 180) / Math.PI,
  };
}
