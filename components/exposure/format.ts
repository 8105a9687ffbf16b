/** Number formats for exposure tables and charts, in one place so every page prints figures alike. */

const PEOPLE = new Intl.NumberFormat("en-GB", { maximumFractionDigits: 0 });
const ONE_DECIMAL = new Intl.NumberFormat("en-GB", { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const SHARE = new Intl.NumberFormat("en-GB", { style: "percent", maximumFractionDigits: 0 });

/** Whole people with thousands separators (expected counts are rounded to whole people). */
export function formatPeople(people: number): string {
  return PEOPLE.format(Math.round(people));
}

/** Warning seconds as planners see them: rounded down to whole seconds (the engine keeps full precision); "no alert" for null. */
export function formatWarningS(warningS: number | null): string {
  return warningS === null ? "no alert" : `${Math.floor(warningS)} s`;
}

/** An area in km², whole above 10 km², one decimal below. */
export function formatAreaKm2(areaKm2: number): string {
  return `${areaKm2 >= 10 ? PEOPLE.format(Math.round(areaKm2)) : ONE_DECIMAL.format(areaKm2)} km²`;
}

/** An intensity value on its scale, one decimal. */
export function formatIntensity(intensity: number): string {
  return ONE_DECIMAL.format(intensity);
}

/** A share 0–1 as a whole percentage. */
export function formatShare(share: number): string {
  return SHARE.format(share);
}

/** A signed difference of people (B − A), with "+" for gains. */
export function formatPeopleChange(change: number): string {
  return change > 0 ? `+${formatPeople(change)}` : change < 0 ? `−${formatPeople(-change)}` : "0";
}
