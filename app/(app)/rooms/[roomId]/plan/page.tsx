import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { buildScenarioOf, progressOf } from "@/db/queries/build-progress";
import { getScenario } from "@/db/queries/scenarios";
import { getWorkspace } from "@/db/queries/workspace";
import { CautionsBlock } from "@/components/build-sheet/cautions-block";
import { ChooseBuildButton } from "@/components/design/choose-build-button";
import { PlanTable } from "@/components/design/plan-table";
import { ButtonLink } from "@/components/ui/button";
import { Card, EmptyState, Notice, PageHeader } from "@/components/ui/card";
import { AppError } from "@/lib/api/errors";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Treatment plan" };

export default async function PlanPage({ params, searchParams }: { params: Promise<{ roomId: string }>; searchParams: Promise<{ scenario?: string }> }) {
  const { roomId } = await params;
  const { scenario: asked } = await searchParams;
  const actor = await requireActor();
  const workspace = await getWorkspace(db, actor, roomId).catch((e: unknown) => {
    if (e instanceof AppError) return undefined;
    throw e;
  });
  if (!workspace) notFound();
  const treated = workspace.scenarios.filter((s) => !s.archived && !s.isBaseline);
  const toBuild = await buildScenarioOf(db, roomId);
  const current = treated.find((s) => s.id === asked) ?? treated.find((s) => s.id === toBuild?.id) ?? treated[0];
  const { room } = workspace;
  const header = (
    <PageHeader
      eyebrow={<Link href={`/rooms/${roomId}`} className="hover:underline">{room.name}</Link>}
      title="Treatment plan"
      actions={
        <>
          <ButtonLink variant="secondary" href={`/rooms/${roomId}/design`}>Treatment design</ButtonLink>
          <ButtonLink variant="secondary" href={`/projects/${room.projectId}/build-sheet`}>Build sheet</ButtonLink>
        </>
      }
    >
      Every item of a scenario with its build, size, place and predicted effect; the totals; and which scenario goes to the builders.
    </PageHeader>
  );
  if (!current) {
    return (
      <>
        {header}
        <EmptyState title="No treated scenario yet" action={<ButtonLink href={`/rooms/${roomId}/design`}>Design the treatment</ButtonLink>}>
          Size bass traps and reflection panels on the design page and add them to a scenario.
        </EmptyState>
      </>
    );
  }
  const scenario = await getScenario(db, actor, current.id);
  const progress = await progressOf(db, scenario.items.map((i) => i.id));
  const rv = scenario.results.reverb;
  const onSheet = toBuild?.id === scenario.id;
  return (
    <>
      {header}
      <nav aria-label="Scenarios" className="no-print mb-4 flex flex-wrap gap-2 text-sm">
        {treated.map((s) => (
          <Link key={s.id} href={`/rooms/${roomId}/plan?scenario=${s.id}`} aria-current={s.id === scenario.id ? "page" : undefined} className={`rounded-md border px-3 py-1.5 ${s.id === scenario.id ? "border-kiln-500 bg-paper-raised font-medium" : "border-paper-line hover:bg-paper-sunk"}`}>
            {s.name}
            {s.id === toBuild?.id ? " · to build" : ""}
          </Link>
        ))}
      </nav>
      <Card className="space-y-4">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <div>
            <h2 className="text-lg font-semibold">{scenario.name}</h2>
            <p className="text-sm text-ink-soft" data-testid="plan-build-status">
              {onSheet ? (toBuild?.chosen ? "This scenario is on the project's build sheet." : "On the build sheet for now, as the latest treated scenario; choose it to keep it there.") : "Not on the build sheet."}
            </p>
          </div>
          {workspace.can.editScenarios && !(onSheet && toBuild?.chosen) && <ChooseBuildButton scenarioId={scenario.id} />}
        </div>
        {scenario.items.length === 0 ? (
          <Notice>This scenario has no items yet.</Notice>
        ) : rv ? (
          <PlanTable items={scenario.items} byItem={scenario.results.items.byItem} bandsHz={rv.bandsHz} addedM2={rv.addedM2} progress={progress} />
        ) : (
          <Notice tone="caution">The analysis of this scenario is not available; reopen the room page to recompute it.</Notice>
        )}
        {scenario.results.cautions.length > 0 && (
          <ul className="space-y-1 text-sm" aria-label="Cautions for these items">
            {[...new Set(scenario.results.cautions.map((c) => c.message))].map((message) => {
              const names = scenario.results.cautions.filter((c) => c.message === message).map((c) => scenario.items.find((it) => it.id === c.itemId)?.name ?? "all items");
              return (
                <li key={message} className="text-ink-soft">
                  <span className="font-medium text-ink">{[...new Set(names)].join(", ")}:</span> {message}
                </li>
              );
            })}
          </ul>
        )}
      </Card>
      <CautionsBlock className="mt-6" />
    </>
  );
}
