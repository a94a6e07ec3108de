"use client";

import {
  columnFilteringFeature,
  createFilteredRowModel,
  createSortedRowModel,
  filterFn_includesString,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_datetime,
  sortFn_text,
  tableFeatures,
  useTable,
  type ColumnDef,
} from "@tanstack/react-table";
import { ArrowDown, ArrowUp, ArrowUpDown, Search } from "lucide-react";
import type { ReactNode } from "react";
import { cn } from "./cn";

export const tableFeatureSet = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, text: sortFn_text, datetime: sortFn_datetime },
  filterFns: { includesString: filterFn_includesString },
});
export type TableFeatureSet = typeof tableFeatureSet;

/** The table instance as the header needs it (any TanStack Table v9 table with row sorting). */
interface SortableTable {
  getHeaderGroups(): { id: string; headers: SortableHeader[] }[];
  FlexRender: (props: { header: never }) => ReactNode;
}
interface SortableHeader {
  id: string;
  isPlaceholder: boolean;
  column: { getIsSorted(): false | "asc" | "desc"; getCanSort(): boolean; getToggleSortingHandler(): ((event: unknown) => void) | undefined };
}

/** Column headers that sort on click (buttons, so keyboard users sort too), with aria-sort. */
export function SortableHead({ table, className }: { table: SortableTable; className?: string }) {
  const Render = table.FlexRender as (props: { header: SortableHeader }) => ReactNode;
  return (
    <thead className={className}>
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id}>
          {group.headers.map((header) => {
            const sorted = header.column.getIsSorted();
            return (
              <th key={header.id} scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined} className="px-3 py-2 font-medium">
                {header.isPlaceholder ? null : header.column.getCanSort() ? (
                  <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-ink">
                    <Render header={header} />
                    {sorted === "asc" ? <ArrowUp className="h-3 w-3" aria-hidden /> : sorted === "desc" ? <ArrowDown className="h-3 w-3" aria-hidden /> : <ArrowUpDown className="h-3 w-3 opacity-40" aria-hidden />}
                  </button>
                ) : (
                  <Render header={header} />
                )}
              </th>
            );
          })}
        </tr>
      ))}
    </thead>
  );
}

/**
 * A sortable, searchable table (TanStack Table v9). Columns and data must be stable (module scope
 * or memoised). Header buttons sort; the search box filters over every text column.
 */
export function DataTable<T extends object>({
  columns,
  data,
  searchLabel,
  empty,
  caption,
}: {
  columns: ColumnDef<TableFeatureSet, T, any>[];
  data: T[];
  searchLabel?: string;
  empty?: ReactNode;
  caption?: string;
}) {
  const table = useTable({ features: tableFeatureSet, columns, data, globalFilterFn: "includesString" });
  const rows = table.getRowModel().rows;
  const filter = (table.store.state.globalFilter as string | undefined) ?? "";
  return (
    <div className="space-y-3">
      {searchLabel && (
        <label className="no-print relative block max-w-sm">
          <span className="sr-only">{searchLabel}</span>
          <Search aria-hidden className="pointer-events-none absolute left-2.5 top-2.5 h-4 w-4 text-ink-faint" />
          <input
            type="search"
            value={filter}
            onChange={(e) => table.setGlobalFilter(e.target.value)}
            placeholder={searchLabel}
            className="block w-full rounded-md border border-paper-line bg-paper-raised py-2 pl-8 pr-3 text-sm focus:border-kiln-500 focus:outline-none"
          />
        </label>
      )}
      <div className="overflow-x-auto rounded-[10px] border border-paper-line bg-paper-raised">
        <table className="w-full border-collapse text-sm">
          {caption && <caption className="sr-only">{caption}</caption>}
          <SortableHead table={table} className="bg-paper-sunk/70 text-left text-xs uppercase tracking-wide text-ink-soft" />
          <tbody>
            {rows.map((row) => (
              <tr key={row.id} className="border-t border-paper-line/70 hover:bg-kiln-50/40">
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className={cn("px-3 py-2.5 align-top")}>
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
            {rows.length === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-8 text-center text-ink-soft">
                  {filter ? `Nothing matches “${filter}”.` : (empty ?? "Nothing here yet.")}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}
