"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { scenarioListQuery } from "@/lib/api/queries";
import { FAULT_TYPE_LABELS } from "./fault-type";
import { StateBadge } from "./state-badge";

export function ScenarioList() {
  const { data, error, isPending } = useQuery(scenarioListQuery());
  if (isPending) return <p className="text-ink-muted">Loading scenarios…</p>;
  if (error) return <p role="alert" className="text-error-ink">Scenarios could not be loaded: {error.message}</p>;
  if (data.scenarios.length === 0) return <p className="text-ink-muted">No scenarios are visible to your role yet.</p>;

  return (
    <ul className="grid gap-3 md:grid-cols-2 xl:grid-cols-3" data-testid="scenario-list">
      {data.scenarios.map((scenario) => {
        const source = scenario.latest.source;
        return (
          <li key={scenario.id}>
            <Link
              href={`/scenarios/${scenario.id}`}
              className="block h-full space-y-2 rounded-card border border-line bg-surface p-4 hover:border-tide"
            >
              <div className="flex items-start justify-between gap-2">
                <h2 className="text-lg font-semibold">{scenario.name}</h2>
                <StateBadge state={scenario.latest.state} />
              </div>
              {source && (
                <p className="text-sm text-ink-muted">
                  Mw {source.mw.toFixed(1)} · depth {source.depthKm} km · {FAULT_TYPE_LABELS[source.faultType] ?? source.faultType}
                </p>
              )}
              {scenario.description && <p className="text-sm">{scenario.description}</p>}
              <p className="text-xs text-ink-muted">
                Version {scenario.latest.number} of {scenario.versionCount} visible
              </p>
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
