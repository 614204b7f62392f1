import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeAttic, type AtticInput } from "../ventilation";
import { atticArb } from "../ventilation/arbitraries.test-helpers";
import { buildAirflowPicture } from "./build-airflow-picture";
import { describeAirflowPicture } from "./describe-airflow-picture";
import { DEMO_CASES } from "./demo-cases.test-helpers";
import type { AirflowPicture, ShortCircuitArrow } from "./types";
import { boxesOverlap, lineCrossesBox, textBoxFt } from "./geometry";

const build = (input: AtticInput, sectionIndex?: number) => buildAirflowPicture(input, analyzeAttic(input), sectionIndex === undefined ? {} : { sectionIndex });
const shortCircuits = (p: AirflowPicture) => p.arrows.filter((a): a is ShortCircuitArrow => a.kind === "short-circuit-path");
const intended = (p: AirflowPicture) => p.arrows.filter((a) => a.kind === "intended-path");
const shape = (p: AirflowPicture, id: string) => p.shapes.find((s) => s.id === id);
const dist = (a: readonly [number, number], b: readonly [number, number]) => Math.hypot(a[0] - b[0], a[1] - b[1]);

/** Every number anywhere in the picture, with its path, for the finite check. */
function numbersIn(value: unknown, path = "picture", out: Array<[string, number]> = []): Array<[string, number]> {
  if (typeof value === "number") out.push([path, value]);
  else if (Array.isArray(value)) value.forEach((v, i) => numbersIn(v, `${path}[${i}]`, out));
  else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) numbersIn(v, `${path}.${k}`, out);
  return out;
}

function expectWellFormed(picture: AirflowPicture) {
  const bad = numbersIn(picture).filter(([, n]) => !Number.isFinite(n));
  expect(bad).toEqual([]);
  expect(picture.viewBox.widthFt).toBeGreaterThan(0);
  expect(picture.viewBox.heightFt).toBeGreaterThan(0);
  for (const s of picture.shapes) expect(s.label.length).toBeGreaterThan(0);
  for (const a of picture.arrows) {
    expect(a.label.length).toBeGreaterThan(0);
    expect(a.pointsFt.length).toBeGreaterThanOrEqual(2);
  }
  for (const t of picture.texts) expect(t.text).not.toMatch(/NaN|undefined|Infinity/);
  for (const c of picture.captions) expect(c.text).not.toMatch(/NaN|undefined|Infinity/);
  // Everything drawn lies inside the viewBox.
  const { minXFt, minYFt, widthFt, heightFt } = picture.viewBox;
  const inside = ([x, y]: readonly [number, number]) => x >= minXFt - 1e-6 && x <= minXFt + widthFt + 1e-6 && y >= minYFt - 1e-6 && y <= minYFt + heightFt + 1e-6;
  for (const a of picture.arrows) for (const p of [...a.pointsFt, ...a.head.pointsFt]) expect(inside(p)).toBe(true);
  for (const s of picture.shapes) for (const part of s.parts) for (const p of part.type === "circle" ? [part.centerFt] : part.pointsFt) expect(inside(p)).toBe(true);
}

describe("buildAirflowPicture", () => {
  it("when a ridge and soffits are balanced, then an intended path starts at each eave with intake and ends out at the ridge, with no short-circuit", () => {
    const picture = build(DEMO_CASES.balanced);
    const paths = intended(picture);
    expect(paths.map((a) => a.fromPlace)).toEqual(["the left soffit", "the right soffit"]);
    expect(new Set(paths.map((a) => a.toPlace))).toEqual(new Set(["the ridge vent"]));
    for (const path of paths) {
      const eave = shape(picture, path.fromPlace === "the left soffit" ? "eave-left" : "eave-right")!;
      const first = path.pointsFt[0]!;
      // Starts outdoors under its own eave…
      expect(first[1]).toBeGreaterThan(picture.riseFt);
      expect(Math.sign(first[0] - picture.spanFt / 2)).toBe(path.fromPlace === "the left soffit" ? -1 : 1);
      expect(eave.style).toBe("intake-vent");
      // …and ends above the ridge (y < 0 is above the ridge line).
      expect(path.head.pointsFt[1]![1]).toBeLessThan(0);
      expect(path.head.kind).toBe("filled-triangle");
      expect(path.dashFt).toEqual([]);
    }
    expect(shortCircuits(picture)).toEqual([]);
    expectWellFormed(picture);
  });

  it("when soffit intake is 720 sq in on a gable, then each eave shows half of it in its label and text", () => {
    const picture = build(DEMO_CASES.balanced);
    expect(shape(picture, "eave-left")!.label).toContain("360 sq in (half of 720 sq in)");
    expect(picture.texts.filter((t) => t.forId === "eave-right").map((t) => t.text)).toEqual(["Soffit intake", "360 sq in"]);
    expect(shape(picture, "vent-ridge")!.label).toBe("Ridge vent, 36 ft: 648 sq in");
  });

  it("when a powered gable fan shares the attic with a ridge vent, then a short-circuit path runs from the ridge to the fan with the finding code", () => {
    const picture = build(DEMO_CASES.gableFanRidge);
    const fanShape = shape(picture, "vent-fan")!;
    expect(fanShape.style).toBe("fan");
    const path = shortCircuits(picture).find((a) => a.findingCode === "powered-with-passive-exhaust")!;
    expect(path).toBeDefined();
    expect(path.fromPlace).toBe("the ridge vent");
    expect(path.toPlace).toBe("the gable fan");
    expect(path.ventIds).toEqual(expect.arrayContaining(["ridge", "fan"]));
    expect(path.caption).toContain("Powered fan short-circuits through other high vents");
    expect(path.caption).toMatch(/^Short-circuit A — /);
    // Starts above the roof at the ridge and ends at the fan's edge.
    expect(path.pointsFt[0]![1]).toBeLessThan(0);
    const fanCircle = fanShape.parts.find((p) => p.type === "circle")!;
    if (fanCircle.type !== "circle") throw new Error("fan has no circle");
    expect(dist(path.head.pointsFt[1]!, fanCircle.centerFt)).toBeLessThan(fanCircle.radiusFt * 1.6);
    // Drawn distinctly: dashed with an open arrowhead.
    expect(path.dashFt.length).toBe(2);
    expect(path.head.kind).toBe("open-chevron");
  });

  it("when the fan has too little intake, then a short-circuit path rises from the rooms below through the ceiling to the fan", () => {
    const picture = build(DEMO_CASES.gableFanRidge);
    const path = shortCircuits(picture).find((a) => a.findingCode === "fan-intake-short")!;
    expect(path.fromPlace).toBe("the rooms below");
    const ceilingY = shape(picture, "ceiling")!.parts[0]!;
    if (ceilingY.type !== "polyline") throw new Error("ceiling is a line");
    expect(path.pointsFt[0]![1]).toBeGreaterThan(ceilingY.pointsFt[0]![1]);
    expect(path.caption).toContain("Not enough intake for the fan");
  });

  it("when box vents share the roof with a ridge vent, then a mixed-exhaust short-circuit runs from the box vents to the ridge", () => {
    const picture = build(DEMO_CASES.mixedExhaust);
    const path = shortCircuits(picture).find((a) => a.findingCode === "mixed-exhaust")!;
    expect(path.fromPlace).toBe("the box vents");
    expect(path.toPlace).toBe("the ridge vent");
    expect(shape(picture, "vent-boxes")!.label).toBe("Box (static) vent ×4: 200 sq in");
    // The box vents, 4.5 ft below a 7.5 ft rise, sit 60 % of the way down the slope.
    const box = shape(picture, "vent-boxes")!;
    const ys = box.parts.flatMap((p) => (p.type === "circle" ? [p.centerFt[1]] : p.pointsFt.map((q) => q[1])));
    const meanY = ys.reduce((a, b) => a + b, 0) / ys.length;
    expect(meanY / picture.riseFt).toBeGreaterThan(0.45);
    expect(meanY / picture.riseFt).toBeLessThan(0.65);
    expect(shortCircuits(picture).map((a) => a.findingCode)).toContain("upper-vent-too-low");
  });

  it("when there is no intake, then no intended path is drawn, the eaves say so and the exhaust draws from the house", () => {
    const picture = build(DEMO_CASES.noIntake);
    expect(intended(picture)).toEqual([]);
    expect(picture.shapes.some((s) => s.kind === "eave-intake")).toBe(false);
    expect(picture.texts.filter((t) => t.text === "No intake")).toHaveLength(2);
    const path = shortCircuits(picture)[0]!;
    expect(path.findingCode).toBe("no-intake");
    expect(path.fromPlace).toBe("the rooms below");
    expect(picture.legend.map((l) => l.style)).toEqual(["short-circuit"]);
  });

  it("when the soffits are blocked, then the eave paths are blocked (dotted, ending in a bar) and an X marks each eave", () => {
    const picture = build(DEMO_CASES.blockedSoffits);
    expect(intended(picture)).toEqual([]);
    const blocked = picture.arrows.filter((a) => a.kind === "blocked-path");
    expect(blocked).toHaveLength(2);
    for (const a of blocked) {
      expect(a.head.kind).toBe("stop-bar");
      expect(a.style).toBe("blocked");
    }
    expect(picture.shapes.filter((s) => s.kind === "blocked-mark")).toHaveLength(2);
    expect(shape(picture, "eave-left")!.style).toBe("blocked");
    expect(picture.texts.filter((t) => t.forId === "eave-left").map((t) => t.text)).toEqual(["Soffit intake", "blocked"]);
    expect(picture.legend.find((l) => l.style === "blocked")!.words).toContain("Blocked");
  });

  it("when there is intake but no exhaust, then the eave air is drawn as blocked under the ridge", () => {
    const input: AtticInput = { ...DEMO_CASES.balanced, vents: [DEMO_CASES.balanced.vents[0]!] };
    const picture = build(input);
    const blocked = picture.arrows.filter((a) => a.kind === "blocked-path");
    expect(blocked.map((a) => a.kind === "blocked-path" && a.findingCode)).toEqual(["no-exhaust", "no-exhaust"]);
  });

  it("when a gable louver shares the attic with a ridge vent, then a short-circuit runs from the louver to the ridge", () => {
    const input: AtticInput = {
      ...DEMO_CASES.balanced,
      vents: [...DEMO_CASES.balanced.vents, { id: "louver", kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } }],
    };
    const path = shortCircuits(build(input)).find((a) => a.findingCode === "gable-with-ridge")!;
    expect(path.fromPlace).toBe("the gable louver");
    expect(path.toPlace).toBe("the ridge vent");
  });

  it("when a shed roof is drawn, then it has one eave with intake and the ridge vent at the high side", () => {
    const input: AtticInput = { ...DEMO_CASES.balanced, sections: [{ kind: "rect", lengthFt: 30, widthFt: 16, roofForm: "shed", pitchIn12: 3 }] };
    const picture = build(input);
    expect(picture.roofForm).toBe("shed");
    expect(intended(picture).map((a) => a.fromPlace)).toEqual(["the soffit at the low eave"]);
    expect(picture.riseFt).toBeCloseTo(4, 6); // 16 ft × 3/12
    expectWellFormed(picture);
  });

  it("when the roof is a hip, then it is drawn as a gable-like section with a note saying so", () => {
    const input: AtticInput = { ...DEMO_CASES.balanced, sections: [{ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "hip", pitchIn12: 6 }] };
    const picture = build(input);
    expect(picture.roofForm).toBe("hip");
    expect(picture.notes.join(" ")).toMatch(/Hip roof: drawn as a cut through the middle/);
    expect(picture.riseFt).toBeCloseTo(7.5, 6);
  });

  it("when only an area is known, then the span is its square root and pitch defaults to 6/12 with notes", () => {
    const input: AtticInput = { ...DEMO_CASES.balanced, sections: [{ kind: "area", areaSqFt: 900 }] };
    const picture = build(input);
    expect(picture.spanFt).toBe(30);
    expect(picture.drawnPitchIn12).toBe(6);
    expect(picture.recordedPitchIn12).toBeNull();
    expect(picture.notes.join(" ")).toContain("square root of the floor area (30 ft)");
  });

  it("when a section is asked for, then that one is drawn; an index out of range falls back to the largest", () => {
    const input: AtticInput = {
      ...DEMO_CASES.balanced,
      sections: [
        { kind: "rect", lengthFt: 20, widthFt: 12, roofForm: "gable", pitchIn12: 4 },
        { kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 },
      ],
    };
    expect(build(input).sectionIndex).toBe(1);
    expect(build(input, 0).spanFt).toBe(12);
    expect(build(input, 7).sectionIndex).toBe(1);
    expect(build(input, 0.5).sectionIndex).toBe(1);
  });

  it("when the same input is built twice, then the pictures are identical and survive JSON", () => {
    const a = build(DEMO_CASES.gableFanRidge);
    const b = build(DEMO_CASES.gableFanRidge);
    expect(a).toEqual(b);
    expect(JSON.parse(JSON.stringify(a))).toEqual(a);
  });

  it("when the span doubles, then every coordinate doubles (sizes come from the data)", () => {
    const small = build(DEMO_CASES.gableFanRidge);
    const big = build({ ...DEMO_CASES.gableFanRidge, sections: [{ kind: "rect", lengthFt: 40, widthFt: 60, roofForm: "gable", pitchIn12: 6 }] });
    expect(big.viewBox.widthFt / small.viewBox.widthFt).toBeCloseTo(2, 2);
    expect(big.unitFt).toBeCloseTo(small.unitFt * 2, 9);
  });

  it.each(Object.entries(DEMO_CASES))("when the demo case %s is drawn, then the picture is well formed", (_name, input) => {
    expectWellFormed(build(input));
  });

  it("when any valid attic is drawn, then it does not throw, has no NaN and stays inside its viewBox", () => {
    fc.assert(
      fc.property(atticArb(10), fc.option(fc.integer({ min: -2, max: 8 }), { nil: undefined }), (input, sectionIndex) => {
        const picture = build(input, sectionIndex);
        expectWellFormed(picture);
        for (const a of shortCircuits(picture)) {
          expect(a.caption.length).toBeGreaterThan(0);
          expect(analyzeAttic(input).findings.some((f) => f.code === a.findingCode)).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  }, 30_000); // 300 random attics; on a loaded 2-core machine this can pass 5 s (correctness, not a timing check)
});

describe("the insulation word", () => {
  it("when each demo attic is drawn, then the word on the attic floor covers no vent's label", () => {
    for (const [name, input] of Object.entries(DEMO_CASES)) {
      const picture = build(input);
      const word = picture.texts.find((t) => t.id === "insulation-text")!;
      const covered = picture.texts.filter((t) => t.id !== word.id && boxesOverlap(textBoxFt(word), textBoxFt(t)));
      expect(covered.map((t) => t.text), name).toEqual([]);
    }
  });

  it("when the default spot is free, then the word stays at three quarters of the span", () => {
    const picture = build(DEMO_CASES.balanced); // a 30 ft wide gable attic
    const word = picture.texts.find((t) => t.id === "insulation-text")!;
    expect(word.atFt[0]).toBeCloseTo(22.5, 6);
  });
});

describe("the whole-house fan", () => {
  // A whole-house fan sits in the ceiling and blows house air up into the attic; the attic's vents
  // let it out (California Energy Code §150.1(c)12(B): 1 sq ft of attic NFA per 750 cfm [SOURCES.md S33]).
  const houseFanPaths = (p: AirflowPicture) => p.arrows.filter((a) => a.kind === "house-fan-path");
  const yRange = (s: ReturnType<typeof shape>) => {
    const ys = s!.parts.flatMap((p) => (p.type === "circle" ? [p.centerFt[1] - p.radiusFt, p.centerFt[1] + p.radiusFt] : p.pointsFt.map((q) => q[1])));
    return [Math.min(...ys), Math.max(...ys)] as const;
  };
  const ceilingYOf = (p: AirflowPicture) => {
    const part = shape(p, "ceiling")!.parts[0]!;
    if (part.type !== "polyline") throw new Error("ceiling is a line");
    return part.pointsFt[0]![1];
  };

  it("when a whole-house fan is recorded, then it is drawn in the ceiling, not on the roof, with its name and cfm", () => {
    const picture = build(DEMO_CASES.wholeHouseFan);
    const fan = shape(picture, "vent-whf")!;
    expect(fan.ventKind).toBe("whole-house-fan");
    expect(fan.style).toBe("fan");
    const [top, bottom] = yRange(fan);
    const ceilingY = ceilingYOf(picture);
    expect(top).toBeLessThan(ceilingY); // reaches up into the attic…
    expect(bottom).toBeGreaterThan(ceilingY); // …and its shutter shows in the room below
    expect(top).toBeGreaterThan(picture.riseFt * 0.5); // nowhere near the roof deck
    expect(fan.label).toBe("Whole-house fan in the ceiling: 4,500 cfm");
    expect(picture.texts.filter((t) => t.forId === "vent-whf").map((t) => t.text)).toEqual(["Whole-house fan", "4,500 cfm"]);
    expectWellFormed(picture);
  });

  it("when it shares the attic with soffits and a ridge vent, then house air rises through the fan into the attic and out at the ridge, and the soffit paths still end at the ridge", () => {
    const picture = build(DEMO_CASES.wholeHouseFan);
    const paths = houseFanPaths(picture);
    expect(paths.map((a) => [a.fromPlace, a.toPlace])).toEqual([["the rooms below", "the ridge vent"]]);
    const path = paths[0]!;
    const ceilingY = ceilingYOf(picture);
    expect(path.pointsFt[0]![1]).toBeGreaterThan(ceilingY); // starts in the rooms
    expect(path.head.pointsFt[1]![1]).toBeLessThan(0); // leaves above the ridge
    expect(path.ventIds).toEqual(["whf", "ridge"]);
    expect(path.style).toBe("intended");
    // It passes through the fan: some point of the line lies within the fan's width.
    const fan = shape(picture, "vent-whf")!;
    const xs = fan.parts.flatMap((p) => (p.type === "circle" ? [p.centerFt[0]] : p.pointsFt.map((q) => q[0])));
    const crossing = path.pointsFt.find((p) => Math.abs(p[1] - ceilingY) < picture.unitFt * 1.5)!;
    expect(crossing[0]).toBeGreaterThanOrEqual(Math.min(...xs));
    expect(crossing[0]).toBeLessThanOrEqual(Math.max(...xs));
    // The fan is not an exhaust the soffits feed, nor an attic fan short-circuiting the ridge.
    expect(intended(picture).map((a) => a.toPlace)).toEqual(["the ridge vent", "the ridge vent"]);
    expect(shortCircuits(picture)).toEqual([]);
  });

  it("when it is drawn, then the caption and the description say what it does, that it needs attic exhaust area, windows open, and the gas-appliance caution with local codes", () => {
    const picture = build(DEMO_CASES.wholeHouseFan);
    const caption = picture.captions.find((c) => c.id === "caption-house-fan")!;
    expect(caption.style).toBe("intended");
    for (const words of [/whole-house fan/i, /up into the attic/, /ridge vent/, /750 cfm/, /windows open/, /gas or oil appliances/, /local codes/]) {
      expect(caption.text).toMatch(words);
    }
    const description = describeAirflowPicture(picture);
    expect(description).toContain(caption.text);
    expect(description).not.toContain("There is no exhaust vent");
    expect(picture.legend.find((l) => l.style === "intended")!.words).toMatch(/whole-house fan/);
  });

  it("when it is recorded as an upper vent, then it is still drawn in the ceiling and never becomes the soffits' exhaust", () => {
    const input: AtticInput = { ...DEMO_CASES.wholeHouseFan, vents: DEMO_CASES.wholeHouseFan.vents.map((v) => (v.id === "whf" ? { ...v, location: "upper" as const } : v)) };
    const picture = build(input);
    expect(houseFanPaths(picture)).toHaveLength(1);
    expect(intended(picture).every((a) => a.toPlace === "the ridge vent")).toBe(true);
  });

  it("when the attic has soffits but no upper vent, then the fan's air is drawn leaving through the soffits", () => {
    const input: AtticInput = { ...DEMO_CASES.wholeHouseFan, vents: DEMO_CASES.wholeHouseFan.vents.filter((v) => v.id !== "ridge") };
    const picture = build(input);
    const paths = houseFanPaths(picture);
    expect(paths.map((a) => a.toPlace)).toEqual(["the left soffit", "the right soffit"]);
    for (const p of paths) expect(p.head.pointsFt[1]![1]).toBeGreaterThan(picture.riseFt); // out below the eaves
    expectWellFormed(picture);
  });

  it("when the attic has no vent at all, then the fan's air is drawn blocked under the roof and the caption says it has no way out", () => {
    const input: AtticInput = { ...DEMO_CASES.wholeHouseFan, vents: DEMO_CASES.wholeHouseFan.vents.filter((v) => v.id === "whf") };
    const picture = build(input);
    const blocked = picture.arrows.filter((a) => a.kind === "blocked-path" && a.ventIds.includes("whf"));
    expect(blocked).toHaveLength(1);
    expect(picture.captions.find((c) => c.id === "caption-house-fan")!.text).toMatch(/no vent to let/);
    // No eave is blocked here, so the legend promises no X mark.
    expect(picture.legend.find((l) => l.style === "blocked")!.words).not.toContain("X");
    expectWellFormed(picture);
  });

  it("when a gable roof is drawn with a whole-house fan, then its texts overlap none of the others", () => {
    const picture = build(DEMO_CASES.wholeHouseFan);
    const mine = picture.texts.filter((t) => t.forId === "vent-whf");
    const others = picture.texts.filter((t) => t.forId !== "vent-whf");
    for (const t of mine) expect(others.filter((o) => boxesOverlap(textBoxFt(t), textBoxFt(o))).map((o) => o.text)).toEqual([]);
  });
});

describe("the rooms' words", () => {
  it("when air is drawn up from the rooms to box vents on one slope, then no line crosses \"Rooms below\" and the fan's name stays clear of it", () => {
    // The Whitcombe rental as found: two box vents, no eave intake (the house feeds them).
    const boxesOnly: AtticInput = { ...DEMO_CASES.balanced, sections: [{ kind: "rect", lengthFt: 40, widthFt: 22, roofForm: "gable", pitchIn12: 5 }], vents: [{ id: "boxes", kind: "box", location: "upper", quantity: 2, nfaSqInPerUnit: 50, dropBelowRidgeFt: 1 }] };
    // A whole-house fan with too little intake: air from the rooms also rises to the ridge.
    const fanShortIntake: AtticInput = { ...DEMO_CASES.wholeHouseFan, vents: DEMO_CASES.wholeHouseFan.vents.map((v) => (v.id === "soffit" ? { ...v, lengthFt: 30 } : v)) };
    for (const input of [boxesOnly, DEMO_CASES.wholeHouseFan, DEMO_CASES.noIntake, fanShortIntake]) {
      const picture = build(input);
      const words = picture.texts.find((t) => t.id === "house-text")!;
      expect(picture.arrows.filter((a) => lineCrossesBox(a.pointsFt, textBoxFt(words), a.strokeWidthFt / 2, picture.unitFt)).map((a) => a.id)).toEqual([]);
      expect(picture.texts.filter((t) => t !== words && boxesOverlap(textBoxFt(t), textBoxFt(words))).map((t) => t.text)).toEqual([]);
      const fanWords = picture.texts.filter((t) => t.forId === "vent-whf");
      for (const t of fanWords) expect(picture.arrows.filter((a) => lineCrossesBox(a.pointsFt, textBoxFt(t), a.strokeWidthFt / 2, picture.unitFt)).map((a) => a.id)).toEqual([]);
    }
  });
});
