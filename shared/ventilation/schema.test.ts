import { describe, expect, it } from "vitest";
import { AtticInputSchema } from "./schema";
import { attic } from "./test-helpers";

const messages = (input: unknown) => {
  const result = AtticInputSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => i.message);
};

describe("AtticInputSchema", () => {
  it("when a vent has no size, then the message lists the ways to give one", () => {
    expect(messages(attic({ vents: [{ id: "b", kind: "box", location: "upper" }] })).join(" ")).toMatch(/rated NFA.*per unit.*per foot.*gross/);
  });
  it("when a length-based vent lacks its NFA per foot, then that field is asked for", () => {
    expect(messages(attic({ vents: [{ id: "r", kind: "ridge", location: "upper", lengthFt: 40 }] })).join(" ")).toMatch(/NFA per foot/);
  });
  it("when a gable louver has a gross size but no covering, then the covering is asked for", () => {
    expect(messages(attic({ vents: [{ id: "g", kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 24 }] })).join(" ")).toMatch(/mesh size/);
  });
  it("when a powered fan is given an NFA or no cfm, then it is refused: fans are not NFA", () => {
    expect(messages(attic({ vents: [{ id: "f", kind: "solar-powered", location: "upper", nfaSqIn: 50 }] })).join(" ")).toMatch(/cfm/);
  });
  it("when a vent names an unknown section or ids repeat, then it is refused", () => {
    expect(messages(attic({ vents: [{ id: "b", kind: "box", location: "upper", nfaSqIn: 50, sectionId: "nope" }] })).join(" ")).toMatch(/No section/);
  });
  it("when a polygon crosses itself, then the message says so", () => {
    expect(messages(attic({ sections: [{ kind: "polygon", pointsFt: [[0, 0], [10, 10], [10, 0], [0, 10]] }] })).join(" ")).toMatch(/crosses itself/);
  });
  it("when numbers are NaN, infinite, negative or out of range, then each is refused with a message", () => {
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, -1, 0, 1e9]) {
      expect(messages(attic({ sections: [{ kind: "area", areaSqFt: bad }] })).length).toBeGreaterThan(0);
    }
    expect(messages(attic({ climateZone: 4.5 })).join(" ")).toMatch(/whole number/);
    expect(messages(attic({ sections: [{ kind: "rect", lengthFt: 40, widthFt: 30, pitchIn12: 30 }] })).join(" ")).toMatch(/24\/12/);
  });
  it("when a valid survey is given, then it parses unchanged", () => {
    const input = attic({ vents: [{ id: "r", kind: "ridge", location: "upper", lengthFt: 40, nfaSqInPerFt: 18 }] });
    expect(AtticInputSchema.parse(input)).toEqual(input);
  });
});
