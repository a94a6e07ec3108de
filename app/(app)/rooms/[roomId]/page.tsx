import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { roomFor } from "@/db/queries/rooms";
import { DeleteRoomButton } from "@/components/projects/project-actions";
import { ButtonLink } from "@/components/ui/button";
import { Card, PageHeader } from "@/components/ui/card";
import { AppError } from "@/lib/api/errors";
import { canOnProject } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { formatArea, formatLength, formatVolume } from "@/lib/units/length";

export const metadata: Metadata = { title: "Room" };

export default async function RoomPage({ params }: { params: Promise<{ roomId: string }> }) {
  const { roomId } = await params;
  const actor = await requireActor();
  const found = await roomFor(db, actor, roomId, "room.read").catch((e: unknown) => {
    if (e instanceof AppError) return undefined;
    throw e;
  });
  if (!found) notFound();
  const { room, project } = found;
  const u = actor.unitSystem;
  const { lengthM: L, widthM: W, heightM: H } = room;
  const facts = [
    ["Length", formatLength(L, u)],
    ["Width", formatLength(W, u)],
    ["Height", formatLength(H, u)],
    ["Volume", formatVolume(L * W * H, u)],
    ["Surface area", formatArea(2 * (L * W + L * H + W * H), u)],
    ["Air", `${room.temperatureC} °C · ${room.humidityPct} % RH`],
  ];
  return (
    <>
      <PageHeader
        eyebrow={<Link href={`/projects/${project.id}`} className="hover:underline">{project.name}</Link>}
        title={room.name}
        actions={
          canOnProject(actor, "room.update", project) && (
            <>
              <ButtonLink variant="secondary" href={`/rooms/${room.id}/edit`}>
                Edit room
              </ButtonLink>
              {canOnProject(actor, "room.delete", project) && <DeleteRoomButton roomId={room.id} projectId={project.id} name={room.name} />}
            </>
          )
        }
      />
      <Card>
        <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3">
          {facts.map(([k, v]) => (
            <div key={k}>
              <dt className="text-xs uppercase tracking-wide text-ink-faint">{k}</dt>
              <dd className="tabular-nums text-lg">{v}</dd>
            </div>
          ))}
        </dl>
        {room.notes && <p className="mt-4 whitespace-pre-line border-t border-paper-line pt-3 text-sm text-ink-soft">{room.notes}</p>}
      </Card>
    </>
  );
}
