import "server-only";
import { createHash } from "node:crypto";
import { sql, type Kysely, type Transaction } from "kysely";
import type { Database } from "@/db/schema";
import { newToken } from "./ids";

type Db = Kysely<Database> | Transaction<Database>;
export type TokenPurpose = "password-reset" | "invitation";

const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");

/** Issues a one-time token; only its hash is stored, so a database leak gives no usable links. */
export async function issueToken(db: Db, userId: string, purpose: TokenPurpose, validMinutes: number): Promise<string> {
  const token = newToken();
  // A new link replaces any earlier unused one of the same purpose.
  await db.deleteFrom("auth_tokens").where("user_id", "=", userId).where("purpose", "=", purpose).where("used_at", "is", null).execute();
  await db
    .insertInto("auth_tokens")
    .values({ token_hash: sha256(token), purpose, user_id: userId, expires_at: new Date(Date.now() + validMinutes * 60_000) })
    .execute();
  return token;
}

/** Marks the token used and returns its user, or undefined when unknown, used or expired. */
export async function consumeToken(db: Db, token: string, purpose: TokenPurpose): Promise<string | undefined> {
  const row = await db
    .updateTable("auth_tokens")
    .set({ used_at: sql`now()` })
    .where("token_hash", "=", sha256(token))
    .where("purpose", "=", purpose)
    .where("used_at", "is", null)
    .where("expires_at", ">", sql<Date>`now()`)
    .returning("user_id")
    .executeTakeFirst();
  return row?.user_id;
}

/** Whether a token is still usable (for showing the form), without using it. */
export async function peekToken(db: Db, token: string, purpose: TokenPurpose): Promise<{ userId: string; email: string; name: string } | undefined> {
  return db
    .selectFrom("auth_tokens as t")
    .innerJoin("users as u", "u.id", "t.user_id")
    .select(["t.user_id as userId", "u.email", "u.name"])
    .where("t.token_hash", "=", sha256(token))
    .where("t.purpose", "=", purpose)
    .where("t.used_at", "is", null)
    .where("t.expires_at", ">", sql<Date>`now()`)
    .executeTakeFirst();
}
