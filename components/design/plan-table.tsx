import type { ItemProgress } from "@/db/queries/build-progress";
import type { TreatmentItem } from "@/db/queries/analysis";
import type { ItemResult } from "@/lib/analysis";
import type { Placement } from "@/lib/schemas/workspace";
import { describeBuild, itemBuild } from "@/lib/build-sheet/job-from-items";

const fmtHz = (f: number) => (f >= 1000 ? `${f / 1000}k` : String(f));
const SURFACE: Record<string, string> = { front: "front wall", rear: "rear wall", left: "left wall", right: "right wall", floor: "floor", ceiling: "ceiling" };
const money = (x: number) => x.toLocaleString("en-GB", { minimumFractionDigits: 0, maximumFractionDigits: 0 });

function where(p: Placement): string {
  if (p.kind === "corner") return p.corner.endsWith("-ceiling") ? `${p.corner.replace("-ceiling", "")} wall–ceiling edge` : `${p.corner} corner`;
  return `${SURFACE[p.surface]} (${p.uM.toFixed(2)}, ${p.vM.toFixed(2)})`;
}

function face(i: TreatmentItem): string {
  const s = i.spec;
  if (s.kind === "corner-trap") return `${Math.round(s.depthM * 1000)} mm deep × ${Math.round(s.lengthM * 1000)} mm`;
  return `${Math.round(s.widthM * 1000)} × ${Math.round(s.heightM * 1000)} mm`;
}

/** The plan's items: build, face size, count, location, predicted absorption per band, cost, weight, progress; and the totals. */
export function PlanTable({ items, byItem, bandsHz, addedM2, progress }: { items: TreatmentItem[]; byItem: ItemResult[]; bandsHz: number[]; addedM2: number[]; progress: Map<string, ItemProgress> }) {
  const weight = items.reduce((s, i) => s + (i.unitMassKg ?? 0) * i.count, 0);
  const unknownMass = items.some((i) => i.unitMassKg === null);
  const cost = items.reduce((s, i) => s + i.unitCost * i.count, 0);
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" data-testid="plan-items">
        <thead className="text-xs uppercase tracking-wide text-ink-faint">
          <tr className="text-left">
            <th className="py-1 pr-3 font-medium" rowSpan={2}>Item and build</th>
            <th className="py-1 pr-3 text-right font-medium" rowSpan={2}>Count</th>
            <th className="py-1 pr-3 font-medium" rowSpan={2}>Where</th>
            <th className="py-1 text-center font-medium" colSpan={bandsHz.length}>Absorption area added, m², per octave band (Hz)</th>
            <th className="py-1 pl-3 text-right font-medium" rowSpan={2}>Weight</th>
            <th className="py-1 pl-3 text-right font-medium" rowSpan={2}>Cost</th>
            <th className="py-1 pl-3 font-medium" rowSpan={2}>On site</th>
          </tr>
          <tr className="text-right">
            {bandsHz.map((f) => (
              <th key={f} className="px-1 py-1 font-medium">{fmtHz(f)}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {items.map((i) => {
            const r = byItem.find((b) => b.id === i.id);
            const b = itemBuild(i.spec);
            const pr = progress.get(i.id);
            const unplaced = i.count - i.placements.length;
            return (
              <tr key={i.id} className="border-t border-paper-line align-top">
                <td className="py-1.5 pr-3">
                  <div className="font-medium">{i.name}</div>
                  <div className="text-xs text-ink-soft">{b.ok ? describeBuild(b.build) : face(i)}</div>
                  <div className="text-xs text-ink-faint">face {face(i)}</div>
                </td>
                <td className="py-1.5 pr-3 text-right tabular-nums">{i.count}</td>
                <td className="py-1.5 pr-3 text-xs text-ink-soft">
                  {i.placements.map((p, k) => (
                    <div key={k}>{where(p)}</div>
                  ))}
                  {unplaced > 0 && <div className="text-near">{unplaced} not placed yet</div>}
                </td>
                {bandsHz.map((f, k) => (
                  <td key={f} className="px-1 py-1.5 text-right tabular-nums">{r ? r.absorptionM2[k]!.toFixed(2) : "—"}</td>
                ))}
                <td className="py-1.5 pl-3 text-right tabular-nums">{i.unitMassKg === null ? "—" : `${(i.unitMassKg * i.count).toFixed(0)} kg`}</td>
                <td className="py-1.5 pl-3 text-right tabular-nums">{money(i.unitCost * i.count)}</td>
                <td className="py-1.5 pl-3 text-xs" data-testid="plan-progress">
                  {pr?.installedOn ? `installed ${pr.installedOn}` : pr?.builtOn ? `built ${pr.builtOn}` : "not built"}
                </td>
              </tr>
            );
          })}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-ink/40 font-medium">
            <td className="py-1.5 pr-3">Plan total</td>
            <td className="py-1.5 pr-3 text-right tabular-nums">{items.reduce((s, i) => s + i.count, 0)}</td>
            <td />
            {bandsHz.map((f, k) => (
              <td key={f} className="px-1 py-1.5 text-right tabular-nums" data-testid={`plan-total-${f}`}>{addedM2[k]!.toFixed(1)}</td>
            ))}
            <td className="py-1.5 pl-3 text-right tabular-nums">{weight.toFixed(0)} kg{unknownMass ? " +" : ""}</td>
            <td className="py-1.5 pl-3 text-right tabular-nums">{money(cost)}</td>
            <td />
          </tr>
        </tfoot>
      </table>
      <p className="mt-1 text-xs text-ink-faint">
        Absorption areas are Sabine areas from the scenario&apos;s analysis; membrane and perforated traps are estimates. Places on a surface are (u, v) in metres to the centre of the face: along the wall and up from the floor on walls, x and y on the floor and ceiling.{unknownMass ? " +: some items have no weight given." : ""}
      </p>
    </div>
  );
}
