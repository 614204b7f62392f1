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
  it("when rectangles are added, then the area is their sum (TRADE-REFERENCES §8 E4: 1,200 + 240 = 1,440 sq ft)", () => {
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

/**
 * Drawing and tape notation. A dash between feet and inches joins them: `17'-9"` is 17 ft 9 in, and
 * a dash in a mixed number (`3-1/2"`) is 3½ — common practice on US architectural drawings and in
 * lumber and trim sizes (from memory; no standard's text checked here). The prime ′ and double prime ″
 * are the Unicode foot and inch marks (U+2032 PRIME, U+2033 DOUBLE PRIME; U+02B9/U+02BA are the
 * modifier-letter look-alikes), and ½ ¼ ¾ ⅛ ⅜ ⅝ ⅞ are the vulgar fractions of U+00BC–U+00BE and
 * U+2150–U+215E whose NFKC form is digits around U+2044 FRACTION SLASH (Unicode Character
 * Database, checked with Python's unicodedata).
 */
describe("drawing notation", () => {
  it.each([
    [`17'-9"`, 17 + 9 / 12],
    [`24'-6"`, 24 + 6 / 12],
    [`17' -9"`, 17 + 9 / 12],
    [`17ft-9in`, 17 + 9 / 12],
    [`17'-9`, 17 + 9 / 12],
    [`4'-3 1/2"`, 4 + 3.5 / 12],
    [`4'-3-1/2"`, 4 + 3.5 / 12],
    [`4'-0"`, 4],
    [`3-1/2"`, 3.5 / 12],
    [`17′-9″`, 17 + 9 / 12],
    [`17ʹ-9ʺ`, 17 + 9 / 12],
    [`4′-3½″`, 4 + 3.5 / 12],
    [`4'-3 ½"`, 4 + 3.5 / 12],
    [`¾"`, 0.75 / 12],
    [`2¼ in`, 2.25 / 12],
    [`10'-7⅛"`, 10 + 7.125 / 12],
    [`10'-7⅜"`, 10 + 7.375 / 12],
    [`10'-7⅝"`, 10 + 7.625 / 12],
    [`10'-7⅞"`, 10 + 7.875 / 12],
    [`6 1⁄2"`, 6.5 / 12],
  ])("when given %s, then the dash joins feet and inches (%d ft)", (text, valueFt) => {
    expect(lengthOf(text)).toBeCloseTo(valueFt, 12);
  });

  it("when feet and inches are joined by a dash, then understood shows them as one length", () => {
    expect(parseLengthFt(`17'-9"`)).toEqual({ ok: true, kind: "length", valueFt: 17.75, understood: "17 ft 9 in = 17.75 ft" });
  });

  it("when the minus has spaces on both sides, then it subtracts (17 ft − 9 in = 16.25 ft)", () => {
    expect(lengthOf(`17' - 9"`)).toBe(16.25);
    expect(lengthOf(`24 ft - 6 in`)).toBe(23.5);
    // Feet minus feet is never drawing notation: subtraction even without spaces.
    expect(lengthOf(`20'-5'`)).toBe(15);
  });

  it("when a length written in feet and inches is a side of a rectangle, then the area is the product (26.5 × 40 = 1,060 sq ft)", () => {
    expect(parseAreaSqFt(`26'6" x 40'`)).toEqual({
      ok: true,
      kind: "area",
      valueSqFt: 1060,
      understood: "26 ft 6 in × 40 ft = 1,060 sq ft",
    });
    expect(areaOf(`26'-6" x 40'`)).toBe(1060);
    expect(areaOf(`26' 6" × 40' 0"`)).toBe(1060);
    expect(areaOf(`40' x 26'6"`)).toBe(1060);
    expect(areaOf(`26'6" x 40' + 10' x 12'`)).toBe(1060 + 120);
    expect(areaOf(`2 x (26'-6" x 40')`)).toBe(2120);
  });

  it("when metres and millimetres are given, then 1 ft = 0.3048 m exactly (NIST SP 811 App. B)", () => {
    expect(lengthOf("5.2 m")).toBeCloseTo(5.2 / 0.3048, 12);
    expect(lengthOf("5200 mm")).toBeCloseTo(5.2 / 0.3048, 12);
    expect(lengthOf("5 m 200 mm")).toBeCloseTo(5.2 / 0.3048, 12);
    expect(areaOf("8.1 m x 12 m")).toBeCloseTo((8.1 * 12) / 0.09290304, 9);
    expect(areaOf("8100 mm x 12000 mm")).toBeCloseTo((8.1 * 12) / 0.09290304, 9);
  });

  it("when a dash is left hanging or joins the wrong units, then it answers with a message", () => {
    for (const text of [`17'-`, `17'-"`, `-17'`, `17'--9"`]) {
      const result = parseLengthFt(text);
      expect(result.ok, text).toBe(false);
    }
  });
});

describe("against convert-units (property)", () => {
  // convert-units 2.3.4 is exact within a system (in → ft is 1/12) and bridges ft ↔ m with the
  // rounded 3.28084, so imperial values must agree to 1e-9 and metric ones to 1e-5 relative.
  const feetArb = fc.integer({ min: 0, max: 400 });
  const inchArb = fc.integer({ min: 0, max: 11 });
  const eighthsArb = fc.integer({ min: 0, max: 7 });
  const fractionText = (eighths: number): string => {
    if (eighths === 0) return "";
    let numerator = eighths;
    let denominator = 8;
    while (numerator % 2 === 0) {
      numerator /= 2;
      denominator /= 2;
    }
    return `${numerator}/${denominator}`;
  };
  const GLYPH: Record<number, string> = { 1: "⅛", 2: "¼", 3: "⅜", 4: "½", 5: "⅝", 6: "¾", 7: "⅞" };

  it("when random feet, inches and eighths are written in drawing notation, then the value is what convert-units gives", () => {
    fc.assert(
      fc.property(feetArb, inchArb, eighthsArb, fc.constantFrom("dash", "space", "words", "unicode", "glyph"), (feet, inches, eighths, style) => {
        fc.pre(feet + inches + eighths > 0);
        const inchTotal = inches + eighths / 8;
        const fraction = fractionText(eighths);
        const inchPart = fraction ? `${inches} ${fraction}` : String(inches);
        const text =
          style === "dash" ? `${feet}'-${inchPart}"`
          : style === "space" ? `${feet}' ${inchPart}"`
          : style === "words" ? `${feet} ft ${inchPart} in`
          : style === "unicode" ? `${feet}′-${inchPart}″`
          : `${feet}'-${inches}${eighths ? GLYPH[eighths] : ""}"`;
        const expected = convert(feet).from("ft").to("in") + inchTotal;
        expect(lengthOf(text)).toBeCloseTo(convert(expected).from("in").to("ft"), 9);
      }),
      { numRuns: 500 },
    );
  });

  it("when random metric lengths are given in m, cm or mm, then the value is what convert-units gives", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 3_000_000 }), fc.constantFrom("m", "cm", "mm"), (micrometresTimesTen, unit) => {
        // A length between 0.1 mm and 300 m, written with up to 4 decimals in its unit.
        const metres = micrometresTimesTen / 10_000;
        const inUnit = convert(metres).from("m").to(unit);
        const text = `${Number(inUnit.toFixed(4))} ${unit}`;
        const expectedFt = convert(Number(inUnit.toFixed(4))).from(unit).to("ft");
        const valueFt = lengthOf(text);
        expect(Math.abs(valueFt - expectedFt) / expectedFt).toBeLessThan(1e-5);
      }),
      { numRuns: 500 },
    );
  });

  it("when two random sides are multiplied, then the area is what convert-units gives", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99 }), inchArb, fc.integer({ min: 1, max: 99 }), inchArb, (aFt, aIn, bFt, bIn) => {
        const a = convert(aFt).from("ft").to("in") + aIn;
        const b = convert(bFt).from("ft").to("in") + bIn;
        const expectedSqFt = convert(a * b).from("in2").to("ft2");
        expect(areaOf(`${aFt}'-${aIn}" x ${bFt}'${bIn}"`)).toBeCloseTo(expectedSqFt, 8);
      }),
      { numRuns: 300 },
    );
  });
});
