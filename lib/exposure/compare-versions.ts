/**
 * Two scenario versions over the same population layer version, side by side: blind-zone area and
 * people, the transition matrix of people between warning bands, facilities that gain or lose
 * enough time for an action, and the seconds-gained map layer. Pure: loading and caching live in
 * service.ts.
 */
import { CAUTION } from "@/lib/caution";
import { computeGridWith, prepareEngine, resolveGridGeometry, type Bbox } from "@/lib/geo";
import { evaluatePopulationCells } from "@/lib/geo/population-values";
import { resolveScenario } from "@/lib/scenario/resolve";
import { reachPoints } from "./compute-exposure";
import type { Comparison, ExposureResult, FacilityChange, VersionRef } from "./contracts";
import type { ExposureInputs } from "./inputs";
import { secondsGainedLayer } from "./seconds-gained";
import { transitionMatrix } from "./transition-matrix";

/** One side of a comparison: the version, what it was computed from, and its exposure tables. */
export interface ComparedSide {
  ref: VersionRef;
  inputs: ExposureInputs;
  exposure: ExposureResult;
}

const bboxCorners = ([w, s, e, n]: Bbox): [number, number][] => [[w, s], [w, n], [e, s], [e, n]];

/** Facilities (matched by kind and name) whose action fits in one version and not in the other. */
function facilityChanges(a: ExposureResult, b: ExposureResult): FacilityChange[] {
  const inB = new Map(b.facilities.map((f) => [`${f.kind}\u0000${f.name}`, f]));
  const changes: FacilityChange[] = [];
  for (const fa of a.facilities) {
    const fb = inB.get(`${fa.kind}\u0000${fa.name}`);
    if (!fb) continue;
    a.actions.forEach((action, k) => {
      const k2 = b.actions.findIndex((other) => other.id === action.id);
      if (k2 < 0 || fa.actionFits[k] === fb.actionFits[k2]) return;
      changes.push({
        name: fa.name,
        kind: fa.kind,
        action: action.name,
        secondsNeeded: action.secondsNeeded,
        warningA: fa.warningS,
        warningB: fb.warningS,
        change: fb.actionFits[k2] ? "gains" : "loses",
      });
    });
  }
  return changes;
}

/** Compares B with A; both must hold the same population cells (the caller checks the layer version). */
export function compareVersions(a: ComparedSide, b: ComparedSide, computedAt: string): Comparison {
  const geometry = resolveGridGeometry(a.inputs.scenario);
  const population = a.inputs.population;
  const reach = [...reachPoints(population, a.inputs.facilities), ...bboxCorners(geometry.bbox)];
  const engineOf = (side: ComparedSide) => prepareEngine(side.inputs.scenario, { vs30Cells: side.inputs.vs30Cells, ...side.inputs.context }, reach);
  const [engineA, engineB] = [engineOf(a), engineOf(b)];

  const breaksS = resolveScenario(a.inputs.scenario).warningBreaksS;
  const matrix = transitionMatrix(
    evaluatePopulationCells(engineA, population).warningS,
    evaluatePopulationCells(engineB, population).warningS,
    population.population,
    breaksS,
  );
  const gridA = computeGridWith(engineA, geometry);
  const gridB = computeGridWith(engineB, geometry);
  const blindColumn = matrix.bands.findIndex((band) => band.id === "blind");

  const side = (s: ComparedSide, blindZonePopulation: number, blindZoneAreaKm2: number) => ({
    version: s.ref,
    provenance: s.exposure.provenance,
    blindZoneAreaKm2,
    blindZonePopulation,
    alertedPopulation: s.exposure.totals.alertedPopulation,
    alertedWithTenSecondsPopulation: s.exposure.totals.alertedWithTenSecondsPopulation,
  });
  const notes = [
    ...new Set([...a.exposure.notes, ...b.exposure.notes].filter((note) => !note.startsWith("blind-zone area from"))),
    `warning bands are A's; people are counted by their warning on the primary channel, alerted or not`,
    `blind-zone areas and the seconds-gained layer come from one grid at ${geometry.cellKm} km cells over A's scenario area`,
  ];
  return {
    format: 1,
    computedAt,
    caution: CAUTION,
    notes,
    a: side(a, matrix.rowTotals[blindColumn], gridA.summary.blindZoneAreaKm2),
    b: side(b, matrix.columnTotals[blindColumn], gridB.summary.blindZoneAreaKm2),
    bands: matrix.bands,
    matrix: matrix.matrix,
    rowTotals: matrix.rowTotals,
    columnTotals: matrix.columnTotals,
    totalPopulation: matrix.totalPopulation,
    movedToMoreWarning: matrix.movedToMoreWarning,
    movedToLessWarning: matrix.movedToLessWarning,
    facilities: facilityChanges(a.exposure, b.exposure),
    secondsGained: secondsGainedLayer(gridA.grid, gridB.grid),
    gridCellKm: geometry.cellKm,
    gridBbox: geometry.bbox,
  };
}
