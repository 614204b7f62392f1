import { describe, expect, it } from "vitest";
import type { CatalogItem } from "@shared/schemas/catalog";
import { buildOption, draftFromOption, type OptionDraft } from "./draft";
import { parsePercentToBasisPoints } from "./numbers";

const ridge: CatalogItem = {
  id: "00000000-0000-4000-8000-000000000001", sku: "R", name: "Ridge vent", kind: "ridge", unit: "linear-ft",
  nfaSqInPerUnit: null, nfaSqInPerFt: 18, cfm: null, soldInLengthFt: 4, materialCostCents: 375, sellPriceCents: 1150, laborMinutesPerUnit: 6, isActive: true,
};
const spaceId = "00000000-0000-4000-8000-0000000000aa";
const space = { id: spaceId, name: "Main attic", position: 0, version: 1, roof: { form: "gable" as const, pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 }, sections: [], vents: [], site: {}, notes: null };

function draft(): OptionDraft {
  return draftFromOption(
    {
      name: "Ridge", notes: null, isKept: true,
      spaces: [{ spaceId, ventActions: { fan: "remove" }, siteFixes: {}, added: [{ id: "a1", catalogItemId: ridge.id, quantity: 36 }] }],
      laborLines: [{ id: "l1", description: "Install", hours: 2.5, rateCents: 7500 }],
      discount: { kind: "percent", basisPoints: 750 },
    },
    [space],
  );
}

describe("buildOption", () => {
  it("when a saved option round-trips through the draft, then it comes back the same", () => {
    const { option, problems } = buildOption(draft(), [ridge]);
    expect(problems).toEqual([]);
    expect(option.spaces[0]).toEqual({ spaceId, ventActions: { fan: "remove" }, siteFixes: {}, added: [{ id: "a1", catalogItemId: ridge.id, quantity: 36 }] });
    expect(option.laborLines[0]).toEqual({ id: "l1", description: "Install", hours: 2.5, rateCents: 7500 });
    expect(option.discount).toEqual({ kind: "percent", basisPoints: 750 });
  });

  it("when a quantity is mistyped, then that line is left out and named, and the rest stays", () => {
    const d = draft();
    d.spaces[0]!.added[0]!.quantity = "3x";
    d.labor[0]!.rate = "12.345";
    const { option, problems } = buildOption(d, [ridge]);
    expect(option.spaces[0]!.added).toEqual([]);
    expect(option.laborLines).toEqual([]);
    expect(problems.map((p) => p.key)).toEqual(["a1", "l1"]);
  });
});

describe("parsePercentToBasisPoints", () => {
  it("when a percent is typed, then basis points come from its digits", () => {
    expect(parsePercentToBasisPoints("12.25", "D")).toEqual({ ok: true, value: 1225 });
    expect(parsePercentToBasisPoints("10 %", "D")).toEqual({ ok: true, value: 1000 });
    expect(parsePercentToBasisPoints("101", "D").ok).toBe(false);
  });
});
