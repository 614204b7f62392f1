import { describe, expect, it } from "vitest";
import { analyzeAttic, type AtticInput } from "../ventilation";
import { buildAirflowPicture } from "./build-airflow-picture";
import { DEMO_CASES } from "./demo-cases.test-helpers";
import { describeAirflowPicture, joinPlaces } from "./describe-airflow-picture";

const describeCase = (input: AtticInput) => describeAirflowPicture(buildAirflowPicture(input, analyzeAttic(input)));

describe("describeAirflowPicture", () => {
  it("when ridge and soffits are balanced, then it says air enters at both soffits and leaves at the ridge", () => {
    expect(describeCase(DEMO_CASES.balanced)).toBe(
      "A cut through the gable roof, 30 ft across at a 6/12 pitch. Air enters at both soffits and leaves at the ridge vent.",
    );
  });

  it("when a gable fan shares the attic with a ridge vent, then it names the short-circuit through the ridge", () => {
    const text = describeCase(DEMO_CASES.gableFanRidge);
    expect(text).toContain("Air enters at both soffits and leaves at the gable fan.");
    expect(text).toContain("Short-circuit A: The gable fan pulls outside air in through the ridge vent instead of through the soffits");
  });

  it("when there is no intake, then it says so", () => {
    expect(describeCase(DEMO_CASES.noIntake)).toContain("There is no intake at the eaves.");
  });

  it("when the soffits are blocked, then it says insulation covers them", () => {
    expect(describeCase(DEMO_CASES.blockedSoffits)).toContain("Blocked: insulation covers the soffit vents");
  });
});

describe("joinPlaces", () => {
  it("when both soffits are listed, then it says both soffits", () => {
    expect(joinPlaces(["the left soffit", "the right soffit"])).toBe("both soffits");
  });
  it("when three places are listed, then it joins them with commas and 'and'", () => {
    expect(joinPlaces(["the box vents", "the ridge vent", "the gable fan"])).toBe("the box vents, the ridge vent and the gable fan");
  });
});
