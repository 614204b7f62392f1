import { describe, expect, it } from "vitest";
import { simulateAirflow } from "../airflow-model";
import { analyzeAttic, type AtticInput } from "../ventilation";
import { buildAirflowPicture } from "./index";
import { MAX_FLOW_WIDTH_UNITS, MIN_FLOW_WIDTH_UNITS } from "./flow-widths";
import { boxesOverlap, emptyBounds, includePrimitive, lineCrossesBox, textBoxFt } from "./geometry";

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

describe("crowded words on the gable wall", () => {
  // The Farrowby demo's garage attic: two gable louvers (north and south), no eave intake.
  const louver = (id: string, label: string) =>
    ({ id, kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 18, covering: { mesh: "1/4", louvers: true }, dropBelowRidgeFt: 2, label }) as const;
  const garage: AtticInput = {
    ...fanAndRidge,
    sections: [{ kind: "rect", lengthFt: 24, widthFt: 22, roofForm: "gable", pitchIn12: 6 }],
    vents: [louver("gable-louver-1", "North gable louver"), louver("gable-louver-2", "South gable louver")],
  };
  const picture = buildAirflowPicture(garage, analyzeAttic(garage), { airflow: simulateAirflow(garage, { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 }) });
  const glyphBoxes = picture.shapes.filter((s) => s.kind === "vent").map((s) => {
    const b = emptyBounds();
    for (const part of s.parts) includePrimitive(b, part, 0);
    return { id: s.id, box: b };
  });

  it("when a garage attic has two gable louvers, then one name says how many, with their total area", () => {
    const names = picture.texts.filter((t) => /gable louver/i.test(t.text)).map((t) => t.text);
    expect(names).toEqual(["Gable louvers ×2"]);
    const shape = picture.shapes.find((s) => s.ventIds.includes("gable-louver-1"))!;
    expect(shape.ventIds).toEqual(["gable-louver-1", "gable-louver-2"]);
    expect(shape.label).toMatch(/^Gable louvers on the gable wall ×2: [\d,.]+ sq in$/);
  });

  it("when the picture of that garage is drawn, then no two of its words overlap, and no cfm figure covers a vent", () => {
    const clashes: string[] = [];
    picture.texts.forEach((a, i) => {
      for (const b of picture.texts.slice(i + 1)) if (boxesOverlap(textBoxFt(a), textBoxFt(b))) clashes.push(`${a.text} / ${b.text}`);
    });
    expect(clashes).toEqual([]);
    const cfmTexts = picture.texts.filter((t) => t.id.startsWith("cfm-"));
    for (const t of cfmTexts) expect(glyphBoxes.filter((g) => boxesOverlap(textBoxFt(t), g.box)).map((g) => g.id), t.text).toEqual([]);
  });

  it("when an estimate labels the arrows of any demo-like attic, then a cfm figure never sits on a line", () => {
    for (const input of [fanAndRidge, garage]) {
      const p = buildAirflowPicture(input, analyzeAttic(input), { airflow: simulateAirflow(input, { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 }) });
      for (const t of p.texts.filter((x) => x.id.startsWith("cfm-"))) {
        const box = textBoxFt(t);
        const onLine = p.arrows.filter((a) => a.pointsFt.some(([x, y]) => x > box.minXFt && x < box.maxXFt && y > box.minYFt && y < box.maxYFt));
        expect(onLine.map((a) => a.id), t.text).toEqual([]);
      }
    }
  });
});

describe("cfm figures and the roof", () => {
  it("when a garage with box vents on one slope is labelled, then no cfm figure crosses the roof deck", () => {
    // The Farrowby garage after its box-vent option: soffits both sides, six box vents on one slope.
    const input: AtticInput = {
      ...fanAndRidge,
      sections: [{ kind: "rect", lengthFt: 24, widthFt: 22, roofForm: "gable", pitchIn12: 6 }],
      vents: [
        { id: "soffit", kind: "soffit-individual", location: "lower", quantity: 12, nfaSqInPerUnit: 28 },
        { id: "boxes", kind: "box", location: "upper", quantity: 6, nfaSqInPerUnit: 50, dropBelowRidgeFt: 1.5 },
      ],
    };
    const p = buildAirflowPicture(input, analyzeAttic(input), { airflow: simulateAirflow(input, { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 }) });
    const deck = p.shapes.find((s) => s.id === "roof-deck")!;
    const labels = p.texts.filter((t) => t.id.startsWith("cfm-"));
    expect(labels.length).toBeGreaterThan(0);
    for (const t of labels) {
      for (const part of deck.parts) if (part.type === "polyline") expect(lineCrossesBox(part.pointsFt, textBoxFt(t), deck.strokeWidthFt / 2, p.unitFt), t.text).toBe(false);
    }
  });
});
