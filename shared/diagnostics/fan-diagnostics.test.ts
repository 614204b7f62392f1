import { describe, expect, it } from "vitest";
import { analyzeAttic } from "../ventilation/analyze-attic";
import { attic, roofFan, soffit } from "../ventilation/test-helpers";
import { FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "./cautions";
import { checkPowerVerifiedOff, diagnoseFan, interpretBladeSpin, interpretCapacitor, interpretThermostatTest, interpretWindingResistance, interpretWindingToGround } from "./fan-diagnostics";

describe("interpretWindingResistance (common practice, from memory)", () => {
  it.each([1, 12, 45, 100])("when the winding reads %d ohms, then it is plausible", (ohms) => {
    expect(interpretWindingResistance(ohms, ["f"]).code).toBe("fan-winding-ok");
  });
  it.each(["open" as const, 1_000_000, 20_000_000])("when the winding reads %s, then it is open: replace the motor", (reading) => {
    const f = interpretWindingResistance(reading, ["f"]);
    expect(f).toMatchObject({ code: "fan-winding-open", severity: "critical", ventIds: ["f"] });
    expect(f.detail).toMatch(/Replace the motor/);
  });
  it("when the winding reads kilohms, then the reading is suspect and should be rechecked", () => {
    expect(interpretWindingResistance(5_000, ["f"]).code).toBe("fan-winding-suspect");
  });
  it("when power was not verified off, then the reading is not interpreted", () => {
    expect(interpretWindingResistance(12, ["f"], false).code).toBe("fan-power-not-verified");
  });
});

describe("interpretThermostatTest (common practice)", () => {
  it("when ~120 V with the dial below the attic temperature and ~0 V above, then the thermostat is fine", () => {
    const f = interpretThermostatTest({ atticTempF: 104, switchedLegVoltsDialBelow: 121, switchedLegVoltsDialAbove: 0.2 }, ["f"]);
    expect(f.code).toBe("fan-thermostat-ok");
    expect(f.detail).toMatch(/90 °F/);
    expect(f.caution).toContain(LIVE_VOLTAGE_TEST_CAUTION);
  });
  it("when 0 V both ways, then it has failed open (after checking supply)", () => {
    const f = interpretThermostatTest({ switchedLegVoltsDialBelow: 0, switchedLegVoltsDialAbove: 0 }, ["f"]);
    expect(f.code).toBe("fan-thermostat-failed");
    expect(f.detail).toMatch(/supply/);
  });
  it("when 120 V both ways, then it is stuck closed", () => {
    expect(interpretThermostatTest({ switchedLegVoltsDialBelow: 120, switchedLegVoltsDialAbove: 119 }, ["f"]).title).toMatch(/never switches the fan off/);
  });
  it("when a partial voltage is read, then the test is inconclusive", () => {
    expect(interpretThermostatTest({ switchedLegVoltsDialBelow: 60, switchedLegVoltsDialAbove: 0 }, ["f"]).code).toBe("fan-thermostat-inconclusive");
  });
});

describe("blade and power checks", () => {
  it("when the blade does not spin freely, then the sealed bearings are seized: replace, do not oil", () => {
    const f = interpretBladeSpin(false, ["f"]);
    expect(f.code).toBe("fan-bearings-seized");
    expect(f.detail).toMatch(/Do not oil/);
    expect(interpretBladeSpin(true, ["f"]).code).toBe("fan-bearings-ok");
  });
  it("when power is not verified off, then it is critical and every diagnostic finding carries the safety caution", () => {
    const f = checkPowerVerifiedOff(false, ["f"]);
    expect(f.severity).toBe("critical");
    for (const finding of [f, interpretBladeSpin(false), interpretWindingResistance("open"), checkPowerVerifiedOff(true)]) {
      expect(finding.caution).toContain(FAN_SAFETY_CAUTION);
      expect(finding.detail).toContain("licensed electrician");
    }
  });
});

describe("diagnoseFan and analyzeAttic", () => {
  it("when readings are taken without confirming power off, then only the stop finding is returned for the hands-on checks", () => {
    expect(diagnoseFan({ windingResistanceOhms: 12, isBladeFreeToSpin: true }, "f").map((f) => f.code)).toEqual(["fan-power-not-verified"]);
  });
  it("when a powered vent carries diagnostics, then analyzeAttic includes their findings", () => {
    const a = analyzeAttic(
      attic({
        vents: [soffit("s", 2000), roofFan("f", 1000, { diagnostics: { isPowerVerifiedOff: true, isLockedOut: true, isTesterProven: true, windingResistanceOhms: "open", isBladeFreeToSpin: false } })],
      }),
    );
    const codes = a.findings.map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(["fan-winding-open", "fan-bearings-seized"]));
    expect(a.findings.find((f) => f.code === "fan-winding-open")?.ventIds).toEqual(["f"]);
  });
});

describe("TSDoc examples", () => {
  it("when the diagnoseFan example runs, then it gives the codes its TSDoc shows", () => {
    expect(diagnoseFan({ isPowerVerifiedOff: true, isLockedOut: true, isTesterProven: true, windingResistanceOhms: "open" }, "fan1").map((f) => f.code)).toEqual(["fan-power-verified", "fan-winding-open"]);
  });
});

// Winding checks (common practice, from memory [SOURCES.md S30]): a small fan motor's winding reads
// some ohms to some tens of ohms; 0 Ω or a fraction of an ohm is a short (or the meter is across
// shorted leads); winding to frame should read open (OL) or megohms.
describe("winding shorts, winding-to-frame and capacitor (common practice, from memory)", () => {
  it.each([0, 0.05, 0.4, 0.99])("when the winding reads %d ohms, then it is a short (or shorted leads), critical", (ohms) => {
    const f = interpretWindingResistance(ohms, ["f"]);
    expect(f).toMatchObject({ code: "fan-winding-shorted", severity: "critical" });
    expect(f.detail).toMatch(/short/);
  });
  it.each(["open" as const, 5_000_000, 1_000_000])("when winding-to-frame reads %s, then the insulation is fine", (reading) => {
    expect(interpretWindingToGround(reading, ["f"]).code).toBe("fan-ground-ok");
  });
  it.each([0, 200, 50_000, 999_999])("when winding-to-frame reads %d ohms, then the winding leaks to the frame: critical, do not re-energize", (ohms) => {
    const f = interpretWindingToGround(ohms, ["f"]);
    expect(f).toMatchObject({ code: "fan-winding-grounded", severity: "critical" });
    expect(f.detail).toMatch(/Do not switch it back on/);
  });
  it("when a motor has a capacitor reading within its printed tolerance, then it is fine", () => {
    expect(interpretCapacitor({ ratedMicrofarads: 5, measuredMicrofarads: 5.2, tolerancePercent: 6 }, ["f"]).code).toBe("fan-capacitor-ok");
  });
  it("when a capacitor reads outside its tolerance (default ±6 %), then it has failed: replace it", () => {
    const f = interpretCapacitor({ ratedMicrofarads: 5, measuredMicrofarads: 4.6 }, ["f"]);
    expect(f).toMatchObject({ code: "fan-capacitor-failed", severity: "warning" });
    expect(f.detail).toMatch(/4\.7.*5\.3/);
    expect(f.caution).toMatch(/discharge/i);
  });
  it("when the motor has no capacitor (shaded-pole), then no capacitor finding is made", () => {
    expect(diagnoseFan({ isPowerVerifiedOff: true, isLockedOut: true, isTesterProven: true, hasCapacitor: false }, "f").map((x) => x.code)).toEqual(["fan-power-verified"]);
  });
  it("when winding-to-frame and capacitor readings are recorded, then diagnoseFan reports them", () => {
    const codes = diagnoseFan(
      { isPowerVerifiedOff: true, isLockedOut: true, isTesterProven: true, windingToGroundOhms: 2_000, hasCapacitor: true, capacitor: { ratedMicrofarads: 5, measuredMicrofarads: 2 } },
      "f",
    ).map((x) => x.code);
    expect(codes).toEqual(["fan-power-verified", "fan-winding-grounded", "fan-capacitor-failed"]);
  });
});

// Lock-out and prove-your-tester: OSHA 29 CFR 1910.147 (lockout/tagout) and NFPA 70E's
// live-dead-live test (check the tester on a known live source before and after) [SOURCES.md S31, S32; from memory].
describe("lock-out and prove-your-tester steps", () => {
  it("when the breaker was not locked out, then the hands-on readings are not interpreted: stop", () => {
    const codes = diagnoseFan({ isPowerVerifiedOff: true, isLockedOut: false, isTesterProven: true, windingResistanceOhms: 12 }, "f").map((x) => x.code);
    expect(codes).toEqual(["fan-lockout-missing"]);
  });
  it("when the tester was not proven on a known live source, then the 'dead' reading is not trusted: stop", () => {
    const codes = diagnoseFan({ isPowerVerifiedOff: true, isLockedOut: true, isTesterProven: false, windingResistanceOhms: 12 }, "f").map((x) => x.code);
    expect(codes).toEqual(["fan-tester-not-proven"]);
  });
  it("when an older record has power verified off but no lock-out or tester proof recorded, then the readings are kept and a warning asks for the steps", () => {
    const findings = diagnoseFan({ isPowerVerifiedOff: true, windingResistanceOhms: 12 }, "f");
    expect(findings.map((x) => x.code)).toEqual(["fan-power-verified", "fan-safety-steps-not-recorded", "fan-winding-ok"]);
    const steps = findings.find((x) => x.code === "fan-safety-steps-not-recorded");
    expect(steps?.severity).toBe("warning");
    expect(steps?.detail).toMatch(/lock/i);
    expect(steps?.detail).toMatch(/known live/);
  });
  it("the fan safety caution names lock-out and proving the tester", () => {
    expect(FAN_SAFETY_CAUTION).toMatch(/lock/i);
    expect(FAN_SAFETY_CAUTION).toMatch(/known live/);
  });
});
