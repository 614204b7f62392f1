/**
 * Unvented attic and unvented enclosed rafter assemblies — IRC R806.5 (2012 and later; R806.4 in
 * 2006/2009) [SOURCES.md S7 confirms the 2015 title and its five conditions; the conditions and
 * Table R806.5 below are from memory, S25]. Such an attic is sealed on purpose: it needs no vent
 * area, and vents into it let humid outdoor air reach the cold side of the insulation. Eavesight
 * therefore never recommends adding vents to it; it checks the conditions instead:
 * 1. the space is entirely inside the building thermal envelope;
 * 2. no interior Class I vapor retarder at the ceiling;
 * 3. wood shingles or shakes have a 1/4 in vented air space under them;
 * 4. in climate zones 5–8 the air-impermeable insulation is (or is covered by) a Class II vapor retarder;
 * 5. the insulation: air-impermeable insulation in contact with the underside of the deck — alone,
 *    or with air-permeable insulation below it when the air-impermeable layer meets Table R806.5's
 *    R-value for the climate zone — or rigid board above the deck meeting the same table.
 *    Air-permeable insulation alone does not qualify (the 2018+ vapor-diffusion-port route for hot
 *    climates is not modelled: Eavesight says so).
 */
import type { ConditionStatus } from "./requirement";
import type { MoistureRegime, UnventedAssembly, VaporRetarder } from "./schema";

/**
 * Table R806.5 (2012–2024 IRC, from memory [S25]): minimum R-value of the air-impermeable (or
 * rigid board) layer for condensation control, by climate zone.
 */
export function minCondensationControlR(climateZone: number, moistureRegime: MoistureRegime | null | undefined): { rValue: number; zoneText: string; isAssumed: boolean } {
  if (climateZone <= 3) return { rValue: 5, zoneText: `zone ${climateZone}${moistureRegime ?? ""}`, isAssumed: false };
  if (climateZone === 4) {
    if (moistureRegime === "C") return { rValue: 10, zoneText: "zone 4C (marine)", isAssumed: false };
    if (moistureRegime === "A" || moistureRegime === "B") return { rValue: 15, zoneText: `zone 4${moistureRegime}`, isAssumed: false };
    return { rValue: 15, zoneText: "zone 4 (moisture letter not recorded, so 4A/4B's higher figure is used)", isAssumed: true };
  }
  const byZone: Record<number, number> = { 5: 20, 6: 25, 7: 30, 8: 35 };
  return { rValue: byZone[climateZone] ?? 35, zoneText: `zone ${climateZone}${climateZone <= 6 ? (moistureRegime ?? "") : ""}`, isAssumed: false };
}

export interface UnventedCondition {
  id: "inside-envelope" | "no-class-i-retarder" | "shingle-shake-gap" | "class-ii-retarder" | "insulation";
  status: ConditionStatus | "unknown";
  reason: string;
}

export interface UnventedCheck {
  /** Every condition met (none "not-met" or "unknown"). */
  isMet: boolean;
  conditions: UnventedCondition[];
}

/**
 * @example
 * // Closed-cell foam R-21 under the deck, zone 5, inside the envelope, asphalt shingles
 * checkUnventedAssembly({ insulation: "air-impermeable-only", airImpermeableRValue: 21, foamIsClassII: true, isInsideThermalEnvelope: true, roofCovering: "asphalt-shingles" }, 5, "A", "none").isMet // true
 */
export function checkUnventedAssembly(assembly: UnventedAssembly, climateZone: number, moistureRegime: MoistureRegime | null | undefined, ceilingVaporRetarder: VaporRetarder): UnventedCheck {
  const conditions: UnventedCondition[] = [];
  conditions.push({
    id: "inside-envelope",
    status: assembly.isInsideThermalEnvelope === true ? "met" : assembly.isInsideThermalEnvelope === false ? "not-met" : "unknown",
    reason:
      assembly.isInsideThermalEnvelope === true
        ? "The attic is inside the building's thermal envelope (the insulation and air barrier follow the roof): met."
        : assembly.isInsideThermalEnvelope === false
          ? "The attic is not fully inside the thermal envelope (for example the attic floor is still insulated and open to a vented part): not met. The roof-line insulation and air barrier must enclose the whole space."
          : "Whether the attic is fully inside the thermal envelope was not recorded.",
  });
  conditions.push({
    id: "no-class-i-retarder",
    status: ceilingVaporRetarder === "class-I" ? "not-met" : "met",
    reason:
      ceilingVaporRetarder === "class-I"
        ? "A Class I vapor retarder (polyethylene, foil) is recorded at the ceiling; an unvented attic must have none on the interior side, so moisture can dry inward: not met."
        : "No Class I vapor retarder at the ceiling: met.",
  });
  const isShakes = assembly.roofCovering === "wood-shingles-or-shakes";
  conditions.push({
    id: "shingle-shake-gap",
    status: !isShakes ? (assembly.roofCovering === undefined ? "unknown" : "not-applicable") : assembly.hasVentedGapUnderShakes === true ? "met" : assembly.hasVentedGapUnderShakes === false ? "not-met" : "unknown",
    reason: !isShakes
      ? assembly.roofCovering === undefined
        ? "The roof covering was not recorded (wood shingles or shakes need a 1/4 in vented air space under them)."
        : "The roof is not wood shingles or shakes, so the 1/4 in vented gap rule does not apply."
      : assembly.hasVentedGapUnderShakes === true
        ? "Wood shingles or shakes sit over a 1/4 in vented air space: met."
        : "Wood shingles or shakes need a 1/4 in vented air space between them and the roofing underlayment" + (assembly.hasVentedGapUnderShakes === false ? ": not met." : "; not recorded."),
  });
  const isCold = climateZone >= 5;
  const hasAirImpermeable = assembly.insulation !== "air-permeable-only";
  conditions.push({
    id: "class-ii-retarder",
    status: !isCold || !hasAirImpermeable ? "not-applicable" : assembly.foamIsClassII === true ? "met" : assembly.foamIsClassII === false ? "not-met" : "unknown",
    reason:
      !isCold || !hasAirImpermeable
        ? `In zone ${climateZone} the Class II vapor retarder rule for the air-impermeable insulation does not apply.`
        : assembly.foamIsClassII === true
          ? `In zone ${climateZone} the air-impermeable insulation is, or is covered by, a Class II vapor retarder: met.`
          : `In climate zones 5–8 the air-impermeable insulation must be a Class II vapor retarder (closed-cell foam usually is at normal thickness; open-cell foam needs a vapor-retarder coating)` +
            (assembly.foamIsClassII === false ? ": not met." : "; not recorded."),
  });
  const table = minCondensationControlR(climateZone, moistureRegime);
  let insulation: UnventedCondition;
  if (assembly.insulation === "air-permeable-only") {
    insulation = {
      id: "insulation",
      status: "not-met",
      reason:
        "Only air-permeable insulation (batts, blown fiberglass or cellulose) at the roof: that does not make an unvented assembly. It needs air-impermeable insulation (spray foam) against the deck or rigid board above it (the vapor-diffusion-port route for hot climates is not checked here).",
    };
  } else if (assembly.insulation === "air-impermeable-only") {
    insulation = { id: "insulation", status: "met", reason: "Air-impermeable insulation alone, in contact with the underside of the roof deck: met (no condensation-control minimum applies when nothing air-permeable is below it)." };
  } else {
    const what = assembly.insulation === "rigid-above-deck-and-air-permeable" ? "rigid board above the deck" : "air-impermeable insulation under the deck";
    const r = assembly.airImpermeableRValue;
    insulation =
      r === undefined
        ? { id: "insulation", status: "unknown", reason: `With air-permeable insulation below it, the ${what} must reach R-${table.rValue} in ${table.zoneText} (Table R806.5); its R-value was not recorded.` }
        : {
            id: "insulation",
            status: r >= table.rValue ? "met" : "not-met",
            reason: `With air-permeable insulation below it, the ${what} must reach R-${table.rValue} in ${table.zoneText} (Table R806.5); it is R-${r}: ${r >= table.rValue ? "met" : "not met — condensation can form at the deck"}.`,
          };
  }
  conditions.push(insulation);
  return { isMet: conditions.every((c) => c.status === "met" || c.status === "not-applicable"), conditions };
}
