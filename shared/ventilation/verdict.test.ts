import { describe, expect, it } from "vitest";
import { analyzeAttic } from "./analyze-attic";
import type { Vent } from "./schema";
import { attic, ridge, soffit } from "./test-helpers";

// IRC R806.2 (every edition): net free area "not less than 1/150" of the vented floor area
// [SOURCES.md S1, S2, S7]. The comparison is with the exact requirement; rounding up is for what
// is bought and what is shown (SOURCES.md §8 E3: 1,234.5 sq ft → 1,185.12 sq in, buy 1,186).
const e3 = (vents: Vent[]) => analyzeAttic(attic({ codeBasis: "strict-150", sections: [{ kind: "area", areaSqFt: 1234.5 }], vents }));

describe("the code-minimum verdict is never rounded (IRC R806.2 'not less than 1/150')", () => {
  it("when 1,185.5 sq in is provided against the exact 1,185.12 sq in, then it complies and says it clears the minimum by a hair", () => {
    const a = e3([soffit("s", 600), ridge("r", 585.5)]);
    expect(a.requirement.exactSqIn).toBeCloseTo(1185.12, 9);
    expect(a.requirement.totalSqIn).toBe(1186); // rounded up for buying and display only
    expect(a.compliant).toBe(true);
    expect(a.findings.map((f) => f.code)).not.toContain("below-minimum");
    const narrow = a.findings.find((f) => f.code === "meets-minimum-narrowly");
    expect(narrow?.severity).toBe("info");
    expect(narrow?.detail).toMatch(/1,185\.12 sq in/);
    expect(narrow?.detail).toMatch(/1,186 sq in/);
  });

  it("when 1,185 sq in is provided, then it falls short by 0.12 sq in and says so", () => {
    const a = e3([soffit("s", 600), ridge("r", 585)]);
    expect(a.compliant).toBe(false);
    const below = a.findings.find((f) => f.code === "below-minimum");
    expect(below?.detail).toMatch(/0\.12 sq in short/);
  });

  it("when the exact provided area is 1,185.119 sq in (shown as 1,185.12), then it is still below the exact 1,185.12 sq in", () => {
    // 480 in × 5.555246 in gross behind louvers + 1/8 in mesh (factor 2.25, JLC field guide [S11]) = 1,185.1191 sq in
    const a = e3([{ id: "g", kind: "gable-louver", location: "lower", grossWidthIn: 480, grossHeightIn: 5.555246, covering: { mesh: "1/8", louvers: true } }]);
    expect(a.provided.totalSqIn).toBe(1185.12); // the display figure
    expect(a.compliant).toBe(false);
  });

  it("when the provided area is far above the minimum, then there is no 'narrowly' note", () => {
    const a = e3([soffit("s", 800), ridge("r", 600)]);
    expect(a.compliant).toBe(true);
    expect(a.findings.map((f) => f.code)).not.toContain("meets-minimum-narrowly");
  });

  it("when the 1/300 route is not met but the provided area clears the exact 1/300 figure by a fraction, then the exception note says it would pass at 1/300", () => {
    // 1,234.5 sq ft at 1/300 = 592.56 sq in exactly (SOURCES.md §8 E3); soffits only, so no upper vents
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", climateZone: 4, sections: [{ kind: "area", areaSqFt: 1234.5 }], vents: [soffit("s", 592.7)] }));
    expect(a.requirement.ratio).toBe(150);
    expect(a.findings.find((f) => f.code === "exception-not-met")?.severity).toBe("warning");
  });
});
