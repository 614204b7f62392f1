/**
 * A large attic for benchmarks: 20 sections and, by default, 150 vent rows, the most one space may
 * hold (`LIMITS.maxVents`, decision 27); pass 200 for the attic issue 17 measured before that limit
 * (it no longer validates, so only the trusted core entry takes it). Tallgrass Exteriors demo.
 */
import { LIMITS, type AtticInput, type Vent } from "../shared/ventilation/index";

export function largeAttic(ventRows: number = LIMITS.maxVents): AtticInput {
  const sections: AtticInput["sections"] = Array.from({ length: 20 }, (_, i) => {
    if (i % 3 === 0) return { kind: "rect", id: `sec-${i}`, lengthFt: 30 + i, widthFt: 24, roofForm: "gable", pitchIn12: 6 };
    if (i % 3 === 1) {
      // A 12-corner L/step outline.
      const w = 20 + i;
      return {
        kind: "polygon",
        id: `sec-${i}`,
        roofForm: "hip",
        pitchIn12: 8,
        spanFt: 20,
        pointsFt: [[0, 0], [w, 0], [w, 10], [w - 5, 10], [w - 5, 20], [w - 10, 20], [w - 10, 30], [10, 30], [10, 20], [5, 20], [5, 10], [0, 10]],
      };
    }
    return { kind: "area", id: `sec-${i}`, areaSqFt: 400 + i * 10, roofForm: "shed", pitchIn12: 4, spanFt: 16 };
  });
  const vents: Vent[] = Array.from({ length: ventRows }, (_, i): Vent => {
    const sectionId = `sec-${i % 20}`;
    switch (i % 8) {
      case 0:
        return { id: `v${i}`, kind: "soffit-continuous", location: "lower", sectionId, lengthFt: 20, nfaSqInPerFt: 9 };
      case 1:
        return { id: `v${i}`, kind: "soffit-individual", location: "lower", sectionId, quantity: 6, nfaSqInPerUnit: 25 };
      case 2:
        return { id: `v${i}`, kind: "ridge", location: "upper", sectionId, lengthFt: 12, nfaSqInPerFt: 18 };
      case 3:
        return { id: `v${i}`, kind: "box", location: "upper", sectionId, quantity: 2, nfaSqIn: 50, dropBelowRidgeFt: 2 };
      case 4:
        return { id: `v${i}`, kind: "gable-louver", location: "upper", sectionId, grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } };
      case 5:
        return { id: `v${i}`, kind: "turbine", location: "upper", sectionId, nfaSqIn: 112, heightAboveEaveFt: 5 };
      case 6:
        return {
          id: `v${i}`,
          kind: "powered-roof",
          location: "upper",
          sectionId,
          cfm: 1000,
          diagnostics: { isPowerVerifiedOff: true, windingResistanceOhms: 14, isBladeFreeToSpin: true, thermostatTest: { switchedLegVoltsDialBelow: 120, switchedLegVoltsDialAbove: 0 } },
        };
      default:
        return { id: `v${i}`, kind: "fascia", location: "lower", sectionId, lengthFt: 10, nfaSqInPerFt: 6 };
    }
  });
  return {
    codeBasis: "irc-2018",
    climateZone: 6,
    ceilingVaporRetarder: "class-II",
    roofColor: "dark",
    sections,
    vents,
    site: { atmosphericCombustionAppliance: true, bafflesPresent: false },
  };
}
