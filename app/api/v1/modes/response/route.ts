import { engineRoute } from "@/lib/api/engine-route";
import { modalResponse, modalResponseRequestSchema } from "@/lib/modes";

export const POST = engineRoute(modalResponseRequestSchema, ({ room, ...options }) => ({
  frequenciesHz: options.frequenciesHz,
  levelsDb: modalResponse(room, options),
}));
