import { CODE_BASIS_LABELS, PROJECT_STATUSES, type ProjectStatus } from "@shared/schemas/projects";
import { CODE_BASES, type RoofColor, type VaporRetarder } from "@shared/ventilation/index";
import type { SelectOption } from "@/components/ui/select";

export const STATUS_LABELS: Record<ProjectStatus, string> = {
  lead: "Lead",
  surveyed: "Surveyed",
  proposed: "Proposed",
  sold: "Sold",
  lost: "Lost",
  completed: "Completed",
};
export const STATUS_OPTIONS: SelectOption[] = PROJECT_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }));

export { CODE_BASIS_LABELS };
export const CODE_BASIS_OPTIONS: SelectOption[] = CODE_BASES.map((c) => ({ value: c, label: CODE_BASIS_LABELS[c] }));

export const VAPOR_RETARDER_LABELS: Record<VaporRetarder, string> = {
  none: "None, or not known",
  "class-I": "Class I (polyethylene sheet, foil facing)",
  "class-II": "Class II (kraft facing, vapor-retarder primer)",
  "class-III": "Class III (ordinary latex paint)",
};
export const VAPOR_RETARDER_OPTIONS: SelectOption[] = (Object.keys(VAPOR_RETARDER_LABELS) as VaporRetarder[]).map((v) => ({
  value: v,
  label: VAPOR_RETARDER_LABELS[v],
}));

export const ROOF_COLOR_LABELS: Record<RoofColor, string> = {
  light: "Light (white, light grey, tan)",
  medium: "Medium",
  dark: "Dark (black, dark brown, charcoal)",
};
export const ROOF_COLOR_OPTIONS: SelectOption[] = (Object.keys(ROOF_COLOR_LABELS) as RoofColor[]).map((c) => ({
  value: c,
  label: ROOF_COLOR_LABELS[c],
}));

/** IECC thermal zones; the moisture letter (A, B, C) is chosen beside it — zones 7 and 8 have none. */
export const CLIMATE_ZONE_OPTIONS: SelectOption[] = [1, 2, 3, 4, 5, 6, 7, 8].map((z) => ({
  value: String(z),
  label: `Zone ${z}${z <= 2 ? " (hot)" : z >= 7 ? " (very cold, no letter)" : ""}`,
}));

export type MoistureRegime = "A" | "B" | "C";
const MOISTURE_LABELS: Record<MoistureRegime, string> = { A: "A – moist", B: "B – dry", C: "C – marine" };

/** Zones 7 and 8 carry no moisture regime; marine (C) occurs only in zones 3 to 5. */
export function moistureOptions(climateZone: number): SelectOption[] {
  if (climateZone >= 7) return [];
  const regimes: MoistureRegime[] = climateZone >= 3 && climateZone <= 5 ? ["A", "B", "C"] : ["A", "B"];
  return regimes.map((r) => ({ value: r, label: MOISTURE_LABELS[r] }));
}

/** The regime to keep when the zone changes: null where the zone has none or doesn't offer it. */
export function fitMoistureRegime(climateZone: number, regime: MoistureRegime | null): MoistureRegime | null {
  if (regime === null) return null;
  return moistureOptions(climateZone).some((o) => o.value === regime) ? regime : null;
}
