"use server";

import { revalidatePath } from "next/cache";
import type { ActionResult } from "@/app/(app)/projects/actions";
import { db } from "@/db/client";
import { saveDraft, updateReportSettings } from "@/db/queries/reports";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { issueRevision, sendRevision } from "@/lib/report/delivery";
import { checkDraftScenarios } from "@/lib/report/draft";
import { reportDraftSchema, reportSendSchema, reportSettingsSchema } from "@/lib/report/schemas";

async function run<T>(work: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await work() };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}

export async function saveReportDraftAction(input: unknown): Promise<ActionResult<{ revisionId: string }>> {
  const actor = await requireActor();
  const parsed = reportDraftSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  return run(async () => {
    await checkDraftScenarios(db, actor, parsed.data.roomId, parsed.data.scenarioIds);
    const revision = await saveDraft(db, actor, parsed.data.roomId, parsed.data);
    revalidatePath(`/rooms/${parsed.data.roomId}/report`);
    return { revisionId: revision.id };
  });
}

export async function issueReportAction(roomId: string, revisionId: string): Promise<ActionResult<{ revisionId: string; renderMs: number; signMs: number }>> {
  const actor = await requireActor();
  return run(async () => {
    const { revision, renderMs, signMs } = await issueRevision(db, actor, revisionId);
    revalidatePath(`/rooms/${roomId}/report`);
    return { revisionId: revision.id, renderMs, signMs };
  });
}

export async function sendReportAction(roomId: string, revisionId: string, input: unknown): Promise<ActionResult<{ to: string; invited: boolean; attached: boolean }>> {
  const actor = await requireActor();
  const parsed = reportSendSchema.safeParse(input ?? {});
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  return run(async () => {
    const recipient = parsed.data.email && parsed.data.name ? { email: parsed.data.email, name: parsed.data.name } : undefined;
    const sent = await sendRevision(db, actor, revisionId, recipient);
    revalidatePath(`/rooms/${roomId}/report`);
    return sent;
  });
}

export async function reportSettingsAction(roomId: string, input: unknown): Promise<ActionResult<{ attachPdf: boolean }>> {
  const actor = await requireActor();
  if (!canInFirm(actor, "report.settings")) return { ok: false, code: "forbidden", message: "Only the firm's owner changes delivery settings." };
  const parsed = reportSettingsSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  return run(async () => {
    const s = await updateReportSettings(db, actor.firmId, parsed.data);
    revalidatePath(`/rooms/${roomId}/report`);
    return { attachPdf: s.attachPdf };
  });
}
