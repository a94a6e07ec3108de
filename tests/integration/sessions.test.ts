// Session expiry and renewal (lucia v3 with sessions in PostgreSQL): a session in the second half of
// its 14 days is renewed ("fresh") on use, an expired one is gone, sign-out ends it.
import { sql } from "kysely";
import { beforeAll, describe, expect, it } from "vitest";
import { signOutAction } from "@/app/(auth)/actions";
import { lucia } from "@/lib/auth/lucia";
import { getActor } from "@/lib/auth/session";
import { actAs, currentCookie, runAction, userIdOf } from "../support/act-as";
import { resetTables, testDb } from "./support/db";

const DAY = 24 * 60 * 60 * 1000;

beforeAll(() => resetTables());

describe("lucia sessions", () => {
  it("a new session lasts 14 days and is not renewed on its first use", async () => {
    const s = await lucia.createSession(await userIdOf("engineer"), {});
    expect(s.expiresAt.getTime() - Date.now()).toBeGreaterThan(13.9 * DAY);
    const { session } = await lucia.validateSession(s.id);
    expect(session?.fresh).toBe(false);
  });

  it("a session used in the second half of its life is extended back to 14 days", async () => {
    const s = await lucia.createSession(await userIdOf("engineer"), {});
    await testDb().updateTable("user_sessions").set({ expires_at: new Date(Date.now() + 3 * DAY) }).where("id", "=", s.id).execute();
    const { session } = await lucia.validateSession(s.id);
    expect(session?.fresh).toBe(true);
    const row = await testDb().selectFrom("user_sessions").select("expires_at").where("id", "=", s.id).executeTakeFirstOrThrow();
    expect(new Date(row.expires_at).getTime() - Date.now()).toBeGreaterThan(13.9 * DAY);
  });

  it("an expired session signs nobody in and is deleted", async () => {
    await actAs("client");
    const id = currentCookie(lucia.sessionCookieName)!;
    await testDb().updateTable("user_sessions").set({ expires_at: sql<Date>`now() - interval '1 minute'` }).where("id", "=", id).execute();
    expect(await getActor()).toBeNull();
    expect(await testDb().selectFrom("user_sessions").select("id").where("id", "=", id).executeTakeFirst()).toBeUndefined();
  });

  it("sign-out ends the session in the database and clears the cookie", async () => {
    await actAs("builder");
    const id = currentCookie(lucia.sessionCookieName)!;
    expect(await runAction(() => signOutAction())).toEqual({ redirect: "/sign-in" });
    expect(currentCookie(lucia.sessionCookieName)).toBeUndefined();
    expect((await lucia.validateSession(id)).session).toBeNull();
  });

  it("a deactivated member's sessions stop working at once", async () => {
    await actAs("builder");
    const builder = await userIdOf("builder");
    await testDb().updateTable("users").set({ active: false }).where("id", "=", builder).execute();
    expect(await getActor()).toBeNull();
    await testDb().updateTable("users").set({ active: true }).where("id", "=", builder).execute();
  });
});
