"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { toast } from "sonner";
import { saveReportDraftAction } from "@/app/(app)/rooms/[roomId]/report/actions";
import { Button } from "@/components/ui/button";
import { Field, Select, Textarea } from "@/components/ui/field";

export interface ComposeScenario {
  id: string;
  name: string;
  isBaseline: boolean;
  itemCount: number;
}

/** The engineer's choice of scenarios (the last ticked is the recommendation), paper and note. */
export function ComposeForm(props: { roomId: string; scenarios: ComposeScenario[]; initial: { scenarioIds: string[]; paperSize: "A4" | "LETTER"; note: string } }) {
  const router = useRouter();
  const [ids, setIds] = useState<string[]>(props.initial.scenarioIds);
  const [paperSize, setPaper] = useState(props.initial.paperSize);
  const [note, setNote] = useState(props.initial.note);
  const [error, setError] = useState<string | undefined>();
  const [pending, start] = useTransition();
  const toggle = (id: string) => setIds((cur) => (cur.includes(id) ? cur.filter((x) => x !== id) : [...cur, id]));
  return (
    <form
      className="space-y-4"
      onSubmit={(e) => {
        e.preventDefault();
        start(async () => {
          const r = await saveReportDraftAction({ roomId: props.roomId, scenarioIds: ids, paperSize, note });
          if (!r.ok) {
            setError(r.fields?.scenarioIds?.[0] ?? r.message);
            return;
          }
          setError(undefined);
          toast.success("Draft saved");
          router.refresh();
        });
      }}
    >
      <fieldset>
        <legend className="mb-2 text-sm font-medium text-ink">Scenarios in the report</legend>
        <p className="mb-2 text-xs text-ink-faint">Tick in order; the last one ticked is the recommendation. The baseline is always shown as “before”.</p>
        <ul className="space-y-1.5">
          {props.scenarios.map((s) => (
            <li key={s.id}>
              <label className="flex items-center gap-2 text-sm">
                <input type="checkbox" checked={ids.includes(s.id)} onChange={() => toggle(s.id)} aria-label={s.name} />
                <span>{s.name}</span>
                <span className="text-xs text-ink-faint">
                  {s.isBaseline ? "baseline" : `${s.itemCount} item${s.itemCount === 1 ? "" : "s"}`}
                  {ids.includes(s.id) && ids[ids.length - 1] === s.id ? " · recommendation" : ""}
                </span>
              </label>
            </li>
          ))}
        </ul>
        {error && (
          <p role="alert" className="mt-2 text-xs font-medium text-outside">
            {error}
          </p>
        )}
      </fieldset>
      <Field id="paper" label="Paper size">
        <Select id="paper" value={paperSize} onChange={(e) => setPaper(e.target.value as "A4" | "LETTER")}>
          <option value="A4">A4</option>
          <option value="LETTER">US Letter</option>
        </Select>
      </Field>
      <Field id="note" label="Note to the client (optional)" hint="Printed in the summary.">
        <Textarea id="note" value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
      </Field>
      <Button type="submit" disabled={pending || ids.length === 0}>
        {pending ? "Saving…" : "Save draft"}
      </Button>
    </form>
  );
}
