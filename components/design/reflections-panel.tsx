"use client";

import { useMemo, useState } from "react";
import { Card, Notice } from "@/components/ui/card";
import { Select } from "@/components/ui/field";
import { AddToScenario, type ScenarioChoice } from "./add-to-scenario";
import { useDebounced, useReflections } from "./api";
import { panelSetItems, panelUnitCost } from "./proposal-items";
import { RoomNet, type RoomNetProps } from "./room-net";

const PANEL_SIZES = [
  { id: "1200x600", label: "1200 × 600 mm, long side level", widthM: 1.2, heightM: 0.6 },
  { id: "600x1200", label: "600 × 1200 mm, long side upright", widthM: 0.6, heightM: 1.2 },
  { id: "600x600", label: "600 × 600 mm", widthM: 0.6, heightM: 0.6 },
] as const;
const SURFACE_WORD: Record<string, string> = { front: "Front wall", rear: "Rear wall", left: "Left wall", right: "Right wall", floor: "Floor", ceiling: "Ceiling" };
const cm = (m: number) => `${Math.round(m * 100)} cm`;

/** First reflection points from each main speaker to each seat, the zones, the suggested panels and their placement problems. */
export function ReflectionsPanel({ roomId, room, openings, speakers, seats, scenarios, fromScenario, canEdit }: Omit<RoomNetProps, "points" | "zones" | "panels" | "problemPanelIds"> & { roomId: string; scenarios: ScenarioChoice[]; fromScenario: ScenarioChoice | undefined; canEdit: boolean }) {
  const [size, setSize] = useState<(typeof PANEL_SIZES)[number]["id"]>("1200x600");
  const [marginCm, setMarginCm] = useState(20);
  const panel = PANEL_SIZES.find((p) => p.id === size)!;
  const request = useDebounced({ roomId, marginM: marginCm / 100, panel: { widthM: panel.widthM, heightM: panel.heightM } }, 150);
  const { data, error, isFetching } = useReflections(request);
  const problemIds = useMemo(() => new Set((data?.problems ?? []).flatMap((p) => p.itemIds)), [data]);
  const cost = panelUnitCost(panel.widthM, panel.heightM, 0.1, 35);
  const items = data ? panelSetItems(data.panels, { thicknessM: 0.1, flowResistivity: 10_000, materialId: "mineral-wool-35", ...cost }) : [];

  return (
    <Card className="space-y-4" aria-busy={isFetching}>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 className="text-lg font-semibold">Reflection points</h2>
          <p className="text-sm text-ink-soft">Image-source method: from each main speaker to each seat, the first reflection on every surface, padded into zones that cover the whole listening area.</p>
        </div>
        <div className="flex flex-wrap gap-3 text-sm">
          <label className="space-y-1">
            <span className="block font-medium">Panel size</span>
            <Select value={size} onChange={(e) => setSize(e.target.value as typeof size)} aria-label="Panel size">
              {PANEL_SIZES.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.label}
                </option>
              ))}
            </Select>
          </label>
          <label className="space-y-1">
            <span className="block font-medium">Padding round the points</span>
            <Select value={String(marginCm)} onChange={(e) => setMarginCm(Number(e.target.value))} aria-label="Padding round the points">
              {[0, 10, 20, 30, 50].map((m) => (
                <option key={m} value={m}>
                  {m} cm
                </option>
              ))}
            </Select>
          </label>
        </div>
      </div>
      {error && <Notice tone="error">{error.message}</Notice>}
      {data && (
        <>
          <RoomNet room={room} points={data.points} zones={data.zones} panels={data.panels} openings={openings} speakers={speakers} seats={seats} problemPanelIds={problemIds} />
          <p className="text-xs text-ink-faint">
            The room unfolded and seen from inside: the floor plan in the middle (front wall to the left, left wall at the top), each wall folded out from its floor edge, the ceiling beyond the rear wall. {data.points.length} points, found in {data.elapsedMs} ms.
          </p>
          <div className="overflow-x-auto">
            <table className="w-full text-sm" data-testid="panel-sets">
              <caption className="mb-1 text-left text-sm font-semibold text-ink">Suggested panels</caption>
              <thead className="text-left text-xs uppercase tracking-wide text-ink-faint">
                <tr>
                  <th className="py-1 pr-3 font-medium">Surface</th>
                  <th className="py-1 pr-3 text-right font-medium">Count</th>
                  <th className="py-1 pr-3 font-medium">Grid</th>
                  <th className="py-1 pr-3 font-medium">Panel</th>
                  <th className="py-1 pr-3 font-medium">Height</th>
                  <th className="py-1 font-medium">Covers the zone</th>
                </tr>
              </thead>
              <tbody>
                {data.panels.filter((p) => p.count > 0).map((p, i) => (
                  <tr key={i} className="border-t border-paper-line">
                    <td className="py-1 pr-3">
                      {SURFACE_WORD[p.surface]}
                      {data.panels.filter((q) => q.surface === p.surface && q.count > 0).length > 1 && <span className="block text-xs text-ink-faint">for {p.zone.speakerIds.join(" and ")}</span>}
                    </td>
                    <td className="py-1 pr-3 text-right tabular-nums">{p.count}</td>
                    <td className="py-1 pr-3 tabular-nums">
                      {p.columns} × {p.rows}
                    </td>
                    <td className="py-1 pr-3 tabular-nums">
                      {Math.round(p.panel.widthM * 1000)} × {Math.round(p.panel.heightM * 1000)} mm
                    </td>
                    <td className="py-1 pr-3 tabular-nums">
                      {p.surface === "ceiling" || p.surface === "floor" ? `centred ${cm(p.centreHeightM)} from the left wall` : `bottom edge ${cm(p.bottomHeightM)}, centre ${cm(p.centreHeightM)} above the floor`}
                    </td>
                    <td className="py-1">{p.coversZone ? "yes" : "partly"}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <section aria-labelledby="problems-title">
            <h3 id="problems-title" className="text-sm font-semibold">
              Placement problems
            </h3>
            {data.problems.length === 0 ? (
              <p className="text-sm text-within" data-testid="placement-problems">None: every suggested panel fits its surface, clear of doors, windows and the other panels.</p>
            ) : (
              <ul className="list-disc pl-5 text-sm" data-testid="placement-problems">
                {data.problems.map((p, i) => (
                  <li key={i}>{p.message}</li>
                ))}
              </ul>
            )}
          </section>
          {canEdit && items.length > 0 && (
            <AddToScenario roomId={roomId} items={items} scenarios={scenarios} fromScenario={fromScenario} suggestedName={`${fromScenario?.name ?? "Treatment"} + reflection panels`} label="Add these panels" testId="add-panels" />
          )}
          {canEdit && items.length > 0 && <p className="text-xs text-ink-faint">Panels of 100 mm light mineral wool, floor panels left out (a rug does that job); move any panel that has a problem above on the room page.</p>}
        </>
      )}
    </Card>
  );
}
