import { boughtQuantity } from "../design/bought-quantity";
import type { MaterialLine, MaterialsList, WorkLine } from "../design/materials-list";
import { formatNumber } from "../units/format";
import type { ChangeOrderLine } from "./types";

export interface SignedChange {
  number: number;
  lines: readonly ChangeOrderLine[];
}

const fmt = (n: number) => formatNumber(n, { maxFractionDigits: 3 });

/**
 * The crew's list after the signed change orders, in the order they were signed: catalog
 * materials added or taken out change the quantity to bring (rounded again to how each item is
 * sold; an item taken out entirely leaves the list), and every line is also written as work, so
 * the crew reads what changed and why. Unsigned change orders are never passed in.
 *
 * @example
 * // signed list: 40 ft of 8 ft soffit strip (5 pieces); change order 1 removes 8 ft
 * applyChangeOrders(list, [{ number: 1, lines: [{ action: "remove", quantity: 8, item: strip, … }] }]).items[0]
 * // { quantity: 32, buyCount: 4, buyUnit: "pieces of 8 ft", … }
 */
export function applyChangeOrders(base: MaterialsList, changes: readonly SignedChange[]): MaterialsList {
  const items: MaterialLine[] = base.items.map((i) => ({ ...i }));
  const work: WorkLine[] = [...base.work];
  for (const change of changes) {
    for (const line of change.lines) {
      const sign = line.action === "add" ? 1 : -1;
      work.push({
        spaceId: null,
        description: `Change order ${change.number}: ${line.action === "add" ? "add" : "leave out"} ${line.description} (${fmt(line.quantity)} ${line.unit}).`,
        caution: null,
      });
      const item = line.item;
      if (!item || item.kind === "labor" || item.unit === "hour") continue;
      const at = items.findIndex((i) => i.catalogItemId === item.id);
      const quantity = Math.max(0, (at >= 0 ? items[at]!.quantity : 0) + sign * line.quantity);
      if (quantity === 0) {
        if (at >= 0) items.splice(at, 1);
        continue;
      }
      const bought = boughtQuantity(item, quantity);
      const next: MaterialLine = {
        catalogItemId: item.id, sku: item.sku, name: item.name, kind: item.kind, unit: item.unit, quantity,
        buyCount: bought.count, buyUnit: bought.unitWords, explanation: `${item.name}: ${bought.explanation}`,
      };
      if (at >= 0) items[at] = next;
      else items.push(next);
    }
  }
  return { items, work };
}
