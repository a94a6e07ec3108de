import { engineRoute } from "@/lib/api/engine-route";
import { predictReverberation, reverbPredictRequestSchema } from "@/lib/reverb";

export const POST = engineRoute(reverbPredictRequestSchema, (r) => ({ prediction: predictReverberation(r) }));
