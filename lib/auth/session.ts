import "server-only";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import type { Actor } from "./actor";
import { lucia } from "./lucia";

/**
 * The signed-in actor for this request, or null. Renews the session cookie when lucia extends the
 * session; server components cannot set cookies, so there the renewal waits for the next action.
 */
export const getActor = cache(async (): Promise<Actor | null> => {
  const store = await cookies();
  const sessionId = store.get(lucia.sessionCookieName)?.value ?? null;
  if (!sessionId) return null;
  const { user, session } = await lucia.validateSession(sessionId);
  try {
    if (session?.fresh) {
      const c = lucia.createSessionCookie(session.id);
      store.set(c.name, c.value, c.attributes);
    }
    if (!session) {
      const c = lucia.createBlankSessionCookie();
      store.set(c.name, c.value, c.attributes);
    }
  } catch {
    // Rendering a server component: cookies are read-only here.
  }
  if (!user || !user.active) return null;
  return { userId: user.id, firmId: user.firmId, role: user.role, email: user.email, name: user.name, unitSystem: user.unitSystem };
});

/** The actor for a page or action that needs one; otherwise off to the sign-in page. */
export async function requireActor(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  return actor;
}

/** Starts a session for the user and sets its cookie (server actions and route handlers only). */
export async function startSession(userId: string): Promise<void> {
  const session = await lucia.createSession(userId, {});
  const c = lucia.createSessionCookie(session.id);
  (await cookies()).set(c.name, c.value, c.attributes);
}

/** Ends the current session and clears its cookie. */
export async function endSession(): Promise<void> {
  const store = await cookies();
  const sessionId = store.get(lucia.sessionCookieName)?.value;
  if (sessionId) await lucia.invalidateSession(sessionId);
  const c = lucia.createBlankSessionCookie();
  store.set(c.name, c.value, c.attributes);
}
