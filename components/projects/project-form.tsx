"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import type { z } from "zod";
import { createProjectAction, updateProjectAction } from "@/app/(app)/projects/actions";
import { Button, ButtonLink } from "@/components/ui/button";
import { ActionError } from "@/components/ui/action-error";
import { describedBy, Field, Input, Select, Textarea } from "@/components/ui/field";
import { PROJECT_STATUS_LABEL, PROJECT_STATUSES, projectInputSchema, type ProjectInput } from "@/lib/schemas/project";

type Person = { id: string; name: string; email: string };
type FormValues = z.input<typeof projectInputSchema>;

export function ProjectForm({ initial, projectId, version, clients, builders }: { initial?: ProjectInput; projectId?: string; version?: number; clients: Person[]; builders: Person[] }) {
  const router = useRouter();
  const [formError, setFormError] = useState<{ message: string; conflict: boolean } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<FormValues, unknown, ProjectInput>({
    resolver: zodResolver(projectInputSchema),
    defaultValues: initial ?? { name: "", clientName: "", siteAddress: "", status: "survey", notes: "", clientUserId: null, builderIds: [] },
  });
  const err = (k: keyof FormValues) => formState.errors[k]?.message as string | undefined;

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const payload = { ...values, clientUserId: values.clientUserId || null };
    const result = projectId ? await updateProjectAction(projectId, { ...payload, version }) : await createProjectAction(payload);
    if (result.ok) {
      toast.success(projectId ? "Project saved" : "Project created");
      router.push(`/projects/${result.data.id}`);
      router.refresh();
      return;
    }
    for (const [field, messages] of Object.entries(result.fields ?? {})) {
      if (field in projectInputSchema.shape) setError(field as keyof FormValues, { message: messages[0] });
    }
    setFormError({ message: result.message, conflict: result.code === "conflict" });
  });

  return (
    <form onSubmit={onSubmit} className="max-w-2xl space-y-5" noValidate>
      <ActionError error={formError} />
      <div className="grid gap-5 sm:grid-cols-2">
        <Field id="name" label="Project name" error={err("name")}>
          <Input {...describedBy("name", err("name"))} {...register("name")} autoFocus />
        </Field>
        <Field id="clientName" label="Client" error={err("clientName")}>
          <Input {...describedBy("clientName", err("clientName"))} {...register("clientName")} />
        </Field>
      </div>
      <Field id="siteAddress" label="Site address" error={err("siteAddress")}>
        <Input {...describedBy("siteAddress", err("siteAddress"))} {...register("siteAddress")} />
      </Field>
      <div className="grid gap-5 sm:grid-cols-2">
        <Field id="status" label="Stage" error={err("status")}>
          <Select {...describedBy("status", err("status"))} {...register("status")}>
            {PROJECT_STATUSES.map((s) => (
              <option key={s} value={s}>
                {PROJECT_STATUS_LABEL[s]}
              </option>
            ))}
          </Select>
        </Field>
        <Field id="clientUserId" label="Client's account" hint="The client member who may read this project's published reports." error={err("clientUserId")}>
          <Select {...describedBy("clientUserId", err("clientUserId"))} {...register("clientUserId")}>
            <option value="">No client account yet</option>
            {clients.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name} ({c.email})
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <fieldset className="space-y-2">
        <legend className="text-sm font-medium">Builders on this job</legend>
        {builders.length === 0 ? (
          <p className="text-xs text-ink-faint">No builder members yet. Owners can invite them from Team.</p>
        ) : (
          <div className="flex flex-wrap gap-3">
            {builders.map((b) => (
              <label key={b.id} className="flex items-center gap-2 rounded-md border border-paper-line bg-paper-raised px-3 py-1.5 text-sm">
                <input type="checkbox" value={b.id} {...register("builderIds")} className="accent-kiln-500" />
                {b.name}
              </label>
            ))}
          </div>
        )}
      </fieldset>
      <Field id="notes" label="Notes" hint="Constraints from the survey: depth the client accepts, doors, budget…" error={err("notes")}>
        <Textarea {...describedBy("notes", err("notes"))} {...register("notes")} rows={4} />
      </Field>
      <div className="flex gap-2">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : projectId ? "Save project" : "Create project"}
        </Button>
        <ButtonLink variant="secondary" href={projectId ? `/projects/${projectId}` : "/projects"}>
          Cancel
        </ButtonLink>
      </div>
    </form>
  );
}
