import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { findProject } from "@/db/queries/projects";
import { ProjectForm } from "@/components/projects/project-form";
import { PageHeader } from "@/components/ui/card";
import { canOnProject } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { firmPeople } from "../../people";

export const metadata: Metadata = { title: "Edit project" };

export default async function EditProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requireActor();
  const project = await findProject(db, actor, projectId);
  if (!project || !canOnProject(actor, "project.update", project)) notFound();
  const people = await firmPeople(actor.firmId);
  return (
    <>
      <PageHeader title={`Edit ${project.name}`} eyebrow="Project" />
      <ProjectForm
        projectId={project.id}
        version={project.version}
        initial={{ name: project.name, clientName: project.clientName, siteAddress: project.siteAddress, status: project.status, notes: project.notes, clientUserId: project.clientUserId, builderIds: [...project.builderIds] }}
        {...people}
      />
    </>
  );
}
