import { describe, expect, it } from "vitest";
import type { MaterialsList } from "../design/materials-list";
import { applyChangeOrders } from "./crew-list";
import type { ChangeOrderItem, ChangeOrderLine } from "./types";

const strip: ChangeOrderItem = { id: "00000000-0000-4000-8000-000000000001", sku: "SS-8", name: "Continuous soffit strip, 8 ft", kind: "soffit-continuous", unit: "linear-ft", soldInLengthFt: 8 };
const decking: ChangeOrderItem = { id: "00000000-0000-4000-8000-000000000002", sku: "OSB-716", name: "Roof decking 7/16 in, 4 × 8 sheet", kind: "other", unit: "each", soldInLengthFt: null };
const base: MaterialsList = {
  items: [{ catalogItemId: strip.id, sku: "SS-8", name: strip.name, kind: strip.kind, unit: "linear-ft", quantity: 40, buyCount: 5, buyUnit: "pieces of 8 ft", explanation: "" }],
  work: [{ spaceId: null, description: "Cut the soffit slot: 3 h.", caution: null }],
};
const line = (l: Partial<ChangeOrderLine>): ChangeOrderLine => ({ id: "l", action: "add", description: "x", quantity: 1, unit: "each", unitPriceCents: 100, item: null, ...l });

describe("applyChangeOrders", () => {
  it("when a signed change takes 8 ft of strip out, then the crew buys 4 pieces of 8 ft (32 ft ÷ 8 = 4), and the work says why", () => {
    const after = applyChangeOrders(base, [{ number: 1, lines: [line({ action: "remove", quantity: 8, unit: "ft", description: "soffit strip on the garage side", item: strip })] }]);
    expect(after.items).toEqual([expect.objectContaining({ catalogItemId: strip.id, quantity: 32, buyCount: 4, buyUnit: "pieces of 8 ft" })]);
    expect(after.work.at(-1)?.description).toBe("Change order 1: leave out soffit strip on the garage side (8 ft).");
    expect(base.items[0]!.quantity).toBe(40);
  });

  it("when changes add a new material and later remove all of another, then the list follows them in order", () => {
    const after = applyChangeOrders(base, [
      { number: 1, lines: [line({ quantity: 3, description: "decking sheets over the rot", item: decking })] },
      { number: 2, lines: [line({ action: "remove", quantity: 40, unit: "ft", item: strip })] },
    ]);
    expect(after.items).toEqual([expect.objectContaining({ catalogItemId: decking.id, quantity: 3, buyCount: 3, buyUnit: "each" })]);
    expect(after.work.map((w) => w.description)).toHaveLength(3);
  });

  it("when a line is labour or free text, then only the work list changes", () => {
    const after = applyChangeOrders(base, [{ number: 1, lines: [line({ quantity: 2, unit: "h", description: "tear off and replace rotted decking" })] }]);
    expect(after.items).toEqual(base.items);
    expect(after.work.at(-1)?.description).toBe("Change order 1: add tear off and replace rotted decking (2 h).");
  });
});
