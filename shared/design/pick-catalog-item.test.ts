import { describe, expect, it } from "vitest";
import { DEMO_IDS, demoCatalog } from "./demo-catalog.test-helpers";
import { pickVentItem, pickWorkItem } from "./pick-catalog-item";

describe("pickVentItem and pickWorkItem (the TSDoc examples)", () => {
  it("when the catalog has one ridge vent, then it is picked", () => {
    expect(pickVentItem(demoCatalog(), "ridge", "linear-ft")?.name).toBe("Shingle-over ridge vent, 4 ft");
  });
  it("when two soffit vents compete, then the lower price per sq in wins (16 × 8 in: $18 ÷ 56 beats round: $6 ÷ 9)", () => {
    expect(pickVentItem(demoCatalog(), "soffit-individual", "each")?.id).toBe(DEMO_IDS.rectSoffit);
  });
  it("when a cheaper item is inactive, then it is never picked", () => {
    expect(pickVentItem(demoCatalog(), "box", "each")?.id).toBe(DEMO_IDS.staticVent);
  });
  it("when a work item is wanted, then the cheapest active one of the kind is picked; none gives null", () => {
    expect(pickWorkItem(demoCatalog(), "patch-vent-opening")?.sku).toBe("PATCH");
    expect(pickWorkItem(demoCatalog(), "other")).toBeNull();
  });
});
