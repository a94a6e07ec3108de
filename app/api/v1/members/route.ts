import { db } from "@/db/client";
import { listMembers } from "@/db/queries/users";
import { forbidden } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { inviteMember } from "@/lib/auth/flows";
import { canInFirm } from "@/lib/auth/permissions";
import { inviteSchema } from "@/lib/schemas/member";

export const GET = apiRoute(async ({ actor }) => {
  if (!canInFirm(actor, "member.list")) throw forbidden();
  return { body: { members: await listMembers(db, actor.firmId) } };
});

export const POST = apiRoute(async ({ request, actor }) => {
  if (!canInFirm(actor, "member.manage")) throw forbidden("Only the firm's owners invite members.");
  const input = await readJson(request, inviteSchema);
  return { body: await inviteMember(db, actor, input), status: 201 };
});
