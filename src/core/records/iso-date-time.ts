/**
 * Whether a text is a date and time as Trialbook records them: ISO 8601 extended format
 * (ISO 8601-1:2019 section 5.4, as profiled by RFC 3339 section 5.6), a calendar date, "T", a
 * time of day to the minute, optional seconds and decimal fraction, and an optional offset ("Z"
 * or +hh:mm / -hh:mm); without an offset it is the device's local time, which is what a phone's
 * date-time picker gives (HTML's "local date and time string", e.g. 2026-03-01T14:05). Days are
 * checked against their month (leap years by the Gregorian rule). Not anything Date.parse happens
 * to accept ("May 2", "2024-05-02 10:00", "Thu, 02 May 2024"), whose meaning differs by engine.
 * Method: the grammar of RFC 3339 section 5.6 with the seconds optional (common practice for
 * the picker's value). Cost: one regular expression. Throws nothing.
 * Example: isIsoDateTime('2026-03-01T14:05') -> true; isIsoDateTime('2026-02-29T14:05') -> false.
 */

/** The shape; the calendar is checked after it. Exported for the schema test. */
export const ISO_DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})T([01]\d|2[0-3]):[0-5]\d(:[0-5]\d(\.\d{1,9})?)?(Z|[+-]([01]\d|2[0-3]):[0-5]\d)?$/;

const DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** True for a date and time in the form above, on a day that exists. */
export function isIsoDateTime(text: string): boolean {
  const m = ISO_DATE_TIME.exec(text);
  if (!m) return false;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  if (month < 1 || month > 12 || day < 1) return false;
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return day <= (month === 2 && leap ? 29 : DAYS[month - 1]);
}
