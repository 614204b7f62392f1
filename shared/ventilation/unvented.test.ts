import { describe, expect, it } from "vitest";
import { generateOptions } from "../design/generate-options";
import { demoCatalog } from "../design/demo-catalog.test-helpers";
import { analyzeAttic } from "./analyze-attic";
import type { AtticInput, UnventedAssembly } from "./schema";
import { attic, box, roofFan } from "./test-helpers";
import { minCondensationControlR } from "./unvented";

// IRC R806.5 (2012–2024; R806.4 in 2006/2009) "Unvented attic and unvented enclosed rafter
// assemblies" [SOURCES.md S7: the 2015 title and its five conditions; S25 from memory: the
// conditions and Table R806.5].
const foam: UnventedAssembly = { insulation: "air-impermeable-only", airImpermeableRValue: 21, foamIsClassII: true, isInsideThermalEnvelope: true, roofCovering: "asphalt-shingles" };
const sealed = (extra: Partial<AtticInput> = {}, assembly: Partial<UnventedAssembly> = {}) =>
  analyzeAttic(attic({ climateZone: 5, moistureRegime: "A", assembly: "unvented", unvented: { ...foam, ...assembly }, ...extra }));

describe("unvented attic assemblies (IRC R806.5)", () => {
  it("when a spray-foam attic has no vents, then there is no 'add vents' finding: no vent area is required and it complies", () => {
    const a = sealed();
    const codes = a.findings.map((f) => f.code);
    for (const harmful of ["below-minimum", "no-intake", "no-exhaust", "exception-not-met"] as const) expect(codes).not.toContain(harmful);
    expect(a.assembly).toBe("unvented");
    expect(a.requirement.totalSqIn).toBe(0);
    expect(a.compliant).toBe(true);
    expect(codes).toContain("unvented-assembly");
    expect(a.summary).toMatch(/needs no vent area, and none should be added/);
  });

  it("when no finding of a sealed attic says to add vents, then its words never ask for them (never recommend vents into a foam-insulated attic)", () => {
    const a = sealed({ vents: [box("b", 50)] }, { isInsideThermalEnvelope: false });
    for (const f of a.findings) expect(f.detail).not.toMatch(/\badd (vent|intake|exhaust|soffit)/i);
    expect(a.findings.find((f) => f.code === "vents-in-unvented-attic")?.ventIds).toEqual(["b"]);
    expect(a.compliant).toBe(false);
  });

  it("when the design generator gets a sealed attic, then it proposes no option at all", () => {
    const space = {
      name: "Main attic",
      roof: { form: "gable" as const, pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80, assembly: "unvented" as const, unvented: foam },
      sections: [{ kind: "rect" as const, lengthFt: 40, widthFt: 30 }],
      vents: [],
      site: {},
      notes: null,
    };
    const result = generateOptions({ project: { codeBasis: "irc-2018", climateZone: 5, ceilingVaporRetarder: "none", roofColor: "medium" }, spaceId: "s1", space, catalog: demoCatalog() });
    expect(result.options).toEqual([]);
    expect(result.skipped.every((s) => /never proposes vents/.test(s.reason))).toBe(true);
  });

  it("when the attic is not inside the thermal envelope, then condition 1 is not met", () => {
    const a = sealed({}, { isInsideThermalEnvelope: false });
    expect(a.unvented?.conditions.find((c) => c.id === "inside-envelope")?.status).toBe("not-met");
    expect(a.findings.map((f) => f.code)).toContain("unvented-condition-not-met");
  });

  it("when a Class I vapor retarder is at the ceiling, then condition 2 is not met", () => {
    expect(sealed({ ceilingVaporRetarder: "class-I" }).unvented?.conditions.find((c) => c.id === "no-class-i-retarder")?.status).toBe("not-met");
  });

  it("when wood shakes have no 1/4 in vented gap, then condition 3 is not met", () => {
    expect(sealed({}, { roofCovering: "wood-shingles-or-shakes", hasVentedGapUnderShakes: false }).unvented?.conditions.find((c) => c.id === "shingle-shake-gap")?.status).toBe("not-met");
  });

  it("when open-cell foam without a Class II coating is in zone 5, then condition 4 is not met; in zone 3 it does not apply", () => {
    expect(sealed({}, { foamIsClassII: false }).unvented?.conditions.find((c) => c.id === "class-ii-retarder")?.status).toBe("not-met");
    expect(sealed({ climateZone: 3 }, { foamIsClassII: false }).unvented?.conditions.find((c) => c.id === "class-ii-retarder")?.status).toBe("not-applicable");
  });

  it("when batts alone are at the roof line, then the insulation condition is not met", () => {
    expect(sealed({}, { insulation: "air-permeable-only" }).unvented?.conditions.find((c) => c.id === "insulation")?.status).toBe("not-met");
  });

  it.each([
    [1, null, 5],
    [3, "C", 5],
    [4, "C", 10],
    [4, "A", 15],
    [4, "B", 15],
    [5, "A", 20],
    [6, "B", 25],
    [7, null, 30],
    [8, null, 35],
  ] as const)("Table R806.5: zone %d%s needs R-%d of air-impermeable insulation under air-permeable insulation", (zone, regime, r) => {
    expect(minCondensationControlR(zone, regime).rValue).toBe(r);
    const at = (rValue: number) =>
      analyzeAttic(attic({ climateZone: zone, moistureRegime: regime, assembly: "unvented", unvented: { ...foam, insulation: "air-impermeable-and-air-permeable", airImpermeableRValue: rValue } })).unvented?.conditions.find((c) => c.id === "insulation")?.status;
    expect(at(r)).toBe("met");
    expect(at(r - 0.5)).toBe("not-met");
  });

  it("when zone 4 has no moisture letter, then the stricter 4A/4B figure is used and said so", () => {
    const t = minCondensationControlR(4, null);
    expect(t).toMatchObject({ rValue: 15, isAssumed: true });
    expect(t.zoneText).toMatch(/not recorded/);
  });

  it("when a sealed attic has a powered fan and a natural-draft appliance, then the backdraft warning still shows", () => {
    const a = sealed({ vents: [roofFan("f", 1000)], site: { atmosphericCombustionAppliance: true } });
    expect(a.findings.map((f) => f.code)).toEqual(expect.arrayContaining(["vents-in-unvented-attic", "backdraft-risk"]));
  });

  it("when 'unvented' is chosen without saying how it is insulated, then the input is refused with a clear message", () => {
    expect(() => analyzeAttic(attic({ assembly: "unvented" }))).toThrow(/how the unvented roof is insulated/);
  });

  it("when an older survey has no assembly, then it is analysed as vented (backwards compatible)", () => {
    expect(analyzeAttic(attic()).assembly).toBe("vented");
  });
});
