"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { toast } from "sonner";
import { approveReportAction, postReportCommentAction } from "@/app/(app)/projects/[projectId]/reports/actions";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";

export function ApproveForm({ projectId, revisionId, revision }: { projectId: string; revisionId: string; revision: number }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string>();
  return (
    <div className="space-y-2">
      <Button
        disabled={pending}
        onClick={() =>
          start(async () => {
            const r = await approveReportAction(projectId, revisionId, {});
            if (!r.ok) return setError(r.message);
            toast.success("Thank you: the recommendation is approved");
            router.refresh();
          })
        }
      >
        {pending ? "Approving…" : `Approve the recommendation (revision ${revision})`}
      </Button>
      {error && (
        <p role="alert" className="text-xs font-medium text-outside">
          {error}
        </p>
      )}
    </div>
  );
}

export function CommentForm({ projectId, reportId, asStaff }: { projectId: string; reportId: string; asStaff: boolean }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [body, setBody] = useState("");
  const [error, setError] = useState<string>();
  const id = `comment-${reportId}`;
  return (
    <form
      className="space-y-2"
      onSubmit={(e) => {
        e.preventDefault();
        start(async () => {
          const r = await postReportCommentAction(projectId, reportId, { body });
          if (!r.ok) return setError(r.fields?.body?.[0] ?? r.message);
          setBody("");
          setError(undefined);
          router.refresh();
        });
      }}
    >
      <Field id={id} label={asStaff ? "Answer" : "Ask a question"} error={error}>
        <Textarea id={id} value={body} maxLength={4000} onChange={(e) => setBody(e.target.value)} />
      </Field>
      <Button type="submit" variant="secondary" disabled={pending || body.trim() === ""}>
        {asStaff ? "Send answer" : "Send question"}
      </Button>
    </form>
  );
}
