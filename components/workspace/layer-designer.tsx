"use client";

import { ArrowDown, ArrowUp, Plus, Trash2, TriangleAlert } from "lucide-react";
import { useMemo, useState } from "react";
import { useFieldArray, useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { DELANY_BAZLEY_RANGE, POROUS_MATERIALS, porousMaterial, type Incidence, type Layer } from "@/lib/porous";
import type { BuildInput } from "@/lib/schemas/workspace";
import type { UnitSystem } from "@/lib/units/length";
import { AbsorptionPlot } from "@/components/plots/absorption-plot";
import { designStack, layersToRows, thicknessUnit, type LayerRow } from "./layer-math";

type IncidenceChoice = "normal" | "angle" | "random" | "field";
interface FormValues {
  layers: LayerRow[];
  incidence: IncidenceChoice;
  angleDeg: string;
  name: string;
  notes: string;
}

export interface LibraryBuild {
  id: string;
  name: string;
  kind: string;
  layers: Layer[] | null;
  materialId: string | null;
  notes: string;
}

const KIND_WORDS: Record<LayerRow["kind"], string> = { porous: "Porous layer", air: "Air gap", "resistive-sheet": "Facing (fabric, tissue)" };

function newRow(kind: LayerRow["kind"], u: UnitSystem): LayerRow {
  if (kind === "porous") return { kind, materialId: "mineral-wool-45", thickness: u === "metric" ? "100" : "4", flowResistivity: "15000", model: "miki" };
  if (kind === "air") return { kind, materialId: "", thickness: u === "metric" ? "50" : "2", flowResistivity: "", model: "miki" };
  return { kind, materialId: "", thickness: "", flowResistivity: "200", model: "miki" };
}

function incidenceOf(v: IncidenceChoice, angle: string): Incidence {
  if (v === "angle") {
    const a = Number(angle);
    return { angleDeg: Number.isFinite(a) ? a : 45 };
  }
  return v;
}

/**
 * The layer designer of the Absorbers tab: a stack of porous layers, air gaps and facings, front to
 * back on a rigid wall, with α at the chosen incidence computed here in the browser (lib/porous), the
 * model-validity flags, the single-number ratings, and saving the stack as a build of the library.
 */
export function LayerDesigner({
  units,
  canSave,
  builds,
  onSave,
}: {
  units: UnitSystem;
  canSave: boolean;
  builds: LibraryBuild[];
  onSave: (input: BuildInput) => Promise<{ ok: true } | { ok: false; message: string; fields?: Record<string, string[]> }>;
}) {
  const tu = thicknessUnit(units);
  const { control, register, handleSubmit, reset, setError, formState } = useForm<FormValues>({
    defaultValues: { layers: [newRow("resistive-sheet", units), newRow("porous", units), newRow("air", units)], incidence: "random", angleDeg: "45", name: "", notes: "" },
  });
  const { fields, append, remove, move, update } = useFieldArray({ control, name: "layers" });
  const rows = useWatch({ control, name: "layers" });
  const incidence = useWatch({ control, name: "incidence" });
  const angleDeg = useWatch({ control, name: "angleDeg" });
  const [saved, setSaved] = useState<string | null>(null);
  const [saveError, setSaveError] = useState<string | null>(null);

  const inc = incidenceOf(incidence, angleDeg);
  const result = useMemo(() => designStack(rows ?? [], units, inc), [rows, units, JSON.stringify(inc)]); // eslint-disable-line react-hooks/exhaustive-deps
  const issueAt = (i: number, key: string) => (result.ok ? undefined : result.issues.find((x) => x.path[0] === i && x.path[1] === key)?.message);
  const rowIssue = (i: number) => (result.ok ? undefined : result.issues.find((x) => x.path.length === 1 && x.path[0] === i)?.message);
  const generalIssue = result.ok ? undefined : result.issues.find((x) => x.path.length === 0)?.message;
  const materials = [...new Set((rows ?? []).filter((r) => r.kind === "porous" && r.materialId).map((r) => r.materialId))].map((id) => porousMaterial(id)).filter((m) => m !== undefined);
  const outOfRange = result.ok ? result.spectrum.filter((p) => !p.withinModelRange).map((p) => p.frequencyHz) : [];

  const onSubmit = handleSubmit(async (v) => {
    setSaved(null);
    setSaveError(null);
    if (!result.ok) return;
    if (!v.name.trim()) {
      setError("name", { message: "Give the build a name" });
      return;
    }
    const materialId = (v.layers.find((r) => r.kind === "porous" && r.materialId)?.materialId as string | undefined) ?? null;
    const r = await onSave({ name: v.name.trim(), notes: v.notes, spec: { kind: "porous-panel", layers: result.layers, materialId } });
    if (r.ok) setSaved(v.name.trim());
    else {
      setSaveError(r.message);
      if (r.fields?.name) setError("name", { message: r.fields.name[0] });
    }
  });

  function openBuild(b: LibraryBuild) {
    if (!b.layers) return;
    reset({ layers: layersToRows(b.layers, units, b.materialId), incidence, angleDeg, name: `${b.name} (variant)`, notes: b.notes });
  }

  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,26rem)_minmax(0,1fr)]">
      <form onSubmit={onSubmit} className="space-y-4" noValidate aria-label="Layer designer">
        <Card className="space-y-3 p-4">
          <div className="flex items-baseline justify-between">
            <h3 className="text-base font-semibold">Stack, front to back</h3>
            <span className="text-xs text-ink-faint">rigid wall behind the last layer</span>
          </div>
          <ol className="space-y-3">
            {fields.map((f, i) => {
              const row = rows?.[i] ?? (f as unknown as LayerRow);
              const id = `layer-${i}`;
              return (
                <li key={f.id} className="rounded-md border border-paper-line bg-paper p-3" aria-label={`Layer ${i + 1}: ${KIND_WORDS[row.kind]}`}>
                  <div className="mb-2 flex items-center gap-2">
                    <span className="grid h-6 w-6 place-items-center rounded-full bg-ink text-xs font-semibold text-paper" aria-hidden>
                      {i + 1}
                    </span>
                    <label className="sr-only" htmlFor={`${id}-kind`}>
                      Layer {i + 1} kind
                    </label>
                    <Select
                      id={`${id}-kind`}
                      value={row.kind}
                      onChange={(e) => update(i, newRow(e.target.value as LayerRow["kind"], units))}
                      className="w-auto flex-1 py-1"
                    >
                      <option value="porous">{KIND_WORDS.porous}</option>
                      <option value="air">{KIND_WORDS.air}</option>
                      <option value="resistive-sheet">{KIND_WORDS["resistive-sheet"]}</option>
                    </Select>
                    <Button type="button" variant="ghost" className="px-2 py-1" aria-label={`Move layer ${i + 1} toward the front`} disabled={i === 0} onClick={() => move(i, i - 1)}>
                      <ArrowUp className="h-4 w-4" aria-hidden />
                    </Button>
                    <Button type="button" variant="ghost" className="px-2 py-1" aria-label={`Move layer ${i + 1} toward the wall`} disabled={i === fields.length - 1} onClick={() => move(i, i + 1)}>
                      <ArrowDown className="h-4 w-4" aria-hidden />
                    </Button>
                    <Button type="button" variant="ghost" className="px-2 py-1" aria-label={`Remove layer ${i + 1}`} disabled={fields.length === 1} onClick={() => remove(i)}>
                      <Trash2 className="h-4 w-4" aria-hidden />
                    </Button>
                  </div>
                  {row.kind === "porous" && (
                    <div className="grid grid-cols-2 gap-2">
                      <Field
                        id={`${id}-material`}
                        label="Material"
                        className="col-span-2"
                        hint={porousMaterial(row.materialId) ? `Typical σ ${porousMaterial(row.materialId)!.flowResistivity.typical.toLocaleString("en-GB")} Pa·s/m² (usual ${porousMaterial(row.materialId)!.flowResistivity.min.toLocaleString("en-GB")}–${porousMaterial(row.materialId)!.flowResistivity.max.toLocaleString("en-GB")}); use a measured value where you have one.` : "Type the airflow resistivity of your material (ISO 9053)."}
                      >
                        <Select
                          id={`${id}-material`}
                          {...register(`layers.${i}.materialId`, {
                            onChange: (e) => {
                              const m = porousMaterial(e.target.value);
                              if (m) update(i, { ...row, materialId: m.id, flowResistivity: String(m.flowResistivity.typical) });
                            },
                          })}
                        >
                          {POROUS_MATERIALS.map((m) => (
                            <option key={m.id} value={m.id}>
                              {m.name}
                            </option>
                          ))}
                          <option value="">Other — σ typed in</option>
                        </Select>
                      </Field>
                      <Field id={`${id}-thickness`} label={`Thickness (${tu})`} error={issueAt(i, "thicknessM")}>
                        <Input id={`${id}-thickness`} inputMode="decimal" aria-invalid={issueAt(i, "thicknessM") ? true : undefined} {...register(`layers.${i}.thickness`)} />
                      </Field>
                      <Field id={`${id}-sigma`} label="σ (Pa·s/m²)" error={issueAt(i, "flowResistivity")}>
                        <Input id={`${id}-sigma`} inputMode="numeric" aria-invalid={issueAt(i, "flowResistivity") ? true : undefined} {...register(`layers.${i}.flowResistivity`)} />
                      </Field>
                      <Field id={`${id}-model`} label="Model" className="col-span-2">
                        <Select id={`${id}-model`} {...register(`layers.${i}.model`)}>
                          <option value="miki">Miki (1990)</option>
                          <option value="delany-bazley">Delany–Bazley (1970)</option>
                        </Select>
                      </Field>
                    </div>
                  )}
                  {row.kind === "air" && (
                    <Field id={`${id}-thickness`} label={`Gap (${tu})`} error={issueAt(i, "thicknessM")}>
                      <Input id={`${id}-thickness`} inputMode="decimal" aria-invalid={issueAt(i, "thicknessM") ? true : undefined} {...register(`layers.${i}.thickness`)} />
                    </Field>
                  )}
                  {row.kind === "resistive-sheet" && (
                    <Field id={`${id}-r`} label="Flow resistance R (Pa·s/m)" hint="About 0–100 for an open weave, a few hundred for a tissue, thousands for felt." error={issueAt(i, "flowResistance")}>
                      <Input id={`${id}-r`} inputMode="numeric" aria-invalid={issueAt(i, "flowResistance") ? true : undefined} {...register(`layers.${i}.flowResistivity`)} />
                    </Field>
                  )}
                  {rowIssue(i) && <p className="mt-1 text-xs font-medium text-outside">{rowIssue(i)}</p>}
                </li>
              );
            })}
          </ol>
          <div className="flex flex-wrap gap-2">
            <Button type="button" variant="secondary" onClick={() => append(newRow("porous", units))}>
              <Plus className="h-4 w-4" aria-hidden /> Porous layer
            </Button>
            <Button type="button" variant="secondary" onClick={() => append(newRow("air", units))}>
              <Plus className="h-4 w-4" aria-hidden /> Air gap
            </Button>
            <Button type="button" variant="secondary" onClick={() => append(newRow("resistive-sheet", units))}>
              <Plus className="h-4 w-4" aria-hidden /> Facing
            </Button>
          </div>
        </Card>

        <Notice tone="caution">
          <span className="flex gap-2">
            <TriangleAlert className="mt-0.5 h-4 w-4 flex-none text-near" aria-hidden />
            <span>
              {materials.length > 0 ? materials[0]!.caution : "Mineral and glass wool fibres irritate skin, eyes and airways: wear gloves, eye protection and a dust mask when cutting, and keep the fill covered."}{" "}
              Check the fire rating of the fill, facing and frame against your local building codes before it goes into a room.
            </span>
          </span>
        </Notice>

        {canSave ? (
          <Card className="space-y-3 p-4">
            <h3 className="text-base font-semibold">Save to the firm&apos;s library</h3>
            {saved && <Notice tone="success">“{saved}” is in the library. Add it to a scenario on the Decay tab.</Notice>}
            {saveError && <Notice tone="error">{saveError}</Notice>}
            <Field id="build-name" label="Build name" error={formState.errors.name?.message}>
              <Input id="build-name" aria-invalid={formState.errors.name ? true : undefined} {...register("name")} />
            </Field>
            <Field id="build-notes" label="Notes (optional)">
              <Textarea id="build-notes" rows={2} className="min-h-0" {...register("notes")} />
            </Field>
            <Button type="submit" disabled={!result.ok || formState.isSubmitting}>
              {formState.isSubmitting ? "Saving…" : "Save build"}
            </Button>
          </Card>
        ) : (
          <p className="text-sm text-ink-soft">Your role can try stacks here; saving builds to the library is for engineers and owners.</p>
        )}
      </form>

      <div className="min-w-0 space-y-4">
        <Card className="p-4">
          <div className="mb-3 flex flex-wrap items-center gap-3">
            <h3 className="text-base font-semibold">Absorption coefficient α</h3>
            <fieldset className="flex flex-wrap items-center gap-2 text-sm">
              <legend className="sr-only">Incidence</legend>
              {(["normal", "angle", "random", "field"] as const).map((v) => (
                <label key={v} className="inline-flex cursor-pointer items-center gap-1.5 rounded-md border border-paper-line px-2 py-1 has-[:checked]:border-ink has-[:checked]:bg-paper-sunk">
                  <input type="radio" value={v} {...register("incidence")} className="accent-kiln-500" />
                  {v === "normal" ? "normal (0°)" : v === "angle" ? "at an angle" : v === "random" ? "random (0–90°)" : "field (0–78°)"}
                </label>
              ))}
              {incidence === "angle" && (
                <label className="inline-flex items-center gap-1.5">
                  <span className="sr-only">Angle of incidence in degrees</span>
                  <Input className="w-20 py-1" inputMode="decimal" aria-label="Angle of incidence in degrees" {...register("angleDeg")} />°
                </label>
              )}
            </fieldset>
          </div>
          {result.ok ? (
            <AbsorptionPlot title={`α of the stack, ${typeof inc === "string" ? `${inc} incidence` : `${inc.angleDeg}° incidence`}`} builds={[{ label: "This stack", points: result.spectrum }]} domainHz={[50, 5000]} />
          ) : (
            <Notice tone="error">{generalIssue ?? result.issues[0]?.message ?? "The stack needs attention."} Fix the marked field to see the curve.</Notice>
          )}
          {result.ok && outOfRange.length > 0 && (
            <p className="mt-3 text-xs text-ink-soft">
              <span className="font-medium text-near">Hollow markers, dotted line:</span> at {outOfRange[0]}
              {outOfRange.length > 1 ? `–${outOfRange[outOfRange.length - 1]}` : ""} Hz a porous layer is outside its model&apos;s fitted range
              ({DELANY_BAZLEY_RANGE.min} ≤ ρ₀f/σ ≤ {DELANY_BAZLEY_RANGE.max}); the value there is an extrapolation — trust a measurement over it.
            </p>
          )}
        </Card>
        {result.ok && <RatingCard result={result} units={units} />}
        <LibraryList builds={builds} onOpen={openBuild} />
      </div>
    </div>
  );
}

function RatingCard({ result, units }: { result: Extract<ReturnType<typeof designStack>, { ok: true }>; units: UnitSystem }) {
  const { iso11654, nrc, saa, thirdOctaves } = result.rating;
  const anyOut = thirdOctaves.some((b) => !b.withinModelRange);
  const depth = units === "metric" ? `${(result.totalDepthM * 1000).toFixed(0)} mm` : `${(result.totalDepthM / 0.0254).toFixed(1)} in`;
  return (
    <Card className="p-4">
      <h3 className="mb-2 text-base font-semibold">Single-number ratings (modelled, random incidence)</h3>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-5">
        {[
          ["αw (ISO 11654)", `${iso11654.alphaW.toFixed(2)}${iso11654.indicators ? ` (${iso11654.indicators})` : ""}`],
          ["Class", iso11654.absorptionClass],
          ["NRC (ASTM C423)", nrc.toFixed(2)],
          ["SAA", saa.toFixed(2)],
          ["Total depth", depth],
        ].map(([k, v]) => (
          <div key={k}>
            <dt className="text-xs tracking-wide text-ink-faint">{k}</dt>
            <dd className="text-lg tabular-nums">{v}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-2 text-xs text-ink-soft">
        αp at 250/500/1k/2k/4k Hz: {iso11654.practical.map((p) => p.toFixed(2)).join(" / ")}. A model estimate for an infinite layer without edge effects — not a
        laboratory measurement{anyOut ? "; some rating bands fall outside a layer's model range" : ""}.
      </p>
    </Card>
  );
}

function LibraryList({ builds, onOpen }: { builds: LibraryBuild[]; onOpen: (b: LibraryBuild) => void }) {
  return (
    <Card className="p-4">
      <h3 className="mb-2 text-base font-semibold">The firm&apos;s library</h3>
      {builds.length === 0 ? (
        <p className="text-sm text-ink-soft">No builds saved yet. Design a stack on the left and save it; it then appears here and in the Decay tab&apos;s “Add from the library”.</p>
      ) : (
        <ul className="divide-y divide-paper-line text-sm">
          {builds.map((b) => (
            <li key={b.id} className="flex items-center justify-between gap-3 py-2">
              <span className="min-w-0">
                <span className="font-medium">{b.name}</span> <span className="text-ink-faint">· {b.kind.replace("-", " ")}</span>
                {b.notes && <span className="block truncate text-xs text-ink-soft">{b.notes}</span>}
              </span>
              {b.layers && (
                <Button type="button" variant="ghost" className="px-2 py-1" onClick={() => onOpen(b)} aria-label={`Open ${b.name} in the designer`}>
                  Open
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
