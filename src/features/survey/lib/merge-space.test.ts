import { describe, expect, it } from "vitest";
import { SpaceRoofSchema } from "@shared/schemas/survey";
import type { SpaceRecord } from "../api/types";
import { buildSpace, spaceFromServer } from "./drafts";
import { mergeSpace, spaceDifferences } from "./merge-space";

const base: SpaceRecord = {
  id: "8b1f0c52-3c55-4a43-9b53-2d1d8c7c9e10", projectId: "p", name: "Main attic", position: 0, version: 3,
  roof: SpaceRoofSchema.parse({ pitchIn12: 6 }),
  sections: [{ id: "s1", kind: "rect", lengthFt: 40, widthFt: 30 }],
  vents: [
    { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
    { id: "soffit", kind: "soffit-individual", location: "lower", quantity: 10, nfaSqInPerUnit: 50 },
  ],
  site: {}, notes: null, createdAt: "2026-12-03T10:00:00Z", updatedAt: "2026-12-03T10:00:00Z",
};

/** This device: ridge shortened to 30 ft, a box vent added, pitch 8/12. */
function mine() {
  const draft = spaceFromServer(base, "imperial");
  const theirsAlso = spaceFromServer({ ...base, vents: [...base.vents, { id: "box", kind: "box", location: "upper", quantity: 2, nfaSqInPerUnit: 50 }] }, "imperial");
  draft.vents[0] = { ...draft.vents[0]!, length: { ...draft.vents[0]!.length, text: "30", value: 30 } };
  draft.vents.push(theirsAlso.vents[2]!);
  draft.roof = { ...draft.roof, pitch: { ...draft.roof.pitch, text: "8", value: 8 } };
  return draft;
}
/** Saved elsewhere meanwhile: renamed, soffits counted as 12, the ridge left alone. */
const theirs: SpaceRecord = {
  ...base, version: 4, name: "House attic",
  vents: [base.vents[0]!, { ...base.vents[1]!, quantity: 12 }],
};

describe("spaceDifferences", () => {
  it("when both sides changed different parts, then each differing part is listed with both versions, and equal parts are not", () => {
    const diffs = spaceDifferences(mine(), theirs, "imperial");
    expect(diffs.map((d) => d.key)).toEqual(["name", "roof:pitch", "vent:ridge", "vent:soffit", "vent:box"]);
    expect(diffs.find((d) => d.key === "vent:ridge")).toMatchObject({ mine: expect.stringContaining("30 ft"), theirs: expect.stringContaining("36 ft") });
    expect(diffs.find((d) => d.key === "vent:box")).toMatchObject({ theirs: "Not in this version" });
    expect(diffs.find((d) => d.key === "name")).toMatchObject({ mine: "Main attic", theirs: "House attic" });
    expect(diffs.find((d) => d.key === "roof:pitch")).toMatchObject({ mine: "8 in 12", theirs: "6 in 12" });
  });
});

describe("mergeSpace", () => {
  it("when the estimator keeps their name and soffit count but their own ridge, pitch and new box vent, then the result holds exactly those", () => {
    const merged = mergeSpace(mine(), theirs, { name: "theirs", "vent:soffit": "theirs", "vent:ridge": "mine", "roof:pitch": "mine", "vent:box": "mine" }, "imperial");
    const survey = buildSpace(merged).survey!;
    expect(survey.name).toBe("House attic");
    expect(survey.roof.pitchIn12).toBe(8);
    expect(survey.vents).toEqual([
      expect.objectContaining({ id: "ridge", lengthFt: 30 }),
      expect.objectContaining({ id: "soffit", quantity: 12 }),
      expect.objectContaining({ id: "box", quantity: 2 }),
    ]);
  });

  it("when a part only this device has is given up, then it is left out; and with no choices every part stays this device's", () => {
    const without = buildSpace(mergeSpace(mine(), theirs, { "vent:box": "theirs" }, "imperial")).survey!;
    expect(without.vents.map((v) => v.id)).toEqual(["ridge", "soffit"]);
    const allMine = buildSpace(mergeSpace(mine(), theirs, {}, "imperial")).survey!;
    expect(allMine).toEqual(buildSpace(mine()).survey);
  });

  it("when every differing part is taken from the other version, then the result is the other version", () => {
    const keys = spaceDifferences(mine(), theirs, "imperial").map((d) => d.key);
    const merged = mergeSpace(mine(), theirs, Object.fromEntries(keys.map((k) => [k, "theirs" as const])), "imperial");
    expect(buildSpace(merged).survey).toEqual(buildSpace(spaceFromServer(theirs, "imperial")).survey);
    expect(spaceDifferences(merged, theirs, "imperial")).toEqual([]);
  });
});
