/**
 * Integer rounding for money. Every amount in pricing is a whole number of cents held in a plain
 * JavaScript number, kept below Number.MAX_SAFE_INTEGER so every step is exact integer arithmetic
 * (common practice for money: integer minor units, as Dinero.js does; never binary floats).
 *
 * Rounding rule used throughout: **round half up** (half a cent or more goes up), applied once,
 * at the step that produces cents. All amounts here are non-negative, so "half up" and "half away
 * from zero" agree.
 */

/** Thousandths in one unit of quantity: quantities are priced to 0.001 ft, 0.001 h or 0.001 each. */
export const THOUSANDTHS_PER_UNIT = 1_000;

/** Basis points in a whole: 10,000 bp = 100 %, so 825 bp = 8.25 %. */
export const BASIS_POINTS_PER_WHOLE = 10_000;

function assertSafeNonNegativeInteger(value: number, what: string): void {
  if (!Number.isSafeInteger(value) || value < 0) {
    throw new RangeError(`${what} must be a whole, non-negative number below 2^53; got ${value}.`);
  }
}

/**
 * numerator ÷ denominator rounded half up, for non-negative safe integers, computed exactly
 * (the remainder decides; no floating-point division result is trusted).
 *
 * @example
 * divideRoundHalfUp(24_750, 1_000) // 25  (24.75 → 25)
 * divideRoundHalfUp(24_500, 1_000) // 25  (24.5, half, goes up)
 * divideRoundHalfUp(24_499, 1_000) // 24
 */
export function divideRoundHalfUp(numerator: number, denominator: number): number {
  assertSafeNonNegativeInteger(numerator, "The numerator");
  assertSafeNonNegativeInteger(denominator, "The denominator");
  if (denominator === 0) throw new RangeError("Can't divide by zero.");
  let quotient = Math.floor(numerator / denominator);
  let remainder = numerator - quotient * denominator;
  // Correct the float quotient by one either way if it landed on the wrong side.
  if (remainder < 0) {
    quotient -= 1;
    remainder += denominator;
  } else if (remainder >= denominator) {
    quotient += 1;
    remainder -= denominator;
  }
  return remainder * 2 >= denominator ? quotient + 1 : quotient;
}

/**
 * numerator ÷ denominator rounded down, exactly, for non-negative safe integers. Used where a
 * limit must never be exceeded (a deposit cap set by law).
 *
 * @example
 * divideRoundDown(24_999, 1_000) // 24
 */
export function divideRoundDown(numerator: number, denominator: number): number {
  assertSafeNonNegativeInteger(numerator, "The numerator");
  assertSafeNonNegativeInteger(denominator, "The denominator");
  if (denominator === 0) throw new RangeError("Can't divide by zero.");
  let quotient = Math.floor(numerator / denominator);
  const remainder = numerator - quotient * denominator;
  if (remainder < 0) quotient -= 1;
  else if (remainder >= denominator) quotient += 1;
  return quotient;
}

/**
 * a × b ÷ denominator rounded half up, exactly, for non-negative safe integers. When a × b passes
 * 2^53 the product is taken in BigInt, so a share of a large amount (a discount × materials ÷
 * subtotal) is still exact; the result itself must be a safe integer.
 *
 * @example
 * mulDivRoundHalfUp(4_608, 24_700, 46_075) // 2470  (2,470.27…)
 */
export function mulDivRoundHalfUp(a: number, b: number, denominator: number): number {
  assertSafeNonNegativeInteger(a, "The amount");
  assertSafeNonNegativeInteger(b, "The multiplier");
  const product = a * b;
  if (Number.isSafeInteger(product)) return divideRoundHalfUp(product, denominator);
  assertSafeNonNegativeInteger(denominator, "The denominator");
  if (denominator === 0) throw new RangeError("Can't divide by zero.");
  const d = BigInt(denominator);
  const result = Number((BigInt(a) * BigInt(b) * 2n + d) / (2n * d));
  assertSafeNonNegativeInteger(result, "The result");
  return result;
}

/**
 * a × b ÷ denominator rounded down, exactly (BigInt when a × b passes 2^53).
 *
 * @example
 * mulDivRoundDown(432_115, 1_000, 10_000) // 43211  (43,211.5 → 43,211)
 */
export function mulDivRoundDown(a: number, b: number, denominator: number): number {
  assertSafeNonNegativeInteger(a, "The amount");
  assertSafeNonNegativeInteger(b, "The multiplier");
  const product = a * b;
  if (Number.isSafeInteger(product)) return divideRoundDown(product, denominator);
  assertSafeNonNegativeInteger(denominator, "The denominator");
  if (denominator === 0) throw new RangeError("Can't divide by zero.");
  return Number((BigInt(a) * BigInt(b)) / BigInt(denominator));
}

/**
 * A quantity (feet, hours or a count) as whole thousandths, rounded half up. Binary floats can't
 * hold most decimals exactly (1.0005 is stored as 1.000499999…), so the product is first cut to
 * 12 significant digits, which drops that noise and keeps every digit a person could type.
 *
 * @example
 * quantityToThousandths(38) // 38000
 * quantityToThousandths(2.25) // 2250
 * quantityToThousandths(1.0005) // 1001  (half a thousandth goes up)
 * quantityToThousandths(1.0004) // 1000
 */
export function quantityToThousandths(quantity: number): number {
  if (!Number.isFinite(quantity) || quantity < 0) {
    throw new RangeError(`A quantity must be a finite number of at least 0; got ${quantity}.`);
  }
  const scaled = Number((quantity * THOUSANDTHS_PER_UNIT).toPrecision(12));
  const thousandths = Math.floor(scaled + 0.5);
  assertSafeNonNegativeInteger(thousandths, "The quantity in thousandths");
  return thousandths;
}

/**
 * The share `basisPoints` of an amount of cents, rounded half up to the cent.
 *
 * @example
 * percentOfCents(123_45, 825) // 1018  (12,345 × 8.25 % = 1,018.4625 cents → 1,018)
 */
export function percentOfCents(amountCents: number, basisPoints: number): number {
  assertSafeNonNegativeInteger(amountCents, "The amount in cents");
  assertSafeNonNegativeInteger(basisPoints, "The rate in basis points");
  return mulDivRoundHalfUp(amountCents, basisPoints, BASIS_POINTS_PER_WHOLE);
}

/** Throws unless `cents` is a whole, non-negative, safe number of cents. */
export function assertCents(cents: number, what = "An amount"): void {
  assertSafeNonNegativeInteger(cents, `${what} in cents`);
}
