import { DEMO_ACCOUNTS } from "@/db/seed-data";
import { lucia } from "@/lib/auth/lucia";
import { testDb } from "../integration/support/db";

type Store = { cookies: Map<string, string>; headers: Map<string, string> };
const request = () => (globalThis as unknown as { __eigenroomRequest: Store }).__eigenroomRequest;

export type DemoWho = "owner" | "engineer" | "builder" | "client" | "client2" | "anonymous";

const EMAIL: Record<Exclude<DemoWho, "anonymous">, string> = {
  owner: DEMO_ACCOUNTS[0]!.email,
  engineer: DEMO_ACCOUNTS[1]!.email,
  builder: DEMO_ACCOUNTS[2]!.email,
  client: DEMO_ACCOUNTS[3]!.email,
  client2: DEMO_ACCOUNTS[4]!.email,
};

export async function userIdOf(who: Exclude<DemoWho, "anonymous">): Promise<string> {
  const row = await testDb().selectFrom("users").select("id").where("email", "=", EMAIL[who]).executeTakeFirstOrThrow();
  return row.id;
}

/** Makes the next calls run as this demo user (a real lucia session in the test database). */
export async function actAs(who: DemoWho): Promise<void> {
  request().cookies.clear();
  if (who === "anonymous") return;
  const session = await lucia.createSession(await userIdOf(who), {});
  request().cookies.set(lucia.sessionCookieName, session.id);
}

export function setRequestHeader(name: string, value: string): void {
  request().headers.set(name, value);
}

export function currentCookie(name: string): string | undefined {
  return request().cookies.get(name);
}

type Handler<P> = (req: Request, ctx: { params: Promise<P> }) => Promise<Response>;

/** Calls a route handler the way Next would, with a JSON body when given. */
export async function callRoute<P extends object>(handler: Handler<P>, opts: { method?: string; body?: unknown; rawBody?: string; params?: P; contentType?: string } = {}): Promise<{ status: number; json: any }> {
  const body = opts.rawBody ?? (opts.body === undefined ? undefined : JSON.stringify(opts.body));
  const req = new Request("http://eigenroom.test/api/v1/x", {
    method: opts.method ?? (body === undefined ? "GET" : "POST"),
    headers: body === undefined ? {} : { "content-type": opts.contentType ?? "application/json" },
    body,
  });
  const res = await handler(req, { params: Promise.resolve((opts.params ?? {}) as P) });
  const text = await res.text();
  return { status: res.status, json: text ? JSON.parse(text) : null };
}

/** Runs a server action; a Next redirect comes back as { redirect: url } instead of throwing. */
export async function runAction<T>(fn: () => Promise<T>): Promise<T | { redirect: string }> {
  try {
    return await fn();
  } catch (error) {
    const digest = (error as { digest?: string }).digest;
    if (typeof digest === "string" && digest.startsWith("NEXT_REDIRECT")) return { redirect: digest.split(";")[2] ?? "" };
    throw error;
  }
}
