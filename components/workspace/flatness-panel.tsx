"use client";

import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, EmptyState, Notice } from "@/components/ui/card";
import type { Workspace } from "@/db/queries/workspace";
import { colourRamp } from "@/lib/plots";
import { formatLength, type UnitSystem } from "@/lib/units/length";
import type { FlatnessJobInput, FlatnessMode } from "@/lib/workers";
import { PlanLegend, PlanView } from "./plan-view";
import type { WorkspaceActions } from "./room-workspace";
import type { PlanPosition } from "./types";
import { useFlatnessMap } from "./use-flatness-map";

const GRID_X = 72;

/**
 * The flatness map over the floor plan, computed in a Web Worker: where a listener hears the most
 * even bass with the subwoofers where they are ("Where to sit"), or where one subwoofer gives the
 * most even bass at the main seat ("Where to put a subwoofer"). Dragging a subwoofer here (or on the
 * Room tab) recomputes the seat map.
 */
export function FlatnessPanel({ ws, positions, units, rt60S, speedOfSound, actions, onMove }: { ws: Workspace; positions: PlanPosition[]; units: UnitSystem; rt60S: number | null; speedOfSound: number; actions: WorkspaceActions; onMove: (id: string, p: { xM: number; yM: number }) => void }) {
  const [mode, setMode] = useState<FlatnessMode>("seats");
  const { room } = ws;
  const seats = positions.filter((p) => p.kind === "seat");
  const main = seats.find((s) => s.isMain) ?? seats[0] ?? null;
  const bass = positions.filter((p) => p.kind !== "seat" && p.drivesBass);
  const subs = positions.filter((p) => p.kind === "subwoofer");
  const subHeight = subs[0]?.zM ?? 0.3;
  const earHeight = main?.zM ?? 1.05;

  const input: FlatnessJobInput | null = useMemo(() => {
    if (rt60S === null) return null;
    if (mode === "seats" && bass.length === 0) return null;
    if (mode === "subwoofer" && !main) return null;
    return {
      mode,
      room: { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM },
      sources: bass.map((s) => ({ xM: s.xM, yM: s.yM, zM: s.zM, delayMs: s.delayMs, polarity: s.polarity })),
      seat: main ? { xM: main.xM, yM: main.yM, zM: main.zM } : null,
      heightM: mode === "seats" ? earHeight : subHeight,
      gridX: GRID_X,
      rt60Seconds: rt60S,
      speedOfSound,
    };
  }, [mode, rt60S, speedOfSound, room.lengthM, room.widthM, room.heightM, JSON.stringify(bass.map((s) => [s.xM, s.yM, s.zM, s.delayMs, s.polarity])), main?.xM, main?.yM, main?.zM, earHeight, subHeight]); // eslint-disable-line react-hooks/exhaustive-deps
  const key = JSON.stringify(input);
  const { state, cancel, restart, last } = useFlatnessMap(input, key);
  const result = state.status === "done" ? state.result : state.status === "cancelled" ? state.previous : last;
  const shown = result && result.mode === mode ? result : null;
  const ramp = useMemo(() => (shown ? colourRamp([shown.minDb, shown.maxDb]) : null), [shown]);
  const heat = shown && ramp ? { xM: shown.xM, yM: shown.yM, values: shown.stdDevDb, colour: ramp.colour, best: shown.best } : null;

  const need = mode === "seats" ? (bass.length === 0 ? "Add a subwoofer on the Room tab (or mark a speaker as playing the bass) to map where the bass is most even." : null) : !main ? "Add a seat on the Room tab: this map judges every subwoofer spot at the main seat." : null;

  return (
    <section aria-labelledby="flatness-title" className="space-y-2">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="flatness-title" className="text-lg font-semibold">
          Evenness map
        </h2>
        <div role="group" aria-label="Map" className="no-print flex overflow-hidden rounded-md border border-paper-line text-sm">
          {(
            [
              ["seats", "Where to sit"],
              ["subwoofer", "Where to put a subwoofer"],
            ] as const
          ).map(([m, t]) => (
            <button key={m} type="button" aria-pressed={mode === m} onClick={() => setMode(m)} className={mode === m ? "bg-ink px-3 py-1.5 text-paper" : "bg-paper-raised px-3 py-1.5 text-ink-soft hover:bg-paper-sunk"}>
              {t}
            </button>
          ))}
        </div>
      </div>
      {need ? (
        <EmptyState title="Nothing to map yet">{need}</EmptyState>
      ) : (
        <Card className="p-4">
          <p className="mb-3 text-sm text-ink-soft">
            {mode === "seats"
              ? `Each cell is a listener at ${formatLength(earHeight, units)} ear height hearing the ${bass.length} source${bass.length > 1 ? "s" : ""} that play the bass. Lighter cells hear a more even bass (smaller spread of level over 20–120 Hz). Drag a subwoofer to see the map follow.`
              : `Each cell is one subwoofer at ${formatLength(subHeight, units)} height, heard at ${main?.name ?? "the main seat"}. Lighter cells give that seat a more even bass.`}
          </p>
          <div className="no-print mb-3 flex min-h-9 flex-wrap items-center gap-3" aria-live="polite">
            {state.status === "running" ? (
              <>
                <div className="h-2 w-48 overflow-hidden rounded-full bg-paper-sunk" role="progressbar" aria-label="Computing the map" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(state.progress * 100)}>
                  <div className="h-full bg-kiln-500 transition-[width]" style={{ width: `${Math.max(3, state.progress * 100)}%` }} />
                </div>
                <span className="text-sm tabular-nums text-ink-soft">Computing… {Math.round(state.progress * 100)} %</span>
                <Button type="button" variant="secondary" className="py-1" onClick={cancel}>
                  Cancel
                </Button>
              </>
            ) : state.status === "cancelled" ? (
              <>
                <span className="text-sm text-ink-soft">Cancelled{shown ? " — showing the last finished map." : "."}</span>
                <Button type="button" variant="secondary" className="py-1" onClick={restart}>
                  Compute again
                </Button>
              </>
            ) : state.status === "error" ? (
              <Notice tone="error">The map could not be computed: {state.message}</Notice>
            ) : shown ? (
              <span className="text-sm text-ink-soft" data-testid="flatness-summary">
                Flattest at {formatLength(shown.best.xM, units)} from the front wall, {formatLength(shown.best.yM, units)} from the left wall: spread {shown.minDb.toFixed(1)} dB (worst {shown.maxDb.toFixed(1)} dB) · {shown.xM.length} × {shown.yM.length} cells in {Math.round(shown.elapsedMs)} ms
              </span>
            ) : null}
          </div>
          <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_12rem]">
            <PlanView
              room={room}
              positions={positions}
              units={units}
              editable={ws.can.editRoom}
              heat={heat}
              onMove={onMove}
              onMoveEnd={(id, p) => {
                const z = positions.find((q) => q.id === id)?.zM ?? 0;
                void actions.movePosition(id, { ...p, zM: z });
              }}
              label={`Evenness map over the floor plan of ${room.name}: ${mode === "seats" ? "where to sit" : "where to put a subwoofer"}`}
            />
            <div className="space-y-3 text-xs text-ink-soft">
              {ramp && shown && (
                <div>
                  <div className="mb-1 font-medium text-ink">Spread of level (dB)</div>
                  <div className="h-3 w-full rounded-sm border border-paper-line" style={{ background: `linear-gradient(to right, ${ramp.stops.map((s) => `${s.colour} ${s.offset * 100}%`).join(", ")})` }} aria-hidden />
                  <div className="mt-0.5 flex justify-between tabular-nums">
                    <span>{shown.minDb.toFixed(1)} even</span>
                    <span>{shown.maxDb.toFixed(1)} uneven</span>
                  </div>
                </div>
              )}
              <PlanLegend withHeat />
            </div>
          </div>
        </Card>
      )}
    </section>
  );
}
