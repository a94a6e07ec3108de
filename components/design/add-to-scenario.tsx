"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { addProposalAction } from "@/app/(app)/rooms/[roomId]/design/actions";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import type { NewItem } from "./proposal-items";

export interface ScenarioChoice {
  id: string;
  name: string;
  isBaseline: boolean;
  version: number;
}

/**
 * "Add to scenario": the items go into an existing treated scenario, or into a new scenario that starts
 * as a copy of `fromScenario` (the default, so the one that was sized stays as it was).
 */
export function AddToScenario({ roomId, items, scenarios, fromScenario, suggestedName, label = "Add to scenario", testId }: { roomId: string; items: NewItem[]; scenarios: ScenarioChoice[]; fromScenario: ScenarioChoice | undefined; suggestedName: string; label?: string; testId: string }) {
  const router = useRouter();
  const treated = scenarios.filter((s) => !s.isBaseline);
  const [into, setInto] = useState<string>("new");
  const [name, setName] = useState(suggestedName);
  const [pending, start] = useTransition();
  const [outcome, setOutcome] = useState<{ ok: true; scenarioId: string; added: number } | { ok: false; message: string; fields?: Record<string, string[]> } | null>(null);

  const submit = () =>
    start(async () => {
      const target = treated.find((s) => s.id === into);
      const r = await addProposalAction(roomId, {
        into: target ? { kind: "existing", scenarioId: target.id, version: target.version } : { kind: "new", name, copyFromScenarioId: fromScenario?.id ?? null },
        items,
      });
      if (r.ok) {
        setOutcome({ ok: true, scenarioId: r.data.scenarioId, added: r.data.added });
        router.refresh();
      } else setOutcome({ ok: false, message: r.message, fields: r.fields });
    });

  return (
    <div className="space-y-2 rounded-md border border-paper-line bg-paper-sunk/60 p-3 text-sm" data-testid={testId}>
      <div className="flex flex-wrap items-end gap-2">
        <label className="block min-w-72 flex-[2] space-y-1">
          <span className="font-medium">Into</span>
          <Select value={into} onChange={(e) => setInto(e.target.value)} aria-label="Scenario to add to">
            <option value="new">A new scenario{fromScenario ? ` (copy of “${fromScenario.name}”)` : ""}</option>
            {treated.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </Select>
        </label>
        {into === "new" && (
          <label className="block min-w-48 flex-1 space-y-1">
            <span className="font-medium">Name</span>
            <Input value={name} onChange={(e) => setName(e.target.value)} aria-label="Name of the new scenario" maxLength={120} />
          </label>
        )}
        <Button type="button" onClick={submit} disabled={pending || items.length === 0}>
          {pending ? "Adding…" : `${label} (${items.reduce((s, i) => s + i.count, 0)} units)`}
        </Button>
      </div>
      {outcome?.ok && (
        <p role="status" className="text-within">
          Added {outcome.added} item{outcome.added === 1 ? "" : "s"}.{" "}
          <Link className="font-medium underline" href={`/rooms/${roomId}/plan?scenario=${outcome.scenarioId}`}>
            Open the treatment plan
          </Link>
        </p>
      )}
      {outcome && !outcome.ok && (
        <div role="alert" className="text-outside">
          <p className="font-medium">{outcome.message}</p>
          {outcome.fields && (
            <ul className="list-disc pl-5 text-xs">
              {Object.entries(outcome.fields)
                .slice(0, 6)
                .map(([k, v]) => (
                  <li key={k}>
                    {k}: {v.join("; ")}
                  </li>
                ))}
            </ul>
          )}
        </div>
      )}
    </div>
  );
}
