/**
 * CSV as Leeway exports it (RFC 4180 fields, CRLF line ends): first a `#` line with the caution,
 * then `#` lines saying how the figures were made and any notes (default delays…), then the
 * header and the rows. Machine readers skip `#` lines as comments.
 */

/** A cell value: numbers are written as they are, `null` as an empty field. */
export type CsvValue = string | number | boolean | null;

/** What one exported table holds. */
export interface CsvTable {
  /** The brief's caution; always the first line. */
  caution: string;
  /** The "how it was made" line. */
  provenance: string;
  /** Further statements, one `#` line each (e.g. "default delays — enter your operator's figures"). */
  notes?: readonly string[];
  header: readonly string[];
  rows: readonly (readonly CsvValue[])[];
}

const LINE_END = "\r\n";
// A text field starting with one of these is read as a formula by spreadsheets (OWASP "CSV injection").
const FORMULA_START = /^[=+\-@\t\r]/;

/** One field, quoted when it holds a comma, quote or line break (RFC 4180 §2). */
export function csvField(value: CsvValue): string {
  if (value === null) return "";
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : "";
  if (typeof value === "boolean") return value ? "yes" : "no";
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A comment line; line breaks inside the text are folded so the comment stays one line. */
function commentLine(text: string): string {
  return `# ${text.replace(/[\r\n]+/g, " ")}`;
}

/** The whole CSV text, ending with a line break. */
export function writeCsv(table: CsvTable): string {
  const width = table.header.length;
  table.rows.forEach((row, index) => {
    if (row.length !== width) throw new Error(`CSV row ${index + 1} has ${row.length} fields; the header has ${width}`);
  });
  const lines = [
    commentLine(table.caution),
    commentLine(`How it was made: ${table.provenance}`),
    ...(table.notes ?? []).map(commentLine),
    table.header.map(csvField).join(","),
    ...table.rows.map((row) => row.map(csvField).join(",")),
  ];
  return lines.join(LINE_END) + LINE_END;
}
