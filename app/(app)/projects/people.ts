import "server-only";
import { db } from "@/db/client";
import { listMembers } from "@/db/queries/users";

/** Client and builder members of a firm, for the project form's choices. */
export async function firmPeople(firmId: string) {
  const members = (await listMembers(db, firmId)).filter((m) => m.active);
  const pick = (role: string) => members.filter((m) => m.role === role).map((m) => ({ id: m.id, name: m.name, email: m.email }));
  return { clients: pick("client"), builders: pick("builder") };
}
