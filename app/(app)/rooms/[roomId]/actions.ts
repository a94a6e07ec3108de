"use server";

// Server actions of the room workspace. Every one runs in the same order: who is signed in →
// may they (404 when the room is not visible, 403 when the role does not allow it) → zod safeParse
// with the shared schema → the db query (one transaction, analysis recomputed inside it) →
// revalidatePath → a typed ActionResult (never a thrown expected error).
//
// Versions: surfaces and positions carry the ROOM's version; scenarios and their items carry the
// SCENARIO's version. Each result hands back the new version to send with the next write.

import { revalidatePath } from "next/cache";
import type { z } from "zod";
import { db } from "@/db/client";
import { createBuild, deleteBuild, getBuild, updateBuild } from "@/db/queries/builds";
import { createPosition, deletePosition, updatePosition } from "@/db/queries/positions";
import { roomFor } from "@/db/queries/rooms";
import { createScenario, duplicateScenario, scenarioFor, updateScenario } from "@/db/queries/scenarios";
import { saveSurfaces } from "@/db/queries/surfaces";
import { addTreatmentItem, removeTreatmentItem, updateTreatmentItem } from "@/db/queries/treatment-items";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import type { Actor } from "@/lib/auth/actor";
import { canInFirm, type ProjectAction } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import {
  buildInputSchema,
  buildUpdateSchema,
  positionInputSchema,
  positionMoveSchema,
  positionRenameSchema,
  positionUpdateSchema,
  scenarioDuplicateSchema,
  scenarioInputSchema,
  scenarioUpdateSchema,
  scenarioVersionSchema,
  surfacesInputSchema,
  treatmentItemInputSchema,
  treatmentItemUpdateSchema,
  versionSchema,
} from "@/lib/schemas/workspace";
import type { ActionResult } from "../../projects/actions";

type Failure = Extract<ActionResult, { ok: false }>;

function failure(error: unknown): Failure {
  if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
  throw error;
}

async function run<T>(work: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await work() };
  } catch (error) {
    return failure(error);
  }
}

function invalid(error: z.ZodError): Failure {
  return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(error) };
}

/** who → may they, for a room: the actor, or the failure to return. */
async function mayOnRoom(roomId: string, action: ProjectAction): Promise<{ actor: Actor; projectId: string } | Failure> {
  const actor = await requireActor();
  try {
    const { project } = await roomFor(db, actor, roomId, action);
    return { actor, projectId: project.id };
  } catch (error) {
    return failure(error);
  }
}

/** who → may they, for a scenario. */
async function mayOnScenario(scenarioId: string, action: ProjectAction): Promise<{ actor: Actor; roomId: string; projectId: string } | Failure> {
  const actor = await requireActor();
  try {
    const { room, project } = await scenarioFor(db, actor, scenarioId, action);
    return { actor, roomId: room.id, projectId: project.id };
  } catch (error) {
    return failure(error);
  }
}

const isFailure = (v: object): v is Failure => "ok" in v && v.ok === false;

function revalidateRoom(roomId: string, projectId: string) {
  revalidatePath(`/rooms/${roomId}`);
  revalidatePath(`/projects/${projectId}`);
}

// ---- surfaces and positions (room version)

/** Saves the six surfaces (finishes, custom α, openings). Input: `surfacesInputSchema`. */
export async function saveSurfacesAction(roomId: string, input: unknown): Promise<ActionResult<{ roomVersion: number }>> {
  const who = await mayOnRoom(roomId, "workspace.update");
  if (isFailure(who)) return who;
  const parsed = surfacesInputSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const { roomVersion } = await saveSurfaces(db, who.actor, roomId, parsed.data);
    revalidateRoom(roomId, who.projectId);
    return { roomVersion };
  });
}

/** Adds a seat or a source. Input: `positionInputSchema`. */
export async function addPositionAction(roomId: string, input: unknown): Promise<ActionResult<{ id: string; roomVersion: number }>> {
  const who = await mayOnRoom(roomId, "workspace.update");
  if (isFailure(who)) return who;
  const parsed = positionInputSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const { position, roomVersion } = await createPosition(db, who.actor, roomId, parsed.data);
    revalidateRoom(roomId, who.projectId);
    return { id: position.id, roomVersion };
  });
}

/** Changes any fields of a position. Input: `positionUpdateSchema`. */
export async function updatePositionAction(roomId: string, positionId: string, input: unknown): Promise<ActionResult<{ id: string; roomVersion: number }>> {
  const who = await mayOnRoom(roomId, "workspace.update");
  if (isFailure(who)) return who;
  const parsed = positionUpdateSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const { position, roomVersion } = await updatePosition(db, who.actor, roomId, positionId, parsed.data);
    revalidateRoom(roomId, who.projectId);
    return { id: position.id, roomVersion };
  });
}

/** Moves a position (the plan view's drag): one call with `{ xM, yM, zM, version }`. */
export async function movePositionAction(roomId: string, positionId: string, input: unknown): Promise<ActionResult<{ id: string; roomVersion: number }>> {
  const who = await mayOnRoom(roomId, "workspace.update");
  if (isFailure(who)) return who;
  const parsed = positionMoveSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const { position, roomVersion } = await updatePosition(db, who.actor, roomId, positionId, parsed.data);
    revalidatePath(`/rooms/${roomId}`);
    return { id: position.id, roomVersion };
  });
}

/** Renames a position: `{ name, version }`. */
export async function renamePositionAction(roomId: string, positionId: string, input: unknown): Promise<ActionResult<{ id: string; roomVersion: number }>> {
  const who = await mayOnRoom(roomId, "workspace.update");
  if (isFailure(who)) return who;
  const parsed = positionRenameSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const { position, roomVersion } = await updatePosition(db, who.actor, roomId, positionId, parsed.data);
    revalidatePath(`/rooms/${roomId}`);
    return { id: position.id, roomVersion };
  });
}

/** Deletes a position: `{ version }` (the room's). */
export async function deletePositionAction(roomId: string, positionId: string, input: unknown): Promise<ActionResult<{ id: string; roomVersion: number }>> {
  const who = await mayOnRoom(roomId, "workspace.update");
  if (isFailure(who)) return who;
  const parsed = versionSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const { roomVersion } = await deletePosition(db, who.actor, roomId, positionId, parsed.data.version);
    revalidateRoom(roomId, who.projectId);
    return { id: positionId, roomVersion };
  });
}

// ---- scenarios (scenario version)

type ScenarioRef = { id: string; version: number };

/** Creates a scenario of the room (empty, or a copy via `copyFromScenarioId`). Input: `scenarioInputSchema`. */
export async function createScenarioAction(roomId: string, input: unknown): Promise<ActionResult<ScenarioRef>> {
  const who = await mayOnRoom(roomId, "scenario.create");
  if (isFailure(who)) return who;
  const parsed = scenarioInputSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const s = await createScenario(db, who.actor, roomId, parsed.data);
    revalidatePath(`/rooms/${roomId}`);
    return { id: s.id, version: s.version };
  });
}

/** Duplicates a scenario with its items. Input: `{ name? }`. */
export async function duplicateScenarioAction(scenarioId: string, input: unknown): Promise<ActionResult<ScenarioRef>> {
  const who = await mayOnScenario(scenarioId, "scenario.create");
  if (isFailure(who)) return who;
  const parsed = scenarioDuplicateSchema.safeParse(input ?? {});
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const s = await duplicateScenario(db, who.actor, scenarioId, parsed.data);
    revalidatePath(`/rooms/${who.roomId}`);
    return { id: s.id, version: s.version };
  });
}

/** Changes a scenario's name, notes, target or archived state. Input: `scenarioUpdateSchema`. */
export async function updateScenarioAction(scenarioId: string, input: unknown): Promise<ActionResult<ScenarioRef>> {
  const who = await mayOnScenario(scenarioId, "scenario.update");
  if (isFailure(who)) return who;
  const parsed = scenarioUpdateSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const s = await updateScenario(db, who.actor, scenarioId, parsed.data);
    revalidatePath(`/rooms/${who.roomId}`);
    return { id: s.id, version: s.version };
  });
}

/** Renames a scenario: `{ name, version }`. */
export async function renameScenarioAction(scenarioId: string, input: unknown): Promise<ActionResult<ScenarioRef>> {
  const who = await mayOnScenario(scenarioId, "scenario.update");
  if (isFailure(who)) return who;
  const parsed = scenarioUpdateSchema.pick({ name: true, version: true }).required({ name: true }).safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const s = await updateScenario(db, who.actor, scenarioId, parsed.data);
    revalidatePath(`/rooms/${who.roomId}`);
    return { id: s.id, version: s.version };
  });
}

/** Archives (`archived: true`) or brings back a scenario: `{ archived, version }`; not the baseline. */
export async function archiveScenarioAction(scenarioId: string, input: unknown): Promise<ActionResult<ScenarioRef>> {
  const who = await mayOnScenario(scenarioId, "scenario.archive");
  if (isFailure(who)) return who;
  const parsed = scenarioUpdateSchema.pick({ archived: true, version: true }).required({ archived: true }).safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const s = await updateScenario(db, who.actor, scenarioId, parsed.data);
    revalidatePath(`/rooms/${who.roomId}`);
    return { id: s.id, version: s.version };
  });
}

// ---- treatment items (scenario version)

type ItemRef = { id: string; scenarioVersion: number };

/** Adds a treatment item to a scenario. Input: `treatmentItemInputSchema`. */
export async function addTreatmentItemAction(scenarioId: string, input: unknown): Promise<ActionResult<ItemRef>> {
  const who = await mayOnScenario(scenarioId, "treatment.update");
  if (isFailure(who)) return who;
  const parsed = treatmentItemInputSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const r = await addTreatmentItem(db, who.actor, scenarioId, parsed.data);
    revalidatePath(`/rooms/${who.roomId}`);
    return { id: r.item!.id, scenarioVersion: r.scenarioVersion };
  });
}

/** Changes a treatment item. Input: `treatmentItemUpdateSchema`. */
export async function updateTreatmentItemAction(scenarioId: string, itemId: string, input: unknown): Promise<ActionResult<ItemRef>> {
  const who = await mayOnScenario(scenarioId, "treatment.update");
  if (isFailure(who)) return who;
  const parsed = treatmentItemUpdateSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const r = await updateTreatmentItem(db, who.actor, scenarioId, itemId, parsed.data);
    revalidatePath(`/rooms/${who.roomId}`);
    return { id: itemId, scenarioVersion: r.scenarioVersion };
  });
}

/** Removes a treatment item: `{ version }` (the scenario's). */
export async function removeTreatmentItemAction(scenarioId: string, itemId: string, input: unknown): Promise<ActionResult<ItemRef>> {
  const who = await mayOnScenario(scenarioId, "treatment.update");
  if (isFailure(who)) return who;
  const parsed = scenarioVersionSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const r = await removeTreatmentItem(db, who.actor, scenarioId, itemId, parsed.data.version);
    revalidatePath(`/rooms/${who.roomId}`);
    return { id: itemId, scenarioVersion: r.scenarioVersion };
  });
}

// ---- the firm's build library

/** Saves a build to the library. Input: `buildInputSchema`. */
export async function saveBuildAction(input: unknown): Promise<ActionResult<{ id: string; version: number }>> {
  const actor = await requireActor();
  if (!canInFirm(actor, "library.manage")) return { ok: false, code: "forbidden", message: "Your role cannot change the build library." };
  const parsed = buildInputSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const b = await createBuild(db, actor, parsed.data);
    revalidatePath("/builds");
    return { id: b.id, version: b.version };
  });
}

/** Changes a library build. Input: `buildUpdateSchema`. */
export async function updateBuildAction(buildId: string, input: unknown): Promise<ActionResult<{ id: string; version: number }>> {
  const actor = await requireActor();
  try {
    await getBuild(db, actor, buildId);
  } catch (error) {
    return failure(error);
  }
  if (!canInFirm(actor, "library.manage")) return { ok: false, code: "forbidden", message: "Your role cannot change the build library." };
  const parsed = buildUpdateSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const b = await updateBuild(db, actor, buildId, parsed.data);
    revalidatePath("/builds");
    return { id: b.id, version: b.version };
  });
}

/** Deletes a library build (items made from it keep their own copy). */
export async function deleteBuildAction(buildId: string): Promise<ActionResult> {
  const actor = await requireActor();
  if (!canInFirm(actor, "library.manage")) return { ok: false, code: "forbidden", message: "Your role cannot change the build library." };
  return run(async () => {
    await deleteBuild(db, actor, buildId);
    revalidatePath("/builds");
    return { id: buildId };
  });
}
