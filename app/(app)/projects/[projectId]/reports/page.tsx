import type { Metadata } from "next";
import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { db } from "@/db/client";
import { findProject } from "@/db/queries/projects";
import { listComments, listProjectEvents, listProjectReports, recordAccess, type ReportComment, type ReportEvent } from "@/db/queries/reports";
import { ApproveForm, CommentForm } from "@/components/reports/portal-forms";
import { RevisionTable } from "@/components/reports/revision-table";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { canOnProject } from "@/lib/auth/permissions";
import { getActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Reports" };

const EVENT_LABEL: Record<ReportEvent["kind"], string> = {
  drafted: "draft opened",
  issued: "issued and signed",
  superseded: "superseded",
  sent: "sent to the client",
  viewed: "viewed",
  downloaded: "downloaded",
  approved: "approved",
  question: "question asked",
  answer: "answer given",
};

/** The client portal and the engineer's overview: reports with revisions, approvals, the thread and the audit log. */
export default async function ProjectReportsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await getActor();
  if (!actor) redirect(`/sign-in?next=${encodeURIComponent(`/projects/${projectId}/reports`)}`);
  const project = await findProject(db, actor, projectId);
  if (!project || !canOnProject(actor, "report.read-issued", project)) notFound();
  const reports = await listProjectReports(db, actor, project.id);
  const staff = canOnProject(actor, "report.read", project);
  const threads = new Map<string, ReportComment[]>();
  for (const r of reports) threads.set(r.id, await listComments(db, actor, r.id));
  if (actor.role === "client") {
    for (const r of reports) {
      const current = r.revisions.find((v) => v.status === "issued");
      if (current) await recordAccess(db, actor, r, current.id, "viewed");
    }
  }
  const events = staff ? await listProjectEvents(db, actor, project.id) : [];
  return (
    <>
      <PageHeader eyebrow={<Link href={`/projects/${project.id}`} className="hover:underline">{project.name}</Link>} title="Reports">
        {project.clientName}
      </PageHeader>
      {reports.length === 0 ? (
        <EmptyState title={staff ? "No report yet" : "No report has been issued yet"}>{staff ? "Compose one from a room's page." : "You will get an e-mail when your report is ready."}</EmptyState>
      ) : (
        <div className="space-y-6">
          {reports.map((r) => {
            const current = r.revisions.find((v) => v.status === "issued");
            const approvedByMe = current?.approvals.some((a) => a.userName === actor.name);
            const thread = threads.get(r.id) ?? [];
            return (
              <Card key={r.id}>
                <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
                  <h2 className="text-lg font-semibold">
                    {r.roomName} <span className="ml-1 text-sm font-normal tabular-nums text-ink-soft">{r.number}</span>
                  </h2>
                  {staff && (
                    <Link className="text-sm text-kiln-600 underline" href={`/rooms/${r.roomId}/report`}>
                      Compose or issue
                    </Link>
                  )}
                </div>
                <RevisionTable report={r} />
                {current && canOnProject(actor, "report.approve", project) && (
                  <div className="mt-4">
                    {approvedByMe ? <p className="text-sm font-medium text-within">You approved revision {current.revision}.</p> : <ApproveForm projectId={project.id} revisionId={current.id} revision={current.revision} />}
                  </div>
                )}
                <div className="mt-5 border-t border-paper-line pt-4">
                  <h3 className="mb-2 text-sm font-semibold">Questions and answers</h3>
                  {thread.length === 0 ? (
                    <p className="mb-3 text-sm text-ink-soft">No questions yet.</p>
                  ) : (
                    <ol className="mb-3 space-y-2">
                      {thread.map((c) => (
                        <li key={c.id} className={`rounded-md border px-3 py-2 text-sm ${c.kind === "answer" ? "border-kiln-300 bg-paper-sunk" : "border-paper-line"}`}>
                          <div className="text-xs text-ink-faint">
                            {c.authorName} · {c.kind === "answer" ? "answer" : "question"} · {c.createdAt.toISOString().slice(0, 16).replace("T", " ")} UTC{c.revision ? ` · revision ${c.revision}` : ""}
                          </div>
                          <p className="whitespace-pre-line">{c.body}</p>
                        </li>
                      ))}
                    </ol>
                  )}
                  {current && (canOnProject(actor, "report.ask", project) || canOnProject(actor, "report.answer", project)) && <CommentForm projectId={project.id} reportId={r.id} asStaff={staff} />}
                </div>
              </Card>
            );
          })}
          {staff && (
            <Card>
              <h2 className="mb-3 text-lg font-semibold">Audit log</h2>
              <table className="w-full text-sm">
                <thead>
                  <tr className="border-b border-paper-line text-left text-xs uppercase tracking-wide text-ink-faint">
                    <th className="py-1.5 pr-3">When (UTC)</th>
                    <th className="py-1.5 pr-3">Report</th>
                    <th className="py-1.5 pr-3">What</th>
                    <th className="py-1.5">Who</th>
                  </tr>
                </thead>
                <tbody>
                  {events.map((e) => (
                    <tr key={e.id} className="border-b border-paper-line/60" data-event={e.kind}>
                      <td className="py-1.5 pr-3 tabular-nums">{e.at.toISOString().slice(0, 19).replace("T", " ")}</td>
                      <td className="py-1.5 pr-3 tabular-nums">
                        {e.reportNumber}
                        {e.revision ? ` rev ${e.revision}` : ""}
                      </td>
                      <td className="py-1.5 pr-3">{EVENT_LABEL[e.kind]}</td>
                      <td className="py-1.5">{e.actorName}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </Card>
          )}
        </div>
      )}
    </>
  );
}
