/**
 * The price of one design option, every line with its arithmetic in words. Pure: the catalog and
 * the company's pricing settings are passed in.
 *
 * Order of the arithmetic (each step's rounding is in its own file):
 * 1. each line: unit price × quantity, half up to the cent (line-total.ts);
 * 2. subtotal = the exact sum of the lines; materials and labour are kept apart for tax;
 * 3. discount on the subtotal, never more than it (discount.ts);
 * 4. tax on the discounted taxable amount, labour taxed or not by company setting (tax.ts);
 * 5. total = subtotal − discount + tax;
 * 6. deposit from the total with its caps (deposit.ts).
 *
 * A catalog line is labour when its item is of kind "labor" or sold by the hour; every other
 * catalog line is materials (a vent's sell price is its installed price per unit or foot).
 */
import type { CatalogItem, CatalogUnit } from "../schemas/catalog";
import type { DesignOptionInput } from "../schemas/options";
import { depositCents, NO_DEPOSIT, type DepositPolicy, type DepositResult } from "./deposit";
import { discountCents } from "./discount";
import { formatBasisPoints, formatCents, formatThousandthCents } from "./format-money";
import { exactLineThousandthCents, lineTotalCents } from "./line-total";
import { quantityToThousandths, THOUSANDTHS_PER_UNIT } from "./rounding";
import { taxableCents, taxCents } from "./tax";

export interface PricingSettings {
  /** Sales tax rate, basis points (825 = 8.25 %). A company setting; local tax law decides. */
  taxRateBasisPoints: number;
  /** Whether labour is taxed. A company setting; default true (materials and labour both taxed). */
  isLaborTaxed: boolean;
  deposit: DepositPolicy;
}

export const DEFAULT_PRICING_SETTINGS: PricingSettings = { taxRateBasisPoints: 0, isLaborTaxed: true, deposit: NO_DEPOSIT };

export type PriceCategory = "materials" | "labor";

export interface PriceLine {
  /** The added item's id or the labour line's id. */
  id: string;
  source: "catalog-item" | "labor-line";
  spaceId: string | null;
  catalogItemId: string | null;
  description: string;
  category: PriceCategory;
  unit: CatalogUnit;
  quantity: number;
  unitPriceCents: number;
  totalCents: number;
  /** e.g. "38 ft × $6.50 per ft = $247.00". */
  explanation: string;
}

export interface OptionPrice {
  lines: PriceLine[];
  materialsCents: number;
  laborCents: number;
  subtotalCents: number;
  discountCents: number;
  taxableCents: number;
  taxRateBasisPoints: number;
  isLaborTaxed: boolean;
  taxCents: number;
  totalCents: number;
  deposit: DepositResult;
  /** The steps from lines to total in words. */
  explanation: string[];
}

export class PricingError extends Error {
  constructor(
    message: string,
    readonly catalogItemId: string,
  ) {
    super(message);
    this.name = "PricingError";
  }
}

export type PricedOption = Pick<DesignOptionInput, "spaces" | "laborLines" | "discount">;

const PER_UNIT: Record<CatalogUnit, string> = { each: "each", "linear-ft": "per ft", hour: "per hour" };

function quantityWords(quantity: number, unit: CatalogUnit): string {
  const text = formatThousandths(quantityToThousandths(quantity));
  if (unit === "linear-ft") return `${text} ft`;
  if (unit === "hour") return `${text} h`;
  return text;
}

function formatThousandths(thousandths: number): string {
  const whole = Math.floor(thousandths / THOUSANDTHS_PER_UNIT);
  const rest = thousandths - whole * THOUSANDTHS_PER_UNIT;
  const wholeText = String(whole).replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  return rest === 0 ? wholeText : `${wholeText}.${String(rest).padStart(3, "0").replace(/0+$/, "")}`;
}

/** "38 ft × $6.50 per ft = $247.00", or "… = $41.10885, rounded half up to $41.11". */
export function explainLine(quantity: number, unit: CatalogUnit, unitPriceCents: number): { totalCents: number; explanation: string } {
  const totalCents = lineTotalCents(unitPriceCents, quantity);
  const exact = exactLineThousandthCents(unitPriceCents, quantity);
  const head = `${quantityWords(quantity, unit)} × ${formatCents(unitPriceCents)} ${PER_UNIT[unit]}`;
  const isRounded = exact !== totalCents * THOUSANDTHS_PER_UNIT;
  const explanation = isRounded
    ? `${head} = ${formatThousandthCents(exact)}, rounded half up to ${formatCents(totalCents)}`
    : `${head} = ${formatCents(totalCents)}`;
  return { totalCents, explanation };
}

const isLaborItem = (item: CatalogItem) => item.kind === "labor" || item.unit === "hour";

/**
 * @example
 * // 38 ft of ridge vent at $6.50/ft and 2.25 h of labour at $95.00/h, 10 % off, 8.25 % tax
 * priceOption({ spaces: [{ spaceId, ventActions: {}, siteFixes: {}, added: [{ id: "a1", catalogItemId: ridgeId, quantity: 38 }] }],
 *   laborLines: [{ id: "l1", description: "Install", hours: 2.25, rateCents: 9_500 }], discount: { kind: "percent", basisPoints: 1_000 } },
 *   catalog, { taxRateBasisPoints: 825, isLaborTaxed: true, deposit: NO_DEPOSIT })
 * // subtotal 24,700 + 21,375 = 46,075 cents; discount 4,608 (4,607.5 half up); taxable 41,467;
 * // tax 3,421 (3,421.0275); total 44,888 cents = "$448.88"
 */
export function priceOption(option: PricedOption, catalog: readonly CatalogItem[], settings: PricingSettings = DEFAULT_PRICING_SETTINGS): OptionPrice {
  const byId = new Map(catalog.map((item) => [item.id, item]));
  const lines: PriceLine[] = [];
  for (const space of option.spaces) {
    for (const added of space.added) {
      const item = byId.get(added.catalogItemId);
      if (!item) throw new PricingError(`No catalog item has the id "${added.catalogItemId}".`, added.catalogItemId);
      const { totalCents, explanation } = explainLine(added.quantity, item.unit, item.sellPriceCents);
      lines.push({
        id: added.id,
        source: "catalog-item",
        spaceId: space.spaceId,
        catalogItemId: item.id,
        description: item.name,
        category: isLaborItem(item) ? "labor" : "materials",
        unit: item.unit,
        quantity: added.quantity,
        unitPriceCents: item.sellPriceCents,
        totalCents,
        explanation: `${item.name}: ${explanation}`,
      });
    }
  }
  for (const labor of option.laborLines) {
    const { totalCents, explanation } = explainLine(labor.hours, "hour", labor.rateCents);
    lines.push({
      id: labor.id,
      source: "labor-line",
      spaceId: null,
      catalogItemId: null,
      description: labor.description,
      category: "labor",
      unit: "hour",
      quantity: labor.hours,
      unitPriceCents: labor.rateCents,
      totalCents,
      explanation: `${labor.description}: ${explanation}`,
    });
  }

  const sum = (items: PriceLine[]) => items.reduce((acc, line) => acc + line.totalCents, 0);
  const materialsCents = sum(lines.filter((l) => l.category === "materials"));
  const laborCents = sum(lines.filter((l) => l.category === "labor"));
  const subtotalCents = materialsCents + laborCents;
  const discount = discountCents(subtotalCents, option.discount);
  const taxable = taxableCents({ materialsCents, laborCents, discountCents: discount, isLaborTaxed: settings.isLaborTaxed });
  const tax = taxCents(taxable, settings.taxRateBasisPoints);
  const totalCents = subtotalCents - discount + tax;
  const deposit = depositCents(totalCents, settings.deposit);

  const explanation: string[] = [
    `Subtotal: materials ${formatCents(materialsCents)} + labour ${formatCents(laborCents)} = ${formatCents(subtotalCents)} (the sum of ${lines.length} line${lines.length === 1 ? "" : "s"}).`,
  ];
  if (option.discount.kind === "percent") {
    explanation.push(`Discount: ${formatBasisPoints(option.discount.basisPoints)} of ${formatCents(subtotalCents)} = ${formatCents(discount)} (rounded half up to the cent, never more than the subtotal).`);
  } else if (option.discount.kind === "amount") {
    explanation.push(`Discount: ${formatCents(discount)}${discount < option.discount.cents ? ` (${formatCents(option.discount.cents)} asked, limited to the subtotal)` : ""}.`);
  }
  explanation.push(
    settings.isLaborTaxed
      ? `Taxable: ${formatCents(subtotalCents)} − ${formatCents(discount)} = ${formatCents(taxable)} (materials and labour are taxed: company setting).`
      : `Taxable: materials only, less their share of the discount = ${formatCents(taxable)} (labour is not taxed: company setting).`,
  );
  explanation.push(`Tax: ${formatBasisPoints(settings.taxRateBasisPoints)} of ${formatCents(taxable)} = ${formatCents(tax)} (rounded half up to the cent).`);
  explanation.push(`Total: ${formatCents(subtotalCents)} − ${formatCents(discount)} + ${formatCents(tax)} = ${formatCents(totalCents)}.`);
  if (settings.deposit.request.kind !== "none") {
    const limitWords =
      deposit.limitedBy === "cap-amount"
        ? ` (${formatCents(deposit.requestedCents)} asked, limited by the ${formatCents(settings.deposit.capCents ?? 0)} cap)`
        : deposit.limitedBy === "cap-percent"
          ? ` (${formatCents(deposit.requestedCents)} asked, limited to ${formatBasisPoints(settings.deposit.capBasisPoints ?? 0)} of the total, rounded down)`
          : deposit.limitedBy === "total"
            ? " (limited to the total)"
            : "";
    explanation.push(`Deposit at signing: ${formatCents(deposit.depositCents)}${limitWords}. Deposit limits are set by local law.`);
  }

  return {
    lines,
    materialsCents,
    laborCents,
    subtotalCents,
    discountCents: discount,
    taxableCents: taxable,
    taxRateBasisPoints: settings.taxRateBasisPoints,
    isLaborTaxed: settings.isLaborTaxed,
    taxCents: tax,
    totalCents,
    deposit,
    explanation,
  };
}
