"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { toast } from "sonner";
import { issueReportAction, reportSettingsAction, sendReportAction } from "@/app/(app)/rooms/[roomId]/report/actions";
import { ActionButton } from "@/components/ui/action-button";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";

export function IssueButton({ roomId, revisionId }: { roomId: string; revisionId: string }) {
  return (
    <ActionButton
      pendingLabel="Signing…"
      run={() => issueReportAction(roomId, revisionId)}
      success={(d) => `Issued and signed (render ${(d.renderMs / 1000).toFixed(1)} s, sign ${(d.signMs / 1000).toFixed(1)} s)`}
    >
      Issue and sign
    </ActionButton>
  );
}

/** Sends the issued revision; asks for the client's address when the project has no client account. */
export function SendForm({ roomId, revisionId, needsRecipient, clientLabel }: { roomId: string; revisionId: string; needsRecipient: boolean; clientLabel: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [email, setEmail] = useState("");
  const [name, setName] = useState("");
  const [error, setError] = useState<string>();
  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        start(async () => {
          const r = await sendReportAction(roomId, revisionId, needsRecipient ? { email, name } : {});
          if (!r.ok) return setError(r.fields?.email?.[0] ?? r.message);
          setError(undefined);
          toast.success(`Sent to ${r.data.to}${r.data.invited ? " with an invitation" : ""}`);
          router.refresh();
        });
      }}
    >
      {needsRecipient ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field id="client-email" label="Client's e-mail">
            <Input id="client-email" type="email" value={email} onChange={(e) => setEmail(e.target.value)} required />
          </Field>
          <Field id="client-name" label="Client's name">
            <Input id="client-name" value={name} onChange={(e) => setName(e.target.value)} required />
          </Field>
        </div>
      ) : (
        <p className="text-sm text-ink-soft">To {clientLabel}.</p>
      )}
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? "Sending…" : "Send to client"}
      </Button>
      {error && (
        <p role="alert" className="text-xs font-medium text-outside">
          {error}
        </p>
      )}
    </form>
  );
}

export function AttachSetting({ roomId, attachPdf }: { roomId: string; attachPdf: boolean }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  return (
    <label className="flex items-center gap-2 text-sm">
      <input
        type="checkbox"
        checked={attachPdf}
        disabled={pending}
        onChange={(e) =>
          start(async () => {
            const r = await reportSettingsAction(roomId, { attachPdf: e.target.checked });
            if (!r.ok) toast.error(r.message);
            router.refresh();
          })
        }
      />
      Attach the signed PDF to report e-mails (firm setting)
    </label>
  );
}
