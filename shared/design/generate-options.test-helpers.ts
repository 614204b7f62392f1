/** Checks every generated option must pass, computed independently of the generator. */
import { expect } from "vitest";
import { priceOption } from "../pricing/index";
import type { CatalogItem } from "../schemas/catalog";
import { DesignOptionInputSchema } from "../schemas/options";
import type { SpaceSurvey } from "../schemas/survey";
import { toAtticInput, type ProjectBasis } from "../survey/to-attic-input";
import { analyzeAttic, isPoweredKind } from "../ventilation/index";
import { applyOption } from "./apply-option";
import type { GenerateOptionsResult } from "./generate-options";

export function expectSoundOptions(result: GenerateOptionsResult, project: ProjectBasis, space: SpaceSurvey, catalog: readonly CatalogItem[]): void {
  expect(result.options.length + result.skipped.length).toBe(3);
  for (const skipped of result.skipped) expect(skipped.reason.length).toBeGreaterThan(10);
  const byId = new Map(catalog.map((i) => [i.id, i]));
  for (const generated of result.options) {
    const { option } = generated;
    expect(DesignOptionInputSchema.safeParse(option).success).toBe(true);
    const optionSpace = option.spaces[0]!;
    // The attic after the work, re-applied and re-analysed here, not trusted from the generator.
    const applied = applyOption(space, optionSpace, catalog);
    expect(applied).toEqual(generated.applied);
    const analysis = analyzeAttic(toAtticInput(project, applied));
    expect(analysis).toEqual(generated.analysis);
    expect(analysis.compliant).toBe(true);
    expect(analysis.provided.totalSqIn).toBeGreaterThanOrEqual(analysis.requirement.totalSqIn);
    // One exhaust type, no fan, never a fan or gable louver with a ridge vent, intake ≥ exhaust.
    const exhaustKinds = new Set(applied.vents.filter((v) => !isPoweredKind(v.kind) && v.location === "upper").map((v) => v.kind));
    expect(exhaustKinds.size).toBe(1);
    expect(applied.vents.some((v) => isPoweredKind(v.kind))).toBe(false);
    if (exhaustKinds.has("ridge")) expect(applied.vents.some((v) => v.kind === "gable-louver")).toBe(false);
    expect(analysis.provided.intakeSqIn).toBeGreaterThanOrEqual(analysis.provided.exhaustSqIn);
    const codes = analysis.findings.map((f) => f.code);
    for (const code of ["powered-with-passive-exhaust", "mixed-exhaust", "gable-with-ridge", "exhaust-exceeds-intake", "below-minimum", "soffits-blocked"] as const) {
      expect(codes).not.toContain(code);
    }
    // Quantities are what is bought: whole vents; linear vents in whole feet, whole pieces where they fit.
    for (const added of optionSpace.added) {
      const item = byId.get(added.catalogItemId)!;
      expect(item.isActive).toBe(true);
      if (item.unit === "each") expect(Number.isInteger(added.quantity)).toBe(true);
      if (item.unit === "linear-ft") expect(Number.isInteger(added.quantity)).toBe(true);
    }
    // Price is the pricing module's, in whole cents.
    expect(generated.price).toEqual(priceOption(option, catalog));
    expect(Number.isSafeInteger(generated.price.totalCents)).toBe(true);
    expect(option.rationale.length).toBeGreaterThan(3);
  }
}
