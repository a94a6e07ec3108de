// Integration-test access to the real test database that `npm test` creates, migrates and seeds
// (`eigenroom_test`, reached through DATABASE_URL). No mock of our own database.
import { type Kysely, sql } from "kysely";
import { createDb } from "@/db/create-db";
import type { Database } from "@/db/schema";
import { seedDemo } from "@/db/seed";

let instance: Kysely<Database> | undefined;

/** The test database's URL; refuses anything that does not look like a test database. */
export function testDatabaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set; run integration tests through npm test");
  const name = decodeURIComponent(new URL(url).pathname.slice(1));
  if (!name.endsWith("_test")) {
    throw new Error(`DATABASE_URL points at "${name}", not a test database (its name must end in _test); refusing to touch it`);
  }
  return url;
}

/** One shared Kysely instance over the test database (closed by `closeTestDb`). */
export function testDb(): Kysely<Database> {
  instance ??= createDb(testDatabaseUrl(), 4);
  return instance;
}

export async function closeTestDb(): Promise<void> {
  await instance?.destroy();
  instance = undefined;
}

/** Our tables (everything in `public` except Kysely's own bookkeeping). */
export async function appTables(db: Kysely<Database> = testDb()): Promise<string[]> {
  const { rows } = await sql<{ name: string }>`
    select tablename as name from pg_tables
     where schemaname = 'public' and tablename not in ('kysely_migration', 'kysely_migration_lock')
     order by tablename`.execute(db);
  return rows.map((r) => r.name);
}

/** Empties every table (identities restarted) without re-seeding. */
export async function truncateTables(db: Kysely<Database> = testDb()): Promise<void> {
  const tables = await appTables(db);
  if (tables.length === 0) return;
  const list = tables.map((t) => `"${t.replace(/"/g, '""')}"`).join(", ");
  await sql.raw(`truncate table ${list} restart identity cascade`).execute(db);
}

/** Back to the freshly seeded demo state: empties every table, then runs the demo seed again. */
export async function resetTables(db: Kysely<Database> = testDb()): Promise<void> {
  await truncateTables(db);
  const { created } = await seedDemo(db);
  if (!created) throw new Error("resetTables: the demo seed did not run after truncation");
}
