/** Options shared by every command: the scenario, site conditions and provenance. */
import type { EngineOptions } from "@/lib/geo";
import type { Scenario } from "@/lib/scenario/schema";
import { requireOption, type OptionSpec, type ParsedOptions } from "../args";
import { computedAtOption, readScenarioFile, readVs30Csv } from "../inputs";

/** Options every scenario command takes. */
export const SCENARIO_OPTIONS: OptionSpec = {
  scenario: "value",
  vs30: "value",
  "computed-at": "value",
  "scenario-version": "value",
  "ground-motion-module": "value",
};

/** Engine options from the shared command-line options (`--vs30`, `--computed-at`, `--scenario-version`). */
export function engineOptions(options: ParsedOptions): EngineOptions {
  const vs30 = options.vs30;
  const version = options["scenario-version"];
  return {
    computedAt: computedAtOption(options["computed-at"]),
    scenarioVersion: typeof version === "string" ? version : null,
    ...(typeof vs30 === "string" ? { vs30Cells: readVs30Csv(vs30) } : {}),
  };
}

/** The scenario named by `--scenario`. */
export function scenarioOption(options: ParsedOptions, command: string): Scenario {
  return readScenarioFile(requireOption(options, "scenario", command));
}
