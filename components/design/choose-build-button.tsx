"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { chooseBuildScenarioAction } from "@/app/(app)/rooms/[roomId]/plan/actions";
import { Button } from "@/components/ui/button";

/** Puts the scenario on the project's build sheet for its room. */
export function ChooseBuildButton({ scenarioId }: { scenarioId: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex items-center gap-2">
      <Button
        type="button"
        disabled={pending}
        onClick={() =>
          start(async () => {
            const r = await chooseBuildScenarioAction(scenarioId);
            if (r.ok) router.refresh();
            else setError(r.message);
          })
        }
      >
        {pending ? "Saving…" : "Build this scenario"}
      </Button>
      {error && <span role="alert" className="text-sm text-outside">{error}</span>}
    </span>
  );
}
