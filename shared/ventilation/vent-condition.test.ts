import { describe, expect, it } from "vitest";
import { analyzeAttic } from "./analyze-attic";
import type { Vent } from "./schema";
import { attic, ridge, roofFan, soffit } from "./test-helpers";
import { ventNfa } from "./vent-nfa";

// A blocked opening passes no air; IRC R806.2 counts net free area, the open area air can pass
// [SOURCES.md S1, S7]; R806.3 asks that insulation not block eave vents [S1, S2].
const tenSoffits = (extra: Partial<Vent> = {}): Vent => ({ id: "s", kind: "soffit-individual", location: "lower", quantity: 10, nfaSqInPerUnit: 50, ...extra });

describe("vent condition", () => {
  it("when 4 of 10 soffit vents are blocked by insulation, then 6 × 50 = 300 sq in counts and the words say so", () => {
    const v = ventNfa(tenSoffits({ condition: "partly-blocked", blockedQuantity: 4, blockedBy: "insulation" }));
    expect(v).toMatchObject({ nfaSqIn: 300, fullNfaSqIn: 500, openShare: 0.6 });
    expect(v.explanation).toMatch(/4 of 10 blocked by insulation, so 6 of 10 count: 300 sq in counted/);
  });

  it("when 4 of 10 soffit vents are blocked, then intake, the total and the fan's intake all drop by 200 sq in", () => {
    const open = analyzeAttic(attic({ vents: [tenSoffits(), ridge("r", 300), roofFan("f", 600)] }));
    const blocked = analyzeAttic(attic({ vents: [tenSoffits({ condition: "partly-blocked", blockedQuantity: 4, blockedBy: "insulation" }), ridge("r", 300), roofFan("f", 600)] }));
    expect(open.provided.intakeSqIn - blocked.provided.intakeSqIn).toBe(200);
    expect(open.provided.totalSqIn - blocked.provided.totalSqIn).toBe(200);
    expect(blocked.fan?.intakeProvidedSqIn).toBe(300);
    const f = blocked.findings.find((x) => x.code === "vents-blocked");
    expect(f?.detail).toMatch(/200 sq in of vent area is not counted/);
    expect(f?.detail).toMatch(/baffles/);
  });

  it.each(["blocked", "painted-over"] as const)("when a vent is %s, then none of it counts", (condition) => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 800, { condition }), ridge("r", 500)] }));
    expect(a.provided.intakeSqIn).toBe(0);
    expect(a.findings.map((f) => f.code)).toEqual(expect.arrayContaining(["vents-blocked", "no-intake"]));
  });

  it("when a continuous soffit is half blocked, then half of it counts", () => {
    expect(ventNfa(soffit("s", 800, { condition: "partly-blocked", blockedShare: 0.5 })).nfaSqIn).toBe(400);
  });

  it("when a vent is damaged, then it still counts and a repair finding cites R806.1's openings", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 800), ridge("r", 500, { condition: "damaged" })] }));
    expect(a.provided.exhaustSqIn).toBe(500);
    expect(a.findings.find((f) => f.code === "vent-damaged")?.detail).toMatch(/R806\.1/);
  });

  it("when blocked vents take the attic below the minimum, then the verdict follows the open area", () => {
    // 1,500 sq ft at 1/150 = 1,440 sq in (SOURCES.md §8 E1); strict basis
    const ok = analyzeAttic(attic({ codeBasis: "strict-150", vents: [soffit("s", 800), ridge("r", 700)] }));
    const short = analyzeAttic(attic({ codeBasis: "strict-150", vents: [soffit("s", 800, { condition: "partly-blocked", blockedShare: 0.1 }), ridge("r", 700)] }));
    expect(ok.compliant).toBe(true);
    expect(short.compliant).toBe(false);
  });

  it("when 'partly blocked' gives no count or share, or more blocked than there are, then the survey is refused with a clear message", () => {
    expect(() => analyzeAttic(attic({ vents: [tenSoffits({ condition: "partly-blocked" })] }))).toThrow(/how many are blocked/);
    expect(() => analyzeAttic(attic({ vents: [tenSoffits({ condition: "partly-blocked", blockedQuantity: 11 })] }))).toThrow(/At most 10/);
    expect(() => analyzeAttic(attic({ vents: [tenSoffits({ blockedQuantity: 2 })] }))).toThrow(/partly blocked/);
  });

  it("when an older survey has no condition, then every vent counts in full (backwards compatible)", () => {
    expect(ventNfa(tenSoffits()).nfaSqIn).toBe(500);
  });
});
