import { describe, expect, it } from "vitest";
import { analyzeAttic } from "../ventilation/analyze-attic";
import { attic, roofFan, soffit } from "../ventilation/test-helpers";
import { FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "./cautions";
import { checkPowerVerifiedOff, diagnoseFan, interpretBladeSpin, interpretThermostatTest, interpretWindingResistance } from "./fan-diagnostics";

describe("interpretWindingResistance (common practice, from memory)", () => {
  it.each([0.4, 12, 45, 100])("when the winding reads %d ohms, then it is plausible", (ohms) => {
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
        vents: [soffit("s", 2000), roofFan("f", 1000, { diagnostics: { isPowerVerifiedOff: true, windingResistanceOhms: "open", isBladeFreeToSpin: false } })],
      }),
    );
    const codes = a.findings.map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(["fan-winding-open", "fan-bearings-seized"]));
    expect(a.findings.find((f) => f.code === "fan-winding-open")?.ventIds).toEqual(["f"]);
  });
});

describe("TSDoc examples", () => {
  it("when the diagnoseFan example runs, then it gives the codes its TSDoc shows", () => {
    expect(diagnoseFan({ isPowerVerifiedOff: true, windingResistanceOhms: "open" }, "fan1").map((f) => f.code)).toEqual(["fan-power-verified", "fan-winding-open"]);
  });
});
