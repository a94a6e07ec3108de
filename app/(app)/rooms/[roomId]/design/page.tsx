import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { getWorkspace } from "@/db/queries/workspace";
import { DesignWorkspace } from "@/components/design/design-workspace";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { AppError } from "@/lib/api/errors";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Treatment design" };

export default async function DesignPage({ params, searchParams }: { params: Promise<{ roomId: string }>; searchParams: Promise<{ scenario?: string }> }) {
  const { roomId } = await params;
  const { scenario } = await searchParams;
  const actor = await requireActor();
  const workspace = await getWorkspace(db, actor, roomId).catch((e: unknown) => {
    if (e instanceof AppError) return undefined;
    throw e;
  });
  if (!workspace) notFound();
  const active = workspace.scenarios.filter((s) => !s.archived);
  const initial = active.find((s) => s.id === scenario) ?? active.find((s) => !s.isBaseline) ?? active[0]!;
  const { room } = workspace;
  return (
    <>
      <PageHeader
        eyebrow={<Link href={`/rooms/${roomId}`} className="hover:underline">{room.name}</Link>}
        title="Treatment design"
        actions={
          <>
            <ButtonLink variant="secondary" href={`/rooms/${roomId}/plan`}>
              Treatment plan
            </ButtonLink>
            <ButtonLink variant="secondary" href={`/rooms/${roomId}`}>
              Back to the room
            </ButtonLink>
          </>
        }
      >
        Size the bass traps toward the target within your limits, and find where the first reflections land.
      </PageHeader>
      <DesignWorkspace
        roomId={roomId}
        room={{ lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM }}
        scenarios={active.map((s) => ({ id: s.id, name: s.name, isBaseline: s.isBaseline, version: s.version }))}
        initialScenarioId={initial.id}
        canEdit={workspace.can.editScenarios}
        openings={workspace.surfaces.flatMap((s) => s.openings.map((o) => ({ surface: s.surface, uM: o.uM, vM: o.vM, widthM: o.widthM, heightM: o.heightM, label: o.label || o.kind })))}
        speakers={workspace.sources.filter((s) => s.kind === "main-speaker").map((s) => ({ id: s.name || s.id, xM: s.xM, yM: s.yM }))}
        seats={workspace.seats.map((s) => ({ id: s.name || s.id, xM: s.xM, yM: s.yM, isMain: s.isMain }))}
      />
    </>
  );
}
