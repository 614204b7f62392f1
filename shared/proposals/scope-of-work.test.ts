import { describe, expect, it } from "vitest";
import { demoCatalog, DEMO_IDS } from "../design/demo-catalog.test-helpers";
import type { Vent } from "../ventilation/schema";
import { pluralNoun, productWords, scopeOfWork } from "./scope-of-work";

const catalog = demoCatalog();
const vents: Vent[] = [
  { id: "fan-1", kind: "powered-gable", location: "upper", cfm: 1200, mounting: "gable" },
  { id: "box-1", kind: "box", location: "upper", quantity: 4, nfaSqInPerUnit: 50 },
  { id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
];
const space = { id: "s1", name: "Main attic", vents };
const plan = (fields: Partial<Parameters<typeof scopeOfWork>[1][number]>) => ({ spaceId: "s1", ventActions: {}, added: [], siteFixes: {}, ...fields });

describe("scopeOfWork", () => {
  it("when the documented example is run, then it gives the sentences of its @example", () => {
    const lines = scopeOfWork([space], [plan({ ventActions: { "fan-1": "remove" }, added: [{ id: "a1", catalogItemId: DEMO_IDS.ridge, quantity: 38 }] })], catalog, []);
    expect(lines).toEqual([
      "Remove the gable-mounted fan and close the opening from inside the attic.",
      "Install 38 ft of shingle-over ridge vent along the ridge, opening the vent slot in the roof deck where there is none.",
    ]);
  });

  it("when soffit vents are added by count, then the sentence counts them with the size aside", () => {
    const lines = scopeOfWork([space], [plan({ added: [{ id: "a1", catalogItemId: DEMO_IDS.roundSoffit, quantity: 12 }] })], catalog, []);
    expect(lines).toEqual(["Add 12 round soffit vents (4 in) to the soffits, spaced evenly along the eaves."]);
  });

  it("when box vents are removed and a patch item closes the openings, fixes and labour lines are included, then each is a sentence and the patching is said once", () => {
    const lines = scopeOfWork(
      [space],
      [plan({ ventActions: { "box-1": "remove" }, siteFixes: { clearsBlockedSoffits: true }, added: [{ id: "p", catalogItemId: DEMO_IDS.patch, quantity: 4 }, { id: "l", catalogItemId: DEMO_IDS.labor, quantity: 3 }] })],
      catalog,
      [{ description: "Haul away the old vents " }],
    );
    expect(lines).toEqual([
      "Remove the 4 existing box (static) vents.",
      "Clear the insulation that blocks the soffit vents and fit a baffle in each rafter bay to keep it clear.",
      "Patch 4 old vent openings with roof decking and matching shingles.",
      "Haul away the old vents.",
    ]);
  });

  it("when a gable fan is removed and a seal item closes the opening, then closing it is said once", () => {
    const lines = scopeOfWork([space], [plan({ ventActions: { "fan-1": "remove" }, added: [{ id: "s", catalogItemId: DEMO_IDS.sealGable, quantity: 1 }] })], catalog, []);
    expect(lines).toEqual(["Remove the gable-mounted fan.", "Seal the gable opening from inside the attic."]);
  });

  it("when the catalog's installation labour is a line, then it is priced but not listed as work", () => {
    const lines = scopeOfWork([space], [plan({})], catalog, [{ description: "Installation labour", hoursBasis: "catalog" }, { description: "Haul away the old fan", hoursBasis: "entered" }]);
    expect(lines).toEqual(["Haul away the old fan."]);
  });

  it("when an option covers two spaces, then each sentence names its space", () => {
    const garage = { id: "s2", name: "Garage attic", vents: [] };
    const lines = scopeOfWork([space, garage], [plan({ ventActions: { "ridge-1": "remove" } }), { spaceId: "s2", ventActions: {}, siteFixes: {}, added: [{ id: "b", catalogItemId: DEMO_IDS.baffle, quantity: 1 }] }], catalog, []);
    expect(lines).toEqual([
      "Main attic: Remove the existing 36 ft of ridge vent and close the ridge slot.",
      "Garage attic: Fit 1 rafter-bay baffle (vent chute) in the rafter bays so insulation cannot block the air coming in at the eaves.",
    ]);
  });

  it("when product names carry sizes or pack lengths, then the words are split sensibly", () => {
    expect(productWords("Rectangular soffit vent 16 × 8 in")).toEqual({ noun: "rectangular soffit vent", size: "16 × 8 in" });
    expect(productWords("Shingle-over ridge vent, 4 ft")).toEqual({ noun: "shingle-over ridge vent", size: null });
    expect(productWords("Rafter-bay baffle (vent chute)")).toEqual({ noun: "rafter-bay baffle", size: "vent chute" });
    expect(pluralNoun("rafter-bay baffle", 3)).toBe("rafter-bay baffles");
    expect(pluralNoun("static roof vent", 2)).toBe("static roof vents");
  });
});
