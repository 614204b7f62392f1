/**
 * Pricing in integer cents (DESIGN.md §4): line totals, option subtotal, discount, tax, total,
 * deposit and display. Import from here.
 */
export { divideRoundHalfUp, mulDivRoundHalfUp, mulDivRoundDown, divideRoundDown, quantityToThousandths, percentOfCents, assertCents, THOUSANDTHS_PER_UNIT, BASIS_POINTS_PER_WHOLE } from "./rounding";
export { lineTotalCents, exactLineThousandthCents } from "./line-total";
export { discountCents } from "./discount";
export { taxableCents, taxCents } from "./tax";
export type { TaxableInput } from "./tax";
export { depositCents, NO_DEPOSIT } from "./deposit";
export type { DepositPolicy, DepositRequest, DepositResult } from "./deposit";
export { formatCents, formatThousandthCents, formatBasisPoints } from "./format-money";
export { priceOption, explainLine, DEFAULT_PRICING_SETTINGS, PricingError } from "./price-option";
export type { OptionPrice, PriceLine, PriceCategory, PricingSettings, PricedOption } from "./price-option";
export { parseDollarsToCents, centsToDollarsText } from "./parse-dollars";
export type { ParsedCents } from "./parse-dollars";
