/**
 * One option's analysis: the core run on the attic as it would be after the work
 * (applyOption, then toAtticInput). Never stored as the source of truth (DESIGN.md §3).
 */
import type { CatalogItem } from "../schemas/catalog";
import type { OptionSpace } from "../schemas/options";
import type { SpaceSurvey } from "../schemas/survey";
import { toAtticInput, type ProjectBasis } from "../survey/to-attic-input";
import { analyzeAttic, type AtticAnalysis } from "../ventilation/index";
import { applyOption } from "./apply-option";

export interface OptionSpaceAnalysis {
  applied: SpaceSurvey;
  analysis: AtticAnalysis;
}

/**
 * @example
 * analyzeOption(project, space, optionSpace, catalog).analysis.compliant // true when the work meets the code
 */
export function analyzeOption(project: ProjectBasis, space: SpaceSurvey, optionSpace: OptionSpace, catalog: readonly CatalogItem[]): OptionSpaceAnalysis {
  const applied = applyOption(space, optionSpace, catalog);
  return { applied, analysis: analyzeAttic(toAtticInput(project, applied)) };
}
