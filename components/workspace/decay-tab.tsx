"use client";

import { useState } from "react";
import { BandBarsPlot } from "@/components/plots/band-bars-plot";
import { Button } from "@/components/ui/button";
import { Card, EmptyState, Notice } from "@/components/ui/card";
import { Input, Select } from "@/components/ui/field";
import type { Build } from "@/db/queries/builds";
import type { Scenario } from "@/db/queries/scenarios";
import type { Workspace } from "@/db/queries/workspace";
import type { ScenarioTarget } from "@/lib/schemas/workspace";
import type { UnitSystem } from "@/lib/units/length";
import { ItemsPanel } from "./items-panel";
import type { WorkspaceActions } from "./room-workspace";
import { ScenarioBar } from "./scenario-bar";
import { VerdictMark } from "./verdict-mark";

const fmtHz = (f: number) => (f >= 1000 ? `${f / 1000}k` : String(f));
const s2 = (v: number) => v.toFixed(2);
const signed = (v: number) => `${v > 0 ? "+" : v < 0 ? "−" : "±"}${Math.abs(v).toFixed(2)}`;

function TargetForm({ target, editable, onSave }: { target: ScenarioTarget; editable: boolean; onSave: (t: ScenarioTarget) => Promise<string | void> }) {
  const [kind, setKind] = useState(target.kind);
  const [lower, setLower] = useState(target.kind === "small-room" ? String(target.lowerS) : "0.20");
  const [upper, setUpper] = useState(target.kind === "small-room" ? String(target.upperS) : "0.40");
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    let t: ScenarioTarget;
    if (kind === "listening-room") t = { kind };
    else {
      const lo = Number(lower.replace(",", ".")), hi = Number(upper.replace(",", "."));
      if (!(lo >= 0.05 && hi <= 5 && hi > lo)) return setError("The band runs from a lower to a higher time, between 0.05 and 5 s.");
      t = { kind, lowerS: lo, upperS: hi };
    }
    setBusy(true);
    const m = await onSave(t);
    setBusy(false);
    if (m) setError(m);
  }
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3" aria-label="Target">
      <label className="text-sm">
        <span className="mb-1 block font-medium">Target</span>
        <Select value={kind} disabled={!editable} onChange={(e) => setKind(e.target.value as ScenarioTarget["kind"])} className="w-72">
          <option value="small-room">Flat band for a small room</option>
          <option value="listening-room">Reference listening room (BS.1116 mask)</option>
        </Select>
      </label>
      {kind === "small-room" && (
        <>
          <label className="text-sm">
            <span className="mb-1 block font-medium">From (s)</span>
            <Input className="w-20" inputMode="decimal" value={lower} disabled={!editable} onChange={(e) => setLower(e.target.value)} />
          </label>
          <label className="text-sm">
            <span className="mb-1 block font-medium">To (s)</span>
            <Input className="w-20" inputMode="decimal" value={upper} disabled={!editable} onChange={(e) => setUpper(e.target.value)} />
          </label>
        </>
      )}
      {editable && (
        <Button type="submit" variant="secondary" disabled={busy}>
          {busy ? "Saving…" : "Save target"}
        </Button>
      )}
      {error && <p role="alert" className="w-full text-sm font-medium text-outside">{error}</p>}
    </form>
  );
}

/** The Decay tab: scenarios, the target, predicted RT per octave band against it, and the current scenario's treatment. */
export function DecayTab({ ws, scenarios, current, units, builds, actions, onScenario }: { ws: Workspace; scenarios: Scenario[]; current: Scenario | null; units: UnitSystem; builds: Build[]; actions: WorkspaceActions; onScenario: (id: string) => void }) {
  const editable = ws.can.editScenarios;
  const active = scenarios.filter((s) => !s.archived);
  const archived = ws.scenarios.filter((s) => s.archived).map((s) => ({ id: s.id, name: s.name }));
  const bar = <ScenarioBar roomId={ws.room.id} scenarios={active} archived={archived} current={current} editable={editable} actions={actions} onScenario={onScenario} />;
  if (!current) return <div className="space-y-5">{bar}<EmptyState title="No scenario yet">Create one with “New from baseline”.</EmptyState></div>;
  const rv = current.results.reverb;
  const withReverb = active.filter((s) => s.results.reverb);
  const sch = current.results.modes.schroederHz;

  return (
    <div className="space-y-5">
      {bar}
      <Card className="p-4">
        <TargetForm key={`${current.id}-${current.version}`} target={current.target} editable={editable} onSave={async (t) => { const r = await actions.setTarget(current.id, t); return r.ok ? undefined : r.code === "conflict" ? "Someone else changed this scenario — reload first." : r.message; }} />
      </Card>
      {!rv ? (
        <Notice>{current.results.notes[0] ?? "No decay prediction for this room."}</Notice>
      ) : (
        <>
          <Card className="p-4">
            <BandBarsPlot
              title="Predicted reverberation time per octave band (Eyring)"
              units="s"
              bandsHz={rv.bandsHz}
              scenarios={withReverb.map((s) => ({ label: s.name, values: s.results.reverb!.treated.eyringS, verdicts: s.id === current.id ? s.results.reverb!.comparison.map((c) => c.verdict) : undefined }))}
              target={rv.comparison.map((c) => ({ lowerS: c.lowerS, upperS: c.upperS, targetS: c.targetS }))}
              yTitle="RT60 (s)"
              caption={`Shaded: the target band of “${current.name}”. Verdict marks belong to “${current.name}”. Eyring formula with the room's finishes, air absorption and the scenario's items.`}
            />
          </Card>
          {sch !== null && <Notice tone="caution">Below the Schroeder frequency (about {sch.toFixed(0)} Hz) the reverberation time is not a good description of this room — look at the modal response on the Low end tab. The 63 Hz and 125 Hz bands here are a diffuse-field estimate only.</Notice>}
          <section aria-labelledby="deviation-title" className="space-y-2">
            <h2 id="deviation-title" className="text-lg font-semibold">
              Against the target: “{current.name}”
            </h2>
            <div className="overflow-x-auto rounded-[10px] border border-paper-line bg-paper-raised">
              <table className="w-full text-sm" data-testid="deviation-table">
                <caption className="sr-only">Predicted reverberation time per band against the target</caption>
                <thead className="bg-paper-sunk/70 text-left text-xs tracking-wide text-ink-soft">
                  <tr>
                    <th className="px-3 py-2 font-medium">Band (Hz)</th>
                    {rv.bandsHz.map((f) => (
                      <th key={f} className="px-3 py-2 text-right font-medium">
                        {fmtHz(f)}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody className="tabular-nums">
                  <tr className="border-t border-paper-line/70">
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">Target band (s)</th>
                    {rv.comparison.map((c, i) => <td key={i} className="px-3 py-1.5 text-right">{s2(c.lowerS)}–{s2(c.upperS)}</td>)}
                  </tr>
                  <tr className="border-t border-paper-line/70">
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">Untreated (s)</th>
                    {rv.untreated.eyringS.map((v, i) => <td key={i} className="px-3 py-1.5 text-right text-ink-soft">{s2(v)}</td>)}
                  </tr>
                  <tr className="border-t border-paper-line/70">
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">Predicted (s)</th>
                    {rv.comparison.map((c, i) => <td key={i} className="px-3 py-1.5 text-right font-medium">{s2(c.predictedS)}</td>)}
                  </tr>
                  <tr className="border-t border-paper-line/70">
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">Outside the band by (s)</th>
                    {rv.comparison.map((c, i) => <td key={i} className="px-3 py-1.5 text-right">{c.excessS === 0 ? "—" : signed(c.excessS)}</td>)}
                  </tr>
                  <tr className="border-t border-paper-line/70">
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">Verdict</th>
                    {rv.comparison.map((c, i) => <td key={i} className="px-3 py-1.5 text-right"><VerdictMark verdict={c.verdict} /></td>)}
                  </tr>
                  <tr className="border-t border-paper-line/70">
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">Absorption to add (m²)</th>
                    {rv.toAddM2.map((v, i) => <td key={i} className="px-3 py-1.5 text-right text-ink-soft">{v === 0 ? "—" : v.toFixed(1)}</td>)}
                  </tr>
                </tbody>
              </table>
            </div>
            <p className="text-xs text-ink-soft">
              <VerdictMark verdict="within" /> inside the band · <VerdictMark verdict="near" /> outside by at most 0.05 s · <VerdictMark verdict="outside" /> further out.
              {rv.notes.length > 0 && ` ${rv.notes.join(" ")}`}
            </p>
          </section>
        </>
      )}
      <ItemsPanel scenario={current} results={current.results} builds={builds} room={ws.room} units={units} editable={editable} actions={actions} />
    </div>
  );
}
