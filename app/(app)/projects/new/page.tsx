import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ProjectForm } from "@/components/projects/project-form";
import { PageHeader } from "@/components/ui/card";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { firmPeople } from "../people";

export const metadata: Metadata = { title: "New project" };

export default async function NewProjectPage() {
  const actor = await requireActor();
  if (!canInFirm(actor, "project.create")) notFound();
  const people = await firmPeople(actor.firmId);
  return (
    <>
      <PageHeader title="New project" eyebrow="Projects">
        One client, their rooms, and everything you design for them.
      </PageHeader>
      <ProjectForm {...people} />
    </>
  );
}
