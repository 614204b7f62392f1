import { describe, expect, it } from "vitest";
import { COMBUSTION_SAFETY_CAUTION } from "../diagnostics/cautions";
import { analyzeAttic } from "./analyze-attic";
import type { Finding, FindingCode } from "./findings";
import { attic, box, ridge, roofFan, soffit } from "./test-helpers";

const codes = (findings: Finding[]) => findings.map((f) => f.code);
const find = (findings: Finding[], code: FindingCode) => findings.find((f) => f.code === code);

describe("ventilation findings", () => {
  it("when vent area is below the minimum, then below-minimum is critical and says how short", () => {
    const a = analyzeAttic(attic({ codeBasis: "strict-150", vents: [soffit("s", 600), ridge("r", 500)] }));
    const f = find(a.findings, "below-minimum");
    expect(f?.severity).toBe("critical");
    expect(f?.detail).toContain(`${1440 - 1100} sq in short`);
    expect(a.compliant).toBe(false);
  });

  it("when there are no intake vents, then no-intake is critical; with neither, no-exhaust too", () => {
    expect(codes(analyzeAttic(attic({ vents: [ridge("r", 1500)] })).findings)).toContain("no-intake");
    const empty = analyzeAttic(attic({ vents: [] }));
    expect(codes(empty.findings)).toEqual(expect.arrayContaining(["no-intake", "no-exhaust", "below-minimum"]));
  });

  it("when only a powered fan exhausts, then no-exhaust is not reported (the fan is the exhaust)", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 1500), roofFan("f", 1000)] }));
    expect(codes(a.findings)).not.toContain("no-exhaust");
  });

  it("when exhaust exceeds intake, then exhaust-exceeds-intake is a warning [BC Housing S18; IRC 2012+ 50 % cap]", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 600), ridge("r", 900)] }));
    expect(find(a.findings, "exhaust-exceeds-intake")?.severity).toBe("warning");
  });

  it("when a powered fan shares the attic with a ridge vent, then powered-with-passive-exhaust is critical and names both (common practice, S19)", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 1500), ridge("r", 500), roofFan("f", 1000)] }));
    const f = find(a.findings, "powered-with-passive-exhaust");
    expect(f?.severity).toBe("critical");
    expect(f?.ventIds).toEqual(["f", "r"]);
  });

  it("when a ridge vent and box vents are mixed, then mixed-exhaust is a warning (common practice, S19)", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 1500), ridge("r", 500), box("b", 200)] }));
    expect(find(a.findings, "mixed-exhaust")?.ventIds).toEqual(["r", "b"]);
  });

  it("when gable louvers and a ridge vent are together, then gable-with-ridge is reported without a duplicate mixed-exhaust", () => {
    const gable = { id: "g", kind: "gable-louver" as const, location: "upper" as const, nfaSqIn: 150 };
    const a = analyzeAttic(attic({ vents: [soffit("s", 1500), ridge("r", 500), gable] }));
    expect(codes(a.findings)).toContain("gable-with-ridge");
    expect(codes(a.findings)).not.toContain("mixed-exhaust");
  });

  it("when a 1,200 cfm fan has 500 sq in of intake, then fan-intake-short: 1,200 ÷ 300 × 144 = 576 > 500 (HVI)", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 500), roofFan("f", 1200)] }));
    expect(a.fan?.intakeNeededSqIn).toBe(576);
    expect(find(a.findings, "fan-intake-short")?.detail).toContain("1,200 ÷ 300 × 144 = 576 sq in");
  });

  it("when the fan is far under or over the recommendation, then fan-undersized / fan-oversized (Eavesight thresholds, common practice)", () => {
    // 1,500 sq ft × 0.7 = 1,050 cfm recommended; 75 % = 787.5; 150 % = 1,575
    expect(codes(analyzeAttic(attic({ vents: [soffit("s", 2000), roofFan("f", 700)] })).findings)).toContain("fan-undersized");
    expect(codes(analyzeAttic(attic({ vents: [soffit("s", 2000), roofFan("f", 800)] })).findings)).not.toContain("fan-undersized");
    expect(codes(analyzeAttic(attic({ vents: [soffit("s", 2000), roofFan("f", 1600)] })).findings)).toContain("fan-oversized");
  });

  it("when a powered fan is in a house with an atmospheric appliance, then backdraft-risk is critical and asks for a combustion safety test [SOURCES.md §5.1: S13 field study, S14]", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 2000), roofFan("f", 1000)], site: { atmosphericCombustionAppliance: true } }));
    const f = find(a.findings, "backdraft-risk");
    expect(f?.severity).toBe("critical");
    expect(f?.detail).toMatch(/combustion safety/);
    expect(f?.caution).toBe(COMBUSTION_SAFETY_CAUTION);
    expect(a.findings[0]?.severity).toBe("critical");
  });

  it("when a powered fan is present and no appliance is recorded, then the depressurization caution is still given (DESIGN §7)", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 2000), roofFan("f", 1000)] }));
    expect(codes(a.findings)).not.toContain("backdraft-risk");
    expect(find(a.findings, "powered-fan-depressurization")?.detail).toContain(COMBUSTION_SAFETY_CAUTION);
  });

  it("when a gable fan is not sealed to its opening, then gable-fan-unsealed is reported", () => {
    const gableFan = { id: "gf", kind: "powered-gable" as const, location: "upper" as const, cfm: 1000 };
    const a = analyzeAttic(attic({ vents: [soffit("s", 2000), gableFan], site: { gableFanSealed: false } }));
    expect(find(a.findings, "gable-fan-unsealed")?.ventIds).toEqual(["gf"]);
    const sealed = analyzeAttic(attic({ vents: [soffit("s", 2000), { ...gableFan, sealedToOpening: true }], site: { gableFanSealed: false } }));
    expect(codes(sealed.findings)).not.toContain("gable-fan-unsealed");
  });

  it("when soffits are blocked, then soffits-blocked cites IRC R806.3's 1 in air space and the attic is not compliant", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 1000), ridge("r", 800)], site: { soffitsBlocked: true } }));
    expect(find(a.findings, "soffits-blocked")?.detail).toMatch(/R806\.3.*1 in/);
    expect(a.provided.totalSqIn).toBeGreaterThanOrEqual(a.requirement.totalSqIn);
    expect(a.compliant).toBe(false);
  });

  it("when baffles are missing or a bath fan dumps into the attic, then each is a warning", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 1000), ridge("r", 800)], site: { bafflesPresent: false, bathFanIntoAttic: true } }));
    expect(find(a.findings, "baffles-missing")?.severity).toBe("warning");
    expect(find(a.findings, "bath-fan-into-attic")?.severity).toBe("warning");
  });

  it("when the vents would meet 1/300 but the exception fails, then exception-not-met is a warning that says what falls short", () => {
    // 2018, zone 6, no retarder: 720 sq in meets 1/300 but not 1/150
    const a = analyzeAttic(attic({ climateZone: 6, vents: [soffit("s", 400), ridge("r", 320)] }));
    const f = find(a.findings, "exception-not-met");
    expect(f?.severity).toBe("warning");
    expect(f?.detail).toMatch(/zone 6/);
  });

  it("when every finding is produced, then each has a title, a detail and only known vent ids", () => {
    const a = analyzeAttic(
      attic({
        vents: [soffit("s", 300), ridge("r", 900), box("b", 100, { dropBelowRidgeFt: 6 }), roofFan("f", 3000, { diagnostics: { isPowerVerifiedOff: false } })],
        site: { atmosphericCombustionAppliance: true, soffitsBlocked: true, bathFanIntoAttic: true },
      }),
    );
    const ids = new Set(["s", "r", "b", "f"]);
    for (const f of a.findings) {
      expect(f.title.length).toBeGreaterThan(0);
      expect(f.detail.length).toBeGreaterThan(20);
      for (const id of f.ventIds) expect(ids.has(id)).toBe(true);
    }
    const order = a.findings.map((f) => ["critical", "warning", "info"].indexOf(f.severity));
    expect(order).toEqual([...order].sort((x, y) => x - y));
  });
});
