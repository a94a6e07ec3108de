"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import type { z } from "zod";
import { inviteMemberAction, updateMemberAction } from "@/app/(app)/members/actions";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { describedBy, Field, Input, Select } from "@/components/ui/field";
import { inviteSchema, ROLE_LABEL, ROLES, type InviteInput } from "@/lib/schemas/member";
import type { Role } from "@/db/schema";

export interface MemberView {
  id: string;
  name: string;
  email: string;
  role: Role;
  active: boolean;
  invited: boolean;
}

export function InviteForm() {
  const router = useRouter();
  const [error, setErrorText] = useState<string | null>(null);
  const { register, handleSubmit, reset, setError, formState } = useForm<z.input<typeof inviteSchema>, unknown, InviteInput>({ resolver: zodResolver(inviteSchema), defaultValues: { email: "", name: "", role: "engineer" } });
  const err = (k: "email" | "name" | "role") => formState.errors[k]?.message;
  const onSubmit = handleSubmit(async (values) => {
    setErrorText(null);
    const r = await inviteMemberAction(values);
    if (r.ok) {
      toast.success(`Invitation sent to ${values.email}`);
      reset();
      router.refresh();
      return;
    }
    for (const [f, m] of Object.entries(r.fields ?? {})) if (f === "email" || f === "name" || f === "role") setError(f, { message: m[0] });
    setErrorText(r.message);
  });
  return (
    <Card>
      <h2 className="mb-3 text-lg font-semibold">Invite someone</h2>
      <form onSubmit={onSubmit} className="grid items-end gap-4 sm:grid-cols-[1fr_1fr_10rem_auto]" noValidate>
        <Field id="invite-name" label="Name" error={err("name")}>
          <Input {...describedBy("invite-name", err("name"))} {...register("name")} />
        </Field>
        <Field id="invite-email" label="E-mail" error={err("email")}>
          <Input {...describedBy("invite-email", err("email"))} type="email" {...register("email")} />
        </Field>
        <Field id="invite-role" label="Role" error={err("role")}>
          <Select {...describedBy("invite-role", err("role"))} {...register("role")}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABEL[r]}
              </option>
            ))}
          </Select>
        </Field>
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Sending…" : "Send invitation"}
        </Button>
      </form>
      {error && (
        <div className="mt-3">
          <Notice tone="error">{error}</Notice>
        </div>
      )}
    </Card>
  );
}

export function MemberRow({ member, canManage, isSelf }: { member: MemberView; canManage: boolean; isSelf: boolean }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const change = (input: { role?: Role; active?: boolean }) =>
    start(async () => {
      const r = await updateMemberAction(member.id, input);
      if (r.ok) {
        toast.success(`${member.name} updated`);
        router.refresh();
      } else toast.error(r.message);
    });
  return (
    <tr className="border-t border-paper-line/70">
      <td className="px-3 py-2.5">
        <div className="font-medium">
          {member.name} {isSelf && <span className="text-xs text-ink-faint">(you)</span>}
        </div>
        <div className="text-xs text-ink-soft">{member.email}</div>
      </td>
      <td className="px-3 py-2.5">
        {canManage && !isSelf ? (
          <select aria-label={`Role of ${member.name}`} value={member.role} disabled={pending} onChange={(e) => change({ role: e.target.value as Role })} className="rounded-md border border-paper-line bg-paper-raised px-2 py-1 text-sm">
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABEL[r]}
              </option>
            ))}
          </select>
        ) : (
          ROLE_LABEL[member.role]
        )}
      </td>
      <td className="px-3 py-2.5 text-sm">{!member.active ? <span className="text-outside">Deactivated</span> : member.invited ? <span className="text-near">Invited</span> : <span className="text-within">Active</span>}</td>
      <td className="px-3 py-2.5 text-right">
        {canManage && !isSelf && (
          <Button variant={member.active ? "ghost" : "secondary"} disabled={pending} onClick={() => change({ active: !member.active })}>
            {member.active ? "Deactivate" : "Reactivate"}
          </Button>
        )}
      </td>
    </tr>
  );
}
