import { hash } from "@node-rs/argon2";
import type { Kysely } from "kysely";
import { ARGON2_OPTIONS } from "../lib/auth/password-options";
import { newUserId } from "../lib/auth/ids";
import { DEMO_ACCOUNTS, DEMO_FIRM, DEMO_PROJECTS } from "./seed-data";
import type { Database } from "./schema";

/**
 * Fills the invented demo world once. A marker row in `demo_seed` makes a second call a no-op, so
 * `npm start` can call it every time without duplicating or overwriting the user's own edits.
 */
export async function seedDemo(db: Kysely<Database>): Promise<{ created: boolean }> {
  const hashes = await Promise.all(DEMO_ACCOUNTS.map((a) => hash(a.password, ARGON2_OPTIONS)));
  return db.transaction().execute(async (trx) => {
    const marker = await trx.insertInto("demo_seed").values({ id: 1 }).onConflict((oc) => oc.doNothing()).returning("id").executeTakeFirst();
    if (!marker) return { created: false };

    const firm = await trx.insertInto("firms").values({ name: DEMO_FIRM.name, contact_email: DEMO_FIRM.contactEmail }).returning("id").executeTakeFirstOrThrow();
    const ids = new Map<string, string>();
    for (const [i, account] of DEMO_ACCOUNTS.entries()) {
      const id = newUserId();
      ids.set(account.email, id);
      await trx
        .insertInto("users")
        .values({ id, firm_id: firm.id, email: account.email, name: account.name, role: account.role, password_hash: hashes[i] ?? null, unit_system: account.role === "client" ? "imperial" : "metric" })
        .execute();
    }
    const engineerId = DEMO_ACCOUNTS.find((a) => a.role === "engineer")?.email;
    const builderEmail = DEMO_ACCOUNTS.find((a) => a.role === "builder")?.email;
    for (const p of DEMO_PROJECTS) {
      const project = await trx
        .insertInto("projects")
        .values({
          firm_id: firm.id,
          name: p.name,
          client_name: p.clientName,
          client_user_id: ids.get(p.clientEmail) ?? null,
          site_address: p.siteAddress,
          status: p.status,
          notes: p.notes,
          created_by: engineerId ? ids.get(engineerId) ?? null : null,
        })
        .returning("id")
        .executeTakeFirstOrThrow();
      if (p.builderAssigned && builderEmail) {
        await trx.insertInto("project_builders").values({ project_id: project.id, user_id: ids.get(builderEmail)! }).execute();
      }
      for (const r of p.rooms) {
        await trx
          .insertInto("rooms")
          .values({ project_id: project.id, name: r.name, length_m: r.lengthM, width_m: r.widthM, height_m: r.heightM, temperature_c: r.temperatureC, humidity_pct: r.humidityPct, notes: r.notes })
          .execute();
      }
    }
    return { created: true };
  });
}
