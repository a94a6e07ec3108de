import { type Kysely, type MigrationProvider, Migrator } from "kysely";
import { migrations } from "./migrations";

const provider: MigrationProvider = { getMigrations: async () => migrations };

/** Brings the schema to the newest migration; throws with the failing migration's name. */
export async function migrateToLatest(db: Kysely<any>): Promise<void> {
  const migrator = new Migrator({ db, provider });
  const { error, results } = await migrator.migrateToLatest();
  const failed = results?.find((r) => r.status === "Error");
  if (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new Error(`migration ${failed?.migrationName ?? "(unknown)"} failed: ${reason}`, { cause: error });
  }
}
