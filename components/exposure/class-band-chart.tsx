import { StackedBarChart, type StackSeries } from "@/components/charts/stacked-bar-chart";
import type { ExposureResult } from "@/lib/exposure/contracts";
import { bandStyles, classLabel } from "./labels";
import { formatPeople } from "./format";

/**
 * Not alerted people: a neutral stone grey outside the warning ramp, so it never reads as a warning
 * band (Leeway's own value; the ramp's lightest step is #ecf0d5).
 */
const NOT_ALERTED_FILL = "#b3aea3";

/** Population by warning band (alerted people) per intensity class, with those not alerted on top. */
export function ClassBandChart({ exposure }: { exposure: ExposureResult }) {
  const styles = bandStyles(exposure.warningBands);
  const rows = exposure.classByBand.rows.filter((row) => row.total > 0);
  const series: StackSeries[] = [
    ...exposure.warningBands.map((band, b) => ({
      key: band.id,
      label: `alerted, ${styles.get(band.id)?.label ?? band.label}`,
      colour: styles.get(band.id)?.colour ?? NOT_ALERTED_FILL,
      values: rows.map((row) => row.alertedByBand[b]),
    })),
    { key: "not-alerted", label: "not alerted", colour: NOT_ALERTED_FILL, values: rows.map((row) => row.notAlerted) },
  ];
  return (
    <StackedBarChart
      testId="class-band-chart"
      title="People by warning band in each intensity class"
      description={`Each bar is one intensity class; its segments are the people alerted with each warning time, the blind zone at the bottom, and the people not alerted on top. ${formatPeople(exposure.totals.totalPopulation)} people in all.`}
      categories={rows.map((row) => classLabel(exposure.intensityScale, row.intensityClass))}
      series={series}
      yLabel="people"
      formatValue={formatPeople}
    />
  );
}
