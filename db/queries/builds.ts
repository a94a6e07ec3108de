import { sql } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { canInFirm, type FirmAction } from "@/lib/auth/permissions";
import { AppError, conflict, forbidden, notFound } from "@/lib/api/errors";
import { buildSpecSchema, type BuildInput, type BuildSpec, type BuildUpdate } from "@/lib/schemas/workspace";
import type { BuildsTable } from "../schema";
import type { Selectable } from "kysely";
import { inTransaction, type Db } from "./analysis";
import { isUuid } from "./projects";

/** A saved, named absorber design of the firm's library. */
export interface Build {
  id: string;
  firmId: string;
  name: string;
  kind: BuildSpec["kind"];
  spec: BuildSpec;
  notes: string;
  version: number;
  createdBy: string | null;
  createdAt: Date;
  updatedAt: Date;
}

function toBuild(r: Selectable<BuildsTable>): Build {
  const spec = buildSpecSchema.parse(r.spec);
  return { id: r.id, firmId: r.firm_id, name: r.name, kind: spec.kind, spec, notes: r.notes, version: r.version, createdBy: r.created_by, createdAt: r.created_at, updatedAt: r.updated_at };
}

function allow(actor: Actor, action: FirmAction) {
  if (!canInFirm(actor, action)) throw forbidden(action === "library.read" ? "Your role cannot see the build library." : "Your role cannot change the build library.");
}

const NAME_TAKEN = () => new AppError("bad_request", "The library already has a build of that name.", { name: ["already used in your firm's library"] });
const isUniqueViolation = (e: unknown) => (e as { code?: string })?.code === "23505";

/** The firm's builds by name (`library.read`: owner, engineer, builder). */
export async function listBuilds(db: Db, actor: Actor): Promise<Build[]> {
  allow(actor, "library.read");
  const rows = await db.selectFrom("builds").selectAll().where("firm_id", "=", actor.firmId).orderBy(sql`lower(name)`).execute();
  return rows.map(toBuild);
}

/** One build of the actor's firm (404 for another firm's or an unknown id). */
export async function getBuild(db: Db, actor: Actor, buildId: string): Promise<Build> {
  allow(actor, "library.read");
  if (!isUuid(buildId)) throw notFound("That build");
  const row = await db.selectFrom("builds").selectAll().where("id", "=", buildId).where("firm_id", "=", actor.firmId).executeTakeFirst();
  if (!row) throw notFound("That build");
  return toBuild(row);
}

/** Saves a new build to the firm's library (`library.manage`); names are unique per firm (case-insensitive). */
export async function createBuild(db: Db, actor: Actor, input: BuildInput): Promise<Build> {
  allow(actor, "library.manage");
  return inTransaction(db, async (trx) => {
    const taken = await trx.selectFrom("builds").select("id").where("firm_id", "=", actor.firmId).where(sql`lower(name)`, "=", input.name.toLowerCase()).executeTakeFirst();
    if (taken) throw NAME_TAKEN();
    try {
      const row = await trx
        .insertInto("builds")
        .values({ firm_id: actor.firmId, name: input.name, kind: input.spec.kind, spec: JSON.stringify(input.spec), notes: input.notes, created_by: actor.userId })
        .returningAll()
        .executeTakeFirstOrThrow();
      return toBuild(row);
    } catch (e) {
      if (isUniqueViolation(e)) throw NAME_TAKEN();
      throw e;
    }
  });
}

/** Changes a build if `version` is current (else 409). Items made from it keep their own copy. */
export async function updateBuild(db: Db, actor: Actor, buildId: string, input: BuildUpdate): Promise<Build> {
  return inTransaction(db, async (trx) => {
    await getBuild(trx, actor, buildId);
    allow(actor, "library.manage");
    if (input.name !== undefined) {
      const taken = await trx.selectFrom("builds").select("id").where("firm_id", "=", actor.firmId).where(sql`lower(name)`, "=", input.name.toLowerCase()).where("id", "!=", buildId).executeTakeFirst();
      if (taken) throw NAME_TAKEN();
    }
    const row = await trx
      .updateTable("builds")
      .set({
        ...(input.name !== undefined && { name: input.name }),
        ...(input.spec !== undefined && { spec: JSON.stringify(input.spec), kind: input.spec.kind }),
        ...(input.notes !== undefined && { notes: input.notes }),
        version: sql`version + 1`,
        updated_at: sql`now()`,
      })
      .where("id", "=", buildId)
      .where("version", "=", input.version)
      .returningAll()
      .executeTakeFirst();
    if (!row) throw conflict();
    return toBuild(row);
  });
}

/** Deletes a build of the library; items made from it keep their copy (their link is cleared). */
export async function deleteBuild(db: Db, actor: Actor, buildId: string): Promise<void> {
  await getBuild(db, actor, buildId);
  allow(actor, "library.manage");
  await db.deleteFrom("builds").where("id", "=", buildId).where("firm_id", "=", actor.firmId).execute();
}
