import { formatValue, type PlotCell, type PlotTable } from "@/lib/plots";

/** Rows shown to screen readers before the table says "and N more" (the CSV has them all). */
const MAX_ROWS = 200;

const cell = (c: PlotCell) => (c === null ? "–" : typeof c === "number" ? formatValue(c, Math.abs(c) >= 100 ? 0 : Math.abs(c) >= 10 ? 1 : 2) : c);

/** The data behind a plot as a visually hidden table (screen readers; the plot itself is role="img"). */
export function DataTable({ title, table }: { title: string; table: PlotTable }) {
  const rows = table.rows.slice(0, MAX_ROWS);
  // The wrapper carries sr-only: a <table> ignores the 1 px box and, absolutely positioned at its
  // full height, would stretch the page below the plot.
  return (
    <div className="sr-only">
    <table>
      <caption>Data of {title}</caption>
      <thead>
        <tr>
          {table.columns.map((c, i) => (
            <th key={i} scope="col">
              {c.unit ? `${c.label} (${c.unit})` : c.label}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((r, i) => (
          <tr key={i}>
            {r.map((c, j) => (
              <td key={j}>{cell(c)}</td>
            ))}
          </tr>
        ))}
        {table.rows.length > MAX_ROWS && (
          <tr>
            <td colSpan={table.columns.length}>and {table.rows.length - MAX_ROWS} more rows (download the CSV for all of them)</td>
          </tr>
        )}
      </tbody>
    </table>
    </div>
  );
}
