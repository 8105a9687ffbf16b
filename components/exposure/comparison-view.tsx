"use client";

import { useQuery } from "@tanstack/react-query";
import type { DistrictShape } from "@/components/charts/district-map";
import { SecondsGainedMap } from "@/components/charts/seconds-gained-map";
import { comparisonQuery } from "@/lib/api/exposure-queries";
import type { Comparison, FacilityChange } from "@/lib/exposure/contracts";
import { versionPairQuery, type VersionPair } from "@/lib/exposure/version-pair";
import { formatAreaKm2, formatPeople, formatPeopleChange, formatWarningS } from "./format";
import { bandStyles, FACILITY_KIND_LABELS } from "./labels";
import { SortableTable, type Column } from "./sortable-table";
import { TableFrame } from "./table-frame";

const versionName = (side: Comparison["a"]) => `${side.version.scenarioName}, version ${side.version.versionNumber}`;

/** Version B beside version A: blind zone, people moved between warning bands, facilities, seconds gained. */
export function ComparisonView({ pair, districts, canDownloadGeoJson }: { pair: VersionPair; districts: DistrictShape[]; canDownloadGeoJson: boolean }) {
  const { data, error, isPending } = useQuery(comparisonQuery(pair));
  if (isPending) return <p className="text-ink-muted">Comparing…</p>;
  if (error) return <p role="alert" className="max-w-3xl rounded-card bg-error-bg px-3 py-2 text-error-ink" data-testid="comparison-refused">{error.message}</p>;
  const { comparison } = data;
  const { a, b } = comparison;
  const query = versionPairQuery(pair);
  const csv = (table: string) => `/api/compare/csv?${query}&table=${table}`;
  const frame = { provenance: `A: ${a.provenance} | B: ${b.provenance}`, usesDefaultDelays: comparison.notes.some((note) => note.startsWith("default delays")) };
  const styles = bandStyles(comparison.bands.filter((band) => band.id !== "no-alert"));
  const bandName = (id: string, label: string) => styles.get(id)?.label ?? label;

  const summary: { key: string; label: string; a: number; b: number; format: (v: number) => string }[] = [
    { key: "area", label: "Blind-zone area", a: a.blindZoneAreaKm2, b: b.blindZoneAreaKm2, format: formatAreaKm2 },
    { key: "blind", label: "People in the blind zone", a: a.blindZonePopulation, b: b.blindZonePopulation, format: formatPeople },
    { key: "alerted", label: "People alerted", a: a.alertedPopulation, b: b.alertedPopulation, format: formatPeople },
    { key: "ten", label: "People alerted 10 s or more before the shaking", a: a.alertedWithTenSecondsPopulation, b: b.alertedWithTenSecondsPopulation, format: formatPeople },
  ];

  const facilityColumns: Column<FacilityChange>[] = [
    { key: "name", header: "Facility", value: (r) => r.name },
    { key: "kind", header: "Kind", value: (r) => r.kind, render: (r) => FACILITY_KIND_LABELS[r.kind] ?? r.kind },
    { key: "action", header: "Protective action", value: (r) => r.action },
    { key: "a", header: "Warning in A", unit: "s", align: "right", value: (r) => r.warningA, render: (r) => formatWarningS(r.warningA) },
    { key: "b", header: "Warning in B", unit: "s", align: "right", value: (r) => r.warningB, render: (r) => formatWarningS(r.warningB) },
    { key: "change", header: "Change", value: (r) => r.change, render: (r) => (r.change === "gains" ? "now fits" : "no longer fits") },
  ];

  return (
    <div className="space-y-8" data-testid="comparison">
      <TableFrame {...frame} testId="comparison-summary" title="Side by side" csvHref={csv("summary")}>
        <div className="overflow-x-auto rounded-card border border-line bg-surface">
          <table className="w-full text-sm">
            <thead className="border-b border-line text-ink-muted">
              <tr>
                <th scope="col" className="px-3 py-2 text-left font-semibold">Figure</th>
                <th scope="col" className="px-3 py-2 text-right font-semibold">A: {versionName(a)}</th>
                <th scope="col" className="px-3 py-2 text-right font-semibold">B: {versionName(b)}</th>
                <th scope="col" className="px-3 py-2 text-right font-semibold">B − A</th>
              </tr>
            </thead>
            <tbody>
              {summary.map((row) => (
                <tr key={row.key} className="border-t border-line" data-testid={`compare-${row.key}`}>
                  <th scope="row" className="px-3 py-1.5 text-left font-normal">{row.label}</th>
                  <td className="px-3 py-1.5 text-right tabular-nums" data-side="a" data-value={row.a}>{row.format(row.a)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums" data-side="b" data-value={row.b}>{row.format(row.b)}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{row.key === "area" ? `${row.b - row.a < 0 ? "−" : "+"}${formatAreaKm2(Math.abs(row.b - row.a))}` : formatPeopleChange(row.b - row.a)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </TableFrame>

      <TableFrame
        {...frame}
        testId="transition-matrix"
        title="People moved between warning bands"
        csvHref={csv("transitions")}
        description={`Each row is a warning band in A, each column one in B (primary channel, alerted or not). Row totals are A's people per band, column totals B's. ${formatPeople(comparison.movedToMoreWarning)} people get more warning in B, ${formatPeople(comparison.movedToLessWarning)} less.`}
      >
        <div className="max-h-[32rem] overflow-auto rounded-card border border-line bg-surface">
          <table className="w-full border-collapse text-sm">
            <thead>
              <tr>
                <th scope="col" className="sticky top-0 bg-surface px-3 py-2 text-left font-semibold text-ink-muted">A \ B</th>
                {comparison.bands.map((band) => (
                  <th key={band.id} scope="col" className="sticky top-0 bg-surface px-3 py-2 text-right font-semibold text-ink-muted">
                    {bandName(band.id, band.label)}
                  </th>
                ))}
                <th scope="col" className="sticky top-0 bg-surface px-3 py-2 text-right font-semibold text-ink-muted">Total in A (people)</th>
              </tr>
            </thead>
            <tbody>
              {comparison.matrix.map((row, r) => (
                <tr key={comparison.bands[r].id} className="border-t border-line">
                  <th scope="row" className="px-3 py-1.5 text-left font-semibold">{bandName(comparison.bands[r].id, comparison.bands[r].label)}</th>
                  {row.map((people, c) => (
                    <td key={c} className={`px-3 py-1.5 text-right tabular-nums ${r === c ? "text-ink-muted" : ""}`}>
                      {people ? formatPeople(people) : "–"}
                    </td>
                  ))}
                  <td className="px-3 py-1.5 text-right font-semibold tabular-nums">{formatPeople(comparison.rowTotals[r])}</td>
                </tr>
              ))}
            </tbody>
            <tfoot>
              <tr className="border-t-2 border-line-strong font-semibold">
                <th scope="row" className="px-3 py-1.5 text-left">Total in B (people)</th>
                {comparison.columnTotals.map((total, c) => (
                  <td key={c} className="px-3 py-1.5 text-right tabular-nums">{formatPeople(total)}</td>
                ))}
                <td className="px-3 py-1.5 text-right tabular-nums">{formatPeople(comparison.totalPopulation)}</td>
              </tr>
            </tfoot>
          </table>
        </div>
      </TableFrame>

      <TableFrame
        {...frame}
        testId="facility-changes"
        title="Facilities that gain or lose enough time for an action"
        csvHref={csv("facilities")}
        description="A facility and action appear when the action fits in one version and not in the other."
      >
        {comparison.facilities.length ? (
          <SortableTable caption="Facilities whose protective actions change" columns={facilityColumns} rows={comparison.facilities} rowKey={(r) => `${r.kind}/${r.name}/${r.action}`} />
        ) : (
          <p className="text-sm text-ink-muted">No facility gains or loses an action.</p>
        )}
      </TableFrame>

      <TableFrame {...frame} testId="seconds-gained" title="Seconds gained" description="B's warning minus A's on the primary channel, from one grid over A's scenario area.">
        <SecondsGainedMap testId="seconds-gained-map" layer={comparison.secondsGained} districts={districts} bbox={comparison.gridBbox} />
        {canDownloadGeoJson && (
          <a href={`/api/compare/seconds-gained?${query}`} download className="text-sm font-semibold text-tide hover:underline">
            Download the layer as GeoJSON
          </a>
        )}
      </TableFrame>

      <section className="space-y-1 text-sm text-ink-muted">
        <h2 className="font-semibold text-ink">Notes</h2>
        <ul className="list-disc pl-5">
          {comparison.notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      </section>
    </div>
  );
}
