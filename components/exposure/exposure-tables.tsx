"use client";

import type { ExposureResult } from "@/lib/exposure/contracts";
import { formatAreaKm2, formatIntensity, formatPeople, formatShare, formatWarningS } from "./format";
import { bandStyles, classLabel, FACILITY_KIND_LABELS } from "./labels";
import { SortableTable, type Column } from "./sortable-table";
import { TableFrame } from "./table-frame";

type Row<K extends keyof ExposureResult> = ExposureResult[K] extends (infer R)[] ? R : never;

const people = <R,>(key: string, header: string, value: (row: R) => number): Column<R> => ({
  key,
  header,
  unit: "people",
  align: "right",
  value,
  render: (row) => formatPeople(value(row)),
});

/** Every exposure table of one version, each sortable, with CSV, provenance and caution. */
export function ExposureTables({ exposure, csvBase }: { exposure: ExposureResult; csvBase: string }) {
  const frame = { provenance: exposure.provenance, usesDefaultDelays: exposure.usesDefaultDelays };
  const csv = (table: string) => `${csvBase}?table=${table}`;
  const styles = bandStyles(exposure.warningBands);
  const scale = exposure.intensityScale;

  type ClassRow = ExposureResult["classByBand"]["rows"][number];
  const classColumns: Column<ClassRow>[] = [
    { key: "class", header: "Intensity class", value: (r) => exposure.intensityClasses.indexOf(r.intensityClass), render: (r) => classLabel(scale, r.intensityClass) },
    ...exposure.warningBands.map((band, b) => people<ClassRow>(band.id, `Alerted, ${styles.get(band.id)?.label ?? band.label}`, (r) => r.alertedByBand[b])),
    people<ClassRow>("not-alerted", "Not alerted", (r) => r.notAlerted),
    people<ClassRow>("total", "Total", (r) => r.total),
  ];
  const { classByBand } = exposure;

  const districtColumns: Column<Row<"byDistrict">>[] = [
    { key: "district", header: "District", value: (r) => r.district ?? "", render: (r) => r.district ?? "No district" },
    people("population", "People", (r) => r.population),
    people("blind", "In the blind zone", (r) => r.blindZonePopulation),
    people("alerted", "Alerted", (r) => r.alertedPopulation),
    people("can-act", "Alerted with warning", (r) => r.alertedWithWarningPopulation),
    { key: "share", header: "Share who can act", align: "right", value: (r) => (r.population ? r.alertedWithWarningPopulation / r.population : 0), render: (r) => (r.population ? formatShare(r.alertedWithWarningPopulation / r.population) : "–") },
  ];

  const channelColumns: Column<Row<"byChannel">>[] = [
    { key: "channel", header: "Channel", value: (r) => r.channel, render: (r) => `${r.channel}${r.primary ? " (primary)" : ""}` },
    { key: "delivery", header: "Delivery", unit: "s", align: "right", value: (r) => r.deliveryS },
    people("blind", "In the blind zone", (r) => r.blindZonePopulation),
    people("alerted", "Alerted", (r) => r.alertedPopulation),
    people("can-act", "Alerted with warning", (r) => r.alertedWithWarningPopulation),
  ];

  const actionColumns: Column<Row<"actions">>[] = [
    { key: "action", header: "Protective action", value: (r) => r.name },
    { key: "seconds", header: "Seconds needed", unit: "s", align: "right", value: (r) => r.secondsNeeded },
    { key: "needs", header: "Warning it needs", unit: "s", align: "right", value: (r) => r.secondsNeeded + exposure.reactionTimeS },
    people("population", "Alerted people who can complete it", (r) => r.population),
  ];

  const facilityColumns: Column<Row<"facilities">>[] = [
    { key: "name", header: "Facility", value: (r) => r.name },
    { key: "kind", header: "Kind", value: (r) => r.kind, render: (r) => FACILITY_KIND_LABELS[r.kind] ?? r.kind },
    { key: "warning", header: "Warning", unit: "s", align: "right", value: (r) => r.warningS, render: (r) => formatWarningS(r.warningS) },
    { key: "intensity", header: `Intensity (${scale.toUpperCase()})`, align: "right", value: (r) => r.intensity, render: (r) => `${formatIntensity(r.intensity)} · ${classLabel(scale, r.intensityClass)}` },
    { key: "alerted", header: "Alerted", align: "right", value: (r) => r.alertedShare, render: (r) => (r.geometry === "line" ? formatShare(r.alertedShare) : r.alertedShare === 1 ? "yes" : "no") },
    ...exposure.actions.map(
      (action, k): Column<Row<"facilities">> => ({
        key: action.id,
        header: action.name,
        value: (r) => (r.actionFits[k] === null ? -1 : r.actionFits[k] ? 1 : 0),
        render: (r) =>
          r.actionFits[k] === null ? <span className="text-ink-muted">not for this kind</span> : r.actionFits[k] ? "fits" : <span className="font-semibold">does not fit</span>,
      }),
    ),
  ];

  return (
    <div className="space-y-8">
      <TableFrame
        {...frame}
        testId="class-band-table"
        title="People by intensity and warning"
        csvHref={csv("class-band")}
        description={
          <>
            Rows are intensity classes; columns are the warning the <strong>alerted</strong> people get on the primary channel, from the blind zone (shaking before the
            alert) to the longest warnings. Everyone outside the alert area is under &ldquo;not alerted&rdquo;, whatever their warning. Rows and columns add up to the
            layer&rsquo;s {formatPeople(classByBand.total)} people.
          </>
        }
      >
        <SortableTable
          caption="People by intensity class and warning band"
          columns={classColumns}
          rows={classByBand.rows}
          rowKey={(r) => r.intensityClass}
          footer={["Total", ...classByBand.bandTotals.map(formatPeople), formatPeople(classByBand.notAlertedTotal), formatPeople(classByBand.total)]}
        />
      </TableFrame>

      <TableFrame {...frame} testId="district-table" title="By district" csvHref={csv("districts")} description="The blind zone counts everyone whose shaking arrives before the alert, alerted or not; “alerted with warning” are those who can act.">
        <SortableTable caption="People by district" columns={districtColumns} rows={exposure.byDistrict} rowKey={(r) => r.district ?? "(none)"} />
      </TableFrame>

      <TableFrame {...frame} testId="channel-table" title="By delivery channel" csvHref={csv("channels")} description="The same alert through each channel: a slower channel widens the blind zone.">
        <SortableTable caption="People by delivery channel" columns={channelColumns} rows={exposure.byChannel} rowKey={(r) => r.channel} />
      </TableFrame>

      <TableFrame
        {...frame}
        testId="action-table"
        title="Protective actions"
        csvHref={csv("actions")}
        description={`An action fits when the warning is at least the reaction time (${exposure.reactionTimeS} s, a workspace setting) plus the action's seconds. Only alerted people count.`}
      >
        <SortableTable caption="People who can complete each protective action" columns={actionColumns} rows={exposure.actions} rowKey={(r) => r.id} />
      </TableFrame>

      <TableFrame
        {...frame}
        testId="facility-table"
        title="Facilities"
        csvHref={csv("facilities")}
        description="Schools and hospitals by their point; rail segments by their worst point, sampled every 0.5 km: the shortest warning and the strongest shaking along the line. On a line an action fits only when the whole line is alerted."
      >
        {exposure.facilities.length ? (
          <SortableTable caption="Facilities with their warning, intensity and protective actions" columns={facilityColumns} rows={exposure.facilities} rowKey={(r) => String(r.id)} />
        ) : (
          <p className="text-sm text-ink-muted">This version records no facilities layer.</p>
        )}
      </TableFrame>

      <p className="text-sm text-ink-muted">
        Blind-zone area on the scenario grid: {formatAreaKm2(exposure.totals.blindZoneAreaKm2)}. Computed {exposure.computedAt.replace("T", " ").slice(0, 16)} UTC.
      </p>
    </div>
  );
}
