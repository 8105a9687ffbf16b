import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { ScenarioMapPanel } from "@/components/scenarios/scenario-map-panel";
import { VersionVisibility } from "@/components/publishing/version-visibility";
import { StateBadge } from "@/components/scenarios/state-badge";
import { listActiveCouncilMembers } from "@/db/queries/people";
import { findScenario, listScenarioVersions } from "@/db/queries/scenarios";
import { positiveIntParam } from "@/lib/api/params";
import { can, visibleStates } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Scenario" };

const searchSchema = z.object({ v: positiveIntParam.optional() });

export default async function ScenarioPage(props: {
  params: Promise<{ scenarioId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const [params, search, user] = await Promise.all([props.params, props.searchParams, requireUser()]);
  const scenarioId = positiveIntParam.safeParse(params.scenarioId);
  const query = searchSchema.safeParse(search);
  if (!scenarioId.success || !query.success) notFound();

  const scenario = await findScenario({ id: scenarioId.data });
  if (!scenario) notFound();
  const versions = await listScenarioVersions({ scenarioId: scenario.id, states: visibleStates(user.role) });
  const version = query.data.v ? versions.find((v) => v.number === query.data.v) : versions[0];
  // A version the role may not see is reported like a missing one: its existence is not the role's business.
  if (!version) notFound();
  // Planners see how many council members a publication will e-mail before they publish.
  const councilMembers = can(user.role, "scenario:publish") ? (await listActiveCouncilMembers()).length : 0;

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-bold">{scenario.name}</h1>
        <StateBadge state={version.state} />
        <span className="text-sm text-ink-muted">
          Version {version.number}
          {version.author ? ` · by ${version.author}` : ""} · {version.createdAt.toISOString().slice(0, 10)}
        </span>
      </div>
      {scenario.description && <p className="max-w-3xl">{scenario.description}</p>}
      {can(user.role, "scenario:publish") && (
        <VersionVisibility
          scenarioId={scenario.id}
          versionNumber={version.number}
          state={version.state}
          councilMembers={councilMembers}
        />
      )}
      <ScenarioMapPanel scenarioId={scenario.id} versionNumber={version.number} />
    </div>
  );
}
