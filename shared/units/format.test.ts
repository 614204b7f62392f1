import convert from "convert-units";
import { describe, expect, it } from "vitest";
import {
  ceilWhole,
  cfmToLps,
  CU_M_PER_CU_FT,
  formatAirflowCfm,
  formatAreaSqFt,
  formatFeetInches,
  formatLength,
  formatNfaSqIn,
  formatNumber,
  formatPercent,
  formatVolumeCuFt,
  LPS_PER_CFM,
  M_PER_FT,
  sqFtToSqM,
  SQ_CM_PER_SQ_IN,
  SQ_M_PER_SQ_FT,
  sqInToSqM,
} from "./format";

describe("exact conversion factors", () => {
  // NIST SP 811 App. B: 1 in = 25.4 mm and 1 ft = 0.3048 m exactly; the rest follow by powers.
  it("when squared and cubed from 1 ft = 0.3048 m, then they equal the NIST exact values", () => {
    expect(M_PER_FT).toBe(0.3048);
    expect(SQ_M_PER_SQ_FT).toBeCloseTo(0.3048 ** 2, 15); // NIST SP 811 App. B: 9.290304 E-02
    expect(SQ_CM_PER_SQ_IN).toBeCloseTo(2.54 ** 2, 15); // NIST SP 811 App. B: 6.4516 E+00 cm² per in²
    expect(CU_M_PER_CU_FT).toBeCloseTo(0.3048 ** 3, 15); // NIST SP 811 App. B: 2.831685 E-02
  });

  it("when a cfm is turned into L/s, then it is 0.4719474432 (SOURCES.md §7, NIST SP 811 App. B)", () => {
    expect(LPS_PER_CFM).toBeCloseTo(0.4719474432, 12);
    expect(cfmToLps(1)).toBeCloseTo(0.47194745, 7);
  });

  it("when compared with convert-units, then the factors agree to its rounding (it bridges with 3.28084 ft/m)", () => {
    // convert-units 2.3.4 is an independent implementation; agreement within 1e-6 relative.
    expect(sqFtToSqM(1)).toBeCloseTo(convert(1).from("ft2").to("m2"), 6);
    expect(cfmToLps(1)).toBeCloseTo(convert(1).from("ft3/min").to("l/s"), 5);
  });
});

describe("formatNumber", () => {
  it("when given thousands and decimals, then it prints en-US digits without trailing zeros", () => {
    expect(formatNumber(1440)).toBe("1,440");
    expect(formatNumber(1185.12)).toBe("1,185.12");
    expect(formatNumber(149.3333)).toBe("149.33");
    expect(formatNumber(8.23, { maxFractionDigits: 3 })).toBe("8.23");
    expect(formatNumber(-0.0001)).toBe("0");
  });

  it("when given NaN or Infinity, then it prints a dash, never NaN", () => {
    expect(formatNumber(Number.NaN)).toBe("—");
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe("—");
  });
});

describe("ceilWhole", () => {
  it("when a required area has float noise, then rounding up ignores the noise (SOURCES.md §8 E3 rounding rule)", () => {
    expect(ceilWhole((1500 * 144) / 150)).toBe(1440);
    expect(ceilWhole(1440.0000000002)).toBe(1440);
    expect(ceilWhole(1185.12)).toBe(1186);
    expect(ceilWhole(0.1 + 0.2)).toBe(1);
  });
});

describe("display helpers", () => {
  it("when metric is chosen, then each quantity converts with the exact factor", () => {
    // SOURCES.md §8 E1: 1,500 sq ft = 139.35 m²; E5: 1,260 cfm = 594.65 L/s; E8: 4,500 cu ft.
    expect(formatAreaSqFt(1500, "metric")).toBe("139.35 m²");
    expect(formatAreaSqFt(1500)).toBe("1,500 sq ft");
    expect(formatAirflowCfm(1260, "metric")).toBe("594.65 L/s");
    expect(formatAirflowCfm(1449, "metric")).toBe("683.85 L/s");
    expect(formatNfaSqIn(1440)).toBe("1,440 sq in");
    expect(formatNfaSqIn(336 / 2.25, "metric")).toBe(`${formatNumber((336 / 2.25) * 6.4516)} cm²`);
    expect(formatLength(24.5, "metric")).toBe(`${formatNumber(24.5 * 0.3048)} m`);
    expect(formatVolumeCuFt(4500, "metric")).toBe(`${formatNumber(4500 * 0.028316846592)} m³`);
    expect(formatPercent(0.4)).toBe("40 %");
  });

  it("when E3's 1/150 NFA is shown in m², then it matches 114.689 m² ÷ 150 (SOURCES.md §8 E3)", () => {
    expect(sqInToSqM(1185.12)).toBeCloseTo(0.7646, 4);
    expect(sqFtToSqM(1234.5)).toBeCloseTo(114.689, 3);
    expect(sqInToSqM(1185.12)).toBeCloseTo(sqFtToSqM(1234.5) / 150, 10);
  });

  it("when feet are shown as feet and inches, then inches round to 1/8 and carry into the next foot", () => {
    expect(formatFeetInches(24.5)).toBe("24 ft 6 in");
    // 7.5 m = 295.2756 in = 24 ft 7.2756 in; 7.2756 × 8 = 58.2 → 58/8 = 7 1/4 in
    expect(formatFeetInches(7.5 / 0.3048)).toBe("24 ft 7 1/4 in");
    expect(formatFeetInches(11.999)).toBe("12 ft");
    expect(formatFeetInches(0.5 / 12)).toBe("1/2 in");
  });
});
