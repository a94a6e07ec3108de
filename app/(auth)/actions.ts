"use server";

import { redirect } from "next/navigation";
import { db } from "@/db/client";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { checkSignIn, requestPasswordReset, setPasswordWithToken } from "@/lib/auth/flows";
import { requestAddress } from "@/lib/auth/request-address";
import { endSession, startSession } from "@/lib/auth/session";
import { acceptInviteSchema } from "@/lib/schemas/member";
import { resetPasswordSchema, resetRequestSchema, signInSchema } from "@/lib/schemas/password";

export type FormState = { message?: string; fields?: Record<string, string[]>; done?: boolean };

const entries = (form: FormData) => Object.fromEntries([...form.entries()].filter(([, v]) => typeof v === "string"));

/** Only same-site paths may follow a sign-in (no open redirect). */
function safeNext(next: unknown): string {
  return typeof next === "string" && next.startsWith("/") && !next.startsWith("//") ? next : "/projects";
}

export async function signInAction(_prev: FormState, form: FormData): Promise<FormState> {
  const parsed = signInSchema.safeParse(entries(form));
  if (!parsed.success) return { fields: fieldErrors(parsed.error) };
  const result = await checkSignIn(db, parsed.data.email, parsed.data.password, await requestAddress());
  if (!result.ok) return { message: result.message };
  await startSession(result.userId);
  redirect(safeNext(form.get("next")));
}

export async function signOutAction(): Promise<void> {
  await endSession();
  redirect("/sign-in");
}

export async function requestResetAction(_prev: FormState, form: FormData): Promise<FormState> {
  const parsed = resetRequestSchema.safeParse(entries(form));
  if (!parsed.success) return { fields: fieldErrors(parsed.error) };
  await requestPasswordReset(db, parsed.data.email);
  return { done: true, message: "If an account uses that address, a link to choose a new password is on its way. It expires in an hour." };
}

async function setPassword(form: FormData, purpose: "password-reset" | "invitation"): Promise<FormState> {
  const schema = purpose === "invitation" ? acceptInviteSchema : resetPasswordSchema;
  const parsed = schema.safeParse(entries(form));
  if (!parsed.success) return { fields: fieldErrors(parsed.error) };
  if (form.get("confirm") !== parsed.data.password) return { fields: { confirm: ["The two passwords differ"] } };
  try {
    const userId = await setPasswordWithToken(db, parsed.data.token, purpose, parsed.data.password);
    await startSession(userId);
  } catch (error) {
    if (error instanceof AppError) return { message: error.message };
    throw error;
  }
  redirect("/projects");
}

export async function resetPasswordAction(_prev: FormState, form: FormData): Promise<FormState> {
  return setPassword(form, "password-reset");
}

export async function acceptInviteAction(_prev: FormState, form: FormData): Promise<FormState> {
  return setPassword(form, "invitation");
}
