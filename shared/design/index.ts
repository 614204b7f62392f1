/**
 * Design options (DESIGN.md §4): the attic after an option's work, its analysis, the generator
 * and the crew's materials list. Import from here.
 */
export { applyOption, addedVentId, defaultLocation, isVentCatalogKind, DesignError } from "./apply-option";
export { analyzeOption } from "./analyze-option";
export type { OptionSpaceAnalysis } from "./analyze-option";
export { generateOptions, OPTION_TYPES, OPTION_TYPE_NAMES, DEFAULT_GENERATOR_SETTINGS } from "./generate-options";
export type { GenerateOptionsInput, GenerateOptionsResult, GeneratedOption, GeneratorSettings, OptionType, SkippedOption } from "./generate-options";
export { materialsList } from "./materials-list";
export type { MaterialLine, MaterialsList, WorkLine } from "./materials-list";
export { boughtQuantity, piecesToBuy } from "./bought-quantity";
export type { BoughtQuantity } from "./bought-quantity";
export { roofConstraints, usableRidgeFt, staticVentCapacity, rafterBays, RIDGE_VENT_END_CLEARANCE_FT, STATIC_VENT_SPACING_FT, STATIC_VENT_DROP_FT, DEFAULT_RAFTER_SPACING_IN } from "./roof-constraints";
export type { RoofConstraints, LengthEstimate } from "./roof-constraints";
export { sizeVentItem } from "./size-vent-item";
export type { SizeResult, VentRoom } from "./size-vent-item";
export { pickVentItem, pickWorkItem } from "./pick-catalog-item";
export { catalogLaborHours, withCatalogLabor } from "./catalog-labor";
