import "server-only";
import { parseWith } from "@/lib/api/handler";
import { scenarioVersionParamsSchema } from "@/lib/api/params";
import type { Permission } from "@/lib/auth/permissions";
import { requirePermission, type CurrentUser } from "@/lib/auth/session";
import { loadExportSource, type ExportSource } from "./export-source";

/** The route context of every export under /api/scenarios/:scenarioId/versions/:number/exports. */
export type ExportRouteContext = { params: Promise<{ scenarioId: string; number: string }> };

/**
 * The common start of an export handler (STYLE.md §4): the address is parsed, the session and the
 * role's permission checked, then the version loaded and checked against the role's visibility.
 */
export async function beginExport(context: ExportRouteContext, permission: Permission): Promise<{ user: CurrentUser; source: ExportSource; now: Date }> {
  const { scenarioId, number } = parseWith(scenarioVersionParamsSchema, await context.params, "Scenario version address");
  const user = await requirePermission(permission);
  const now = new Date();
  const source = await loadExportSource({ scenarioId, number, user, now });
  return { user, source, now };
}
