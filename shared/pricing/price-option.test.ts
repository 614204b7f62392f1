import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { CatalogItem, CatalogUnit } from "../schemas/catalog";
import type { AddedItem, OptionSpace } from "../schemas/options";
import { NO_DEPOSIT } from "./deposit";
import { PricingError, priceOption } from "./price-option";

const spaceId = "00000000-0000-4000-8000-00000000aaaa";
const catalogItem = (n: number, unit: CatalogUnit, sellPriceCents: number, kind: CatalogItem["kind"] = "ridge"): CatalogItem => ({
  id: `00000000-0000-4000-8000-${String(n).padStart(12, "0")}`,
  sku: `SKU-${n}`,
  name: `Item ${n}`,
  kind,
  unit,
  nfaSqInPerUnit: null,
  nfaSqInPerFt: null,
  cfm: null,
  soldInLengthFt: null,
  materialCostCents: 0,
  sellPriceCents,
  laborMinutesPerUnit: 0,
  isActive: true,
});
const ridgeVent = { ...catalogItem(1, "linear-ft", 650), name: "Shingle-over ridge vent, 4 ft" };
const space = (added: AddedItem[]): OptionSpace => ({ spaceId, ventActions: {}, siteFixes: {}, added });

describe("priceOption: the TSDoc example", () => {
  it("when 38 ft of ridge vent and 2.25 h of labour get 10 % off and 8.25 % tax, then the total is $448.88 with every step in words", () => {
    const price = priceOption(
      {
        spaces: [space([{ id: "a1", catalogItemId: ridgeVent.id, quantity: 38 }])],
        laborLines: [{ id: "l1", description: "Install", hours: 2.25, rateCents: 9_500 }],
        discount: { kind: "percent", basisPoints: 1_000 },
      },
      [ridgeVent],
      { taxRateBasisPoints: 825, isLaborTaxed: true, deposit: NO_DEPOSIT },
    );
    expect(price.lines.map((l) => l.totalCents)).toEqual([24_700, 21_375]);
    expect(price.lines[0]!.explanation).toBe("Shingle-over ridge vent, 4 ft: 38 ft × $6.50 per ft = $247.00");
    expect(price.lines[1]!.explanation).toBe("Install: 2.25 h × $95.00 per hour = $213.75");
    expect(price).toMatchObject({ materialsCents: 24_700, laborCents: 21_375, subtotalCents: 46_075, discountCents: 4_608, taxableCents: 41_467, taxCents: 3_421, totalCents: 44_888 });
    expect(price.explanation).toEqual([
      "Subtotal: materials $247.00 + labour $213.75 = $460.75 (the sum of 2 lines).",
      "Discount: 10 % of $460.75 = $46.08 (rounded half up to the cent, never more than the subtotal).",
      "Taxable: $460.75 − $46.08 = $414.67 (materials and labour are taxed: company setting).",
      "Tax: 8.25 % of $414.67 = $34.21 (rounded half up to the cent).",
      "Total: $460.75 − $46.08 + $34.21 = $448.88.",
    ]);
  });

  it("when labour is not taxed, then only the materials' share is taxed", () => {
    const price = priceOption(
      { spaces: [space([{ id: "a1", catalogItemId: ridgeVent.id, quantity: 38 }])], laborLines: [{ id: "l1", description: "Install", hours: 2.25, rateCents: 9_500 }], discount: { kind: "percent", basisPoints: 1_000 } },
      [ridgeVent],
      { taxRateBasisPoints: 825, isLaborTaxed: false, deposit: NO_DEPOSIT },
    );
    // materials' share of the 4,608 discount = 4,608 × 24,700 ÷ 46,075 = 2,470.27 → 2,470; taxable 22,230; tax 1,833.975 → 1,834
    expect(price).toMatchObject({ taxableCents: 22_230, taxCents: 1_834, totalCents: 46_075 - 4_608 + 1_834 });
  });

  it("when a line's product has a fraction of a cent, then its words show the exact amount and the half-up rounding", () => {
    const item = catalogItem(2, "linear-ft", 333);
    const price = priceOption({ spaces: [space([{ id: "a", catalogItemId: item.id, quantity: 12.345 }])], laborLines: [], discount: { kind: "none" } }, [item]);
    expect(price.lines[0]!.explanation).toBe("Item 2: 12.345 ft × $3.33 per ft = $41.10885, rounded half up to $41.11");
    expect(price.totalCents).toBe(4_111);
  });

  it("when the deposit is capped at the lesser of $1,000 or 10 %, then the words say which cap decided", () => {
    const item = catalogItem(3, "each", 1_250_000);
    const price = priceOption({ spaces: [space([{ id: "a", catalogItemId: item.id, quantity: 1 }])], laborLines: [], discount: { kind: "none" } }, [item], {
      taxRateBasisPoints: 0,
      isLaborTaxed: true,
      deposit: { request: { kind: "percent", basisPoints: 3_000 }, capCents: 100_000, capBasisPoints: 1_000 },
    });
    expect(price.deposit.depositCents).toBe(100_000);
    expect(price.explanation.at(-1)).toBe("Deposit at signing: $1,000.00 ($3,750.00 asked, limited by the $1,000.00 cap). Deposit limits are set by local law.");
  });

  it("when an item is of kind labor or sold by the hour, then it counts as labour", () => {
    const labour = catalogItem(4, "hour", 9_500, "labor");
    const price = priceOption({ spaces: [space([{ id: "a", catalogItemId: labour.id, quantity: 1.5 }])], laborLines: [], discount: { kind: "none" } }, [labour]);
    expect(price).toMatchObject({ materialsCents: 0, laborCents: 14_250 });
  });

  it("when an added item names no catalog item, then it throws a PricingError naming the id", () => {
    expect(() => priceOption({ spaces: [space([{ id: "a", catalogItemId: "missing", quantity: 1 }])], laborLines: [], discount: { kind: "none" } }, [])).toThrow(PricingError);
  });
});

describe("priceOption: cents arithmetic over 1,000 random lines (fast-check)", () => {
  const lineArb = fc.record({
    unit: fc.constantFrom<CatalogUnit>("each", "linear-ft", "hour"),
    priceCents: fc.integer({ min: 0, max: 5_000_000 }), // up to $50,000 a unit
    // Quantities typed to 3 decimals (feet, hours, counts).
    quantityThousandths: fc.integer({ min: 1, max: 10_000_000 }), // up to 10,000 (the schema maximum)
  });
  const optionArb = fc.record({
    lines: fc.array(lineArb, { minLength: 1_000, maxLength: 1_000 }),
    discount: fc.oneof(
      fc.constant({ kind: "none" as const }),
      fc.integer({ min: 0, max: 100_000_000 }).map((cents) => ({ kind: "amount" as const, cents })),
      fc.integer({ min: 0, max: 10_000 }).map((basisPoints) => ({ kind: "percent" as const, basisPoints })),
    ),
    taxRateBasisPoints: fc.integer({ min: 0, max: 1_500 }),
    isLaborTaxed: fc.boolean(),
  });

  it("when lines are priced, then each is an integer equal to the exact BigInt half-up amount, and the lines sum exactly to the subtotal", () => {
    fc.assert(
      fc.property(optionArb, ({ lines, discount, taxRateBasisPoints, isLaborTaxed }) => {
        const catalog = lines.map((l, i) => catalogItem(i + 1, l.unit, l.priceCents, l.unit === "hour" ? "labor" : "ridge"));
        // The schema allows 200 items per space: spread the 1,000 lines over 5 spaces.
        const spaces = Array.from({ length: 5 }, (_, s) =>
          space(lines.slice(s * 200, s * 200 + 200).map((l, j) => ({ id: `a${s * 200 + j}`, catalogItemId: catalog[s * 200 + j]!.id, quantity: l.quantityThousandths / 1000 }))),
        );
        const price = priceOption({ spaces, laborLines: [], discount }, catalog, { taxRateBasisPoints, isLaborTaxed, deposit: NO_DEPOSIT });

        let subtotal = 0n;
        let materials = 0n;
        price.lines.forEach((line, i) => {
          const l = lines[i]!;
          const expected = (BigInt(l.priceCents) * BigInt(l.quantityThousandths) * 2n + 1000n) / 2000n;
          expect(Number.isInteger(line.totalCents)).toBe(true);
          expect(BigInt(line.totalCents)).toBe(expected);
          subtotal += expected;
          if (l.unit !== "hour") materials += expected;
        });
        expect(BigInt(price.subtotalCents)).toBe(subtotal);
        expect(price.materialsCents + price.laborCents).toBe(price.subtotalCents);

        const expectedDiscount =
          discount.kind === "none" ? 0n : discount.kind === "amount" ? (BigInt(discount.cents) < subtotal ? BigInt(discount.cents) : subtotal) : (subtotal * BigInt(discount.basisPoints) * 2n + 10_000n) / 20_000n;
        expect(BigInt(price.discountCents)).toBe(expectedDiscount);
        const taxable = isLaborTaxed
          ? subtotal - expectedDiscount
          : subtotal === 0n
            ? 0n
            : materials - (expectedDiscount * materials * 2n + subtotal) / (2n * subtotal);
        expect(BigInt(price.taxableCents)).toBe(taxable);
        expect(BigInt(price.taxCents)).toBe((taxable * BigInt(taxRateBasisPoints) * 2n + 10_000n) / 20_000n);
        expect(price.totalCents).toBe(price.subtotalCents - price.discountCents + price.taxCents);
        for (const n of [price.subtotalCents, price.discountCents, price.taxableCents, price.taxCents, price.totalCents]) {
          expect(Number.isSafeInteger(n) && n >= 0).toBe(true);
        }
      }),
      { numRuns: 30 },
    );
  });

  it("when the same lines are summed as floats in dollars, then they can drift, while the cents sum does not", () => {
    // 0.10 + 0.20 in dollars is 0.30000000000000004; 10 + 20 cents is 30.
    const dime = catalogItem(1, "each", 10);
    const twenty = catalogItem(2, "each", 20);
    const price = priceOption({ spaces: [space([{ id: "a", catalogItemId: dime.id, quantity: 1 }, { id: "b", catalogItemId: twenty.id, quantity: 1 }])], laborLines: [], discount: { kind: "none" } }, [dime, twenty]);
    expect(0.1 + 0.2).not.toBe(0.3);
    expect(price.subtotalCents).toBe(30);
  });
});
