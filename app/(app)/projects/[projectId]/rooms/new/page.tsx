import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { findProject } from "@/db/queries/projects";
import { RoomForm } from "@/components/rooms/room-form";
import { PageHeader } from "@/components/ui/card";
import { canOnProject } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "New room" };

export default async function NewRoomPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const actor = await requireActor();
  const project = await findProject(db, actor, projectId);
  if (!project || !canOnProject(actor, "room.create", project)) notFound();
  return (
    <>
      <PageHeader eyebrow={<Link href={`/projects/${project.id}`} className="hover:underline">{project.name}</Link>} title="New room">
        Measure inside the finished surfaces. Non-rectangular rooms: use the main rectangle and note the rest.
      </PageHeader>
      <RoomForm projectId={project.id} initialUnits={actor.unitSystem} />
    </>
  );
}
