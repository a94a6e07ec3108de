import "server-only";
import { sql, type Kysely } from "kysely";
import type { Database } from "@/db/schema";

/** Failed sign-ins allowed per key in the window before further attempts are refused. */
export const LOGIN_LIMITS = { windowMinutes: 15, perAccount: 5, perAddress: 30 } as const;

export interface RateDecision {
  allowed: boolean;
  retryAfterSeconds: number;
}

/** Counts failed attempts for each key within the window; refuses when any key is over its limit. */
export async function checkLoginRate(db: Kysely<Database>, keys: { account: string; address: string }): Promise<RateDecision> {
  const since = sql<Date>`now() - make_interval(mins => ${LOGIN_LIMITS.windowMinutes})`;
  const rows = await db
    .selectFrom("login_attempts")
    .select(["key", db.fn.countAll<number>().as("failures"), db.fn.min("attempted_at").as("oldest")])
    .where("key", "in", [keys.account, keys.address])
    .where("succeeded", "=", false)
    .where("attempted_at", ">", since)
    .groupBy("key")
    .execute();
  for (const row of rows) {
    const limit = row.key === keys.account ? LOGIN_LIMITS.perAccount : LOGIN_LIMITS.perAddress;
    if (Number(row.failures) >= limit) {
      const oldest = new Date(row.oldest as unknown as string).getTime();
      const retry = Math.max(1, Math.ceil((oldest + LOGIN_LIMITS.windowMinutes * 60_000 - Date.now()) / 1000));
      return { allowed: false, retryAfterSeconds: retry };
    }
  }
  return { allowed: true, retryAfterSeconds: 0 };
}

export async function recordLoginAttempt(db: Kysely<Database>, keys: { account: string; address: string }, succeeded: boolean): Promise<void> {
  await db
    .insertInto("login_attempts")
    .values([
      { key: keys.account, succeeded },
      { key: keys.address, succeeded },
    ])
    .execute();
  if (succeeded) {
    // A successful sign-in clears the account's failures (not the address's).
    await db.deleteFrom("login_attempts").where("key", "=", keys.account).where("succeeded", "=", false).execute();
  }
}
