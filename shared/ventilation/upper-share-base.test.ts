import { describe, expect, it } from "vitest";
import { analyzeAttic } from "./analyze-attic";
import { attic, ridge, soffit } from "./test-helpers";

// IRC 2012/2015 and 2018+ R806.2 condition 2: "not less than 40 percent and not more than 50 percent
// of the required ventilating area" in upper vents [SOURCES.md S4 quotes it]. The literal base is
// the REQUIRED area (1/300 of the floor); reading it as a share of the area PROVIDED is a local
// reading a company may choose. 1,500 sq ft → 720 sq in at 1/300; 50 % = 360 sq in (SOURCES.md §8 E2).
const heavyRidge = [soffit("s", 800), ridge("r", 400)]; // 400 > 360 = 50 % of required; but 400/1,200 = 33 % of provided

describe("the 40–50 % base", () => {
  it("when upper vents give more than 50 % of the required area, then by default (the literal text) the 1/300 route is not met", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", vents: heavyRidge }));
    expect(a.requirement.upperShareBase).toBe("required");
    expect(a.requirement.ratio).toBe(150);
    expect(a.compliant).toBe(false);
    const placement = a.requirement.exception.conditions.find((c) => c.id === "vent-placement");
    expect(placement?.reason).toMatch(/400 sq in.*at most 50 % of 720 sq in = 360 sq in.*not met/);
  });

  it("when the other reading would decide differently, then a note says the building department may read it as a share of the area provided", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", vents: heavyRidge }));
    const note = a.findings.find((f) => f.code === "upper-share-reading");
    expect(note?.severity).toBe("info");
    expect(note?.detail).toMatch(/building department may read/);
    expect(note?.detail).toMatch(/would be met/);
  });

  it("when the company chose the 'share of provided' reading, then the same attic meets 1/300 and the note names the literal reading", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", upperShareBase: "provided", vents: heavyRidge }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.compliant).toBe(true);
    expect(a.findings.find((f) => f.code === "upper-share-reading")?.detail).toMatch(/literal text.*would not be met/);
  });

  it("when the 2012/2015 text is chosen, then the same literal base applies (IRC 2012 R806.2 condition 2)", () => {
    expect(analyzeAttic(attic({ codeBasis: "irc-2012", vents: heavyRidge })).requirement.ratio).toBe(150);
  });

  it("when upper vents are within 40–50 % of the required area, then both readings agree and there is no note", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", vents: [soffit("s", 400), ridge("r", 320)] }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.findings.map((f) => f.code)).not.toContain("upper-share-reading");
  });

  it("when IRC 2009 is chosen, then its 50–80 % range is checked against the required area too", () => {
    // 80 % of 720 = 576; a 600 sq in ridge 3+ ft above the eaves exceeds it
    const a = analyzeAttic(attic({ codeBasis: "irc-2009", vents: [soffit("s", 900), ridge("r", 600, { heightAboveEaveFt: 7 })] }));
    expect(a.requirement.exception.conditions.find((c) => c.id === "vent-placement")?.status).toBe("not-met");
  });
});
