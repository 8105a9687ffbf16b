import type { LayerKind } from "@/db/schema";
import { FORMATS_BY_KIND, LAYER_KIND_LABELS, type LayerFormat } from "./formats";
import { readDistrictsGeojson, readFacilitiesGeojson } from "./geojson-layers";
import { readPopulationCsv, readSiteConditionCsv, type ReadLayerOptions } from "./grid-csv";
import { LayerFileError } from "./layer-file-error";
import type { ParsedLayer } from "./parsed-layer";
import { readFacilitiesCsv, readStationsCsv } from "./point-csv";

/**
 * Reads and checks a layer file of the given kind and format. Resolves with the parsed layer, or
 * rejects with a `LayerFileError` that lists the bad rows or features; nothing is half-accepted.
 */
export async function readLayerFile(kind: LayerKind, format: LayerFormat, text: string, options: ReadLayerOptions = {}): Promise<ParsedLayer> {
  if (!FORMATS_BY_KIND[kind].includes(format)) {
    const accepted = FORMATS_BY_KIND[kind].map((f) => (f === "csv" ? "CSV" : "GeoJSON")).join(" or ");
    throw new LayerFileError(`A ${LAYER_KIND_LABELS[kind].toLowerCase()} layer is uploaded as ${accepted}, not ${format === "csv" ? "CSV" : "GeoJSON"}.`);
  }
  switch (kind) {
    case "population":
      return readPopulationCsv(text, options);
    case "site-condition":
      return readSiteConditionCsv(text, options);
    case "stations":
      return readStationsCsv(text, options);
    case "districts":
      return readDistrictsGeojson(text, options);
    case "facilities":
      return format === "csv" ? readFacilitiesCsv(text, options) : readFacilitiesGeojson(text, options);
  }
}
