import { describe, expect, it } from "vitest";
import { boughtQuantity, piecesToBuy } from "./bought-quantity";

describe("piecesToBuy and boughtQuantity", () => {
  it("when 38 ft of ridge vent is sold in 4 ft pieces, then 10 pieces (40 ft) are bought (the TSDoc example)", () => {
    expect(piecesToBuy(38, 4)).toBe(10);
    expect(boughtQuantity({ unit: "linear-ft", soldInLengthFt: 4 }, 38)).toEqual({
      count: 10,
      unitWords: "pieces of 4 ft",
      boughtLengthFt: 40,
      explanation: "38 ft needed ÷ 4 ft pieces = 9.5 → 10 pieces (40 ft)",
    });
  });
  it("when the length is a whole number of pieces, even with float noise, then no extra piece is bought", () => {
    expect(piecesToBuy(40, 4)).toBe(10);
    expect(piecesToBuy(0.1 * 3 * 80, 8)).toBe(3); // 24.000000000000004 ft
    expect(boughtQuantity({ unit: "linear-ft", soldInLengthFt: 8 }, 48).explanation).toBe("48 ft needed ÷ 8 ft pieces = 6 pieces (48 ft)");
  });
  it("when a linear item has no piece length, then whole feet are bought; each items in whole units", () => {
    expect(boughtQuantity({ unit: "linear-ft", soldInLengthFt: null }, 71.5)).toMatchObject({ count: 72, unitWords: "ft" });
    expect(boughtQuantity({ unit: "each", soldInLengthFt: null }, 9)).toMatchObject({ count: 9, unitWords: "each" });
    expect(boughtQuantity({ unit: "hour", soldInLengthFt: null }, 2.25)).toMatchObject({ count: 2.25, unitWords: "h" });
  });
});
