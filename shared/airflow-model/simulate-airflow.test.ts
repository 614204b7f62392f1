import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { atticArb } from "../ventilation/arbitraries.test-helpers";
import { ventNfa, type AtticInput, type Vent } from "../ventilation";
import { attic, ridge, roofFan, soffit } from "../ventilation/test-helpers";
import { simulateAirflow, type AirflowConditions, type AirflowResult } from "./index";

const cfmOf = (r: AirflowResult, id: string) => r.openings.find((o) => o.id === id)!.cfm;
const kelvin = (f: number) => ((f - 32) * 5) / 9 + 273.15;
const CU_M_PER_S_PER_CFM = 0.028316846592 / 60; // NIST SP 811 App. B (exact)
const SQ_M_PER_SQ_IN = 0.00064516; // exact

/** 30 ft span gable at 6/12: the ridge stands 15 × 6/12 = 7.5 ft over the eaves. */
const gable = (vents: Vent[], extra: Partial<AtticInput> = {}): AtticInput =>
  attic({ sections: [{ kind: "rect", lengthFt: 50, widthFt: 30, roofForm: "gable", pitchIn12: 6 }], vents, ...extra });

/** Attic net inflow (vents + ceiling) and house net inflow (envelope − ceiling), and the gross flow through each. */
function balances(r: AirflowResult) {
  const ceiling = cfmOf(r, "ceiling");
  const envelope = cfmOf(r, "house-envelope");
  const ventFlows = r.openings.filter((o) => o.id !== "ceiling" && o.id !== "house-envelope").map((o) => o.cfm);
  const atticNet = ventFlows.reduce((a, b) => a + b, 0) + ceiling;
  const atticGross = (ventFlows.reduce((a, b) => a + Math.abs(b), 0) + Math.abs(ceiling)) / 2;
  return { atticNet, atticGross, houseNet: envelope - ceiling, houseGross: Math.abs(ceiling), ventCount: ventFlows.length };
}

describe("simulateAirflow against the ASHRAE stack-flow equation", () => {
  // ASHRAE Handbook — Fundamentals (1997) ch. 25 eq. 37: Q = C_D·A·√(2·g·ΔH_NPL·(T_i − T_o)/T_i),
  // ΔH_NPL from the middle of the lower opening to the neutral pressure level. With two equal
  // openings the neutral level is half-way between them.
  it("when two equal openings 7.5 ft apart are the only way in and out, then each passes the handbook's stack flow", () => {
    const input = gable([soffit("low", 200), ridge("high", 200)]);
    const conditions: AirflowConditions = { outdoorTempF: 40, atticTempF: 90, houseTempF: 40, ceilingLeakageSqIn: 0 };
    const r = simulateAirflow(input, conditions);

    const ti = kelvin(90);
    const to = kelvin(40);
    const deltaHnplM = (7.5 / 2) * 0.3048;
    const areaM2 = 200 * SQ_M_PER_SQ_IN;
    const expectedCfm = (0.61 * areaM2 * Math.sqrt(2 * 9.80665 * deltaHnplM * ((ti - to) / ti))) / CU_M_PER_S_PER_CFM;
    expect(expectedCfm).toBeGreaterThan(100); // a meaningful flow: ≈ 140 cfm
    expect(cfmOf(r, "low")).toBeCloseTo(expectedCfm, 0);
    expect(Math.abs(cfmOf(r, "low") - expectedCfm) / expectedCfm).toBeLessThan(0.005);
    expect(cfmOf(r, "high")).toBeCloseTo(-expectedCfm, 0); // out at the top
    expect(r.dischargeCoefficient).toBe(0.61);
  });

  it("when the openings differ, then the flow is that of the two orifices in series under the whole stack pressure", () => {
    // Independent closed form: the stack pressure over the height, ΔP_s = g·H·(ρ_o − ρ_i), is spent
    // across two orifices in series, ΔP_s = (ρ_o/2)·Q²·(1/(C_D·A₁)² + 1/(C_D·A₂)²), with ρ_i/ρ_o = T_o/T_i.
    const input = gable([soffit("low", 400), ridge("high", 150)]);
    const r = simulateAirflow(input, { outdoorTempF: 20, atticTempF: 50, houseTempF: 20, ceilingLeakageSqIn: 0 });
    const ti = kelvin(50);
    const to = kelvin(20);
    const hM = 7.5 * 0.3048;
    const a1 = 0.61 * 400 * SQ_M_PER_SQ_IN;
    const a2 = 0.61 * 150 * SQ_M_PER_SQ_IN;
    const qM3 = Math.sqrt((2 * 9.80665 * hM * (1 - to / ti)) / (1 / a1 ** 2 + 1 / a2 ** 2));
    const expectedCfm = qM3 / CU_M_PER_S_PER_CFM;
    expect(Math.abs(cfmOf(r, "low") - expectedCfm) / expectedCfm).toBeLessThan(0.005);
  });

  it("when the attic is no warmer than outdoors and there is no wind or fan, then nothing moves", () => {
    const r = simulateAirflow(gable([soffit("low", 300), ridge("high", 300)]), { outdoorTempF: 70, atticTempF: 70, houseTempF: 70 });
    expect(r.openings.every((o) => Math.abs(o.cfm) < 0.05)).toBe(true);
    expect(r.atticAirChangesPerHour).toBeCloseTo(0, 3);
  });
});

describe("simulateAirflow: a fan case solved by hand", () => {
  // Everything at 70 °F and calm, so only the fan drives the air (no stack, no wind).
  // Attic 800 sq ft: house leakage by default 800 × 0.05 = 40 sq in (ELA, C_D = 1); ceiling 40 sq in as entered.
  // Soffit 400 sq in NFA × C_D 0.61 = 244 sq in effective. A 1,000 cfm fan at its rating.
  //
  // Air reaches the attic two ways, both from outdoors at 0 Pa to the attic at P_a:
  //   - the soffit: 244 sq in;
  //   - house envelope then ceiling in series: 1/A² = 1/40² + 1/40² → A = 40/√2 = 28.284 sq in.
  // In parallel: 272.284 sq in = 0.175667 m². ρ at 70 °F = 101,325 / (287.05 × 294.261 K) = 1.19957 kg/m³.
  // 1,000 cfm = 0.471947 m³/s → velocity 0.471947 / 0.175667 = 2.68660 m/s
  //   → P_a = −ρv²/2 = −1.19957 × 2.68660² / 2 = −4.3292 Pa.
  // House air: 1,000 × 28.284 / 272.284 = 103.88 cfm; soffit: 896.12 cfm.
  // Envelope and ceiling are equal, so each takes half the drop: P_h = −2.1646 Pa.
  const input = attic({ sections: [{ kind: "area", areaSqFt: 800 }], vents: [soffit("s", 400), roofFan("f", 1000)] });
  const conditions: AirflowConditions = { outdoorTempF: 70, atticTempF: 70, houseTempF: 70, ceilingLeakageSqIn: 40, fanModel: "rated", areFansRunning: true };

  it("when the fan moves its rated 1,000 cfm, then pressures and flows match the hand solution", () => {
    const r = simulateAirflow(input, conditions);
    expect(r.fanCfm).toBeCloseTo(1000, 1);
    expect(r.atticPressurePa).toBeCloseTo(-4.33, 2);
    expect(r.housePressurePa).toBeCloseTo(-2.16, 1);
    expect(cfmOf(r, "ceiling")).toBeCloseTo(103.9, 0);
    expect(cfmOf(r, "s")).toBeCloseTo(896.1, 0);
    expect(cfmOf(r, "f")).toBeCloseTo(-1000, 1);
    expect(cfmOf(r, "house-envelope")).toBeCloseTo(103.9, 0);
    expect(r.fanAirFrom.lowerVentsCfm).toBeCloseTo(896.1, 0);
    expect(r.fanAirFrom.upperVentsCfm).toBe(0);
    expect(r.fanAirFrom.houseCfm).toBeCloseTo(103.9, 0);
    expect(r.houseAirDrawnCfm).toBeCloseTo(103.9, 0);
    // With the fan off nothing moves, so the fan's pull on the house is the whole −2.16 Pa.
    expect(r.houseDepressurizationByFansPa).toBeCloseTo(-2.16, 1);
    // No pitch recorded: volume = 800 sq ft × 4.2 ft = 3,360 cu ft; 1,000 × 60 / 3,360 = 17.86 per hour.
    expect(r.atticVolumeCuFt).toBeCloseTo(3360, 0);
    expect(r.atticAirChangesPerHour).toBeCloseTo(17.86, 1);
  });

  it("when the fan follows the straight-line curve, then it moves rated × (1 − back-pressure ÷ 49.8 Pa)", () => {
    const r = simulateAirflow(input, { ...conditions, fanModel: "curve" });
    expect(r.fanCfm).toBeLessThan(1000);
    expect(r.fanCfm).toBeCloseTo(1000 * (1 - -r.atticPressurePa / 49.8), 0);
    expect(r.reasons.join(" ")).toContain("straight-line fan curve");
  });

  it("when the fan's thermostat set point is above the attic temperature, then the fan is off and the house is not pulled", () => {
    const r = simulateAirflow(
      attic({ sections: [{ kind: "area", areaSqFt: 800 }], vents: [soffit("s", 400), roofFan("f", 1000, { thermostatSetPointF: 110 })] }),
      { outdoorTempF: 90, atticTempF: 105, houseTempF: 75 },
    );
    expect(r.fanCfm).toBe(0);
    expect(r.houseDepressurizationByFansPa).toBeNull();
    expect(r.reasons.join(" ")).toContain("below its thermostat's 110 °F set point");
  });
});

describe("simulateAirflow: a fan found dead", () => {
  it("when the fan's blade will not turn or its winding reads open, then it is taken as stopped whatever the attic temperature", () => {
    for (const diagnostics of [{ isBladeFreeToSpin: false }, { windingResistanceOhms: "open" as const }]) {
      const r = simulateAirflow(attic({ vents: [soffit("s", 300), roofFan("f", 1200, { diagnostics })] }), { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 });
      expect(r.fanCfm).toBe(0);
      expect(r.reasons.join(" ")).toContain("does not run as found");
    }
  });
});

describe("simulateAirflow against published field measurements", () => {
  // Tooley & Davis (EEBA 1995), 8 North Carolina houses, as summarized at TRADE-REFERENCES §5 [SRC 13]:
  // attic fans depressurized the houses by 0.5–2.5 Pa and drew 104–646 cfm of house air.
  it.each([
    ["1,200 sq ft, 1,000 cfm fan, 250 sq in of soffit", 1200, 1000, 250],
    ["1,800 sq ft, 1,400 cfm fan, 400 sq in of soffit", 1800, 1400, 400],
  ])("when an ordinary house has %s and no other high vent, then the model lands in the measured range", (_, areaSqFt, fanCfm, soffitSqIn) => {
    const r = simulateAirflow(
      attic({ sections: [{ kind: "area", areaSqFt, roofForm: "gable", pitchIn12: 6, spanFt: 28 }], vents: [soffit("s", soffitSqIn), roofFan("f", fanCfm)] }),
      { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 },
    );
    expect(r.houseDepressurizationByFansPa!).toBeLessThanOrEqual(-0.5);
    expect(r.houseDepressurizationByFansPa!).toBeGreaterThanOrEqual(-2.5);
    expect(r.houseAirDrawnCfm).toBeGreaterThanOrEqual(100);
    expect(r.houseAirDrawnCfm).toBeLessThanOrEqual(650);
  });

  it("when the same fan has only half the intake, then it pulls the house harder than in an ordinary house", () => {
    const run = (soffitSqIn: number) =>
      simulateAirflow(attic({ sections: [{ kind: "area", areaSqFt: 1500 }], vents: [soffit("s", soffitSqIn), roofFan("f", 1200)] }), { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 });
    const starved = run(150);
    const ordinary = run(300);
    expect(starved.houseDepressurizationByFansPa!).toBeLessThan(ordinary.houseDepressurizationByFansPa!);
    expect(starved.houseAirDrawnCfm).toBeGreaterThan(ordinary.houseAirDrawnCfm);
  });

  it("when a ridge vent shares the attic with the fan, then part of the fan's air comes in through the ridge", () => {
    const r = simulateAirflow(gable([soffit("s", 300), ridge("r", 300), roofFan("f", 1200)]), { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 });
    expect(cfmOf(r, "r")).toBeGreaterThan(0); // into the attic through an exhaust vent: the short-circuit
    expect(r.fanAirFrom.upperVentsCfm).toBeGreaterThan(0.25 * r.fanCfm);
    const total = r.fanAirFrom.lowerVentsCfm + r.fanAirFrom.upperVentsCfm + r.fanAirFrom.houseCfm;
    expect(total).toBeCloseTo(r.fanCfm, 0);
  });
});

describe("simulateAirflow: leakage", () => {
  it("when a blower-door figure is given, then a third of its leakage area is in the ceiling", () => {
    // 2,000 CFM50 × (4/50)^0.65 = 387.2 cfm at 4 Pa = 0.18275 m³/s; ÷ √(2 × 4 / ρ) with ρ(92 °F) = 1.1529:
    // 0.18275 / 2.6342 = 0.069374 m² = 107.5 sq in for the house, 35.8 in the ceiling.
    // Cross-check (common practice rule of thumb): ELA in sq in ≈ CFM50 ÷ 18 → 111 sq in.
    const r = simulateAirflow(gable([soffit("s", 300), ridge("r", 300)]), { outdoorTempF: 92, atticTempF: 130, houseTempF: 75, houseCfm50: 2000 });
    expect(r.ceilingLeakageSqIn + r.houseLeakageSqIn).toBeCloseTo(107.5, 0);
    expect(r.ceilingLeakageSqIn).toBeCloseTo(107.5 / 3, 0);
    expect(r.reasons.join(" ")).toContain("2,000 CFM50");
  });

  it("when the ceiling was air-sealed, then the default ceiling leakage is smaller and the fan draws less house air", () => {
    const vents = [soffit("s", 200), roofFan("f", 1200)];
    const open = simulateAirflow(attic({ vents }), { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 });
    const sealed = simulateAirflow(attic({ vents, site: { ceilingAirSealed: true } }), { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 });
    expect(sealed.ceilingLeakageSqIn).toBeCloseTo(1500 * 0.008, 1);
    expect(sealed.houseAirDrawnCfm).toBeLessThan(open.houseAirDrawnCfm);
  });
});

describe("simulateAirflow properties", () => {
  const conditionsArb: fc.Arbitrary<AirflowConditions> = fc.record(
    {
      outdoorTempF: fc.double({ min: -40, max: 120, noNaN: true }),
      atticTempF: fc.double({ min: -40, max: 180, noNaN: true }),
      houseTempF: fc.double({ min: 50, max: 85, noNaN: true }),
      windMph: fc.double({ min: 0, max: 60, noNaN: true }),
      ceilingLeakageSqIn: fc.double({ min: 0, max: 2000, noNaN: true }),
      houseCfm50: fc.double({ min: 100, max: 50_000, noNaN: true }),
      fanModel: fc.constantFrom("curve" as const, "rated" as const),
      areFansRunning: fc.boolean(),
    },
    { requiredKeys: ["outdoorTempF", "atticTempF", "houseTempF"] },
  );

  // Vents up to 20,000 sq in each (139 sq ft, more than any house has). Past that, a vent so large
  // that a pressure change of one part in 10¹⁶ moves a measurable flow is below double precision.
  const realisticAtticArb = atticArb(10).map((a) => ({ ...a, vents: a.vents.filter((v) => ventNfa(v).nfaSqIn <= 20_000) }));

  it("conserves air: in each zone what comes in goes out, within 0.5 % (plus the 0.1 cfm rounding of each figure)", () => {
    fc.assert(
      fc.property(realisticAtticArb, conditionsArb, (input, conditions) => {
        const r = simulateAirflow(input, conditions);
        const b = balances(r);
        for (const value of [r.atticPressurePa, r.housePressurePa, r.fanCfm, r.atticAirChangesPerHour, ...r.openings.map((o) => o.cfm)]) {
          expect(Number.isFinite(value)).toBe(true);
        }
        const rounding = 0.05 * (b.ventCount + 2);
        expect(Math.abs(b.atticNet)).toBeLessThanOrEqual(0.005 * b.atticGross + rounding);
        expect(Math.abs(b.houseNet)).toBeLessThanOrEqual(0.005 * b.houseGross + rounding);
        const from = r.fanAirFrom.lowerVentsCfm + r.fanAirFrom.upperVentsCfm + r.fanAirFrom.houseCfm;
        expect(Math.abs(from - r.fanCfm)).toBeLessThanOrEqual(0.005 * r.fanCfm + 0.2);
        expect(r.openings.length).toBe(input.vents.length + 2);
      }),
      { numRuns: 500 },
    );
  }, 30_000);

  it("more soffit area never draws more house air while the soffits are taking air in", () => {
    // Summer with the fans running: the usual case the trade argues about.
    const summerArb = fc.record({
      outdoorTempF: fc.double({ min: 60, max: 110, noNaN: true }),
      atticRiseF: fc.double({ min: 0, max: 60, noNaN: true }),
      houseTempF: fc.double({ min: 65, max: 80, noNaN: true }),
      ceilingLeakageSqIn: fc.double({ min: 1, max: 500, noNaN: true }),
      fanModel: fc.constantFrom("curve" as const, "rated" as const),
    });
    fc.assert(
      fc.property(atticArb(8), summerArb, fc.double({ min: 1, max: 2000, noNaN: true }), fc.double({ min: 1, max: 2000, noNaN: true }), (input, s, soffitSqIn, extraSqIn) => {
        const conditions: AirflowConditions = {
          outdoorTempF: s.outdoorTempF,
          atticTempF: Math.min(180, s.outdoorTempF + s.atticRiseF),
          houseTempF: s.houseTempF,
          ceilingLeakageSqIn: s.ceilingLeakageSqIn,
          fanModel: s.fanModel,
          areFansRunning: true,
        };
        const withSoffit = (sqIn: number): AtticInput => ({ ...input, vents: [...input.vents, soffit("added-soffit", sqIn)] });
        const before = simulateAirflow(withSoffit(soffitSqIn), conditions);
        fc.pre(cfmOf(before, "added-soffit") > 0);
        const after = simulateAirflow(withSoffit(soffitSqIn + extraSqIn), conditions);
        expect(after.houseAirDrawnCfm).toBeLessThanOrEqual(before.houseAirDrawnCfm + 0.1);
        expect(after.atticPressurePa).toBeGreaterThanOrEqual(before.atticPressurePa - 0.01);
      }),
      { numRuns: 300 },
    );
  }, 30_000);

  it("a bigger fan never draws less house air (calm, fans running)", () => {
    fc.assert(
      fc.property(fc.double({ min: 50, max: 5000, noNaN: true }), fc.double({ min: 1, max: 3000, noNaN: true }), fc.double({ min: 10, max: 1500, noNaN: true }), (fanCfm, extraCfm, soffitSqIn) => {
        const run = (cfm: number) =>
          simulateAirflow(attic({ vents: [soffit("s", soffitSqIn), roofFan("f", cfm)] }), { outdoorTempF: 92, atticTempF: 130, houseTempF: 75, areFansRunning: true });
        expect(run(fanCfm + extraCfm).houseAirDrawnCfm).toBeGreaterThanOrEqual(run(fanCfm).houseAirDrawnCfm - 0.1);
      }),
      { numRuns: 100 },
    );
  }, 30_000);
});
