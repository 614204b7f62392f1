import { describe, expect, it } from "vitest";
import { ventDisplayName, ventListPhrase } from "./vent-kinds";
import { analyzeAttic } from "./analyze-attic";

describe("naming vents in sentences", () => {
  it("when a vent has a label, then the sentence uses kind and label; without one, the kind only (the TSDoc examples)", () => {
    expect(ventDisplayName({ kind: "gable-louver", label: "north gable" })).toBe('the gable louver "north gable"');
    expect(ventDisplayName({ kind: "ridge" })).toBe("the ridge vent");
  });

  it("when several vents are listed, then each name appears once, joined with 'and'", () => {
    expect(ventListPhrase([{ kind: "ridge" }, { kind: "box" }, { kind: "box" }])).toBe("the ridge vent and the box (static) vent");
  });

  it("when vent ids are generated codes, then no finding or reason shows them", () => {
    const id = "3f2b9c1e-7a55-4c2e-9d0e-5b1a2c3d4e5f";
    const analysis = analyzeAttic({
      codeBasis: "irc-2018", climateZone: 4, ceilingVaporRetarder: "none", roofColor: "medium",
      sections: [{ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 }],
      vents: [
        { id, kind: "ridge", location: "upper", lengthFt: 38, nfaSqInPerFt: 18 },
        { id: `${id}-fan`, kind: "powered-gable", location: "upper", cfm: 1200, mounting: "gable" },
        { id: `${id}-soffit`, kind: "soffit-continuous", location: "lower", lengthFt: 30, nfaSqInPerFt: 9 },
      ],
    });
    const text = [...analysis.requirement.reasons, ...analysis.findings.flatMap((f) => [f.title, f.detail])].join("\n");
    expect(analysis.findings.map((f) => f.code)).toContain("powered-with-passive-exhaust");
    expect(text).toContain("the ridge vent");
    expect(text).not.toContain(id);
  });
});
