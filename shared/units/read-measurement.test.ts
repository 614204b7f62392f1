import convert from "convert-units";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatFeetInches } from "./format";
import { evaluateExpression } from "./measurement-expression";
import { readMeasurement } from "./read-measurement";

describe("readMeasurement without the expression reader", () => {
  it.each([`17'-9"`, `24'-6"`, "5.2 m", "2400 mm", `26'6" x 40'`, `4'-3 1/2"`, `4′-3½″`, "30 x 40", "1200 sq ft", "24 ft 6 1/2 in", "2 x 1200 sq ft"])(
    "when given the plain entry %s, then it is read at once, as the full reader reads it",
    (text) => {
      const quick = readMeasurement(text, "either", {});
      expect(quick.ok).toBe(true);
      expect(quick).toEqual(readMeasurement(text, "either", {}, evaluateExpression));
    },
  );

  it.each(["12 x 30 + 8 x 10", `17' - 9"`, "2 x (30 x 40)", "30 x 40 - 6 x 8", "10 ft / 2", "(20 + 10) ft"])(
    "when given the expression %s, then it asks for the expression reader",
    (text) => {
      expect(readMeasurement(text, "either", {})).toMatchObject({ ok: false, needsExpressionReader: true });
      expect(readMeasurement(text, "either", {}, evaluateExpression).ok).toBe(true);
    },
  );

  it.each([["-5", /negative/], ["30 +", /ends with an operator/], ["((30", /parentheses/], ["abc", /don't understand/], ["24 ft 6 in 3", /unit/]])(
    "when given the mistyped %j, then it answers with the message without the expression reader",
    (text, message) => {
      const result = readMeasurement(text, "either", {});
      expect(result).not.toHaveProperty("needsExpressionReader");
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message).toMatch(message);
    },
  );

  it("when a stored length is shown as feet and inches (formatFeetInches), then reading it back needs no expression reader (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 16 * 12 * 500 }), (sixteenths) => {
        const valueFt = sixteenths / 16 / 12;
        const result = readMeasurement(formatFeetInches(valueFt, 16), "length", {});
        expect(result).toMatchObject({ ok: true });
        if (result.ok && result.kind === "length") expect(result.valueFt).toBeCloseTo(valueFt, 10);
      }),
    );
  });
});

describe("unit definitions", () => {
  it.each([
    ["1 yd", "yd"], ["1 ft", "ft"], ["1 in", "in"], ["1 m", "m"], ["1 cm", "cm"], ["1 mm", "mm"],
  ] as const)("when given %s, then it is the length convert-units gives (NIST SP 811 App. B: 1 ft = 0.3048 m)", (text, unit) => {
    const result = readMeasurement(text, "length", {});
    // convert-units bridges ft ↔ m with the rounded 3.28084, hence 1e-6 relative for metric units.
    const expectedFt = convert(1).from(unit).to("ft");
    expect(result.ok && result.kind === "length" && Math.abs(result.valueFt - expectedFt) / expectedFt).toBeLessThan(1e-6);
  });

  it.each([
    ["1 sq yd", "yd2"], ["1 sq ft", "ft2"], ["1 sq in", "in2"], ["1 m2", "m2"], ["1 cm2", "cm2"],
  ] as const)("when given %s, then it is the area convert-units gives", (text, unit) => {
    const result = readMeasurement(text, "area", {});
    const expectedSqFt = convert(1).from(unit as "ft2").to("ft2");
    expect(result.ok && result.kind === "area" && Math.abs(result.valueSqFt - expectedSqFt) / expectedSqFt).toBeLessThan(1e-5);
  });
});
