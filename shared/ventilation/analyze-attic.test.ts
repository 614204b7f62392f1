import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeAttic, tryAnalyzeAttic, type AtticAnalysis } from "./analyze-attic";
import { atticArb, passiveVentArb } from "./arbitraries.test-helpers";
import { AtticInputSchema } from "./schema";
import { attic, ridge, roofFan, soffit } from "./test-helpers";

// Worked examples E1–E8, SOURCES.md §8, each checked end to end with its arithmetic.
describe("worked examples (SOURCES.md §8)", () => {
  it("E1: when a 1,500 sq ft attic is at 1/150, then 1,500 ÷ 150 = 10 sq ft = 1,440 sq in, and 720/720 is an allowed split [IRC R806.2 base rule; S1, 2, 7]", () => {
    const a = analyzeAttic(attic({ codeBasis: "strict-150", vents: [soffit("s", 720), ridge("r", 720)] }));
    expect(a.floorAreaSqFt).toBe(1500);
    expect(a.requirement.totalSqFt).toBe(1500 / 150);
    expect(a.requirement.totalSqIn).toBe(10 * 144);
    expect(a.requirement.reasons.join(" ")).toContain("1,500 sq ft ÷ 150 = 10 sq ft = 1,440 sq in");
    expect(a.compliant).toBe(true); // 1/150 sets no split, so 720/720 is fine
    expect(a.findings.filter((f) => f.severity === "critical")).toEqual([]);
    // SI: 1,500 sq ft = 139.35 m², 10 sq ft = 0.929 m² (× 0.09290304, NIST SP 811 App. B)
    expect(a.floorAreaSqFt * 0.09290304).toBeCloseTo(139.35, 2);
  });

  it("E2: when the same attic meets the 2018 exception, then 1,500 ÷ 300 = 5 sq ft = 720 sq in; upper 288–360, lower 360–432; 360/360 passes [IRC 2018 R806.2 exception; from memory + S5]", () => {
    const a = analyzeAttic(attic({ codeBasis: "irc-2018", climateZone: 4, vents: [soffit("s", 360), ridge("r", 360)] }));
    expect(a.requirement.ratio).toBe(300);
    expect(a.requirement.totalSqIn).toBe((1500 / 300) * 144);
    expect(a.requirement.split).toMatchObject({ upperMinSqIn: 288, upperMaxSqIn: 360, lowerMinSqIn: 360, lowerMaxSqIn: 432 });
    expect(a.compliant).toBe(true);
    // Zone 6–8 also needs the Class I/II retarder under 2018:
    expect(analyzeAttic(attic({ codeBasis: "irc-2018", climateZone: 7, vents: [soffit("s", 360), ridge("r", 360)] })).requirement.ratio).toBe(150);
  });

  it("E3: when the floor is 1,234.5 sq ft, then 1/150 = 1,185.12 → 1,186 sq in and 1/300 = 592.56 → 593 sq in", () => {
    const at150 = analyzeAttic(attic({ codeBasis: "strict-150", sections: [{ kind: "area", areaSqFt: 1234.5 }] }));
    expect(at150.requirement.exactSqIn).toBeCloseTo((1234.5 / 150) * 144, 9);
    expect(at150.requirement.totalSqIn).toBe(1186);
    const at300 = analyzeAttic(attic({ sections: [{ kind: "area", areaSqFt: 1234.5 }], vents: [soffit("s", 340), ridge("r", 260)] }));
    expect(at300.requirement.totalSqIn).toBe(593);
    expect(at300.requirement.reasons.join(" ")).toContain("1,234.5 sq ft ÷ 300 = 4.115 sq ft = 592.56 sq in, rounded up to 593 sq in");
  });

  it("E4: when the L is two rectangles 30 × 40 and 12 × 20, then 1,440 sq ft → 1,382.4 → 1,383 sq in at 1/150 and 691.2 → 692 at 1/300; each wing alone sums to the same", () => {
    const sections = [
      { kind: "rect" as const, id: "main", lengthFt: 40, widthFt: 30 },
      { kind: "rect" as const, id: "wing", lengthFt: 20, widthFt: 12 },
    ];
    const a = analyzeAttic(attic({ codeBasis: "strict-150", sections }));
    expect(a.floorAreaSqFt).toBe(1200 + 240);
    expect(a.requirement.exactSqIn).toBeCloseTo(1382.4, 9);
    expect(a.requirement.totalSqIn).toBe(1383);
    const main = analyzeAttic(attic({ codeBasis: "strict-150", sections: [sections[0]!] })).requirement.exactSqIn;
    const wing = analyzeAttic(attic({ codeBasis: "strict-150", sections: [sections[1]!] })).requirement.exactSqIn;
    expect(main).toBeCloseTo(1152, 9);
    expect(wing).toBeCloseTo(230.4, 9);
    expect(main + wing).toBeCloseTo(a.requirement.exactSqIn, 9);
    // 1/300 route: 691.2, upper 276.48–345.6
    const at300 = analyzeAttic(attic({ sections, vents: [soffit("s", 400), ridge("r", 300)] }));
    expect(at300.requirement.exactSqIn).toBeCloseTo(691.2, 9);
    expect(at300.requirement.split.upperMinSqIn).toBe(Math.ceil(276.48));
    expect(at300.requirement.split.upperMaxSqIn).toBe(Math.floor(345.6));
  });

  it("E5: when an 1,800 sq ft dark-roof attic has a fan, then 1,800 × 0.7 = 1,260 and × 1.15 = 1,449 cfm (HVI attic ventilation guidance)", () => {
    const base = { sections: [{ kind: "area" as const, areaSqFt: 1800 }], vents: [soffit("s", 1000), roofFan("f", 1400)] };
    expect(analyzeAttic(attic({ ...base, roofColor: "medium" })).fan?.recommendedCfm).toBe(1260);
    const dark = analyzeAttic(attic({ ...base, roofColor: "dark" }));
    expect(dark.fan?.recommendedCfm).toBe(1449);
    expect(dark.fan?.isDarkOrSteep).toBe(true);
    expect(dark.fan?.reasons.join(" ")).toContain("1,260 × 1.15 = 1,449 cfm");
    // SI: 1,260 × 0.47194745 = 594.65 L/s
    expect(1260 * 0.47194745).toBeCloseTo(594.65, 2);
  });

  it("E5 steep: when a section's pitch is 7/12 or more, then the +15 % applies (steep = 7/12, JLC field guide threshold; common practice)", () => {
    const steep = analyzeAttic(attic({ sections: [{ kind: "area", areaSqFt: 1800, pitchIn12: 7 }], vents: [soffit("s", 1000), roofFan("f", 1400)] }));
    expect(steep.fan?.recommendedCfm).toBe(1449);
    const notSteep = analyzeAttic(attic({ sections: [{ kind: "area", areaSqFt: 1800, pitchIn12: 6.5 }], vents: [soffit("s", 1000), roofFan("f", 1400)] }));
    expect(notSteep.fan?.recommendedCfm).toBe(1260);
  });

  it("E6: when the fan is 1,200 cfm, then it needs 1,200 ÷ 300 = 4 sq ft = 576 sq in of intake; a 1,449 cfm fan needs 696 (HVI)", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 1000), roofFan("f", 1200)] }));
    expect(a.fan?.intakeNeededSqIn).toBe(576);
    expect(a.fan?.reasons.join(" ")).toContain("1,200 ÷ 300 = 4 sq ft = 576 sq in");
    const b = analyzeAttic(attic({ sections: [{ kind: "area", areaSqFt: 1800 }], roofColor: "dark", vents: [soffit("s", 1000), roofFan("f", 1200)] }));
    expect(b.fan?.intakeNeededForRecommendedSqIn).toBe(696);
  });

  it("E7: when 14 × 24 in louvers (louvers + 1/8 in mesh) give the upper share, then each is 336 ÷ 2.25 = 149.33; two (298.67) fall within 40–50 % of E2's 720 sq in, three (448) exceed the 360 sq in the literal text allows (JLC field guide [S11]; IRC 2018 R806.2 condition 2 [S4])", () => {
    const louver = (id: string) => ({ id, kind: "gable-louver" as const, location: "upper" as const, grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8" as const, louvers: true }, dropBelowRidgeFt: 2 });
    const two = analyzeAttic(attic({ vents: [soffit("s", 450), louver("g1"), louver("g2")] }));
    expect(two.provided.perVent[1]?.nfaSqIn).toBeCloseTo(336 / 2.25, 2);
    expect(two.provided.exhaustSqIn).toBeCloseTo(2 * 149.33, 1);
    expect(two.requirement.ratio).toBe(300); // upper 298.67 in 288–360; eaves 450 ≥ 720 − 298.67
    const three = analyzeAttic(attic({ vents: [soffit("s", 450), louver("g1"), louver("g2"), louver("g3")] }));
    expect(three.provided.exhaustSqIn).toBeCloseTo(3 * 149.33, 1);
    expect(three.requirement.ratio).toBe(150); // 448 > 50 % × 720 = 360 of the required area
    expect(three.requirement.otherReading?.wouldBeMet).toBe(true); // 448 ÷ 898 = 49.9 % of the area provided
  });

  it("E8: when a 30 × 40 gable is at 6:12, then volume 4,500 cu ft, 10 ACH = 750 cfm, area rule 840 cfm, and 840 ÷ 300 × 144 = 403.2 sq in intake (HVI)", () => {
    const a = analyzeAttic(
      attic({ sections: [{ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 }], vents: [soffit("s", 600), roofFan("f", 840)] }),
    );
    expect(a.volumeCuFt).toBe(0.5 * 30 * 7.5 * 40);
    expect(a.fan).toMatchObject({ airChangeMethodCfm: 750, areaMethodCfm: 840, recommendedCfm: 840 });
    expect(a.fan?.intakeNeededSqIn).toBe(Math.ceil(403.2));
    // Mean height 4,500 ÷ 1,200 = 3.75 ft, below the 4.2 ft where the two HVI rules agree.
    expect(a.volumeCuFt! / a.floorAreaSqFt).toBe(3.75);
  });
});

describe("properties", () => {
  const finiteEverywhere = (value: unknown): boolean => {
    if (typeof value === "number") return Number.isFinite(value);
    if (Array.isArray(value)) return value.every(finiteEverywhere);
    if (value && typeof value === "object") return Object.values(value).every(finiteEverywhere);
    if (typeof value === "string") return !/NaN|Infinity|undefined/.test(value);
    return true;
  };

  it("when any schema-valid attic is analysed, then every number is finite and no text says NaN", () => {
    fc.assert(
      fc.property(atticArb(), (input) => {
        expect(AtticInputSchema.safeParse(input).success).toBe(true);
        const a: AtticAnalysis = analyzeAttic(input);
        expect(finiteEverywhere(a)).toBe(true);
        // A vented attic always needs some vent area; a sealed one (IRC R806.5) needs none and never gets "add vents".
        if (a.assembly === "vented") expect(a.requirement.totalSqIn).toBeGreaterThan(0);
        else {
          expect(a.requirement.totalSqIn).toBe(0);
          expect(a.findings.map((f) => f.code)).not.toContain("below-minimum");
        }
      }),
      { numRuns: 300 },
    );
  }, 30_000); // many random attics: correctness, not a timing check

  it("when the floor area grows (vents and geometry fixed), then the required NFA never decreases", () => {
    fc.assert(
      fc.property(atticArb(), fc.double({ min: 0.01, max: 100_000, noNaN: true }), (input, extraSqFt) => {
        const before = analyzeAttic(input).requirement.totalSqIn;
        const grown = { ...input, sections: [...input.sections, { kind: "area" as const, areaSqFt: extraSqFt }] };
        expect(analyzeAttic(grown).requirement.totalSqIn).toBeGreaterThanOrEqual(before);
      }),
      { numRuns: 300 },
    );
  }, 30_000); // many random attics: correctness, not a timing check

  it("when a rectangle gets longer along its ridge (rise unchanged), then the required NFA never decreases", () => {
    fc.assert(
      fc.property(atticArb(), fc.double({ min: 1, max: 3, noNaN: true }), (input, factor) => {
        const first = input.sections[0]!;
        fc.pre(first.kind === "rect" && first.lengthFt * factor <= 1000 && first.roofForm !== "hip");
        const before = analyzeAttic(input).requirement.totalSqIn;
        const longer = { ...input, sections: [{ ...first, lengthFt: (first as { lengthFt: number }).lengthFt * factor }, ...input.sections.slice(1)] };
        expect(analyzeAttic(longer as typeof input).requirement.totalSqIn).toBeGreaterThanOrEqual(before);
      }),
      { numRuns: 300 },
    );
  }, 30_000); // many random attics: correctness, not a timing check

  it("when a passive vent is added, then the provided NFA never goes down", () => {
    fc.assert(
      fc.property(atticArb(), passiveVentArb("added"), (input, vent) => {
        const before = analyzeAttic(input).provided;
        const after = analyzeAttic({ ...input, vents: [...input.vents, vent] }).provided;
        expect(after.totalSqIn).toBeGreaterThanOrEqual(before.totalSqIn);
        expect(after.intakeSqIn).toBeGreaterThanOrEqual(before.intakeSqIn);
        expect(after.exhaustSqIn).toBeGreaterThanOrEqual(before.exhaustSqIn);
      }),
      { numRuns: 300 },
    );
  }, 30_000); // many random attics: correctness, not a timing check

  it("when input is broken anywhere, then it is rejected with a message and never yields NaN", () => {
    const breakers: Array<(x: Record<string, unknown>) => unknown> = [
      (x) => ({ ...x, climateZone: 9 }),
      (x) => ({ ...x, climateZone: Number.NaN }),
      (x) => ({ ...x, sections: [] }),
      (x) => ({ ...x, sections: [{ kind: "rect", lengthFt: -10, widthFt: 20 }] }),
      (x) => ({ ...x, sections: [{ kind: "area", areaSqFt: Number.POSITIVE_INFINITY }] }),
      (x) => ({ ...x, sections: [{ kind: "polygon", pointsFt: [[0, 0], [10, 10], [10, 0], [0, 10]] }] }),
      (x) => ({ ...x, vents: [{ id: "a", kind: "ridge", location: "upper" }] }),
      (x) => ({ ...x, vents: [{ id: "a", kind: "powered-roof", location: "upper", nfaSqIn: 50 }] }),
      (x) => ({ ...x, vents: [{ id: "a", kind: "box", location: "upper", nfaSqIn: Number.NaN }] }),
      (x) => ({ ...x, vents: [{ id: "a", kind: "box", location: "upper", nfaSqIn: 50 }, { id: "a", kind: "box", location: "upper", nfaSqIn: 50 }] }),
      (x) => ({ ...x, codeBasis: "irc-1999" }),
      () => null,
      () => "attic",
    ];
    fc.assert(
      fc.property(atticArb(3), fc.constantFrom(...breakers), (input, breaker) => {
        const result = tryAnalyzeAttic(breaker(input as unknown as Record<string, unknown>));
        expect(result.ok).toBe(false);
        if (!result.ok) {
          expect(result.issues.length).toBeGreaterThan(0);
          for (const issue of result.issues) expect(issue.message.length).toBeGreaterThan(0);
        }
        expect(() => analyzeAttic(breaker(input as unknown as Record<string, unknown>) as never)).toThrow();
      }),
      { numRuns: 200 },
    );
  }, 30_000); // many random attics: correctness, not a timing check
});

describe("summary", () => {
  it("when the attic passes, then the summary says so with the numbers", () => {
    const a = analyzeAttic(attic({ codeBasis: "strict-150", vents: [soffit("s", 800), ridge("r", 700)] }));
    expect(a.summary).toBe("Meets the code minimum: 1,500 sq in of vent area provided, 1,440 sq in required at 1/150.");
  });
});

describe("TSDoc examples", () => {
  it("when the analyzeAttic example runs, then its reasons read as the TSDoc shows", () => {
    const a = analyzeAttic({ codeBasis: "strict-150", climateZone: 4, ceilingVaporRetarder: "none", roofColor: "medium", sections: [{ kind: "area", areaSqFt: 1500 }], vents: [] });
    expect(a.requirement.totalSqIn).toBe(1440);
    expect(a.requirement.reasons.at(-2)).toBe("Required: 1,500 sq ft ÷ 150 = 10 sq ft = 1,440 sq in.");
  });
  it("when the tryAnalyzeAttic example runs, then it is not ok", () => {
    expect(tryAnalyzeAttic({ codeBasis: "irc-2018" }).ok).toBe(false);
  });
});
