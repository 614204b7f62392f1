import { describe, expect, it } from "vitest";
import { catalogLaborHours, withCatalogLabor } from "./catalog-labor";
import type { LaborLine } from "../schemas/options";

const catalog = [{ id: "strip", laborMinutesPerUnit: 5 }, { id: "rect", laborMinutesPerUnit: 15 }];
const line = (hoursBasis: LaborLine["hoursBasis"], hours: number): LaborLine => ({ id: "labor-1", description: "Installation labour", hours, rateCents: 7_500, hoursBasis });
const option = (quantity: number, laborLines: LaborLine[]) => ({ spaces: [{ added: [{ id: "a", catalogItemId: "strip", quantity }, { id: "b", catalogItemId: "rect", quantity: 3 }] }], laborLines });

describe("labour from the catalog", () => {
  it("when the strip goes from 48 to 80 ft, then the catalog's labour follows: 285 min → 4.75 h, then 445 min → 7.5 h (quarter hours, rounded up)", () => {
    expect(catalogLaborHours(option(48, []).spaces, catalog)).toBe(4.75);
    expect(withCatalogLabor(option(80, [line("catalog", 4.75)]), catalog).laborLines[0]!.hours).toBe(7.5);
  });

  it("when a person overrode the hours, then the quantities no longer move them", () => {
    expect(withCatalogLabor(option(80, [line("overridden", 8)]), catalog).laborLines[0]!.hours).toBe(8);
  });

  it("when a line was entered by hand, then it is left as entered", () => {
    const lines = [line(undefined, 3), { ...line("catalog", 1), id: "labor-2" }];
    expect(withCatalogLabor(option(48, lines), catalog).laborLines.map((l) => l.hours)).toEqual([3, 4.75]);
  });

  it("when nothing added carries minutes, then there is no catalog labour and the line keeps its hours", () => {
    expect(catalogLaborHours([{ added: [{ id: "o", catalogItemId: "other", quantity: 5 }] }], catalog)).toBeNull();
    expect(withCatalogLabor({ spaces: [], laborLines: [line("catalog", 2)] }, catalog).laborLines[0]!.hours).toBe(2);
  });
});
