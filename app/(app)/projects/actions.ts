"use server";

import { revalidatePath } from "next/cache";
import { db } from "@/db/client";
import { createProject, deleteProject, updateProject } from "@/db/queries/projects";
import { createRoom, deleteRoom, updateRoom } from "@/db/queries/rooms";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { projectInputSchema, projectUpdateSchema } from "@/lib/schemas/project";
import { roomInputSchema, roomUpdateSchema } from "@/lib/schemas/room";

/** What every server action here returns: a value for the form, never a thrown expected error. */
export type ActionResult<T = { id: string }> =
  | { ok: true; data: T }
  | { ok: false; code: AppError["code"]; message: string; fields?: Record<string, string[]> };

async function run<T>(work: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await work() };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}

function invalid(error: import("zod").ZodError): ActionResult<never> {
  return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(error) };
}

export async function createProjectAction(input: unknown): Promise<ActionResult> {
  const actor = await requireActor();
  if (!canInFirm(actor, "project.create")) return { ok: false, code: "forbidden", message: "Your role cannot create projects." };
  const parsed = projectInputSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const project = await createProject(db, actor, parsed.data);
    revalidatePath("/projects");
    return { id: project.id };
  });
}

export async function updateProjectAction(projectId: string, input: unknown): Promise<ActionResult> {
  const actor = await requireActor();
  const parsed = projectUpdateSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const project = await updateProject(db, actor, projectId, parsed.data);
    revalidatePath("/projects");
    revalidatePath(`/projects/${projectId}`);
    return { id: project.id };
  });
}

export async function deleteProjectAction(projectId: string): Promise<ActionResult> {
  const actor = await requireActor();
  return run(async () => {
    await deleteProject(db, actor, projectId);
    revalidatePath("/projects");
    return { id: projectId };
  });
}

export async function createRoomAction(projectId: string, input: unknown): Promise<ActionResult> {
  const actor = await requireActor();
  const parsed = roomInputSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const room = await createRoom(db, actor, projectId, parsed.data);
    revalidatePath(`/projects/${projectId}`);
    return { id: room.id };
  });
}

export async function updateRoomAction(roomId: string, input: unknown): Promise<ActionResult> {
  const actor = await requireActor();
  const parsed = roomUpdateSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error);
  return run(async () => {
    const room = await updateRoom(db, actor, roomId, parsed.data);
    revalidatePath(`/projects/${room.projectId}`);
    revalidatePath(`/rooms/${roomId}`);
    return { id: room.id };
  });
}

export async function deleteRoomAction(roomId: string, projectId: string): Promise<ActionResult> {
  const actor = await requireActor();
  return run(async () => {
    await deleteRoom(db, actor, roomId);
    revalidatePath(`/projects/${projectId}`);
    return { id: roomId };
  });
}
