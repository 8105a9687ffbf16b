import "server-only";
import { notFound } from "next/navigation";
import { z } from "zod";
import { listScenarioVersions } from "@/db/queries/scenarios";
import { positiveIntParam } from "@/lib/api/params";
import { visibleStates } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";
import { loadVersion } from "./service";

const searchSchema = z.object({ v: positiveIntParam.optional() });

/**
 * The scenario version a page shows: `?v=` or else the newest the role may see. A version the role
 * may not see is a 404, like a missing one (its existence is not the role's business).
 */
export async function resolvePageVersion(props: { params: Promise<{ scenarioId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [params, search, user] = await Promise.all([props.params, props.searchParams, requireUser()]);
  const scenarioId = positiveIntParam.safeParse(params.scenarioId);
  const query = searchSchema.safeParse(search);
  if (!scenarioId.success || !query.success) notFound();
  const versions = await listScenarioVersions({ scenarioId: scenarioId.data, states: visibleStates(user.role) });
  const chosen = query.data.v ? versions.find((v) => v.number === query.data.v) : versions[0];
  if (!chosen) notFound();
  const version = await loadVersion({ scenarioId: scenarioId.data, number: chosen.number });
  return { user, version, versions };
}
