import type { ScenarioIssue } from "@/lib/scenario/schema";

/** The message for a scenario-file JSON path (`source.depthKm`), if the schema has one. */
export type IssueLookup = (path: string) => string | undefined;

/** Looks issues up by path; the first message for a path wins. */
export function issueLookup(issues: readonly ScenarioIssue[]): IssueLookup {
  const byPath = new Map<string, string>();
  for (const issue of issues) if (!byPath.has(issue.path)) byPath.set(issue.path, issue.message);
  return (path) => byPath.get(path);
}
