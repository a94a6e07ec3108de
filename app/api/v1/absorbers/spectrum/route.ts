import { engineRoute } from "@/lib/api/engine-route";
import { absorberSpectrumRequestSchema, absorptionSpectrum } from "@/lib/porous";

export const POST = engineRoute(absorberSpectrumRequestSchema, (r) => ({
  points: absorptionSpectrum(r.layers, { frequenciesHz: r.frequenciesHz, incidence: r.incidence, air: r.air }),
}));
