import "server-only";
import type { z } from "zod";
import { forbidden } from "./errors";
import { apiRoute, readJson } from "./route";
import { canInFirm } from "@/lib/auth/permissions";

/**
 * A computation endpoint: signed-in callers post the engine's request schema and get its result.
 * No database work; the engines throw RangeError/TypeError for inputs outside their domain (400).
 */
export function engineRoute<S extends z.ZodType>(schema: S, compute: (input: z.infer<S>) => unknown) {
  return apiRoute(async ({ request, actor }) => {
    if (!canInFirm(actor, "engine.run")) throw forbidden();
    const input = await readJson(request, schema);
    return { body: compute(input) };
  });
}
