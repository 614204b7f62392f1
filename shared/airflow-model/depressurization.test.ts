import { describe, expect, it } from "vitest";
import { depressurizationCheck } from "./depressurization";

// Combustion-appliance-zone limits of home-performance testing (BPI combustion safety tables,
// from memory, not verified here): −2 Pa for an orphan natural-draft water heater, the strictest.
describe("depressurizationCheck", () => {
  it("when an atmospheric appliance is recorded and the fans pull the house 2.6 Pa, then it is past the −2 Pa limit and says so", () => {
    const check = depressurizationCheck({ houseDepressurizationByFansPa: -2.6 }, { atmosphericCombustionAppliance: true });
    expect(check.limitPa).toBe(-2);
    expect(check.isOverLimit).toBe(true);
    expect(check.sentence).toMatch(/^Caution: /);
    expect(check.sentence).toContain("2.6 Pa");
    expect(check.sentence).toContain("worst-case depressurization");
  });

  it("when the pull is 1.5 Pa, then it is within the limit but still sends the homeowner to a test", () => {
    const check = depressurizationCheck({ houseDepressurizationByFansPa: -1.5 }, { atmosphericCombustionAppliance: true });
    expect(check.isOverLimit).toBe(false);
    expect(check.sentence).toContain("other exhaust fans and the dryer add to it");
  });

  it("when no appliance is recorded, then no limit applies and the words say to test if there is one", () => {
    const check = depressurizationCheck({ houseDepressurizationByFansPa: -3 }, {});
    expect(check.limitPa).toBeNull();
    expect(check.isOverLimit).toBe(false);
    expect(check.sentence).toContain("if there is one");
  });

  it("when no fan runs, then there is no pull", () => {
    const check = depressurizationCheck({ houseDepressurizationByFansPa: null }, { atmosphericCombustionAppliance: true });
    expect(check.isOverLimit).toBe(false);
    expect(check.byFansPa).toBeNull();
  });
});
