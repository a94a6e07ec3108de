import { db } from "@/db/client";
import { apiRoute } from "@/lib/api/route";
import { issueRevision } from "@/lib/report/delivery";

type P = { revisionId: string };

export const POST = apiRoute<P>(async ({ actor, params }) => {
  const { revision, renderMs, signMs } = await issueRevision(db, actor, params.revisionId);
  return { body: { revision, timings: { renderMs, signMs } } };
});
