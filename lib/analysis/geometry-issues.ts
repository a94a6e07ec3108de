import { openingIssues, placementIssues, positionInsideRoomIssues } from "@/lib/schemas/workspace";
import type { AnalysisItem, AnalysisRoom } from "./types";

export interface GeometryIssue {
  /** what does not fit: a seat or source, an opening, or an item of a scenario */
  what: "position" | "opening" | "item";
  id: string;
  message: string;
}

/**
 * Everything saved in a room that would not fit its dimensions: positions outside the box, openings
 * off their surface, item placements off their surface or traps longer than their corner. Used when a
 * room's dimensions change, so that a smaller room never holds a seat in mid-air.
 * @param items every item of every scenario of the room (with an id to name it)
 * @example roomGeometryIssues({ ...room, lengthM: 3 }, []) // [{ what: 'position', id: 'seat-1', message: 'Main seat: must lie inside the room: 0 ≤ x ≤ 3 m' }]
 */
export function roomGeometryIssues(room: AnalysisRoom, items: readonly AnalysisItem[]): GeometryIssue[] {
  const out: GeometryIssue[] = [];
  for (const p of [...room.seats, ...room.sources]) {
    for (const i of positionInsideRoomIssues(p, room)) out.push({ what: "position", id: p.id, message: `${p.name}: ${i.message}` });
  }
  for (const s of room.surfaces) {
    for (const i of openingIssues(s.surface, s.openings, room)) out.push({ what: "opening", id: s.surface, message: `${s.surface} opening: ${i.message}` });
  }
  for (const item of items) {
    for (const i of placementIssues(item, room)) out.push({ what: "item", id: item.id, message: `${item.name}: ${i.message}` });
  }
  return out;
}
