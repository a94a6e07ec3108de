import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Suspense } from "react";
import { db } from "@/db/client";
import { listBuilds } from "@/db/queries/builds";
import { roomFor } from "@/db/queries/rooms";
import { compareScenarios } from "@/db/queries/scenarios";
import { getWorkspace } from "@/db/queries/workspace";
import { DeleteRoomButton } from "@/components/projects/project-actions";
import { ButtonLink } from "@/components/ui/button";
import { Card, Notice, PageHeader } from "@/components/ui/card";
import { RoomFilesPanel } from "@/components/files/room-files-panel";
import { RoomWorkspace } from "@/components/workspace/room-workspace";
import { AppError } from "@/lib/api/errors";
import { canInFirm, canOnProject } from "@/lib/auth/permissions";
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
  const header = (
    <PageHeader
      eyebrow={<Link href={`/projects/${project.id}`} className="hover:underline">{project.name}</Link>}
      title={room.name}
      actions={
        <>
          {canOnProject(actor, "workspace.read", project) && (
            <>
              <ButtonLink variant="secondary" href={`/rooms/${room.id}/design`}>
                Size treatment
              </ButtonLink>
              <ButtonLink variant="secondary" href={`/rooms/${room.id}/plan`}>
                Treatment plan
              </ButtonLink>
            </>
          )}
          {canOnProject(actor, "report.compose", project) && (
            <ButtonLink variant="secondary" href={`/rooms/${room.id}/report`}>
              Report
            </ButtonLink>
          )}
          {canOnProject(actor, "room.delete", project) && <DeleteRoomButton roomId={room.id} projectId={project.id} name={room.name} />}
        </>
      }
    >
      {formatLength(room.lengthM, u)} × {formatLength(room.widthM, u)} × {formatLength(room.heightM, u)} · {formatVolume(room.lengthM * room.widthM * room.heightM, u)}
    </PageHeader>
  );

  // Clients read the room but not the firm's working analysis: they get it in the signed report.
  if (!canOnProject(actor, "workspace.read", project)) {
    const { lengthM: L, widthM: W, heightM: H } = room;
    return (
      <>
        {header}
        <Card>
          <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3">
            {[
              ["Length", formatLength(L, u)],
              ["Width", formatLength(W, u)],
              ["Height", formatLength(H, u)],
              ["Volume", formatVolume(L * W * H, u)],
              ["Surface area", formatArea(2 * (L * W + L * H + W * H), u)],
            ].map(([k, v]) => (
              <div key={k}>
                <dt className="text-xs uppercase tracking-wide text-ink-faint">{k}</dt>
                <dd className="tabular-nums text-lg">{v}</dd>
              </div>
            ))}
          </dl>
        </Card>
        <div className="mt-4">
          <Notice>Your engineer&apos;s findings and recommendation for this room reach you in the signed report.</Notice>
        </div>
        <RoomFilesPanel actor={actor} roomId={room.id} />
      </>
    );
  }

  const [workspace, scenarios, builds] = await Promise.all([
    getWorkspace(db, actor, roomId),
    compareScenarios(db, actor, roomId),
    canInFirm(actor, "library.read") ? listBuilds(db, actor) : Promise.resolve([]),
  ]);
  return (
    <>
      {header}
      <Suspense>
        <RoomWorkspace
          roomId={room.id}
          initial={workspace}
          initialScenarios={scenarios}
          initialBuilds={builds}
          units={u}
          canSaveBuilds={canInFirm(actor, "library.manage")}
          roomTabFooter={<RoomFilesPanel actor={actor} roomId={room.id} />}
        />
      </Suspense>
    </>
  );
}
