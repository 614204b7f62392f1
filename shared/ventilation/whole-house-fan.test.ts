import { describe, expect, it } from "vitest";
import { generateOptions } from "../design/generate-options";
import { demoCatalog } from "../design/demo-catalog.test-helpers";
import { analyzeAttic } from "./analyze-attic";
import type { Vent } from "./schema";
import { attic, ridge, soffit } from "./test-helpers";
import { wholeHouseFanOutletSqIn } from "./whole-house-fan";

// California Energy Code §150.1(c)12(B) (2022, 2025): at least 1 sq ft of attic vent net free area per
// 750 cfm of rated whole-house fan airflow [SOURCES.md S33]; fan makers commonly ask 1 per 500 [S34].
const whf = (id: string, cfm: number, extra: Partial<Vent> = {}): Vent => ({ id, kind: "whole-house-fan", location: "lower", cfm, ...extra });

describe("whole-house fans", () => {
  it("when a 4,500 cfm fan is sized, then it needs 4,500 ÷ 750 = 6 sq ft = 864 sq in of attic outlet (Energy Code §150.1(c)12(B))", () => {
    expect(wholeHouseFanOutletSqIn(4500)).toBe(864);
    expect(wholeHouseFanOutletSqIn(4500, 500)).toBe(1296);
  });

  it("when a whole-house fan shares the attic with a ridge vent, then nothing says to close the ridge or treats it as an attic fan", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 600), ridge("r", 500), whf("w", 4500)] }));
    const codes = a.findings.map((f) => f.code);
    for (const wrong of ["powered-with-passive-exhaust", "fan-intake-short", "fan-undersized", "fan-oversized", "gable-with-ridge"] as const) expect(codes).not.toContain(wrong);
    expect(a.fan).toBeNull();
    expect(a.provided.wholeHouseFanCfm).toBe(4500);
    expect(a.provided.poweredCfm).toBe(0);
    for (const f of a.findings) expect(f.detail).not.toMatch(/close (off )?the (ridge|other high vents)/i);
  });

  it("when the attic vents give less than 1 sq ft per 750 cfm, then the outlet is short: every vent, the ridge included, counts", () => {
    const short = analyzeAttic(attic({ vents: [soffit("s", 500), ridge("r", 363), whf("w", 4500)] })); // 863 < 864
    expect(short.findings.find((f) => f.code === "whole-house-fan-outlet-short")?.detail).toMatch(/4,500 cfm ÷ 750 = 6 sq ft = 864 sq in.*863 sq in/);
    const enough = analyzeAttic(attic({ vents: [soffit("s", 500), ridge("r", 364), whf("w", 4500)] })); // 864
    expect(enough.findings.map((f) => f.code)).not.toContain("whole-house-fan-outlet-short");
  });

  it("when a whole-house fan is recorded, then the homeowner is told windows must be open and the vents kept open", () => {
    const f = analyzeAttic(attic({ vents: [soffit("s", 900), ridge("r", 700), whf("w", 3000)] })).findings.find((x) => x.code === "whole-house-fan-operation");
    expect(f?.severity).toBe("info");
    expect(f?.detail).toMatch(/windows open/);
    expect(f?.detail).toMatch(/never close a ridge/);
    expect(f?.detail).toMatch(/1 sq ft of attic vent per 500 cfm, 864 sq in here/);
  });

  it("when the house has a natural-draft appliance, then running a whole-house fan is a critical combustion-safety finding", () => {
    const a = analyzeAttic(attic({ vents: [soffit("s", 900), ridge("r", 700), whf("w", 3000)], site: { atmosphericCombustionAppliance: true } }));
    expect(a.findings.find((x) => x.code === "whole-house-fan-operation")?.severity).toBe("critical");
  });

  it("when a whole-house fan is given a net free area, then the survey is refused: it is rated in cfm", () => {
    expect(() => analyzeAttic(attic({ vents: [{ id: "w", kind: "whole-house-fan", location: "lower", nfaSqIn: 100 }] }))).toThrow(/cfm/);
  });

  it("when the design generator meets a whole-house fan, then it keeps the fan and never removes or patches it", () => {
    const space = {
      name: "Main attic",
      roof: { form: "gable" as const, pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 },
      sections: [{ kind: "rect" as const, lengthFt: 40, widthFt: 25 }],
      vents: [soffit("s", 200), whf("w", 3000)],
      site: {},
      notes: null,
    };
    const result = generateOptions({ project: { codeBasis: "irc-2018", climateZone: 4, ceilingVaporRetarder: "none", roofColor: "medium" }, spaceId: "s1", space, catalog: demoCatalog() });
    expect(result.options.length).toBeGreaterThan(0);
    for (const o of result.options) expect(o.option.spaces[0]!.ventActions["w"]).toBeUndefined();
  });
});
