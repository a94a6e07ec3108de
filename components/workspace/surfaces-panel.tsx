"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { Input, Select } from "@/components/ui/field";
import { FINISHES } from "@/lib/reverb";
import { ALPHA_BANDS_HZ, SURFACE_LABEL, surfacesInputSchema, type SurfaceFinish, type SurfaceId, type SurfaceInput } from "@/lib/schemas/workspace";
import { formatArea, type UnitSystem } from "@/lib/units/length";

export interface SurfaceRow {
  surface: SurfaceId;
  finish: SurfaceFinish;
  openings: SurfaceInput["openings"];
  assumed: boolean;
  areaM2: number;
}

type Draft = { surface: SurfaceId; kind: "finish" | "custom"; finishId: string; alpha: string[]; description: string };

const toDraft = (s: SurfaceRow): Draft =>
  s.finish.kind === "finish"
    ? { surface: s.surface, kind: "finish", finishId: s.finish.finishId, alpha: ALPHA_BANDS_HZ.map(() => "0.10"), description: "" }
    : { surface: s.surface, kind: "custom", finishId: FINISHES[0]!.id, alpha: s.finish.alpha.map((a) => String(a)), description: s.finish.description };

const fmtHz = (f: number) => (f >= 1000 ? `${f / 1000}k` : String(f));

/** The six surfaces and their finish (built-in, or custom α per octave band), saved together. */
export function SurfacesPanel({ surfaces, units, editable, onSave }: { surfaces: SurfaceRow[]; units: UnitSystem; editable: boolean; onSave: (surfaces: SurfaceInput[]) => Promise<string | void> }) {
  const [drafts, setDrafts] = useState<Draft[]>(() => surfaces.map(toDraft));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const key = JSON.stringify(surfaces.map((s) => s.finish));
  const [seenKey, setSeenKey] = useState(key);
  if (key !== seenKey) {
    // saved elsewhere (or by us): show what is stored now
    setSeenKey(key);
    setDrafts(surfaces.map(toDraft));
  }
  const set = (i: number, patch: Partial<Draft>) => setDrafts((d) => d.map((x, k) => (k === i ? { ...x, ...patch } : x)));
  const anyAssumed = surfaces.some((s) => s.assumed);

  async function save() {
    setError(null);
    const body = drafts.map((d, i) => ({
      surface: d.surface,
      finish: d.kind === "finish" ? { kind: "finish" as const, finishId: d.finishId } : { kind: "custom" as const, alpha: d.alpha.map((a) => Number(a.replace(",", "."))), description: d.description },
      openings: surfaces[i]!.openings,
    }));
    const parsed = surfacesInputSchema.safeParse({ version: 1, surfaces: body });
    if (!parsed.success) return setError(`${parsed.error.issues[0]?.path.slice(1).join(" → ") ?? ""}: ${parsed.error.issues[0]?.message ?? "check the values"}`);
    setBusy(true);
    const m = await onSave(parsed.data.surfaces);
    setBusy(false);
    if (m) setError(m);
  }

  if (surfaces.length === 0) return <Notice>This room has no surfaces stored yet.</Notice>;
  return (
    <Card className="p-4">
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-base font-semibold">Surfaces and finishes</h3>
        <span className="text-xs text-ink-faint">α per octave band, random incidence</span>
      </div>
      {anyAssumed && <p className="mb-3 text-sm text-ink-soft">Surfaces marked “assumed” still carry the default finish of a new room: choose what is really there.</p>}
      <div className="space-y-3">
        {drafts.map((d, i) => {
          const s = surfaces[i]!;
          const fin = FINISHES.find((f) => f.id === d.finishId);
          return (
            <div key={d.surface} className="grid gap-2 border-t border-paper-line pt-3 first:border-t-0 first:pt-0 md:grid-cols-[12rem_minmax(0,1fr)]">
              <div>
                <div className="text-sm font-medium">{SURFACE_LABEL[d.surface]}</div>
                <div className="text-xs text-ink-faint tabular-nums">
                  {formatArea(s.areaM2, units)}
                  {s.openings.length > 0 && ` · ${s.openings.length} opening${s.openings.length > 1 ? "s" : ""}`}
                  {s.assumed && <span className="ml-1 rounded bg-near-soft px-1 text-near">assumed</span>}
                </div>
              </div>
              <div className="space-y-2">
                <label className="sr-only" htmlFor={`finish-${d.surface}`}>
                  Finish of the {SURFACE_LABEL[d.surface]}
                </label>
                <Select id={`finish-${d.surface}`} disabled={!editable} value={d.kind === "custom" ? "__custom" : d.finishId} onChange={(e) => (e.target.value === "__custom" ? set(i, { kind: "custom" }) : set(i, { kind: "finish", finishId: e.target.value }))}>
                  {FINISHES.map((f) => (
                    <option key={f.id} value={f.id}>
                      {f.name}
                    </option>
                  ))}
                  <option value="__custom">Custom α per band…</option>
                </Select>
                {d.kind === "finish" && fin && (
                  <p className="text-xs tabular-nums text-ink-faint">
                    α 125–4k Hz: {fin.alpha125to4k.map((a) => a.toFixed(2)).join(" · ")}
                    {fin.note ? ` — ${fin.note}` : ""}
                  </p>
                )}
                {d.kind === "custom" && (
                  <div className="space-y-2">
                    <div className="grid grid-cols-4 gap-1.5 sm:grid-cols-8">
                      {ALPHA_BANDS_HZ.map((f, b) => (
                        <label key={f} className="text-xs text-ink-soft">
                          {fmtHz(f)} Hz
                          <Input className="mt-0.5 px-2 py-1 tabular-nums" inputMode="decimal" aria-label={`${SURFACE_LABEL[d.surface]} α at ${f} Hz`} disabled={!editable} value={d.alpha[b] ?? ""} onChange={(e) => set(i, { alpha: d.alpha.map((a, k) => (k === b ? e.target.value : a)) })} />
                        </label>
                      ))}
                    </div>
                    <Input aria-label={`${SURFACE_LABEL[d.surface]} description`} placeholder="What it is (e.g. timber slats over 50 mm wool)" disabled={!editable} value={d.description} onChange={(e) => set(i, { description: e.target.value })} />
                  </div>
                )}
              </div>
            </div>
          );
        })}
      </div>
      {error && <p role="alert" className="mt-3 text-sm font-medium text-outside">{error}</p>}
      {editable && (
        <div className="no-print mt-4 flex items-center gap-3">
          <Button type="button" onClick={save} disabled={busy}>
            {busy ? "Saving…" : "Save surfaces"}
          </Button>
          <span className="text-xs text-ink-faint">Finish fire ratings follow your local building codes.</span>
        </div>
      )}
    </Card>
  );
}
