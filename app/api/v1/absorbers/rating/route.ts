import { engineRoute } from "@/lib/api/engine-route";
import { absorberRatingRequestSchema, rateAbsorber } from "@/lib/porous";

export const POST = engineRoute(absorberRatingRequestSchema, (r) => ({ rating: rateAbsorber(r) }));
