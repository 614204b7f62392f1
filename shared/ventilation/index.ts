/**
 * The ventilation core's public face (DESIGN.md §4). Import from here, not from the files behind it.
 */
export { analyzeAttic, analyzeParsedAttic, tryAnalyzeAttic } from "./analyze-attic";
export type { AtticAnalysis, FanAnalysis, SectionAnalysis, TryAnalyzeResult } from "./analyze-attic";
export {
  AtticInputSchema,
  ParsedAtticSchema,
  SectionSchema,
  VentSchema,
  SiteSchema,
  CoveringSchema,
  CodeBasisSchema,
  VaporRetarderSchema,
  RoofColorSchema,
  RoofFormSchema,
  VentKindSchema,
  VentLocationSchema,
  MeshSizeSchema,
  CODE_BASES,
  LIMITS,
} from "./schema";
export type { AtticInput, ParsedAttic, CodeBasis, RoofColor, Section, Site, VaporRetarder, Vent, VentLocation, UpperShareBase, MoistureRegime, UnventedAssembly } from "./schema";
export { UpperShareBaseSchema, MoistureRegimeSchema, AtticAssemblySchema, UnventedAssemblySchema, LouverMaterialSchema } from "./schema";
export { checkUnventedAssembly, minCondensationControlR } from "./unvented";
export type { UnventedCheck, UnventedCondition } from "./unvented";
export { wholeHouseFanOutletSqIn, WHOLE_HOUSE_FAN_CFM_PER_SQ_FT_OF_OUTLET, WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT } from "./whole-house-fan";
export { meetsRequiredArea } from "./balance";
export { VENT_KINDS, VENT_KIND_LABELS, POWERED_KINDS, EAVE_KINDS, AT_RIDGE_KINDS, isPoweredKind, isWholeHouseFanKind, isMechanicalKind, ventDisplayName, ventListPhrase } from "./vent-kinds";
export type { VentKind } from "./vent-kinds";
export { FINDING_CODES, sortFindings } from "./findings";
export type { Finding, FindingCode, Severity } from "./findings";
export type { Requirement, RequirementSplit, ExceptionCondition, ConditionStatus, Ratio } from "./requirement";
export { requiredNfa, ratioArithmetic } from "./requirement";
export type { ProvidedNfa } from "./balance";
export type { VentNfa } from "./vent-nfa";
export { ventNfa } from "./vent-nfa";
export { COVERING_FACTORS, coveringFactor, netFreeAreaFromGrossSqIn } from "./covering-factors";
export type { Covering, MeshSize } from "./covering-factors";
export { shoelaceAreaSqFt, polygonProblem, sectionAreaSqFt } from "./floor-area";
export type { PointFt } from "./floor-area";
export { sectionGeometry, sectionRiseFt } from "./attic-volume";
export type { RoofForm } from "./attic-volume";
export {
  recommendFanCfm,
  fanIntakeNeededSqIn,
  CFM_PER_SQ_FT,
  DARK_OR_STEEP_MULTIPLIER,
  AIR_CHANGES_PER_HOUR,
  CFM_PER_SQ_FT_OF_INTAKE,
  STEEP_PITCH_IN_12,
  FAN_UNDERSIZED_BELOW,
  FAN_OVERSIZED_ABOVE,
} from "./fan-sizing";
export { formatNumber } from "../units/format";
export {
  FAN_SAFETY_CAUTION,
  ATTIC_SAFETY_CAUTION,
  ROOF_SAFETY_CAUTION,
  COMBUSTION_SAFETY_CAUTION,
  LIVE_VOLTAGE_TEST_CAUTION,
} from "../diagnostics/cautions";
export { FanDiagnosticsSchema } from "../diagnostics/schema";
export type { FanDiagnostics } from "../diagnostics/schema";
export { aboveMinimum } from "./recommendations";
export type { Recommendation } from "./recommendations";
