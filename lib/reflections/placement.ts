import { checkNumber, checkRoom, SURFACE_NAMES, surfaceFrame, surfaceSize, type Room, type SurfaceId } from "./geometry";

/** A panel, trap footprint or opening as a rectangle on a surface: lower corner (u, v) and size, m. */
export interface PlacedItem {
  id: string;
  surface: SurfaceId;
  uM: number;
  vM: number;
  widthM: number;
  heightM: number;
}

/** One placement problem, in plain words. */
export interface PlacementProblem {
  kind: "outside-surface" | "overlap" | "covers-opening";
  itemIds: string[];
  surface: SurfaceId;
  message: string;
}

const EPS = 1e-9;
const fmt = (m: number) => `${Number(m.toFixed(2))} m`;

function checkItem(item: PlacedItem, field: string): void {
  if (typeof item !== "object" || item === null) throw new TypeError(`${field} must be an object`);
  if (typeof item.id !== "string" || item.id.length === 0) throw new TypeError(`${field}.id must be a non-empty string`);
  surfaceFrame({ lengthM: 1, widthM: 1, heightM: 1 }, item.surface);
  checkNumber(item.uM, `${field}.uM`, -100, 100);
  checkNumber(item.vM, `${field}.vM`, -100, 100);
  checkNumber(item.widthM, `${field}.widthM`, 0.001, 100);
  checkNumber(item.heightM, `${field}.heightM`, 0.001, 100);
}

/** Overlap of two rectangles with positive area (touching edges do not count), each grown by `gap`. */
function intersects(a: PlacedItem, b: PlacedItem, gap = 0): boolean {
  return a.uM < b.uM + b.widthM + gap - EPS && b.uM < a.uM + a.widthM + gap - EPS && a.vM < b.vM + b.heightM + gap - EPS && b.vM < a.vM + a.heightM + gap - EPS;
}

/**
 * Placement checks on the room's surfaces: each item inside its surface's rectangle; no two items on
 * the same surface overlapping (touching is fine); no item over an opening (door, window) or within
 * `clearanceM` of one. Problems come as: outside-surface per item, then covers-opening per item and
 * opening, then overlaps per pair, in input order.
 * @example checkPlacement(room, { items: [{ id: 'a', surface: 'left', uM: 5.2, vM: 1, widthM: 1.2, heightM: 0.6 }], openings: [] })[0].kind // 'outside-surface'
 */
export function checkPlacement(
  room: Room,
  { items, openings, clearanceM = 0 }: { items: readonly PlacedItem[]; openings: readonly PlacedItem[]; clearanceM?: number },
): PlacementProblem[] {
  checkRoom(room);
  if (!Array.isArray(items as unknown)) throw new TypeError("items must be an array");
  if (!Array.isArray(openings as unknown)) throw new TypeError("openings must be an array");
  if (items.length > 500) throw new RangeError(`items must hold at most 500 rectangles, got ${items.length}`);
  items.forEach((it, i) => checkItem(it, `items[${i}]`));
  openings.forEach((it, i) => checkItem(it, `openings[${i}]`));
  checkNumber(clearanceM, "clearanceM", 0, 2);
  const problems: PlacementProblem[] = [];
  for (const it of items) {
    const size = surfaceSize(room, it.surface);
    const over = [
      it.uM < -EPS ? `${fmt(-it.uM)} past its start along the surface` : "",
      it.uM + it.widthM > size.uM + EPS ? `${fmt(it.uM + it.widthM - size.uM)} past its end (${fmt(size.uM)})` : "",
      it.vM < -EPS ? `${fmt(-it.vM)} below its lower edge` : "",
      it.vM + it.heightM > size.vM + EPS ? `${fmt(it.vM + it.heightM - size.vM)} past its upper edge (${fmt(size.vM)})` : "",
    ].filter(Boolean);
    if (over.length > 0) {
      problems.push({ kind: "outside-surface", itemIds: [it.id], surface: it.surface, message: `${it.id} does not fit the ${SURFACE_NAMES[it.surface]}: it runs ${over.join(" and ")}.` });
    }
  }
  for (const it of items) {
    for (const op of openings) {
      if (op.surface !== it.surface || !intersects(it, op, clearanceM)) continue;
      problems.push({
        kind: "covers-opening",
        itemIds: [it.id, op.id],
        surface: it.surface,
        message: intersects(it, op)
          ? `${it.id} covers ${op.id} on the ${SURFACE_NAMES[it.surface]}: move it clear of the opening.`
          : `${it.id} is closer than ${fmt(clearanceM)} to ${op.id} on the ${SURFACE_NAMES[it.surface]}: leave room for the frame and hinges.`,
      });
    }
  }
  for (let i = 0; i < items.length; i++) {
    for (let j = i + 1; j < items.length; j++) {
      const a = items[i]!;
      const b = items[j]!;
      if (a.surface !== b.surface || a.id === b.id || !intersects(a, b)) continue;
      problems.push({ kind: "overlap", itemIds: [a.id, b.id], surface: a.surface, message: `${a.id} and ${b.id} overlap on the ${SURFACE_NAMES[a.surface]}: space them apart.` });
    }
  }
  return problems;
}

/** Vertical corners of the room. */
export type VerticalCorner = "front-left" | "front-right" | "rear-left" | "rear-right";

/**
 * The rectangles a floor-to-ceiling corner trap takes on its two walls (a strip of the leg's width,
 * full height), for {@link checkPlacement}. Both carry the trap's id.
 * @example cornerTrapFootprints(room, { id: 't1', corner: 'front-left', legM: 0.424 })[1] // { id: 't1', surface: 'left', uM: 0, vM: 0, widthM: 0.424, heightM: 2.5 }
 */
export function cornerTrapFootprints(room: Room, { id, corner, legM }: { id: string; corner: VerticalCorner; legM: number }): PlacedItem[] {
  checkRoom(room);
  checkNumber(legM, "legM", 0.01, Math.min(room.lengthM, room.widthM));
  const [fr, lr] = corner.split("-") as [string, string];
  if (!["front", "rear"].includes(fr) || !["left", "right"].includes(lr)) throw new TypeError(`corner must be front-left, front-right, rear-left or rear-right, got ${String(corner)}`);
  const endWall = fr as "front" | "rear";
  const sideWall = lr as "left" | "right";
  return [
    { id, surface: endWall, uM: sideWall === "left" ? 0 : room.widthM - legM, vM: 0, widthM: legM, heightM: room.heightM },
    { id, surface: sideWall, uM: endWall === "front" ? 0 : room.lengthM - legM, vM: 0, widthM: legM, heightM: room.heightM },
  ];
}
