import "server-only";
import type { Kysely } from "kysely";
import { reportDownloadGate } from "@/db/queries/invoices";
import { findUserByEmail } from "@/db/queries/users";
import { markIssued, recordEvent, reportSettings, revisionFor, revisionPdf, type ReportRevision } from "@/db/queries/reports";
import { roomFor } from "@/db/queries/rooms";
import type { Database } from "@/db/schema";
import { ENGINE_VERSION } from "@/lib/analysis";
import { AppError } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/actor";
import { inviteMember } from "@/lib/auth/flows";
import { sendMail } from "@/lib/email/mailer";
import { reportIssuedMail } from "@/lib/email/templates";
import { serverEnv } from "@/lib/env";
import { configuredSigningIdentity } from "@/lib/signing/configured";
import { sha256Hex, signPdf } from "@/lib/signing";
import { gatherReportInput } from "./gather";
import { renderReport } from "./render";

async function firmOf(db: Kysely<Database>, firmId: string) {
  const f = await db.selectFrom("firms").select(["name", "contact_email"]).where("id", "=", firmId).executeTakeFirstOrThrow();
  return { name: f.name, contactEmail: f.contact_email };
}

/** Renders a draft revision as an unsigned preview marked "draft" (staff only; nothing is stored). */
export async function previewRevision(db: Kysely<Database>, actor: Actor, revisionId: string): Promise<{ pdf: Buffer; filename: string }> {
  const { revision, report, project } = await revisionFor(db, actor, revisionId, "report.compose");
  if (revision.status !== "draft") throw new AppError("bad_request", "Only a draft has a preview; download the issued file instead.");
  const { room } = await roomFor(db, actor, report.roomId, "report.compose");
  const input = await gatherReportInput(db, actor, { report, revision, project, room, firm: await firmOf(db, actor.firmId) }, { issuedAt: new Date(), status: "draft", signature: null });
  const { pdf } = await renderReport(input);
  return { pdf, filename: `${report.number}-rev${revision.revision}-draft.pdf` };
}

/**
 * Issues the draft: renders it with the signature block, signs it (PKCS#7 with the configured
 * certificate), stores the signed bytes with their SHA-256, signer and time, and supersedes the
 * previously issued revision. Returns the revision and how long rendering and signing took.
 */
export async function issueRevision(db: Kysely<Database>, actor: Actor, revisionId: string): Promise<{ revision: ReportRevision; renderMs: number; signMs: number }> {
  const { revision, report, project } = await revisionFor(db, actor, revisionId, "report.issue");
  if (revision.status !== "draft") throw new AppError("conflict", "This revision has already been issued; open a new draft to change the report.");
  const { room } = await roomFor(db, actor, report.roomId, "report.issue");
  const identity = configuredSigningIdentity();
  const firm = await firmOf(db, actor.firmId);
  const issuedAt = new Date(Math.floor(Date.now() / 1000) * 1000);
  const verifyUrl = new URL("/verify", serverEnv().APP_URL).href;
  const t0 = Date.now();
  const input = await gatherReportInput(db, actor, { report, revision, project, room, firm }, {
    issuedAt,
    status: "issued",
    signature: { signerName: actor.name, certificateSubject: [identity.certificate.commonName, identity.certificate.organization].filter(Boolean).join(", "), certificateFingerprint: identity.certificate.fingerprintSha256, verifyUrl },
  });
  const { pdf, pageCount } = await renderReport(input);
  const t1 = Date.now();
  const signed = await signPdf(pdf, identity, {
    reason: `${report.number} revision ${revision.revision}: room acoustics report`,
    name: actor.name,
    contactInfo: firm.contactEmail ?? actor.email,
    location: firm.name,
    signingTime: issuedAt,
  });
  const t2 = Date.now();
  const issued = await markIssued(db, actor, revisionId, {
    pdf: signed,
    sha256: sha256Hex(signed),
    pageCount,
    signerName: actor.name,
    signedAt: issuedAt,
    certificateFingerprint: identity.certificate.fingerprintSha256,
    engineVersion: ENGINE_VERSION,
  });
  return { revision: issued, renderMs: t1 - t0, signMs: t2 - t1 };
}

/** The portal link of a project's reports (through sign-in when needed: app/api/v1/reports/portal). */
export function portalUrl(projectId: string): string {
  return new URL(`/api/v1/reports/portal/${projectId}`, serverEnv().APP_URL).href;
}

/**
 * E-mails an issued revision to the project's client: a link to the portal (and the signed PDF when
 * the firm attaches it). A client without an account is invited first (the invitation carries the
 * link that sets a password); `recipient` names them when the project has no client member yet.
 */
export async function sendRevision(
  db: Kysely<Database>,
  actor: Actor,
  revisionId: string,
  recipient?: { email: string; name: string },
): Promise<{ to: string; invited: boolean; attached: boolean }> {
  const { revision, report, project } = await revisionFor(db, actor, revisionId, "report.send");
  if (revision.status !== "issued") throw new AppError("bad_request", revision.status === "draft" ? "Issue (sign) the revision before sending it." : "This revision is superseded; send the current one.");
  let clientId = project.clientUserId;
  let invited = false;
  if (!clientId) {
    if (!recipient) throw new AppError("bad_request", "This project has no client account yet: give the client's e-mail address.", { email: ["enter the client's e-mail address"] });
    const existing = await findUserByEmail(db, recipient.email);
    if (existing && (existing.firm_id !== actor.firmId || existing.role !== "client")) {
      throw new AppError("conflict", "That address belongs to an account that is not a client of your firm.", { email: ["not a client of your firm"] });
    }
    if (existing && existing.password_hash !== null) clientId = existing.id;
    else {
      clientId = (await inviteMember(db, actor, { email: recipient.email, name: recipient.name, role: "client" })).userId;
      invited = true;
    }
    await db.updateTable("projects").set({ client_user_id: clientId }).where("id", "=", project.id).where("client_user_id", "is", null).execute();
  }
  const client = await db.selectFrom("users").select(["id", "email", "name", "password_hash", "active"]).where("id", "=", clientId).executeTakeFirstOrThrow();
  if (!client.active) throw new AppError("bad_request", "The client's account is deactivated; reactivate it under Team first.");
  if (client.password_hash === null && !invited) {
    await inviteMember(db, actor, { email: client.email, name: client.name, role: "client" });
    invited = true;
  }
  const settings = await reportSettings(db, actor.firmId);
  const firm = await firmOf(db, actor.firmId);
  const pdf = settings.attachPdf ? await revisionPdf(db, revision.id) : undefined;
  const body = reportIssuedMail({
    firmName: firm.name,
    engineerName: revision.signerName ?? actor.name,
    clientName: client.name,
    projectName: project.name,
    roomName: report.roomName,
    reportNumber: report.number,
    revision: revision.revision,
    summary: "It explains in plain words what we found in the room, what we recommend and what it will cost, with the detailed figures for anyone who wants them.",
    url: portalUrl(project.id),
    attached: !!pdf,
    firstRevision: report.revisions.filter((r) => r.status !== "draft").length <= 1,
  });
  await sendMail({
    to: client.email,
    fromName: firm.name,
    replyTo: actor.email,
    ...body,
    attachments: pdf ? [{ filename: `${report.number}-rev${revision.revision}.pdf`, content: pdf, contentType: "application/pdf" }] : undefined,
  });
  await recordEvent(db, { reportId: report.id, revisionId: revision.id, kind: "sent", actor, detail: { to: client.email, invited, attached: !!pdf, revision: revision.revision } });
  return { to: client.email, invited, attached: !!pdf };
}

/** The signed file of an issued or superseded revision for download; records "downloaded". */
export async function downloadRevision(db: Kysely<Database>, actor: Actor, revisionId: string): Promise<{ pdf: Buffer; filename: string; superseded: boolean }> {
  const { revision, report, project } = await revisionFor(db, actor, revisionId, "report.read-issued");
  if (revision.status === "draft") throw new AppError("bad_request", "A draft has no signed file; open its preview.");
  // The firm may hold a client's download until the engineering fee is paid; staff are never held.
  if (actor.role === "client") {
    const gate = await reportDownloadGate(db, project.id, report.id);
    if (!gate.allowed) throw new AppError("forbidden", "This report can be downloaded once the engineering fee is paid. Pay it from the project page.");
  }
  const pdf = await revisionPdf(db, revision.id);
  if (!pdf) throw new AppError("not_found", "That report revision was not found.");
  await recordEvent(db, { reportId: report.id, revisionId: revision.id, kind: "downloaded", actor, detail: { revision: revision.revision, role: actor.role } });
  return { pdf, filename: `${report.number}-rev${revision.revision}${revision.status === "superseded" ? "-superseded" : ""}.pdf`, superseded: revision.status === "superseded" };
}
