"use client";

import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  rowSortingFeature,
  sortFn_basic,
  sortFn_text,
  tableFeatures,
  useTable,
  type ColumnFiltersState,
  type FilterFn,
  type SortingState,
} from "@tanstack/react-table";
import { Layers, MoveHorizontal } from "lucide-react";
import { useMemo, useState } from "react";
import { SortableHead } from "@/components/ui/data-table";
import type { ScenarioResults } from "@/lib/analysis";

type ModeRow = ScenarioResults["modes"]["table"][number] & { index: string; gapBelowHz: number | null };
const KINDS = ["axial", "tangential", "oblique"] as const;
type Kind = (typeof KINDS)[number];

const features = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { basic: sortFn_basic, text: sortFn_text },
});
const helper = createColumnHelper<typeof features, ModeRow>();

const kindIn: FilterFn<typeof features, ModeRow> = (row, columnId, value: Kind[]) => value.includes(row.getValue(columnId) as Kind);
kindIn.autoRemove = (v: unknown) => !Array.isArray(v) || v.length === KINDS.length;

const f1 = (v: number) => v.toFixed(1);

/** Icon + words for a mode's flags (never colour alone). */
function Flags({ row, bandwidthHz }: { row: ModeRow; bandwidthHz: number }) {
  if (!row.coincident && !row.wideGapBelow) return <span className="text-ink-faint">—</span>;
  return (
    <span className="flex flex-col gap-0.5">
      {row.coincident && (
        <span className="inline-flex items-center gap-1 text-outside">
          <Layers className="h-3.5 w-3.5" aria-hidden />
          overlaps a neighbour (&lt; {f1(bandwidthHz)} Hz apart)
        </span>
      )}
      {row.wideGapBelow && (
        <span className="inline-flex items-center gap-1 text-near">
          <MoveHorizontal className="h-3.5 w-3.5" aria-hidden />
          wide gap below ({row.gapBelowHz === null ? "—" : f1(row.gapBelowHz)} Hz)
        </span>
      )}
    </span>
  );
}

/**
 * The room's modes (TanStack Table v9): sortable by every column, filterable by kind, with
 * coincident modes and wide gaps flagged by an icon and words.
 */
export function ModeTable({ modes }: { modes: ScenarioResults["modes"] }) {
  const data = useMemo<ModeRow[]>(
    () => modes.table.map((m, i, all) => ({ ...m, index: `${m.nx} ${m.ny} ${m.nz}`, gapBelowHz: i === 0 ? null : m.frequencyHz - all[i - 1]!.frequencyHz })),
    [modes.table],
  );
  const columns = useMemo(
    () =>
      helper.columns([
        helper.accessor("frequencyHz", { header: "Frequency (Hz)", cell: (c) => f1(c.getValue()), sortFn: "basic" }),
        helper.accessor("index", { header: "Order nx ny nz", sortFn: "text", cell: (c) => <span className="font-mono text-xs">{c.getValue()}</span> }),
        helper.accessor("kind", { header: "Kind", filterFn: kindIn, sortFn: "text" }),
        helper.accessor("gapBelowHz", { header: "Gap below (Hz)", sortFn: "basic", sortUndefined: "last", cell: (c) => (c.getValue() === null ? "—" : f1(c.getValue()!)) }),
        helper.display({ id: "bandwidth", header: "Bandwidth (Hz)", cell: () => f1(modes.bandwidthHz) }),
        helper.accessor((r) => (r.coincident ? 2 : 0) + (r.wideGapBelow ? 1 : 0), { id: "flags", header: "Flags", sortFn: "basic", cell: (c) => <Flags row={c.row.original} bandwidthHz={modes.bandwidthHz} /> }),
      ]),
    [modes.bandwidthHz],
  );
  const [sorting, setSorting] = useState<SortingState>([{ id: "frequencyHz", desc: false }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const table = useTable({ features, columns, data, state: { sorting, columnFilters }, onSortingChange: setSorting, onColumnFiltersChange: setColumnFilters });
  const shown = (columnFilters.find((f) => f.id === "kind")?.value as Kind[] | undefined) ?? [...KINDS];
  const toggle = (k: Kind) => {
    const next = shown.includes(k) ? shown.filter((x) => x !== k) : [...shown, k];
    table.getColumn("kind")?.setFilterValue(next.length === KINDS.length ? undefined : next);
  };
  const rows = table.getRowModel().rows;
  const nCo = data.filter((r) => r.coincident).length;
  const nGap = data.filter((r) => r.wideGapBelow).length;

  return (
    <div className="space-y-3">
      <div className="no-print flex flex-wrap items-center gap-3">
        <fieldset className="flex flex-wrap items-center gap-2 text-sm">
          <legend className="sr-only">Show mode kinds</legend>
          <span className="text-ink-soft">Show</span>
          {KINDS.map((k) => (
            <label key={k} className="inline-flex cursor-pointer items-center gap-1.5 rounded-md border border-paper-line bg-paper-raised px-2.5 py-1 has-[:checked]:border-ink has-[:checked]:bg-paper-sunk">
              <input type="checkbox" checked={shown.includes(k)} onChange={() => toggle(k)} className="accent-kiln-500" />
              {k} <span className="tabular-nums text-ink-faint">({modes.counts[k]})</span>
            </label>
          ))}
        </fieldset>
        <p className="text-xs text-ink-soft" aria-live="polite">
          {rows.length} of {data.length} modes up to {modes.maxFrequencyHz} Hz · {nCo} overlapping · {nGap} wide gap{nGap === 1 ? "" : "s"}
          {modes.tableTruncated ? " · list cut at the first 400" : ""}
        </p>
      </div>
      <div className="max-h-[28rem] overflow-auto rounded-[10px] border border-paper-line bg-paper-raised print:max-h-none">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Room modes, sortable; coincidences and wide gaps flagged</caption>
          <SortableHead table={table} className="sticky top-0 bg-paper-sunk text-left text-xs tracking-wide text-ink-soft" />
          <tbody>
            {rows.map((row) => (
              <tr key={row.id} className={`border-t border-paper-line/70 ${row.original.kind === "axial" ? "font-medium" : ""}`}>
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-1.5 align-top tabular-nums">
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
            {rows.length === 0 && (
              <tr>
                <td colSpan={6} className="px-3 py-6 text-center text-ink-soft">
                  No kind is selected: tick axial, tangential or oblique above.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
