import { readdirSync } from "node:fs";
import { join } from "node:path";
import { computeExposureWith, prepareEngine, resolveGridGeometry, summarizeGridWith, CAUTION, type ExposureResult, type GridSummary, type Provenance } from "@/lib/geo";
import { CliError } from "../cli-error";
import { numberOption, requireOption, type ParsedOptions } from "../args";
import { readPopulationCsv, readScenarioFile } from "../inputs";
import { engineOptions } from "./context";

/** One scenario's result in a batch. */
export interface BatchResult {
  summary: GridSummary;
  exposure?: Omit<ExposureResult, "notes" | "caution" | "provenance">;
  notes: string[];
  caution: string;
  provenance: Provenance;
}

/** `batch --scenarios DIR [--population POP.csv] [--cell-km K]`: every *.json file, keyed by file name. */
export const batchCommand = {
  name: "batch",
  summary: "grid summary (and exposure with --population) for every *.json in a folder",
  options: { scenarios: "value", population: "value", "cell-km": "value", vs30: "value", "computed-at": "value", "ground-motion-module": "value" } as const,
  run(options: ParsedOptions): { output: Record<string, BatchResult>; result: BatchResult | undefined } {
    const dir = requireOption(options, "scenarios", "batch");
    let files: string[];
    try {
      files = readdirSync(dir).filter((f) => f.endsWith(".json")).sort();
    } catch {
      throw new CliError(`batch: cannot read the folder ${dir}`);
    }
    if (files.length === 0) throw new CliError(`batch: no *.json scenario files in ${dir}`);
    // Every file is checked before anything is computed, so a bad one leaves stdout empty.
    const scenarios = files.map((f) => [f, readScenarioFile(join(dir, f))] as const);
    const population = typeof options.population === "string" ? readPopulationCsv(options.population) : undefined;
    const cellKm = numberOption(options, "cell-km", "batch");
    const context = engineOptions(options);
    const output: Record<string, BatchResult> = {};
    for (const [file, scenario] of scenarios) {
      const engine = prepareEngine(scenario, context);
      const summary = summarizeGridWith(engine, resolveGridGeometry(scenario, { cellKm }));
      output[file] = {
        summary,
        ...(population ? { exposure: computeExposureWith(engine, population) } : {}),
        notes: engine.notes,
        caution: CAUTION,
        provenance: engine.provenance,
      };
    }
    return { output, result: output[files[0]] };
  },
};
