/**
 * The engine behind a message channel (the map workspace's Web Worker): a pure function from a
 * request to a response plus the buffers to transfer. The request envelope and the scenario are
 * validated here; errors come back as issues, never as exceptions.
 */
import { z } from "zod";
import { formatJsonPath, parseScenario, type ScenarioIssue } from "@/lib/scenario/schema";
import { traceContours, type ContourSet } from "../contours";
import { computeGrid, type EngineGrid, type GridSummary } from "../grid";
import type { Provenance } from "../provenance";
import { computeSites, type SiteResult } from "../sites";

/** Cells of the preview grid the map computes while a source is dragged (200 × 200). */
export const PREVIEW_MAX_CELLS = 40_000;

const context = {
  id: z.number().int(),
  scenario: z.unknown(),
  computedAt: z.string().nullable().optional(),
  scenarioVersion: z.union([z.number(), z.string()]).nullable().optional(),
  layerVersions: z.record(z.string(), z.union([z.number(), z.string()])).optional(),
};

const requestSchema = z.discriminatedUnion("kind", [
  z.object({
    kind: z.literal("grid"),
    ...context,
    cellKm: z.number().min(0.1).max(50).optional(),
    bbox: z.tuple([z.number(), z.number(), z.number(), z.number()]).optional(),
    /** Default PREVIEW_MAX_CELLS. */
    maxCells: z.number().int().positive().optional(),
    contours: z.boolean().optional(),
    /** PGA and P(exceed) per cell (default true; previews send false). */
    detail: z.boolean().optional(),
  }),
  z.object({
    kind: z.literal("sites"),
    ...context,
    sites: z.array(z.object({ id: z.string(), lon: z.number(), lat: z.number(), vs30: z.number().optional() })),
  }),
]);

/** A request to the engine worker. */
export type EngineRequest = z.input<typeof requestSchema>;

/** The worker's reply. */
export type EngineResponse =
  | { id: number; kind: "grid"; ok: true; grid: EngineGrid; summary: GridSummary; contours: ContourSet | null; notes: string[]; caution: string; provenance: Provenance }
  | { id: number; kind: "sites"; ok: true; sites: SiteResult[]; alertIssued: boolean; notes: string[]; caution: string; provenance: Provenance }
  | { id: number | null; kind: "error"; ok: false; issues: ScenarioIssue[] };

/** Typed-array buffers of a grid, to hand over without copying. */
function gridBuffers(grid: EngineGrid): ArrayBuffer[] {
  return [
    grid.pArrivalS, grid.sArrivalS, grid.peakShakingS, grid.alertS, grid.warningS, grid.pgvCms, grid.pgaCms2,
    grid.intensity, grid.pExceedTarget, grid.intensityClass, grid.alerted, grid.extrapolated,
  ].map((a) => a.buffer as ArrayBuffer);
}

/** Handles one message: validates it, runs the engine, and lists the buffers to transfer. */
export function handleEngineMessage(message: unknown): { response: EngineResponse; transfer: ArrayBuffer[] } {
  const request = requestSchema.safeParse(message);
  if (!request.success) {
    const id = typeof message === "object" && message !== null && "id" in message && typeof message.id === "number" ? message.id : null;
    const issues = request.error.issues.map((i) => ({ path: `(message) ${formatJsonPath(i.path)}`, message: i.message }));
    return { response: { id, kind: "error", ok: false, issues }, transfer: [] };
  }
  const r = request.data;
  const parsed = parseScenario(r.scenario);
  if (!parsed.ok) return { response: { id: r.id, kind: "error", ok: false, issues: parsed.issues }, transfer: [] };
  const provenance = { computedAt: r.computedAt, scenarioVersion: r.scenarioVersion, layerVersions: r.layerVersions };
  if (r.kind === "sites") {
    const result = computeSites(parsed.scenario, r.sites, provenance);
    return { response: { id: r.id, kind: "sites", ok: true, ...result }, transfer: [] };
  }
  const result = computeGrid(parsed.scenario, { ...provenance, cellKm: r.cellKm, bbox: r.bbox, maxCells: r.maxCells ?? PREVIEW_MAX_CELLS, detail: r.detail });
  const contours = r.contours === false ? null : traceContours(result.grid);
  return { response: { id: r.id, kind: "grid", ok: true, ...result, contours }, transfer: gridBuffers(result.grid) };
}
