// Made once: `toLocaleDateString` builds a formatter on every call, which a screen of 20 cards paid
// 20 times on a slow phone (about 75 ms at 4x CPU throttling in `npm run bench:web`'s profile).
const DAY = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const MOMENT = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "short",
  year: "numeric",
  hour: "2-digit",
  minute: "2-digit",
});

/** "14 Mar 2026" from "2026-03-14", read as a calendar day (UTC) so no time zone moves it a day. */
export function formatDay(isoDay: string): string {
  const d = new Date(`${isoDay.slice(0, 10)}T00:00:00Z`);
  if (Number.isNaN(d.getTime())) return isoDay;
  return DAY.format(d);
}

/** "14 Mar 2026, 16:05" in the reader's own time zone, for when a row was written. */
export function formatMoment(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return MOMENT.format(d);
}

/** A calendar day as YYYY-MM-DD where the person is: an evening pour west of Greenwich is already tomorrow in UTC. */
export function localDay(d: Date = new Date()): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, "0")}-${String(d.getDate()).padStart(2, "0")}`;
}

/** The day n days after a YYYY-MM-DD day (before, for a negative n). */
export function addDays(isoDay: string, n: number): string {
  const d = new Date(`${isoDay}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + n);
  return d.toISOString().slice(0, 10);
}

/** Whether the text is a day that exists, written YYYY-MM-DD (no 31 February). */
export function isCalendarDay(text: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(text)) return false;
  const d = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === text;
}

const WEEKDAYS = ["Sunday", "Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday"];
const MONTHS = [
  "January",
  "February",
  "March",
  "April",
  "May",
  "June",
  "July",
  "August",
  "September",
  "October",
  "November",
  "December",
];

/**
 * A typed day in words, to check it at a glance: "Saturday 14 March 2026", with "today", "yesterday"
 * or "tomorrow" where it is one of those. Undefined for text that is not yet a day.
 */
export function dayInWords(text: string, today: string = localDay()): string | undefined {
  const t = text.trim();
  if (!isCalendarDay(t)) return undefined;
  // Built from names, not toLocaleDateString, whose commas differ between browsers and Node.
  const d = new Date(`${t}T00:00:00Z`);
  const words = `${WEEKDAYS[d.getUTCDay()]} ${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
  const near = { [today]: "today", [addDays(today, -1)]: "yesterday", [addDays(today, 1)]: "tomorrow" }[t];
  return near ? `${words}, ${near}` : words;
}
