import type { AtticInput, CodeBasis, MoistureRegime, RoofColor, UpperShareBase, VaporRetarder } from "../ventilation/schema.ts";
import type { SpaceSurvey } from "../schemas/survey.ts";

export interface ProjectBasis {
  codeBasis: CodeBasis;
  climateZone: number;
  /** IECC moisture letter (A, B, C) or null; zones 7–8 have none. */
  moistureRegime?: MoistureRegime | null | undefined;
  ceilingVaporRetarder: VaporRetarder;
  roofColor: RoofColor;
  /** The company's reading of the 1/300 upper-vent share (its profile setting); literal when absent. */
  upperShareBase?: UpperShareBase | null | undefined;
}

/**
 * The core's input for one attic space: the project's code basis and climate, the space's
 * sections (each taking the space's roof form and pitch unless it has its own), its vents and
 * its site flags. Pure, so the client's live panel and the server's analysis see the same thing.
 *
 * @example
 * toAtticInput({ codeBasis: "irc-2018", climateZone: 4, ceilingVaporRetarder: "none", roofColor: "dark" },
 *   { name: "Main attic", roof: { form: "hip", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null },
 *     sections: [{ kind: "rect", lengthFt: 40, widthFt: 30 }], vents: [], site: {}, notes: null }).sections[0]
 * // → { kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "hip", pitchIn12: 6 }
 */
export function toAtticInput(project: ProjectBasis, space: SpaceSurvey): AtticInput {
  const { moistureOrMould: _m, daylightAtRidge: _d, ...site } = space.site;
  return {
    codeBasis: project.codeBasis,
    climateZone: project.climateZone,
    ceilingVaporRetarder: project.ceilingVaporRetarder,
    roofColor: project.roofColor,
    ...(project.upperShareBase != null ? { upperShareBase: project.upperShareBase } : {}),
    ...(project.moistureRegime !== undefined ? { moistureRegime: project.moistureRegime } : {}),
    ...(space.roof.assembly !== undefined ? { assembly: space.roof.assembly } : {}),
    ...(space.roof.unvented !== undefined ? { unvented: space.roof.unvented } : {}),
    ...(space.roof.enclosedRafterBays !== undefined ? { enclosedRafterBays: space.roof.enclosedRafterBays } : {}),
    sections: space.sections.map((s) => ({ ...s, roofForm: s.roofForm ?? space.roof.form, pitchIn12: s.pitchIn12 ?? space.roof.pitchIn12 })),
    vents: space.vents,
    site,
  };
}
