import { describe, expect, it } from "vitest";
import { emptyForm, readCatalogForm } from "./catalog-form";

describe("readCatalogForm", () => {
  it("when a ridge vent is entered in dollars, then it becomes exact cents with NFA per foot", () => {
    const result = readCatalogForm({ ...emptyForm(), sku: "RV-1", name: "Ridge vent", nfa: "18", soldInLengthFt: "4", materialCost: "3.75", sellPrice: "11.5" });
    expect(result.errors).toBeNull();
    expect(result.input).toMatchObject({ nfaSqInPerFt: 18, nfaSqInPerUnit: null, cfm: null, soldInLengthFt: 4, materialCostCents: 375, sellPriceCents: 1150 });
  });

  it("when a fan has no cfm and a price with three decimals, then each field says what is wrong", () => {
    const result = readCatalogForm({ ...emptyForm(), sku: "FAN", name: "Fan", kind: "powered-gable", unit: "each", materialCost: "1.234", sellPrice: "9" });
    expect(result.input).toBeNull();
    expect(result.errors).toMatchObject({ cfm: expect.any(String), materialCost: expect.stringContaining("two decimals") });
  });

  it("when a work item is entered, then no rating is sent", () => {
    const result = readCatalogForm({ ...emptyForm(), sku: "PATCH", name: "Patch", kind: "patch-vent-opening", unit: "each", nfa: "50", materialCost: "14", sellPrice: "95" });
    expect(result.input).toMatchObject({ nfaSqInPerUnit: null, nfaSqInPerFt: null, cfm: null });
  });
});
