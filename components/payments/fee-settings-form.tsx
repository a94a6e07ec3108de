"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { toast } from "sonner";
import type { z } from "zod";
import { saveFeeSettingsAction } from "@/app/(app)/settings/fees/actions";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { describedBy, Field, Input, Select } from "@/components/ui/field";
import { FEE_CURRENCIES } from "@/lib/payments/money";
import { feeSettingsSchema, type FeeSettingsInput } from "@/lib/payments/schemas";

type FormValues = z.input<typeof feeSettingsSchema>;

export function FeeSettingsForm({ initial, updatedAt }: { initial?: FormValues; updatedAt?: string }) {
  const router = useRouter();
  const [error, setErrorText] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<FormValues, unknown, FeeSettingsInput>({
    resolver: zodResolver(feeSettingsSchema),
    defaultValues: initial ?? { basis: "per-project", amount: "", currency: "EUR", downloadsWaitForPayment: false },
  });
  const err = (k: keyof FormValues) => formState.errors[k]?.message;
  const onSubmit = handleSubmit(async (values) => {
    setErrorText(null);
    const r = await saveFeeSettingsAction(values);
    if (r.ok) {
      toast.success(`Fee saved: ${r.data.summary}`);
      router.refresh();
      return;
    }
    for (const [f, m] of Object.entries(r.fields ?? {})) if (f === "basis" || f === "amount" || f === "currency") setError(f, { message: m[0] });
    setErrorText(r.message);
  });
  return (
    <Card className="max-w-2xl">
      <form onSubmit={onSubmit} className="space-y-5" noValidate>
        {!initial && <Notice tone="info">No fee is set yet: projects show no invoices until you set one.</Notice>}
        <fieldset className="space-y-2">
          <legend className="text-sm font-medium text-ink">Charged</legend>
          <label className="flex items-start gap-2 text-sm">
            <input type="radio" value="per-project" {...register("basis")} className="mt-1" />
            <span>
              <span className="font-medium">Per project</span> — one invoice covers every report of the project.
            </span>
          </label>
          <label className="flex items-start gap-2 text-sm">
            <input type="radio" value="per-report" {...register("basis")} className="mt-1" />
            <span>
              <span className="font-medium">Per report</span> — each issued report is invoiced on its own.
            </span>
          </label>
          {err("basis") && <p className="text-xs font-medium text-outside">{err("basis")}</p>}
        </fieldset>
        <div className="grid gap-4 sm:grid-cols-[1fr_10rem]">
          <Field id="fee-amount" label="Amount" hint="Before any taxes you add on your own invoice paper; e.g. 850 or 850.00." error={err("amount")}>
            <Input {...describedBy("fee-amount", err("amount"))} inputMode="decimal" autoComplete="off" {...register("amount")} />
          </Field>
          <Field id="fee-currency" label="Currency" error={err("currency")}>
            <Select {...describedBy("fee-currency", err("currency"))} {...register("currency")}>
              {FEE_CURRENCIES.map((c) => (
                <option key={c} value={c}>
                  {c}
                </option>
              ))}
            </Select>
          </Field>
        </div>
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" {...register("downloadsWaitForPayment")} className="mt-1" />
          <span>
            <span className="font-medium">Report downloads wait for payment.</span> The client sees the issued report is ready, and can download it once the invoice covering it is paid. Your own team always can.
          </span>
        </label>
        {error && <Notice tone="error">{error}</Notice>}
        <div className="flex items-center gap-3">
          <Button type="submit" disabled={formState.isSubmitting}>
            {formState.isSubmitting ? "Saving…" : "Save fee"}
          </Button>
          {updatedAt && <span className="text-xs text-ink-faint">Last changed {new Date(updatedAt).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short" })}</span>}
        </div>
      </form>
    </Card>
  );
}
