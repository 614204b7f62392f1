import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { SpaceSurvey } from "../schemas/survey";
import type { ProjectBasis } from "../survey/to-attic-input";
import { CODE_BASES, type Vent } from "../ventilation/index";
import { DEMO_IDS, demoCatalog } from "./demo-catalog.test-helpers";
import { blockedSoffits, fanAndRidge, hipShortRidge, lShape, roofFanOnly, smallRanch, SPACE_ID, zone4Project } from "./design-cases.test-helpers";
import { generateOptions } from "./generate-options";
import { expectSoundOptions } from "./generate-options.test-helpers";

const catalog = demoCatalog();
const run = (space: SpaceSurvey, project: ProjectBasis = zone4Project) => generateOptions({ project, spaceId: SPACE_ID, space, catalog });
const typesOf = (result: ReturnType<typeof run>) => result.options.map((o) => o.type);
const addedOf = (result: ReturnType<typeof run>, index: number) => result.options[index]!.option.spaces[0]!.added;

describe("generateOptions on varied attics (IRC 2018, zone 4)", () => {
  it("when a 1,000 sq ft gable ranch is designed, then ridge and static options meet 1/300 and the remove-fan option is skipped (the TSDoc example)", () => {
    const result = run(smallRanch());
    expectSoundOptions(result, zone4Project, smallRanch(), catalog);
    expect(typesOf(result)).toEqual(["ridge-and-continuous-soffit", "static-vents-and-individual-soffit"]);
    expect(result.options[0]!.analysis.requirement.ratio).toBe(300);
    expect(result.skipped).toEqual([{ type: "remove-fan-passive", reason: "The survey records no powered fan in this attic." }]);
    const rationale = result.options[0]!.option.rationale;
    expect(rationale).toContain("Required at 1/300: 1,000 sq ft ÷ 300 = 3.333 sq ft = 480 sq in.");
    // Half of 480 = 240 sq in → 14 ft → 4 pieces = 16 ft = 288 sq in, over "not more than 50 percent of
    // the required ventilating area" (IRC 2018 R806.2 condition 2 [SOURCES.md S4]: 240 sq in); so the
    // exhaust aims at the 40 % minimum: 192 ÷ 18 = 10.67 → 11 ft → 3 pieces = 12 ft = 216 sq in (45 %).
    expect(rationale.join("\n")).toContain("192 ÷ 18 = 10.67 → 11 ft; bought in 4 ft pieces: 3 × 4 = 12 ft, all installed");
    expect(rationale.join("\n")).toContain("Held to at most 50 % of the required area");
    expect(addedOf(result, 0)).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.ridge, quantity: 12 }));
    // The old box vents go and their holes are patched.
    expect(result.options[0]!.option.spaces[0]!.ventActions).toEqual({ b1: "remove" });
    expect(addedOf(result, 0)).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.patch, quantity: 2 }));
  });

  it("when an L-shaped attic has two sections and no recorded lengths, then lengths are estimated, said so, and the gable louver is sealed for the ridge vent", () => {
    const result = run(lShape());
    expectSoundOptions(result, zone4Project, lShape(), catalog);
    expect(result.options[0]!.analysis.floorAreaSqFt).toBe(48 * 28 + 20 * 16);
    const ridge = result.options.find((o) => o.type === "ridge-and-continuous-soffit")!;
    expect(ridge.option.spaces[0]!.ventActions).toEqual({ g1: "remove" });
    expect(ridge.option.spaces[0]!.added).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.sealGable, quantity: 1 }));
    expect(ridge.option.rationale.join(" ")).toContain("68 ft of ridge (estimated)");
  });

  it("when a hip roof has a 6 ft ridge, then the ridge option is skipped with the arithmetic and static vents fit round the hip ends", () => {
    const result = run(hipShortRidge());
    expectSoundOptions(result, zone4Project, hipShortRidge(), catalog);
    expect(typesOf(result)).toEqual(["static-vents-and-individual-soffit"]);
    const skip = result.skipped.find((s) => s.type === "ridge-and-continuous-soffit")!;
    expect(skip.reason).toContain("only 5 ft is available (6 ft of ridge (recorded) less 6 in at each end of the ridge = 5 ft)");
    // 1,672 sq ft ÷ 300 = 802.56 sq in; 9 static vents (450) would exceed 50 % of it (401.28, IRC 2018
    // R806.2 condition 2 [S4]), so 40 % = 321.02 → 7 vents of 50 sq in = 350 sq in
    expect(addedOf(result, 0)).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.staticVent, quantity: 7, dropBelowRidgeFt: 1.5 }));
    expect(result.options[0]!.option.spaces[0]!.ventActions).toEqual({ t1: "remove" });
  });

  it("when a gable fan shares the attic with a ridge vent, then every option removes the fan, disconnects it and never leaves it with the ridge vent", () => {
    const result = run(fanAndRidge());
    expectSoundOptions(result, zone4Project, fanAndRidge(), catalog);
    expect(typesOf(result)).toEqual(["ridge-and-continuous-soffit", "static-vents-and-individual-soffit"]);
    for (const generated of result.options) {
      expect(generated.option.spaces[0]!.ventActions.fan1).toBe("remove");
      expect(generated.option.spaces[0]!.added).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.disconnect, quantity: 1 }));
      expect(generated.option.notes).toContain("natural-draft gas");
    }
    // The ridge option keeps the 20 ft ridge vent (360 sq in = half of 720) and seals the fan's and the louver's gable openings.
    expect(result.options[0]!.option.spaces[0]!.ventActions).toEqual({ fan1: "remove", g1: "remove" });
    expect(result.options[0]!.option.spaces[0]!.added).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.sealGable, quantity: 2 }));
    // Removing the fan and keeping the ridge is the ridge option already: not proposed twice.
    expect(result.skipped).toEqual([{ type: "remove-fan-passive", reason: 'It would be the same work as "Ridge vent with continuous soffit intake".' }]);
  });

  it("when a roof fan is the only exhaust, then the remove-fan option reuses its opening for a static vent", () => {
    const result = run(roofFanOnly());
    expectSoundOptions(result, zone4Project, roofFanOnly(), catalog);
    const noFan = result.options.find((o) => o.type === "remove-fan-passive")!;
    expect(noFan.option.spaces[0]!.ventActions).toEqual({ fan1: "replace" });
    expect(noFan.option.spaces[0]!.added).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.staticVent, quantity: 1, replacesVentId: "fan1" }));
    expect(noFan.option.spaces[0]!.added).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.disconnect, quantity: 1 }));
    expect(noFan.option.spaces[0]!.added.some((a) => a.catalogItemId === DEMO_IDS.patch)).toBe(false);
  });

  it("when the soffits are blocked, then every option clears them, adds a baffle per bay and becomes compliant", () => {
    const result = run(blockedSoffits());
    expect(result.baseline?.compliant).toBe(false);
    expectSoundOptions(result, zone4Project, blockedSoffits(), catalog);
    expect(result.options.length).toBeGreaterThan(0);
    for (const generated of result.options) {
      expect(generated.option.spaces[0]!.siteFixes).toEqual({ clearsBlockedSoffits: true });
      // 72 ft × 12 ÷ 24 in = 36 bays
      expect(generated.option.spaces[0]!.added).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.baffle, quantity: 36 }));
      expect(generated.option.spaces[0]!.added).toContainEqual(expect.objectContaining({ catalogItemId: DEMO_IDS.insulationClearing, quantity: 72 }));
    }
  });
});

describe("generateOptions: an attic that already has the design", () => {
  it("when the attic already has what an option would build and meets the code minimum, then that option is skipped with the reason, never offered as $0 with no work", () => {
    const first = run(smallRanch());
    for (const [i, type] of (["ridge-and-continuous-soffit", "static-vents-and-individual-soffit"] as const).entries()) {
      const again = run(first.options[i]!.applied);
      expect(typesOf(again), type).not.toContain(type);
      expect(again.skipped.find((s) => s.type === type)?.reason, type).toMatch(/already has this design and meets the code minimum/);
      for (const o of again.options) {
        const space = o.option.spaces[0]!;
        const work = space.added.length + Object.values(space.ventActions).filter((a) => a !== "keep").length + Object.keys(space.siteFixes).length;
        expect(work, o.type).toBeGreaterThan(0);
        expect(o.price.totalCents, o.type).toBeGreaterThan(0);
      }
    }
  });
});

describe("generateOptions: a bath fan that blows into the attic", () => {
  const withBathFan = (): SpaceSurvey => ({ ...smallRanch(), site: { ...smallRanch().site, bathFanIntoAttic: true } });

  it("when the survey found a bath fan ducted into the attic, then every option ducts it to a roof or wall cap as a line item with its reason, and the finding is gone after", () => {
    const result = run(withBathFan());
    expect(result.options.length).toBeGreaterThan(0);
    for (const o of result.options) {
      const duct = o.option.spaces[0]!.added.find((a) => a.catalogItemId === DEMO_IDS.bathFanDuct);
      expect(duct, o.type).toMatchObject({ quantity: 1 });
      expect(o.option.spaces[0]!.siteFixes.ductsBathFan, o.type).toBe(true);
      expect(o.option.rationale.join(" "), o.type).toMatch(/roof or wall cap/);
      expect(o.analysis.findings.map((f) => f.code), o.type).not.toContain("bath-fan-into-attic");
    }
  });

  it("when the catalog has no bath-fan duct item, then the reason says to price that work by hand, in words, not an internal id", () => {
    const result = generateOptions({ project: zone4Project, spaceId: SPACE_ID, space: withBathFan(), catalog: catalog.filter((c) => c.kind !== "bath-fan-duct") });
    const words = result.options[0]!.option.rationale.join(" ");
    expect(words).toMatch(/no item to duct a bath fan outside; price that work by hand/);
    expect(words).not.toMatch(/bath-fan-duct/);
  });
});

describe("generateOptions: ratio by code basis", () => {
  it("when the 2018 text applies in zone 6 without a Class I/II retarder, then it sizes at 1/150 and says why", () => {
    const project: ProjectBasis = { ...zone4Project, climateZone: 6 };
    const result = run(smallRanch(), project);
    expectSoundOptions(result, project, smallRanch(), catalog);
    expect(result.options.every((o) => o.analysis.requirement.ratio === 150)).toBe(true);
    expect(result.options[0]!.option.rationale).toContain(
      "Under the 2018/2021/2024 text, 1/300 in climate zone 6 also needs a Class I or II ceiling vapor retarder, which is not recorded, so the design is sized at 1/150 (IRC R806.2 exception).",
    );
    expect(result.options[0]!.option.rationale).toContain("Required at 1/150: 1,000 sq ft ÷ 150 = 6.667 sq ft = 960 sq in.");
  });

  it("when the basis is strict 1/150, then every option is sized at 1/150", () => {
    const project: ProjectBasis = { ...zone4Project, codeBasis: "strict-150" };
    const result = run(lShape(), project);
    expectSoundOptions(result, project, lShape(), catalog);
    expect(result.options.map((o) => o.analysis.requirement.ratio)).toEqual([150, 150]);
  });

  it("when IRC 2009 applies to a 2/12 roof whose ridge is under 3 ft above the eaves, then 1/300 is tried, refused by the core and 1/150 used", () => {
    const project: ProjectBasis = { ...zone4Project, codeBasis: "irc-2009" };
    // rise = 12 ft × 2 ÷ 12 = 2 ft: upper vents can't be 3 ft above the eave vents
    const space: SpaceSurvey = { ...smallRanch(), roof: { ...smallRanch().roof, pitchIn12: 2 }, sections: [{ kind: "rect", id: "main", lengthFt: 40, widthFt: 24 }] };
    const result = run(space, project);
    expectSoundOptions(result, project, space, catalog);
    const ridge = result.options.find((o) => o.type === "ridge-and-continuous-soffit")!;
    expect(ridge.analysis.requirement.ratio).toBe(150);
    expect(ridge.option.rationale.join(" ")).toContain("1/300 was tried first and could not be met");
  });

  it("when IRC 2009 applies to a 6/12 roof, then the ridge option meets 1/300 with half the area high", () => {
    const project: ProjectBasis = { ...zone4Project, codeBasis: "irc-2009" };
    const result = run(smallRanch(), project);
    expectSoundOptions(result, project, smallRanch(), catalog);
    expect(result.options[0]!.analysis.requirement.ratio).toBe(300);
  });
});

describe("generateOptions: edge cases", () => {
  it("when the survey has no sections, then nothing is proposed and every type says why", () => {
    const result = run({ ...smallRanch(), sections: [] });
    expect(result.options).toEqual([]);
    expect(result.baseline).toBeNull();
    expect(result.skipped.map((s) => s.type)).toEqual(["ridge-and-continuous-soffit", "static-vents-and-individual-soffit", "remove-fan-passive"]);
    expect(result.skipped[0]!.reason).toContain("can't be analysed yet");
  });

  it("when the catalog has no ridge vent, then the ridge option is skipped for that reason", () => {
    const result = generateOptions({ project: zone4Project, spaceId: SPACE_ID, space: smallRanch(), catalog: catalog.filter((i) => i.kind !== "ridge") });
    expect(result.skipped.find((s) => s.type === "ridge-and-continuous-soffit")?.reason).toBe("The catalog has no active ridge vent sold by the foot with an NFA per foot.");
  });

  it("when the eave can't be measured or estimated, then soffit designs are skipped with the reason", () => {
    const space: SpaceSurvey = { ...smallRanch(), roof: { ...smallRanch().roof, eaveLengthFt: null }, sections: [{ kind: "area", areaSqFt: 1_000 }] };
    const result = run(space);
    expect(result.options).toEqual([]);
    expect(result.skipped[0]!.reason).toContain("can't be estimated from an entered area");
  });

  it("when run twice on the same input, then the result is identical (deterministic)", () => {
    expect(run(fanAndRidge())).toEqual(run(fanAndRidge()));
  });

  it("when a labour rate is set, then the labour line uses it with hours from the catalog's minutes, rounded up to the quarter hour", () => {
    const result = generateOptions({ project: zone4Project, spaceId: SPACE_ID, space: smallRanch(), catalog, settings: { laborRateCentsPerHour: 10_000 } });
    // ridge option: 12 ft × 3 + 24 ft × 4 + 2 × 60 + 12 ft × 2 = 276 min → 4.75 h (the ridge held to 50 % of the required area)
    expect(result.options[0]!.option.laborLines).toEqual([{ id: "labor-1", description: "Installation labour", hours: 4.75, rateCents: 10_000, hoursBasis: "catalog" }]);
    expect(result.options[0]!.price.laborCents).toBe(47_500);
  });
});

describe("generateOptions: property tests over random reasonable attics", () => {
  const existingVentArb = (i: number, lengthFt: number, eaveFt: number): fc.Arbitrary<Vent> =>
    fc.oneof(
      fc.record({ q: fc.integer({ min: 1, max: 4 }), drop: fc.double({ min: 0.5, max: 6, noNaN: true }) }).map(({ q, drop }): Vent => ({ id: `v${i}`, kind: "box", location: "upper", quantity: q, nfaSqInPerUnit: 50, dropBelowRidgeFt: drop })),
      fc.constant<Vent>({ id: `v${i}`, kind: "turbine", location: "upper", nfaSqIn: 112 }),
      fc.constant<Vent>({ id: `v${i}`, kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } }),
      fc.integer({ min: 4, max: Math.max(4, Math.floor(lengthFt) - 2) }).map((l): Vent => ({ id: `v${i}`, kind: "ridge", location: "upper", lengthFt: l, nfaSqInPerFt: 18 })),
      fc.integer({ min: 1, max: 12 }).map((q): Vent => ({ id: `v${i}`, kind: "soffit-individual", location: "lower", quantity: q, nfaSqInPerUnit: 9 })),
      fc.integer({ min: 8, max: Math.max(8, Math.floor(eaveFt / 2)) }).map((l): Vent => ({ id: `v${i}`, kind: "soffit-continuous", location: "lower", lengthFt: l, nfaSqInPerFt: 9 })),
      fc.integer({ min: 600, max: 1_600 }).map((cfm): Vent => ({ id: `v${i}`, kind: "powered-roof", location: "upper", cfm })),
      fc.integer({ min: 600, max: 1_600 }).map((cfm): Vent => ({ id: `v${i}`, kind: "powered-gable", location: "upper", cfm, mounting: "gable" })),
    );

  const atticArb = fc
    .record({
      form: fc.constantFrom("gable" as const, "hip" as const, "shed" as const),
      pitchIn12: fc.integer({ min: 3, max: 12 }),
      lengthFt: fc.integer({ min: 20, max: 70 }),
      widthFt: fc.integer({ min: 16, max: 40 }),
      ell: fc.option(fc.record({ lengthFt: fc.integer({ min: 10, max: 24 }), widthFt: fc.integer({ min: 10, max: 20 }) }), { nil: undefined }),
      isRidgeRecorded: fc.boolean(),
      isEaveRecorded: fc.boolean(),
      soffitsBlocked: fc.boolean(),
      bafflesPresent: fc.option(fc.boolean(), { nil: undefined }),
      ventCount: fc.integer({ min: 0, max: 5 }),
    })
    .chain((a) => {
      const ridgeFt = a.form === "hip" ? Math.abs(a.lengthFt - a.widthFt) + (a.ell?.lengthFt ?? 0) : a.lengthFt + (a.ell?.lengthFt ?? 0);
      const eaveFt = a.form === "hip" ? 2 * (a.lengthFt + a.widthFt) : a.form === "shed" ? a.lengthFt : 2 * a.lengthFt;
      return fc.tuple(...Array.from({ length: a.ventCount }, (_, i) => existingVentArb(i, a.lengthFt, eaveFt))).map((vents): SpaceSurvey => ({
        name: "Attic",
        roof: { form: a.form, pitchIn12: a.pitchIn12, ridgeLengthFt: a.isRidgeRecorded ? Math.max(1, ridgeFt) : null, eaveLengthFt: a.isEaveRecorded ? eaveFt : null },
        sections: [{ kind: "rect", id: "main", lengthFt: a.lengthFt, widthFt: a.widthFt }, ...(a.ell ? [{ kind: "rect" as const, id: "ell", ...a.ell }] : [])],
        vents,
        site: { soffitsBlocked: a.soffitsBlocked, ...(a.bafflesPresent !== undefined ? { bafflesPresent: a.bafflesPresent } : {}) },
        notes: null,
      }));
    });

  const projectArb: fc.Arbitrary<ProjectBasis> = fc.record({
    codeBasis: fc.constantFrom(...CODE_BASES),
    climateZone: fc.integer({ min: 1, max: 8 }),
    ceilingVaporRetarder: fc.constantFrom("none" as const, "class-I" as const, "class-II" as const, "class-III" as const),
    roofColor: fc.constantFrom("light" as const, "medium" as const, "dark" as const),
  });

  it("when any reasonable attic is designed, then every option is compliant under its basis, one exhaust type, intake ≥ exhaust, no fan, and every skip has a reason", () => {
    fc.assert(
      fc.property(atticArb, projectArb, (space, project) => {
        const result = generateOptions({ project, spaceId: SPACE_ID, space, catalog });
        expectSoundOptions(result, project, space, catalog);
      }),
      { numRuns: 150 },
    );
  }, 30_000); // many random attics: correctness, not a timing check

  it("when a one-section gable up to 1,500 sq ft has its ridge and eaves recorded, then at least one option is proposed", () => {
    const gableArb = fc.record({ lengthFt: fc.integer({ min: 24, max: 60 }), widthFt: fc.integer({ min: 16, max: 25 }), pitchIn12: fc.integer({ min: 3, max: 12 }) });
    fc.assert(
      fc.property(gableArb, projectArb, ({ lengthFt, widthFt, pitchIn12 }, project) => {
        const space: SpaceSurvey = {
          name: "Attic",
          roof: { form: "gable", pitchIn12, ridgeLengthFt: lengthFt, eaveLengthFt: 2 * lengthFt },
          sections: [{ kind: "rect", lengthFt, widthFt }],
          vents: [],
          site: {},
          notes: null,
        };
        const result = generateOptions({ project, spaceId: SPACE_ID, space, catalog });
        expect(result.options.length).toBeGreaterThan(0);
        expectSoundOptions(result, project, space, catalog);
      }),
      { numRuns: 100 },
    );
  }, 30_000); // many random attics: correctness, not a timing check
});
