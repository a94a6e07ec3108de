import { db } from "@/db/client";
import { apiRoute, readJson } from "@/lib/api/route";
import { updateMember } from "@/lib/auth/members";
import { canInFirm } from "@/lib/auth/permissions";
import { forbidden } from "@/lib/api/errors";
import { memberUpdateSchema } from "@/lib/schemas/member";

export const PATCH = apiRoute<{ userId: string }>(async ({ request, actor, params }) => {
  if (!canInFirm(actor, "member.manage")) throw forbidden("Only the firm's owners manage members.");
  const input = await readJson(request, memberUpdateSchema);
  return { body: { member: await updateMember(db, actor, params.userId, input) } };
});
