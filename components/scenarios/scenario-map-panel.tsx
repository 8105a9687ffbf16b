"use client";

import { useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { RegionMap } from "@/components/map/region-map";
import { scenarioVersionQuery } from "@/lib/api/queries";
import { FAULT_TYPE_LABELS } from "./fault-type";

/** The parts of a scenario file the read-only map shows. */
const mapPartsSchema = z.object({
  name: z.string().optional(),
  source: z.object({ lon: z.number(), lat: z.number(), depthKm: z.number(), mw: z.number(), faultType: z.string() }),
  stations: z.array(z.object({ id: z.string(), lon: z.number(), lat: z.number(), operating: z.boolean().optional() })),
});

export function ScenarioMapPanel({ scenarioId, versionNumber }: { scenarioId: number; versionNumber: number }) {
  const { data, error, isPending } = useQuery(scenarioVersionQuery(scenarioId, versionNumber));
  if (isPending) return <p className="text-ink-muted">Loading the map…</p>;
  if (error) return <p role="alert" className="text-error-ink">The scenario could not be loaded: {error.message}</p>;

  const parts = mapPartsSchema.safeParse(data.version.params);
  if (!parts.success) return <p role="alert" className="text-error-ink">This scenario version has no readable source.</p>;
  const { source, stations } = parts.data;
  const operating = stations.filter((s) => s.operating !== false).length;

  return (
    <div className="grid gap-4 lg:grid-cols-[1fr_18rem]">
      <RegionMap
        stations={stations.map((s) => ({ id: s.id, lon: s.lon, lat: s.lat, operating: s.operating !== false }))}
        sources={[{ name: data.scenario.name, ...source }]}
      />
      <aside className="space-y-3 rounded-card border border-line bg-surface p-4 text-sm" data-testid="scenario-facts">
        <h2 className="text-base font-semibold">Source</h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
          <dt className="text-ink-muted">Magnitude</dt>
          <dd>Mw {source.mw.toFixed(1)}</dd>
          <dt className="text-ink-muted">Depth</dt>
          <dd>{source.depthKm} km</dd>
          <dt className="text-ink-muted">Type</dt>
          <dd>{FAULT_TYPE_LABELS[source.faultType] ?? source.faultType}</dd>
          <dt className="text-ink-muted">Epicentre</dt>
          <dd>
            {source.lat.toFixed(3)}°, {source.lon.toFixed(3)}°
          </dd>
        </dl>
        <h2 className="text-base font-semibold">Stations</h2>
        <p>
          {operating} operating of {stations.length}
        </p>
      </aside>
    </div>
  );
}
