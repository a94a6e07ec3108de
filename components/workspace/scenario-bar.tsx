"use client";

import { Archive, Copy, Pencil, Plus } from "lucide-react";
import { useState } from "react";
import { toast } from "sonner";
import { Button, ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Input } from "@/components/ui/field";
import type { Scenario } from "@/db/queries/scenarios";
import { DEFAULT_TARGET } from "@/lib/schemas/workspace";
import type { WorkspaceActions } from "./room-workspace";

/** Scenario management: pick, create from the baseline, duplicate, rename, archive (with undo), bring back. */
export function ScenarioBar({ roomId, scenarios, archived, current, editable, actions, onScenario }: { roomId: string; scenarios: Scenario[]; archived: { id: string; name: string }[]; current: Scenario | null; editable: boolean; actions: WorkspaceActions; onScenario: (id: string) => void }) {
  const active = scenarios.filter((s) => !s.archived);
  const baseline = scenarios.find((s) => s.isBaseline) ?? null;
  const [mode, setMode] = useState<null | "new" | "rename" | "duplicate">(null);
  const [name, setName] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  function open(m: "new" | "rename" | "duplicate") {
    setMode(m);
    setError(null);
    setName(m === "new" ? `Treated ${active.length}` : m === "rename" ? (current?.name ?? "") : `${current?.name ?? "Scenario"} (copy)`);
  }
  async function submit(e: React.FormEvent) {
    e.preventDefault();
    if (!name.trim()) return setError("Give the scenario a name.");
    setBusy(true);
    const n = name.trim();
    const r =
      mode === "new"
        ? await actions.createScenario(n, baseline?.id ?? null, current?.target ?? DEFAULT_TARGET)
        : mode === "duplicate" && current
          ? await actions.duplicateScenario(current.id, n)
          : current
            ? await actions.renameScenario(current.id, n)
            : null;
    setBusy(false);
    if (!r) return;
    if (!r.ok) return setError(r.code === "conflict" ? "Someone else changed this scenario — reload first." : r.message);
    setMode(null);
    const id = (r.data as { id?: string } | undefined)?.id;
    if (mode !== "rename" && id) onScenario(id);
  }
  async function archive(s: Scenario) {
    const r = await actions.archiveScenario(s.id, true);
    if (!r.ok) return;
    if (baseline) onScenario(baseline.id);
    toast(`“${s.name}” archived`, { action: { label: "Undo", onClick: () => void actions.archiveScenario(s.id, false).then(() => onScenario(s.id)) } });
  }

  return (
    <Card className="space-y-3 p-4">
      <div className="flex flex-wrap items-center gap-2">
        <span className="text-sm font-medium text-ink-soft">Scenario</span>
        <div role="group" aria-label="Scenarios" className="flex flex-wrap gap-1.5">
          {active.map((s) => (
            <button key={s.id} type="button" aria-pressed={current?.id === s.id} onClick={() => onScenario(s.id)} className={`rounded-md border px-3 py-1.5 text-sm ${current?.id === s.id ? "border-ink bg-ink text-paper" : "border-paper-line bg-paper-raised hover:bg-paper-sunk"}`}>
              {s.name}
              {s.isBaseline && <span className="ml-1 text-xs opacity-75">(baseline)</span>}
            </button>
          ))}
        </div>
        <span className="flex-1" />
        {active.length >= 2 && (
          <ButtonLink variant="secondary" href={`/rooms/${roomId}/compare`} className="no-print py-1.5">
            Compare scenarios
          </ButtonLink>
        )}
      </div>
      {editable && (
        <div className="no-print flex flex-wrap gap-2">
          <Button type="button" variant="secondary" className="py-1.5" onClick={() => open("new")}>
            <Plus className="h-4 w-4" aria-hidden /> New from baseline
          </Button>
          {current && (
            <>
              <Button type="button" variant="secondary" className="py-1.5" onClick={() => open("duplicate")}>
                <Copy className="h-4 w-4" aria-hidden /> Duplicate
              </Button>
              <Button type="button" variant="secondary" className="py-1.5" onClick={() => open("rename")}>
                <Pencil className="h-4 w-4" aria-hidden /> Rename
              </Button>
              {!current.isBaseline && (
                <Button type="button" variant="ghost" className="py-1.5" onClick={() => void archive(current)}>
                  <Archive className="h-4 w-4" aria-hidden /> Archive
                </Button>
              )}
            </>
          )}
        </div>
      )}
      {mode && (
        <form onSubmit={submit} className="flex flex-wrap items-end gap-2" aria-label={mode === "new" ? "New scenario" : mode === "rename" ? "Rename scenario" : "Duplicate scenario"}>
          <label className="text-sm">
            <span className="mb-1 block font-medium">{mode === "new" ? "Name of the new scenario (starts as a copy of the baseline)" : mode === "rename" ? "New name" : "Name of the copy"}</span>
            <Input value={name} onChange={(e) => setName(e.target.value)} autoFocus className="w-72" aria-label="Scenario name" />
          </label>
          <Button type="submit" disabled={busy}>
            {busy ? "Saving…" : mode === "new" ? "Create scenario" : mode === "rename" ? "Rename" : "Duplicate"}
          </Button>
          <Button type="button" variant="ghost" onClick={() => setMode(null)}>
            Cancel
          </Button>
          {error && <p role="alert" className="w-full text-sm font-medium text-outside">{error}</p>}
        </form>
      )}
      {archived.length > 0 && (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-soft">Archived ({archived.length})</summary>
          <ul className="mt-2 space-y-1">
            {archived.map((s) => (
              <li key={s.id} className="flex items-center gap-2">
                <span>{s.name}</span>
                {editable && (
                  <Button type="button" variant="ghost" className="px-2 py-0.5 text-xs" onClick={() => void actions.archiveScenario(s.id, false)}>
                    Bring back
                  </Button>
                )}
              </li>
            ))}
          </ul>
        </details>
      )}
    </Card>
  );
}
