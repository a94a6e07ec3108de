"use client";

import { Plus } from "lucide-react";
import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { ConfirmButton } from "@/components/ui/confirm-button";
import { Field, Input, Select } from "@/components/ui/field";
import { POSITION_LIMITS, type PositionKind } from "@/lib/schemas/workspace";
import { formatLength, type UnitSystem } from "@/lib/units/length";
import { LengthInput } from "./length-input";
import { PositionGlyph } from "./plan-view";
import { KIND_LABEL, type PlanPosition } from "./types";

export interface PositionDraft {
  name: string;
  xM: number;
  yM: number;
  zM: number;
  isMain: boolean;
  delayMs: number;
  polarity: 1 | -1;
  drivesBass: boolean;
}

/** Where a new position starts (m): seats near the middle at ear height, sources at the front. */
export function defaultPosition(kind: PositionKind, room: { lengthM: number; widthM: number; heightM: number }, existing: PlanPosition[]): Omit<PlanPosition, "id"> {
  const n = existing.filter((p) => p.kind === kind).length;
  const { lengthM: L, widthM: W, heightM: H } = room;
  const base = { isMain: false, delayMs: 0, polarity: 1 as const, drivesBass: kind !== "main-speaker" };
  if (kind === "seat") {
    const offset = ((n % 3) - 1) * Math.min(0.65, W / 4);
    return { ...base, kind, name: `Seat ${n + 1}`, xM: r(Math.min(L * 0.62 + Math.floor(n / 3) * 0.9, L - 0.3)), yM: r(W / 2 + offset), zM: r(Math.min(1.05, H)), isMain: existing.every((p) => !(p.kind === "seat" && p.isMain)) && n === 0 };
  }
  if (kind === "main-speaker") {
    const ys = [W * 0.25, W * 0.75, W * 0.5];
    return { ...base, kind, name: ["Left", "Right", "Centre"][n] ?? `Speaker ${n + 1}`, xM: r(Math.min(0.5, L / 4)), yM: r(ys[n % 3]!), zM: r(Math.min(1.0, H)) };
  }
  const corners = [[0.3, 0.3], [0.3, W - 0.3], [L - 0.3, 0.3], [L - 0.3, W - 0.3]] as const;
  const c = corners[n % 4]!;
  return { ...base, kind, name: `Sub ${n + 1}`, xM: r(Math.min(c[0], L)), yM: r(Math.min(Math.max(c[1], 0), W)), zM: r(Math.min(0.3, H)) };
}
const r = (v: number) => Math.round(v * 1000) / 1000;

/** The list of positions with add buttons, and the editor of the selected one. */
export function PositionPanel({
  positions,
  selected,
  units,
  room,
  editable,
  onSelect,
  onAdd,
  onSave,
  onDelete,
}: {
  positions: PlanPosition[];
  selected: PlanPosition | null;
  units: UnitSystem;
  room: { lengthM: number; widthM: number; heightM: number };
  editable: boolean;
  onSelect: (id: string) => void;
  onAdd: (kind: PositionKind) => void;
  onSave: (id: string, draft: PositionDraft) => Promise<string | void>;
  onDelete: (id: string) => Promise<string | void>;
}) {
  return (
    <div className="space-y-4">
      {editable && (
        <div className="no-print flex flex-wrap gap-2">
          {(["seat", "main-speaker", "subwoofer"] as const).map((k) => (
            <Button key={k} type="button" variant="secondary" className="px-2.5 py-1.5" onClick={() => onAdd(k)} disabled={k === "seat" ? positions.filter((p) => p.kind === "seat").length >= POSITION_LIMITS.maxSeats : positions.filter((p) => p.kind !== "seat").length >= POSITION_LIMITS.maxSources}>
              <Plus className="h-4 w-4" aria-hidden /> {KIND_LABEL[k].toLowerCase() === "seat" ? "Seat" : KIND_LABEL[k]}
            </Button>
          ))}
        </div>
      )}
      <ul className="divide-y divide-paper-line rounded-[10px] border border-paper-line bg-paper-raised text-sm" aria-label="Seats and sources">
        {positions.map((p) => (
          <li key={p.id}>
            <button type="button" onClick={() => onSelect(p.id)} aria-pressed={selected?.id === p.id} className={`flex w-full items-center gap-2 px-3 py-2 text-left hover:bg-paper-sunk ${selected?.id === p.id ? "bg-kiln-50" : ""}`}>
              <svg width="20" height="20" viewBox="-10 -10 20 20" aria-hidden="true">
                <PositionGlyph kind={p.kind} isMain={p.isMain} size={7} />
              </svg>
              <span className="min-w-0 flex-1 truncate font-medium">
                {p.name}
                {p.isMain && <span className="ml-1 text-xs font-normal text-kiln-700">main seat</span>}
              </span>
              <span className="text-xs tabular-nums text-ink-faint">
                {formatLength(p.xM, units)} · {formatLength(p.yM, units)}
              </span>
            </button>
          </li>
        ))}
      </ul>
      {selected && <PositionForm key={selected.id} position={selected} units={units} room={room} editable={editable} onSave={onSave} onDelete={onDelete} />}
    </div>
  );
}

function PositionForm({ position, units, room, editable, onSave, onDelete }: { position: PlanPosition; units: UnitSystem; room: { lengthM: number; widthM: number; heightM: number }; editable: boolean; onSave: (id: string, d: PositionDraft) => Promise<string | void>; onDelete: (id: string) => Promise<string | void> }) {
  const [d, setD] = useState<PositionDraft>(() => ({ ...position }));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  // a drag moves the position while the form is open: follow it
  useEffect(() => setD((v) => ({ ...v, xM: position.xM, yM: position.yM })), [position.xM, position.yM]);
  const set = <K extends keyof PositionDraft>(k: K, v: PositionDraft[K]) => setD((x) => ({ ...x, [k]: v }));
  const isSeat = position.kind === "seat";
  const bad = (v: number, max: number) => !(Number.isFinite(v) && v >= 0 && v <= max + 1e-9);
  const id = `pos-${position.id.slice(0, 8)}`;
  const dirty = d.name !== position.name || Math.abs(d.xM - position.xM) > 1e-6 || Math.abs(d.yM - position.yM) > 1e-6 || Math.abs(d.zM - position.zM) > 1e-6 || d.isMain !== position.isMain || d.delayMs !== position.delayMs || d.polarity !== position.polarity || d.drivesBass !== position.drivesBass;

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    if (!d.name.trim()) return setError("Give it a name.");
    if (bad(d.xM, room.lengthM) || bad(d.yM, room.widthM) || bad(d.zM, room.heightM)) return setError("The position must lie inside the room.");
    setBusy(true);
    const m = await onSave(position.id, { ...d, name: d.name.trim() });
    setBusy(false);
    if (m) setError(m);
  }

  return (
    <Card className="p-4">
      <form onSubmit={submit} className="space-y-3" aria-label={`Edit ${position.name}`}>
        <div className="flex items-center justify-between">
          <h3 className="text-base font-semibold">{KIND_LABEL[position.kind]}</h3>
          {isSeat && (
            <label className="inline-flex items-center gap-1.5 text-sm">
              <input type="checkbox" checked={d.isMain} disabled={!editable} onChange={(e) => set("isMain", e.target.checked)} className="accent-kiln-500" /> main seat
            </label>
          )}
        </div>
        <Field id={`${id}-name`} label="Name">
          <Input id={`${id}-name`} value={d.name} disabled={!editable} onChange={(e) => set("name", e.target.value)} />
        </Field>
        <div className="grid gap-3 sm:grid-cols-3 lg:grid-cols-1">
          <Field id={`${id}-x`} label="From the front wall (x)">
            <LengthInput id={`${id}-x`} label="From the front wall" units={units} value={d.xM} invalid={bad(d.xM, room.lengthM)} onChange={(v) => set("xM", v)} />
          </Field>
          <Field id={`${id}-y`} label="From the left wall (y)">
            <LengthInput id={`${id}-y`} label="From the left wall" units={units} value={d.yM} invalid={bad(d.yM, room.widthM)} onChange={(v) => set("yM", v)} />
          </Field>
          <Field id={`${id}-z`} label={isSeat ? "Ear height (z)" : "Driver height (z)"}>
            <LengthInput id={`${id}-z`} label={isSeat ? "Ear height" : "Driver height"} units={units} value={d.zM} invalid={bad(d.zM, room.heightM)} onChange={(v) => set("zM", v)} />
          </Field>
        </div>
        {!isSeat && (
          <div className="grid grid-cols-2 gap-3">
            <Field id={`${id}-delay`} label="Delay (ms)">
              <Input id={`${id}-delay`} type="number" min={0} max={POSITION_LIMITS.maxDelayMs} step={0.1} value={Number.isFinite(d.delayMs) ? d.delayMs : ""} disabled={!editable} onChange={(e) => set("delayMs", e.target.value === "" ? Number.NaN : Number(e.target.value))} />
            </Field>
            <Field id={`${id}-polarity`} label="Polarity">
              <Select id={`${id}-polarity`} value={String(d.polarity)} disabled={!editable} onChange={(e) => set("polarity", e.target.value === "-1" ? -1 : 1)}>
                <option value="1">normal (+)</option>
                <option value="-1">inverted (−)</option>
              </Select>
            </Field>
            <label className="col-span-2 inline-flex items-center gap-1.5 text-sm">
              <input type="checkbox" checked={d.drivesBass} disabled={!editable} onChange={(e) => set("drivesBass", e.target.checked)} className="accent-kiln-500" /> plays the low end (counts in the seat responses and the map)
            </label>
          </div>
        )}
        {error && <p role="alert" className="text-sm font-medium text-outside">{error}</p>}
        {editable && (
          <div className="flex flex-wrap justify-between gap-2">
            <Button type="submit" disabled={busy || !dirty}>
              {busy ? "Saving…" : "Save position"}
            </Button>
            <ConfirmButton label="Delete" title={`Delete ${position.name}?`} confirmLabel="Delete" onConfirm={() => onDelete(position.id)}>
              The {KIND_LABEL[position.kind].toLowerCase()} leaves the plan and every scenario&apos;s analysis of this room.
            </ConfirmButton>
          </div>
        )}
      </form>
    </Card>
  );
}
