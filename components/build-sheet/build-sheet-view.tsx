import Link from "next/link";
import type { ProjectBuildSheet } from "@/db/queries/build-progress";
import { presentLength } from "@/lib/build-sheet";
import { Card, Notice } from "@/components/ui/card";
import { CautionsBlock } from "./cautions-block";
import { describeBuild } from "@/lib/build-sheet/job-from-items";
import { ProgressControls } from "./progress-controls";

const th = "py-1 pr-3 text-left text-xs font-medium uppercase tracking-wide text-ink-faint";
const td = "py-1 pr-3 align-top";

/** The builder's build sheet: items and their progress, one section per build type (a page each in print), the boards, the job's totals and cost, the cautions. */
export function BuildSheetView({ data, canEditPrices }: { data: ProjectBuildSheet; canEditPrices: boolean }) {
  const { presented: p, sheet, units } = data;
  const currency = data.priceList.currency;
  const money = (x: number) => `${currency} ${x.toLocaleString("en-GB", { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
  const L = (m: number) => presentLength(m, units);
  return (
    <div className="space-y-6 print:space-y-4">
      <CautionsBlock />
      {!data.priceList.isSet && (
        <Notice tone="caution">
          The firm has no price list yet, so the materials cost is left at zero and the stock sizes are the usual ones (19 × 150 mm boards of 2.4 m, 1200 × 600 × 50 mm slabs).{" "}
          {canEditPrices && (
            <Link href="/settings/prices" className="font-medium underline">
              Set the price list
            </Link>
          )}
        </Notice>
      )}

      <Card className="print:bg-white">
        <h2 className="mb-2 text-lg font-semibold">Items on site</h2>
        {data.rooms.map((room) => (
          <div key={room.id} className="mb-4 last:mb-0">
            <h3 className="text-sm font-semibold">
              {room.name}
              <span className="font-normal text-ink-soft">
                {room.scenario ? ` — scenario “${room.scenario.name}”${room.scenario.chosen ? "" : " (latest treated scenario; not yet chosen by the engineer)"}` : " — nothing to build yet"}
              </span>
            </h3>
            {room.items.length > 0 && (
              <table className="mt-1 w-full text-sm" data-testid="progress-table">
                <thead>
                  <tr>
                    <th className={th}>Item</th>
                    <th className={th}>Build type</th>
                    <th className={`${th} text-right`}>Count</th>
                    <th className={th}>Built</th>
                    <th className={th}>Installed</th>
                    {data.can.markProgress && <th className={`${th} no-print`}>Mark</th>}
                  </tr>
                </thead>
                <tbody>
                  {room.items.map((it) => (
                    <tr key={it.id} className="border-t border-paper-line" data-item={it.name}>
                      <td className={td}>
                        {it.name}
                        {it.progress.note && <div className="text-xs text-ink-soft">Note: {it.progress.note}</div>}
                      </td>
                      <td className={td}>{it.group === null ? <span className="text-near">to a drawing</span> : `#${it.group + 1}`}</td>
                      <td className={`${td} text-right tabular-nums`}>{it.count}</td>
                      <td className={td} data-testid="built-cell">
                        {it.progress.builtOn ? (
                          <span className="inline-flex flex-wrap items-center gap-1 whitespace-nowrap">
                            <Tick /> {it.progress.builtOn}
                            {it.progress.builtByName ? <span className="text-xs text-ink-soft">by {it.progress.builtByName}</span> : null}
                          </span>
                        ) : (
                          <span className="text-ink-faint">not yet</span>
                        )}
                      </td>
                      <td className={td}>
                        {it.progress.installedOn ? (
                          <span className="inline-flex flex-wrap items-center gap-1 whitespace-nowrap">
                            <Tick /> {it.progress.installedOn}
                            {it.progress.installedByName ? <span className="text-xs text-ink-soft">by {it.progress.installedByName}</span> : null}
                          </span>
                        ) : (
                          <span className="text-ink-faint">not yet</span>
                        )}
                      </td>
                      {data.can.markProgress && (
                        <td className={`${td} no-print`}>
                          <ProgressControls projectId={data.project.id} itemId={it.id} itemName={it.name} progress={it.progress} />
                        </td>
                      )}
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
          </div>
        ))}
        {data.skipped.length > 0 && (
          <Notice tone="caution">
            Not on this sheet — build to a drawing: {data.skipped.map((s) => `${s.name} (${s.reason})`).join("; ")}.
          </Notice>
        )}
      </Card>

      {p && sheet && (
        <>
          {p.builds.map((b, i) => {
            const g = data.groups[i]!;
            const raw = sheet.builds[i]!;
            return (
              <section key={i} className="build-type rounded-[10px] border border-paper-line bg-paper-raised p-5 print:break-before-page print:border-0 print:bg-white print:p-0" aria-labelledby={`bt-${i}`} data-testid="build-type">
                <h2 id={`bt-${i}`} className="text-lg font-semibold">
                  Build type {i + 1}: {describeBuild(g.build)}
                </h2>
                <p className="text-sm text-ink-soft">
                  {b.count} unit{b.count === 1 ? "" : "s"} for {g.label} ({g.rooms.join(", ")}) · {b.unitWeight} each, {b.weight} in all
                </p>
                <div className="mt-3 grid gap-4 md:grid-cols-2 print:grid-cols-2">
                  <div>
                    <h3 className="text-sm font-semibold">Frame cut list</h3>
                    <table className="w-full text-sm">
                      <thead>
                        <tr>
                          <th className={th}>Piece</th>
                          <th className={`${th} text-right`}>Length</th>
                          <th className={`${th} text-right`}>Count</th>
                        </tr>
                      </thead>
                      <tbody>
                        {b.cutList.map((c, k) => (
                          <tr key={k} className="border-t border-paper-line">
                            <td className={td}>{c.label}</td>
                            <td className={`${td} text-right tabular-nums`}>{c.length}</td>
                            <td className={`${td} text-right tabular-nums`}>{c.count}</td>
                          </tr>
                        ))}
                      </tbody>
                    </table>
                    <p className="mt-1 text-xs text-ink-faint">
                      From {L(data.priceList.lumber.thicknessM)} × {L(data.priceList.lumber.widthM)} lumber; each cut allows {L(data.priceList.kerfM)} of saw kerf (the boards are planned below).
                    </p>
                  </div>
                  <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
                    <dt className="text-ink-soft">Fill, per unit</dt>
                    <dd>{b.fill}</dd>
                    <dt className="text-ink-soft">Insulation slabs</dt>
                    <dd className="tabular-nums">
                      {b.slabs} × {L(data.priceList.slab.lengthM)} × {L(data.priceList.slab.widthM)} × {L(data.slab!.thicknessM)}
                    </dd>
                    <dt className="text-ink-soft">Fabric</dt>
                    <dd className="tabular-nums">{b.fabricCut ? `${b.count} pieces of ${b.fabricCut} (${b.fabricArea}), ${L(data.priceList.fabric.wrapM)} wrap onto the back` : `${b.fabricArea}`}</dd>
                    {b.faceSheets > 0 && (
                      <>
                        <dt className="text-ink-soft">Face sheets</dt>
                        <dd className="tabular-nums">
                          {b.faceSheets} × {L(data.priceList.sheet.lengthM)} × {L(data.priceList.sheet.widthM)}
                        </dd>
                      </>
                    )}
                    <dt className="text-ink-soft">Fixings</dt>
                    <dd className="tabular-nums">
                      {b.screws} screws{b.cleats ? `, ${b.cleats} cleats or hangers` : ""}
                      {b.brackets ? `, ${b.brackets} brackets` : ""}
                    </dd>
                    <dt className="text-ink-soft">Finished weight</dt>
                    <dd className="tabular-nums">
                      {b.unitWeight} each · {b.weight} in all
                    </dd>
                  </dl>
                </div>
                <ul className="mt-3 list-disc space-y-0.5 pl-5 text-sm">
                  {[...raw.notes, ...g.notes].map((n, k) => (
                    <li key={k}>{n}</li>
                  ))}
                </ul>
              </section>
            );
          })}

          <section className="rounded-[10px] border border-paper-line bg-paper-raised p-5 print:break-before-page print:border-0 print:bg-white print:p-0" aria-labelledby="boards-title">
            <h2 id="boards-title" className="text-lg font-semibold">
              Cutting the boards
            </h2>
            <p className="mb-2 text-xs text-ink-faint">Pieces are packed longest first into the first board with room for them (one saw kerf per cut); each board is then cut from the shortest stock length that holds its pieces. Keep the offcuts for cleats and battens.</p>
            <ol className="grid gap-1 text-sm md:grid-cols-2 print:grid-cols-2">
              {p.boards.map((board, k) => (
                <li key={k} className="break-inside-avoid border-t border-paper-line py-1">
                  <span className="font-medium tabular-nums">
                    Board {k + 1} ({board.stock}):
                  </span>{" "}
                  <span className="tabular-nums">{board.cuts.join(", ")}</span> <span className="text-ink-faint">— offcut {board.offcut}</span>
                </li>
              ))}
            </ol>
          </section>

          <section className="break-inside-avoid rounded-[10px] border border-paper-line bg-paper-raised p-5 print:border-0 print:bg-white print:p-0" aria-labelledby="totals-title" data-testid="job-totals">
            <h2 id="totals-title" className="text-lg font-semibold">
              Totals for the job
            </h2>
            <table className="mt-2 w-full max-w-2xl text-sm">
              <thead>
                <tr>
                  <th className={th}>Material</th>
                  <th className={`${th} text-right`}>Quantity</th>
                  <th className={`${th} text-right`}>Cost</th>
                </tr>
              </thead>
              <tbody className="tabular-nums">
                <tr className="border-t border-paper-line">
                  <td className={td}>
                    Boards, {L(data.priceList.lumber.thicknessM)} × {L(data.priceList.lumber.widthM)}
                  </td>
                  <td className={`${td} text-right`}>{p.totals.boards.map((b) => `${b.count} × ${b.stock}`).join(", ")}</td>
                  <td className={`${td} text-right`}>{money(p.totals.cost.boards)}</td>
                </tr>
                <tr className="border-t border-paper-line">
                  <td className={td}>
                    Insulation slabs, {L(data.priceList.slab.lengthM)} × {L(data.priceList.slab.widthM)} × {L(data.slab!.thicknessM)}
                  </td>
                  <td className={`${td} text-right`}>{p.totals.slabs}</td>
                  <td className={`${td} text-right`}>{money(p.totals.cost.slabs)}</td>
                </tr>
                <tr className="border-t border-paper-line">
                  <td className={td}>Fabric</td>
                  <td className={`${td} text-right`}>{p.totals.fabricArea}</td>
                  <td className={`${td} text-right`}>{money(p.totals.cost.fabric)}</td>
                </tr>
                {p.totals.faceSheets > 0 && (
                  <tr className="border-t border-paper-line">
                    <td className={td}>Face sheets</td>
                    <td className={`${td} text-right`}>{p.totals.faceSheets}</td>
                    <td className={`${td} text-right`}>{money(p.totals.cost.sheets)}</td>
                  </tr>
                )}
                <tr className="border-t border-paper-line">
                  <td className={td}>Fixings</td>
                  <td className={`${td} text-right`}>
                    {p.totals.screws} screws, {p.totals.cleats} cleats, {p.totals.brackets} brackets
                  </td>
                  <td className={`${td} text-right`}>{money(p.totals.cost.fixings)}</td>
                </tr>
                <tr className="border-t-2 border-ink/40 font-semibold">
                  <td className={td}>Materials</td>
                  <td className={`${td} text-right`}>finished weight {p.totals.weight}</td>
                  <td className={`${td} text-right`} data-testid="job-cost">
                    {money(p.totals.cost.total)}
                  </td>
                </tr>
              </tbody>
            </table>
            <ul className="mt-2 list-disc pl-5 text-xs text-ink-soft">
              <li>
                Slabs of {L(data.slab!.thicknessM)}: {data.slab!.reason}.
              </li>
              {sheet.notes.map((n, k) => (
                <li key={k}>{n}</li>
              ))}
              <li>Prices from the firm&apos;s price list{data.priceList.isSet ? "" : " (not set: zero)"}; labour, delivery and tax not included.</li>
            </ul>
          </section>
        </>
      )}
      {!sheet && <Notice>No room of this project has treatment to build yet.</Notice>}
    </div>
  );
}

function Tick() {
  return (
    <svg width="12" height="12" viewBox="0 0 12 12" aria-hidden="true" className="text-within">
      <path d="M2 6.5 L5 9.5 L10 2.5" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
    </svg>
  );
}
