import { db } from "@/db/client";
import { revisionFor } from "@/db/queries/reports";
import { apiRoute } from "@/lib/api/route";
import { downloadRevision, previewRevision } from "@/lib/report/delivery";

type P = { revisionId: string };

function pdfResponse(pdf: Buffer, filename: string, inline: boolean): Response {
  return new Response(new Uint8Array(pdf), {
    status: 200,
    headers: {
      "content-type": "application/pdf",
      "content-length": String(pdf.length),
      "content-disposition": `${inline ? "inline" : "attachment"}; filename="${filename}"`,
      "cache-control": "private, no-store",
    },
  });
}

export const GET = apiRoute<P>(async ({ request, actor, params }) => {
  const inline = new URL(request.url).searchParams.get("inline") === "1";
  const { revision } = await revisionFor(db, actor, params.revisionId, "report.read-issued");
  if (revision.status === "draft") {
    const { pdf, filename } = await previewRevision(db, actor, params.revisionId);
    return pdfResponse(pdf, filename, true);
  }
  const { pdf, filename } = await downloadRevision(db, actor, params.revisionId);
  return pdfResponse(pdf, filename, inline);
});
