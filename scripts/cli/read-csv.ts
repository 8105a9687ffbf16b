/**
 * Strict CSV input for the CLI: the header names the columns (required ones must be there, no
 * others), and every problem names the file, the data row (and file line) and the column.
 */
import { readFileSync } from "node:fs";
import { basename } from "node:path";
import Papa from "papaparse";
import { CliError } from "./cli-error";

/** One column: its name, whether it must be present, and how its text becomes a value. */
export interface CsvColumn<T> {
  name: string;
  required: boolean;
  parse(text: string): { ok: true; value: T } | { ok: false; message: string };
}

/** A numeric column within [min, max]; an empty cell of an optional column reads as NaN (not given). */
export function numberColumn(name: string, required: boolean, min: number, max: number, unit = ""): CsvColumn<number> {
  return {
    name,
    required,
    parse(text) {
      const trimmed = text.trim();
      if (trimmed === "") return required ? { ok: false, message: "is empty" } : { ok: true, value: Number.NaN };
      const value = Number(trimmed);
      if (!Number.isFinite(value)) return { ok: false, message: `"${trimmed}" is not a number` };
      if (value < min || value > max) return { ok: false, message: `${trimmed} is outside ${min}–${max}${unit}` };
      return { ok: true, value };
    },
  };
}

/** A text column (trimmed). */
export function textColumn(name: string, required: boolean): CsvColumn<string> {
  return {
    name,
    required,
    parse(text) {
      const trimmed = text.trim();
      return required && trimmed === "" ? { ok: false, message: "is empty" } : { ok: true, value: trimmed };
    },
  };
}

const MAX_REPORTED = 20;

/** Reads a CSV file into column arrays; throws CliError listing the bad rows (up to 20). */
export function readCsv<C extends Record<string, CsvColumn<unknown>>>(
  path: string,
  columns: C,
): { rows: number; values: { [K in keyof C]: (C[K] extends CsvColumn<infer T> ? T : never)[] | undefined } } {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch {
    throw new CliError(`cannot read ${path}`);
  }
  const file = basename(path);
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: false });
  const [header, ...body] = parsed.data;
  if (!header || header.every((h) => h.trim() === "")) throw new CliError(`${file}: the file is empty (expected a header line)`);
  const names = header.map((h) => h.trim());
  const specs = Object.values(columns);
  const problems: string[] = [];
  for (const name of names) if (!specs.some((c) => c.name === name)) problems.push(`${file} line 1: unknown column "${name}"`);
  for (const c of specs) if (c.required && !names.includes(c.name)) problems.push(`${file} line 1: missing column "${c.name}"`);
  if (problems.length) throw new CliError(`${file}: the header is not valid (columns: ${specs.map((c) => c.name).join(", ")})`, problems);
  const values: Record<string, unknown[] | undefined> = {};
  for (const [key, c] of Object.entries(columns)) values[key] = names.includes(c.name) ? [] : undefined;
  let rows = 0;
  body.forEach((cells, k) => {
    if (cells.length === 1 && cells[0].trim() === "") return;
    rows++;
    const where = `${file} row ${rows} (line ${k + 2})`;
    if (cells.length !== names.length) {
      problems.push(`${where}: ${cells.length} values for ${names.length} columns`);
      return;
    }
    for (const [key, c] of Object.entries(columns)) {
      const index = names.indexOf(c.name);
      if (index < 0) continue;
      const result = c.parse(cells[index]);
      if (result.ok) values[key]?.push(result.value);
      else problems.push(`${where}, column "${c.name}": ${result.message}`);
    }
  });
  if (problems.length) {
    const shown = problems.slice(0, MAX_REPORTED);
    if (problems.length > MAX_REPORTED) shown.push(`… and ${problems.length - MAX_REPORTED} more`);
    throw new CliError(`${file}: ${problems.length} problem${problems.length === 1 ? "" : "s"}`, shown);
  }
  if (rows === 0) throw new CliError(`${file}: no data rows`);
  return { rows, values: values as never };
}
