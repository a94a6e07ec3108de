import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { getPriceList } from "@/db/queries/price-lists";
import { EMPTY_PRICE_LIST } from "@/lib/build-sheet/job-from-items";
import { PriceListForm } from "@/components/build-sheet/price-list-form";
import { PageHeader } from "@/components/ui/card";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Price list" };

export default async function PriceListPage() {
  const actor = await requireActor();
  if (!canInFirm(actor, "price-list.manage")) notFound();
  const list = await getPriceList(db, actor);
  const { version, updatedAt, updatedBy: _by, ...values } = list ?? { ...EMPTY_PRICE_LIST, version: 0, updatedAt: null, updatedBy: null };
  return (
    <>
      <PageHeader title="Price list">Materials prices and stock sizes the build sheets count and price from.</PageHeader>
      <PriceListForm initial={values} version={version} updatedAt={updatedAt ? updatedAt.toISOString() : null} />
    </>
  );
}
