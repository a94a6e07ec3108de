import { engineRoute } from "@/lib/api/engine-route";
import { flatnessMap, flatnessMapRequestSchema } from "@/lib/modes";

export const POST = engineRoute(flatnessMapRequestSchema, ({ room, ...options }) => {
  const map = flatnessMap(room, options);
  // index ix*gridY + iy, as in the contract
  return { xM: map.xM, yM: map.yM, stdDevDb: Array.from(map.stdDevDb), gridX: options.gridX, gridY: options.gridY };
});
