import type { Role } from "@/db/schema";
import { parseWith } from "@/lib/api/handler";
import { loadVisibleVersion } from "./access";
import { comparisonOf } from "./service";
import { versionPairSchema } from "./version-pair";

/** Parses `?a=…&b=…`, checks that the role may see both versions, and returns their comparison (cached). */
export async function compareFromRequest(request: Request, role: Role) {
  const pair = parseWith(versionPairSchema, Object.fromEntries(new URL(request.url).searchParams), "Comparison request");
  const [a, b] = await Promise.all([
    loadVisibleVersion({ role, scenarioId: pair.a.scenarioId, number: pair.a.number }),
    loadVisibleVersion({ role, scenarioId: pair.b.scenarioId, number: pair.b.number }),
  ]);
  return comparisonOf(a, b);
}
