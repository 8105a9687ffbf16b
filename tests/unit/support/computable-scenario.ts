// The shared fixture's scenario file (support/app.ts) is only a sketch, and other tests rely on
// that. Publishing needs a file the engine computes: this turns the fixture's versions into one,
// in open ocean like the invented demo region, with one population cell of 1,000 people on the
// epicentre. Two of its three stations operate.
import { eq } from "drizzle-orm";
import { packGridChunks } from "@/db/grid-codec";
import { gridChunks, scenarioVersions } from "@/db/schema";
import { app, type Fixture } from "./app";

export const COMPUTABLE_SCENARIO_PARAMS = {
  version: 1,
  name: "Harbour test",
  source: { lon: -126.3, lat: -46.6, depthKm: 20, mw: 7.1, faultType: "crustal" },
  stations: [
    { id: "S1", lon: -126.5, lat: -46.5 },
    { id: "S2", lon: -126.1, lat: -46.7 },
    { id: "S3", lon: -126.2, lat: -46.4, operating: false },
  ],
  vs30: 400,
  area: { bbox: [-126.8, -47.0, -125.8, -46.2], cellKm: 5 },
};

/** People in the one population cell, which lies on the epicentre. */
export const EPICENTRE_CELL_PEOPLE = 1_000;

/** Gives every version of the fixture's scenario the computable file and its population layer version the one cell. */
export async function makeFixtureComputable(fixture: Fixture): Promise<void> {
  await app.db.update(scenarioVersions).set({ params: COMPUTABLE_SCENARIO_PARAMS }).where(eq(scenarioVersions.scenarioId, fixture.scenarioId));
  const { source } = COMPUTABLE_SCENARIO_PARAMS;
  const cells = { lon: Float64Array.of(source.lon), lat: Float64Array.of(source.lat), value: Float64Array.of(EPICENTRE_CELL_PEOPLE) };
  for (const chunk of packGridChunks(cells)) await app.db.insert(gridChunks).values({ layerVersionId: fixture.populationLayerVersionId, ...chunk });
}
