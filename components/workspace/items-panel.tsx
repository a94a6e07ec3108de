"use client";

import { Pencil, Plus, TriangleAlert } from "lucide-react";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { ConfirmButton } from "@/components/ui/confirm-button";
import { Field, Input, Select } from "@/components/ui/field";
import type { Build } from "@/db/queries/builds";
import type { Scenario } from "@/db/queries/scenarios";
import type { ScenarioResults } from "@/lib/analysis";
import { CEILING_EDGES, SURFACE_IDS, SURFACE_LABEL, VERTICAL_CORNERS, surfaceExtentM, type ItemSpec, type Placement, type SurfaceId } from "@/lib/schemas/workspace";
import { formatLength, type UnitSystem } from "@/lib/units/length";
import { LengthInput } from "./length-input";
import type { WorkspaceActions } from "./room-workspace";

type Item = Scenario["items"][number];
type Room = { lengthM: number; widthM: number; heightM: number };
type Where = { kind: "surface"; surface: SurfaceId } | { kind: "corner" };

const money = (v: number) => v.toLocaleString("en-GB", { minimumFractionDigits: 2, maximumFractionDigits: 2 });

/** Placements for `count` units: spread evenly along the surface at mid height, or round the corners. */
export function placementsFor(spec: ItemSpec, count: number, where: Where, room: Room): Placement[] {
  if (spec.kind === "corner-trap") {
    const corners = spec.orientation === "floor-to-ceiling" ? VERTICAL_CORNERS : CEILING_EDGES;
    return Array.from({ length: Math.min(count, corners.length) }, (_, i) => ({ kind: "corner" as const, corner: corners[i]! }));
  }
  if (where.kind !== "surface") return [];
  const ext = surfaceExtentM(where.surface, room);
  const w = spec.widthM, h = spec.heightM;
  if (w > ext.uM || h > ext.vM) return [];
  const n = Math.min(count, Math.floor(ext.uM / w));
  return Array.from({ length: n }, (_, i) => ({ kind: "surface" as const, surface: where.surface, uM: round(w / 2 + ((ext.uM - w) * (i + 1)) / (n + 1)), vM: round(ext.vM / 2) }));
}
const round = (v: number) => Math.round(v * 1000) / 1000;

function whereText(item: Item): string {
  if (item.placements.length === 0) return "not placed yet";
  const by = new Map<string, number>();
  for (const p of item.placements) {
    const k = p.kind === "surface" ? SURFACE_LABEL[p.surface].replace(/ \(.*\)$/, "").toLowerCase() : `${p.corner} corner`;
    by.set(k, (by.get(k) ?? 0) + 1);
  }
  const placed = [...by.entries()].map(([k, n]) => (n > 1 ? `${k} ×${n}` : k)).join(", ");
  return item.placements.length < item.count ? `${placed}; ${item.count - item.placements.length} not placed` : placed;
}

function sizeText(spec: ItemSpec, units: UnitSystem) {
  return spec.kind === "corner-trap" ? `${formatLength(spec.lengthM, units)} long, ${formatLength(spec.depthM, units)} deep` : `${formatLength(spec.widthM, units)} × ${formatLength(spec.heightM, units)}`;
}

/** The treatment items of the current scenario: add from the library, edit, remove; cost and cautions. */
export function ItemsPanel({ scenario, results, builds, room, units, editable, actions }: { scenario: Scenario; results: ScenarioResults; builds: Build[]; room: Room; units: UnitSystem; editable: boolean; actions: WorkspaceActions }) {
  const [editing, setEditing] = useState<string | "new" | null>(null);
  const items = scenario.items;
  const cautions = results.cautions;
  return (
    <section aria-labelledby="items-title" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="items-title" className="text-lg font-semibold">
          Treatment in “{scenario.name}”
        </h2>
        {editable && !scenario.isBaseline && editing !== "new" && (
          <Button type="button" variant="secondary" className="no-print" onClick={() => setEditing("new")} disabled={builds.length === 0}>
            <Plus className="h-4 w-4" aria-hidden /> Add from the library
          </Button>
        )}
      </div>
      {editable && !scenario.isBaseline && builds.length === 0 && <p className="text-sm text-ink-soft">The library is empty: design a stack on the Absorbers tab and save it, then add it here.</p>}
      {editing === "new" && <ItemForm builds={builds} room={room} units={units} onCancel={() => setEditing(null)} onSave={async (input) => { const r = await actions.addItem(scenario.id, input); if (r.ok) setEditing(null); return r.ok ? undefined : r.message; }} />}
      {items.length === 0 ? (
        <EmptyState title={scenario.isBaseline ? "The baseline is the room as it is" : "No treatment in this scenario yet"}>
          {scenario.isBaseline ? "Keep the baseline untreated; create a scenario with “New from baseline” and add panels and traps there." : "Add panels or bass traps from the firm's library to see what they do to the decay."}
        </EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-[10px] border border-paper-line bg-paper-raised">
          <table className="w-full text-sm">
            <caption className="sr-only">Treatment items of {scenario.name}</caption>
            <thead className="bg-paper-sunk/70 text-left text-xs tracking-wide text-ink-soft">
              <tr>
                <th className="px-3 py-2 font-medium">Item</th>
                <th className="px-3 py-2 font-medium">Count</th>
                <th className="px-3 py-2 font-medium">Face / size</th>
                <th className="px-3 py-2 font-medium">Where</th>
                <th className="px-3 py-2 text-right font-medium">Unit cost</th>
                <th className="px-3 py-2 text-right font-medium">Cost</th>
                {editable && <th className="no-print px-3 py-2"><span className="sr-only">Actions</span></th>}
              </tr>
            </thead>
            <tbody>
              {items.map((it) =>
                editing === it.id ? (
                  <tr key={it.id}>
                    <td colSpan={editable ? 7 : 6} className="p-3">
                      <ItemForm item={it} builds={builds} room={room} units={units} onCancel={() => setEditing(null)} onSave={async (input) => { const r = await actions.updateItem(scenario.id, it.id, input); if (r.ok) setEditing(null); return r.ok ? undefined : r.message; }} />
                    </td>
                  </tr>
                ) : (
                  <tr key={it.id} className="border-t border-paper-line/70">
                    <td className="px-3 py-2">
                      <div className="font-medium">{it.name}</div>
                      <div className="text-xs text-ink-faint">{it.kind.replace("-", " ")}</div>
                    </td>
                    <td className="px-3 py-2 tabular-nums">{it.count}</td>
                    <td className="px-3 py-2 tabular-nums">{sizeText(it.spec, units)}</td>
                    <td className="px-3 py-2">{whereText(it)}</td>
                    <td className="px-3 py-2 text-right tabular-nums">{money(it.unitCost)}</td>
                    <td className="px-3 py-2 text-right tabular-nums">{money(it.unitCost * it.count)}</td>
                    {editable && (
                      <td className="no-print px-3 py-2">
                        <div className="flex justify-end gap-1">
                          <Button type="button" variant="ghost" className="px-2 py-1" aria-label={`Edit ${it.name}`} onClick={() => setEditing(it.id)}>
                            <Pencil className="h-4 w-4" aria-hidden />
                          </Button>
                          <ConfirmButton label="Remove" title={`Remove ${it.name}?`} confirmLabel="Remove" onConfirm={async () => { const r = await actions.removeItem(scenario.id, it.id); return r.ok ? undefined : r.message; }}>
                            The item leaves “{scenario.name}”; the build stays in the library.
                          </ConfirmButton>
                        </div>
                      </td>
                    )}
                  </tr>
                ),
              )}
              <tr className="border-t border-paper-line bg-paper-sunk/40 font-medium">
                <td className="px-3 py-2">Total</td>
                <td className="px-3 py-2 tabular-nums">{results.items.count}</td>
                <td colSpan={3} />
                <td className="px-3 py-2 text-right tabular-nums">{money(results.items.cost)}</td>
                {editable && <td className="no-print" />}
              </tr>
            </tbody>
          </table>
        </div>
      )}
      {cautions.length > 0 && (
        <ul className="space-y-1.5 rounded-md border border-near/40 bg-near-soft px-3.5 py-2.5 text-sm" aria-label="Cautions">
          {[...new Map(cautions.map((c) => [c.message, c])).values()].map((c) => (
            <li key={c.message} className="flex gap-2">
              <TriangleAlert className="mt-0.5 h-4 w-4 flex-none text-near" aria-hidden />
              <span>
                {c.itemId && <span className="font-medium">{items.find((i) => i.id === c.itemId)?.name}: </span>}
                {c.message}
              </span>
            </li>
          ))}
          <li className="pl-6 text-xs text-ink-soft">Follow local building codes; for structural fixings or work near wiring, ask a licensed professional.</li>
        </ul>
      )}
    </section>
  );
}

function ItemForm({ item, builds, room, units, onSave, onCancel }: { item?: Item; builds: Build[]; room: Room; units: UnitSystem; onSave: (input: { name: string; spec: ItemSpec; count: number; placements: Placement[]; unitCost: number; unitMassKg: number | null; buildId: string | null; notes: string }) => Promise<string | void>; onCancel: () => void }) {
  const [buildId, setBuildId] = useState(item?.buildId ?? builds[0]?.id ?? "");
  const build = builds.find((b) => b.id === buildId);
  const baseSpec = item?.spec ?? null;
  const kind = baseSpec?.kind ?? build?.kind ?? "porous-panel";
  const [name, setName] = useState(item?.name ?? build?.name ?? "");
  const [count, setCount] = useState(String(item?.count ?? (kind === "corner-trap" ? 2 : 4)));
  const [widthM, setWidthM] = useState(baseSpec && baseSpec.kind !== "corner-trap" ? baseSpec.widthM : 0.6);
  const [heightM, setHeightM] = useState(baseSpec && baseSpec.kind !== "corner-trap" ? baseSpec.heightM : 1.2);
  const [lengthM, setLengthM] = useState(baseSpec?.kind === "corner-trap" ? baseSpec.lengthM : Math.min(room.heightM, 2.4));
  const firstSurface = item?.placements.find((p) => p.kind === "surface");
  const [surface, setSurface] = useState<SurfaceId>(firstSurface?.kind === "surface" ? firstSurface.surface : "rear");
  const [unitCost, setUnitCost] = useState(String(item?.unitCost ?? 0));
  const [unitMass, setUnitMass] = useState(item?.unitMassKg === null || item?.unitMassKg === undefined ? "" : String(item.unitMassKg));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const id = item ? `item-${item.id.slice(0, 6)}` : "item-new";

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setError(null);
    const src = item?.spec ?? build?.spec;
    if (!src) return setError("Choose a build from the library.");
    const n = Number(count);
    if (!Number.isInteger(n) || n < 1) return setError("Count must be a whole number of at least 1.");
    let spec: ItemSpec;
    if (src.kind === "corner-trap") spec = { ...src, lengthM };
    else if (src.kind === "porous-panel") spec = { ...src, widthM, heightM, exposedSides: "exposedSides" in src ? Boolean(src.exposedSides) : false };
    else spec = { ...src, widthM, heightM };
    if (![widthM, heightM, lengthM].every(Number.isFinite)) return setError("Give the size as numbers.");
    const placements = placementsFor(spec, n, spec.kind === "corner-trap" ? { kind: "corner" } : { kind: "surface", surface }, room);
    const cost = Number(unitCost.replace(",", "."));
    const mass = unitMass.trim() === "" ? null : Number(unitMass.replace(",", "."));
    if (!Number.isFinite(cost) || cost < 0) return setError("Unit cost must be a number of at least 0.");
    if (mass !== null && (!Number.isFinite(mass) || mass < 0)) return setError("Unit mass must be a number of kg, or empty.");
    setBusy(true);
    const m = await onSave({ name: name.trim() || build?.name || "Item", spec, count: n, placements, unitCost: cost, unitMassKg: mass, buildId: item?.buildId ?? (build?.id ?? null), notes: item?.notes ?? "" });
    setBusy(false);
    if (m) setError(m);
  }

  return (
    <Card className="p-4">
      <form onSubmit={submit} className="space-y-3" aria-label={item ? `Edit ${item.name}` : "Add a treatment item"}>
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          {!item && (
            <Field id={`${id}-build`} label="Build from the library">
              <Select id={`${id}-build`} value={buildId} onChange={(e) => { setBuildId(e.target.value); setName(builds.find((b) => b.id === e.target.value)?.name ?? ""); }}>
                {builds.map((b) => (
                  <option key={b.id} value={b.id}>
                    {b.name} ({b.kind.replace("-", " ")})
                  </option>
                ))}
              </Select>
            </Field>
          )}
          <Field id={`${id}-name`} label="Item name">
            <Input id={`${id}-name`} value={name} onChange={(e) => setName(e.target.value)} />
          </Field>
          <Field id={`${id}-count`} label="Count">
            <Input id={`${id}-count`} type="number" min={1} step={1} value={count} onChange={(e) => setCount(e.target.value)} />
          </Field>
          {kind === "corner-trap" ? (
            <Field id={`${id}-length`} label="Run length of each trap">
              <LengthInput id={`${id}-length`} label="Run length" units={units} value={lengthM} onChange={setLengthM} />
            </Field>
          ) : (
            <>
              <Field id={`${id}-w`} label="Face width">
                <LengthInput id={`${id}-w`} label="Face width" units={units} value={widthM} onChange={setWidthM} />
              </Field>
              <Field id={`${id}-h`} label="Face height">
                <LengthInput id={`${id}-h`} label="Face height" units={units} value={heightM} onChange={setHeightM} />
              </Field>
              <Field id={`${id}-where`} label="Hangs on">
                <Select id={`${id}-where`} value={surface} onChange={(e) => setSurface(e.target.value as SurfaceId)}>
                  {SURFACE_IDS.filter((s) => s !== "floor").map((s) => (
                    <option key={s} value={s}>
                      {SURFACE_LABEL[s]}
                    </option>
                  ))}
                </Select>
              </Field>
            </>
          )}
          <Field id={`${id}-cost`} label="Unit cost">
            <Input id={`${id}-cost`} inputMode="decimal" value={unitCost} onChange={(e) => setUnitCost(e.target.value)} />
          </Field>
          <Field id={`${id}-mass`} label="Unit mass (kg, optional)" hint="Heavy units get a fixing caution.">
            <Input id={`${id}-mass`} inputMode="decimal" value={unitMass} onChange={(e) => setUnitMass(e.target.value)} />
          </Field>
        </div>
        {kind === "corner-trap" && <p className="text-xs text-ink-soft">Corner traps go into the room&apos;s corners in turn (up to four).</p>}
        {error && <p role="alert" className="text-sm font-medium text-outside">{error}</p>}
        <div className="flex gap-2">
          <Button type="submit" disabled={busy}>
            {busy ? "Saving…" : item ? "Save item" : "Add item"}
          </Button>
          <Button type="button" variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      </form>
    </Card>
  );
}
