import { describe, expect, it } from "vitest";
import { depositCents, NO_DEPOSIT } from "./deposit";

const lesserOf1000Or10Percent = { capCents: 100_000, capBasisPoints: 1_000 };

describe("depositCents", () => {
  it("when 30 % of $12,500 is asked with a cap of the lesser of $1,000 or 10 %, then the deposit is $1,000 (TSDoc example)", () => {
    expect(depositCents(1_250_000, { request: { kind: "percent", basisPoints: 3_000 }, ...lesserOf1000Or10Percent })).toEqual({
      depositCents: 100_000,
      requestedCents: 375_000,
      limitedBy: "cap-amount",
    });
  });
  it("when 10 % of the total is less than $1,000, then the percent cap decides, rounded down", () => {
    // 10 % of $4,321.15 = 43,211.5 cents → 43,211 (down: never over a legal cap)
    expect(depositCents(432_115, { request: { kind: "percent", basisPoints: 5_000 }, ...lesserOf1000Or10Percent })).toEqual({
      depositCents: 43_211,
      requestedCents: 216_058,
      limitedBy: "cap-percent",
    });
  });
  it("when the request is under both caps, then it is taken as asked; a requested percent rounds half up", () => {
    // 1.5 % of $4,321.15 = 6,481.725 cents → 6,482
    expect(depositCents(432_115, { request: { kind: "percent", basisPoints: 150 }, ...lesserOf1000Or10Percent })).toEqual({
      depositCents: 6_482,
      requestedCents: 6_482,
      limitedBy: null,
    });
  });
  it("when a fixed amount is more than the total and there is no cap, then the deposit is the total", () => {
    expect(depositCents(20_000, { request: { kind: "amount", cents: 50_000 }, capCents: null, capBasisPoints: null })).toMatchObject({ depositCents: 20_000, limitedBy: "total" });
  });
  it("when no deposit is asked, then it is zero", () => {
    expect(depositCents(20_000, NO_DEPOSIT).depositCents).toBe(0);
  });
});
