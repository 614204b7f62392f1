import { describe, expect, it } from "vitest";
import { analyzeAttic } from "../ventilation/analyze-attic";
import { attic, roofFan, soffit } from "../ventilation/test-helpers";
import { fanControlFindings } from "./fan-controls";

// Fan controls: common practice, from memory [SOURCES.md S35] — no code section governs them.
describe("fan controls (common practice)", () => {
  it.each(["thermostat-and-humidistat", "always-on"] as const)("when a fan is on %s in climate zone 6, then it warns that it pulls moist house air into the attic", (control) => {
    const f = fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control }, 6).find((x) => x.code === "fan-control-cold-climate");
    expect(f?.severity).toBe("warning");
    expect(f?.detail).toMatch(/moist house air/);
  });
  it("when the same humidistat fan is in zone 3, then there is no cold-climate warning", () => {
    expect(fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "thermostat-and-humidistat" }, 3).map((x) => x.code)).not.toContain("fan-control-cold-climate");
  });
  it("when zone 5 is the boundary, then it counts as cold", () => {
    expect(fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "always-on" }, 5).map((x) => x.code)).toContain("fan-control-cold-climate");
    expect(fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "always-on" }, 4).map((x) => x.code)).not.toContain("fan-control-cold-climate");
  });
  it.each([
    [60, "warning"],
    [74, "warning"],
    [130, "info"],
  ] as const)("when the thermostat is set to %d °F, far from the usual ~90–110 °F, then it says so (%s)", (setPointF, severity) => {
    const f = fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "thermostat", thermostatSetPointF: setPointF }, 4).find((x) => x.code === "fan-set-point-unusual");
    expect(f?.severity).toBe(severity);
  });
  it.each([75, 90, 110, 120])("when the thermostat is set to %d °F, then no set-point finding", (setPointF) => {
    expect(fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "thermostat", thermostatSetPointF: setPointF }, 4).map((x) => x.code)).not.toContain("fan-set-point-unusual");
  });
  it("when a thermostat fan was never seen running, then the override test is asked for; when it failed, it is a warning", () => {
    expect(fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "thermostat" }, 4).map((x) => x.code)).toContain("fan-override-untested");
    expect(fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "thermostat", diagnostics: { overrideTest: "runs" } }, 4).map((x) => x.code)).not.toContain("fan-override-untested");
    expect(fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "thermostat", diagnostics: { overrideTest: "does-not-run" } }, 4).find((x) => x.code === "fan-override-failed")?.severity).toBe("warning");
  });
  it("when analyzeAttic meets a humidistat fan in zone 7, then the finding is in the analysis", () => {
    const a = analyzeAttic(attic({ climateZone: 7, vents: [soffit("s", 900), roofFan("f", 1000, { control: "thermostat-and-humidistat" })] }));
    expect(a.findings.map((f) => f.code)).toContain("fan-control-cold-climate");
  });
});
