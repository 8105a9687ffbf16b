/**
 * The caution every map, table and export carries (product brief, "Cautions and provenance").
 * Machine outputs carry it too: a `caution` field in JSON, a first `#` line in CSV, the CLI's stderr.
 */
export const CAUTION =
  "Scenario results are planning estimates with large uncertainty, not forecasts. Real alert behaviour depends on the operating agency. Follow official guidance and local codes, and have results reviewed by qualified seismologists and emergency managers.";
