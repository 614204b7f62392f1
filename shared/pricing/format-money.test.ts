import { describe, expect, it } from "vitest";
import { formatBasisPoints, formatCents, formatThousandthCents } from "./format-money";

describe("formatCents (the TSDoc examples)", () => {
  it("when given cents, then it shows en-US dollars with two decimals and thousands separators", () => {
    expect(formatCents(123_456)).toBe("$1,234.56");
    expect(formatCents(5)).toBe("$0.05");
    expect(formatCents(-2_500)).toBe("-$25.00");
    expect(formatCents(0)).toBe("$0.00");
    expect(formatCents(1_000_000_00)).toBe("$1,000,000.00");
  });
  it("when given a non-integer, then it shows a dash rather than a wrong amount", () => {
    expect(formatCents(1.5)).toBe("—");
  });
  it("when it agrees with Intl's currency format on whole cents, then no float path was needed", () => {
    const intl = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" });
    for (const cents of [0, 1, 99, 100, 12_345, 9_999_999, 123_456_789]) expect(formatCents(cents)).toBe(intl.format(cents / 100));
  });
});

describe("formatThousandthCents and formatBasisPoints (the TSDoc examples)", () => {
  it("when an exact line amount has extra digits, then they are shown; whole cents keep two decimals", () => {
    expect(formatThousandthCents(4_110_885)).toBe("$41.10885");
    expect(formatThousandthCents(24_700_000)).toBe("$247.00");
    expect(formatThousandthCents(4_607_500)).toBe("$46.075");
  });
  it("when a rate is in basis points, then it shows as a percent", () => {
    expect(formatBasisPoints(825)).toBe("8.25 %");
    expect(formatBasisPoints(1_000)).toBe("10 %");
    expect(formatBasisPoints(750)).toBe("7.5 %");
    expect(formatBasisPoints(5)).toBe("0.05 %");
  });
});
