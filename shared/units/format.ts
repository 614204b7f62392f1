/**
 * Display helpers. The core works in feet, square feet, square inches and cfm; metric is for
 * display only (DESIGN.md §4). Every factor below is exact by definition
 * (1 in = 25.4 mm, 1 ft = 0.3048 m) — NIST SP 811 App. B [SOURCES.md §7, S22].
 */

/** Metres in one foot, exact (NIST SP 811 App. B). */
export const M_PER_FT = 0.3048;
/** Square metres in one square foot, exact (0.3048²). */
export const SQ_M_PER_SQ_FT = 0.09290304;
/** Square centimetres in one square inch, exact (2.54²). */
export const SQ_CM_PER_SQ_IN = 6.4516;
/** Square inches in one square foot, exact (12²). */
export const SQ_IN_PER_SQ_FT = 144;
/** Cubic metres in one cubic foot, exact (0.3048³). */
export const CU_M_PER_CU_FT = 0.028316846592;
/** Litres per second in one cubic foot per minute: 0.028316846592 m³ × 1000 L/m³ ÷ 60 s, exact. */
export const LPS_PER_CFM = (CU_M_PER_CU_FT * 1000) / 60;

export type UnitSystem = "imperial" | "metric";

export interface FormatNumberOptions {
  /** Most digits after the point; trailing zeros are dropped. Default 2. */
  maxFractionDigits?: number;
  /** Fewest digits after the point. Default 0. */
  minFractionDigits?: number;
}

/**
 * Formats a number for reasons and labels: en-US digits with thousands separators, at most
 * `maxFractionDigits` decimals, no trailing zeros. Non-finite input prints as "—" so a bug never
 * shows "NaN" to a homeowner.
 *
 * Prints exactly what `Intl.NumberFormat("en-US", { maximumFractionDigits, minimumFractionDigits })`
 * prints (ICU rounds the shortest decimal that reads back as the same double, half away from zero),
 * except that a lone "-0" prints as "0"; a property test checks it against Intl over many numbers.
 * Written by hand because an analysis formats about a thousand figures and Intl took ~0.4 µs each
 * (issue 17).
 *
 * @example
 * formatNumber(1440) // "1,440"
 * formatNumber(1185.12) // "1,185.12"
 * formatNumber(149.3333) // "149.33"
 */
export function formatNumber(value: number, options?: FormatNumberOptions): string {
  if (!Number.isFinite(value)) return "—";
  const max = options?.maxFractionDigits ?? 2;
  const min = Math.min(options?.minFractionDigits ?? 0, max);
  const isNegative = value < 0 || (value === 0 && 1 / value < 0);
  const magnitude = isNegative ? -value : value;
  if (Number.isInteger(magnitude) && magnitude < 1e21) {
    // The common case: a whole number, whose shortest decimal is its own digits.
    const whole = groupThousands(String(magnitude));
    const text = min > 0 ? `${whole}.${"0".repeat(min)}` : whole;
    return isNegative ? (text === "0" ? "0" : `-${text}`) : text;
  }
  const text = formatScaled(magnitude, max, min) ?? formatDecimal(magnitude, max, min);
  return isNegative ? (text === "0" ? "0" : `-${text}`) : text;
}

/** "1234567" → "1,234,567". */
function groupThousands(digits: string): string {
  const length = digits.length;
  if (length <= 3) return digits;
  let head = length % 3 || 3;
  let text = digits.slice(0, head);
  for (; head < length; head += 3) text += `,${digits.slice(head, head + 3)}`;
  return text;
}

const POWERS_OF_TEN = Array.from({ length: 21 }, (_, i) => 10 ** i);

/**
 * The quick way for most figures: scale by 10^max and round. It equals rounding the shortest decimal
 * whenever the scaled value is clearly away from a half (the shortest decimal is within half an ulp
 * of the double, far less than the margin kept here); near a half, or for large values, it declines
 * (undefined) and the digit-string way decides.
 */
function formatScaled(magnitude: number, max: number, min: number): string | undefined {
  const scaled = magnitude * POWERS_OF_TEN[max]!;
  if (!(scaled < 1e15)) return undefined;
  let rounded = Math.round(scaled);
  if (Math.abs(scaled - rounded) > 0.5 - 1e-6) return undefined;
  if (rounded === 0) return min > 0 ? `0.${"0".repeat(min)}` : "0";
  let fractionLength = max;
  while (fractionLength > min && rounded % 10 === 0) {
    rounded /= 10;
    fractionLength -= 1;
  }
  const digits = String(rounded);
  if (fractionLength === 0) return groupThousands(digits);
  if (digits.length <= fractionLength) return `0.${"0".repeat(fractionLength - digits.length)}${digits}`;
  return `${groupThousands(digits.slice(0, digits.length - fractionLength))}.${digits.slice(digits.length - fractionLength)}`;
}

/**
 * A positive finite number to at most `max` and at least `min` decimals, from its shortest
 * round-trip decimal (what `String` gives), rounded half away from zero as ICU does.
 */
function formatDecimal(magnitude: number, max: number, min: number): string {
  // Shortest decimal as a digit string and the position of the point: "123.45" → "12345", 3.
  const shortest = String(magnitude);
  const e = shortest.indexOf("e");
  const mantissa = e < 0 ? shortest : shortest.slice(0, e);
  const dot = mantissa.indexOf(".");
  let digits = dot < 0 ? mantissa : mantissa.slice(0, dot) + mantissa.slice(dot + 1);
  let point = (dot < 0 ? mantissa.length : dot) + (e < 0 ? 0 : Number(shortest.slice(e + 1)));
  let leadingZeros = 0;
  while (leadingZeros < digits.length - 1 && digits.charCodeAt(leadingZeros) === 48) leadingZeros += 1;
  digits = digits.slice(leadingZeros);
  point -= leadingZeros;

  // Keep the digits up to `max` decimals; round half away from zero on the first one dropped.
  const keep = point + max;
  if (keep < digits.length) {
    const roundsUp = keep >= 0 && digits.charCodeAt(keep) >= 53; // "5"
    digits = keep > 0 ? digits.slice(0, keep) : "";
    if (roundsUp) {
      let i = digits.length - 1;
      while (i >= 0 && digits[i] === "9") i -= 1;
      if (i < 0) {
        // All nines (or nothing kept): 9.996 → 10.00, 0.005 → 0.01.
        digits = `1${"0".repeat(digits.length)}`;
        point += 1;
        if (keep <= 0) point = 1 - max;
      } else {
        digits = digits.slice(0, i) + String.fromCharCode(digits.charCodeAt(i) + 1) + "0".repeat(digits.length - i - 1);
      }
    }
  }
  // Split into whole and fraction digits around the point.
  let whole: string;
  let fraction: string;
  if (point <= 0) {
    whole = "0";
    fraction = "0".repeat(-point) + digits;
  } else if (point >= digits.length) {
    whole = digits + "0".repeat(point - digits.length);
    fraction = "";
  } else {
    whole = digits.slice(0, point);
    fraction = digits.slice(point);
  }
  if (whole === "") whole = "0";
  fraction = fraction.slice(0, max);
  let end = fraction.length;
  while (end > min && fraction.charCodeAt(end - 1) === 48) end -= 1; // trailing "0"
  fraction = fraction.slice(0, end);
  if (fraction.length < min) fraction += "0".repeat(min - fraction.length);
  return fraction === "" ? groupThousands(whole) : `${groupThousands(whole)}.${fraction}`;
}

/** Rounds to `digits` decimals, half away from zero, without the 1.005 float surprise. */
export function roundTo(value: number, digits: number): number {
  const factor = 10 ** digits;
  return Math.sign(value) * Math.round(Math.abs(value) * factor * (1 + Number.EPSILON)) / factor;
}

/**
 * Rounds up to a whole number after discarding float noise below 1e-6, so that
 * 1,500 × 144 ÷ 150 stays 1,440 and never becomes 1,441. Required areas are always rounded up
 * [SOURCES.md §8 E3].
 *
 * @example
 * ceilWhole(1185.12) // 1186
 * ceilWhole(1440.0000000002) // 1440
 */
export function ceilWhole(value: number): number {
  return Math.ceil(roundTo(value, 6));
}

/** Rounds down to a whole number after discarding float noise below 1e-6. */
export function floorWhole(value: number): number {
  return Math.floor(roundTo(value, 6));
}

export const ftToM = (valueFt: number): number => valueFt * M_PER_FT;
export const mToFt = (valueM: number): number => valueM / M_PER_FT;
export const sqFtToSqM = (areaSqFt: number): number => areaSqFt * SQ_M_PER_SQ_FT;
export const sqMToSqFt = (areaSqM: number): number => areaSqM / SQ_M_PER_SQ_FT;
export const sqInToSqCm = (areaSqIn: number): number => areaSqIn * SQ_CM_PER_SQ_IN;
export const sqInToSqM = (areaSqIn: number): number => (areaSqIn * SQ_CM_PER_SQ_IN) / 10_000;
export const cfmToLps = (airflowCfm: number): number => airflowCfm * LPS_PER_CFM;
export const cuFtToCuM = (volumeCuFt: number): number => volumeCuFt * CU_M_PER_CU_FT;

/**
 * Feet and inches, inches rounded to the nearest 1/`denominator` in (default 1/8), carrying
 * 12 in into the next foot.
 *
 * @example
 * formatFeetInches(24.5) // "24 ft 6 in"
 * formatFeetInches(7.5 / 0.3048) // "24 ft 7 1/4 in"
 */
export function formatFeetInches(valueFt: number, denominator: 2 | 4 | 8 | 16 = 8): string {
  if (!Number.isFinite(valueFt)) return "—";
  const sign = valueFt < 0 ? "-" : "";
  const totalUnits = Math.round(Math.abs(valueFt) * 12 * denominator);
  const feet = Math.floor(totalUnits / (12 * denominator));
  const restUnits = totalUnits - feet * 12 * denominator;
  const wholeIn = Math.floor(restUnits / denominator);
  let numerator = restUnits - wholeIn * denominator;
  let den: number = denominator;
  while (numerator > 0 && numerator % 2 === 0) {
    numerator /= 2;
    den /= 2;
  }
  const fraction = numerator > 0 ? `${numerator}/${den}` : "";
  const inchText = [wholeIn > 0 ? String(wholeIn) : "", fraction].filter(Boolean).join(" ");
  if (feet === 0 && inchText === "") return "0 in";
  if (feet === 0) return `${sign}${inchText} in`;
  if (inchText === "") return `${sign}${formatNumber(feet)} ft`;
  return `${sign}${formatNumber(feet)} ft ${inchText} in`;
}

/**
 * A length in feet for display.
 *
 * @example
 * formatLength(24.5, "imperial") // "24.5 ft"
 * formatLength(24.5, "metric") // "7.47 m"
 */
export function formatLength(valueFt: number, system: UnitSystem = "imperial"): string {
  return system === "metric"
    ? `${formatNumber(ftToM(valueFt))} m`
    : `${formatNumber(valueFt)} ft`;
}

/**
 * A floor area for display.
 *
 * @example
 * formatAreaSqFt(1500, "imperial") // "1,500 sq ft"
 * formatAreaSqFt(1500, "metric") // "139.35 m²"
 */
export function formatAreaSqFt(areaSqFt: number, system: UnitSystem = "imperial"): string {
  return system === "metric"
    ? `${formatNumber(sqFtToSqM(areaSqFt))} m²`
    : `${formatNumber(areaSqFt)} sq ft`;
}

/**
 * A vent's net free area for display (square inches, or square centimetres in metric).
 *
 * @example
 * formatNfaSqIn(1440, "imperial") // "1,440 sq in"
 * formatNfaSqIn(149.33, "metric") // "963.42 cm²"
 */
export function formatNfaSqIn(nfaSqIn: number, system: UnitSystem = "imperial"): string {
  return system === "metric"
    ? `${formatNumber(sqInToSqCm(nfaSqIn))} cm²`
    : `${formatNumber(nfaSqIn)} sq in`;
}

/**
 * An airflow for display (cfm, or litres per second in metric).
 *
 * @example
 * formatAirflowCfm(1260, "metric") // "594.65 L/s"
 */
export function formatAirflowCfm(airflowCfm: number, system: UnitSystem = "imperial"): string {
  return system === "metric"
    ? `${formatNumber(cfmToLps(airflowCfm))} L/s`
    : `${formatNumber(airflowCfm)} cfm`;
}

/**
 * An attic volume for display.
 *
 * @example
 * formatVolumeCuFt(4500, "metric") // "127.43 m³"
 */
export function formatVolumeCuFt(volumeCuFt: number, system: UnitSystem = "imperial"): string {
  return system === "metric"
    ? `${formatNumber(cuFtToCuM(volumeCuFt))} m³`
    : `${formatNumber(volumeCuFt)} cu ft`;
}

/**
 * A ratio 0–1 as a percent with one decimal place at most.
 *
 * @example
 * formatPercent(0.4) // "40 %"
 */
export function formatPercent(share: number): string {
  return `${formatNumber(share * 100, { maxFractionDigits: 1 })} %`;
}
