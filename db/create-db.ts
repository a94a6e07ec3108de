import { Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import type { Database } from "./schema";

// PostgreSQL returns bigint (int8) as a string by default; our counters fit in a double.
pg.types.setTypeParser(20, (v) => Number.parseInt(v, 10));

/** A Kysely instance over its own pool. Scripts and tests call this; the app uses db/client.ts. */
export function createDb(connectionString: string, max = 10): Kysely<Database> {
  const pool = new pg.Pool({ connectionString, max });
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}

/** The pg pool behind a Kysely instance is not exposed; keep one beside it when both are needed. */
export function createPool(connectionString: string, max = 10): pg.Pool {
  return new pg.Pool({ connectionString, max });
}
