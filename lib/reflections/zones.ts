import { checkNumber, checkRoom, SURFACES, surfaceSize, type Point3, type Room, type SurfaceId } from "./geometry";
import { reflectionPoint, type ReflectionPoint } from "./reflection-point";

/** A speaker or a seat. */
export interface Position {
  id: string;
  position: Point3;
}

/** A reflection point with the speaker and seat it belongs to. */
export type SeatReflection = ReflectionPoint & { speakerId: string; seatId: string };

/** A rectangle on a surface in its own frame, m. */
export interface Zone {
  surface: SurfaceId;
  uMinM: number;
  uMaxM: number;
  vMinM: number;
  vMaxM: number;
  speakerIds: string[];
  pointCount: number;
}

function checkList(list: unknown, field: string): asserts list is Position[] {
  if (!Array.isArray(list) || list.length === 0) throw new RangeError(`${field} must hold at least one position`);
  if (list.length > 64) throw new RangeError(`${field} must hold at most 64 positions, got ${list.length}`);
}

/**
 * Every first-order reflection point, speakers × seats × surfaces (image-source method, see
 * {@link reflectionPoint}); pairs lying both on a surface give no point there.
 * @example firstReflections(room, { speakers: [{ id: 'L', position: [0.5, 1, 1.2] }], seats: [{ id: 'a', position: [3, 2, 1.1] }] }).length // 6
 */
export function firstReflections(
  room: Room,
  { speakers, seats, surfaces = SURFACES, speedOfSound = 343 }: { speakers: readonly Position[]; seats: readonly Position[]; surfaces?: readonly SurfaceId[]; speedOfSound?: number },
): SeatReflection[] {
  checkList(speakers, "speakers");
  checkList(seats, "seats");
  const out: SeatReflection[] = [];
  for (const sp of speakers) {
    for (const seat of seats) {
      for (const surface of surfaces) {
        const r = reflectionPoint(room, sp.position, seat.position, surface, speedOfSound);
        if (r) out.push({ ...r, speakerId: sp.id, seatId: seat.id });
      }
    }
  }
  return out;
}

/**
 * Seats at the four corners of a rectangular listening area at ear height. The reflection point is a
 * linear-fractional function of the receiver position, so over a box its extremes are at the corners:
 * zones from these four seats cover every seat inside the area.
 * @example listeningAreaSeats({ xMinM: 3, xMaxM: 4, yMinM: 1.5, yMaxM: 2.5, earHeightM: 1.1 }).length // 4
 */
export function listeningAreaSeats(area: { xMinM: number; xMaxM: number; yMinM: number; yMaxM: number; earHeightM: number }): Position[] {
  checkNumber(area.xMinM, "xMinM", 0, 100);
  checkNumber(area.xMaxM, "xMaxM", area.xMinM, 100);
  checkNumber(area.yMinM, "yMinM", 0, 100);
  checkNumber(area.yMaxM, "yMaxM", area.yMinM, 100);
  checkNumber(area.earHeightM, "earHeightM", 0, 100);
  const out: Position[] = [];
  for (const [i, x] of [area.xMinM, area.xMaxM].entries()) {
    for (const [j, y] of [area.yMinM, area.yMaxM].entries()) out.push({ id: `area-${i}${j}`, position: [x, y, area.earHeightM] });
  }
  return out;
}

const overlaps = (a: Zone, b: Zone) => a.uMinM <= b.uMaxM && b.uMinM <= a.uMaxM && a.vMinM <= b.vMaxM && b.vMinM <= a.vMaxM;

/**
 * Reflection zones for a listening area: on each surface, per speaker, the bounding rectangle of that
 * speaker's reflection points over all seats, padded by `marginM` on every side and clipped to the
 * surface; rectangles of one surface that overlap are merged into their bounding rectangle (repeated
 * until none overlap). Sorted by surface order, then u.
 * @param marginM padding, m (0…2; common practice 0.1–0.3 m for the head's movement and panel edges)
 * @example reflectionZones(room, { speakers, seats, marginM: 0.2 })[0].surface // 'front'
 */
export function reflectionZones(
  room: Room,
  opts: { speakers: readonly Position[]; seats: readonly Position[]; marginM: number; surfaces?: readonly SurfaceId[]; speedOfSound?: number },
): Zone[] {
  checkRoom(room);
  const margin = checkNumber(opts.marginM, "marginM", 0, 2);
  const surfaces = opts.surfaces ?? SURFACES;
  const points = firstReflections(room, opts);
  const zones: Zone[] = [];
  for (const surface of surfaces) {
    const size = surfaceSize(room, surface);
    let rects: Zone[] = [];
    for (const sp of opts.speakers) {
      const mine = points.filter((p) => p.surface === surface && p.speakerId === sp.id);
      if (mine.length === 0) continue;
      rects.push({
        surface,
        uMinM: Math.max(0, Math.min(...mine.map((p) => p.u)) - margin),
        uMaxM: Math.min(size.uM, Math.max(...mine.map((p) => p.u)) + margin),
        vMinM: Math.max(0, Math.min(...mine.map((p) => p.v)) - margin),
        vMaxM: Math.min(size.vM, Math.max(...mine.map((p) => p.v)) + margin),
        speakerIds: [sp.id],
        pointCount: mine.length,
      });
    }
    let merged = true;
    while (merged) {
      merged = false;
      outer: for (let i = 0; i < rects.length; i++) {
        for (let j = i + 1; j < rects.length; j++) {
          if (!overlaps(rects[i]!, rects[j]!)) continue;
          const a = rects[i]!;
          const b = rects[j]!;
          const joined: Zone = {
            surface,
            uMinM: Math.min(a.uMinM, b.uMinM),
            uMaxM: Math.max(a.uMaxM, b.uMaxM),
            vMinM: Math.min(a.vMinM, b.vMinM),
            vMaxM: Math.max(a.vMaxM, b.vMaxM),
            speakerIds: [...a.speakerIds, ...b.speakerIds],
            pointCount: a.pointCount + b.pointCount,
          };
          rects = [...rects.slice(0, i), joined, ...rects.slice(i + 1, j), ...rects.slice(j + 1)];
          merged = true;
          break outer;
        }
      }
    }
    zones.push(...rects.sort((a, b) => a.uMinM - b.uMinM));
  }
  return zones;
}
