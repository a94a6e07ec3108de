"use client";

import type { ReactNode } from "react";

import { useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useCallback, useMemo, useState } from "react";
import {
  addPositionAction,
  addTreatmentItemAction,
  archiveScenarioAction,
  createScenarioAction,
  deletePositionAction,
  duplicateScenarioAction,
  movePositionAction,
  removeTreatmentItemAction,
  renameScenarioAction,
  saveBuildAction,
  saveSurfacesAction,
  updatePositionAction,
  updateScenarioAction,
  updateTreatmentItemAction,
} from "@/app/(app)/rooms/[roomId]/actions";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/card";
import type { Build } from "@/db/queries/builds";
import type { Scenario } from "@/db/queries/scenarios";
import type { Workspace } from "@/db/queries/workspace";
import { analyzeScenario, type AnalysisRoom } from "@/lib/analysis";
import type { BuildInput, PositionKind, ScenarioTarget, SurfaceInput, TreatmentItemInput, TreatmentItemUpdate } from "@/lib/schemas/workspace";
import type { UnitSystem } from "@/lib/units/length";
import { AbsorbersTab } from "./absorbers-tab";
import { analysisKey, useBuildsQuery, useSaver, useScenariosQuery, useWorkspaceQuery, workspaceKey, type SaveResult } from "./data";
import { DecayTab } from "./decay-tab";
import { LowEndTab } from "./low-end-tab";
import { defaultPosition, type PositionDraft } from "./position-editor";
import { RoomTab } from "./room-tab";
import type { PlanPosition } from "./types";

export const TABS = [
  { id: "room", label: "Room" },
  { id: "low-end", label: "Low end" },
  { id: "absorbers", label: "Absorbers" },
  { id: "decay", label: "Decay" },
] as const;
export type TabId = (typeof TABS)[number]["id"];

/** What the workspace's saves call; every one is a server action of the room route. */
export interface WorkspaceActions {
  movePosition(id: string, p: { xM: number; yM: number; zM: number }): Promise<SaveResult>;
  addPosition(kind: PositionKind): Promise<SaveResult<{ id: string }>>;
  savePosition(id: string, d: PositionDraft): Promise<SaveResult>;
  deletePosition(id: string): Promise<SaveResult>;
  saveSurfaces(s: SurfaceInput[]): Promise<SaveResult>;
  createScenario(name: string, copyFrom: string | null, target: ScenarioTarget): Promise<SaveResult<{ id: string }>>;
  duplicateScenario(id: string, name: string): Promise<SaveResult<{ id: string }>>;
  renameScenario(id: string, name: string): Promise<SaveResult>;
  setTarget(id: string, target: ScenarioTarget): Promise<SaveResult>;
  archiveScenario(id: string, archived: boolean): Promise<SaveResult>;
  addItem(scenarioId: string, input: Omit<TreatmentItemInput, "version">): Promise<SaveResult>;
  updateItem(scenarioId: string, itemId: string, patch: Omit<TreatmentItemUpdate, "version">): Promise<SaveResult>;
  removeItem(scenarioId: string, itemId: string): Promise<SaveResult>;
  saveBuild(input: BuildInput): Promise<SaveResult>;
}

/** Positions of the workspace as the plan holds them. */
export function planPositions(w: Workspace): PlanPosition[] {
  return [
    ...w.seats.map((s) => ({ id: s.id, kind: s.kind, name: s.name, xM: s.xM, yM: s.yM, zM: s.zM, isMain: s.isMain, delayMs: 0, polarity: 1 as const, drivesBass: false })),
    ...w.sources.map((s) => ({ id: s.id, kind: s.kind, name: s.name, xM: s.xM, yM: s.yM, zM: s.zM, isMain: false, delayMs: s.delayMs, polarity: s.polarity, drivesBass: s.drivesBass })),
  ];
}

/** The room as lib/analysis reads it, with the positions as they are on screen (a drag in progress included). */
export function analysisRoomFrom(w: Workspace, positions: PlanPosition[]): AnalysisRoom {
  return {
    lengthM: w.room.lengthM,
    widthM: w.room.widthM,
    heightM: w.room.heightM,
    temperatureC: w.room.temperatureC,
    humidityPct: w.room.humidityPct,
    surfaces: w.surfaces.map((s) => ({ surface: s.surface, finish: s.finish, openings: s.openings })),
    seats: positions.filter((p) => p.kind === "seat").map((p) => ({ id: p.id, name: p.name, xM: p.xM, yM: p.yM, zM: p.zM, isMain: p.isMain })),
    sources: positions
      .filter((p) => p.kind !== "seat")
      .map((p) => ({ id: p.id, name: p.name, kind: p.kind as "main-speaker" | "subwoofer", xM: p.xM, yM: p.yM, zM: p.zM, delayMs: p.delayMs, polarity: p.polarity, drivesBass: p.drivesBass })),
  };
}

/**
 * The room page's client: tabs in the URL (`?tab=`, `?scenario=`), the workspace and the scenarios
 * through TanStack Query (initial data from the server page), saves through the server actions with
 * the version read, and the conflict banner on a stale save.
 */
export function RoomWorkspace({ roomId, initial, initialScenarios, initialBuilds, units, canSaveBuilds, roomTabFooter }: { roomId: string; initial: Workspace; initialScenarios: Scenario[]; initialBuilds: Build[]; units: UnitSystem; canSaveBuilds: boolean; roomTabFooter?: ReactNode }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const qc = useQueryClient();
  const tab = (TABS.find((t) => t.id === params.get("tab"))?.id ?? "room") as TabId;
  const ws = useWorkspaceQuery(roomId, initial).data;
  const scenarios = useScenariosQuery(roomId, initialScenarios).data;
  const builds = useBuildsQuery(initialBuilds).data;
  const { save, conflict, reload } = useSaver(roomId);
  const [overrides, setOverrides] = useState<Record<string, { xM: number; yM: number }>>({});

  const active = scenarios.filter((s) => !s.archived);
  const current = active.find((s) => s.id === params.get("scenario")) ?? active.find((s) => s.isBaseline) ?? active[0] ?? null;

  const setParam = useCallback(
    (patch: Record<string, string | null>) => {
      const next = new URLSearchParams(params.toString());
      for (const [k, v] of Object.entries(patch)) v === null ? next.delete(k) : next.set(k, v);
      router.replace(`${pathname}?${next.toString()}`, { scroll: false });
    },
    [params, pathname, router],
  );

  const stored = useMemo(() => planPositions(ws), [ws]);
  const positions = useMemo(() => stored.map((p) => (overrides[p.id] ? { ...p, ...overrides[p.id] } : p)), [stored, overrides]);
  const liveRoom = useMemo(() => analysisRoomFrom(ws, positions), [ws, positions]);
  // the current scenario analysed here with the positions on screen: the seat responses follow a drag at once
  const live = useMemo(() => {
    if (!current) return null;
    try {
      return analyzeScenario(liveRoom, { target: current.target, items: current.items.map((i) => ({ id: i.id, name: i.name, spec: i.spec, count: i.count, unitCost: i.unitCost, unitMassKg: i.unitMassKg, placements: i.placements })) });
    } catch {
      return current.results;
    }
  }, [liveRoom, current]);

  const roomVersion = () => qc.getQueryData<Workspace>(workspaceKey(roomId))?.room.version ?? ws.room.version;
  const scenarioVersion = (id: string) => qc.getQueryData<Scenario[]>(analysisKey(roomId))?.find((s) => s.id === id)?.version ?? qc.getQueryData<Workspace>(workspaceKey(roomId))?.scenarios.find((s) => s.id === id)?.version ?? 1;
  const bumpRoom = (v: number) => qc.setQueryData<Workspace>(workspaceKey(roomId), (old) => (old ? { ...old, room: { ...old.room, version: v } } : old));
  const bumpScenario = (id: string, v: number) => qc.setQueryData<Scenario[]>(analysisKey(roomId), (old) => old?.map((s) => (s.id === id ? { ...s, version: v } : s)));
  const onRoom = <T extends { roomVersion: number }>(r: SaveResult<T>) => {
    if (r.ok) bumpRoom(r.data.roomVersion);
    return r;
  };
  const onScenario = (id: string) => <T extends { scenarioVersion?: number; version?: number }>(r: SaveResult<T>) => {
    if (r.ok) bumpScenario(id, (r.data.scenarioVersion ?? r.data.version)!);
    return r;
  };

  const actions: WorkspaceActions = {
    movePosition: (id, p) =>
      save(async () => {
        const r = onRoom(await movePositionAction(roomId, id, { ...p, version: roomVersion() }));
        return r;
      }, { quiet: false }).then((r) => {
        setOverrides((o) => {
          const { [id]: _, ...rest } = o;
          return rest;
        });
        return r;
      }),
    addPosition: (kind) =>
      save(async () => {
        const d = defaultPosition(kind, ws.room, positions);
        const body = kind === "seat" ? { kind, name: d.name, xM: d.xM, yM: d.yM, zM: d.zM, isMain: d.isMain, version: roomVersion() } : { kind, name: d.name, xM: d.xM, yM: d.yM, zM: d.zM, delayMs: 0, polarity: 1, drivesBass: d.drivesBass, version: roomVersion() };
        return onRoom(await addPositionAction(roomId, body));
      }, { success: `${kind === "seat" ? "Seat" : kind === "subwoofer" ? "Subwoofer" : "Speaker"} added: drag it into place` }),
    savePosition: (id, d) =>
      save(async () => {
        const p = positions.find((q) => q.id === id);
        const body = p?.kind === "seat" ? { name: d.name, xM: d.xM, yM: d.yM, zM: d.zM, isMain: d.isMain } : { name: d.name, xM: d.xM, yM: d.yM, zM: d.zM, delayMs: d.delayMs, polarity: d.polarity, drivesBass: d.drivesBass };
        return onRoom(await updatePositionAction(roomId, id, { ...body, version: roomVersion() }));
      }, { success: "Position saved" }),
    deletePosition: (id) => save(async () => onRoom(await deletePositionAction(roomId, id, { version: roomVersion() })), { success: "Position deleted" }),
    saveSurfaces: (s) => save(async () => onRoom(await saveSurfacesAction(roomId, { version: roomVersion(), surfaces: s })), { success: "Surfaces saved" }),
    createScenario: (name, copyFrom, target) => save(async () => await createScenarioAction(roomId, { name, copyFromScenarioId: copyFrom, target }), { success: `Scenario “${name}” created` }),
    duplicateScenario: (id, name) => save(async () => await duplicateScenarioAction(id, { name }), { success: `Scenario “${name}” created` }),
    renameScenario: (id, name) => save(async () => onScenario(id)(await renameScenarioAction(id, { name, version: scenarioVersion(id) })), { success: "Scenario renamed" }),
    setTarget: (id, target) => save(async () => onScenario(id)(await updateScenarioAction(id, { target, version: scenarioVersion(id) })), { success: "Target saved" }),
    archiveScenario: (id, archived) => save(async () => onScenario(id)(await archiveScenarioAction(id, { archived, version: scenarioVersion(id) }))),
    addItem: (sid, input) => save(async () => onScenario(sid)(await addTreatmentItemAction(sid, { ...input, version: scenarioVersion(sid) })), { success: "Item added" }),
    updateItem: (sid, iid, patch) => save(async () => onScenario(sid)(await updateTreatmentItemAction(sid, iid, { ...patch, version: scenarioVersion(sid) })), { success: "Item saved" }),
    removeItem: (sid, iid) => save(async () => onScenario(sid)(await removeTreatmentItemAction(sid, iid, { version: scenarioVersion(sid) })), { success: "Item removed" }),
    saveBuild: (input) => save(async () => await saveBuildAction(input), { success: "Build saved to the library", quiet: true }),
  };

  const move = useCallback((id: string, p: { xM: number; yM: number }) => setOverrides((o) => ({ ...o, [id]: p })), []);

  return (
    <div className="space-y-5">
      {conflict && (
        <Notice tone="error">
          <span className="flex flex-wrap items-center gap-3">
            <span>Someone else changed this room or scenario since you opened it — reload to see their changes, then make yours again.</span>
            <Button type="button" variant="secondary" className="py-1" onClick={async () => { setOverrides({}); await reload(); router.refresh(); }}>
              Reload
            </Button>
          </span>
        </Notice>
      )}
      <nav aria-label="Room sections" className="no-print -mb-px flex gap-1 overflow-x-auto border-b border-paper-line">
        {TABS.map((t) => {
          const next = new URLSearchParams(params.toString());
          next.set("tab", t.id);
          return (
            <Link
              key={t.id}
              href={`${pathname}?${next.toString()}`}
              scroll={false}
              replace
              aria-current={tab === t.id ? "page" : undefined}
              className={`whitespace-nowrap border-b-2 px-4 py-2 text-sm font-medium ${tab === t.id ? "border-kiln-500 text-ink" : "border-transparent text-ink-soft hover:border-paper-line hover:text-ink"}`}
            >
              {t.label}
            </Link>
          );
        })}
      </nav>
      <h2 className="hidden text-xl print:block">{TABS.find((t) => t.id === tab)!.label}</h2>
      {tab === "room" && <RoomTab ws={ws} positions={positions} units={units} actions={actions} onMove={move} />}
      {tab === "room" && roomTabFooter}
      {tab === "low-end" && <LowEndTab ws={ws} positions={positions} units={units} live={live} scenario={current} scenarios={active} onScenario={(id) => setParam({ scenario: id })} actions={actions} onMove={move} />}
      {tab === "absorbers" && <AbsorbersTab units={units} builds={builds} canSave={canSaveBuilds} actions={actions} />}
      {tab === "decay" && <DecayTab ws={ws} scenarios={scenarios} current={current} units={units} builds={builds} actions={actions} onScenario={(id) => setParam({ scenario: id })} />}
    </div>
  );
}
