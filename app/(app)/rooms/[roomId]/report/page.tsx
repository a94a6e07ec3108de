import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { findRoomReport, reportSettings } from "@/db/queries/reports";
import { listScenarios } from "@/db/queries/scenarios";
import { ComposeForm } from "@/components/reports/compose-form";
import { AttachSetting, IssueButton, SendForm } from "@/components/reports/revision-actions";
import { RevisionTable } from "@/components/reports/revision-table";
import { Card, Notice, PageHeader } from "@/components/ui/card";
import { AppError } from "@/lib/api/errors";
import { canInFirm, canOnProject } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Room report" };

/** The engineer composes a room's report: scenarios, paper, preview, issue (sign), send. */
export default async function RoomReportPage({ params }: { params: Promise<{ roomId: string }> }) {
  const { roomId } = await params;
  const actor = await requireActor();
  const found = await findRoomReport(db, actor, roomId).catch((e: unknown) => {
    if (e instanceof AppError) return undefined;
    throw e;
  });
  if (!found || !canOnProject(actor, "report.compose", found.project)) notFound();
  const { report, room, project } = found;
  const scenarios = await listScenarios(db, actor, room.id);
  const settings = await reportSettings(db, actor.firmId);
  const draft = report?.revisions.find((r) => r.status === "draft");
  const current = report?.revisions.find((r) => r.status === "issued");
  const client = project.clientUserId ? await db.selectFrom("users").select(["name", "email"]).where("id", "=", project.clientUserId).executeTakeFirst() : undefined;
  const initial = draft ?? current;
  return (
    <>
      <PageHeader eyebrow={<Link href={`/rooms/${room.id}`} className="hover:underline">{room.name}</Link>} title={report ? `Report ${report.number}` : "Report"}>
        {project.name} · {project.clientName}
      </PageHeader>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.3fr)]">
        <Card>
          <h2 className="mb-3 text-lg font-semibold">{draft ? `Draft of revision ${draft.revision}` : "Compose"}</h2>
          {scenarios.length === 0 ? (
            <Notice tone="caution">This room has no scenarios yet: describe the room and its treatment first.</Notice>
          ) : (
            <ComposeForm
              roomId={room.id}
              scenarios={scenarios.map((s) => ({ id: s.id, name: s.name, isBaseline: s.isBaseline, itemCount: s.itemCount }))}
              initial={{ scenarioIds: initial?.scenarioIds ?? scenarios.filter((s) => !s.isBaseline).slice(-1).map((s) => s.id), paperSize: initial?.paperSize ?? "A4", note: initial?.note ?? "" }}
            />
          )}
          {canInFirm(actor, "report.settings") && (
            <div className="mt-5 border-t border-paper-line pt-4">
              <AttachSetting roomId={room.id} attachPdf={settings.attachPdf} />
            </div>
          )}
        </Card>
        <div className="space-y-6">
          {draft && (
            <Card>
              <h2 className="mb-1 text-lg font-semibold">Preview and issue</h2>
              <p className="mb-3 text-sm text-ink-soft">
                The preview is marked as a draft and is never shown to the client. Issuing signs revision {draft.revision} with the firm&apos;s certificate; it cannot be changed afterwards.
              </p>
              <div className="flex flex-wrap items-start gap-3">
                <a className="inline-flex items-center rounded-md border border-paper-line bg-paper-raised px-3.5 py-2 text-sm font-medium hover:bg-paper-sunk" href={`/api/v1/reports/revisions/${draft.id}/pdf`} target="_blank" rel="noreferrer">
                  Open preview (PDF)
                </a>
                {canOnProject(actor, "report.issue", project) && <IssueButton roomId={room.id} revisionId={draft.id} />}
              </div>
            </Card>
          )}
          {current && canOnProject(actor, "report.send", project) && (
            <Card>
              <h2 className="mb-1 text-lg font-semibold">Send revision {current.revision}</h2>
              <SendForm roomId={room.id} revisionId={current.id} needsRecipient={!client} clientLabel={client ? `${client.name} <${client.email}>` : ""} />
            </Card>
          )}
          {report && (
            <Card>
              <h2 className="mb-3 text-lg font-semibold">Revisions</h2>
              <RevisionTable report={report} />
              <p className="mt-3 text-xs text-ink-faint">
                Audit log and questions: <Link className="underline" href={`/projects/${project.id}/reports`}>project reports</Link>.
              </p>
            </Card>
          )}
        </div>
      </div>
    </>
  );
}
