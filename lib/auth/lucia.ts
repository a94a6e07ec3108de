import "server-only";
import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { Lucia, TimeSpan } from "lucia";
import { pool } from "@/db/client";
import type { Role, UnitSystem } from "@/db/schema";
import { serverEnv } from "@/lib/env";

export const SESSION_COOKIE = "eigenroom_session";

const adapter = new NodePostgresAdapter(pool, { user: "users", session: "user_sessions" });

// Sessions last 14 days; lucia renews ("fresh") a session used in the second half of its life.
export const lucia = new Lucia(adapter, {
  sessionExpiresIn: new TimeSpan(14, "d"),
  sessionCookie: { name: SESSION_COOKIE, attributes: { secure: serverEnv().cookieSecure, sameSite: "lax" } },
  getUserAttributes: (a) => ({
    email: a.email,
    name: a.name,
    role: a.role,
    firmId: a.firm_id,
    unitSystem: a.unit_system,
    active: a.active,
  }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: { email: string; name: string; role: Role; firm_id: string; unit_system: UnitSystem; active: boolean };
  }
}
