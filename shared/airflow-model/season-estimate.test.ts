import { describe, expect, it } from "vitest";
import { attic, roofFan, soffit, ridge } from "../ventilation/test-helpers";
import { beforeAfterRows, DEFAULT_ESTIMATE_CONDITIONS, estimateAirflow } from "./index";

describe("estimateAirflow and beforeAfterRows", () => {
  const withFan = attic({ vents: [soffit("s", 200), roofFan("f", 1200)], site: { atmosphericCombustionAppliance: true } });
  const passive = attic({ vents: [soffit("s", 720), ridge("r", 720)], site: { atmosphericCombustionAppliance: true } });

  it("when the fan is removed for a ridge vent, then summer house air drawn falls to the attic's own stack draw and the rows say so", () => {
    const before = estimateAirflow(withFan, DEFAULT_ESTIMATE_CONDITIONS);
    const after = estimateAirflow(passive, DEFAULT_ESTIMATE_CONDITIONS);
    expect(before.summer.fanCfm).toBeGreaterThan(0); // runs: the attic at 130 °F is over the 100 °F default set point
    expect(before.winter.fanCfm).toBe(0); // off at 30 °F
    expect(before.summer.houseAirDrawnCfm).toBeGreaterThan(100);
    // The hot attic's own stack still lifts a little house air through the ceiling.
    expect(after.summer.houseAirDrawnCfm).toBeLessThan(before.summer.houseAirDrawnCfm / 4);
    const rows = beforeAfterRows(before, after);
    const summerHouse = rows.find((r) => r.season === "summer" && r.label === "house air drawn into the attic")!;
    expect(summerHouse.after).toBe(`${Math.round(after.summer.houseAirDrawnCfm)} cfm`);
    expect(summerHouse.sentence).toMatch(/^Summer: house air drawn into the attic \d[\d,]* cfm → \d+ cfm$/);
    expect(rows.find((r) => r.label === "fans' pull on the house" && r.season === "summer")!.after).toBe("no fan");
    expect(before.summer.depressurization.limitPa).toBe(-2);
  });

  it("when nothing runs in winter, then no pull row is shown for winter", () => {
    const rows = beforeAfterRows(estimateAirflow(passive, DEFAULT_ESTIMATE_CONDITIONS), estimateAirflow(passive, DEFAULT_ESTIMATE_CONDITIONS));
    expect(rows.filter((r) => r.season === "winter").map((r) => r.label)).toEqual(["house air drawn into the attic", "attic air changes"]);
  });
});
