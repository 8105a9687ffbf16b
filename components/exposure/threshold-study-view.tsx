"use client";

import { useQuery } from "@tanstack/react-query";
import { LineChart } from "@/components/charts/line-chart";
import { thresholdStudyQuery } from "@/lib/api/exposure-queries";
import { RESULT_LINE_COLOURS } from "@/lib/colour/ramps";
import type { ThresholdRow } from "@/lib/exposure/contracts";
import { formatIntensity, formatPeople } from "./format";
import { classLabel } from "./labels";
import { SortableTable, type Column } from "./sortable-table";
import { TableFrame } from "./table-frame";

/** The alert-threshold study: expected needless, late and missed people for each alert-area threshold. */
export function ThresholdStudyView({ scenarioId, versionNumber }: { scenarioId: number; versionNumber: number }) {
  const { data, error, isPending } = useQuery(thresholdStudyQuery(scenarioId, versionNumber));
  if (isPending) return <p className="text-ink-muted">Computing the study…</p>;
  if (error) return <p role="alert" className="rounded-card bg-error-bg px-3 py-2 text-error-ink">The study could not be computed: {error.message}</p>;
  const { study } = data;
  const scale = study.intensityScale;
  const current = study.rows.findIndex((row) => row.areaAt === study.currentAreaAt);
  const people = (key: "alertedPopulation" | "needless" | "late" | "missed", header: string): Column<ThresholdRow> => ({
    key,
    header,
    unit: "people",
    align: "right",
    value: (r) => r[key],
    render: (r) => formatPeople(r[key]),
  });
  const columns: Column<ThresholdRow>[] = [
    {
      key: "areaAt",
      header: "Alert area at",
      value: (r) => r.areaAt,
      render: (r) => `${classLabel(scale, r.intensityClass)} (${formatIntensity(r.areaAt)})${r.areaAt === study.currentAreaAt ? " — this version" : ""}`,
    },
    people("alertedPopulation", "Alerted"),
    people("needless", "Expected alerted needlessly"),
    people("late", "Expected alerted late"),
    people("missed", "Expected missed"),
  ];

  return (
    <div className="space-y-6">
      <p className="max-w-4xl text-sm">
        Each row sends the alert to every place predicted to reach the class shown, everything else unchanged (the alert is issued at{" "}
        {formatIntensity(study.issueAt)}). &ldquo;Expected&rdquo; counts weigh each person by the chance, from the ground-motion model&rsquo;s scatter, that their
        shaking reaches {classLabel(scale, study.rows.find((r) => r.areaAt >= study.target)?.intensityClass ?? String(study.target))} or more: needless — alerted but
        shaken less; late — alerted with no warning left; missed — not alerted yet shaken that hard. Raising the threshold never lowers the missed count and never
        raises the needless one.
      </p>
      <LineChart
        testId="threshold-chart"
        title="Expected needless, late and missed people by alert-area threshold"
        description="Lines of expected people for each alert-area threshold, lowest threshold on the left; the dotted rule marks this version's threshold."
        categories={study.rows.map((r) => classLabel(scale, r.intensityClass))}
        series={[
          { key: "needless", label: "expected alerted needlessly", colour: RESULT_LINE_COLOURS.alertArea, values: study.rows.map((r) => r.needless) },
          { key: "late", label: "expected alerted late", colour: RESULT_LINE_COLOURS.sFront, dash: "6 3", values: study.rows.map((r) => r.late) },
          { key: "missed", label: "expected missed", colour: RESULT_LINE_COLOURS.pFront, dash: "2 3", values: study.rows.map((r) => r.missed) },
        ]}
        marked={current >= 0 ? current : undefined}
        markedLabel="this version"
        yLabel="people"
        formatValue={formatPeople}
      />
      <TableFrame
        testId="threshold-table"
        title="Alert-area threshold study"
        csvHref={`/api/scenarios/${scenarioId}/versions/${versionNumber}/threshold-study/csv`}
        provenance={study.provenance}
        usesDefaultDelays={study.notes.some((note) => note.startsWith("default delays"))}
        description={study.notes.join("; ")}
      >
        <SortableTable caption="Expected outcomes per alert-area threshold" columns={columns} rows={study.rows} rowKey={(r) => String(r.areaAt)} />
      </TableFrame>
    </div>
  );
}
