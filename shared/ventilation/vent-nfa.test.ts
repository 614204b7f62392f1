import { describe, expect, it } from "vitest";
import { ventNfa } from "./vent-nfa";

describe("ventNfa", () => {
  it("when a ridge vent is 40 ft at 18 sq in per ft, then NFA = 40 × 18 = 720 sq in", () => {
    const v = ventNfa({ id: "r", kind: "ridge", location: "upper", lengthFt: 40, nfaSqInPerFt: 18 });
    expect(v.nfaSqIn).toBe(720);
    expect(v.explanation).toBe("40 ft × 18 sq in per ft = 720 sq in");
  });

  it("when 12 individual soffit vents of 25 sq in are recorded, then NFA = 12 × 25 = 300 sq in", () => {
    expect(ventNfa({ id: "s", kind: "soffit-individual", location: "lower", quantity: 12, nfaSqInPerUnit: 25 }).nfaSqIn).toBe(300);
  });

  it("when two 14 × 24 in louvers with louvers and 1/8 in mesh are recorded, then NFA = 2 × 336 ÷ 2.25 = 298.67 sq in (JLC field guide / USDA-FPL table; E7)", () => {
    const v = ventNfa({ id: "g", kind: "gable-louver", location: "upper", quantity: 2, grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } });
    expect(v.nfaSqIn).toBeCloseTo((2 * 336) / 2.25, 2);
    expect(v.explanation).toContain("÷ 2.25 (louvers with 1/8 in mesh)");
  });

  it("when a rated NFA is given with a gross size, then the rated figure wins (labeled products state their own NFA, SOURCES.md §4)", () => {
    const v = ventNfa({ id: "g", kind: "gable-louver", location: "upper", nfaSqIn: 144, grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/4", louvers: false } });
    expect(v.nfaSqIn).toBe(144);
  });

  it("when the vent is a powered fan, then it adds no NFA and its cfm × quantity is its airflow", () => {
    const v = ventNfa({ id: "f", kind: "powered-gable", location: "upper", cfm: 1100, quantity: 2 });
    expect(v).toMatchObject({ isPowered: true, nfaSqIn: 0, airflowCfm: 2200 });
  });
});
