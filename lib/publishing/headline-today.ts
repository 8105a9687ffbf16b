import "server-only";
import { findHeadlineSource } from "@/db/queries/publishing";
import { exposureOf, loadVersion } from "@/lib/exposure/service";
import { LeewayError } from "@/lib/errors";
import { computeHeadline, headlineChanges, type HeadlineExposure } from "./headline";

/**
 * The exposure engine's headline figures for a version (from the result cache when its inputs are
 * unchanged). A version the engine cannot compute — no population layer, say — gets the reason
 * instead, so it can still be published with its source figures; any other failure propagates and
 * nothing is published.
 */
export async function exposureForHeadline({ scenarioId, number }: { scenarioId: number; number: number }): Promise<HeadlineExposure> {
  try {
    const { exposure } = await exposureOf(await loadVersion({ scenarioId, number }));
    return { figures: exposure.headline, provenance: exposure.provenance };
  } catch (error) {
    if (error instanceof LeewayError) return { unavailable: error.message };
    throw error;
  }
}

/**
 * For the council summary: the headline frozen at publication beside the one Leeway computes today
 * from the same scenario file and layer versions, and the figures that differ — an engine, model
 * or settings change since publication. `stored` is null for a version that was never published.
 */
export async function compareHeadlineWithToday({ scenarioId, number }: { scenarioId: number; number: number }) {
  const [source, exposure] = await Promise.all([findHeadlineSource({ scenarioId, number }), exposureForHeadline({ scenarioId, number })]);
  const today = computeHeadline({ versionNumber: source.number, params: source.params, layerVersions: source.layerVersions, computedAt: new Date(), exposure });
  return { stored: source.stored, today, changes: source.stored ? headlineChanges(source.stored, today) : [] };
}
