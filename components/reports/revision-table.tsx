import type { Report } from "@/db/queries/reports";

const STATUS: Record<string, string> = { draft: "Draft (not signed)", issued: "Issued", superseded: "Superseded" };

/** The revisions of a report, newest first; superseded ones are marked and stay downloadable. */
export function RevisionTable({ report }: { report: Report }) {
  return (
    <table className="w-full text-sm">
      <thead>
        <tr className="border-b border-paper-line text-left text-xs uppercase tracking-wide text-ink-faint">
          <th className="py-1.5 pr-3">Revision</th>
          <th className="py-1.5 pr-3">Status</th>
          <th className="py-1.5 pr-3">Signed</th>
          <th className="py-1.5 pr-3">Approved</th>
          <th className="py-1.5">File</th>
        </tr>
      </thead>
      <tbody>
        {report.revisions.map((r) => (
          <tr key={r.id} className="border-b border-paper-line/60 align-top" data-revision={r.revision} data-status={r.status}>
            <td className="py-2 pr-3 tabular-nums">{r.revision}</td>
            <td className={`py-2 pr-3 ${r.status === "superseded" ? "text-ink-faint line-through decoration-1" : r.status === "issued" ? "font-medium text-within" : "text-near"}`}>
              {STATUS[r.status]}
              {r.status === "superseded" && <span className="ml-1 no-underline">· replaced by a newer revision</span>}
            </td>
            <td className="py-2 pr-3 text-ink-soft">{r.signedAt ? `${r.signerName}, ${r.signedAt.toISOString().slice(0, 16).replace("T", " ")} UTC` : "—"}</td>
            <td className="py-2 pr-3 text-ink-soft">{r.approvals.length ? r.approvals.map((a) => `${a.userName}, ${a.approvedAt.toISOString().slice(0, 16).replace("T", " ")} UTC`).join("; ") : "—"}</td>
            <td className="py-2">
              <a className="text-kiln-600 underline" href={`/api/v1/reports/revisions/${r.id}/pdf`}>
                {r.status === "draft" ? "Preview" : "Download PDF"}
              </a>
              {r.sha256 && <div className="mt-0.5 break-all font-mono text-[10px] text-ink-faint">SHA-256 {r.sha256}</div>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
