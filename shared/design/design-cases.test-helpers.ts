/**
 * Attics for generator tests and the benchmark (Tallgrass Exteriors jobs in Marrow Creek;
 * invented). Each is a SpaceSurvey as the estimator records it.
 */
import type { SpaceSurvey } from "../schemas/survey";
import type { ProjectBasis } from "../survey/to-attic-input";

export const SPACE_ID = "00000000-0000-4000-8000-00000000a771";

export const zone4Project: ProjectBasis = { codeBasis: "irc-2018", climateZone: 4, ceilingVaporRetarder: "none", roofColor: "medium" };

/** 40 × 25 ft gable ranch, 1,000 sq ft, with two old box vents and a few round soffit vents. */
export function smallRanch(): SpaceSurvey {
  return {
    name: "Main attic",
    roof: { form: "gable", pitchIn12: 5, ridgeLengthFt: 40, eaveLengthFt: 80 },
    sections: [{ kind: "rect", id: "main", lengthFt: 40, widthFt: 25 }],
    vents: [
      { id: "b1", kind: "box", location: "upper", quantity: 2, nfaSqInPerUnit: 50, dropBelowRidgeFt: 1 },
      { id: "s1", kind: "soffit-individual", location: "lower", quantity: 6, nfaSqInPerUnit: 9 },
    ],
    site: {},
    notes: null,
  };
}

/** L-shaped ranch: 48 × 28 ft main wing and 20 × 16 ft ell, gable roofs, one attic space. */
export function lShape(): SpaceSurvey {
  return {
    name: "Whole attic",
    roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null },
    sections: [
      { kind: "rect", id: "main", lengthFt: 48, widthFt: 28 },
      { kind: "rect", id: "ell", lengthFt: 20, widthFt: 16 },
    ],
    vents: [{ id: "g1", kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } }],
    site: {},
    notes: null,
  };
}

/** 44 × 38 ft hip roof: the ridge is only 44 − 38 = 6 ft. */
export function hipShortRidge(): SpaceSurvey {
  return {
    name: "Main attic",
    roof: { form: "hip", pitchIn12: 6, ridgeLengthFt: 6, eaveLengthFt: 164 },
    sections: [{ kind: "rect", id: "main", lengthFt: 44, widthFt: 38 }],
    vents: [{ id: "t1", kind: "turbine", location: "upper", quantity: 2, nfaSqIn: 112, dropBelowRidgeFt: 2 }],
    site: { bafflesPresent: true },
    notes: null,
  };
}

/** 50 × 30 ft gable with a powered gable fan and a short old ridge vent: the fan short-circuits it. */
export function fanAndRidge(): SpaceSurvey {
  return {
    name: "Main attic",
    roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 50, eaveLengthFt: 100 },
    sections: [{ kind: "rect", id: "main", lengthFt: 50, widthFt: 30 }],
    vents: [
      { id: "fan1", kind: "powered-gable", location: "upper", cfm: 1_200, mounting: "gable", sealedToOpening: false },
      { id: "r1", kind: "ridge", location: "upper", lengthFt: 20, nfaSqInPerFt: 18 },
      { id: "g1", kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } },
      { id: "s1", kind: "soffit-continuous", location: "lower", lengthFt: 40, nfaSqInPerFt: 9 },
    ],
    site: { atmosphericCombustionAppliance: true },
    notes: null,
  };
}

/** 36 × 28 ft gable whose soffit vents are buried in insulation, no baffles. */
export function blockedSoffits(): SpaceSurvey {
  return {
    name: "Main attic",
    roof: { form: "gable", pitchIn12: 4, ridgeLengthFt: 36, eaveLengthFt: 72 },
    sections: [{ kind: "rect", id: "main", lengthFt: 36, widthFt: 28 }],
    vents: [
      { id: "s1", kind: "soffit-continuous", location: "lower", lengthFt: 72, nfaSqInPerFt: 9 },
      { id: "r1", kind: "ridge", location: "upper", lengthFt: 35, nfaSqInPerFt: 18 },
    ],
    site: { soffitsBlocked: true, bafflesPresent: false },
    notes: null,
  };
}

/** A powered roof fan and nothing else high: a remove-fan option reuses its opening. */
export function roofFanOnly(): SpaceSurvey {
  return {
    name: "Main attic",
    roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 42, eaveLengthFt: 84 },
    sections: [{ kind: "rect", id: "main", lengthFt: 42, widthFt: 30 }],
    vents: [
      { id: "fan1", kind: "powered-roof", location: "upper", cfm: 1_000, dropBelowRidgeFt: 2 },
      { id: "s1", kind: "soffit-individual", location: "lower", quantity: 10, nfaSqInPerUnit: 56 },
    ],
    site: {},
    notes: null,
  };
}
