import { type Kysely, sql, type Transaction } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject, type ProjectAction } from "@/lib/auth/permissions";
import { AppError, conflict, forbidden, notFound } from "@/lib/api/errors";
import type { Database, PaperSize, ReportEventKind, ReportRevisionStatus } from "../schema";
import { findProject, isUuid, type Project } from "./projects";
import { roomFor, type Room } from "./rooms";

type Db = Kysely<Database> | Transaction<Database>;

export interface ReportApproval {
  revisionId: string;
  userName: string;
  note: string;
  approvedAt: Date;
}

export interface ReportRevision {
  id: string;
  reportId: string;
  revision: number;
  status: ReportRevisionStatus;
  scenarioIds: string[];
  paperSize: PaperSize;
  note: string;
  sha256: string | null;
  pageCount: number | null;
  signerName: string | null;
  signedAt: Date | null;
  certificateFingerprint: string | null;
  engineVersion: string | null;
  supersededAt: Date | null;
  createdAt: Date;
  approvals: ReportApproval[];
}

export interface Report {
  id: string;
  number: string;
  projectId: string;
  roomId: string;
  roomName: string;
  createdAt: Date;
  /** newest first; for a client only issued and superseded revisions */
  revisions: ReportRevision[];
}

export interface ReportEvent {
  id: number;
  reportId: string;
  reportNumber: string;
  revision: number | null;
  kind: ReportEventKind;
  actorName: string;
  detail: Record<string, unknown>;
  at: Date;
}

export interface ReportComment {
  id: string;
  reportId: string;
  revision: number | null;
  kind: "question" | "answer";
  authorName: string;
  body: string;
  createdAt: Date;
}

export interface ReportSettings {
  attachPdf: boolean;
  signingCertificateRef: string;
  certificateFingerprint: string | null;
}

/** Whether the actor may see unsigned drafts (staff) or only issued revisions (clients). */
const seesDrafts = (actor: Actor, project: Project) => canOnProject(actor, "report.read", project);

const revisionColumns = [
  "rv.id",
  "rv.report_id",
  "rv.revision",
  "rv.status",
  "rv.scenario_ids",
  "rv.paper_size",
  "rv.note",
  "rv.sha256",
  "rv.page_count",
  "rv.signer_name",
  "rv.signed_at",
  "rv.certificate_fingerprint",
  "rv.engine_version",
  "rv.superseded_at",
  "rv.created_at",
] as const;

type RevisionRow = {
  id: string;
  report_id: string;
  revision: number;
  status: ReportRevisionStatus;
  scenario_ids: string[];
  paper_size: PaperSize;
  note: string;
  sha256: string | null;
  page_count: number | null;
  signer_name: string | null;
  signed_at: Date | null;
  certificate_fingerprint: string | null;
  engine_version: string | null;
  superseded_at: Date | null;
  created_at: Date;
};

function toRevision(r: RevisionRow, approvals: ReportApproval[]): ReportRevision {
  return {
    id: r.id,
    reportId: r.report_id,
    revision: r.revision,
    status: r.status,
    scenarioIds: r.scenario_ids,
    paperSize: r.paper_size,
    note: r.note,
    sha256: r.sha256,
    pageCount: r.page_count,
    signerName: r.signer_name,
    signedAt: r.signed_at,
    certificateFingerprint: r.certificate_fingerprint,
    engineVersion: r.engine_version,
    supersededAt: r.superseded_at,
    createdAt: r.created_at,
    approvals: approvals.filter((a) => a.revisionId === r.id),
  };
}

async function loadReports(db: Db, reportRows: { id: string; number: string; project_id: string; room_id: string; room_name: string; created_at: Date }[], withDrafts: boolean): Promise<Report[]> {
  if (reportRows.length === 0) return [];
  const ids = reportRows.map((r) => r.id);
  let q = db.selectFrom("report_revisions as rv").select(revisionColumns).where("rv.report_id", "in", ids);
  if (!withDrafts) q = q.where("rv.status", "<>", "draft");
  const revs = await q.orderBy("rv.revision", "desc").execute();
  const approvals = await db
    .selectFrom("report_approvals")
    .select(["revision_id", "user_name", "note", "approved_at"])
    .where("report_id", "in", ids)
    .orderBy("approved_at")
    .execute();
  const a = approvals.map((x) => ({ revisionId: x.revision_id, userName: x.user_name, note: x.note, approvedAt: x.approved_at }));
  return reportRows.map((r) => ({
    id: r.id,
    number: r.number,
    projectId: r.project_id,
    roomId: r.room_id,
    roomName: r.room_name,
    createdAt: r.created_at,
    revisions: revs.filter((v) => v.report_id === r.id).map((v) => toRevision(v, a)),
  }));
}

function reportsQuery(db: Db) {
  return db
    .selectFrom("reports as r")
    .innerJoin("rooms as rm", "rm.id", "r.room_id")
    .select(["r.id", "r.number", "r.project_id", "r.room_id", "rm.name as room_name", "r.created_at"]);
}

/**
 * The reports of a project the actor may see: staff see every revision, the project's client only
 * issued and superseded ones (a report without any is left out for them). 404 when the project is not
 * visible, 403 for a role without report access (builders).
 */
export async function listProjectReports(db: Db, actor: Actor, projectId: string): Promise<Report[]> {
  const project = await findProject(db, actor, projectId);
  if (!project) throw notFound("That project");
  if (!canOnProject(actor, "report.read-issued", project)) throw forbidden();
  const rows = await reportsQuery(db).where("r.project_id", "=", project.id).orderBy("rm.name").execute();
  const reports = await loadReports(db, rows, seesDrafts(actor, project));
  return seesDrafts(actor, project) ? reports : reports.filter((r) => r.revisions.length > 0);
}

/** The report of a room (undefined when none has been started), as the actor may see it. */
export async function findRoomReport(db: Db, actor: Actor, roomId: string): Promise<{ report: Report | undefined; room: Room; project: Project }> {
  const { room, project } = await roomFor(db, actor, roomId, "report.read-issued");
  const rows = await reportsQuery(db).where("r.room_id", "=", room.id).execute();
  const [report] = await loadReports(db, rows, seesDrafts(actor, project));
  if (report && !seesDrafts(actor, project) && report.revisions.length === 0) return { report: undefined, room, project };
  return { report, room, project };
}

/** One report by id, as the actor may see it (404 when not visible). */
export async function reportFor(db: Db, actor: Actor, reportId: string, action: ProjectAction): Promise<{ report: Report; project: Project }> {
  if (!isUuid(reportId)) throw notFound("That report");
  const row = await reportsQuery(db).where("r.id", "=", reportId).executeTakeFirst();
  const project = row ? await findProject(db, actor, row.project_id) : undefined;
  if (!row || !project || !canOnProject(actor, "report.read-issued", project)) throw notFound("That report");
  const [report] = await loadReports(db, [row], seesDrafts(actor, project));
  if (!report || (!seesDrafts(actor, project) && report.revisions.length === 0)) throw notFound("That report");
  if (!canOnProject(actor, action, project)) throw forbidden();
  return { report, project };
}

/**
 * One revision with its report and project. A draft is not found (404) for anyone who may not see
 * drafts, so a client never learns that an unsigned revision exists.
 */
export async function revisionFor(db: Db, actor: Actor, revisionId: string, action: ProjectAction): Promise<{ revision: ReportRevision; report: Report; project: Project }> {
  if (!isUuid(revisionId)) throw notFound("That report revision");
  const rv = await db.selectFrom("report_revisions").select(["report_id", "status"]).where("id", "=", revisionId).executeTakeFirst();
  if (!rv) throw notFound("That report revision");
  let found;
  try {
    found = await reportFor(db, actor, rv.report_id, "report.read-issued");
  } catch (error) {
    if (error instanceof AppError) throw notFound("That report revision");
    throw error;
  }
  const revision = found.report.revisions.find((r) => r.id === revisionId);
  if (!revision) throw notFound("That report revision");
  if (!canOnProject(actor, action, found.project)) throw forbidden();
  return { revision, ...found };
}

/** The stored, signed PDF of an issued or superseded revision. */
export async function revisionPdf(db: Db, revisionId: string): Promise<Buffer | undefined> {
  const row = await db.selectFrom("report_revisions").select("pdf").where("id", "=", revisionId).where("status", "<>", "draft").executeTakeFirst();
  return row?.pdf ?? undefined;
}

/** The next report number of a year, e.g. ER-2026-0001 (one counter per year, unique installation-wide). */
export async function nextReportNumber(db: Db, year: number): Promise<string> {
  const row = await db
    .insertInto("report_number_counters")
    .values({ year, last_number: 1 })
    .onConflict((oc) => oc.column("year").doUpdateSet({ last_number: sql`report_number_counters.last_number + 1` }))
    .returning("last_number")
    .executeTakeFirstOrThrow();
  return `ER-${year}-${String(row.last_number).padStart(4, "0")}`;
}

export interface DraftInput {
  scenarioIds: string[];
  paperSize: PaperSize;
  note: string;
}

/**
 * Saves the room's draft (creating the report and its number on first use): the one draft of the
 * report is updated, or a new one is opened as the next revision. The caller has validated the input
 * and checked that the scenarios belong to the room.
 */
export async function saveDraft(db: Kysely<Database>, actor: Actor, roomId: string, input: DraftInput, now = new Date()): Promise<ReportRevision> {
  return db.transaction().execute(async (trx) => {
    const { room, project } = await roomFor(trx, actor, roomId, "report.compose");
    let report = await trx.selectFrom("reports").select(["id"]).where("room_id", "=", room.id).forUpdate().executeTakeFirst();
    if (!report) {
      const number = await nextReportNumber(trx, now.getUTCFullYear());
      report = await trx
        .insertInto("reports")
        .values({ firm_id: project.firmId, project_id: project.id, room_id: room.id, number, created_by: actor.userId })
        .returning("id")
        .executeTakeFirstOrThrow();
    }
    const draft = await trx.selectFrom("report_revisions").select("id").where("report_id", "=", report.id).where("status", "=", "draft").executeTakeFirst();
    let id: string;
    if (draft) {
      await trx
        .updateTable("report_revisions")
        .set({ scenario_ids: input.scenarioIds, paper_size: input.paperSize, note: input.note, updated_at: sql`now()` })
        .where("id", "=", draft.id)
        .execute();
      id = draft.id;
    } else {
      const max = await trx.selectFrom("report_revisions").select(sql<number>`coalesce(max(revision), 0)::int`.as("n")).where("report_id", "=", report.id).executeTakeFirstOrThrow();
      const row = await trx
        .insertInto("report_revisions")
        .values({ report_id: report.id, revision: max.n + 1, status: "draft", scenario_ids: input.scenarioIds, paper_size: input.paperSize, note: input.note, created_by: actor.userId })
        .returning("id")
        .executeTakeFirstOrThrow();
      id = row.id;
      await recordEvent(trx, { reportId: report.id, revisionId: id, kind: "drafted", actor, detail: { revision: max.n + 1 } });
    }
    return (await revisionFor(trx, actor, id, "report.compose")).revision;
  });
}

export interface SignedFile {
  pdf: Buffer;
  sha256: string;
  pageCount: number;
  signerName: string;
  signedAt: Date;
  certificateFingerprint: string;
  engineVersion: string;
}

/**
 * Turns the draft into an issued revision with its signed file, and marks the previously issued
 * revision superseded. Fails with 409 when the revision is no longer a draft (issued twice).
 */
export async function markIssued(db: Kysely<Database>, actor: Actor, revisionId: string, file: SignedFile): Promise<ReportRevision> {
  return db.transaction().execute(async (trx) => {
    const { revision, report } = await revisionFor(trx, actor, revisionId, "report.issue");
    await trx.selectFrom("reports").select("id").where("id", "=", report.id).forUpdate().execute();
    const updated = await trx
      .updateTable("report_revisions")
      .set({
        status: "issued",
        pdf: file.pdf,
        sha256: file.sha256,
        page_count: file.pageCount,
        signed_by: actor.userId,
        signer_name: file.signerName,
        signed_at: file.signedAt,
        certificate_fingerprint: file.certificateFingerprint,
        engine_version: file.engineVersion,
        updated_at: sql`now()`,
      })
      .where("id", "=", revisionId)
      .where("status", "=", "draft")
      .returning("id")
      .executeTakeFirst();
    if (!updated) throw conflict("This revision has already been issued; open a new draft to change the report.");
    const superseded = await trx
      .updateTable("report_revisions")
      .set({ status: "superseded", superseded_at: file.signedAt, updated_at: sql`now()` })
      .where("report_id", "=", report.id)
      .where("status", "=", "issued")
      .where("id", "<>", revisionId)
      .returning(["id", "revision"])
      .execute();
    await recordEvent(trx, { reportId: report.id, revisionId, kind: "issued", actor, detail: { revision: revision.revision, sha256: file.sha256, pages: file.pageCount } });
    for (const s of superseded) {
      await recordEvent(trx, { reportId: report.id, revisionId: s.id, kind: "superseded", actor, detail: { revision: s.revision, by: revision.revision } });
    }
    await trx
      .insertInto("firm_report_settings")
      .values({ firm_id: actor.firmId, certificate_fingerprint: file.certificateFingerprint })
      .onConflict((oc) => oc.column("firm_id").doUpdateSet({ certificate_fingerprint: file.certificateFingerprint, updated_at: sql`now()` }))
      .execute();
    return (await revisionFor(trx, actor, revisionId, "report.read")).revision;
  });
}

/** Appends one entry to the audit log. */
export async function recordEvent(
  db: Db,
  e: { reportId: string; revisionId: string | null; kind: ReportEventKind; actor: Pick<Actor, "userId" | "name"> | null; detail?: Record<string, unknown> },
): Promise<void> {
  await db
    .insertInto("report_events")
    .values({
      report_id: e.reportId,
      revision_id: e.revisionId,
      kind: e.kind,
      actor_user_id: e.actor?.userId ?? null,
      actor_name: e.actor?.name ?? "someone not signed in",
      detail: JSON.stringify(e.detail ?? {}),
    })
    .execute();
}

/** The audit log of a project's reports, newest first (staff only: report.read). */
export async function listProjectEvents(db: Db, actor: Actor, projectId: string, limit = 200): Promise<ReportEvent[]> {
  const project = await findProject(db, actor, projectId);
  if (!project) throw notFound("That project");
  if (!canOnProject(actor, "report.read", project)) throw forbidden();
  const rows = await db
    .selectFrom("report_events as e")
    .innerJoin("reports as r", "r.id", "e.report_id")
    .leftJoin("report_revisions as rv", "rv.id", "e.revision_id")
    .select(["e.id", "e.report_id", "r.number", "rv.revision", "e.kind", "e.actor_name", "e.detail", "e.at"])
    .where("r.project_id", "=", project.id)
    .orderBy("e.at", "desc")
    .orderBy("e.id", "desc")
    .limit(limit)
    .execute();
  return rows.map((r) => ({ id: Number(r.id), reportId: r.report_id, reportNumber: r.number, revision: r.revision, kind: r.kind, actorName: r.actor_name, detail: r.detail, at: r.at }));
}

/** The question-and-answer thread of a report, oldest first (whoever may read the report). */
export async function listComments(db: Db, actor: Actor, reportId: string): Promise<ReportComment[]> {
  await reportFor(db, actor, reportId, "report.read-issued");
  const rows = await db
    .selectFrom("report_comments as c")
    .leftJoin("report_revisions as rv", "rv.id", "c.revision_id")
    .select(["c.id", "c.report_id", "rv.revision", "c.kind", "c.author_name", "c.body", "c.created_at"])
    .where("c.report_id", "=", reportId)
    .orderBy("c.created_at")
    .execute();
  return rows.map((r) => ({ id: r.id, reportId: r.report_id, revision: r.revision, kind: r.kind, authorName: r.author_name, body: r.body, createdAt: r.created_at }));
}

/**
 * Adds a question (the project's client: report.ask) or an answer (staff: report.answer) to the thread
 * of the report's newest issued revision, and logs it.
 */
export async function addComment(db: Kysely<Database>, actor: Actor, reportId: string, kind: "question" | "answer", body: string): Promise<{ comment: ReportComment; project: Project; report: Report }> {
  return db.transaction().execute(async (trx) => {
    const { report, project } = await reportFor(trx, actor, reportId, kind === "question" ? "report.ask" : "report.answer");
    const current = report.revisions.find((r) => r.status === "issued");
    if (!current) throw new AppError("bad_request", "Questions and answers open once a revision has been issued.");
    const row = await trx
      .insertInto("report_comments")
      .values({ report_id: report.id, revision_id: current.id, kind, author_user_id: actor.userId, author_name: actor.name, body })
      .returning(["id", "created_at"])
      .executeTakeFirstOrThrow();
    await recordEvent(trx, { reportId: report.id, revisionId: current.id, kind, actor, detail: { excerpt: body.slice(0, 140) } });
    return {
      comment: { id: row.id, reportId: report.id, revision: current.revision, kind, authorName: actor.name, body, createdAt: row.created_at },
      project,
      report,
    };
  });
}

/** The project's client approves an issued (current) revision; once per person and revision. */
export async function approveRevision(db: Kysely<Database>, actor: Actor, revisionId: string, note: string): Promise<{ approval: ReportApproval; report: Report; project: Project; revision: ReportRevision }> {
  return db.transaction().execute(async (trx) => {
    const { revision, report, project } = await revisionFor(trx, actor, revisionId, "report.approve");
    if (revision.status !== "issued") throw conflict("This revision has been superseded by a newer one; approve the current revision.");
    const row = await trx
      .insertInto("report_approvals")
      .values({ report_id: report.id, revision_id: revision.id, user_id: actor.userId, user_name: actor.name, note })
      .onConflict((oc) => oc.columns(["revision_id", "user_id"]).doNothing())
      .returning(["approved_at"])
      .executeTakeFirst();
    if (!row) throw conflict("You have already approved this revision.");
    await recordEvent(trx, { reportId: report.id, revisionId: revision.id, kind: "approved", actor, detail: { revision: revision.revision, ...(note && { note }) } });
    return { approval: { revisionId: revision.id, userName: actor.name, note, approvedAt: row.approved_at }, report, project, revision };
  });
}

/** The firm's delivery settings (defaults until the owner changes one). */
export async function reportSettings(db: Db, firmId: string): Promise<ReportSettings> {
  const row = await db.selectFrom("firm_report_settings").selectAll().where("firm_id", "=", firmId).executeTakeFirst();
  return { attachPdf: row?.attach_pdf ?? true, signingCertificateRef: row?.signing_certificate_ref ?? "configured", certificateFingerprint: row?.certificate_fingerprint ?? null };
}

/** Changes whether report e-mails carry the PDF (the caller has checked report.settings). */
export async function updateReportSettings(db: Db, firmId: string, input: { attachPdf: boolean }): Promise<ReportSettings> {
  await db
    .insertInto("firm_report_settings")
    .values({ firm_id: firmId, attach_pdf: input.attachPdf })
    .onConflict((oc) => oc.column("firm_id").doUpdateSet({ attach_pdf: input.attachPdf, updated_at: sql`now()` }))
    .execute();
  return reportSettings(db, firmId);
}

/** What the public check shows of an issued or superseded revision. */
export interface PublicRevisionFacts {
  reportNumber: string;
  revision: number;
  status: "issued" | "superseded";
  roomName: string;
  projectName: string;
  firmName: string;
  signerName: string;
  signedAt: Date;
  sha256: string;
  certificateFingerprint: string | null;
  newestRevision: number;
}

function publicQuery(db: Db) {
  return db
    .selectFrom("report_revisions as rv")
    .innerJoin("reports as r", "r.id", "rv.report_id")
    .innerJoin("rooms as rm", "rm.id", "r.room_id")
    .innerJoin("projects as p", "p.id", "r.project_id")
    .innerJoin("firms as f", "f.id", "r.firm_id")
    .select([
      "r.number",
      "rv.revision",
      "rv.status",
      "rm.name as room_name",
      "p.name as project_name",
      "f.name as firm_name",
      "rv.signer_name",
      "rv.signed_at",
      "rv.sha256",
      "rv.certificate_fingerprint",
      sql<number>`(select max(x.revision)::int from report_revisions x where x.report_id = r.id and x.status <> 'draft')`.as("newest"),
    ])
    .where("rv.status", "<>", "draft");
}

type PublicRow = Awaited<ReturnType<ReturnType<typeof publicQuery>["executeTakeFirstOrThrow"]>>;
const toPublic = (r: PublicRow): PublicRevisionFacts => ({
  reportNumber: r.number,
  revision: r.revision,
  status: r.status as "issued" | "superseded",
  roomName: r.room_name,
  projectName: r.project_name,
  firmName: r.firm_name,
  signerName: r.signer_name ?? "",
  signedAt: r.signed_at!,
  sha256: r.sha256!,
  certificateFingerprint: r.certificate_fingerprint,
  newestRevision: r.newest,
});

/** The issued revision whose file has this SHA-256 (public: no actor). */
export async function findIssuedByHash(db: Db, sha256: string): Promise<PublicRevisionFacts | undefined> {
  const row = await publicQuery(db).where("rv.sha256", "=", sha256.toLowerCase()).executeTakeFirst();
  return row ? toPublic(row) : undefined;
}

/** Whether a report number exists (public: no actor), and its issued revisions. */
export async function findIssuedByNumber(db: Db, number: string): Promise<PublicRevisionFacts[]> {
  const rows = await publicQuery(db).where("r.number", "=", number.toUpperCase()).orderBy("rv.revision", "desc").execute();
  return rows.map(toPublic);
}

/** Records that someone opened the report page or file (viewed / downloaded). */
export async function recordAccess(db: Db, actor: Actor, report: Report, revisionId: string, kind: "viewed" | "downloaded"): Promise<void> {
  const revision = report.revisions.find((r) => r.id === revisionId);
  await recordEvent(db, { reportId: report.id, revisionId, kind, actor, detail: { revision: revision?.revision, role: actor.role } });
}
