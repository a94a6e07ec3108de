import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { projectBuildSheet } from "@/db/queries/build-progress";
import { BuildSheetView } from "@/components/build-sheet/build-sheet-view";
import { PrintButton } from "@/components/build-sheet/print-button";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/card";
import { AppError } from "@/lib/api/errors";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Build sheet" };

export default async function BuildSheetPage({ params, searchParams }: { params: Promise<{ projectId: string }>; searchParams: Promise<{ units?: string }> }) {
  const { projectId } = await params;
  const { units: askedUnits } = await searchParams;
  const actor = await requireActor();
  const units = askedUnits === "metric" || askedUnits === "imperial" ? askedUnits : actor.unitSystem;
  const data = await projectBuildSheet(db, actor, projectId, units).catch((e: unknown) => {
    if (e instanceof AppError) return undefined;
    throw e;
  });
  if (!data) notFound();
  const other = units === "metric" ? "imperial" : "metric";
  return (
    <>
      <PageHeader
        eyebrow={<Link href={`/projects/${projectId}`} className="hover:underline">{data.project.name}</Link>}
        title="Build sheet"
        actions={
          <>
            <ButtonLink variant="secondary" href={`/projects/${projectId}/build-sheet?units=${other}`}>
              Show in {other === "metric" ? "millimetres" : "inches"}
            </ButtonLink>
            {canInFirm(actor, "price-list.manage") && (
              <ButtonLink variant="secondary" href="/settings/prices">
                Price list
              </ButtonLink>
            )}
            <PrintButton />
          </>
        }
      >
        {data.project.clientName}
        {data.project.siteAddress && ` · ${data.project.siteAddress}`} · {units === "metric" ? "metric" : "imperial"} · printed {new Date().toISOString().slice(0, 10)}
      </PageHeader>
      <BuildSheetView data={data} canEditPrices={canInFirm(actor, "price-list.manage")} />
    </>
  );
}
