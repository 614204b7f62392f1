/** Tallgrass Exteriors demo attics (Marrow Creek), for the airflow tests and screenshots. */
import type { AtticInput } from "../ventilation";

const base = {
  codeBasis: "irc-2018",
  climateZone: 4,
  ceilingVaporRetarder: "none",
  roofColor: "medium",
} as const;

const mainSection = { kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 } as const;

export const DEMO_CASES: Record<"balanced" | "gableFanRidge" | "mixedExhaust" | "noIntake" | "blockedSoffits" | "wholeHouseFan", AtticInput> = {
  balanced: {
    ...base,
    sections: [mainSection],
    vents: [
      { id: "soffit", kind: "soffit-continuous", location: "lower", lengthFt: 80, nfaSqInPerFt: 9 },
      { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
    ],
  },
  gableFanRidge: {
    ...base,
    sections: [mainSection],
    vents: [
      { id: "soffit", kind: "soffit-individual", location: "lower", quantity: 8, nfaSqInPerUnit: 25 },
      { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
      { id: "fan", kind: "powered-gable", location: "upper", cfm: 1200, mounting: "gable" },
    ],
  },
  mixedExhaust: {
    ...base,
    sections: [mainSection],
    vents: [
      { id: "soffit", kind: "soffit-continuous", location: "lower", lengthFt: 80, nfaSqInPerFt: 9 },
      { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
      { id: "boxes", kind: "box", location: "upper", quantity: 4, nfaSqInPerUnit: 50, dropBelowRidgeFt: 4.5 },
    ],
  },
  noIntake: {
    ...base,
    sections: [mainSection],
    vents: [{ id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 }],
  },
  blockedSoffits: {
    ...base,
    sections: [mainSection],
    vents: [
      { id: "soffit", kind: "soffit-continuous", location: "lower", lengthFt: 80, nfaSqInPerFt: 9 },
      { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
    ],
    site: { soffitsBlocked: true },
  },
  wholeHouseFan: {
    ...base,
    sections: [mainSection],
    vents: [
      { id: "soffit", kind: "soffit-continuous", location: "lower", lengthFt: 80, nfaSqInPerFt: 9 },
      { id: "ridge", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
      { id: "whf", kind: "whole-house-fan", location: "lower", cfm: 4500 },
    ],
  },
};
