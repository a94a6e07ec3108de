import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { findProject } from "@/db/queries/projects";
import { listRooms } from "@/db/queries/rooms";
import { BuildSheetLink } from "@/components/build-sheet/build-sheet-link";
import { ProjectInvoicesPanel } from "@/components/payments/project-invoices";
import { ProjectReports } from "@/components/reports/project-reports";
import { DeleteProjectButton } from "@/components/projects/project-actions";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, PageHeader } from "@/components/ui/card";
import { canOnProject } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { PROJECT_STATUS_LABEL } from "@/lib/schemas/project";
import { formatLength, formatVolume } from "@/lib/units/length";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requireActor();
  const project = await findProject(db, actor, projectId);
  if (!project) notFound();
  const rooms = await listRooms(db, actor, project.id);
  const can = (a: Parameters<typeof canOnProject>[1]) => canOnProject(actor, a, project);
  const units = actor.unitSystem;
  return (
    <>
      <PageHeader
        eyebrow={<Link href="/projects" className="hover:underline">Projects</Link>}
        title={project.name}
        actions={
          <>
            {can("room.create") && <ButtonLink href={`/projects/${project.id}/rooms/new`}>Add room</ButtonLink>}
            {can("project.update") && (
              <ButtonLink variant="secondary" href={`/projects/${project.id}/edit`}>
                Edit project
              </ButtonLink>
            )}
            {can("project.delete") && <DeleteProjectButton projectId={project.id} name={project.name} roomCount={rooms.length} />}
          </>
        }
      >
        {project.clientName}
        {project.siteAddress && ` · ${project.siteAddress}`} · <span className="font-medium">{PROJECT_STATUS_LABEL[project.status]}</span>
      </PageHeader>
      {project.notes && actor.role !== "client" && (
        <Card className="mb-6 text-sm text-ink-soft">
          <h2 className="mb-1 font-sans text-xs font-medium uppercase tracking-wide text-ink-faint">Survey notes</h2>
          <p className="whitespace-pre-line">{project.notes}</p>
        </Card>
      )}
      <h2 className="mb-3 text-lg font-semibold">Rooms</h2>
      {rooms.length === 0 ? (
        <EmptyState title="No rooms yet" action={can("room.create") && <ButtonLink href={`/projects/${project.id}/rooms/new`}>Describe the first room</ButtonLink>}>
          Start with the inside dimensions; surfaces, seats and sources come next.
        </EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {rooms.map((r) => (
            <li key={r.id}>
              <Link href={`/rooms/${r.id}`} className="block rounded-[10px] border border-paper-line bg-paper-raised p-4 transition hover:border-kiln-300 hover:shadow-sm">
                <div className="font-medium">{r.name}</div>
                <div className="mt-1 text-sm tabular-nums text-ink-soft">
                  {formatLength(r.lengthM, units)} × {formatLength(r.widthM, units)} × {formatLength(r.heightM, units)}
                </div>
                <div className="mt-0.5 text-xs text-ink-faint">{formatVolume(r.lengthM * r.widthM * r.heightM, units)}</div>
              </Link>
            </li>
          ))}
        </ul>
      )}
      <BuildSheetLink actor={actor} project={project} />
      <ProjectReports projectId={project.id} />
      <ProjectInvoicesPanel actor={actor} project={project} />
    </>
  );
}
