import { type Kysely, sql, type Transaction } from "kysely";
import { type Actor } from "@/lib/auth/actor";
import { canOnProject, type ProjectAction, type ProjectFacts } from "@/lib/auth/permissions";
import { AppError, conflict, forbidden, notFound } from "@/lib/api/errors";
import type { ProjectInput, ProjectUpdate } from "@/lib/schemas/project";
import type { Database, ProjectStatus } from "../schema";

type Db = Kysely<Database> | Transaction<Database>;

export interface Project extends ProjectFacts {
  id: string;
  name: string;
  clientName: string;
  siteAddress: string;
  status: ProjectStatus;
  notes: string;
  version: number;
  createdAt: Date;
  updatedAt: Date;
  roomCount: number;
}

/**
 * Restricts a projects query to what the actor may see — the same rules as
 * lib/auth/permissions.ts `canSeeProject`, written as SQL so that unseen projects are never loaded.
 */
function visibleTo(db: Db, actor: Actor) {
  let q = db.selectFrom("projects as p").where("p.firm_id", "=", actor.firmId);
  if (actor.role === "builder") {
    q = q.where((eb) => eb.exists(eb.selectFrom("project_builders as pb").select("pb.user_id").whereRef("pb.project_id", "=", "p.id").where("pb.user_id", "=", actor.userId)));
  } else if (actor.role === "client") {
    q = q.where("p.client_user_id", "=", actor.userId);
  }
  return q;
}

function selectProject(db: Db, actor: Actor) {
  return visibleTo(db, actor).select([
    "p.id",
    "p.firm_id",
    "p.name",
    "p.client_name",
    "p.client_user_id",
    "p.site_address",
    "p.status",
    "p.notes",
    "p.version",
    "p.created_at",
    "p.updated_at",
    sql<string[]>`coalesce((select array_agg(pb.user_id) from project_builders pb where pb.project_id = p.id), '{}')`.as("builder_ids"),
    sql<number>`(select count(*)::int from rooms r where r.project_id = p.id)`.as("room_count"),
  ]);
}

type ProjectRowOut = Awaited<ReturnType<ReturnType<typeof selectProject>["executeTakeFirstOrThrow"]>>;

function toProject(r: ProjectRowOut): Project {
  return {
    id: r.id,
    firmId: r.firm_id,
    name: r.name,
    clientName: r.client_name,
    clientUserId: r.client_user_id,
    builderIds: r.builder_ids,
    siteAddress: r.site_address,
    status: r.status,
    notes: r.notes,
    version: r.version,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
    roomCount: r.room_count,
  };
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (s: string) => UUID.test(s);

export async function listProjects(db: Db, actor: Actor): Promise<Project[]> {
  const rows = await selectProject(db, actor).orderBy("p.updated_at", "desc").execute();
  return rows.map(toProject);
}

/** The project if the actor may see it, else undefined (callers answer 404). */
export async function findProject(db: Db, actor: Actor, id: string): Promise<Project | undefined> {
  if (!isUuid(id)) return undefined;
  const row = await selectProject(db, actor).where("p.id", "=", id).executeTakeFirst();
  return row ? toProject(row) : undefined;
}

/** The project for an action: 404 when it is not visible, 403 when visible but not allowed. */
export async function projectFor(db: Db, actor: Actor, id: string, action: ProjectAction): Promise<Project> {
  const project = await findProject(db, actor, id);
  if (!project) throw notFound("That project");
  if (!canOnProject(actor, action, project)) throw forbidden();
  return project;
}

/** Client and builders must be members of the actor's firm with those roles. */
async function checkPeople(db: Db, actor: Actor, input: Partial<Pick<ProjectInput, "clientUserId" | "builderIds">>) {
  const fields: Record<string, string[]> = {};
  if (input.clientUserId) {
    const client = await db.selectFrom("users").select("id").where("id", "=", input.clientUserId).where("firm_id", "=", actor.firmId).where("role", "=", "client").executeTakeFirst();
    if (!client) fields.clientUserId = ["Choose a client member of your firm"];
  }
  if (input.builderIds && input.builderIds.length > 0) {
    const found = await db.selectFrom("users").select("id").where("id", "in", input.builderIds).where("firm_id", "=", actor.firmId).where("role", "=", "builder").execute();
    if (found.length !== new Set(input.builderIds).size) fields.builderIds = ["Choose builder members of your firm"];
  }
  if (Object.keys(fields).length > 0) throw new AppError("bad_request", "Some people chosen are not members of your firm with that role.", fields);
}

async function setBuilders(db: Db, projectId: string, builderIds: string[]) {
  await db.deleteFrom("project_builders").where("project_id", "=", projectId).execute();
  const unique = [...new Set(builderIds)];
  if (unique.length > 0) await db.insertInto("project_builders").values(unique.map((user_id) => ({ project_id: projectId, user_id }))).execute();
}

/** Creates a project in the actor's firm; the caller has checked `project.create`. */
export async function createProject(db: Kysely<Database>, actor: Actor, input: ProjectInput): Promise<Project> {
  return db.transaction().execute(async (trx) => {
    await checkPeople(trx, actor, input);
    const row = await trx
      .insertInto("projects")
      .values({
        firm_id: actor.firmId,
        name: input.name,
        client_name: input.clientName,
        client_user_id: input.clientUserId,
        site_address: input.siteAddress,
        status: input.status,
        notes: input.notes,
        created_by: actor.userId,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    await setBuilders(trx, row.id, input.builderIds);
    return (await findProject(trx, actor, row.id))!;
  });
}

/** Updates a project if `version` is current (else 409); all or nothing. */
export async function updateProject(db: Kysely<Database>, actor: Actor, id: string, input: ProjectUpdate): Promise<Project> {
  return db.transaction().execute(async (trx) => {
    await projectFor(trx, actor, id, "project.update");
    await checkPeople(trx, actor, input);
    const { version, builderIds, ...rest } = input;
    const updated = await trx
      .updateTable("projects")
      .set({
        ...(rest.name !== undefined && { name: rest.name }),
        ...(rest.clientName !== undefined && { client_name: rest.clientName }),
        ...(rest.clientUserId !== undefined && { client_user_id: rest.clientUserId }),
        ...(rest.siteAddress !== undefined && { site_address: rest.siteAddress }),
        ...(rest.status !== undefined && { status: rest.status }),
        ...(rest.notes !== undefined && { notes: rest.notes }),
        version: sql`version + 1`,
        updated_at: sql`now()`,
      })
      .where("id", "=", id)
      .where("version", "=", version)
      .returning("id")
      .executeTakeFirst();
    if (!updated) throw conflict();
    if (builderIds !== undefined) await setBuilders(trx, id, builderIds);
    return (await findProject(trx, actor, id))!;
  });
}

export async function deleteProject(db: Kysely<Database>, actor: Actor, id: string): Promise<void> {
  await projectFor(db, actor, id, "project.delete");
  await db.deleteFrom("projects").where("id", "=", id).execute();
}
