"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { exposureQuery } from "@/lib/api/exposure-queries";
import { ClassBandChart } from "./class-band-chart";
import { ExposureTables } from "./exposure-tables";
import { formatPeople } from "./format";
import { HeadlineCards } from "./headline-cards";

/** A version's exposure: headline figures, the chart and every table (data from the exposure API, prefetched on the server). */
export function ExposureView({ scenarioId, versionNumber }: { scenarioId: number; versionNumber: number }) {
  const { data, error, isPending } = useQuery(exposureQuery(scenarioId, versionNumber));
  if (isPending) return <p className="text-ink-muted">Computing exposure…</p>;
  if (error) return <p role="alert" className="rounded-card bg-error-bg px-3 py-2 text-error-ink">The exposure could not be computed: {error.message}</p>;
  const { exposure } = data;
  const { totals, expected } = exposure;
  const base = `/api/scenarios/${scenarioId}/versions/${versionNumber}/exposure/csv`;

  return (
    <div className="space-y-6">
      <HeadlineCards figures={exposure.headline} />
      <p className="max-w-4xl text-sm">
        {formatPeople(totals.totalPopulation)} people in the population layer; {formatPeople(totals.alertedPopulation)} alerted
        {exposure.alertIssued ? "" : " (the alert is not issued: no place is predicted to reach the issue threshold)"}. Expected, from the ground-motion scatter:{" "}
        {formatPeople(expected.needless)} alerted needlessly, {formatPeople(expected.late)} alerted late, {formatPeople(expected.missed)} missed —{" "}
        <Link href={`/scenarios/${scenarioId}/exposure/thresholds?v=${versionNumber}`} className="font-semibold text-tide hover:underline">
          see how the alert-area threshold changes these
        </Link>
        .
      </p>
      <ClassBandChart exposure={exposure} />
      <ExposureTables exposure={exposure} csvBase={base} />
      {exposure.notes.length > 0 && (
        <section className="space-y-1 text-sm text-ink-muted">
          <h2 className="font-semibold text-ink">Notes on these figures</h2>
          <ul className="list-disc pl-5">
            {exposure.notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
