import { describe, expect, it } from "vitest";
import { basisPointsToPercentText, centsToDollarsText, parseDepositPercent, parseDollarsToCents, parsePercentToBasisPoints } from "./numbers";

describe("percent ↔ basis points", () => {
  it("when a rate is typed with two decimals, then it is stored exactly in basis points", () => {
    expect(parsePercentToBasisPoints("8.25", "Rate")).toEqual({ ok: true, value: 825 });
    expect(parsePercentToBasisPoints("7", "Rate")).toEqual({ ok: true, value: 700 });
    expect(parsePercentToBasisPoints("0.1 %", "Rate")).toEqual({ ok: true, value: 10 });
    expect(parsePercentToBasisPoints(".5", "Rate")).toEqual({ ok: true, value: 50 });
    // 0.29 * 100 is 28.999999999999996 in floating point; the digits give 29.
    expect(parsePercentToBasisPoints("0.29", "Rate")).toEqual({ ok: true, value: 29 });
  });
  it("when the text is not a percent, then it says why", () => {
    expect(parsePercentToBasisPoints("8.255", "Rate").ok).toBe(false);
    expect(parsePercentToBasisPoints("-1", "Rate").ok).toBe(false);
    expect(parsePercentToBasisPoints("eight", "Rate").ok).toBe(false);
    expect(parsePercentToBasisPoints("", "Rate").ok).toBe(false);
  });
  it("when basis points are shown, then the examples in the docs hold", () => {
    expect(basisPointsToPercentText(825)).toBe("8.25");
    expect(basisPointsToPercentText(700)).toBe("7");
    expect(basisPointsToPercentText(750)).toBe("7.5");
    expect(basisPointsToPercentText(5)).toBe("0.05");
  });
});

describe("dollars ↔ cents", () => {
  it("when dollars are typed, then cents are exact", () => {
    expect(parseDollarsToCents("1,000", "Cap")).toEqual({ ok: true, value: 100_000 });
    expect(parseDollarsToCents("$12.5", "Cap")).toEqual({ ok: true, value: 1250 });
    expect(parseDollarsToCents("0.29", "Cap")).toEqual({ ok: true, value: 29 });
    expect(parseDollarsToCents("1.234", "Cap").ok).toBe(false);
    expect(centsToDollarsText(100_000)).toBe("1000");
    expect(centsToDollarsText(1250)).toBe("12.50");
  });
  it("when a deposit percent is over 100, then it is refused", () => {
    expect(parseDepositPercent("10")).toEqual({ ok: true, value: 10 });
    expect(parseDepositPercent("12.5")).toEqual({ ok: true, value: 12.5 });
    expect(parseDepositPercent("101").ok).toBe(false);
  });
});
