import type { Metadata } from "next";
import "./print.css";
import { DistrictMap, type MapClass } from "@/components/charts/district-map";
import { ClassBandChart } from "@/components/exposure/class-band-chart";
import { CouncilGlossary } from "@/components/exposure/council-glossary";
import { CouncilTables } from "@/components/exposure/council-tables";
import { formatAreaKm2, formatPeople } from "@/components/exposure/format";
import { HeadlineCards } from "@/components/exposure/headline-cards";
import { PrintButton } from "@/components/exposure/print-button";
import { ScenarioTabs } from "@/components/exposure/scenario-tabs";
import { UnavailableNote } from "@/components/exposure/unavailable-note";
import { VersionHeading } from "@/components/exposure/version-heading";
import { CautionNote } from "@/components/shell/caution-note";
import { readDistrictOutlines } from "@/db/queries/exposure";
import { WARNING_RAMP } from "@/lib/colour/ramps";
import { resolvePageVersion } from "@/lib/exposure/page-version";
import { exposureOf } from "@/lib/exposure/service";
import { orUnavailable } from "@/lib/exposure/unavailable";
import { formatFigure } from "@/lib/publishing/headline";
import { compareHeadlineWithToday } from "@/lib/publishing/headline-today";
import { parseScenario } from "@/lib/scenario/schema";
import { DEFAULT_DELAYS_NOTE } from "@/lib/scenario/defaults";

export const metadata: Metadata = { title: "Council summary" };

// Share of residents in the blind zone, light (few) to dark (most): the warning ramp read backwards,
// so the darkest shade means what it means on the map workspace — no warning.
const BLIND_SHARE_CLASSES: MapClass[] = [
  { from: 0, label: "under 10 % in the blind zone", colour: WARNING_RAMP[6] },
  { from: 0.1, label: "10–25 %", colour: WARNING_RAMP[5] },
  { from: 0.25, label: "25–50 %", colour: WARNING_RAMP[4] },
  { from: 0.5, label: "50–75 %", colour: WARNING_RAMP[2] },
  { from: 0.75, label: "75 % or more", colour: WARNING_RAMP[0] },
];

/** The council summary of a scenario version: plain figures, a map, a chart, the tables and a glossary, printable on A4. */
export default async function CouncilSummaryPage(props: { params: Promise<{ scenarioId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { version } = await resolvePageVersion(props);
  const { scenarioId, versionNumber, state } = version.ref;
  const districtsId = version.layerVersionIds.districts;
  const [outcome, headline, outlines] = await Promise.all([
    orUnavailable(exposureOf(version)),
    compareHeadlineWithToday({ scenarioId, number: versionNumber }),
    districtsId === undefined ? [] : readDistrictOutlines({ layerVersionId: districtsId }),
  ]);
  const parsed = parseScenario(version.row.params);
  const source = parsed.ok ? parsed.scenario.source : null;
  const publishedOn = version.row.publishedAt?.toISOString().slice(0, 10);

  return (
    <article className="space-y-6 print:space-y-4" data-testid="council-summary">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <VersionHeading version={version.ref} title="Council summary" />
        <PrintButton />
      </div>
      <ScenarioTabs scenarioId={scenarioId} versionNumber={versionNumber} current="council" />
      {state !== "published" && (
        <p className="rounded-card bg-caution-bg px-3 py-2 text-caution-ink" role="status">
          This version is not published: council members cannot see it until a planner publishes it.
        </p>
      )}
      <CautionNote />

      {source && (
        <p className="max-w-4xl">
          An imagined earthquake of magnitude {source.mw} at {source.depthKm} km depth ({source.faultType} fault), and how an earthquake early-warning system with{" "}
          {parsed.ok ? parsed.scenario.stations.filter((s) => s.operating !== false).length : "its"} operating stations would serve the people of the region.
          {publishedOn ? ` Published to council on ${publishedOn}.` : ""}
        </p>
      )}

      {outcome.ok ? (
        <>
          <section className="space-y-3">
            <h2 className="text-lg font-bold">The figures that matter most</h2>
            <HeadlineCards figures={outcome.value.exposure.headline} />
            <HeadlineChanges changes={headline.changes} frozen={headline.stored !== null} publishedOn={publishedOn} />
            <p className="text-sm">
              Of {formatPeople(outcome.value.exposure.totals.totalPopulation)} people, {formatPeople(outcome.value.exposure.totals.alertedPopulation)} would be
              alerted. The blind zone covers about {formatAreaKm2(outcome.value.exposure.totals.blindZoneAreaKm2)}.
            </p>
            {outcome.value.exposure.usesDefaultDelays && <p className="inline-block rounded-card bg-caution-bg px-2 py-0.5 text-sm font-semibold text-caution-ink">{DEFAULT_DELAYS_NOTE}</p>}
          </section>

          <section className="grid gap-6 lg:grid-cols-2 print:grid-cols-1">
            <div className="space-y-2">
              <h2 className="text-lg font-bold">Where the shaking comes before the alert</h2>
              {outlines.length > 0 ? (
                <DistrictMap
                  testId="council-map"
                  title="Share of each district's residents in the blind zone"
                  description="Districts shaded from light (few residents in the blind zone) to dark (most); the cross marks the epicentre."
                  districts={outlines}
                  valueOf={(name) => {
                    const row = outcome.value.exposure.byDistrict.find((d) => d.district === name);
                    return row && row.population > 0 ? row.blindZonePopulation / row.population : null;
                  }}
                  classes={BLIND_SHARE_CLASSES}
                  epicentre={source ? [source.lon, source.lat] : undefined}
                />
              ) : (
                <p className="text-sm text-ink-muted">This version records no district boundaries, so there is no district map.</p>
              )}
            </div>
            <div className="space-y-2">
              <h2 className="text-lg font-bold">How much warning, by strength of shaking</h2>
              <ClassBandChart exposure={outcome.value.exposure} />
            </div>
          </section>

          <CouncilTables exposure={outcome.value.exposure} />
          <p className="text-xs text-ink-muted" data-testid="provenance">
            How it was made: {outcome.value.exposure.provenance}
          </p>
        </>
      ) : (
        <UnavailableNote reason={outcome.reason} />
      )}

      <CouncilGlossary scale={outcome.ok ? outcome.value.exposure.intensityScale : "jma"} />
    </article>
  );
}

/** Tells council when today's computation no longer gives the figures frozen at publication. */
function HeadlineChanges({ changes, frozen, publishedOn }: { changes: Awaited<ReturnType<typeof compareHeadlineWithToday>>["changes"]; frozen: boolean; publishedOn?: string }) {
  if (!frozen) return <p className="text-sm text-ink-muted">No figures were frozen with this version; these are today&rsquo;s.</p>;
  if (changes.length === 0) return <p className="text-sm text-ink-muted">Recomputed today, the figures match those published{publishedOn ? ` on ${publishedOn}` : ""}.</p>;
  return (
    <div role="status" className="rounded-card bg-caution-bg px-3 py-2 text-sm text-caution-ink" data-testid="headline-changed">
      <p className="font-semibold">Recomputing today gives different figures from those published{publishedOn ? ` on ${publishedOn}` : ""} (models, settings or Leeway itself changed):</p>
      <ul className="list-disc pl-5">
        {changes.map((change) => (
          <li key={change.key}>
            {change.label}: published {change.stored === undefined ? "—" : formatFigure({ key: change.key, label: change.label, value: change.stored })}, today{" "}
            {change.now === undefined ? "—" : formatFigure({ key: change.key, label: change.label, value: change.now })}
          </li>
        ))}
      </ul>
    </div>
  );
}
