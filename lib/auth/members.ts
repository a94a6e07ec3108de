import "server-only";
import type { Kysely } from "kysely";
import { countActiveOwners, findMember, type Member } from "@/db/queries/users";
import type { Database, Role } from "@/db/schema";
import { AppError, forbidden, notFound } from "@/lib/api/errors";
import type { Actor } from "./actor";
import { lucia } from "./lucia";
import { canInFirm } from "./permissions";

/** Changes a member's role or active flag; the firm always keeps at least one active owner. */
export async function updateMember(db: Kysely<Database>, actor: Actor, userId: string, change: { role?: Role; active?: boolean }): Promise<Member> {
  if (!canInFirm(actor, "member.manage")) throw forbidden("Only the firm's owners manage members.");
  const updated = await db.transaction().execute(async (trx) => {
    const member = await findMember(trx, actor.firmId, userId);
    if (!member) throw notFound("That member");
    const losesOwner = member.role === "owner" && member.active && ((change.role && change.role !== "owner") || change.active === false);
    if (losesOwner && (await countActiveOwners(trx, actor.firmId)) <= 1) {
      throw new AppError("conflict", "The firm needs at least one active owner. Make someone else owner first.");
    }
    if (userId === actor.userId && change.active === false) throw new AppError("conflict", "You cannot deactivate your own account.");
    await trx
      .updateTable("users")
      .set({ ...(change.role && { role: change.role }), ...(change.active !== undefined && { active: change.active }) })
      .where("id", "=", userId)
      .where("firm_id", "=", actor.firmId)
      .execute();
    return (await findMember(trx, actor.firmId, userId))!;
  });
  // A changed role or a deactivation takes effect at once: the person signs in again.
  if (change.active === false || change.role) await lucia.invalidateUserSessions(userId);
  return updated;
}
