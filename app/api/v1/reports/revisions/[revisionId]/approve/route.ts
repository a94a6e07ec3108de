import { db } from "@/db/client";
import { approveRevision } from "@/db/queries/reports";
import { apiRoute, readOptionalJson } from "@/lib/api/route";
import { reportApproveSchema } from "@/lib/report/schemas";

type P = { revisionId: string };

export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  const { note } = await readOptionalJson(request, reportApproveSchema) ?? { note: "" };
  const { approval } = await approveRevision(db, actor, params.revisionId, note);
  return { body: { approval }, status: 201 };
});
