import { computeExposure, type ExposureResult } from "@/lib/geo";
import { requireOption, type ParsedOptions } from "../args";
import { readPopulationCsv } from "../inputs";
import { SCENARIO_OPTIONS, engineOptions, scenarioOption } from "./context";

/** `exposure --scenario S.json --population POP.csv`. */
export const exposureCommand = {
  name: "exposure",
  summary: "exposure tables for a population CSV (lon,lat,population[,district])",
  options: { ...SCENARIO_OPTIONS, population: "value" } as const,
  run(options: ParsedOptions): { output: ExposureResult; result: ExposureResult } {
    const scenario = scenarioOption(options, "exposure");
    const population = readPopulationCsv(requireOption(options, "population", "exposure"));
    const result = computeExposure(scenario, population, engineOptions(options));
    return { output: result, result };
  },
};
