import type { ReactNode } from "react";
import type { ExposureResult } from "@/lib/exposure/contracts";
import { hasMisfit } from "@/lib/exposure/headline-figures";
import { formatPeople, formatShare, formatWarningS } from "./format";
import { bandStyles, classLabel, FACILITY_KIND_LABELS } from "./labels";

function Table({ caption, head, rows, foot, testId }: { caption: string; head: string[]; rows: ReactNode[][]; foot?: ReactNode[]; testId?: string }) {
  return (
    <table className="w-full border-collapse text-sm break-inside-avoid" data-testid={testId}>
      <caption className="pb-1 text-left font-semibold">{caption}</caption>
      <thead>
        <tr className="border-b border-line-strong text-ink-muted">
          {head.map((h, i) => (
            <th key={h} scope="col" className={`px-2 py-1 font-semibold ${i === 0 ? "text-left" : "text-right"}`}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row, r) => (
          <tr key={r} className="border-b border-line">
            {row.map((cell, i) => (
              <td key={i} className={`px-2 py-1 ${i === 0 ? "" : "text-right tabular-nums"}`}>
                {cell}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
      {foot && (
        <tfoot>
          <tr className="font-semibold">
            {foot.map((cell, i) => (
              <td key={i} className={`px-2 py-1 ${i === 0 ? "" : "text-right tabular-nums"}`}>
                {cell}
              </td>
            ))}
          </tr>
        </tfoot>
      )}
    </table>
  );
}

/** The council summary's tables: compact and static, for reading on paper. */
export function CouncilTables({ exposure }: { exposure: ExposureResult }) {
  const styles = bandStyles(exposure.warningBands);
  const rows = exposure.classByBand.rows.filter((row) => row.total > 0);
  const misfits = exposure.facilities.filter(hasMisfit);
  return (
    <div className="space-y-6">
      <Table
        testId="council-class-band"
        caption="People by shaking and warning (alerted people by warning; everyone else under “not alerted”)"
        head={["Shaking", ...exposure.warningBands.map((b) => styles.get(b.id)?.label ?? b.label), "not alerted", "total"]}
        rows={rows.map((row) => [classLabel(exposure.intensityScale, row.intensityClass), ...row.alertedByBand.map(formatPeople), formatPeople(row.notAlerted), formatPeople(row.total)])}
        foot={["Total", ...exposure.classByBand.bandTotals.map(formatPeople), formatPeople(exposure.classByBand.notAlertedTotal), formatPeople(exposure.classByBand.total)]}
      />
      <Table
        testId="council-districts"
        caption="People by district"
        head={["District", "people", "in the blind zone", "alerted with warning", "share who can act"]}
        rows={exposure.byDistrict
          .filter((d) => d.population > 0)
          .map((d) => [
            d.district ?? "No district",
            formatPeople(d.population),
            formatPeople(d.blindZonePopulation),
            formatPeople(d.alertedWithWarningPopulation),
            formatShare(d.alertedWithWarningPopulation / d.population),
          ])}
      />
      <Table
        testId="council-actions"
        caption={`Protective actions (reaction time ${exposure.reactionTimeS} s)`}
        head={["Action", "seconds it takes", "alerted people who can complete it"]}
        rows={exposure.actions.map((a) => [a.name, `${a.secondsNeeded} s`, formatPeople(a.population)])}
      />
      {misfits.length > 0 && (
        <Table
          testId="council-facilities"
          caption={`Facilities where a protective action does not fit (${misfits.length} of ${exposure.facilities.length})`}
          head={["Facility", "kind", "warning", "actions that do not fit"]}
          rows={misfits.map((f) => [
            f.name,
            FACILITY_KIND_LABELS[f.kind] ?? f.kind,
            formatWarningS(f.warningS),
            exposure.actions.filter((_, k) => f.actionFits[k] === false).map((a) => a.name).join(", "),
          ])}
        />
      )}
    </div>
  );
}
