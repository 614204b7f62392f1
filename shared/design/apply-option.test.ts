import { describe, expect, it } from "vitest";
import type { OptionSpace } from "../schemas/options";
import { SpaceSurveySchema, type SpaceSurvey } from "../schemas/survey";
import { applyOption, DesignError } from "./apply-option";
import { DEMO_IDS, demoCatalog } from "./demo-catalog.test-helpers";
import { fanAndRidge, SPACE_ID, smallRanch } from "./design-cases.test-helpers";

const catalog = demoCatalog();
const optionSpace = (fields: Partial<OptionSpace>): OptionSpace => ({ spaceId: SPACE_ID, ventActions: {}, added: [], siteFixes: {}, ...fields });

describe("applyOption", () => {
  it("when a ranch's box vents are removed and 36 ft of ridge vent added, then the box vents are gone and the ridge vent carries the catalog's 18 sq in per ft (the TSDoc example)", () => {
    const applied = applyOption(smallRanch(), optionSpace({ ventActions: { b1: "remove" }, added: [{ id: "a1", catalogItemId: DEMO_IDS.ridge, quantity: 36 }] }), catalog);
    expect(applied.vents.map((v) => v.id)).toEqual(["s1", "added-a1"]);
    expect(applied.vents[1]).toEqual({ id: "added-a1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18, label: "Shingle-over ridge vent, 4 ft" });
    expect(SpaceSurveySchema.safeParse(applied).success).toBe(true);
  });

  it("when an each item is added, then it becomes quantity × NFA per unit, low for a soffit kind and high otherwise", () => {
    const applied = applyOption(
      smallRanch(),
      optionSpace({ added: [{ id: "a", catalogItemId: DEMO_IDS.rectSoffit, quantity: 4 }, { id: "b", catalogItemId: DEMO_IDS.staticVent, quantity: 3, dropBelowRidgeFt: 1.5 }] }),
      catalog,
    );
    expect(applied.vents.find((v) => v.id === "added-a")).toMatchObject({ kind: "soffit-individual", location: "lower", quantity: 4, nfaSqInPerUnit: 56 });
    expect(applied.vents.find((v) => v.id === "added-b")).toMatchObject({ kind: "box", location: "upper", quantity: 3, nfaSqInPerUnit: 50, dropBelowRidgeFt: 1.5 });
  });

  it("when a fan is added, then it carries the catalog's cfm and no NFA", () => {
    const applied = applyOption(smallRanch(), optionSpace({ added: [{ id: "f", catalogItemId: DEMO_IDS.roofFan, quantity: 1 }] }), catalog);
    expect(applied.vents.at(-1)).toMatchObject({ kind: "powered-roof", quantity: 1, cfm: 1_200 });
    expect(applied.vents.at(-1)).not.toHaveProperty("nfaSqInPerUnit");
  });

  it("when a vent is replaced, then the new vent takes its place, section and drop below the ridge", () => {
    const space: SpaceSurvey = { ...smallRanch(), vents: [{ id: "fan", kind: "powered-roof", location: "upper", cfm: 900, sectionId: "main", dropBelowRidgeFt: 2 }] };
    const applied = applyOption(space, optionSpace({ ventActions: { fan: "replace" }, added: [{ id: "r", catalogItemId: DEMO_IDS.staticVent, quantity: 1, replacesVentId: "fan" }] }), catalog);
    expect(applied.vents).toEqual([{ id: "added-r", kind: "box", location: "upper", label: "Static roof vent", sectionId: "main", dropBelowRidgeFt: 2, quantity: 1, nfaSqInPerUnit: 50 }]);
  });

  it("when accessories are added, then no vent changes; the site fixes clear the soffits and seal gable fans", () => {
    const space = { ...fanAndRidge(), site: { soffitsBlocked: true, bafflesPresent: false } };
    const applied = applyOption(space, optionSpace({ added: [{ id: "b", catalogItemId: DEMO_IDS.baffle, quantity: 50 }], siteFixes: { clearsBlockedSoffits: true, sealsGableFan: true } }), catalog);
    expect(applied.vents.map((v) => v.id)).toEqual(space.vents.map((v) => v.id));
    expect(applied.site).toMatchObject({ soffitsBlocked: false, bafflesPresent: true, gableFanSealed: true });
    expect(applied.vents.find((v) => v.id === "fan1")?.sealedToOpening).toBe(true);
  });

  it("when the option changes nothing, then the survey's vents come back as they were", () => {
    const space = smallRanch();
    expect(applyOption(space, optionSpace({}), catalog)).toEqual(space);
  });

  it("when an each vent has a fractional quantity or an item is unknown, then it throws a DesignError", () => {
    expect(() => applyOption(smallRanch(), optionSpace({ added: [{ id: "x", catalogItemId: DEMO_IDS.staticVent, quantity: 2.5 }] }), catalog)).toThrow(DesignError);
    expect(() => applyOption(smallRanch(), optionSpace({ added: [{ id: "x", catalogItemId: "nope", quantity: 1 }] }), catalog)).toThrow(/No catalog item/);
  });
});
