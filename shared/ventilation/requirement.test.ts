import { describe, expect, it } from "vitest";
import { analyzeAttic } from "./analyze-attic";
import { ratioArithmetic } from "./requirement";
import { attic, box, ridge, soffit } from "./test-helpers";

const SQ_IN_PER_SQ_FT = 144; // NIST SP 811 App. B: 1 ft² = 144 in² exactly

describe("ratioArithmetic", () => {
  it("when 1,500 sq ft is at 1/150, then the words are '1,500 sq ft ÷ 150 = 10 sq ft = 1,440 sq in' (SOURCES.md §8 E1)", () => {
    expect(ratioArithmetic(1500, 150)).toBe("1,500 sq ft ÷ 150 = 10 sq ft = 1,440 sq in");
  });
  it("when 1,234.5 sq ft is at 1/150, then it shows 1,185.12 sq in rounded up to 1,186 (SOURCES.md §8 E3)", () => {
    expect(ratioArithmetic(1234.5, 150)).toBe("1,234.5 sq ft ÷ 150 = 8.23 sq ft = 1,185.12 sq in, rounded up to 1,186 sq in");
  });
});

describe("strict-150", () => {
  it("when the basis is strict 1/150, then 1/150 applies even with vents placed for 1/300 and a vapor retarder", () => {
    const a = analyzeAttic(
      attic({ codeBasis: "strict-150", climateZone: 7, ceilingVaporRetarder: "class-I", vents: [soffit("s", 400), ridge("r", 320)] }),
    );
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.totalSqIn).toBe((1500 * SQ_IN_PER_SQ_FT) / 150);
    expect(a.requirement.exception.isAvailable).toBe(false);
  });
});

// E2's attic: 1,500 sq ft → 1/300 = 720 sq in; 40 % = 288, 50 % = 360 (SOURCES.md §8 E2).
const balanced = [soffit("s", 400), ridge("r", 320)]; // ridge 320 ≥ 288; soffit 400 ≥ 720 − 320 = 400; 320/720 = 44 %

describe("irc-2018 (2018/2021/2024 text)", () => {
  it("when in zone 4 with 40–50 % at the ridge and the balance at the eaves, then 1/300 applies: condition 1 does not apply in CZ 1–5 [IRC 2018 R806.2 exception; SOURCES.md: from memory + S5; common reading of 'both', PRACTICE]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", climateZone: 4, vents: balanced }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.requirement.totalSqIn).toBe(720);
    expect(a.requirement.exception.connector).toBe("both");
    expect(a.requirement.exception.conditions.find((c) => c.id === "vapor-retarder")?.status).toBe("not-applicable");
    expect(a.requirement.reasons.join(" ")).toContain("1,500 sq ft ÷ 300 = 5 sq ft = 720 sq in");
    // The split the rule implies: upper 288–360, lower 360–432 (SOURCES.md §8 E2)
    expect(a.requirement.split).toMatchObject({ isCodeRule: true, upperMinSqIn: 720 * 0.4, upperMaxSqIn: 720 * 0.5, lowerMinSqIn: 720 * 0.5, lowerMaxSqIn: 720 * 0.6 });
  });

  it("when in zone 6 without a Class I/II vapor retarder, then both conditions are not met and 1/150 applies [IRC 2018 R806.2 exception 'both'; from memory + S5]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", climateZone: 6, ceilingVaporRetarder: "class-III", vents: balanced }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.totalSqIn).toBe(1440);
    expect(a.requirement.reasons.join(" ")).toMatch(/zone 6.*Class III.*not met/);
  });

  it("when in zone 6 with a Class II retarder and good placement, then 1/300 applies [IRC 2018 R806.2 exception, both conditions]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", climateZone: 6, ceilingVaporRetarder: "class-II", vents: balanced }));
    expect(a.requirement.ratio).toBe(300);
  });

  it("when in zone 7 with a Class I retarder but no upper vents, then 1/150 applies: the retarder alone is not enough after 2018 [S5]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", climateZone: 7, ceilingVaporRetarder: "class-I", vents: [soffit("s", 900)] }));
    expect(a.requirement.ratio).toBe(150);
  });

  it("when the low vents are box vents of unknown height instead of eave vents, then the bottom-third balance is not met [IRC 2018 R806.2 'bottom one-third', from memory]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", vents: [box("low", 400, { location: "lower" }), ridge("r", 320)] }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.reasons.join(" ")).toMatch(/not known to be in the bottom third/);
  });

  it("when a low box vent's height is known to be within the bottom third of the rise, then it counts toward the balance", () => {
    const a = analyzeAttic(
      attic({
        codeBasis: "irc-2018",
        sections: [{ kind: "rect", lengthFt: 50, widthFt: 30, roofForm: "gable", pitchIn12: 6 }], // rise 7.5 ft
        vents: [box("low", 400, { location: "lower", heightAboveEaveFt: 2 }), ridge("r", 320)], // 2 ≤ 7.5 ÷ 3 = 2.5
      }),
    );
    expect(a.requirement.ratio).toBe(300);
  });

  it("when upper vents sit more than 3 ft below the ridge, then they don't count as upper and upper-vent-too-low is reported [IRC 2012+ R806.2 condition 2, S4]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", vents: [soffit("s", 400), box("b", 320, { dropBelowRidgeFt: 3.5 })] }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.tooLowUpperVentIds).toEqual(["b"]);
    expect(a.findings.map((f) => f.code)).toContain("upper-vent-too-low");
  });

  it("when an upper vent is exactly 3 ft below the ridge, then it still counts ('not more than 3 ft') [S4]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", vents: [soffit("s", 400), box("b", 320, { dropBelowRidgeFt: 3 })] }));
    expect(a.requirement.ratio).toBe(300);
  });

  it("when a box vent's drop below the ridge is unknown, then it is not granted and the reasons say so", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", vents: [soffit("s", 400), box("b", 320)] }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.unknownPositionVentIds).toEqual(["b"]);
    expect(a.requirement.reasons.join(" ")).toMatch(/Drop below the highest point unknown/);
    expect(a.findings.map((f) => f.code)).toContain("upper-vent-position-unknown");
  });

  it("when ridge kinds carry no drop, then they are taken as at the ridge and the reasons say so", () => {
    const a = analyzeAttic(attic({ vents: balanced }));
    expect(a.requirement.reasons.join(" ")).toMatch(/Taken as sitting at the ridge because of their kind/);
  });

  it("when upper vents are under 40 % of the 1/300 area, then condition 2 fails: 280 < 0.4 × 720 = 288 [IRC 2012+ R806.2 condition 2, S4]", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 440), ridge("r", 280)] }));
    expect(a.requirement.ratio).toBe(150);
  });

  it("when the company reads the share as of the area provided and upper vents exceed 50 % of it, then the cap fails (the local reading of 'not more than 50 percent')", () => {
    const a = analyzeAttic(attic({ upperShareBase: "provided", vents: [soffit("s", 380), ridge("r", 400)] }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.reasons.join(" ")).toMatch(/at most 50 % is allowed: not met/);
  });
});

describe("irc-2012 (2012/2015 text)", () => {
  it("when in zone 6 with a Class I retarder and no upper vents, then 1/300 applies: 'one or more' [IRC 2012 R806.2 exception; from memory, S8 'either/or']", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2012", climateZone: 6, ceilingVaporRetarder: "class-I", vents: [soffit("s", 900)] }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.requirement.exception.connector).toBe("one-or-more");
    expect(a.requirement.split.isCodeRule).toBe(false);
  });

  it("when in zone 4 with a Class I retarder only, then 1/150 applies: condition 1 exists only in CZ 6–8 [IRC 2012 R806.2]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2012", climateZone: 4, ceilingVaporRetarder: "class-I", vents: [soffit("s", 900)] }));
    expect(a.requirement.ratio).toBe(150);
  });

  it("when in zone 6 without a retarder but with good placement, then 1/300 applies by condition 2 alone [IRC 2012 R806.2; S4]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2012", climateZone: 6, vents: balanced }));
    expect(a.requirement.ratio).toBe(300);
  });

  it("when the low vents are not eave vents, then the 2012 balance ('in eave or cornice vents') is not met", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2012", vents: [box("low", 400, { location: "lower", heightAboveEaveFt: 0 }), ridge("r", 320)] }));
    expect(a.requirement.ratio).toBe(150);
  });
});

describe("irc-2009", () => {
  // 2009: 50–80 % upper at least 3 ft above the eave vents [S3]; or a Class I/II retarder [from memory].
  const gable = [{ kind: "rect" as const, lengthFt: 50, widthFt: 30, roofForm: "gable" as const, pitchIn12: 6 }]; // rise 7.5 ft

  it("when the ridge is 7.5 ft above the eaves with 50–80 % of the area, then 1/300 applies [IRC 2009 R806.2; S3]", () => {
    // 1/300 = 720; upper ≥ 0.5 × 720 = 360; eaves ≥ 720 − min(400, 576) = 320; 400/720 of total = 55.6 % ≤ 80 %
    const a = analyzeAttic(attic({ codeBasis: "irc-2009", sections: gable, vents: [soffit("s", 320), ridge("r", 400)] }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.requirement.split).toMatchObject({ isCodeRule: true, upperMinSqIn: 720 * 0.5, upperMaxSqIn: 720 * 0.8 }); // 360–576 (E2)
  });

  it("when the 2012+ 40 % share is used under 2009, then it is too little: 320 < 0.5 × 720 = 360 [S3]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2009", sections: gable, vents: [soffit("s", 400), ridge("r", 320)] }));
    expect(a.requirement.ratio).toBe(150);
  });

  it("when the roof pitch is unknown, then the height above the eaves is unknown and the exception is not granted", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2009", vents: [soffit("s", 320), ridge("r", 400)] }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.reasons.join(" ")).toMatch(/Height above the eave vents unknown/);
  });

  it("when a low-slope ridge is under 3 ft above the eaves, then it is too low: 2:12 over 30 ft → 15 × 2/12 = 2.5 ft [IRC 2009 R806.2]", () => {
    const lowSlope = [{ kind: "rect" as const, lengthFt: 50, widthFt: 30, roofForm: "gable" as const, pitchIn12: 2 }];
    const a = analyzeAttic(attic({ codeBasis: "irc-2009", sections: lowSlope, vents: [soffit("s", 320), ridge("r", 400)] }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.tooLowUpperVentIds).toEqual(["r"]);
  });

  it("when a box vent's drop below the ridge is known with the rise, then its height is rise − drop: 7.5 − 5 = 2.5 ft, too low", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2009", sections: gable, vents: [soffit("s", 320), box("b", 400, { dropBelowRidgeFt: 5 })] }));
    expect(a.requirement.tooLowUpperVentIds).toEqual(["b"]);
  });

  it("when a Class II retarder is on the warm side, then 1/300 applies in any zone [IRC 2009 R806.2 alternative 2; from memory]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2009", climateZone: 2, ceilingVaporRetarder: "class-II", vents: [soffit("s", 720)] }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.requirement.exception.connector).toBe("either");
  });
});

describe("E3 rounding (SOURCES.md §8 E3)", () => {
  it("when the floor is 1,234.5 sq ft at 1/150, then 1,234.5 ÷ 150 × 144 = 1,185.12 → 1,186 sq in", () => {
    const a = analyzeAttic(attic({ codeBasis: "strict-150", sections: [{ kind: "area", areaSqFt: 1234.5 }] }));
    expect(a.requirement.exactSqIn).toBeCloseTo(1234.5 * 0.96, 9);
    expect(a.requirement.totalSqIn).toBe(1186);
  });

  it("when the floor is 1,234.5 sq ft at 1/300, then 592.56 → 593 sq in, upper 237.02–296.28 in whole sq in 238–296", () => {
    // irc-2018, zone 4: upper 260 ≥ 237.02; eaves 340 ≥ 592.56 − 260 = 332.56; 260/600 = 43 %
    const a = analyzeAttic(attic({ sections: [{ kind: "area", areaSqFt: 1234.5 }], vents: [soffit("s", 340), ridge("r", 260)] }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.requirement.exactSqIn).toBeCloseTo(592.56, 9);
    expect(a.requirement.totalSqIn).toBe(593);
    expect(a.requirement.split.upperMinSqIn).toBe(Math.ceil(592.56 * 0.4)); // 237.024 → 238
    expect(a.requirement.split.upperMaxSqIn).toBe(Math.floor(592.56 * 0.5)); // 296.28 → 296
    expect(a.requirement.split.lowerMinSqIn).toBe(593 - 296);
  });
});
