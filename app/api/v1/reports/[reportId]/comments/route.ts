import { db } from "@/db/client";
import { listComments } from "@/db/queries/reports";
import { apiRoute, readJson } from "@/lib/api/route";
import { postComment } from "@/lib/report/comments";
import { reportCommentSchema } from "@/lib/report/schemas";

type P = { reportId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { comments: await listComments(db, actor, params.reportId) } }));

export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  const { body } = await readJson(request, reportCommentSchema);
  return { body: { comment: await postComment(db, actor, params.reportId, body) }, status: 201 };
});
