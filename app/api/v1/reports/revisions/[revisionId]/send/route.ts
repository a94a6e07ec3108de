import { db } from "@/db/client";
import { apiRoute, readOptionalJson } from "@/lib/api/route";
import { sendRevision } from "@/lib/report/delivery";
import { reportSendSchema } from "@/lib/report/schemas";

type P = { revisionId: string };

export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  const input = await readOptionalJson(request, reportSendSchema) ?? {};
  const recipient = input.email && input.name ? { email: input.email, name: input.name } : undefined;
  return { body: { sent: await sendRevision(db, actor, params.revisionId, recipient) } };
});
