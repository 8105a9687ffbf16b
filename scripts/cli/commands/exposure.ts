import { compareStrategies, computeExposure, type ExposureResult, type StrategyComparison } from "@/lib/geo";
import { requireOption, type ParsedOptions } from "../args";
import { readPopulationCsv } from "../inputs";
import { SCENARIO_OPTIONS, engineOptions, scenarioOption } from "./context";

/** `exposure --scenario S.json --population POP.csv [--compare-strategies]`. */
export const exposureCommand = {
  name: "exposure",
  summary: "exposure tables for a population CSV (lon,lat,population[,district]); --compare-strategies adds every alert strategy side by side",
  options: { ...SCENARIO_OPTIONS, population: "value", "compare-strategies": "flag" } as const,
  run(options: ParsedOptions): { output: ExposureResult & { strategies?: StrategyComparison[] }; result: ExposureResult } {
    const scenario = scenarioOption(options, "exposure");
    const population = readPopulationCsv(requireOption(options, "population", "exposure"));
    const context = engineOptions(options);
    const result = computeExposure(scenario, population, context);
    const output = options["compare-strategies"] ? { ...result, strategies: compareStrategies(scenario, population, context) } : result;
    return { output, result };
  },
};
