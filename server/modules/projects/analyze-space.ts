import { analyzeParsedAttic, ParsedAtticSchema, type AtticAnalysis } from "../../../shared/ventilation/index.ts";
import { toAtticInput, type ProjectBasis } from "../../../shared/survey/to-attic-input.ts";
import type { SpaceSurvey } from "../../../shared/schemas/survey.ts";

export interface SpaceAnalysis {
  spaceId: string;
  name: string;
  analysis: AtticAnalysis | null;
  issues: { path: string; message: string }[];
}

/**
 * One space through the shared core, exactly as the client's live panel does it: the same
 * toAtticInput, the same schema (parsed once, here), the same core. Never stored: always recomputed.
 */
export function analyzeSpace(project: ProjectBasis, space: SpaceSurvey & { id: string }): SpaceAnalysis {
  const base = { spaceId: space.id, name: space.name };
  if (space.sections.length === 0) {
    return { ...base, analysis: null, issues: [{ path: "sections", message: "Add at least one section of attic floor to see the analysis." }] };
  }
  const parsed = ParsedAtticSchema.safeParse(toAtticInput(project, space));
  if (!parsed.success) {
    return { ...base, analysis: null, issues: parsed.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })) };
  }
  return { ...base, analysis: analyzeParsedAttic(parsed.data), issues: [] };
}
