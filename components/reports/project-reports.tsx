import Link from "next/link";
import { db } from "@/db/client";
import { listProjectReports } from "@/db/queries/reports";
import { findProject } from "@/db/queries/projects";
import { listRooms } from "@/db/queries/rooms";
import { canOnProject } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

/** The project page's report section: issued reports to download (and drafts for staff). */
export async function ProjectReports({ projectId }: { projectId: string }) {
  const actor = await requireActor();
  const project = await findProject(db, actor, projectId);
  if (!project || !canOnProject(actor, "report.read-issued", project)) return null;
  const reports = await listProjectReports(db, actor, project.id);
  const composable = canOnProject(actor, "report.compose", project) ? (await listRooms(db, actor, project.id)).filter((r) => !reports.some((x) => x.roomId === r.id)) : [];
  return (
    <section className="mt-8" aria-labelledby="reports-heading">
      <div className="mb-3 flex items-baseline justify-between">
        <h2 id="reports-heading" className="text-lg font-semibold">
          Reports
        </h2>
        <Link className="text-sm text-kiln-600 underline" href={`/projects/${project.id}/reports`}>
          All revisions, approvals and questions
        </Link>
      </div>
      {composable.length > 0 && (
        <p className="mb-3 text-sm text-ink-soft">
          Start a report for{" "}
          {composable.map((r, i) => (
            <span key={r.id}>
              {i > 0 && ", "}
              <Link className="text-kiln-600 underline" href={`/rooms/${r.id}/report`}>
                {r.name}
              </Link>
            </span>
          ))}
          .
        </p>
      )}
      {reports.length === 0 ? (
        <p className="text-sm text-ink-soft">{actor.role === "client" ? "No report has been issued yet." : "No report yet."}</p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {reports.map((r) => {
            const current = r.revisions.find((v) => v.status === "issued");
            return (
              <li key={r.id} className="rounded-[10px] border border-paper-line bg-paper-raised p-4">
                <div className="font-medium">{r.roomName}</div>
                <div className="text-sm tabular-nums text-ink-soft">
                  {r.number} · {current ? `revision ${current.revision}, issued ${current.signedAt?.toISOString().slice(0, 10)}` : "not issued yet"}
                </div>
                {current && (
                  <a className="mt-2 inline-block text-sm text-kiln-600 underline" href={`/api/v1/reports/revisions/${current.id}/pdf`}>
                    Download the signed PDF
                  </a>
                )}
                {canOnProject(actor, "report.compose", project) && (
                  <Link className="ml-3 mt-2 inline-block text-sm text-kiln-600 underline" href={`/rooms/${r.roomId}/report`}>
                    Compose or issue
                  </Link>
                )}
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
