import convert from "convert-units";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseAreaSqFt, parseLengthFt, parseMeasurement } from "./parse-measurement";

function lengthOf(text: string): number {
  const result = parseLengthFt(text);
  if (!result.ok) throw new Error(`expected ${text} to parse: ${result.message}`);
  return result.valueFt;
}
function areaOf(text: string): number {
  const result = parseAreaSqFt(text);
  if (!result.ok) throw new Error(`expected ${text} to parse: ${result.message}`);
  return result.valueSqFt;
}

describe("parseLengthFt", () => {
  it.each([`24' 6"`, "24 ft 6 in", `24'6"`, "24 feet 6 inches", `24′ 6″`, "24' 6"])(
    "when given %s, then it reads 24.5 ft",
    (text) => {
      expect(lengthOf(text)).toBe(24 + 6 / 12);
    },
  );

  it("when feet and inches are given, then understood repeats them with the total", () => {
    const result = parseLengthFt(`24' 6"`);
    expect(result).toEqual({ ok: true, kind: "length", valueFt: 24.5, understood: "24 ft 6 in = 24.5 ft" });
  });

  it("when metres or centimetres are given, then they convert with 1 ft = 0.3048 m exactly (NIST SP 811 App. B)", () => {
    expect(lengthOf("7.5 m")).toBeCloseTo(7.5 / 0.3048, 12);
    expect(lengthOf("750 cm")).toBeCloseTo(7.5 / 0.3048, 12);
    expect(lengthOf("7500 mm")).toBeCloseTo(7.5 / 0.3048, 12);
    // Cross-check with convert-units (independent; its 3.28084 ft/m bridge is rounded, so 1e-6).
    expect(lengthOf("7.5 m")).toBeCloseTo(convert(7.5).from("m").to("ft"), 4);
    expect(parseLengthFt("7.5 m")).toMatchObject({ understood: "7.5 m = 24.61 ft" });
  });

  it("when inches or a plain number are given, then inches are twelfths and a plain number is feet", () => {
    expect(lengthOf("18 in")).toBe(1.5);
    expect(lengthOf("24")).toBe(24);
    expect(parseLengthFt("24")).toMatchObject({ understood: "24 ft (a plain number is read as feet)" });
    expect(lengthOf(`6 1/2"`)).toBeCloseTo(6.5 / 12, 12);
    expect(lengthOf(`24' 6 1/2"`)).toBeCloseTo(24 + 6.5 / 12, 12);
    expect(lengthOf(`1/2"`)).toBeCloseTo(0.5 / 12, 12);
    expect(lengthOf("1 m 20 cm")).toBeCloseTo(1.2 / 0.3048, 12);
  });

  it("when an area is given where a length is wanted, then it says so", () => {
    const result = parseLengthFt("30 x 40");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/area/);
  });
});

describe("parseAreaSqFt", () => {
  it("when rectangles are added, then the area is their sum (SOURCES.md §8 E4: 1,200 + 240 = 1,440 sq ft)", () => {
    expect(areaOf("30 x 40 + 12 x 20")).toBe(30 * 40 + 12 * 20);
    expect(parseAreaSqFt("30 x 40 + 12 x 20")).toMatchObject({
      understood: "30 ft × 40 ft + 12 ft × 20 ft = 1,440 sq ft (plain numbers are read as feet)",
    });
  });

  it.each(["30*40", "30 × 40", "30 X 40", "30 by 40", `30' x 40'`, "30 ft x 40 ft", "(20 + 10) x 40", "1200 sq ft", "1,200 sq ft", "1200 ft2", "1200 ft²", "1200"])(
    "when given %s, then it reads 1,200 sq ft",
    (text) => {
      expect(areaOf(text)).toBe(1200);
    },
  );

  it("when square metres are given, then they convert with 1 ft² = 0.09290304 m² exactly (NIST SP 811 App. B)", () => {
    expect(areaOf("120 m2")).toBeCloseTo(120 / 0.09290304, 9);
    expect(areaOf("120 sq m")).toBeCloseTo(120 / 0.09290304, 9);
    expect(areaOf("120 m²")).toBeCloseTo(120 / 0.09290304, 9);
    expect(areaOf("120 m2")).toBeCloseTo(convert(120).from("m2").to("ft2"), 2); // convert-units, rounded bridge
    expect(areaOf("9 m x 12 m")).toBeCloseTo(108 / 0.09290304, 9);
  });

  it("when a cut-out or a count is written, then subtraction and count multiples work", () => {
    expect(areaOf("30 x 40 - 6 x 8")).toBe(1200 - 48);
    expect(areaOf("2 x (30 x 40)")).toBe(2400);
  });
});

describe("rejected entries", () => {
  it.each([
    ["", /Enter a measurement/],
    ["   ", /Enter a measurement/],
    ["-5", /negative/],
    ["5 - 10", /negative/],
    ["0", /more than zero/],
    ["abc", /don't understand/],
    ["sqrt(16)", /don't understand/],
    ["a = 5", /don't understand/],
    ["[1, 2]", /don't understand/],
    ["1e9", /don't understand/],
    ["99999999999", /too large/],
    ["20000 ft", /longer than/],
    ["2000 x 2000", /more than/],
    ["7,5 m", /point for decimals/],
    ["2 x 30 x 40", /ambiguous/],
    ["10 ft / 0", /divide by zero/],
    ["((30", /parentheses/],
    ["30 +", /ends with an operator/],
    ["24 ft 6 in 3", /unit/],
    ["5 min", /don't understand/],
    ["x".repeat(300), /too long/],
  ])("when given %j, then it answers ok: false with a clear message", (text, message) => {
    const result = parseMeasurement(text);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(message);
  });

  it("when 0 is allowed, then a zero drop is accepted", () => {
    expect(parseLengthFt("0", { allowZero: true })).toMatchObject({ ok: true, valueFt: 0 });
  });

  it("when given any string at all, then it never throws and never returns NaN (property)", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 60 }), (text) => {
        const result = parseMeasurement(text);
        if (result.ok) {
          const value = result.kind === "length" ? result.valueFt : result.valueSqFt;
          expect(Number.isFinite(value)).toBe(true);
          expect(value).toBeGreaterThan(0);
        } else {
          expect(result.message.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 2000 },
    );
  });

  it("when given feet and inches built from random numbers, then the value is feet + inches ÷ 12 (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 999 }), fc.integer({ min: 0, max: 11 }), (feet, inches) => {
        fc.pre(feet + inches > 0);
        expect(lengthOf(`${feet}' ${inches}"`)).toBeCloseTo(feet + inches / 12, 10);
        expect(lengthOf(`${feet} ft ${inches} in`)).toBeCloseTo(feet + inches / 12, 10);
      }),
    );
  });
});
