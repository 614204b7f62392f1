import { describe, expect, it } from "vitest";
import { analyzeAttic } from "./analyze-attic";
import { checkRafterBays } from "./rafter-bays";
import type { Vent } from "./schema";
import { attic } from "./test-helpers";

// IRC R806.1: enclosed rafter spaces need cross ventilation for each separate space [SOURCES.md S1, S16];
// R806.2's 1/150 applies per bay. 10 bays at 24 in over 400 sq ft: 40 sq ft a bay → 38.4 sq in.
const cathedral = (vents: Vent[]) =>
  analyzeAttic(attic({ codeBasis: "strict-150", sections: [{ kind: "area", areaSqFt: 400 }], enclosedRafterBays: { bayCount: 10, baySpacingIn: 24 }, vents }));

describe("enclosed rafter bays (IRC R806.1, per bay)", () => {
  it("when 10 bays at 24 in share 400 sq ft, then each needs 40 ÷ 150 × 144 = 38.4 sq in", () => {
    expect(checkRafterBays({ bayCount: 10, baySpacingIn: 24 }, 400, 150, [])).toMatchObject({ bayAreaSqFt: 40, requiredPerBaySqIn: 38.4 });
  });

  it("when continuous soffit and ridge run the full 20 ft across all 10 bays, then every bay is cross-ventilated and meets its share", () => {
    // 9 sq in/ft soffit → 18 sq in a bay; 12 sq in/ft ridge → 24 sq in a bay: 42 ≥ 38.4
    const a = cathedral([
      { id: "s", kind: "soffit-continuous", location: "lower", lengthFt: 20, nfaSqInPerFt: 9 },
      { id: "r", kind: "ridge", location: "upper", lengthFt: 20, nfaSqInPerFt: 12 },
    ]);
    expect(a.rafterBays).toMatchObject({ baysWithIntake: 10, baysWithExhaust: 10, isMet: true });
    expect(a.compliant).toBe(true);
  });

  it("when the total area is enough but 4 individual roof vents serve 10 bays, then 6 bays have no exhaust: not compliant", () => {
    const a = cathedral([
      { id: "s", kind: "soffit-continuous", location: "lower", lengthFt: 20, nfaSqInPerFt: 9 },
      { id: "b", kind: "box", location: "upper", quantity: 4, nfaSqInPerUnit: 100 },
    ]);
    expect(a.provided.totalSqIn).toBeGreaterThanOrEqual(a.requirement.totalSqIn); // 580 ≥ 384 overall
    expect(a.rafterBays).toMatchObject({ baysWithExhaust: 4, isMet: false });
    expect(a.compliant).toBe(false);
    expect(a.findings.find((f) => f.code === "rafter-bays-not-vented")?.detail).toMatch(/6 of 10 lack/);
  });

  it("when every bay is vented but each gets less than its share, then it says how much each needs", () => {
    const a = cathedral([
      { id: "s", kind: "soffit-continuous", location: "lower", lengthFt: 20, nfaSqInPerFt: 5 },
      { id: "r", kind: "ridge", location: "upper", lengthFt: 20, nfaSqInPerFt: 5 },
    ]);
    expect(a.rafterBays?.isMet).toBe(false); // 10 + 10 = 20 < 38.4
    expect(a.findings.find((f) => f.code === "rafter-bays-not-vented")?.detail).toMatch(/38\.4 sq in/);
  });

  it("when a space is not rafter bays (older surveys), then there is no per-bay check", () => {
    expect(analyzeAttic(attic()).rafterBays).toBeNull();
  });
});
