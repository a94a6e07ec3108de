"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { approveReportAction, postReportCommentAction } from "@/app/(app)/projects/[projectId]/reports/actions";
import { ActionButton } from "@/components/ui/action-button";
import { Button } from "@/components/ui/button";
import { Field, Textarea } from "@/components/ui/field";

export function ApproveForm({ projectId, revisionId, revision }: { projectId: string; revisionId: string; revision: number }) {
  return (
    <ActionButton pendingLabel="Approving…" run={() => approveReportAction(projectId, revisionId, {})} success={() => "Thank you: the recommendation is approved"}>
      Approve the recommendation (revision {revision})
    </ActionButton>
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
