import Link from "next/link";

/** The views of one scenario version, in the order planners use them. */
const TABS = [
  { id: "map", label: "Map", path: "" },
  { id: "exposure", label: "Exposure", path: "/exposure" },
  { id: "thresholds", label: "Alert thresholds", path: "/exposure/thresholds" },
  { id: "council", label: "Council summary", path: "/council" },
] as const;

export type ScenarioTabId = (typeof TABS)[number]["id"] | "compare";

/**
 * Links between a scenario version's views (map workspace, exposure tables, threshold study,
 * council summary) and a comparison with another version. Every link keeps the version (`?v=`).
 */
export function ScenarioTabs({ scenarioId, versionNumber, current }: { scenarioId: number; versionNumber: number; current: ScenarioTabId }) {
  const tabs = [
    ...TABS.map((tab) => ({ id: tab.id as ScenarioTabId, label: tab.label, href: `/scenarios/${scenarioId}${tab.path}?v=${versionNumber}` })),
    { id: "compare" as const, label: "Compare", href: `/compare?a=${scenarioId}:${versionNumber}` },
  ];
  return (
    <nav aria-label="Scenario views" className="no-print flex flex-wrap gap-1 border-b border-line">
      {tabs.map((tab) => (
        <Link
          key={tab.id}
          href={tab.href}
          aria-current={tab.id === current ? "page" : undefined}
          className={`-mb-px border-b-2 px-3 py-2 text-sm font-semibold ${tab.id === current ? "border-tide text-tide" : "border-transparent text-ink-muted hover:text-ink"}`}
        >
          {tab.label}
        </Link>
      ))}
    </nav>
  );
}
