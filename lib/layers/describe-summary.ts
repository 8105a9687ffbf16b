import { z } from "zod";
import type { LayerKind } from "@/db/schema";

const count = (n: number) => Math.round(n).toLocaleString("en");
const plural = (n: number, one: string, many = `${one}s`) => `${count(n)} ${n === 1 ? one : many}`;

const populationSummary = z.object({ totalPopulation: z.number(), cells: z.number().optional() });
const siteConditionSummary = z.object({ minVs30Ms: z.number(), maxVs30Ms: z.number(), medianVs30Ms: z.number().optional() });
const districtsSummary = z.object({ districts: z.number() });
const facilitiesSummary = z.object({ byKind: z.record(z.string(), z.number()), railKm: z.number().optional() });
/** The demo seed's older facility summary. */
const seededFacilitiesSummary = z.object({ schools: z.number(), hospitals: z.number(), railSegments: z.number() });
const stationsSummary = z.object({ stations: z.number(), operating: z.number() });

const FACILITY_WORDS: Record<string, [string, string]> = {
  school: ["school", "schools"],
  hospital: ["hospital", "hospitals"],
  "care-home": ["care home", "care homes"],
  utility: ["utility", "utilities"],
  rail: ["rail segment", "rail segments"],
  other: ["other facility", "other facilities"],
};

/**
 * One line describing a layer version's stored summary ("1,000,000 people in 48,211 cells").
 * Summaries written by older code or by the demo seed may lack fields; those are left out, and
 * an unreadable summary gives an empty string.
 */
export function describeLayerSummary(kind: LayerKind, summary: unknown): string {
  switch (kind) {
    case "population": {
      const s = populationSummary.safeParse(summary);
      if (!s.success) return "";
      return s.data.cells === undefined ? plural(s.data.totalPopulation, "person", "people") : `${plural(s.data.totalPopulation, "person", "people")} in ${plural(s.data.cells, "cell")}`;
    }
    case "site-condition": {
      const s = siteConditionSummary.safeParse(summary);
      if (!s.success) return "";
      const median = s.data.medianVs30Ms === undefined ? "" : `, median ${count(s.data.medianVs30Ms)} m/s`;
      return `Vs30 ${count(s.data.minVs30Ms)}–${count(s.data.maxVs30Ms)} m/s${median}`;
    }
    case "districts": {
      const s = districtsSummary.safeParse(summary);
      return s.success ? plural(s.data.districts, "district") : "";
    }
    case "facilities": {
      const seeded = seededFacilitiesSummary.safeParse(summary);
      if (seeded.success) return `${plural(seeded.data.schools, "school")}, ${plural(seeded.data.hospitals, "hospital")}, ${plural(seeded.data.railSegments, "rail segment")}`;
      const s = facilitiesSummary.safeParse(summary);
      if (!s.success) return "";
      const parts = Object.entries(s.data.byKind)
        .filter(([, n]) => n > 0)
        .map(([kind, n]) => `${count(n)} ${(FACILITY_WORDS[kind] ?? [kind, kind])[n === 1 ? 0 : 1]}`);
      if (s.data.railKm) parts.push(`${s.data.railKm.toFixed(1)} km of rail`);
      return parts.join(", ");
    }
    case "stations": {
      const s = stationsSummary.safeParse(summary);
      return s.success ? `${plural(s.data.stations, "station")}, ${count(s.data.operating)} operating` : "";
    }
  }
}

const populationDistricts = z.object({
  districtSource: z.enum(["file", "boundaries", "none"]),
  districtNames: z.array(z.string()).optional(),
  peopleWithoutDistrict: z.number().optional(),
  copiedFromVersion: z.number().optional(),
});

/** How a population version's cells got their districts, in a sentence; null when the summary does not say. */
export function describeDistrictSource(summary: unknown): string | null {
  const s = populationDistricts.safeParse(summary);
  if (!s.success) return null;
  const outside = s.data.peopleWithoutDistrict ? ` ${count(s.data.peopleWithoutDistrict)} people are in no district.` : "";
  switch (s.data.districtSource) {
    case "file":
      return `Districts from the file's district column (${plural(s.data.districtNames?.length ?? 0, "name")}).${outside}`;
    case "boundaries":
      return s.data.copiedFromVersion
        ? `The cells of version ${s.data.copiedFromVersion}, placed in new district boundaries.${outside}`
        : `Cells placed in the district boundaries current at upload.${outside}`;
    case "none":
      return "No district boundaries existed at upload; cells have no district until boundaries are uploaded.";
  }
}
