import { describe, expect, it } from "vitest";
import { centsToDollarsText, parseDollarsToCents } from "./parse-dollars";

describe("parseDollarsToCents", () => {
  it("when dollars are typed, then cents come out exact", () => {
    expect(parseDollarsToCents("$1,234.5")).toEqual({ ok: true, cents: 123_450 });
    expect(parseDollarsToCents("0.07")).toEqual({ ok: true, cents: 7 });
    expect(parseDollarsToCents("19.99")).toEqual({ ok: true, cents: 1_999 });
    expect(parseDollarsToCents(".5")).toEqual({ ok: true, cents: 50 });
    expect(parseDollarsToCents("12")).toEqual({ ok: true, cents: 1_200 });
  });

  it("when every amount from 0.00 to 99.99 is typed, then no float drift creeps in", () => {
    for (let cents = 0; cents < 10_000; cents++) {
      expect(parseDollarsToCents(centsToDollarsText(cents))).toEqual({ ok: true, cents });
    }
  });

  it("when the text is not whole cents, then it says why", () => {
    expect(parseDollarsToCents("2.345").ok).toBe(false);
    expect(parseDollarsToCents("-3").ok).toBe(false);
    expect(parseDollarsToCents("abc").ok).toBe(false);
    expect(parseDollarsToCents("").ok).toBe(false);
    expect(parseDollarsToCents("123456789").ok).toBe(false);
  });
});

describe("centsToDollarsText", () => {
  it("when cents are shown in a field, then they read as dollars", () => {
    expect(centsToDollarsText(1_150)).toBe("11.50");
    expect(centsToDollarsText(5)).toBe("0.05");
    expect(centsToDollarsText(0)).toBe("0.00");
  });
});
