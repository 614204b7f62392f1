import { describe, expect, it } from "vitest";
import { analyzeAttic } from "./analyze-attic";
import { attic, box, soffit } from "./test-helpers";
import { riseLookup, ventPosition } from "./vent-position";

// IRC 2012+ R806.2 condition 2: upper vents "not more than 3 feet below the ridge or highest point
// of the space, measured vertically" [SOURCES.md S4 quotes the 2012/2015 text]. A vent that names no
// section is measured from the space's highest point; unknown heights never grant the exception.
const tall = { kind: "rect" as const, id: "main", lengthFt: 40, widthFt: 48, roofForm: "gable" as const, pitchIn12: 6 }; // rise 24 × 6/12 = 12 ft
const low = { kind: "rect" as const, id: "wing", lengthFt: 20, widthFt: 12, roofForm: "gable" as const, pitchIn12: 6 }; // rise 6 × 6/12 = 3 ft

describe("upper vents are measured from the highest point of the space", () => {
  it("when box vents 6 ft above the eaves name no section in a space whose highest rise is 12 ft, then they are 6 ft below the highest point: too low for 1/300 (IRC 2018 R806.2 condition 2)", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", sections: [tall, low], vents: [soffit("s", 600), box("b", 450, { heightAboveEaveFt: 6 })] }));
    expect(a.requirement.tooLowUpperVentIds).toEqual(["b"]);
    expect(a.requirement.ratio).toBe(150);
    expect(a.compliant).toBe(false);
  });

  it("when a vent names no section, then the drop is taken from the highest rise and the height from the lowest (the case that does not grant the exception)", () => {
    const rise = riseLookup([tall, low])(undefined);
    expect(rise).toEqual({ highestFt: 12, lowestFt: 3 });
    expect(ventPosition({ id: "b", kind: "box", location: "upper", nfaSqIn: 50, heightAboveEaveFt: 6 }, rise).dropBelowRidgeFt).toBe(6);
    // IRC 2009: upper vents at least 3 ft above the eave vents [S3]; a 1 ft drop is only 2 ft up in the 3 ft wing
    expect(ventPosition({ id: "b", kind: "box", location: "upper", nfaSqIn: 50, dropBelowRidgeFt: 1 }, rise).heightAboveEaveFt).toBe(2);
  });

  it("when a vent names its section, then that section's rise is used", () => {
    expect(riseLookup([tall, low])("wing")).toEqual({ highestFt: 3, lowestFt: 3 });
  });

  it("when a recorded height is above the highest rise, then it is warned as impossible and not counted as an upper vent", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", sections: [tall], vents: [soffit("s", 600), box("b", 450, { heightAboveEaveFt: 14 })] }));
    const impossible = a.findings.find((f) => f.code === "vent-height-impossible");
    expect(impossible?.ventIds).toEqual(["b"]);
    expect(impossible?.detail).toMatch(/14 ft.*12 ft/);
    expect(a.requirement.qualifyingUpperVentIds).not.toContain("b");
    expect(a.requirement.ratio).toBe(150);
  });

  it("when a recorded drop below the ridge is more than the rise, then it is warned as impossible", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", sections: [tall], vents: [soffit("s", 600), box("b", 450, { dropBelowRidgeFt: 13 })] }));
    expect(a.findings.find((f) => f.code === "vent-height-impossible")?.ventIds).toEqual(["b"]);
  });

  it("when a vent's height is unknown, then the reasons say it is taken as not meeting the rule", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", sections: [{ kind: "area", areaSqFt: 1500 }], vents: [soffit("s", 600), box("b", 450)] }));
    expect(a.requirement.unknownPositionVentIds).toEqual(["b"]);
    expect(a.requirement.ratio).toBe(150);
    expect(a.requirement.reasons.join(" ")).toMatch(/taken as not meeting/);
  });
});
