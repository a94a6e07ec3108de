"use server";

import { revalidatePath } from "next/cache";
import { db } from "@/db/client";
import { saveFeeSettings } from "@/db/queries/invoices";
import { fieldErrors } from "@/lib/api/zod-fields";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { formatMoney, toMinorUnits } from "@/lib/payments/money";
import { feeSettingsSchema } from "@/lib/payments/schemas";
import type { ActionResult } from "../../projects/actions";

/** Saves the firm's engineering fee and the download setting (owners only). */
export async function saveFeeSettingsAction(input: unknown): Promise<ActionResult<{ summary: string }>> {
  const actor = await requireActor();
  if (!canInFirm(actor, "fee.manage")) return { ok: false, code: "forbidden", message: "Only the firm's owners set the fee." };
  const parsed = feeSettingsSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  const { basis, amount, currency, downloadsWaitForPayment } = parsed.data;
  const saved = await saveFeeSettings(db, actor.firmId, actor.userId, { basis, amountMinor: toMinorUnits(amount), currency, downloadsWaitForPayment });
  revalidatePath("/settings/fees");
  return { ok: true, data: { summary: `${formatMoney(saved.amountMinor, saved.currency)} ${saved.basis === "per-report" ? "per report" : "per project"}` } };
}
