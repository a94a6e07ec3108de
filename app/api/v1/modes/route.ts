import { engineRoute } from "@/lib/api/engine-route";
import { bonelloCheck, dimensionRatioCheck, modesRequestSchema, modeTable, roomModes, schroederFrequency } from "@/lib/modes";

/** The room's modes; with an RT60 also the mode table (bandwidths, coincidences, gaps), Schroeder frequency and distribution checks. */
export const POST = engineRoute(modesRequestSchema, ({ room, maxFrequencyHz, speedOfSound, rt60Seconds }) => {
  const modes = roomModes(room, { maxFrequencyHz, speedOfSound });
  if (rt60Seconds === undefined) return { modes, dimensionRatio: dimensionRatioCheck(room) };
  return {
    modes,
    table: modeTable(room, { maxFrequencyHz, rt60Seconds, speedOfSound }),
    schroederFrequencyHz: schroederFrequency(rt60Seconds, room.lengthM * room.widthM * room.heightM),
    bonello: bonelloCheck(room, { rt60Seconds, speedOfSound }),
    dimensionRatio: dimensionRatioCheck(room),
  };
});
