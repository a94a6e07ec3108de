"use server";

import { revalidatePath } from "next/cache";
import type { ActionResult } from "@/app/(app)/projects/actions";
import { db } from "@/db/client";
import { approveRevision } from "@/db/queries/reports";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { requireActor } from "@/lib/auth/session";
import { postComment } from "@/lib/report/comments";
import { reportApproveSchema, reportCommentSchema } from "@/lib/report/schemas";

async function run<T>(work: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await work() };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}

export async function approveReportAction(projectId: string, revisionId: string, input: unknown): Promise<ActionResult<{ approvedAt: string }>> {
  const actor = await requireActor();
  const parsed = reportApproveSchema.safeParse(input ?? {});
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  return run(async () => {
    const { approval } = await approveRevision(db, actor, revisionId, parsed.data.note);
    revalidatePath(`/projects/${projectId}/reports`);
    revalidatePath(`/projects/${projectId}`);
    return { approvedAt: approval.approvedAt.toISOString() };
  });
}

export async function postReportCommentAction(projectId: string, reportId: string, input: unknown): Promise<ActionResult<{ id: string }>> {
  const actor = await requireActor();
  const parsed = reportCommentSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  return run(async () => {
    const c = await postComment(db, actor, reportId, parsed.data.body);
    revalidatePath(`/projects/${projectId}/reports`);
    return { id: c.id };
  });
}
