"use client";

import { Input, Select } from "@/components/ui/field";
import type { CeilingEdge, SizerObjective, VerticalCorner } from "@/lib/sizer";

/** The user's choices for the sizer, as the form holds them (lengths in m). */
export interface SizerChoices {
  scenarioId: string;
  objective: SizerObjective;
  maxDepthM: number;
  corners: VerticalCorner[];
  edges: { edge: CeilingEdge; on: boolean; lengthM: number }[];
  wallAreaM2: number;
  budget: number | null;
  maxItems: number | null;
}

const CORNERS: { id: VerticalCorner; label: string }[] = [
  { id: "front-left", label: "Front left" },
  { id: "front-right", label: "Front right" },
  { id: "rear-left", label: "Rear left" },
  { id: "rear-right", label: "Rear right" },
];
const OBJECTIVES: { id: SizerObjective; label: string; hint: string }[] = [
  { id: "depth", label: "Least depth", hint: "keeps the room as open as it can" },
  { id: "count", label: "Fewest items", hint: "fewest things to build and hang" },
  { id: "cost", label: "Lowest cost", hint: "materials at the demo prices" },
];

const num = (s: string): number => (s.trim() === "" ? NaN : Number(s));

/** Objective and limits of the bass-trap sizer; every change is sent on its own (the answer follows live). */
export function SizerLimitsForm({ value, onChange, scenarios, errors }: { value: SizerChoices; onChange: (v: SizerChoices) => void; scenarios: { id: string; name: string; isBaseline: boolean }[]; errors?: Record<string, string[]> }) {
  const set = (patch: Partial<SizerChoices>) => onChange({ ...value, ...patch });
  const err = (k: string) => errors?.[k]?.[0];
  return (
    <form className="space-y-4 text-sm" onSubmit={(e) => e.preventDefault()} aria-label="Sizer limits">
      <label className="block space-y-1">
        <span className="font-medium">Start from scenario</span>
        <Select value={value.scenarioId} onChange={(e) => set({ scenarioId: e.target.value })} data-testid="sizer-scenario">
          {scenarios.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
              {s.isBaseline ? " (untreated)" : ""}
            </option>
          ))}
        </Select>
        <span className="block text-xs text-ink-faint">Its items are kept; the sizer adds low-frequency treatment on top.</span>
      </label>
      <fieldset className="space-y-1.5">
        <legend className="font-medium">Aim for</legend>
        {OBJECTIVES.map((o) => (
          <label key={o.id} className="flex items-baseline gap-2">
            <input type="radio" name="objective" value={o.id} checked={value.objective === o.id} onChange={() => set({ objective: o.id })} />
            <span>
              {o.label} <span className="text-xs text-ink-faint">— {o.hint}</span>
            </span>
          </label>
        ))}
      </fieldset>
      <label className="block space-y-1">
        <span className="font-medium">Deepest item from its wall (mm)</span>
        <Input type="number" min={0} max={2000} step={10} value={Number.isFinite(value.maxDepthM) ? Math.round(value.maxDepthM * 1000) : ""} onChange={(e) => set({ maxDepthM: num(e.target.value) / 1000 })} aria-invalid={!!err("limits.maxDepthM")} data-testid="sizer-max-depth" />
        {err("limits.maxDepthM") && <span className="text-xs text-outside">{err("limits.maxDepthM")}</span>}
        <span className="block text-xs text-ink-faint">A corner trap stands out by its leg, depth × √2.</span>
      </label>
      <fieldset className="space-y-1">
        <legend className="font-medium">Free floor-to-ceiling corners</legend>
        <div className="grid grid-cols-2 gap-1">
          {CORNERS.map((c) => (
            <label key={c.id} className="flex items-center gap-2">
              <input type="checkbox" checked={value.corners.includes(c.id)} onChange={(e) => set({ corners: e.target.checked ? CORNERS.map((x) => x.id).filter((id) => id === c.id || value.corners.includes(id)) : value.corners.filter((x) => x !== c.id) })} />
              {c.label}
            </label>
          ))}
        </div>
      </fieldset>
      <fieldset className="space-y-1">
        <legend className="font-medium">Free wall–ceiling edges</legend>
        {value.edges.map((e, i) => (
          <div key={e.edge} className="flex items-center gap-2">
            <label className="flex w-20 items-center gap-2 capitalize">
              <input type="checkbox" checked={e.on} onChange={(ev) => set({ edges: value.edges.map((x, k) => (k === i ? { ...x, on: ev.target.checked } : x)) })} />
              {e.edge}
            </label>
            <Input type="number" min={0} step={0.1} className="w-24 py-1" aria-label={`Free length of the ${e.edge} edge, m`} disabled={!e.on} value={Number.isFinite(e.lengthM) ? e.lengthM : ""} onChange={(ev) => set({ edges: value.edges.map((x, k) => (k === i ? { ...x, lengthM: num(ev.target.value) } : x)) })} />
            <span className="text-xs text-ink-faint">m free</span>
          </div>
        ))}
      </fieldset>
      <label className="block space-y-1">
        <span className="font-medium">Free wall area for panels and membrane traps (m²)</span>
        <Input type="number" min={0} step={0.5} value={Number.isFinite(value.wallAreaM2) ? value.wallAreaM2 : ""} onChange={(e) => set({ wallAreaM2: num(e.target.value) })} aria-invalid={!!err("limits.wallAreaM2")} data-testid="sizer-wall-area" />
        {err("limits.wallAreaM2") && <span className="text-xs text-outside">{err("limits.wallAreaM2")}</span>}
      </label>
      <div className="grid grid-cols-2 gap-3">
        <label className="block space-y-1">
          <span className="font-medium">Budget</span>
          <Input type="number" min={0} step={50} placeholder="none" value={value.budget ?? ""} onChange={(e) => set({ budget: e.target.value === "" ? null : Number(e.target.value) })} />
        </label>
        <label className="block space-y-1">
          <span className="font-medium">Most items</span>
          <Input type="number" min={0} step={1} placeholder="none" value={value.maxItems ?? ""} onChange={(e) => set({ maxItems: e.target.value === "" ? null : Number(e.target.value) })} />
        </label>
      </div>
    </form>
  );
}

/** The POST /api/v1/sizer body for the choices. */
export function sizerRequest(roomId: string, v: SizerChoices) {
  return {
    roomId,
    scenarioId: v.scenarioId,
    objective: v.objective,
    limits: {
      maxDepthM: v.maxDepthM,
      verticalCorners: v.corners,
      ceilingEdges: v.edges.filter((e) => e.on).map((e) => ({ edge: e.edge, lengthM: e.lengthM })),
      wallAreaM2: v.wallAreaM2,
      ...(v.budget !== null ? { budget: v.budget } : {}),
      ...(v.maxItems !== null ? { maxItems: v.maxItems } : {}),
    },
  };
}
