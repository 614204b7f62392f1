import { applyOption, DesignError } from "@shared/design/index";
import { NO_DEPOSIT, priceOption, PricingError, type OptionPrice, type PricingSettings } from "@shared/pricing/index";
import type { CatalogItem } from "@shared/schemas/catalog";
import { OptionSpaceSchema, type DesignOptionInput, type OptionSpace } from "@shared/schemas/options";
import type { SpaceSurvey } from "@shared/schemas/survey";
import { toAtticInput, type ProjectBasis } from "@shared/survey/to-attic-input";
import { tryAnalyzeAttic, type AtticInput, type TryAnalyzeResult } from "@shared/ventilation/index";
import type { ProjectRecord, SpaceRecord } from "../api/types";

/*
 * The option's analysis and price in the browser, with the same shared core and pricing the
 * server uses (options.service.ts presentOption), so what is shown while typing is what is saved.
 */

export interface AnalysedAttic {
  input: AtticInput | null;
  result: TryAnalyzeResult;
}

export interface LiveSpace {
  spaceId: string;
  name: string;
  /** The attic as surveyed. */
  before: AnalysedAttic;
  /** The attic after this option's work. */
  after: AnalysedAttic;
}

export const basisOf = (project: ProjectRecord): ProjectBasis => ({
  codeBasis: project.codeBasis,
  climateZone: project.climateZone,
  moistureRegime: project.moistureRegime ?? null,
  ceilingVaporRetarder: project.ceilingVaporRetarder,
  ...(project.upperShareBase !== undefined ? { upperShareBase: project.upperShareBase } : {}),
  roofColor: project.roofColor,
});

export const surveyOf = (space: SpaceRecord): SpaceSurvey => ({
  name: space.name, roof: space.roof, sections: space.sections, vents: space.vents, site: space.site, notes: space.notes,
});

/** The option's plan for a space; a space it does not mention is as surveyed. */
export const planFor = (option: Pick<DesignOptionInput, "spaces">, spaceId: string): OptionSpace =>
  option.spaces.find((s) => s.spaceId === spaceId) ?? OptionSpaceSchema.parse({ spaceId });

function analyse(project: ProjectBasis, survey: SpaceSurvey): AnalysedAttic {
  if (survey.sections.length === 0) {
    return { input: null, result: { ok: false, issues: [{ path: "sections", message: "The survey of this space has no attic floor yet, so it can't be analysed." }] } };
  }
  const input = toAtticInput(project, survey);
  return { input, result: tryAnalyzeAttic(input) };
}

export function analyzeOptionLive(project: ProjectRecord, spaces: readonly SpaceRecord[], option: Pick<DesignOptionInput, "spaces">, catalog: readonly CatalogItem[]): LiveSpace[] {
  const basis = basisOf(project);
  return spaces.map((space) => {
    const surveyed = surveyOf(space);
    const before = analyse(basis, surveyed);
    let after: AnalysedAttic;
    try {
      after = analyse(basis, applyOption(surveyed, planFor(option, space.id), catalog));
    } catch (err) {
      if (!(err instanceof DesignError)) throw err;
      after = { input: null, result: { ok: false, issues: [{ path: "added", message: err.message }] } };
    }
    return { spaceId: space.id, name: space.name, before, after };
  });
}

export type LivePrice = { price: OptionPrice; issue: null } | { price: null; issue: string };

export function priceOptionLive(option: Pick<DesignOptionInput, "spaces" | "laborLines" | "discount">, catalog: readonly CatalogItem[], settings: PricingSettings): LivePrice {
  try {
    return { price: priceOption(option, catalog, settings), issue: null };
  } catch (err) {
    if (err instanceof PricingError) return { price: null, issue: err.message };
    throw err;
  }
}

/**
 * The company's tax terms as the server last applied them (from a saved price). The deposit rule
 * is not sent to non-owners, so the live price leaves the deposit to the server's saved figure.
 */
export function pricingFrom(price: OptionPrice | null | undefined): PricingSettings {
  return { taxRateBasisPoints: price?.taxRateBasisPoints ?? 0, isLaborTaxed: price?.isLaborTaxed ?? true, deposit: NO_DEPOSIT };
}
