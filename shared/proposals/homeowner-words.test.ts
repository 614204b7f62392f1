import { describe, expect, it } from "vitest";
import { FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "../diagnostics/cautions";
import { interpretThermostatTest, interpretWindingResistance } from "../diagnostics/fan-diagnostics";
import { FINDING_CODES } from "../ventilation/findings";
import { homeownerFindings, homeownerSentence, homeownerTitle, toHomeownerFinding } from "./homeowner-words";

describe("findings in a homeowner's words", () => {
  it("when the fan's winding reads open, then the homeowner reads that the motor failed, without the meter reading's jargon or the technician's safety steps", () => {
    const f = toHomeownerFinding(interpretWindingResistance("open", ["fan-1"]));
    expect(f.title).toBe("The attic fan's motor has failed");
    expect(f.plain).toMatch(/motor has burned out/);
    expect(f.title + f.plain + f.detail).not.toMatch(/\bOL\b|winding/i);
    expect(f.detail).not.toContain(FAN_SAFETY_CAUTION);
    expect(f.detail).not.toMatch(/breaker|voltage tester/i);
  });

  it("when a thermostat test failed, then the homeowner reads the plain sentence, not the voltages or the live-voltage caution", () => {
    const f = toHomeownerFinding(interpretThermostatTest({ switchedLegVoltsDialBelow: 0, switchedLegVoltsDialAbove: 0 }, ["fan-1"]));
    expect(f.plain).toMatch(/switch that turns the fan on and off/);
    expect(f.detail).not.toContain(LIVE_VOLTAGE_TEST_CAUTION);
    expect(f.detail).toBe("");
  });

  it("when a finding is about the attic's venting, then its technical note (the rule and the numbers) is kept for the homeowner to unfold", () => {
    const f = toHomeownerFinding({ code: "below-minimum", severity: "critical", title: "Below the code minimum", detail: "The attic has 780 sq in; at 1/150 it needs 1,752 sq in." });
    expect(f.detail).toBe("The attic has 780 sq in; at 1/150 it needs 1,752 sq in.");
  });

  it("when the code is one the technician uses for their own checks, then the homeowner does not see it", () => {
    const shown = homeownerFindings([
      { code: "fan-power-verified", severity: "info", title: "Power verified off before the checks", detail: "…" },
      { code: "soffits-blocked", severity: "critical", title: "Soffit vents blocked", detail: "Half the soffit vents are covered." },
    ]);
    expect(shown.map((f) => f.code)).toEqual(["soffits-blocked"]);
    expect(shown[0]!.plain).toMatch(/insulation covers the vents/);
  });

  it("when a snapshot finding has a code this file does not know, then it keeps the core's title and has no invented sentence", () => {
    const [f] = homeownerFindings([{ code: "some-new-check", severity: "warning", title: "A new check the core added", detail: "Its detail." }]);
    expect(f).toMatchObject({ title: "A new check the core added", plain: null, detail: "Its detail." });
    expect(homeownerSentence("some-new-check")).toBeNull();
  });

  it("when an older snapshot stored no plain sentence, then it is supplied from the code", () => {
    const [f] = homeownerFindings([{ code: "bath-fan-into-attic", severity: "warning", title: "Bath fan exhausts into the attic", detail: "…" }]);
    expect(f!.plain).toMatch(/roof or wall cap/);
  });

  it("every plain sentence stands alone: it starts with a capital, ends with a full stop and does not lean on a sentence before it", () => {
    const codes = ["below-minimum", "no-intake", "no-exhaust", "exhaust-exceeds-intake", "powered-with-passive-exhaust", "mixed-exhaust", "gable-with-ridge", "fan-intake-short", "fan-undersized", "fan-oversized", "backdraft-risk", "exception-not-met", "upper-vent-too-low", "gable-fan-unsealed", "soffits-blocked", "baffles-missing", "bath-fan-into-attic", "appliance-exhaust-into-attic", "powered-fan-depressurization", "fan-winding-open", "fan-bearings-seized", "fan-thermostat-failed"];
    for (const code of codes) {
      const s = homeownerSentence(code);
      expect(s, code).toMatch(/^[A-Z].*\.$/);
      expect(s, code).not.toMatch(/^(Until then|This|That|It|They|Then|So)\b/);
    }
  });
});

describe("homeowner words for the new findings", () => {
  it.each([
    "meets-minimum-narrowly",
    "vents-blocked",
    "unvented-assembly",
    "vents-in-unvented-attic",
    "whole-house-fan-outlet-short",
    "whole-house-fan-operation",
    "fan-control-cold-climate",
    "fan-winding-shorted",
    "fan-winding-grounded",
  ] as const)("when a proposal shows %s, then it has a plain title of its own, not the trade title", (code) => {
    expect(FINDING_CODES).toContain(code);
    expect(homeownerTitle(code, "TRADE TITLE")).not.toBe("TRADE TITLE");
  });
  it("when the sealed-attic finding is shown to a homeowner, then it says no vents are needed", () => {
    expect(homeownerTitle("unvented-assembly", "")).toMatch(/needs no vents/);
  });
});
