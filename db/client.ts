import "server-only";
import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import { serverEnv } from "@/lib/env";
import type { Database } from "./schema";

pg.types.setTypeParser(20, (v) => Number.parseInt(v, 10));

// One pool per server process; kept on globalThis so `next dev` reloads do not leak pools.
const globalForDb = globalThis as unknown as { eigenroomPool?: pg.Pool; eigenroomDb?: Kysely<Database> };

export const pool: pg.Pool = globalForDb.eigenroomPool ?? new pg.Pool({ connectionString: serverEnv().DATABASE_URL, max: 10 });
export const db: Kysely<Database> = globalForDb.eigenroomDb ?? new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });

globalForDb.eigenroomPool = pool;
globalForDb.eigenroomDb = db;
