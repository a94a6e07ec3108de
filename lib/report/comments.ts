import "server-only";
import type { Kysely } from "kysely";
import { addComment, type ReportComment } from "@/db/queries/reports";
import type { Database } from "@/db/schema";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject } from "@/lib/auth/permissions";
import { sendMail } from "@/lib/email/mailer";
import { reportCommentMail } from "@/lib/email/templates";
import { portalUrl } from "./delivery";

/**
 * Adds to a report's thread — a question when the actor is the project's client, an answer when
 * staff — and e-mails the other side: the engineer who signed (else the firm's staff who drafted) for
 * a question, the project's client for an answer.
 */
export async function postComment(db: Kysely<Database>, actor: Actor, reportId: string, body: string): Promise<ReportComment> {
  const isStaff = actor.role === "owner" || actor.role === "engineer";
  const { comment, project, report } = await addComment(db, actor, reportId, isStaff ? "answer" : "question", body);
  const firm = await db.selectFrom("firms").select("name").where("id", "=", actor.firmId).executeTakeFirstOrThrow();
  let to: { email: string; name: string } | undefined;
  if (isStaff && project.clientUserId) {
    to = await db.selectFrom("users").select(["email", "name"]).where("id", "=", project.clientUserId).executeTakeFirst();
  } else if (!isStaff) {
    const signer = await db
      .selectFrom("report_revisions as rv")
      .innerJoin("users as u", "u.id", "rv.signed_by")
      .select(["u.email", "u.name"])
      .where("rv.report_id", "=", report.id)
      .where("rv.status", "=", "issued")
      .executeTakeFirst();
    to = signer;
  }
  if (to && canOnProject(actor, isStaff ? "report.answer" : "report.ask", project)) {
    await sendMail({
      to: to.email,
      fromName: firm.name,
      replyTo: actor.email,
      ...reportCommentMail({ firmName: firm.name, toName: to.name, fromName: actor.name, kind: comment.kind, reportNumber: report.number, roomName: report.roomName, body, url: portalUrl(project.id) }),
    });
  }
  return comment;
}
