import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { roomFor } from "@/db/queries/rooms";
import { RoomForm } from "@/components/rooms/room-form";
import { PageHeader } from "@/components/ui/card";
import { AppError } from "@/lib/api/errors";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Edit room" };

export default async function EditRoomPage({ params }: { params: Promise<{ roomId: string }> }) {
  const { roomId } = await params;
  const actor = await requireActor();
  const found = await roomFor(db, actor, roomId, "room.update").catch((e: unknown) => {
    if (e instanceof AppError) return undefined;
    throw e;
  });
  if (!found) notFound();
  const { room, project } = found;
  return (
    <>
      <PageHeader eyebrow={<Link href={`/rooms/${room.id}`} className="hover:underline">{project.name} · {room.name}</Link>} title={`Edit ${room.name}`} />
      <RoomForm projectId={project.id} roomId={room.id} version={room.version} initial={room} initialUnits={actor.unitSystem} />
    </>
  );
}
