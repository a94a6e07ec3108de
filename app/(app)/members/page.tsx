import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { db } from "@/db/client";
import { listMembers } from "@/db/queries/users";
import { InviteForm, MemberRow } from "@/components/members/members-panel";
import { PageHeader } from "@/components/ui/card";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Team" };

export default async function MembersPage() {
  const actor = await requireActor();
  if (!canInFirm(actor, "member.list")) notFound();
  const canManage = canInFirm(actor, "member.manage");
  const members = await listMembers(db, actor.firmId);
  return (
    <>
      <PageHeader title="Team">Everyone who works in or receives work from the firm, and what each may do.</PageHeader>
      <div className="space-y-6">
        {canManage && <InviteForm />}
        <div className="overflow-x-auto rounded-[10px] border border-paper-line bg-paper-raised">
          <table className="w-full text-sm">
            <caption className="sr-only">Members of the firm</caption>
            <thead className="bg-paper-sunk/70 text-left text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th scope="col" className="px-3 py-2 font-medium">Person</th>
                <th scope="col" className="px-3 py-2 font-medium">Role</th>
                <th scope="col" className="px-3 py-2 font-medium">Status</th>
                <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {members.map((m) => (
                <MemberRow key={m.id} member={{ id: m.id, name: m.name, email: m.email, role: m.role, active: m.active, invited: m.invited }} canManage={canManage} isSelf={m.id === actor.userId} />
              ))}
            </tbody>
          </table>
        </div>
        <p className="text-xs text-ink-faint">Owners manage members and billing · engineers design and issue reports · builders see their jobs&apos; build sheets · clients read their own projects&apos; published reports.</p>
      </div>
    </>
  );
}
