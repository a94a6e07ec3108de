"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { db } from "@/db/client";
import { requireActor } from "@/lib/auth/session";

const unitSchema = z.enum(["metric", "imperial"]);

/** Each user chooses how lengths are shown to them; storage stays in metres. */
export async function setUnitSystemAction(unitSystem: "metric" | "imperial"): Promise<void> {
  const actor = await requireActor();
  const parsed = unitSchema.parse(unitSystem);
  await db.updateTable("users").set({ unit_system: parsed }).where("id", "=", actor.userId).execute();
  revalidatePath("/", "layout");
}
