"use client";

import { useState } from "react";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import type { Workspace } from "@/db/queries/workspace";
import { formatArea, formatLength, formatVolume, type UnitSystem } from "@/lib/units/length";
import { PlanLegend, PlanView } from "./plan-view";
import { PositionPanel } from "./position-editor";
import type { WorkspaceActions } from "./room-workspace";
import { SurfacesPanel } from "./surfaces-panel";
import type { PlanPosition } from "./types";

const msg = (r: { ok: boolean; message?: string; code?: string }) => (r.ok ? undefined : r.code === "conflict" ? "Someone else changed this room — reload first." : (r as { message: string }).message);

/** The Room tab: dimensions and air, the plan with its seats and sources, and the six surfaces. */
export function RoomTab({ ws, positions, units, actions, onMove }: { ws: Workspace; positions: PlanPosition[]; units: UnitSystem; actions: WorkspaceActions; onMove: (id: string, p: { xM: number; yM: number }) => void }) {
  const { room } = ws;
  const editable = ws.can.editRoom;
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const selected = positions.find((p) => p.id === selectedId) ?? null;
  const { lengthM: L, widthM: W, heightM: H } = room;
  const seats = positions.filter((p) => p.kind === "seat").length;
  const subs = positions.filter((p) => p.kind === "subwoofer").length;
  const facts: [string, string][] = [
    ["Length", formatLength(L, units)],
    ["Width", formatLength(W, units)],
    ["Height", formatLength(H, units)],
    ["Volume", formatVolume(L * W * H, units)],
    ["Surface area", formatArea(2 * (L * W + L * H + W * H), units)],
    ["Air", `${room.temperatureC} °C · ${room.humidityPct} % RH`],
  ];

  return (
    <div className="space-y-5">
      <Card>
        <div className="flex flex-wrap items-start justify-between gap-4">
          <dl className="grid flex-1 grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-3 xl:grid-cols-6">
            {facts.map(([k, v]) => (
              <div key={k}>
                <dt className="text-xs uppercase tracking-wide text-ink-faint">{k}</dt>
                <dd className="whitespace-nowrap text-lg tabular-nums">{v}</dd>
              </div>
            ))}
          </dl>
          {editable && (
            <ButtonLink variant="secondary" href={`/rooms/${room.id}/edit`} className="no-print">
              Edit room
            </ButtonLink>
          )}
        </div>
        {room.notes && <p className="mt-4 whitespace-pre-line border-t border-paper-line pt-3 text-sm text-ink-soft">{room.notes}</p>}
      </Card>

      <section aria-labelledby="plan-title" className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <Card className="min-w-0 p-4">
          <div className="mb-2 flex flex-wrap items-baseline justify-between gap-2">
            <h2 id="plan-title" className="text-lg font-semibold">
              Plan
            </h2>
            <PlanLegend />
          </div>
          <PlanView
            room={room}
            positions={positions}
            units={units}
            editable={editable}
            selectedId={selectedId}
            onSelect={setSelectedId}
            onMove={onMove}
            onMoveEnd={(id, p) => {
              const z = positions.find((q) => q.id === id)?.zM ?? 0;
              void actions.movePosition(id, { ...p, zM: z });
            }}
            label={`Floor plan of ${room.name}, to scale, front wall on the left`}
          />
          <p className="mt-2 text-xs text-ink-soft">
            {editable
              ? "Drag a seat, speaker or subwoofer to move it, or focus it (Tab) and use the arrow keys — Shift for bigger steps. It is saved when you let go."
              : "Read only: your role can look at the plan but not move things."}
          </p>
          {(seats === 0 || subs === 0) && (
            <div className="mt-3 rounded-md border border-dashed border-paper-line bg-paper px-4 py-3 text-sm text-ink-soft">
              {seats === 0 && <p>No seats yet. {editable ? "Press “Seat” beside the plan to add one, then drag it to where people listen; the first seat becomes the main seat." : "The engineer has not placed any seats yet."}</p>}
              {subs === 0 && <p className={seats === 0 ? "mt-1" : ""}>No subwoofer yet. {editable ? "Press “Subwoofer” to add one in a front corner — the Low end tab then shows the bass at each seat." : ""}</p>}
            </div>
          )}
        </Card>
        <PositionPanel
          positions={positions}
          selected={selected}
          units={units}
          room={room}
          editable={editable}
          onSelect={setSelectedId}
          onAdd={(k) => void actions.addPosition(k)}
          onSave={async (id, d) => msg(await actions.savePosition(id, d))}
          onDelete={async (id) => {
            const r = await actions.deletePosition(id);
            if (r.ok) setSelectedId(null);
            return msg(r);
          }}
        />
      </section>

      <SurfacesPanel surfaces={ws.surfaces} units={units} editable={editable} onSave={async (s) => msg(await actions.saveSurfaces(s))} />
    </div>
  );
}
