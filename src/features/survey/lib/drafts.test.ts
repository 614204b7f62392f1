import { describe, expect, it } from "vitest";
import type { Section, Vent } from "@shared/ventilation/index";
import type { SpaceRoof } from "@shared/schemas/survey";
import { buildSpace, copyVents, emptySection, emptyVent, liveSurvey, spaceFromServer, type SpaceDraft } from "./drafts";
import { lengthEntry, numberEntry } from "./measure";

/*
 * "Bad input loses nothing": the survey editor keeps every typed text, sends only what the core
 * accepts, and while a part is being corrected the server keeps that part's last saved copy.
 */

const roof: SpaceRoof = { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 };
const savedSection: Section = { id: "00000000-0000-4000-8000-000000000001", kind: "rect", lengthFt: 40, widthFt: 30 };
const savedVent: Vent = { id: "00000000-0000-4000-8000-000000000002", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 };

function savedSpace(): SpaceDraft {
  return spaceFromServer({ id: "space-1", name: "Main attic", roof, sections: [savedSection], vents: [savedVent], site: {}, notes: null }, "imperial");
}

describe("buildSpace", () => {
  it("when every part is complete, then the survey sent equals what the server holds", () => {
    const built = buildSpace(savedSpace());
    expect(built.problems).toEqual([]);
    expect(built.blockedReason).toBeNull();
    expect(built.survey?.sections).toEqual([savedSection]);
    expect(built.survey?.vents).toEqual([savedVent]);
  });

  it("when a saved section's length is corrected to something unreadable, then the typed text stays, the problem is named and the server keeps the last saved copy", () => {
    const draft = savedSpace();
    const section = draft.sections[0]!;
    draft.sections = [{ ...section, length: lengthEntry("forty-ish") }];
    const built = buildSpace(draft, { sections: [savedSection], vents: [savedVent], roof });
    expect(draft.sections[0]!.length.text).toBe("forty-ish");
    expect(draft.sections[0]!.length.error).toBeTruthy();
    expect(built.problems).toEqual([expect.objectContaining({ partId: savedSection.id, message: expect.stringMatching(/Length/) })]);
    expect(built.survey?.sections).toEqual([savedSection]);
  });

  it("when the last saved copy is not passed, then the part being corrected is left out instead of being sent broken", () => {
    const draft = savedSpace();
    draft.sections = [{ ...draft.sections[0]!, width: lengthEntry("-3") }];
    const built = buildSpace(draft);
    expect(built.survey?.sections).toEqual([]);
    expect(built.problems.map((p) => p.partId)).toEqual([savedSection.id]);
  });

  it("when a new vent is half entered, then it is reported with its name and nothing of it is sent", () => {
    const draft = savedSpace();
    const vent = { ...emptyVent("box"), quantity: numberEntry("4", { isWhole: true }) };
    draft.vents = [...draft.vents, vent];
    const built = buildSpace(draft, { sections: [savedSection], vents: [savedVent], roof });
    expect(built.survey?.vents).toEqual([savedVent]);
    expect(built.problems).toEqual([expect.objectContaining({ partId: vent.id, where: expect.stringMatching(/box|static/i), message: expect.stringMatching(/NFA/) })]);
  });

  it("when the roof pitch is unreadable, then the saved roof is sent and the problem is on the roof", () => {
    const draft = savedSpace();
    draft.roof = { ...draft.roof, pitch: numberEntry("steep") };
    const kept = { ...roof, pitchIn12: 9 };
    const built = buildSpace(draft, { sections: [savedSection], vents: [savedVent], roof: kept });
    expect(built.survey?.roof).toEqual(kept);
    expect(built.problems).toEqual([expect.objectContaining({ where: "Roof" })]);
  });

  it("when the space has no name, then nothing is sent and the reason says to name it", () => {
    const draft = { ...savedSpace(), name: "  " };
    const built = buildSpace(draft);
    expect(built.survey).toBeNull();
    expect(built.blockedReason).toMatch(/Name the space/);
  });
});

describe("liveSurvey", () => {
  it("when a part is incomplete, then the live analysis sees only the complete parts (no stale copies)", () => {
    const draft = savedSpace();
    draft.sections = [...draft.sections, emptySection("rect")];
    draft.sections[0] = { ...draft.sections[0]!, length: lengthEntry("oops") };
    expect(liveSurvey(draft).sections).toEqual([]);
    expect(liveSurvey(draft).vents).toEqual([savedVent]);
  });
});

describe("copyVents", () => {
  it("when vents are copied to another space, then each gets a new id and no fan readings come along", () => {
    const fan = { ...emptyVent("powered-roof"), cfm: numberEntry("1100") };
    fan.diagnostics = { ...fan.diagnostics, isPowerVerifiedOff: true, blade: "stuck" };
    const [copy] = copyVents([fan]);
    expect(copy!.id).not.toBe(fan.id);
    expect(copy!.cfm.text).toBe("1100");
    expect(copy!.diagnostics.isPowerVerifiedOff).toBe(false);
    expect(copy!.diagnostics.blade).toBe("");
  });
});
