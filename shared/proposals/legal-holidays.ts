/**
 * The legal public holidays of 5 U.S.C. 6103(a), on the dates the statute names (a holiday that
 * falls on a weekend is not moved: the observed Friday or Monday stays a business day, as the
 * Regulation Z commentary reads the same list for its three-day rescission count).
 *
 * 16 CFR 429.0(c) (the cooling-off rule) names nine of them (from memory: New Year's Day,
 * Washington's Birthday, Memorial Day, Independence Day, Labor Day, Columbus Day, Veterans' Day,
 * Thanksgiving Day, Christmas Day). Skipping all eleven can only lengthen the buyer's window,
 * never shorten it, so it is the safe reading for a seller.
 *
 * @example
 * legalPublicHolidays(2027).slice(0, 3) // ["2027-01-01", "2027-01-18", "2027-02-15"]
 */
export function legalPublicHolidays(year: number): string[] {
  const dates = [
    isoDate(year, 1, 1), // New Year's Day
    nthWeekdayOf(year, 1, MONDAY, 3), // Birthday of Martin Luther King, Jr. (since 1986)
    nthWeekdayOf(year, 2, MONDAY, 3), // Washington's Birthday
    lastWeekdayOf(year, 5, MONDAY), // Memorial Day
    ...(year >= 2021 ? [isoDate(year, 6, 19)] : []), // Juneteenth National Independence Day
    isoDate(year, 7, 4), // Independence Day
    nthWeekdayOf(year, 9, MONDAY, 1), // Labor Day
    nthWeekdayOf(year, 10, MONDAY, 2), // Columbus Day
    isoDate(year, 11, 11), // Veterans Day
    nthWeekdayOf(year, 11, THURSDAY, 4), // Thanksgiving Day
    isoDate(year, 12, 25), // Christmas Day
  ];
  return year >= 1986 ? dates : dates.filter((d) => d !== nthWeekdayOf(year, 1, MONDAY, 3));
}

/** Whether an ISO date (YYYY-MM-DD) is one of the legal public holidays above. */
export function isLegalPublicHoliday(isoDay: string): boolean {
  return legalPublicHolidays(Number(isoDay.slice(0, 4))).includes(isoDay);
}

const MONDAY = 1;
const THURSDAY = 4;

function isoDate(year: number, month: number, day: number): string {
  return new Date(Date.UTC(year, month - 1, day)).toISOString().slice(0, 10);
}

/** The nth (1-based) given weekday (0 = Sunday) of a month. */
function nthWeekdayOf(year: number, month: number, weekday: number, n: number): string {
  const firstWeekday = new Date(Date.UTC(year, month - 1, 1)).getUTCDay();
  return isoDate(year, month, 1 + ((weekday - firstWeekday + 7) % 7) + (n - 1) * 7);
}

function lastWeekdayOf(year: number, month: number, weekday: number): string {
  const last = new Date(Date.UTC(year, month, 0));
  return isoDate(year, month, last.getUTCDate() - ((last.getUTCDay() - weekday + 7) % 7));
}
