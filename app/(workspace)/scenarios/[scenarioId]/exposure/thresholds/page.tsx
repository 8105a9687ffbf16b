import type { Metadata } from "next";
import { dehydrate, HydrationBoundary, QueryClient } from "@tanstack/react-query";
import { ScenarioTabs } from "@/components/exposure/scenario-tabs";
import { ThresholdStudyView } from "@/components/exposure/threshold-study-view";
import { UnavailableNote } from "@/components/exposure/unavailable-note";
import { VersionHeading } from "@/components/exposure/version-heading";
import { thresholdStudyQuery } from "@/lib/api/exposure-queries";
import { CAUTION } from "@/lib/caution";
import { resolvePageVersion } from "@/lib/exposure/page-version";
import { thresholdStudyOf } from "@/lib/exposure/service";
import { orUnavailable } from "@/lib/exposure/unavailable";

export const metadata: Metadata = { title: "Alert thresholds" };

/** The alert-threshold study of a scenario version. */
export default async function ThresholdStudyPage(props: { params: Promise<{ scenarioId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { version } = await resolvePageVersion(props);
  const { scenarioId, versionNumber } = version.ref;
  const outcome = await orUnavailable(thresholdStudyOf(version));
  const queryClient = new QueryClient();
  if (outcome.ok) {
    queryClient.setQueryData(thresholdStudyQuery(scenarioId, versionNumber).queryKey, { caution: CAUTION, version: version.ref, ...outcome.value });
  }
  return (
    <div className="space-y-4">
      <VersionHeading version={version.ref} title="Alert thresholds" />
      <ScenarioTabs scenarioId={scenarioId} versionNumber={versionNumber} current="thresholds" />
      {outcome.ok ? (
        <HydrationBoundary state={dehydrate(queryClient)}>
          <ThresholdStudyView scenarioId={scenarioId} versionNumber={versionNumber} />
        </HydrationBoundary>
      ) : (
        <UnavailableNote reason={outcome.reason} />
      )}
    </div>
  );
}
