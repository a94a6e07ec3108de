import { db } from "@/db/client";
import { getFeeSettings } from "@/db/queries/invoices";
import type { Project } from "@/db/queries/projects";
import type { Actor } from "@/lib/auth/actor";
import { canInFirm, canOnProject } from "@/lib/auth/permissions";
import { formatMoney } from "@/lib/payments/money";
import { projectInvoices, projectReports } from "@/lib/payments/invoices";
import { InvoicesList, type InvoiceRowView } from "./invoices-list";

/** The project's invoices: states for everyone who may see them, Pay for the client, Raise/Void for staff. */
export async function ProjectInvoicesPanel({ actor, project }: { actor: Actor; project: Project }) {
  if (!canOnProject(actor, "invoice.read", project)) return null;
  const invoices = await projectInvoices(db, actor, project.id);
  const canRaise = canOnProject(actor, "invoice.raise", project);
  const fee = canRaise ? await getFeeSettings(db, actor.firmId) : undefined;
  const reports = canRaise && fee?.basis === "per-report" ? await projectReports(db, project.id) : [];
  const live = new Set(invoices.filter((i) => i.status !== "void").map((i) => i.reportId ?? "project"));
  const rows: InvoiceRowView[] = invoices.map((i) => ({ id: i.id, description: i.description, amountText: i.amountText, status: i.status, paidAt: i.paidAt?.toISOString() ?? null, createdAt: i.createdAt.toISOString() }));
  if (!canRaise && rows.length === 0) return null;
  return (
    <section aria-labelledby="invoices-heading" className="mt-8">
      <h2 id="invoices-heading" className="mb-3 text-lg font-semibold">
        Invoices
      </h2>
      <InvoicesList
        invoices={rows}
        canPay={canOnProject(actor, "invoice.pay", project)}
        canRaise={canRaise}
        projectId={project.id}
        fee={fee && fee.amountMinor > 0 ? { basis: fee.basis, text: formatMoney(fee.amountMinor, fee.currency) } : null}
        canSetFee={canInFirm(actor, "fee.manage")}
        projectFeeRaised={live.has("project")}
        reportsToInvoice={reports.filter((r) => !live.has(r.id)).map((r) => ({ id: r.id, number: r.number }))}
      />
    </section>
  );
}
