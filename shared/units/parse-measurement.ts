/**
 * Measurement entry, read at once (plain entries and expressions alike). The server and the tests use
 * this; the client reads plain entries with `read-measurement.ts` and loads the expression half only
 * when an entry needs it (DEVELOPERS.md, Decision "Measurements are read without mathjs").
 */
import { evaluateExpression } from "./measurement-expression";
import { readMeasurement, type ParseAreaResult, type ParseLengthResult, type ParseMeasurementResult, type ParseOptions } from "./read-measurement";

export {
  MAX_AREA_SQFT,
  MAX_LENGTH_FT,
  MAX_MEASUREMENT_CHARS,
  type ParseAreaResult,
  type ParseLengthResult,
  type ParseMeasurementResult,
  type ParseOptions,
} from "./read-measurement";

/**
 * Reads a length or an area, whichever the text is. A plain number is feet.
 *
 * @example
 * parseMeasurement(`24' 6"`) // { ok: true, kind: "length", valueFt: 24.5, understood: "24 ft 6 in = 24.5 ft" }
 * parseMeasurement("30 x 40 + 12 x 20") // { ok: true, kind: "area", valueSqFt: 1440, ... }
 */
export function parseMeasurement(text: string, options: ParseOptions = {}): ParseMeasurementResult {
  return readMeasurement(text, "either", options, evaluateExpression);
}

/**
 * Reads a length in feet; a plain number is feet. A dash joins feet and inches as on drawings.
 * Never throws.
 *
 * @example
 * parseLengthFt(`17'-9"`) // { ok: true, kind: "length", valueFt: 17.75, understood: "17 ft 9 in = 17.75 ft" }
 * parseLengthFt("7.5 m") // valueFt ≈ 24.606 (7.5 ÷ 0.3048)
 */
export function parseLengthFt(text: string, options: ParseOptions = {}): ParseLengthResult {
  return readMeasurement(text, "length", options, evaluateExpression) as ParseLengthResult;
}

/**
 * Reads an area in square feet; a plain number is square feet and `a x b` is two sides in feet.
 *
 * @example
 * parseAreaSqFt(`26'6" x 40'`) // { ok: true, kind: "area", valueSqFt: 1060, understood: "26 ft 6 in × 40 ft = 1,060 sq ft" }
 * parseAreaSqFt("30 x 40 + 12 x 20") // { ok: true, kind: "area", valueSqFt: 1440, understood: "30 ft × 40 ft + 12 ft × 20 ft = 1,440 sq ft" }
 * parseAreaSqFt("120 m2") // valueSqFt ≈ 1,291.67 (120 ÷ 0.09290304)
 */
export function parseAreaSqFt(text: string, options: ParseOptions = {}): ParseAreaResult {
  return readMeasurement(text, "area", options, evaluateExpression) as ParseAreaResult;
}
