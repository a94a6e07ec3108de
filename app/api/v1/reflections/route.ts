import { db } from "@/db/client";
import { loadAnalysisRoom } from "@/db/queries/analysis";
import { roomFor } from "@/db/queries/rooms";
import { AppError } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { checkPlacement, firstReflections, listeningAreaSeats, reflectionZones, roomReflectionsRequestSchema, suggestPanels, type PlacedItem } from "@/lib/reflections";

/** Reflection points, zones, panels and placement problems for a stored room (read access). */
export const POST = apiRoute(async ({ request, actor }) => {
  const body = await readJson(request, roomReflectionsRequestSchema);
  await roomFor(db, actor, body.roomId, "workspace.read");
  const room = await loadAnalysisRoom(db, body.roomId);
  const dims = { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM };
  const speakers = room.sources.filter((s) => s.kind === "main-speaker").map((s) => ({ id: s.name || s.id, position: [s.xM, s.yM, s.zM] as const }));
  if (speakers.length === 0) throw new AppError("bad_request", "Place at least one main speaker in the room first.", { roomId: ["the room has no main speaker"] });
  const seats = body.listeningArea ? listeningAreaSeats(body.listeningArea) : room.seats.map((s) => ({ id: s.name || s.id, position: [s.xM, s.yM, s.zM] as const }));
  if (seats.length === 0) throw new AppError("bad_request", "Place a seat or give a listening area.", { listeningArea: ["the room has no seat"] });
  const surfaces = body.surfaces;
  const points = firstReflections(dims, { speakers, seats, ...(surfaces ? { surfaces } : {}) });
  const zones = reflectionZones(dims, { speakers, seats, marginM: body.marginM, ...(surfaces ? { surfaces } : {}) });
  const panels = suggestPanels(dims, zones, body.panel);
  const openings: PlacedItem[] = room.surfaces.flatMap((s) =>
    s.openings.map((o, i) => ({ id: o.label || `${s.surface} ${o.kind} ${i + 1}`, surface: s.surface, uM: o.uM, vM: o.vM, widthM: o.widthM, heightM: o.heightM })),
  );
  const problems = checkPlacement(dims, { items: [...panels.flatMap((p) => p.placements), ...body.items], openings, clearanceM: body.clearanceM });
  return { body: { roomId: body.roomId, points, zones, panels, problems } };
});
