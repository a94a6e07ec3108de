import type { PlotCell, PlotTable } from "./types";

/**
 * One CSV field (RFC 4180): quoted when it holds a comma, a double quote, CR or LF, or leading/trailing
 * spaces; quotes doubled inside. Numbers are written in full precision with "." decimals; null and
 * non-finite numbers are empty. Text beginning with = + - @ or a tab that is not a number gets a leading
 * apostrophe, so a spreadsheet never runs it as a formula (OWASP CSV injection advice).
 * @example csvField('12" woofer, sealed') // "\"12\"\" woofer, sealed\""
 */
export function csvField(cell: PlotCell): string {
  if (cell === null) return "";
  if (typeof cell === "number") return Number.isFinite(cell) ? (Object.is(cell, -0) ? "0" : String(cell)) : "";
  if (typeof cell !== "string") throw new TypeError(`cell must be a number, string or null (got ${typeof cell})`);
  let s = cell;
  if (/^[=+\-@\t\r]/.test(s) && !/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s)) s = `'${s}`;
  return /[",\r\n]|^\s|\s$/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/**
 * A plot's data table as CSV text (RFC 4180): a header row from the column labels with their units in
 * parentheses, then one line per row, CRLF line ends, a trailing CRLF. Rows shorter than the header are
 * padded with empty fields; longer rows are a RangeError.
 * @example toCsv({ columns: [{ label: "Frequency", unit: "Hz" }, { label: "Seat A" , unit: "dB" }], rows: [[20, -3.5]] }) // "Frequency (Hz),Seat A (dB)\r\n20,-3.5\r\n"
 */
export function toCsv(table: PlotTable): string {
  const n = table.columns.length;
  const header = table.columns.map((c) => csvField(c.unit ? `${c.label} (${c.unit})` : c.label));
  const lines = [header.join(",")];
  table.rows.forEach((row, i) => {
    if (row.length > n) throw new RangeError(`rows[${i}] has ${row.length} cells but the table has ${n} columns`);
    const cells = Array.from({ length: n }, (_, j) => csvField(row[j] ?? null));
    lines.push(cells.join(","));
  });
  return lines.join("\r\n") + "\r\n";
}

/**
 * A file name from a plot title: lower case ASCII letters, digits and hyphens, at most 60 characters,
 * "plot" when nothing is left, with the extension.
 * @example plotFileName("Modal response at seats — row 1", "csv") // "modal-response-at-seats-row-1.csv"
 */
export function plotFileName(title: string, extension: "csv" | "svg" | "png"): string {
  const base = title
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/, "");
  return `${base || "plot"}.${extension}`;
}
