import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { getFeeSettings } from "@/db/queries/invoices";
import { FeeSettingsForm } from "@/components/payments/fee-settings-form";
import { PageHeader } from "@/components/ui/card";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { FEE_CURRENCIES, fromMinorUnits } from "@/lib/payments/money";

export const metadata: Metadata = { title: "Fees" };

export default async function FeeSettingsPage() {
  const actor = await requireActor();
  if (!canInFirm(actor, "fee.manage")) notFound();
  const fee = await getFeeSettings(db, actor.firmId);
  return (
    <>
      <PageHeader title="Engineering fee">What clients pay for a recommendation, and whether their report waits for the payment.</PageHeader>
      <FeeSettingsForm
        initial={fee ? { basis: fee.basis, amount: fromMinorUnits(fee.amountMinor), currency: FEE_CURRENCIES.find((c) => c === fee.currency) ?? "EUR", downloadsWaitForPayment: fee.downloadsWaitForPayment } : undefined}
        updatedAt={fee?.updatedAt.toISOString()}
      />
    </>
  );
}
