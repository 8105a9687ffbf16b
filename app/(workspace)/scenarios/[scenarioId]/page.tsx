import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { ScenarioTabs } from "@/components/exposure/scenario-tabs";
import { ScenarioExports } from "@/components/exports/scenario-exports";
import { VersionVisibility } from "@/components/publishing/version-visibility";
import { StateBadge } from "@/components/scenarios/state-badge";
import { ScenarioWorkspace, type LayerRef } from "@/components/workspace/scenario-workspace";
import { describeLayerVersions, layerVersionIdsSchema, readWorkspaceExposureSettings } from "@/db/queries/exposure";
import { listActiveCouncilMembers } from "@/db/queries/people";
import { findScenario, findScenarioVersion, listScenarioVersions } from "@/db/queries/scenarios";
import { positiveIntParam } from "@/lib/api/params";
import { can, visibleStates } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Scenario" };

const searchSchema = z.object({ v: positiveIntParam.optional() });

const ROLE_LABELS = { admin: "administrator", planner: "planner", trainer: "trainer", council: "council member" } as const;

/** The population and facilities layer versions a scenario version records, for drawing them. */
async function drawableLayers(layerVersions: unknown): Promise<{ population?: LayerRef; facilities?: LayerRef }> {
  const ids = layerVersionIdsSchema.safeParse(layerVersions);
  if (!ids.success) return {};
  const rows = await describeLayerVersions({ ids: Object.values(ids.data) });
  const ref = (kind: string) => {
    const row = rows.find((r) => r.kind === kind);
    return row ? { layerId: row.layerId, number: row.number } : undefined;
  };
  return { population: ref("population"), facilities: ref("facilities") };
}

/**
 * The map workspace of one scenario version (`?v=`, else the newest the role may see). Planners
 * and admins edit and save new versions; trainers and council members look, use the site card and
 * the replay. Roles are checked here and again by every API route the page calls.
 */
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

  const canEdit = can(user.role, "scenario:edit");
  const [councilMembers, settings, stored] = await Promise.all([
    // Planners see how many council members a publication will e-mail before they publish.
    can(user.role, "scenario:publish") ? listActiveCouncilMembers().then((members) => members.length) : Promise.resolve(0),
    readWorkspaceExposureSettings(),
    findScenarioVersion({ scenarioId: scenario.id, number: version.number }),
  ]);
  const layers = can(user.role, "layer:view") && stored ? await drawableLayers(stored.version.layerVersions) : {};

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-bold">{scenario.name}</h1>
        <StateBadge state={version.state} />
        <span className="text-sm text-ink-muted" data-testid="version-line">
          Version {version.number}
          {version.author ? ` · by ${version.author}` : ""} · {version.createdAt.toISOString().slice(0, 10)}
          {version.note ? ` · ${version.note}` : ""}
        </span>
      </div>
      {scenario.description && <p className="max-w-3xl">{scenario.description}</p>}
      {versions.length > 1 && (
        <nav aria-label="Versions" className="flex flex-wrap items-center gap-2 text-sm" data-testid="version-list">
          <span className="text-ink-muted">Versions:</span>
          {versions.map((v) => (
            <Link
              key={v.number}
              href={`/scenarios/${scenario.id}?v=${v.number}`}
              aria-current={v.number === version.number ? "page" : undefined}
              className={`rounded-card border px-2 py-0.5 ${v.number === version.number ? "border-tide bg-tide-soft font-semibold" : "border-line hover:border-tide"}`}
            >
              {v.number}
              {v.state === "draft" ? "" : v.state === "published" ? " · published" : " · shared"}
            </Link>
          ))}
        </nav>
      )}
      <ScenarioTabs scenarioId={scenario.id} versionNumber={version.number} current="map" />
      {can(user.role, "scenario:publish") && (
        <VersionVisibility scenarioId={scenario.id} versionNumber={version.number} state={version.state} councilMembers={councilMembers} />
      )}
      <ScenarioWorkspace
        scenarioId={scenario.id}
        versionNumber={version.number}
        versionState={version.state}
        latestNumber={versions[0].number}
        canEdit={canEdit}
        roleLabel={ROLE_LABELS[user.role]}
        workspaceScale={settings.intensityScale}
        reactionTimeS={settings.reactionTimeS}
        actions={settings.actions}
        layers={layers}
      />
      <ScenarioExports scenarioId={scenario.id} versionNumber={version.number} canExportFiles={can(user.role, "export:files")} />
    </div>
  );
}
