import { describe, expect, it } from "vitest";
import type { OptionSpace } from "../schemas/options";
import { DEMO_IDS, demoCatalog } from "./demo-catalog.test-helpers";
import { fanAndRidge, roofFanOnly, SPACE_ID, zone4Project } from "./design-cases.test-helpers";
import { generateOptions } from "./generate-options";
import { materialsList } from "./materials-list";

const catalog = demoCatalog();
const OTHER_SPACE_ID = "00000000-0000-4000-8000-00000000b772";
const space = (spaceId: string, fields: Partial<OptionSpace>): OptionSpace => ({ spaceId, ventActions: {}, added: [], siteFixes: {}, ...fields });

describe("materialsList", () => {
  it("when 38 ft of ridge vent sold in 4 ft pieces is designed, then the crew buys 10 pieces (the TSDoc example)", () => {
    const list = materialsList({ spaces: [space(SPACE_ID, { added: [{ id: "a1", catalogItemId: DEMO_IDS.ridge, quantity: 38 }] })], laborLines: [] }, catalog);
    expect(list.items).toEqual([
      {
        catalogItemId: DEMO_IDS.ridge,
        sku: "RV-4",
        name: "Shingle-over ridge vent, 4 ft",
        kind: "ridge",
        unit: "linear-ft",
        quantity: 38,
        buyCount: 10,
        buyUnit: "pieces of 4 ft",
        explanation: "Shingle-over ridge vent, 4 ft: 38 ft needed ÷ 4 ft pieces = 9.5 → 10 pieces (40 ft)",
      },
    ]);
  });

  it("when two spaces use the same strip, then the lengths are summed before rounding to pieces", () => {
    // 10 ft + 10 ft = 20 ft ÷ 8 ft = 2.5 → 3 pieces (rounded per space it would be 2 + 2 = 4)
    const list = materialsList(
      {
        spaces: [
          space(SPACE_ID, { added: [{ id: "a", catalogItemId: DEMO_IDS.soffitStrip, quantity: 10 }] }),
          space(OTHER_SPACE_ID, { added: [{ id: "b", catalogItemId: DEMO_IDS.soffitStrip, quantity: 10 }] }),
        ],
        laborLines: [],
      },
      catalog,
    );
    expect(list.items).toHaveLength(1);
    expect(list.items[0]).toMatchObject({ quantity: 20, buyCount: 3, buyUnit: "pieces of 8 ft" });
  });

  it("when an option removes a fan and a louver, then the work lines say what to remove, how to close it and the cautions", () => {
    const option = generateOptions({ project: zone4Project, spaceId: SPACE_ID, space: fanAndRidge(), catalog }).options[0]!.option;
    const list = materialsList(option, catalog, { [SPACE_ID]: fanAndRidge() });
    const work = list.work.map((w) => w.description);
    expect(work).toContain("Remove powered gable fan: have a licensed electrician disconnect and make safe the circuit, seal the opening from inside.");
    expect(work).toContain("Remove gable louver: seal the opening from inside.");
    expect(list.work.find((w) => w.description.includes("powered gable fan"))?.caution).toContain("confirm the circuit is dead with a voltage tester");
    expect(work.at(-1)).toBe("Installation labour: 1.5 h.");
    expect(list.items.map((i) => [i.sku, i.buyCount])).toEqual([["SEAL-G", 2], ["DISC", 1]]);
  });

  it("when a fan is replaced by a static vent, then the work line names the new vent; labour items are work, not materials", () => {
    const option = generateOptions({ project: zone4Project, spaceId: SPACE_ID, space: roofFanOnly(), catalog }).options.find((o) => o.type === "remove-fan-passive")!.option;
    const withLabourItem = { ...option, spaces: [{ ...option.spaces[0]!, added: [...option.spaces[0]!.added, { id: "h", catalogItemId: DEMO_IDS.labor, quantity: 2 }] }] };
    const list = materialsList(withLabourItem, catalog, { [SPACE_ID]: roofFanOnly() });
    expect(list.work.map((w) => w.description)).toContain("Replace powered roof fan with Static roof vent in the same opening (a licensed electrician disconnects the circuit first).");
    expect(list.work.map((w) => w.description)).toContain("Installation labour: 2 h.");
    expect(list.items.some((i) => i.kind === "labor")).toBe(false);
    // 1 static vent in the fan opening + 4 more = 5 bought: held to 40–50 % of the required area (IRC 2018 R806.2 condition 2 [S4])
    expect(list.items.find((i) => i.sku === "SRV")).toMatchObject({ quantity: 5, buyCount: 5, buyUnit: "each" });
  });

  it("when the survey is not given, then removals still appear by vent id", () => {
    const list = materialsList({ spaces: [space(SPACE_ID, { ventActions: { b1: "remove", s1: "keep" }, siteFixes: { clearsBlockedSoffits: true } })], laborLines: [] }, catalog);
    expect(list.work.map((w) => w.description)).toEqual([
      "Remove vent b1: patch the opening.",
      "Pull insulation back from the soffits and fit a baffle in every rafter bay, keeping at least 1 in of air space to the roof sheathing (IRC R806.3) and reaching above the insulation.",
    ]);
  });
});
