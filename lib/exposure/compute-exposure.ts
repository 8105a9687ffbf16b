/**
 * One exposure computation: the engine (lib/geo) over a version's population cells, its
 * scenario grid (for the blind-zone area) and its facilities, shaped into the tables planners
 * read. Pure: the loading and caching live in service.ts.
 */
import { computeExposureWith, describeProvenance, prepareEngine, resolveGridGeometry, summarizeGridWith, type Engine, type PopulationCells } from "@/lib/geo";
import { CAUTION } from "@/lib/caution";
import { classBandTable } from "./class-band-table";
import type { ExposureResult } from "./contracts";
import { facilityRows, type StoredFacility } from "./facility-rows";
import { headlineFigures } from "./headline-figures";
import type { ExposureInputs } from "./inputs";

/** Warning that the council headline counts ("alerted with at least 10 s"), s. */
export const HEADLINE_WARNING_S = 10;

/** Lon/lat points the travel-time tables must reach: the corners of the cells' extent and every facility vertex. */
export function reachPoints(population: Pick<PopulationCells, "lon" | "lat">, facilities: readonly StoredFacility[] = []): [number, number][] {
  let [w, s, e, n] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i < population.lon.length; i++) {
    w = Math.min(w, population.lon[i]);
    e = Math.max(e, population.lon[i]);
    s = Math.min(s, population.lat[i]);
    n = Math.max(n, population.lat[i]);
  }
  const corners: [number, number][] = population.lon.length ? [[w, s], [w, n], [e, s], [e, n]] : [];
  const vertices = facilities.flatMap((f): [number, number][] => (f.geometry.type === "Point" ? [f.geometry.coordinates] : f.geometry.coordinates));
  return [...corners, ...vertices];
}

/** Prepares the engine for a version's inputs, with its site conditions and provenance. */
export function prepareVersionEngine(inputs: Pick<ExposureInputs, "scenario" | "population" | "vs30Cells" | "facilities" | "context">): Engine {
  return prepareEngine(inputs.scenario, { vs30Cells: inputs.vs30Cells, ...inputs.context }, reachPoints(inputs.population, inputs.facilities));
}

/** Computes every exposure table of one scenario version from its loaded inputs. */
export function computeExposureResult(inputs: ExposureInputs): ExposureResult {
  const { scenario, population, settings, context } = inputs;
  const engine = prepareVersionEngine(inputs);
  // The engine counts alerted people with warning ≥ reaction + an action's seconds; a probe action
  // of (10 s − reaction) counts those alerted with at least 10 s, exactly at the boundary.
  const probe = { id: "headline-warning-probe", seconds: HEADLINE_WARNING_S - settings.reactionTimeS };
  const actions = settings.actions.map((a) => ({ id: a.id, seconds: a.secondsNeeded }));
  const exposure = computeExposureWith(engine, population, { actions: [...actions, probe], reactionS: settings.reactionTimeS });
  const counted = new Map(exposure.actions.map((a) => [a.id, a.population]));

  const geometry = resolveGridGeometry(scenario);
  const grid = summarizeGridWith(engine, geometry);
  const facilities = facilityRows(scenario, inputs.facilities, {
    vs30Cells: inputs.vs30Cells,
    ...context,
    actions: settings.actions,
    reactionTimeS: settings.reactionTimeS,
  });

  const notes = [
    ...engine.notes,
    `blind-zone area from the scenario grid at ${geometry.cellKm} km cells over the whole scenario area, land and sea`,
    `reaction time before any action starts: ${settings.reactionTimeS} s (workspace setting)`,
  ];
  if (!population.districtNames?.length) notes.push("the population layer places no cell in a district");

  const result: Omit<ExposureResult, "headline"> = {
    format: 1,
    computedAt: context.computedAt,
    caution: CAUTION,
    provenance: describeProvenance(engine.provenance),
    notes,
    usesDefaultDelays: engine.scenario.defaultsUsed.usesDefaultDelays,
    intensityScale: exposure.intensityScale,
    intensityClasses: [...exposure.intensityClasses],
    warningBands: exposure.warningBands,
    reactionTimeS: settings.reactionTimeS,
    alertIssued: exposure.alertIssued,
    totals: {
      totalPopulation: exposure.totalPopulation,
      blindZonePopulation: exposure.blindZonePopulation,
      blindZoneAreaKm2: grid.blindZoneAreaKm2,
      alertedPopulation: exposure.alertedPopulation,
      notAlertedPopulation: exposure.notAlertedPopulation,
      alertedWithWarningPopulation: exposure.alertedWithWarningPopulation,
      alertedWithTenSecondsPopulation: counted.get(probe.id) ?? 0,
      noAlertPopulation: exposure.noAlertPopulation,
    },
    classByBand: classBandTable(exposure),
    byDistrict: exposure.byDistrict,
    byChannel: exposure.byChannel,
    actions: settings.actions.map((a) => ({ id: a.id, name: a.name, secondsNeeded: a.secondsNeeded, population: counted.get(a.id) ?? 0 })),
    facilities,
    expected: exposure.expected,
  };
  return { ...result, headline: headlineFigures(result) };
}
