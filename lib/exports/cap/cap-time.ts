/**
 * CAP 1.2 date-times (§3.3.2): `YYYY-MM-DDThh:mm:ss` followed by a numeric offset `±hh:mm`. The
 * standard forbids "Z"; UTC is written "+00:00" (the standard's own example uses "-00:00" for it).
 */

const two = (n: number) => String(n).padStart(2, "0");

/**
 * Formats `at` in the time zone `offsetMinutes` east of UTC (e.g. 120 for UTC+2, −300 for UTC−5),
 * to whole seconds.
 */
export function formatCapDateTime(at: Date, offsetMinutes: number): string {
  if (!Number.isInteger(offsetMinutes) || Math.abs(offsetMinutes) > 14 * 60) {
    throw new RangeError(`a time-zone offset must be whole minutes within ±14 h (got ${offsetMinutes})`);
  }
  const local = new Date(Math.floor(at.getTime() / 1000) * 1000 + offsetMinutes * 60_000);
  const date = `${local.getUTCFullYear()}-${two(local.getUTCMonth() + 1)}-${two(local.getUTCDate())}`;
  const time = `${two(local.getUTCHours())}:${two(local.getUTCMinutes())}:${two(local.getUTCSeconds())}`;
  const sign = offsetMinutes < 0 ? "-" : "+";
  const abs = Math.abs(offsetMinutes);
  return `${date}T${time}${sign}${two(Math.floor(abs / 60))}:${two(abs % 60)}`;
}
