import type { Metadata } from "next";
import { db } from "@/db/client";
import { listProjects } from "@/db/queries/projects";
import { ProjectsTable } from "@/components/projects/projects-table";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState, PageHeader } from "@/components/ui/card";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Projects" };

const INTRO = {
  owner: "Every project of the firm.",
  engineer: "Every project of the firm.",
  builder: "The jobs you are assigned to build and install.",
  client: "Your projects and the recommendations your engineer has published.",
} as const;

export default async function ProjectsPage() {
  const actor = await requireActor();
  const projects = await listProjects(db, actor);
  const canCreate = canInFirm(actor, "project.create");
  const title = actor.role === "builder" ? "My jobs" : actor.role === "client" ? "My projects" : "Projects";
  return (
    <>
      <PageHeader title={title} actions={canCreate && <ButtonLink href="/projects/new">New project</ButtonLink>}>
        {INTRO[actor.role]}
      </PageHeader>
      {projects.length === 0 ? (
        <EmptyState
          title={canCreate ? "No projects yet" : "Nothing assigned to you yet"}
          action={canCreate && <ButtonLink href="/projects/new">Start the first project</ButtonLink>}
        >
          {canCreate ? "A project holds one client's rooms, their analyses and the reports you issue." : "When your firm shares a project with you, it appears here."}
        </EmptyState>
      ) : (
        <ProjectsTable
          projects={projects.map((p) => ({ id: p.id, name: p.name, clientName: p.clientName, siteAddress: p.siteAddress, status: p.status, roomCount: p.roomCount, updatedAt: p.updatedAt.toISOString() }))}
        />
      )}
    </>
  );
}
