"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { markProgressAction } from "@/app/(app)/projects/[projectId]/build-sheet/actions";
import { Button } from "@/components/ui/button";
import type { ItemProgress } from "@/db/queries/build-progress";

const localToday = () => {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, "0")}-${String(d.getDate()).padStart(2, "0")}`;
};

/** The builder's marks for one item: built, then installed, each on a day (today by default); the last mark can be taken back. */
export function ProgressControls({ projectId, itemId, itemName, progress }: { projectId: string; itemId: string; itemName: string; progress: ItemProgress }) {
  const router = useRouter();
  const [day, setDay] = useState(localToday);
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const send = (input: Record<string, string | null>) =>
    start(async () => {
      setError(null);
      const r = await markProgressAction(projectId, itemId, input);
      if (r.ok) router.refresh();
      else setError(Object.values(r.fields ?? {})[0]?.[0] ?? r.message);
    });
  const next = !progress.builtOn ? "built" : !progress.installedOn ? "installed" : null;
  return (
    <div className="flex flex-wrap items-center gap-1.5">
      {next && (
        <>
          <input type="date" value={day} max={localToday()} onChange={(e) => setDay(e.target.value)} aria-label={`Day ${itemName} was ${next}`} className="rounded-md border border-paper-line bg-paper-raised px-2 py-1 text-xs" />
          <Button type="button" className="px-2.5 py-1 text-xs" disabled={pending || !day} onClick={() => send(next === "built" ? { builtOn: day } : { installedOn: day })} aria-label={`Mark ${itemName} ${next}`}>
            Mark {next}
          </Button>
        </>
      )}
      {progress.builtOn && (
        <Button type="button" variant="ghost" className="px-2 py-1 text-xs" disabled={pending} onClick={() => send(progress.installedOn ? { installedOn: null } : { builtOn: null })} aria-label={`Take back the last mark of ${itemName}`}>
          Undo {progress.installedOn ? "installed" : "built"}
        </Button>
      )}
      {error && (
        <span role="alert" className="w-full text-xs text-outside">
          {error}
        </span>
      )}
    </div>
  );
}
