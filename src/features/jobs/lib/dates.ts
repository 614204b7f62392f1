const dayFormat = new Intl.DateTimeFormat(undefined, { weekday: "short", month: "short", day: "numeric", year: "numeric" });

/** "Tue, Dec 8, 2026" for a calendar date (YYYY-MM-DD), read at local noon so no time zone moves it a day. */
export function formatDay(isoDate: string): string {
  const d = new Date(`${isoDate}T12:00:00`);
  return Number.isNaN(d.getTime()) ? isoDate : dayFormat.format(d);
}
