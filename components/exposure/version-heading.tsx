import { StateBadge } from "@/components/scenarios/state-badge";
import type { VersionRef } from "@/lib/exposure/contracts";

/** "Exposure · Western trench, Mw 8.4 · version 1 · published". */
export function VersionHeading({ version, title }: { version: VersionRef; title: string }) {
  return (
    <div className="flex flex-wrap items-baseline gap-3">
      <h1 className="text-2xl font-bold">
        {title}: {version.scenarioName}
      </h1>
      <StateBadge state={version.state} />
      <span className="text-sm text-ink-muted">Version {version.versionNumber}</span>
    </div>
  );
}
