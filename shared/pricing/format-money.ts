/**
 * Money for display: en-US dollars from integer cents, built from the integer digits so no float
 * ever touches the amount (common practice: format minor units, don't divide by 100 in floats).
 */

const groupThousands = (digits: string): string => digits.replace(/\B(?=(\d{3})+(?!\d))/g, ",");

/**
 * @example
 * formatCents(123_456) // "$1,234.56"
 * formatCents(5) // "$0.05"
 * formatCents(-2_500) // "-$25.00"
 */
export function formatCents(cents: number): string {
  if (!Number.isSafeInteger(cents)) return "—";
  const sign = cents < 0 ? "-" : "";
  const abs = Math.abs(cents);
  const dollars = Math.floor(abs / 100);
  const rest = abs - dollars * 100;
  return `${sign}$${groupThousands(String(dollars))}.${String(rest).padStart(2, "0")}`;
}

/**
 * An exact amount in thousandths of a cent as dollars, with as many decimals as it needs
 * (2 to 5), for showing the unrounded product of a line.
 *
 * @example
 * formatThousandthCents(4_110_885) // "$41.10885"
 * formatThousandthCents(24_700_000) // "$247.00"
 */
export function formatThousandthCents(thousandthCents: number): string {
  if (!Number.isSafeInteger(thousandthCents) || thousandthCents < 0) return "—";
  const perDollar = 100_000;
  const dollars = Math.floor(thousandthCents / perDollar);
  const fraction = String(thousandthCents - dollars * perDollar).padStart(5, "0").replace(/0+$/, "").padEnd(2, "0");
  return `$${groupThousands(String(dollars))}.${fraction}`;
}

/**
 * A rate in basis points as a percent.
 *
 * @example
 * formatBasisPoints(825) // "8.25 %"
 * formatBasisPoints(1_000) // "10 %"
 */
export function formatBasisPoints(basisPoints: number): string {
  if (!Number.isSafeInteger(basisPoints)) return "—";
  const whole = Math.trunc(basisPoints / 100);
  const rest = Math.abs(basisPoints - whole * 100);
  const fraction = rest === 0 ? "" : `.${String(rest).padStart(2, "0").replace(/0$/, "")}`;
  return `${groupThousands(String(whole))}${fraction} %`;
}
