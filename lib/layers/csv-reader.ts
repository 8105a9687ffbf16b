import Papa from "papaparse";
import { LayerFileError, type IssueCollector } from "./layer-file-error";
import type { LayerLimits } from "./limits";

/** The columns a CSV layer must have and may have, lower-case, in the order the messages list them. */
export interface CsvColumns {
  required: readonly string[];
  optional: readonly string[];
}

/** A data row: its cells by column name, and its row number as a spreadsheet shows it (the header is row 1). */
export type CsvRowHandler = (cells: Record<string, string>, rowNumber: number) => void;

export interface ReadCsvOptions {
  columns: CsvColumns;
  limits: LayerLimits;
  issues: IssueCollector;
  onRow: CsvRowHandler;
  /** Share of the text read so far, 0–1, after each chunk. */
  onProgress?: (fraction: number) => void;
}

/** Characters parsed between pauses; the pause lets a page repaint or a server stream progress. */
const CHUNK_CHARS = 1 << 20;

const BOM = "\uFEFF";

/**
 * @types/papaparse types `chunk` for files and URLs only; Papa's string streamer calls it too, and
 * `pause`/`resume` work there, which is what lets the reader yield between chunks.
 */
type ChunkedStringConfig = Papa.ParseConfig<string[]> & {
  chunkSize: number;
  chunk(results: Papa.ParseResult<string[]>, parser: Papa.Parser): void;
};

function columnList(columns: readonly string[]): string {
  return columns.join(", ");
}

/** Refuses files whose first line shows semicolons or tabs between columns, saying what to change. */
function refuseOtherSeparators(headerLine: string, columns: CsvColumns): void {
  const commas = headerLine.split(",").length - 1;
  const expected = `Leeway reads comma-separated files with decimal points, header ${columnList(columns.required)}`;
  if (headerLine.includes(";") && headerLine.split(";").length - 1 >= commas) {
    throw new LayerFileError(
      `The file separates its columns with semicolons (;). ${expected}: export it as "CSV (comma delimited)", or replace the semicolons with commas and any decimal commas with decimal points. Nothing was saved.`,
      { issues: [{ path: "row 1", message: "semicolons separate the columns" }] },
    );
  }
  if (headerLine.includes("\t") && commas === 0) {
    throw new LayerFileError(`The file separates its columns with tabs. ${expected}. Nothing was saved.`, {
      issues: [{ path: "row 1", message: "tabs separate the columns" }],
    });
  }
}

/** Checks the header against the expected columns and returns each known column's position. */
function readHeader(cells: string[], columns: CsvColumns): Map<string, number> {
  const names = cells.map((cell) => cell.trim().toLowerCase());
  const allowed = new Set([...columns.required, ...columns.optional]);
  const problems: string[] = [];
  const missing = columns.required.filter((name) => !names.includes(name));
  if (missing.length) problems.push(`missing ${missing.map((m) => `"${m}"`).join(", ")}`);
  const unknown = names.filter((name) => !allowed.has(name));
  if (unknown.length) problems.push(`unknown ${unknown.map((u) => `"${u}"`).join(", ")}`);
  const repeated = names.filter((name, i) => names.indexOf(name) !== i);
  if (repeated.length) problems.push(`repeated ${[...new Set(repeated)].map((r) => `"${r}"`).join(", ")}`);
  if (problems.length) {
    const optional = columns.optional.length ? ` (optional: ${columnList(columns.optional)})` : "";
    throw new LayerFileError(
      `The header row has the wrong columns: ${problems.join("; ")}. Expected ${columnList(columns.required)}${optional}. Nothing was saved.`,
      { issues: [{ path: "row 1", message: problems.join("; ") }] },
    );
  }
  return new Map(names.map((name, i) => [name, i]));
}

/** A row with extra cells where a decimal comma would have split a number: digits on both sides of a break. */
function looksLikeDecimalCommas(cells: string[]): boolean {
  return cells.some((cell, i) => i > 0 && /^\d+$/.test(cell.trim()) && /\d$/.test(cells[i - 1].trim()));
}

/**
 * Reads a CSV layer file: UTF-8 text with or without a byte-order mark, LF or CRLF line ends, commas
 * between columns and a header row. Calls `onRow` for every data row; rows of the wrong width go to
 * `issues`. Returns the number of data rows and the header's columns (lower-case). Throws `LayerFileError` for an empty file, other separators, a wrong header or too many rows.
 * Parses in chunks and pauses between them, so a browser stays responsive and a server can report progress.
 */
export async function readCsvRows(text: string, options: ReadCsvOptions): Promise<{ rowCount: number; columns: string[] }> {
  const { columns, limits, issues, onRow, onProgress } = options;
  const body = text.startsWith(BOM) ? text.slice(1) : text;
  if (body.trim() === "") {
    throw new LayerFileError(`The file is empty. Leeway expected a header row (${columnList(columns.required)}) and at least one data row. Nothing was saved.`);
  }
  const firstBreak = body.indexOf("\n");
  refuseOtherSeparators((firstBreak < 0 ? body : body.slice(0, firstBreak)).replace(/\r$/, ""), columns);

  let positions: Map<string, number> | undefined;
  let rowNumber = 0;
  let rowCount = 0;
  let failure: unknown;

  await new Promise<void>((resolve, reject) => {
    const config: ChunkedStringConfig = {
      delimiter: ",",
      chunkSize: CHUNK_CHARS,
      chunk(results: Papa.ParseResult<string[]>, parser: Papa.Parser) {
        const chunkFirstRow = rowNumber + 1;
        try {
          for (const cells of results.data) {
            rowNumber += 1;
            if (!positions) {
              positions = readHeader(cells, columns);
              continue;
            }
            if (cells.length === 1 && cells[0].trim() === "") continue;
            rowCount += 1;
            if (rowCount > limits.maxRows) {
              throw new LayerFileError(
                `The file has more than ${limits.maxRows.toLocaleString("en")} data rows, the most Leeway accepts for this layer. Split it or use coarser cells. Nothing was saved.`,
                { kind: "too-large" },
              );
            }
            if (cells.length !== positions.size) {
              const hint = cells.length > positions.size && looksLikeDecimalCommas(cells) ? "; a decimal comma (12,5) splits a number in two: use decimal points (12.5)" : "";
              issues.add(`row ${rowNumber}`, `has ${cells.length} values but the header has ${positions.size} columns${hint}`);
              continue;
            }
            const record: Record<string, string> = {};
            for (const [name, index] of positions) record[name] = cells[index];
            onRow(record, rowNumber);
          }
          for (const error of results.errors) {
            // Papa numbers rows from 0 within each chunk.
            issues.add(`row ${chunkFirstRow + (error.row ?? 0)}`, `cannot be read as CSV: ${error.message}`);
          }
        } catch (error) {
          failure = error;
          parser.abort();
          return;
        }
        onProgress?.(Math.min(1, results.meta.cursor / body.length));
        parser.pause();
        setTimeout(() => parser.resume(), 0);
      },
      complete: () => (failure ? reject(failure) : resolve()),
    };
    Papa.parse(body, config as Papa.ParseConfig<string[]>);
  });

  if (rowCount === 0) {
    throw new LayerFileError(`The file has a header row but no data rows. Nothing was saved.`, { issues: [{ path: "row 2", message: "no data rows" }] });
  }
  return { rowCount, columns: [...(positions?.keys() ?? [])] };
}
