import { describe, expect, it } from "vitest";
import { providedNfa } from "./balance";
import { ventNfa } from "./vent-nfa";

describe("providedNfa", () => {
  it("when soffits give 720 and a ridge 480, then intake 720, exhaust 480, intake share 720 ÷ 1,200 = 0.6", () => {
    const p = providedNfa([
      ventNfa({ id: "s", kind: "soffit-continuous", location: "lower", nfaSqIn: 720 }),
      ventNfa({ id: "r", kind: "ridge", location: "upper", nfaSqIn: 480 }),
      ventNfa({ id: "f", kind: "solar-powered", location: "upper", cfm: 800 }),
    ]);
    expect(p).toMatchObject({ intakeSqIn: 720, exhaustSqIn: 480, totalSqIn: 1200, poweredCfm: 800 });
    expect(p.intakeShare).toBeCloseTo(720 / 1200, 12);
  });

  it("when there are no passive vents, then the share is null, not NaN", () => {
    expect(providedNfa([]).intakeShare).toBeNull();
  });
});
