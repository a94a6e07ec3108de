"use server";

// Server action of the treatment design page: "Add to scenario". Runs in the usual order — who is
// signed in and may they → zod safeParse with the shared schemas → the workspace's own server actions
// (a new scenario copied from the sized one, then one item after the other, each with the version the
// last write handed back) → a typed ActionResult.

import { z } from "zod";
import { db } from "@/db/client";
import { roomFor } from "@/db/queries/rooms";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { requireActor } from "@/lib/auth/session";
import { scenarioInputSchema, treatmentItemInputSchema } from "@/lib/schemas/workspace";
import type { ActionResult } from "../../../projects/actions";
import { addTreatmentItemAction, createScenarioAction } from "../actions";

const addProposalSchema = z.object({
  into: z.discriminatedUnion("kind", [
    z.object({ kind: z.literal("existing"), scenarioId: z.uuid("Choose a scenario of this room"), version: z.number().int().positive() }),
    z.object({ kind: z.literal("new"), name: scenarioInputSchema.shape.name, copyFromScenarioId: z.uuid().nullable() }),
  ]),
  items: z.array(z.record(z.string(), z.unknown())).min(1, "The proposal has no items").max(50),
});

/** Adds the proposal's items to a scenario of the room (an existing one, or a new copy of the sized one). */
export async function addProposalAction(roomId: string, input: unknown): Promise<ActionResult<{ scenarioId: string; version: number; added: number }>> {
  const actor = await requireActor();
  try {
    await roomFor(db, actor, roomId, "treatment.update");
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
  const parsed = addProposalSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  const { into } = parsed.data;
  // Each item as the workspace's add action will parse it (its version comes from the previous write).
  const items = [];
  for (const [i, raw] of parsed.data.items.entries()) {
    const item = treatmentItemInputSchema.safeParse({ ...raw, version: 1 });
    if (!item.success) {
      const fields = Object.fromEntries(Object.entries(fieldErrors(item.error)).map(([k, v]) => [`items.${i}.${k}`, v]));
      return { ok: false, code: "bad_request", message: "Some items of the proposal are not valid.", fields };
    }
    const { version: _v, ...rest } = item.data;
    items.push(rest);
  }
  let scenarioId: string;
  let version: number;
  if (into.kind === "new") {
    const created = await createScenarioAction(roomId, { name: into.name, copyFromScenarioId: into.copyFromScenarioId });
    if (!created.ok) return created;
    scenarioId = created.data.id;
    version = created.data.version;
  } else {
    scenarioId = into.scenarioId;
    version = into.version;
  }
  let added = 0;
  for (const item of items) {
    const r = await addTreatmentItemAction(scenarioId, { ...item, version });
    if (!r.ok) return { ...r, message: added > 0 ? `${r.message} (${added} of ${items.length} items were added before this one)` : r.message };
    version = r.data.scenarioVersion;
    added += 1;
  }
  return { ok: true, data: { scenarioId, version, added } };
}
