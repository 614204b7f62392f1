import { describe, expect, it } from "vitest";
import { optionFixes } from "./option-fixes";
import type { SnapshotAnalysis, SnapshotFinding, SnapshotSpace } from "./types";

const analysis = (findings: SnapshotFinding[], compliant: boolean): SnapshotAnalysis => ({
  floorAreaSqFt: 1200, compliant, summary: "", findings, hasPoweredFan: false, fan: null,
  requirement: { ratio: 150, totalSqIn: 1152, totalSqFt: 8, upperMinSqIn: 461, upperMaxSqIn: 576, lowerMinSqIn: 576, reasons: [] },
  provided: { intakeSqIn: 300, exhaustSqIn: 648, totalSqIn: 948 },
});
const space = (findings: SnapshotFinding[], compliant: boolean, name = "Main attic", spaceId = "s1"): SnapshotSpace => ({ spaceId, name, analysis: analysis(findings, compliant), picture: null, pictureDescription: [], issues: [] });
const blocked: SnapshotFinding = { code: "soffits-blocked", severity: "critical", title: "Soffit vents blocked", detail: "…" };
const bathFan: SnapshotFinding = { code: "bath-fan-into-attic", severity: "warning", title: "Bath fan exhausts into the attic", detail: "…" };
const info: SnapshotFinding = { code: "powered-fan-depressurization", severity: "info", title: "Powered fans can depressurize the house", detail: "…" };

describe("what an option fixes", () => {
  it("when the option's attic no longer reports a problem, then it is listed as fixed in the homeowner's words; one it still reports is left", () => {
    const result = optionFixes([space([blocked, bathFan, info], false)], { after: [space([bathFan], true)] });
    expect(result).toEqual({ fixed: ["Insulation is blocking the vents under the eaves"], left: ["A bathroom fan blows damp air into the attic"], meetsCode: true });
  });

  it("when there are several spaces, then each problem names its space", () => {
    const before = [space([blocked], false, "Main attic", "s1"), space([blocked], false, "Garage attic", "s2")];
    const result = optionFixes(before, { after: [space([], true, "Main attic", "s1"), space([blocked], false, "Garage attic", "s2")] });
    expect(result.fixed).toEqual(["Main attic: Insulation is blocking the vents under the eaves"]);
    expect(result.left).toEqual(["Garage attic: Insulation is blocking the vents under the eaves"]);
    expect(result.meetsCode).toBe(false);
  });

  it("when the option meets the code, then the cured shortfall is said once, as meeting the code, not again as a fix", () => {
    const below: SnapshotFinding = { code: "below-minimum", severity: "critical", title: "Below the code minimum", detail: "…" };
    expect(optionFixes([space([below, blocked], false)], { after: [space([], true)] })).toEqual({ fixed: ["Insulation is blocking the vents under the eaves"], left: [], meetsCode: true });
  });

  it("when the option's attic could not be analysed, then nothing is claimed as fixed", () => {
    const after: SnapshotSpace = { spaceId: "s1", name: "Main attic", analysis: null, picture: null, pictureDescription: [], issues: ["No attic floor was measured."] };
    expect(optionFixes([space([blocked], false)], { after: [after] })).toEqual({ fixed: [], left: ["Insulation is blocking the vents under the eaves"], meetsCode: false });
  });
});
