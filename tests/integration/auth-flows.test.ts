// Sign-in, rate limiting, password reset and invitations through the real database and the fake
// SMTP server that `npm test` starts (messages land in dev_outbox).
import { sql } from "kysely";
import { beforeAll, describe, expect, it } from "vitest";
import { acceptInviteAction, requestResetAction, resetPasswordAction, signInAction } from "@/app/(auth)/actions";
import { inviteMemberAction } from "@/app/(app)/members/actions";
import { lucia } from "@/lib/auth/lucia";
import { LOGIN_LIMITS } from "@/lib/auth/rate-limit";
import { actAs, currentCookie, runAction, setRequestHeader } from "../support/act-as";
import { resetTables, testDb } from "./support/db";

const form = (o: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(o)) f.set(k, v);
  return f;
};

async function latestMailTo(address: string, after: number): Promise<{ subject: string | null; text_body: string | null }> {
  for (let i = 0; i < 50; i++) {
    const row = await testDb().selectFrom("dev_outbox").select(["id", "subject", "text_body"]).where(sql<boolean>`${address} = any(envelope_to)`).where("id", ">", after).orderBy("id", "desc").executeTakeFirst();
    if (row) return row;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no message to ${address} arrived in the outbox`);
}
const lastOutboxId = async () => Number((await testDb().selectFrom("dev_outbox").select(sql<number>`coalesce(max(id), 0)`.as("m")).executeTakeFirstOrThrow()).m);
const tokenIn = (text: string | null, path: string) => new URL(text!.match(new RegExp(`https?://\\S+${path}\\?token=\\S+`))![0]).searchParams.get("token")!;

beforeAll(async () => {
  await resetTables();
  setRequestHeader("x-forwarded-for", "203.0.113.7");
});

describe("signInAction", () => {
  it("signs in with the demo password and sets a session cookie", async () => {
    await actAs("anonymous");
    const r = await runAction(() => signInAction({}, form({ email: "Engineer@Larchmere.example", password: "demo-engineer-pass" })));
    expect(r).toEqual({ redirect: "/projects" });
    const sessionId = currentCookie(lucia.sessionCookieName);
    expect(sessionId).toBeTruthy();
    const { user } = await lucia.validateSession(sessionId!);
    expect(user?.role).toBe("engineer");
  });

  it("refuses a wrong password with one message that does not reveal whether the account exists", async () => {
    await actAs("anonymous");
    const wrong = await runAction(() => signInAction({}, form({ email: "owner@larchmere.example", password: "nope-nope-nope" })));
    const unknown = await runAction(() => signInAction({}, form({ email: "nobody@larchmere.example", password: "nope-nope-nope" })));
    expect(wrong).toEqual({ message: "That e-mail and password do not match an account." });
    expect(unknown).toEqual(wrong);
  });

  it("never redirects off-site after sign-in", async () => {
    await actAs("anonymous");
    const r = await runAction(() => signInAction({}, form({ email: "builder@larchmere.example", password: "demo-builder-pass", next: "//evil.example/x" })));
    expect(r).toEqual({ redirect: "/projects" });
  });

  it(`locks an account after ${LOGIN_LIMITS.perAccount} failures, even with the right password, and records it in PostgreSQL`, async () => {
    await actAs("anonymous");
    for (let i = 0; i < LOGIN_LIMITS.perAccount; i++) await runAction(() => signInAction({}, form({ email: "client2@larchmere.example", password: `wrong-${i}-xxxxx` })));
    const r = (await runAction(() => signInAction({}, form({ email: "client2@larchmere.example", password: "demo-client2-pass" })))) as { message: string };
    expect(r.message).toMatch(/Too many failed sign-ins/);
    const failures = await testDb().selectFrom("login_attempts").select(testDb().fn.countAll().as("n")).where("key", "=", "account:client2@larchmere.example").where("succeeded", "=", false).executeTakeFirstOrThrow();
    expect(Number(failures.n)).toBe(LOGIN_LIMITS.perAccount);
  });

  it("answers missing fields with field messages", async () => {
    const r = await runAction(() => signInAction({}, form({ email: "", password: "" })));
    expect((r as { fields: Record<string, string[]> }).fields.email?.[0]).toMatch(/e-mail/);
  });
});

describe("password reset by e-mailed link", () => {
  it("e-mails a one-time link that sets a new password and ends old sessions", async () => {
    await actAs("client");
    const oldSession = currentCookie(lucia.sessionCookieName)!;
    await actAs("anonymous");
    const after = await lastOutboxId();
    const r = await requestResetAction({}, form({ email: "client@larchmere.example" }));
    expect(r.done).toBe(true);
    const mail = await latestMailTo("client@larchmere.example", after);
    expect(mail.subject).toBe("Reset your Eigenroom password");
    const token = tokenIn(mail.text_body, "/reset-password");

    const short = await runAction(() => resetPasswordAction({}, form({ token, password: "short", confirm: "short" })));
    expect((short as { fields: Record<string, string[]> }).fields.password?.[0]).toMatch(/10 characters/);

    const done = await runAction(() => resetPasswordAction({}, form({ token, password: "a-brand-new-pass", confirm: "a-brand-new-pass" })));
    expect(done).toEqual({ redirect: "/projects" });
    expect((await lucia.validateSession(oldSession)).session).toBeNull();

    const again = await runAction(() => resetPasswordAction({}, form({ token, password: "another-new-pass", confirm: "another-new-pass" })));
    expect((again as { message: string }).message).toMatch(/expired or was already used/);

    await actAs("anonymous");
    expect(await runAction(() => signInAction({}, form({ email: "client@larchmere.example", password: "a-brand-new-pass" })))).toEqual({ redirect: "/projects" });
  });

  it("says the same thing for an unknown address and sends nothing", async () => {
    const after = await lastOutboxId();
    const r = await requestResetAction({}, form({ email: "nobody@larchmere.example" }));
    expect(r.done).toBe(true);
    await new Promise((res) => setTimeout(res, 300));
    expect(await lastOutboxId()).toBe(after);
  });
});

describe("invitations", () => {
  it("an owner's invitation e-mails a link that sets the password and signs the person in with their role", async () => {
    await actAs("owner");
    const after = await lastOutboxId();
    const invited = await inviteMemberAction({ email: "new.engineer@invented.example", name: "Mira Castell", role: "engineer" });
    expect(invited.ok).toBe(true);
    const mail = await latestMailTo("new.engineer@invented.example", after);
    expect(mail.subject).toContain("invites you to Eigenroom");
    const token = tokenIn(mail.text_body, "/accept-invite");
    await actAs("anonymous");
    const r = await runAction(() => acceptInviteAction({}, form({ token, password: "mira-sets-this-1", confirm: "mira-sets-this-1" })));
    expect(r).toEqual({ redirect: "/projects" });
    const { user } = await lucia.validateSession(currentCookie(lucia.sessionCookieName)!);
    expect(user).toMatchObject({ email: "new.engineer@invented.example", role: "engineer" });
  });

  it("refuses to invite an address that already has an account", async () => {
    await actAs("owner");
    const r = await inviteMemberAction({ email: "engineer@larchmere.example", name: "Dup", role: "builder" });
    expect(r).toMatchObject({ ok: false, code: "conflict" });
  });
});
