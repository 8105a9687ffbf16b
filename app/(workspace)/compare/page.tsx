import type { Metadata } from "next";
import type { ReactNode } from "react";
import { dehydrate, HydrationBoundary, QueryClient } from "@tanstack/react-query";
import { ComparisonView } from "@/components/exposure/comparison-view";
import { UnavailableNote } from "@/components/exposure/unavailable-note";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import { readDistrictOutlines } from "@/db/queries/exposure";
import { listScenarios, listScenarioVersions } from "@/db/queries/scenarios";
import { comparisonQuery } from "@/lib/api/exposure-queries";
import { can, visibleStates } from "@/lib/auth/permissions";
import { requireUser } from "@/lib/auth/session";
import { CAUTION } from "@/lib/caution";
import { loadVisibleVersion } from "@/lib/exposure/access";
import { comparisonOf } from "@/lib/exposure/service";
import { orUnavailable } from "@/lib/exposure/unavailable";
import { versionPairSchema } from "@/lib/exposure/version-pair";

export const metadata: Metadata = { title: "Compare" };

const STATE_WORDS = { draft: "draft", shared: "shared for exercises", published: "published" } as const;

/** Every version the role may see, as picker options `scenarioId:number`. */
async function versionOptions(states: ReturnType<typeof visibleStates>) {
  const scenarios = await listScenarios({ states });
  const perScenario = await Promise.all(
    scenarios.map(async (s) =>
      (await listScenarioVersions({ scenarioId: s.id, states })).map((v) => ({ value: `${s.id}:${v.number}`, label: `${s.name} — version ${v.number} (${STATE_WORDS[v.state]})` })),
    ),
  );
  return perScenario.flat();
}

/** Two scenario versions side by side (?a=scenarioId:version&b=scenarioId:version). */
export default async function ComparePage(props: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [search, user] = await Promise.all([props.searchParams, requireUser()]);
  const options = await versionOptions(visibleStates(user.role));
  const pair = versionPairSchema.safeParse(search);
  const chosen = (key: "a" | "b") => (typeof search[key] === "string" && options.some((o) => o.value === search[key]) ? (search[key] as string) : undefined);

  let body: ReactNode = <p className="text-ink-muted">Choose two versions on the same population layer, for example today&rsquo;s network and one with added stations.</p>;
  if (pair.success) {
    const versions = await Promise.all([
      loadVisibleVersion({ role: user.role, ...pair.data.a }).catch(() => null),
      loadVisibleVersion({ role: user.role, ...pair.data.b }).catch(() => null),
    ]);
    const [a, b] = versions;
    if (!a || !b) {
      body = <UnavailableNote reason="One of these versions does not exist, or your role may not see it." />;
    } else {
      const outcome = await orUnavailable(comparisonOf(a, b));
      if (!outcome.ok) {
        body = <UnavailableNote reason={outcome.reason} />;
      } else {
        const queryClient = new QueryClient();
        queryClient.setQueryData(comparisonQuery(pair.data).queryKey, { caution: CAUTION, ...outcome.value });
        const districtsId = a.layerVersionIds.districts;
        const districts = districtsId === undefined ? [] : await readDistrictOutlines({ layerVersionId: districtsId });
        body = (
          <HydrationBoundary state={dehydrate(queryClient)}>
            <ComparisonView pair={pair.data} districts={districts} canDownloadGeoJson={can(user.role, "export:files")} />
          </HydrationBoundary>
        );
      }
    }
  }

  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Compare scenario versions</h1>
      <form method="get" className="no-print flex flex-wrap items-end gap-3" aria-label="Versions to compare">
        <div className="min-w-72">
          <SelectField label="A (the baseline)" name="a" defaultValue={chosen("a") ?? options[0]?.value} options={options} />
        </div>
        <div className="min-w-72">
          <SelectField label="B (compared with A)" name="b" defaultValue={chosen("b") ?? options[1]?.value ?? options[0]?.value} options={options} />
        </div>
        <Button type="submit">Compare</Button>
      </form>
      {body}
    </div>
  );
}

