"use server";

// Server action of the price-list settings page (owner). who → may they → zod → query → revalidate →
// typed result.

import { revalidatePath } from "next/cache";
import { priceListInputSchema } from "@/lib/schemas/build-sheet";
import { db } from "@/db/client";
import { savePriceList } from "@/db/queries/price-lists";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import type { ActionResult } from "../../projects/actions";

/** Saves the firm's price list. Input: `priceListInputSchema` (with the version read). */
export async function savePriceListAction(input: unknown): Promise<ActionResult<{ version: number }>> {
  const actor = await requireActor();
  if (!canInFirm(actor, "price-list.manage")) return { ok: false, code: "forbidden", message: "Only the firm's owner sets the price list." };
  const parsed = priceListInputSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  try {
    const saved = await savePriceList(db, actor, parsed.data);
    revalidatePath("/settings/prices");
    return { ok: true, data: { version: saved.version } };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}
