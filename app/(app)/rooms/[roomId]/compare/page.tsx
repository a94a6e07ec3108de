import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Suspense } from "react";
import { db } from "@/db/client";
import { compareScenarios } from "@/db/queries/scenarios";
import { getWorkspace } from "@/db/queries/workspace";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { CompareView } from "@/components/workspace/compare-view";
import { AppError } from "@/lib/api/errors";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Compare scenarios" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ roomId: string }>; searchParams: Promise<{ ids?: string }> }) {
  const { roomId } = await params;
  const { ids: rawIds } = await searchParams;
  const actor = await requireActor();
  const workspace = await getWorkspace(db, actor, roomId).catch((e: unknown) => {
    if (e instanceof AppError) return undefined;
    throw e;
  });
  if (!workspace) notFound();
  const active = workspace.scenarios.filter((s) => !s.archived);
  const known = new Set(active.map((s) => s.id));
  const asked = rawIds?.split(",").filter((id) => known.has(id));
  const ids = asked && asked.length > 0 ? asked : active.map((s) => s.id);
  const scenarios = ids.length ? await compareScenarios(db, actor, roomId, ids) : [];
  return (
    <>
      <PageHeader
        eyebrow={<Link href={`/rooms/${roomId}?tab=decay`} className="hover:underline">{workspace.room.name}</Link>}
        title="Compare scenarios"
        actions={<ButtonLink variant="secondary" href={`/rooms/${roomId}?tab=decay`}>Back to the room</ButtonLink>}
      >
        Side by side: decay per band, bass at the main seat, cost and count of items.
      </PageHeader>
      <Suspense>
        <CompareView roomId={roomId} all={active.map((s) => ({ id: s.id, name: s.name, isBaseline: s.isBaseline }))} initial={scenarios} initialIds={ids} />
      </Suspense>
    </>
  );
}
