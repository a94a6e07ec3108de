"use client";

import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useEffect, useState, useTransition } from "react";
import { toast } from "sonner";
import { Button } from "@/components/ui/button";
import { EmptyState, Notice } from "@/components/ui/card";
import { Select } from "@/components/ui/field";
import { cn } from "@/components/ui/cn";

export interface InvoiceRowView {
  id: string;
  description: string;
  amountText: string;
  status: "open" | "paid" | "void";
  paidAt: string | null;
  createdAt: string;
}

const STATUS: Record<InvoiceRowView["status"], { label: string; className: string }> = {
  open: { label: "Open", className: "border-near/40 bg-near-soft text-ink" },
  paid: { label: "Paid", className: "border-within/40 bg-within-soft text-ink" },
  void: { label: "Void", className: "border-paper-line bg-paper-sunk text-ink-faint line-through" },
};

const day = (iso: string) => new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

async function post(url: string, body?: unknown): Promise<{ ok: boolean; json: any }> {
  const res = await fetch(url, { method: "POST", headers: body === undefined ? {} : { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
  return { ok: res.ok, json: await res.json().catch(() => null) };
}

export function InvoicesList(props: {
  invoices: InvoiceRowView[];
  canPay: boolean;
  canRaise: boolean;
  projectId: string;
  fee: { basis: "per-report" | "per-project"; text: string } | null;
  canSetFee: boolean;
  projectFeeRaised: boolean;
  reportsToInvoice: { id: string; number: string }[];
}) {
  const { invoices, canPay, canRaise, projectId, fee } = props;
  const router = useRouter();
  const search = useSearchParams();
  const [pending, start] = useTransition();
  const [reportId, setReportId] = useState(props.reportsToInvoice[0]?.id ?? "");
  const returnedFrom = search.get("paid");
  const returned = returnedFrom ? invoices.find((i) => i.id === returnedFrom) : undefined;
  const cancelled = search.get("checkout") === "cancelled";

  // Back from the checkout before its confirmation arrived: look again a few times.
  useEffect(() => {
    if (!returned || returned.status === "paid") return;
    let tries = 0;
    const timer = setInterval(() => {
      tries += 1;
      router.refresh();
      if (tries >= 5) clearInterval(timer);
    }, 2000);
    return () => clearInterval(timer);
  }, [returned, router]);

  const pay = (id: string) =>
    start(async () => {
      const r = await post(`/api/v1/invoices/${id}/checkout`);
      if (r.ok && typeof r.json?.url === "string") window.location.assign(r.json.url);
      else toast.error(r.json?.error?.message ?? "The checkout could not be opened. Try again in a moment.");
    });
  const raise = () =>
    start(async () => {
      const r = await post("/api/v1/invoices", { projectId, ...(fee?.basis === "per-report" && { reportId }) });
      if (r.ok) {
        toast.success("Invoice raised; the client can pay it from this page.");
        router.refresh();
      } else toast.error(r.json?.error?.message ?? "The invoice could not be raised.");
    });
  const voidIt = (id: string) =>
    start(async () => {
      const r = await post(`/api/v1/invoices/${id}/void`);
      if (r.ok) {
        toast.success("Invoice voided.");
        router.refresh();
      } else toast.error(r.json?.error?.message ?? "The invoice could not be voided.");
    });

  const canRaiseNow = canRaise && fee && (fee.basis === "per-project" ? !props.projectFeeRaised : props.reportsToInvoice.length > 0);
  return (
    <div className="space-y-3">
      {returned && (
        <Notice tone={returned.status === "paid" ? "success" : "info"}>
          {returned.status === "paid" ? `Payment received for “${returned.description}”. Thank you.` : "Thank you — we are waiting for the payment provider to confirm your payment. This page updates by itself."}
        </Notice>
      )}
      {cancelled && <Notice tone="info">The checkout was cancelled; nothing was charged.</Notice>}
      {canRaise && !fee && (
        <Notice tone="info">
          No engineering fee is set for the firm yet.{" "}
          {props.canSetFee ? (
            <Link href="/settings/fees" className="font-medium underline">
              Set the fee
            </Link>
          ) : (
            "An owner sets it under Settings → Fees."
          )}
        </Notice>
      )}
      {invoices.length === 0 ? (
        <EmptyState title="No invoices yet">{canRaise && fee ? `The fee is ${fee.text} ${fee.basis === "per-report" ? "per report" : "per project"}.` : "Invoices for the engineering fee appear here."}</EmptyState>
      ) : (
        <ul className="divide-y divide-paper-line/70 rounded-[10px] border border-paper-line bg-paper-raised">
          {invoices.map((i) => (
            <li key={i.id} className="flex flex-wrap items-center gap-3 px-4 py-3" data-invoice={i.id}>
              <div className="min-w-0 flex-1">
                <div className="font-medium">{i.description}</div>
                <div className="text-xs text-ink-faint">
                  Raised {day(i.createdAt)}
                  {i.paidAt && ` · paid ${day(i.paidAt)}`}
                </div>
              </div>
              <div className="tabular-nums font-medium">{i.amountText}</div>
              <span className={cn("rounded-full border px-2.5 py-0.5 text-xs font-medium", STATUS[i.status].className)}>{STATUS[i.status].label}</span>
              {canPay && i.status === "open" && (
                <Button onClick={() => pay(i.id)} disabled={pending}>
                  {pending ? "Opening checkout…" : `Pay ${i.amountText}`}
                </Button>
              )}
              {canRaise && i.status === "open" && (
                <Button variant="ghost" onClick={() => voidIt(i.id)} disabled={pending}>
                  Void
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
      {canRaiseNow && (
        <div className="flex flex-wrap items-center gap-2">
          {fee.basis === "per-report" && (
            <Select aria-label="Report to invoice" value={reportId} onChange={(e) => setReportId(e.target.value)} className="w-auto">
              {props.reportsToInvoice.map((r) => (
                <option key={r.id} value={r.id}>
                  Report {r.number}
                </option>
              ))}
            </Select>
          )}
          <Button variant="secondary" onClick={raise} disabled={pending}>
            Raise invoice for {fee.text}
          </Button>
        </div>
      )}
    </div>
  );
}
