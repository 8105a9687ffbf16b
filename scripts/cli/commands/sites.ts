import { computeSites, type SiteResult, type SitesResult } from "@/lib/geo";
import { requireOption, type ParsedOptions } from "../args";
import { readSitesCsv } from "../inputs";
import { SCENARIO_OPTIONS, engineOptions, scenarioOption } from "./context";

/** `sites --scenario S.json --sites SITES.csv`: one object per CSV row. */
export const sitesCommand = {
  name: "sites",
  summary: "values at the sites of a CSV (id,lon,lat[,vs30]) → JSON array",
  options: { ...SCENARIO_OPTIONS, sites: "value" } as const,
  run(options: ParsedOptions): { output: SiteResult[]; result: SitesResult } {
    const scenario = scenarioOption(options, "sites");
    const sites = readSitesCsv(requireOption(options, "sites", "sites"));
    const result = computeSites(scenario, sites, engineOptions(options));
    return { output: result.sites, result };
  },
};
