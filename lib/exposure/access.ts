import type { Database } from "@/db/connect";
import type { Role } from "@/db/schema";
import { canViewScenarioState } from "@/lib/auth/permissions";
import { LeewayError } from "@/lib/errors";
import { loadVersion, type LoadedVersion } from "./service";

/**
 * A scenario version the caller's role may see, with its exposure: drafts for admins and planners,
 * versions shared for exercises also for trainers, published versions for everyone (brief, role table).
 * 404 when the version does not exist, 403 when the role may not see it.
 */
export async function loadVisibleVersion({ role, scenarioId, number, db }: { role: Role; scenarioId: number; number: number; db?: Database }): Promise<LoadedVersion> {
  const version = await loadVersion({ scenarioId, number, db });
  if (!canViewScenarioState(role, version.ref.state)) {
    throw new LeewayError("forbidden", `Your role (${role}) may not see ${version.ref.state} scenario versions or their exposure.`);
  }
  return version;
}
