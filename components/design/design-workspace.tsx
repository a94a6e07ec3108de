"use client";

import { useMemo, useState } from "react";
import { Card, Notice } from "@/components/ui/card";
import { defaultCatalogue } from "@/lib/sizer";
import { AddToScenario, type ScenarioChoice } from "./add-to-scenario";
import { useDebounced, useSizer } from "./api";
import { proposalItems } from "./proposal-items";
import { ReflectionsPanel } from "./reflections-panel";
import { SizerLimitsForm, sizerRequest, type SizerChoices } from "./sizer-limits-form";
import { SizerResultView } from "./sizer-result";
import type { RoomNetProps } from "./room-net";

export interface DesignWorkspaceProps {
  roomId: string;
  room: { lengthM: number; widthM: number; heightM: number };
  scenarios: ScenarioChoice[];
  initialScenarioId: string;
  canEdit: boolean;
  openings: RoomNetProps["openings"];
  speakers: RoomNetProps["speakers"];
  seats: RoomNetProps["seats"];
}

/** The treatment design page: the bass-trap sizer (live) and the reflection points, each with "Add to scenario". */
export function DesignWorkspace(props: DesignWorkspaceProps) {
  const { room } = props;
  const [choices, setChoices] = useState<SizerChoices>({
    scenarioId: props.initialScenarioId,
    objective: "count",
    maxDepthM: 0.5,
    corners: ["front-left", "front-right", "rear-left", "rear-right"],
    edges: [
      { edge: "front", on: false, lengthM: room.widthM },
      { edge: "rear", on: true, lengthM: room.widthM },
      { edge: "left", on: false, lengthM: room.lengthM },
      { edge: "right", on: false, lengthM: room.lengthM },
    ],
    wallAreaM2: 4,
    budget: null,
    maxItems: null,
  });
  const request = useDebounced(sizerRequest(props.roomId, choices), 200);
  const { data, error, isFetching } = useSizer(request);
  const catalogue = useMemo(() => defaultCatalogue(), []);
  const from = props.scenarios.find((s) => s.id === choices.scenarioId);
  const items = useMemo(() => (data ? proposalItems(data.proposal.items, catalogue, request.limits, room.heightM) : []), [data, catalogue, request.limits, room.heightM]);
  const fields = (error as (Error & { fields?: Record<string, string[]> }) | null)?.fields;

  return (
    <div className="space-y-6">
      <Card className="grid gap-6 lg:grid-cols-[18rem_1fr]">
        <div>
          <h2 className="mb-3 text-lg font-semibold">Bass traps</h2>
          <SizerLimitsForm value={choices} onChange={setChoices} scenarios={props.scenarios} errors={fields} />
        </div>
        <div className="min-w-0 space-y-4" aria-busy={isFetching} data-testid="sizer-result">
          {error && <Notice tone="error">{error.message}</Notice>}
          {!data && !error && <p className="text-sm text-ink-soft">Sizing…</p>}
          {data && <SizerResultView result={data.proposal} elapsedMs={data.elapsedMs} />}
          {data && props.canEdit && items.length > 0 && (
            <AddToScenario roomId={props.roomId} items={items} scenarios={props.scenarios} fromScenario={from} suggestedName={`${from?.name ?? "Treatment"} + sized traps`} testId="add-proposal" />
          )}
          {data && items.some((i) => i.placements.length < i.count) && <p className="text-xs text-ink-faint">Wall panels and membrane traps are sized by free wall area: place them on the room page after adding.</p>}
        </div>
      </Card>
      <ReflectionsPanel roomId={props.roomId} room={room} openings={props.openings} speakers={props.speakers} seats={props.seats} scenarios={props.scenarios} fromScenario={from} canEdit={props.canEdit} />
    </div>
  );
}
