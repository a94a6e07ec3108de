import { engineRoute } from "@/lib/api/engine-route";
import { evaluateTarget, reverbTargetRequestSchema } from "@/lib/reverb";

export const POST = engineRoute(reverbTargetRequestSchema, ({ target, nearMarginS, ...room }) => evaluateTarget(room, target, nearMarginS));
