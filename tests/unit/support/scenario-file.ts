/**
 * A complete scenario file around the test fixture's source and two stations, with uniform site
 * conditions and a small area: the one most route and export tests write into a version.
 */
export function fixtureScenarioFile(name: string, source: { depthKm?: number; mw?: number } = {}) {
  return {
    version: 1,
    name,
    source: { lon: 150.2, lat: -30.1, depthKm: source.depthKm ?? 20, mw: source.mw ?? 7.1, faultType: "crustal" },
    stations: [
      { id: "S1", lon: 150.0, lat: -30.0 },
      { id: "S2", lon: 150.4, lat: -30.2 },
    ],
    vs30: 400,
    area: { bbox: [149.5, -30.6, 150.9, -29.6], cellKm: 5 },
  };
}
