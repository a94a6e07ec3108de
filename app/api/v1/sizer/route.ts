import { db } from "@/db/client";
import { loadAnalysisRoom } from "@/db/queries/analysis";
import { getScenario } from "@/db/queries/scenarios";
import { reverbSurfaces } from "@/lib/analysis";
import { AppError } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { sizeTreatment, sizerRequestSchema } from "@/lib/sizer";

/** Sizes low-frequency treatment for a room's scenario (read access to the room's workspace). */
export const POST = apiRoute(async ({ request, actor }) => {
  const body = await readJson(request, sizerRequestSchema);
  const scenario = await getScenario(db, actor, body.scenarioId);
  if (scenario.roomId !== body.roomId) throw new AppError("bad_request", "That scenario belongs to another room.", { scenarioId: ["must be a scenario of the room roomId"] });
  const room = await loadAnalysisRoom(db, body.roomId);
  const seat = room.seats.find((s) => s.isMain) ?? room.seats[0];
  const source = room.sources.find((s) => s.drivesBass) ?? room.sources[0];
  const proposal = sizeTreatment({
    room: { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM },
    surfaces: reverbSurfaces(room),
    temperatureC: room.temperatureC,
    relativeHumidityPct: room.humidityPct,
    ...(scenario.results.reverb ? { currentTreatmentM2: scenario.results.reverb.addedM2 } : {}),
    target: body.target ?? scenario.target,
    aim: body.aim,
    objective: body.objective,
    limits: body.limits,
    ...(body.catalogue ? { catalogue: body.catalogue } : {}),
    ...(body.prices ? { prices: body.prices } : {}),
    ...(seat && source ? { seat: { source: [source.xM, source.yM, source.zM] as const, receiver: [seat.xM, seat.yM, seat.zM] as const } } : {}),
  });
  return { body: { roomId: body.roomId, scenarioId: body.scenarioId, proposal } };
});
