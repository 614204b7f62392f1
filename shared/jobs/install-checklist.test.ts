import { describe, expect, it } from "vitest";
import type { MaterialLine, MaterialsList } from "../design/materials-list";
import { applyChangeOrders } from "../change-orders/crew-list";
import type { ChangeOrderItem } from "../change-orders/types";
import { ATTIC_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION, FAN_SAFETY_CAUTION, ROOF_SAFETY_CAUTION } from "../diagnostics/cautions";
import { checklistProblems, installChecklist, jobCautions } from "./index";

const material = (m: Partial<MaterialLine> & Pick<MaterialLine, "catalogItemId" | "kind" | "name">): MaterialLine =>
  ({ sku: "X", unit: "each", quantity: 1, buyCount: 1, buyUnit: "each", explanation: "", ...m });
const ridge = material({ catalogItemId: "r1", kind: "ridge", name: "Shingle-over ridge vent, 4 ft", unit: "linear-ft", quantity: 40 });
const baffle = material({ catalogItemId: "b1", kind: "baffle", name: "Rafter baffle", quantity: 24 });
const labour = material({ catalogItemId: "x1", kind: "other", name: "Drop cloths" });
const plan: MaterialsList = {
  items: [ridge, baffle, labour],
  work: [
    { spaceId: "s1", description: "Remove powered roof fan: have a licensed electrician disconnect and make safe the circuit, patch the opening.", caution: FAN_SAFETY_CAUTION },
    { spaceId: null, description: "Cut the soffit slot: 3 h.", caution: null },
  ],
};
const strip: ChangeOrderItem = { id: "s8", sku: "SS-8", name: "Continuous soffit strip, 8 ft", kind: "soffit-continuous", unit: "linear-ft", soldInLengthFt: 8 };

describe("installChecklist", () => {
  it("when the signed plan removes a fan and adds ridge vent and baffles, then each becomes a step and the ones that change airflow need an after-photo", () => {
    const items = installChecklist(plan, [], plan.items);
    expect(items.map((i) => [i.id, i.isAirflowChange])).toEqual([["w1", true], ["w2", false], ["m-r1", true], ["m-b1", true], ["m-x1", false]]);
    expect(items.find((i) => i.id === "m-r1")!.text).toMatch(/^Cut the ridge slot to the manufacturer's width/);
    // IRC R806.3: at least 1 in of space between insulation and sheathing at the vents (TRADE-REFERENCES).
    expect(items.find((i) => i.id === "m-b1")!.text).toMatch(/at least 1 in of air space.*R806\.3/);
    expect(items.find((i) => i.id === "w1")!.caution).toBe(FAN_SAFETY_CAUTION);
  });

  it("when a change order is signed later, then the earlier items keep their ids and the change adds its own step with the new quantity", () => {
    const change = { number: 1, lines: [{ id: "l1", action: "add" as const, description: "soffit strip on the garage side", quantity: 16, unit: "ft", unitPriceCents: 400, item: strip }] };
    const after = applyChangeOrders(plan, [change]);
    const items = installChecklist(plan, [change], after.items);
    expect(items.slice(0, 5).map((i) => i.id)).toEqual(["w1", "w2", "m-r1", "m-b1", "m-x1"]);
    expect(items.find((i) => i.id === "m-s8")).toMatchObject({ isAirflowChange: true, text: expect.stringContaining("(16 ft)") });
    expect(items.at(-1)).toMatchObject({ id: "co1-l1", isAirflowChange: true, text: "Change order 1: Add soffit strip on the garage side (16 ft)." });
  });
});

describe("checklistProblems", () => {
  it("when an airflow item is ticked without a photo and another is not ticked, then both are named; with a photo each, none", () => {
    const items = installChecklist(plan, [], plan.items);
    expect(checklistProblems(items, [{ itemId: "w1", photoCount: 0 }])).toEqual([
      { itemId: "w1", problem: "needs-photo" }, { itemId: "w2", problem: "not-ticked" }, { itemId: "m-r1", problem: "not-ticked" },
      { itemId: "m-b1", problem: "not-ticked" }, { itemId: "m-x1", problem: "not-ticked" },
    ]);
    const allTicked = items.map((i) => ({ itemId: i.id, photoCount: i.isAirflowChange ? 1 : 0 }));
    expect(checklistProblems(items, allTicked)).toEqual([]);
  });
});

describe("jobCautions", () => {
  it("when the work is on the roof and removes a fan, then attic heat, fall protection and prove-dead apply, but not the combustion caution", () => {
    expect(jobCautions(plan, { hasPoweredFanAfter: false })).toEqual([ATTIC_SAFETY_CAUTION, ROOF_SAFETY_CAUTION, FAN_SAFETY_CAUTION]);
  });
  it("when a powered fan stays after the work, then the combustion-appliance caution is shown", () => {
    const onlySoffits: MaterialsList = { items: [material({ catalogItemId: "s", kind: "soffit-individual", name: "Round soffit vent" })], work: [] };
    expect(jobCautions(onlySoffits, { hasPoweredFanAfter: true })).toEqual([ATTIC_SAFETY_CAUTION, FAN_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION]);
  });
});
