import { describe, expect, it } from "vitest";
import { simulateAirflow } from "../airflow-model";
import { analyzeAttic, type AtticInput } from "../ventilation";
import { buildAirflowPicture } from "./index";
import { MAX_FLOW_WIDTH_UNITS, MIN_FLOW_WIDTH_UNITS } from "./flow-widths";

/** A 30 × 50 ft gable at 6/12 with soffits, a ridge vent and a roof fan beside it (Marrow Creek demo style). */
const fanAndRidge: AtticInput = {
  codeBasis: "irc-2018",
  climateZone: 4,
  ceilingVaporRetarder: "none",
  roofColor: "medium",
  sections: [{ kind: "rect", lengthFt: 50, widthFt: 30, roofForm: "gable", pitchIn12: 6 }],
  vents: [
    { id: "soffit", kind: "soffit-continuous", location: "lower", lengthFt: 80, nfaSqInPerFt: 4 },
    { id: "ridge", kind: "ridge", location: "upper", lengthFt: 20, nfaSqInPerFt: 18 },
    { id: "fan", kind: "powered-roof", location: "upper", cfm: 1200, dropBelowRidgeFt: 2 },
  ],
};

describe("arrow widths from the airflow estimate", () => {
  const analysis = analyzeAttic(fanAndRidge);
  const airflow = simulateAirflow(fanAndRidge, { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 });
  const picture = buildAirflowPicture(fanAndRidge, analysis, { airflow });
  const plain = buildAirflowPicture(fanAndRidge, analysis);

  it("when an estimate is given, then each flow arrow carries its cfm and is as wide as its share of the largest", () => {
    const withCfm = picture.arrows.filter((a) => a.cfm !== undefined);
    expect(withCfm.length).toBeGreaterThan(0);
    const largest = Math.max(...withCfm.map((a) => a.cfm!));
    for (const arrow of withCfm) {
      const expected = picture.unitFt * (MIN_FLOW_WIDTH_UNITS + (MAX_FLOW_WIDTH_UNITS - MIN_FLOW_WIDTH_UNITS) * (arrow.cfm! / largest));
      expect(arrow.strokeWidthFt).toBeCloseTo(expected, 1);
    }
    // The soffit air is split between the two eave arrows; together they carry the soffit's whole flow.
    const soffitCfm = airflow.openings.find((o) => o.id === "soffit")!.cfm;
    const eaveArrows = picture.arrows.filter((a) => a.kind === "intended-path" && a.ventIds.includes("soffit"));
    expect(eaveArrows.reduce((s, a) => s + a.cfm!, 0)).toBeCloseTo(soffitCfm, 0);
  });

  it("when the fan draws through the ridge vent, then that short-circuit arrow carries the ridge's inflow and is labelled", () => {
    const ridgeIn = airflow.openings.find((o) => o.id === "ridge")!.cfm;
    expect(ridgeIn).toBeGreaterThan(0);
    const shortCircuit = picture.arrows.find((a) => a.kind === "short-circuit-path" && a.ventIds.includes("ridge"))!;
    expect(shortCircuit.cfm).toBeCloseTo(ridgeIn, 0);
    expect(picture.texts.some((t) => t.forId === shortCircuit.id && t.text === `${Math.round(ridgeIn).toLocaleString("en-US")} cfm`)).toBe(true);
    expect(picture.notes.some((n) => n.startsWith("Line widths show the estimated summer airflow"))).toBe(true);
  });

  it("when no estimate is given, then the picture is drawn as before", () => {
    expect(plain.arrows.every((a) => a.cfm === undefined)).toBe(true);
    expect(plain.texts.some((t) => t.id.startsWith("cfm-"))).toBe(false);
  });
});
