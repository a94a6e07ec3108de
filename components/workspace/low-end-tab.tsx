"use client";

import { CircleCheck, CircleX, Info } from "lucide-react";
import { FrequencyResponsePlot } from "@/components/plots/frequency-response-plot";
import { ModeSpectrumPlot } from "@/components/plots/mode-spectrum-plot";
import { Card, EmptyState, Notice } from "@/components/ui/card";
import { Field, Select } from "@/components/ui/field";
import type { Scenario } from "@/db/queries/scenarios";
import type { Workspace } from "@/db/queries/workspace";
import { effectiveRt60S, type ScenarioResults } from "@/lib/analysis";
import type { UnitSystem } from "@/lib/units/length";
import { FlatnessPanel } from "./flatness-panel";
import { ModeTable } from "./mode-table";
import type { WorkspaceActions } from "./room-workspace";
import type { PlanPosition } from "./types";

function Verdict({ passes, title, children }: { passes: boolean; title: string; children: React.ReactNode }) {
  const Icon = passes ? CircleCheck : CircleX;
  return (
    <div className="flex gap-2.5">
      <Icon className={`mt-0.5 h-5 w-5 flex-none ${passes ? "text-within" : "text-outside"}`} aria-hidden />
      <div>
        <div className="text-sm font-semibold">
          {title}: <span className={passes ? "text-within" : "text-outside"}>{passes ? "passes" : "does not pass"}</span>
        </div>
        <p className="text-sm text-ink-soft">{children}</p>
      </div>
    </div>
  );
}

/**
 * The Low end tab: the distribution checks in plain words, the Schroeder frequency, the mode spectrum
 * and table, the modal response at each seat with the current sources (analysed here, so a drag shows
 * at once) and the flatness map over the plan (computed in a Web Worker).
 */
export function LowEndTab({
  ws,
  positions,
  units,
  live,
  scenario,
  scenarios,
  onScenario,
  actions,
  onMove,
}: {
  ws: Workspace;
  positions: PlanPosition[];
  units: UnitSystem;
  live: ScenarioResults | null;
  scenario: Scenario | null;
  scenarios: Scenario[];
  onScenario: (id: string) => void;
  actions: WorkspaceActions;
  onMove: (id: string, p: { xM: number; yM: number }) => void;
}) {
  if (!live || !scenario) return <EmptyState title="No scenario to analyse">This room has no active scenario. Create one on the Decay tab.</EmptyState>;
  const m = live.modes;
  const lf = live.lowFrequency;
  const sch = m.schroederHz;
  const seats = positions.filter((p) => p.kind === "seat");
  const bass = positions.filter((p) => p.kind !== "seat" && p.drivesBass);

  return (
    <div className="space-y-5">
      <div className="no-print flex flex-wrap items-end gap-4">
        <Field id="lowend-scenario" label="Damping from the scenario" className="w-72">
          <Select id="lowend-scenario" value={scenario.id} onChange={(e) => onScenario(e.target.value)}>
            {scenarios.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
                {s.isBaseline ? " (untreated)" : ""}
              </option>
            ))}
          </Select>
        </Field>
        <p className="max-w-xl pb-2 text-xs text-ink-soft">The scenario&apos;s low-frequency treatment sets the decay that damps every mode: more bass absorption → shorter decay → wider, lower peaks.</p>
      </div>

      <Card className="grid gap-4 md:grid-cols-3">
        <Verdict passes={m.bonello.passes} title="Mode spacing (Bonello)">
          {m.bonello.verdict}
        </Verdict>
        <Verdict passes={m.ratio.passes} title="Dimension ratios">
          {m.ratio.verdict} (L/H {m.ratio.lengthToHeight.toFixed(2)}, W/H {m.ratio.widthToHeight.toFixed(2)})
        </Verdict>
        <div className="flex gap-2.5">
          <Info className="mt-0.5 h-5 w-5 flex-none text-kiln-600" aria-hidden />
          <div>
            <div className="text-sm font-semibold">Schroeder frequency: {sch === null ? "not available" : `${sch.toFixed(0)} Hz`}</div>
            <p className="text-sm text-ink-soft">
              {m.counts.total} modes up to {m.maxFrequencyHz} Hz ({m.counts.axial} axial, {m.counts.tangential} tangential, {m.counts.oblique} oblique), each about {m.bandwidthHz.toFixed(1)} Hz wide.
            </p>
          </div>
        </div>
      </Card>
      {sch !== null && (
        <Notice tone="caution">
          Below the Schroeder frequency (about {sch.toFixed(0)} Hz here) the reverberation time is not a good description of this room — look at the modal response at the seats instead.
        </Notice>
      )}

      <Card className="p-4">
        <ModeSpectrumPlot
          title="Mode spectrum"
          modes={m.table}
          bandwidthHz={m.bandwidthHz}
          markers={sch !== null && sch <= m.maxFrequencyHz ? [{ value: sch, label: `Schroeder ${sch.toFixed(0)} Hz` }] : []}
          caption={m.verdict}
        />
      </Card>

      <section aria-labelledby="mode-table-title" className="space-y-2">
        <h2 id="mode-table-title" className="text-lg font-semibold">
          Mode table
        </h2>
        <ModeTable modes={m} />
      </section>

      <section aria-labelledby="seat-response-title" className="space-y-2">
        <h2 id="seat-response-title" className="text-lg font-semibold">
          Bass at each seat
        </h2>
        {seats.length === 0 ? (
          <EmptyState title="No seats yet">Add a seat on the Room tab (the “Seat” button beside the plan) to see how the bass arrives there.</EmptyState>
        ) : bass.length === 0 ? (
          <EmptyState title="Nothing plays the low end">Add a subwoofer on the Room tab, or mark a main speaker as playing the bass.</EmptyState>
        ) : !lf ? (
          <Notice>{live.notes.find((n) => /seat|modal sum/.test(n)) ?? "The seat responses are not available for this room."}</Notice>
        ) : (
          <Card className="p-4">
            <FrequencyResponsePlot
              title="Modal response at the seats"
              units="dB (relative)"
              series={lf.seats.map((s) => ({ label: `${s.name}${s.isMain ? " (main)" : ""}`, frequenciesHz: lf.frequenciesHz, levelsDb: s.levelsDb }))}
              domainHz={[15, 250]}
              shadedBand={sch !== null ? { fromHz: 15, toHz: Math.min(250, sch), label: "below Schroeder" } : undefined}
              caption={`${lf.note} Decay used: ${lf.effectiveRt60S.toFixed(2)} s (${lf.effectiveRt60Basis}).`}
            />
            <div className="mt-3 overflow-x-auto">
              <table className="text-sm" data-testid="seat-spread">
                <caption className="pb-1 text-left text-xs text-ink-soft">
                  Spread of the level over {lf.spreadBandHz.lowHz}–{lf.spreadBandHz.highHz} Hz (standard deviation; lower is more even)
                </caption>
                <thead className="text-left text-xs tracking-wide text-ink-soft">
                  <tr>
                    <th className="pr-6 font-medium">Seat</th>
                    <th className="font-medium">Spread (dB)</th>
                  </tr>
                </thead>
                <tbody>
                  {lf.seats.map((s) => (
                    <tr key={s.id} className="border-t border-paper-line/70">
                      <td className="py-1 pr-6">
                        {s.name}
                        {s.isMain ? " (main)" : ""}
                      </td>
                      <td className="py-1 tabular-nums" data-seat-spread={s.name}>
                        {s.spreadDb.toFixed(1)}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </Card>
        )}
      </section>

      <FlatnessPanel ws={ws} positions={positions} units={units} rt60S={live.reverb ? effectiveRt60S(live.reverb.treated.eyringS) : null} speedOfSound={live.room.speedOfSound} actions={actions} onMove={onMove} />
    </div>
  );
}
