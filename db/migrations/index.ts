import type { Migration } from "kysely";
import * as foundation from "./2026-12-01T19-00-foundation";
import * as workspace from "./2026-12-01T20-00-workspace";
import * as reports from "./2026-12-01T21-00-reports";
import * as filesAndFees from "./2026-12-01T21-30-files-and-fees";
import * as buildProgress from "./2026-12-01T21-45-build-progress";

/** Every migration, by name (timestamp first). Imported statically so that Next can bundle them. */
export const migrations: Record<string, Migration> = {
  "2026-12-01T19-00-foundation": foundation,
  "2026-12-01T20-00-workspace": workspace,
  "2026-12-01T21-00-reports": reports,
  "2026-12-01T21-30-files-and-fees": filesAndFees,
  "2026-12-01T21-45-build-progress": buildProgress,
};
