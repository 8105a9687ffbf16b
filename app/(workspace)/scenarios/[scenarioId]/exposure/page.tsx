import type { Metadata } from "next";
import { dehydrate, HydrationBoundary, QueryClient } from "@tanstack/react-query";
import { ExposureView } from "@/components/exposure/exposure-view";
import { ScenarioTabs } from "@/components/exposure/scenario-tabs";
import { UnavailableNote } from "@/components/exposure/unavailable-note";
import { VersionHeading } from "@/components/exposure/version-heading";
import { exposureQuery } from "@/lib/api/exposure-queries";
import { CAUTION } from "@/lib/caution";
import { resolvePageVersion } from "@/lib/exposure/page-version";
import { exposureOf } from "@/lib/exposure/service";
import { orUnavailable } from "@/lib/exposure/unavailable";

export const metadata: Metadata = { title: "Exposure" };

/** Exposure tables of a scenario version, computed on the server from its layer versions. */
export default async function ExposurePage(props: { params: Promise<{ scenarioId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { version } = await resolvePageVersion(props);
  const { scenarioId, versionNumber } = version.ref;
  // Computed here (or read from the cache) and handed to the client query as its first data.
  const outcome = await orUnavailable(exposureOf(version));
  const queryClient = new QueryClient();
  if (outcome.ok) {
    const { exposure, cached } = outcome.value;
    queryClient.setQueryData(exposureQuery(scenarioId, versionNumber).queryKey, { caution: CAUTION, version: version.ref, cached, exposure });
  }

  return (
    <div className="space-y-4">
      <VersionHeading version={version.ref} title="Exposure" />
      <ScenarioTabs scenarioId={scenarioId} versionNumber={versionNumber} current="exposure" />
      {outcome.ok ? (
        <HydrationBoundary state={dehydrate(queryClient)}>
          <ExposureView scenarioId={scenarioId} versionNumber={versionNumber} />
        </HydrationBoundary>
      ) : (
        <UnavailableNote reason={outcome.reason} />
      )}
    </div>
  );
}
