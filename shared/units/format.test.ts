import convert from "convert-units";
import fc from "fast-check";
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

describe("formatNumber against Intl.NumberFormat (the platform's ICU, an independent implementation)", () => {
  // The formatter before issue 17 was Intl.NumberFormat("en-US") with these options; the fast one must
  // print the very same characters for every finite double and every digit setting the core uses.
  const intl = (value: number, max: number, min: number) => {
    const text = new Intl.NumberFormat("en-US", { maximumFractionDigits: max, minimumFractionDigits: min, useGrouping: true }).format(value);
    return text === "-0" ? "0" : text;
  };
  const digits = fc.integer({ min: 0, max: 20 }).chain((max) => fc.tuple(fc.constant(max), fc.integer({ min: 0, max: 20 })));
  const check = (value: number, [max, min]: [number, number]) => {
    expect(formatNumber(value, { maxFractionDigits: max, minFractionDigits: min }), `${value} max ${max} min ${min}`).toBe(intl(value, max, Math.min(min, max)));
  };

  it("when given any finite double, then it prints what Intl prints", () => {
    fc.assert(fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), digits, check), { numRuns: 20_000 });
  });

  it("when given figures like the core's (sizes, areas, halves, ties at the last digit), then it prints what Intl prints", () => {
    const tie = fc.tuple(fc.integer({ min: -10_000_000, max: 10_000_000 }), fc.integer({ min: 0, max: 6 })).map(([n, scale]) => (n + 0.5) / 10 ** scale);
    const everyday = fc.oneof(
      fc.integer({ min: -1e9, max: 1e9 }),
      fc.double({ min: -1e7, max: 1e7, noNaN: true }),
      fc.double({ min: -1e-3, max: 1e-3, noNaN: true }),
      tie,
      fc.integer({ min: -1e6, max: 1e6 }).map((n) => n / 100),
      fc.integer({ min: 0, max: 1e6 }).map((n) => (n * 144) / 300),
    );
    fc.assert(fc.property(everyday, digits, check), { numRuns: 20_000 });
  });

  it("when given the awkward cases (ties, carries, -0, tiny and huge), then it prints what Intl prints", () => {
    const cases = [0, -0, 0.5, 1.5, 2.5, -2.5, 1.005, 1.255, 8.345, 9.995, 999.9999, 999_999.995, 0.0005, -0.0001, -0.001, 1e-7, 1.5e-7, 5e-324, 1e21, Number("1.2345678901234567e25"), 1e300, -1e300, 2 ** 53 + 2, Number.MAX_VALUE, Number.MIN_VALUE, 0.1 + 0.2];
    for (const value of cases) for (let max = 0; max <= 20; max += 1) for (const min of [0, 1, 2, max]) check(value, [max, min]);
  });
});
