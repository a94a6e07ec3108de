"use server";

import { revalidatePath } from "next/cache";
import { db } from "@/db/client";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { inviteMember } from "@/lib/auth/flows";
import { updateMember } from "@/lib/auth/members";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { inviteSchema, memberUpdateSchema } from "@/lib/schemas/member";
import type { ActionResult } from "../projects/actions";

export async function inviteMemberAction(input: unknown): Promise<ActionResult<{ userId: string }>> {
  const actor = await requireActor();
  if (!canInFirm(actor, "member.manage")) return { ok: false, code: "forbidden", message: "Only the firm's owners invite members." };
  const parsed = inviteSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  try {
    const result = await inviteMember(db, actor, parsed.data);
    revalidatePath("/members");
    return { ok: true, data: result };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}

export async function updateMemberAction(userId: string, input: unknown): Promise<ActionResult<{ userId: string }>> {
  const actor = await requireActor();
  const parsed = memberUpdateSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  try {
    await updateMember(db, actor, userId, parsed.data);
    revalidatePath("/members");
    return { ok: true, data: { userId } };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}
