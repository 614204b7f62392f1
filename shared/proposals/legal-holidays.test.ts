import { describe, expect, it } from "vitest";
import Holidays from "date-holidays";
import { isLegalPublicHoliday, legalPublicHolidays } from "./legal-holidays";
import { thirdBusinessDayAfter } from "./disclosures";

describe("legal public holidays (5 U.S.C. 6103(a))", () => {
  it("when computed for 1990–2060, then they are exactly the US public holidays the date-holidays package lists on their own dates", () => {
    // An independent computation from npm: its "public" US holidays, without the observed
    // (substitute) Fridays and Mondays, are the statute's eleven (ten before 2021).
    const reference = new Holidays("US");
    for (let year = 1990; year <= 2060; year++) {
      const expected = reference.getHolidays(year)
        .filter((h) => h.type === "public" && !h.substitute)
        .map((h) => h.date.slice(0, 10))
        .filter((d) => d.startsWith(String(year)))
        .sort();
      expect(legalPublicHolidays(year).sort(), String(year)).toEqual(expected);
    }
  });

  it("when the @example is run, then it gives the documented dates", () => {
    expect(legalPublicHolidays(2027).slice(0, 3)).toEqual(["2027-01-01", "2027-01-18", "2027-02-15"]);
    expect(legalPublicHolidays(2020)).not.toContain("2020-06-19"); // Juneteenth is a legal holiday from 2021
    expect(legalPublicHolidays(2021)).toContain("2021-06-19");
  });

  it("when a holiday falls on a weekend, then only the statutory date is a holiday, not the observed weekday", () => {
    // July 4, 2026 is a Saturday; federal offices observe Friday the 3rd.
    expect(isLegalPublicHoliday("2026-07-04")).toBe(true);
    expect(isLegalPublicHoliday("2026-07-03")).toBe(false);
  });
});

describe("the cooling-off deadline (16 CFR 429.1: midnight of the third business day)", () => {
  it("when no holiday intervenes, then Saturdays count and Sundays do not", () => {
    expect(thirdBusinessDayAfter("2026-12-04")).toBe("2026-12-08"); // Fri → Sat 5, Mon 7, Tue 8
    expect(thirdBusinessDayAfter("2026-12-01")).toBe("2026-12-04");
  });

  it("when a holiday falls in the three days, then it is skipped", () => {
    expect(thirdBusinessDayAfter("2026-11-24")).toBe("2026-11-28"); // Thanksgiving, Thu 26 Nov 2026
    expect(thirdBusinessDayAfter("2026-12-23")).toBe("2026-12-28"); // Thu 24, Christmas Fri 25 skipped, Sat 26, Sun skipped, Mon 28
    expect(thirdBusinessDayAfter("2027-01-15")).toBe("2027-01-20"); // Sat 16, Sun, MLK Mon 18 skipped, Tue 19, Wed 20
  });

  it("when a holiday is observed on a weekday, then that observed day still counts", () => {
    // 2026-07-03 (Fri) is the observed Independence Day; the statute's date, Sat 4 July, is skipped.
    expect(thirdBusinessDayAfter("2026-07-02")).toBe("2026-07-07"); // Fri 3, Sat 4 skipped, Sun skipped, Mon 6, Tue 7
  });
});
