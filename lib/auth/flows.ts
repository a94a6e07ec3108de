import "server-only";
import type { Kysely } from "kysely";
import { findUserByEmail, firmName } from "@/db/queries/users";
import type { Database, Role } from "@/db/schema";
import { AppError } from "@/lib/api/errors";
import { sendMail } from "@/lib/email/mailer";
import { invitationMail, passwordResetMail } from "@/lib/email/templates";
import { serverEnv } from "@/lib/env";
import { ROLE_LABEL } from "@/lib/schemas/member";
import type { Actor } from "./actor";
import { newUserId } from "./ids";
import { lucia } from "./lucia";
import { hashPassword, verifyPassword } from "./passwords";
import { checkLoginRate, recordLoginAttempt } from "./rate-limit";
import { consumeToken, issueToken } from "./tokens";

export const RESET_VALID_MINUTES = 60;
export const INVITE_VALID_DAYS = 7;

export type SignInResult = { ok: true; userId: string } | { ok: false; message: string };

/** Checks e-mail and password under the rate limit; the caller starts the session. */
export async function checkSignIn(db: Kysely<Database>, email: string, password: string, address: string): Promise<SignInResult> {
  const keys = { account: `account:${email.toLowerCase()}`, address: `address:${address}` };
  const rate = await checkLoginRate(db, keys);
  if (!rate.allowed) {
    const minutes = Math.ceil(rate.retryAfterSeconds / 60);
    return { ok: false, message: `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}, or reset your password.` };
  }
  const user = await findUserByEmail(db, email);
  const good = await verifyPassword(user?.password_hash ?? null, password);
  await recordLoginAttempt(db, keys, good && !!user?.active);
  if (!user || !good) return { ok: false, message: "That e-mail and password do not match an account." };
  if (!user.active) return { ok: false, message: "This account has been deactivated. Ask your firm's owner." };
  return { ok: true, userId: user.id };
}

/** Sends a reset link when the account exists; says nothing either way (no account probing). */
export async function requestPasswordReset(db: Kysely<Database>, email: string): Promise<void> {
  const user = await findUserByEmail(db, email);
  if (!user || !user.active || user.password_hash === null) return;
  const token = await issueToken(db, user.id, "password-reset", RESET_VALID_MINUTES);
  const url = `${serverEnv().APP_URL}/reset-password?token=${encodeURIComponent(token)}`;
  const firm = await firmName(db, user.firm_id);
  await sendMail({ to: user.email, fromName: firm, ...passwordResetMail({ firmName: firm, name: user.name, url, validMinutes: RESET_VALID_MINUTES }) });
}

/** Sets a new password from a reset or invitation token; ends every other session of the user. */
export async function setPasswordWithToken(db: Kysely<Database>, token: string, purpose: "password-reset" | "invitation", password: string): Promise<string> {
  const passwordHash = await hashPassword(password);
  const userId = await db.transaction().execute(async (trx) => {
    const id = await consumeToken(trx, token, purpose);
    if (!id) return undefined;
    await trx.updateTable("users").set({ password_hash: passwordHash }).where("id", "=", id).execute();
    return id;
  });
  if (!userId) throw new AppError("bad_request", "This link has expired or was already used. Ask for a new one.", { token: ["expired or used"] });
  await lucia.invalidateUserSessions(userId);
  return userId;
}

/** Creates (or re-invites) a member of the actor's firm and e-mails the link that sets the password. */
export async function inviteMember(db: Kysely<Database>, actor: Actor, input: { email: string; name: string; role: Role }): Promise<{ userId: string }> {
  const existing = await findUserByEmail(db, input.email);
  if (existing && (existing.firm_id !== actor.firmId || existing.password_hash !== null)) {
    throw new AppError("conflict", "An account with this e-mail address already exists.", { email: ["already has an account"] });
  }
  const { userId, token } = await db.transaction().execute(async (trx) => {
    const id = existing?.id ?? newUserId();
    if (existing) {
      await trx.updateTable("users").set({ name: input.name, role: input.role, active: true }).where("id", "=", id).execute();
    } else {
      await trx.insertInto("users").values({ id, firm_id: actor.firmId, email: input.email, name: input.name, role: input.role, password_hash: null }).execute();
    }
    return { userId: id, token: await issueToken(trx, id, "invitation", INVITE_VALID_DAYS * 24 * 60) };
  });
  const firm = await firmName(db, actor.firmId);
  const url = `${serverEnv().APP_URL}/accept-invite?token=${encodeURIComponent(token)}`;
  await sendMail({
    to: input.email,
    fromName: firm,
    replyTo: actor.email,
    ...invitationMail({ firmName: firm, inviterName: actor.name, name: input.name, roleLabel: ROLE_LABEL[input.role], url, validDays: INVITE_VALID_DAYS }),
  });
  return { userId };
}
