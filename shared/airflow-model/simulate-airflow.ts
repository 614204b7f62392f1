/**
 * simulateAirflow: a two-zone (attic and house) airflow estimate. Each zone has one unknown
 * pressure, taken at the ceiling plane relative to outdoors at that height. Every opening — each
 * vent, the ceiling between the zones, the house's own leakage — is an orifice at its height:
 *
 *   Q = C_D·A·√(2·|ΔP|/ρ), flowing from the higher pressure to the lower
 *   ΔP(z) (inside − outside) = P_zone + (ρ_out − ρ_zone)·g·z − C_p·½·ρ_out·U²
 *
 * (ASHRAE Handbook — Fundamentals 1997, ch. 25: orifice flow, stack and wind pressure). Powered
 * fans move air out of the attic at their rated cfm or along a straight-line fan curve. The two
 * zones' volume balances are solved by nested bracketed searches (find-root.ts), which always
 * converge because each zone's net inflow falls as its own pressure rises.
 *
 * Volume flows are balanced at the outdoor air's density; the zones' lighter or heavier air
 * enters only through the stack term (the Boussinesq approximation, off by a few per cent at
 * attic temperatures, and exactly the form of ASHRAE's stack-flow equation).
 */
import { formatNumber, roundTo } from "../units/format";
import type { AtticInput, Vent, VentNfa } from "../ventilation";
import { sectionAreaSqFt, sectionGeometry, ventNfa } from "../ventilation";
import { isPoweredKind, AT_RIDGE_KINDS, EAVE_KINDS } from "../ventilation/vent-kinds";
import { riseLookup, ventPosition } from "../ventilation/vent-position";
import { WINDING_OPEN_MIN_OHMS } from "../diagnostics/fan-diagnostics";
import { findRootDecreasing } from "./find-root";
import {
  airDensityKgPerM3,
  BLOWER_DOOR_TEST_PA,
  CEILING_SHARE_OF_HOUSE_LEAKAGE,
  CU_M_PER_S_PER_CFM,
  DEFAULT_ATTIC_MEAN_HEIGHT_FT,
  DEFAULT_CEILING_ELA_SQ_IN_PER_SQ_FT,
  DEFAULT_FAN_SET_POINT_F,
  DEFAULT_HIGH_VENT_SHARE_OF_RISE,
  DEFAULT_HOUSE_ELA_SQ_IN_PER_SQ_FT,
  DEFAULT_HOUSE_HEIGHT_FT,
  DEFAULT_RISE_FT,
  DEFAULT_SEALED_CEILING_ELA_SQ_IN_PER_SQ_FT,
  ELA_REFERENCE_PA,
  FAN_SHUTOFF_PA,
  GRAVITY_M_PER_S2,
  LEAKAGE_FLOW_EXPONENT,
  M_PER_FT,
  M_PER_S_PER_MPH,
  SQ_M_PER_SQ_IN,
  VENT_DISCHARGE_COEFFICIENT,
  WIND_PRESSURE_COEFFICIENTS as CP,
} from "./physics";
import type { AirflowConditions } from "./schema";

export interface AirflowOpening {
  /** A vent id of the survey, or "ceiling", or "house-envelope". */
  id: string;
  /** Net flow, cfm: positive into the attic (for "house-envelope": into the house). */
  cfm: number;
}

export interface FanAirFrom {
  lowerVentsCfm: number;
  upperVentsCfm: number;
  houseCfm: number;
}

export interface AirflowResult {
  /** Attic pressure at the ceiling plane relative to outdoors at that height, Pa. */
  atticPressurePa: number;
  /** House pressure at the ceiling plane relative to outdoors at that height, Pa. */
  housePressurePa: number;
  openings: AirflowOpening[];
  /** The discharge coefficient applied to every vent's net free area. */
  dischargeCoefficient: number;
  /** What the running fans actually move, cfm (0 when none runs). */
  fanCfm: number;
  /** What the running fans are rated for, cfm. */
  fanRatedCfm: number;
  /** Each powered fan: whether it runs in these conditions and why, in words ("runs: the attic at 130 °F is …"). */
  fanStates: Array<{ ventId: string; isRunning: boolean; why: string }>;
  /** Where the fans' air comes from (the attic taken as well mixed); sums to fanCfm. */
  fanAirFrom: FanAirFrom;
  /** All the air passing through the attic (in = out), cfm. */
  atticAirCfm: number;
  atticVolumeCuFt: number;
  atticAirChangesPerHour: number;
  /** Conditioned air drawn up through the ceiling into the attic, cfm (0 when the flow is the other way). */
  houseAirDrawnCfm: number;
  /** How much the running fans lower the house's pressure, Pa (negative), or null when no fan runs. */
  houseDepressurizationByFansPa: number | null;
  ceilingLeakageSqIn: number;
  houseLeakageSqIn: number;
  /** The model's assumptions, in words, for the "how this was estimated" list. */
  assumptions: string[];
  /** Plain sentences with the inputs and the arithmetic. */
  reasons: string[];
}

/** An opening to outdoors, by zone. Several survey vents may share one (same height and wind position) while solving. */
interface Hole {
  cdAreaM2: number;
  /** ρ difference × g × height: the stack term at this opening, Pa. */
  stackPa: number;
  /** C_p × ½ρU²: outdoor wind pressure at this opening, Pa. */
  windPa: number;
  /** Index of the opening in the answer's list. */
  owner: number;
}

interface Fan {
  ratedM3PerS: number;
  stackPa: number;
  windPa: number;
  owner: number;
  isRunning: boolean;
}

const f0 = (n: number) => formatNumber(n, { maxFractionDigits: 0 });
const f1 = (n: number) => formatNumber(n, { maxFractionDigits: 1 });
const f2 = (n: number) => formatNumber(n, { maxFractionDigits: 2 });
const cfmOf = (m3PerS: number) => m3PerS / CU_M_PER_S_PER_CFM;

/**
 * The core's own per-vent figure (so vent condition and future rules flow through), kept per vent
 * object: the survey re-renders on every keystroke with most vents unchanged, and the core's
 * wording of each figure costs more than this whole model.
 */
const nfaCache = new WeakMap<Vent, VentNfa>();
function nfaOf(vent: Vent): VentNfa {
  let nfa = nfaCache.get(vent);
  if (!nfa) {
    nfa = ventNfa(vent);
    nfaCache.set(vent, nfa);
  }
  return nfa;
}

/** Signed orifice flow into a zone for inside-minus-outside pressure `deltaPa`. */
function inflow(cdAreaM2: number, deltaPa: number, rho: number): number {
  return deltaPa < 0 ? cdAreaM2 * Math.sqrt((-2 * deltaPa) / rho) : -cdAreaM2 * Math.sqrt((2 * deltaPa) / rho);
}

/** Height of a vent above the ceiling plane, ft, and where that figure came from. */
function ventHeightFt(vent: Vent, riseFt: number | null): { heightFt: number; isAssumed: boolean } {
  const position = ventPosition(vent, riseFt);
  if (position.heightAboveEaveFt !== null) return { heightFt: position.heightAboveEaveFt, isAssumed: false };
  const rise = riseFt ?? DEFAULT_RISE_FT;
  if (vent.location === "lower" || EAVE_KINDS.has(vent.kind)) return { heightFt: 0, isAssumed: true };
  if (AT_RIDGE_KINDS.has(vent.kind)) return { heightFt: rise, isAssumed: riseFt === null };
  return { heightFt: rise * DEFAULT_HIGH_VENT_SHARE_OF_RISE, isAssumed: true };
}

/** The wind positions of a vent: [C_p, share of its area]. */
function windPositions(vent: Vent): Array<readonly [number, number]> {
  if (vent.kind === "ridge" || vent.kind === "cupola") return [[CP.ridge, 1]];
  if (vent.kind === "gable-louver" || vent.kind === "powered-gable" || vent.mounting === "gable") return [[CP.gableEnd, 1]];
  if (EAVE_KINDS.has(vent.kind) || vent.location === "lower") return [[CP.eaveWindward, 0.5], [CP.eaveLeeward, 0.5]];
  return [[CP.slopeWindward, 0.5], [CP.slopeLeeward, 0.5]];
}

function fanRuns(vent: Vent, conditions: AirflowConditions): { isRunning: boolean; why: string } {
  if (conditions.areFansRunning !== undefined) return { isRunning: conditions.areFansRunning, why: conditions.areFansRunning ? "set to run" : "set off" };
  const d = vent.diagnostics;
  const isWindingOpen = d?.windingResistanceOhms === "open" || (typeof d?.windingResistanceOhms === "number" && d.windingResistanceOhms >= WINDING_OPEN_MIN_OHMS);
  if (d?.isBladeFreeToSpin === false || isWindingOpen) {
    return { isRunning: false, why: `does not run as found (${d?.isBladeFreeToSpin === false ? "its blade will not turn" : "its motor winding reads open"}), so it is taken as stopped` };
  }
  if (vent.control === "switch" || vent.control === "always-on") return { isRunning: true, why: vent.control === "switch" ? "on a switch, taken as on" : "always on" };
  const setPointF = vent.thermostatSetPointF ?? DEFAULT_FAN_SET_POINT_F;
  const isRunning = conditions.atticTempF >= setPointF;
  const recorded = vent.thermostatSetPointF !== undefined ? "its thermostat's" : "an assumed";
  return { isRunning, why: `${isRunning ? "runs" : "is off"}: the attic at ${f0(conditions.atticTempF)} °F is ${isRunning ? "at or above" : "below"} ${recorded} ${f0(setPointF)} °F set point` };
}

function atticVolume(attic: AtticInput, floorAreaSqFt: number): { volumeCuFt: number; isAssumed: boolean } {
  let volumeCuFt = 0;
  for (const section of attic.sections) {
    const geometry = sectionGeometry(section);
    if (!geometry.isKnown) return { volumeCuFt: floorAreaSqFt * DEFAULT_ATTIC_MEAN_HEIGHT_FT, isAssumed: true };
    volumeCuFt += geometry.volumeCuFt;
  }
  return { volumeCuFt, isAssumed: false };
}

interface Leakage {
  ceilingSqIn: number;
  houseSqIn: number;
  sentence: string;
}

/** Leakage areas (ELA at 4 Pa, C_D = 1) of the ceiling and of the rest of the house, with their arithmetic. */
export function leakageAreas(ceilingAreaSqFt: number, conditions: AirflowConditions, isCeilingAirSealed: boolean, rhoOut: number): Leakage {
  const a = f0(ceilingAreaSqFt);
  let totalSqIn: number | null = null;
  let fromCfm50 = "";
  if (conditions.houseCfm50 !== undefined) {
    const cfmAt4 = conditions.houseCfm50 * (ELA_REFERENCE_PA / BLOWER_DOOR_TEST_PA) ** LEAKAGE_FLOW_EXPONENT;
    totalSqIn = (cfmAt4 * CU_M_PER_S_PER_CFM) / Math.sqrt((2 * ELA_REFERENCE_PA) / rhoOut) / SQ_M_PER_SQ_IN;
    fromCfm50 = `the blower-door figure of ${f0(conditions.houseCfm50)} CFM50 is ${f0(cfmAt4)} cfm at 4 Pa (× (4 ÷ 50)^${LEAKAGE_FLOW_EXPONENT}), an effective leakage area of ${f0(totalSqIn)} sq in for the whole house`;
  }
  if (conditions.ceilingLeakageSqIn !== undefined) {
    const ceilingSqIn = conditions.ceilingLeakageSqIn;
    if (totalSqIn !== null) {
      const houseSqIn = Math.max(totalSqIn - ceilingSqIn, totalSqIn * 0.1);
      return { ceilingSqIn, houseSqIn, sentence: `Ceiling leakage ${f0(ceilingSqIn)} sq in as entered; ${fromCfm50}, so the rest of the house has ${f0(houseSqIn)} sq in (at least a tenth of the whole).` };
    }
    const houseSqIn = ceilingAreaSqFt * DEFAULT_HOUSE_ELA_SQ_IN_PER_SQ_FT;
    return { ceilingSqIn, houseSqIn, sentence: `Ceiling leakage ${f0(ceilingSqIn)} sq in as entered; the rest of the house ${a} sq ft × ${DEFAULT_HOUSE_ELA_SQ_IN_PER_SQ_FT} sq in per sq ft = ${f0(houseSqIn)} sq in (assumed).` };
  }
  if (totalSqIn !== null) {
    const ceilingSqIn = totalSqIn * CEILING_SHARE_OF_HOUSE_LEAKAGE;
    return { ceilingSqIn, houseSqIn: totalSqIn - ceilingSqIn, sentence: `Leakage: ${fromCfm50}; a third of it, ${f0(ceilingSqIn)} sq in, is taken to be in the ceiling and ${f0(totalSqIn - ceilingSqIn)} sq in in the rest of the house.` };
  }
  const perSqFt = isCeilingAirSealed ? DEFAULT_SEALED_CEILING_ELA_SQ_IN_PER_SQ_FT : DEFAULT_CEILING_ELA_SQ_IN_PER_SQ_FT;
  const ceilingSqIn = ceilingAreaSqFt * perSqFt;
  const houseSqIn = ceilingAreaSqFt * DEFAULT_HOUSE_ELA_SQ_IN_PER_SQ_FT;
  return {
    ceilingSqIn,
    houseSqIn,
    sentence: `No leakage was measured, so defaults apply: ceiling ${a} sq ft × ${perSqFt} sq in per sq ft (${isCeilingAirSealed ? "an air-sealed" : "a ceiling not air-sealed"}) = ${f1(ceilingSqIn)} sq in; rest of the house ${a} sq ft × ${DEFAULT_HOUSE_ELA_SQ_IN_PER_SQ_FT} = ${f1(houseSqIn)} sq in.`,
  };
}

/**
 * @example
 * // 1,500 sq ft attic, 300 sq in of soffit, 300 sq in of ridge, a 1,200 cfm roof fan, summer
 * const r = simulateAirflow(attic, { outdoorTempF: 92, atticTempF: 130, houseTempF: 75 });
 * r.fanAirFrom // { lowerVentsCfm: …, upperVentsCfm: … (through the ridge), houseCfm: … }
 */
export function simulateAirflow(attic: AtticInput, conditions: AirflowConditions): AirflowResult {
  const rhoOut = airDensityKgPerM3(conditions.outdoorTempF);
  const rhoAttic = airDensityKgPerM3(conditions.atticTempF);
  const rhoHouse = airDensityKgPerM3(conditions.houseTempF);
  const windMph = conditions.windMph ?? 0;
  const windM = windMph * M_PER_S_PER_MPH;
  const dynamicPa = 0.5 * rhoOut * windM * windM;
  const atticStackPaPerM = (rhoOut - rhoAttic) * GRAVITY_M_PER_S2;
  const houseStackPaPerM = (rhoOut - rhoHouse) * GRAVITY_M_PER_S2;
  const cd = VENT_DISCHARGE_COEFFICIENT;

  const floorAreaSqFt = attic.sections.reduce((sum, s) => sum + sectionAreaSqFt(s), 0);
  const riseOf = riseLookup(attic.sections);
  const assumptions: string[] = [];
  const reasons: string[] = [];

  // The answer's openings: vents in survey order, then the ceiling and the house's envelope.
  const openings: AirflowOpening[] = attic.vents.map((v) => ({ id: v.id, cfm: 0 }));
  const ceilingOwner = openings.push({ id: "ceiling", cfm: 0 }) - 1;
  const envelopeOwner = openings.push({ id: "house-envelope", cfm: 0 }) - 1;
  const ownerLocation: Array<"lower" | "upper" | null> = attic.vents.map((v) => v.location);

  const atticHoles: Hole[] = [];
  const fans: Fan[] = [];
  const fanSentences: string[] = [];
  const fanStates: AirflowResult["fanStates"] = [];
  let isAnyHeightAssumed = false;
  let isAnyRiseAssumed = false;
  attic.vents.forEach((vent, owner) => {
    // The physical estimate places an unassigned vent against the space's highest rise (the ridge).
    const riseFt = riseOf(vent.sectionId)?.highestFt ?? null;
    if (riseFt === null) isAnyRiseAssumed = true;
    const { heightFt, isAssumed } = ventHeightFt(vent, riseFt);
    if (isAssumed) isAnyHeightAssumed = true;
    const stackPa = atticStackPaPerM * heightFt * M_PER_FT;
    const positions = windPositions(vent);
    if (isPoweredKind(vent.kind)) {
      const nfa = nfaOf(vent); // rated cfm × quantity, through the core's own per-vent figure
      const run = fanRuns(vent, conditions);
      const windPa = positions.reduce((sum, [cp, share]) => sum + cp * share, 0) * dynamicPa;
      fans.push({ ratedM3PerS: nfa.airflowCfm * CU_M_PER_S_PER_CFM, stackPa, windPa, owner, isRunning: run.isRunning });
      fanSentences.push(`A fan rated ${f0(nfa.airflowCfm)} cfm ${run.why}.`);
      fanStates.push({ ventId: vent.id, isRunning: run.isRunning, why: run.why });
      return;
    }
    const areaM2 = nfaOf(vent).nfaSqIn * SQ_M_PER_SQ_IN;
    if (areaM2 <= 0) return;
    for (const [cp, share] of positions) {
      atticHoles.push({ cdAreaM2: cd * areaM2 * share, stackPa, windPa: cp * dynamicPa, owner });
    }
  });

  const isCeilingAirSealed = attic.site?.ceilingAirSealed === true;
  const leakage = leakageAreas(floorAreaSqFt, conditions, isCeilingAirSealed, rhoOut);
  const ceilingCdAreaM2 = leakage.ceilingSqIn * SQ_M_PER_SQ_IN;
  const houseHeightFt = conditions.houseHeightFt ?? DEFAULT_HOUSE_HEIGHT_FT;
  const houseHoles: Hole[] = [];
  // Half the house's leakage near its floor, half at its ceiling; each half split windward and leeward.
  for (const heightFt of [-houseHeightFt, 0]) {
    for (const cp of [CP.wallWindward, CP.wallLeeward]) {
      houseHoles.push({ cdAreaM2: leakage.houseSqIn * SQ_M_PER_SQ_IN * 0.25, stackPa: houseStackPaPerM * heightFt * M_PER_FT, windPa: cp * dynamicPa, owner: envelopeOwner });
    }
  }

  // While solving, openings at the same height and wind position act as one.
  const solveHoles = mergeHoles(atticHoles);
  const fanModel = conditions.fanModel ?? "curve";
  const fanOut = (fan: Fan, atticPa: number): number => {
    if (!fan.isRunning) return 0;
    const risePa = -(atticPa + fan.stackPa - fan.windPa); // outdoor minus attic pressure at the fan
    // "Rated" keeps the rating up to 500 Pa of back-pressure, ten times what an attic fan can pull, then
    // fades to nothing at 1,000 Pa so an attic with next to no opening still has an answer.
    if (fanModel === "rated") return fan.ratedM3PerS * Math.min(1, Math.max(0, (1000 - risePa) / 500));
    return fan.ratedM3PerS * Math.max(0, 1 - risePa / FAN_SHUTOFF_PA);
  };
  // A fan can only move air that can reach it: with no other opening to outdoors (no vent, and no
  // path through ceiling and house) it moves none, whatever its rating says.
  const hasPathIn = solveHoles.length > 0 || (ceilingCdAreaM2 > 0 && leakage.houseSqIn > 0);
  if (!hasPathIn) {
    for (const f of fans) f.isRunning = false;
    for (const state of fanStates) state.isRunning = false;
    if (fans.length > 0) fanSentences.push("The attic has no other opening to outdoors and no leakage path through the house, so the fans can move no air.");
  }
  const runningFans = fans.filter((f) => f.isRunning);

  const solve = (withFans: boolean) => {
    const ceilingInflow = (atticPa: number, housePa: number) => inflow(ceilingCdAreaM2, atticPa - housePa, rhoOut);
    const houseBalance = (atticPa: number, housePa: number) => {
      let net = -ceilingInflow(atticPa, housePa);
      for (const h of houseHoles) net += inflow(h.cdAreaM2, housePa + h.stackPa - h.windPa, rhoOut);
      return net;
    };
    const houseAt = (atticPa: number) => findRootDecreasing((p) => houseBalance(atticPa, p), { toleranceY: 1e-10 });
    const atticBalance = (atticPa: number) => {
      const housePa = houseAt(atticPa);
      let net = ceilingInflow(atticPa, housePa);
      for (const h of solveHoles) net += inflow(h.cdAreaM2, atticPa + h.stackPa - h.windPa, rhoOut);
      if (withFans) for (const f of runningFans) net -= fanOut(f, atticPa);
      return net;
    };
    const atticPa = findRootDecreasing(atticBalance, { toleranceY: 1e-10 });
    return { atticPa, housePa: houseAt(atticPa) };
  };

  const { atticPa, housePa } = solve(true);
  const houseDepressurizationByFansPa = runningFans.length > 0 ? housePa - solve(false).housePa : null;

  // Flows at the solution, per opening.
  let lowerInM3 = 0;
  let upperInM3 = 0;
  let passiveOutM3 = 0;
  for (const h of atticHoles) openings[h.owner]!.cfm += inflow(h.cdAreaM2, atticPa + h.stackPa - h.windPa, rhoOut);
  let fanM3 = 0;
  for (const f of fans) {
    const out = fanOut(f, atticPa);
    fanM3 += out;
    openings[f.owner]!.cfm -= out;
  }
  for (let i = 0; i < attic.vents.length; i += 1) {
    if (fans.some((f) => f.owner === i)) continue;
    const q = openings[i]!.cfm;
    if (q > 0 && ownerLocation[i] === "lower") lowerInM3 += q;
    else if (q > 0) upperInM3 += q;
    else passiveOutM3 -= q;
  }
  const ceilingM3 = inflow(ceilingCdAreaM2, atticPa - housePa, rhoOut);
  openings[ceilingOwner]!.cfm = ceilingM3;
  for (const h of houseHoles) openings[envelopeOwner]!.cfm += inflow(h.cdAreaM2, housePa + h.stackPa - h.windPa, rhoOut);

  const houseInM3 = Math.max(0, ceilingM3);
  const atticInM3 = lowerInM3 + upperInM3 + houseInM3;
  const atticOutM3 = fanM3 + passiveOutM3 + Math.max(0, -ceilingM3);
  const fanShare = atticOutM3 > 0 ? fanM3 / atticOutM3 : 0;
  const fanAirFrom: FanAirFrom = {
    lowerVentsCfm: roundTo(cfmOf(lowerInM3 * fanShare), 1),
    upperVentsCfm: roundTo(cfmOf(upperInM3 * fanShare), 1),
    houseCfm: roundTo(cfmOf(houseInM3 * fanShare), 1),
  };
  const volume = atticVolume(attic, floorAreaSqFt);
  const atticAirCfm = cfmOf((atticInM3 + atticOutM3) / 2);
  // Under 1 cu ft (a flat or nearly flat roof) there is no attic air to change.
  const atticAirChangesPerHour = volume.volumeCuFt >= 1 ? (atticAirCfm * 60) / volume.volumeCuFt : 0;
  const fanCfm = cfmOf(fanM3);
  const fanRatedCfm = cfmOf(runningFans.reduce((sum, f) => sum + f.ratedM3PerS, 0));

  // Words: the conditions, the physics with its numbers, the answer.
  const wind = windMph > 0 ? `wind ${f0(windMph)} mph square to the eaves` : "calm";
  reasons.push(`Conditions: outdoors ${f0(conditions.outdoorTempF)} °F, attic ${f0(conditions.atticTempF)} °F, house ${f0(conditions.houseTempF)} °F, ${wind}.`);
  reasons.push(
    `Each vent passes Q = Cd × NFA × √(2 × ΔP ÷ ρ) with Cd = ${cd} (a sharp-edged opening) and ρ = ${f2(rhoOut)} kg/m³ (outdoor air at ${f0(conditions.outdoorTempF)} °F); ceiling and house leakage use their effective leakage areas the same way with Cd = 1.`,
  );
  const atticPerFt = atticStackPaPerM * M_PER_FT;
  reasons.push(
    `Stack pressure: attic air at ${f0(conditions.atticTempF)} °F weighs ${f2(rhoAttic)} kg/m³ against ${f2(rhoOut)} outdoors, so its pressure gains (${f2(rhoOut)} − ${f2(rhoAttic)}) × 9.81 = ${f2(atticPerFt / M_PER_FT)} Pa per metre (${f2(atticPerFt)} Pa per foot) of height over outdoors.`,
  );
  reasons.push(leakage.sentence);
  for (const sentence of fanSentences) reasons.push(sentence);
  if (fanModel === "curve" && runningFans.length > 0) {
    const risePa = -atticPa;
    reasons.push(
      `Against the attic's ${f1(risePa)} Pa below outdoors the fans move ${f0(fanRatedCfm)} × (1 − ${f1(risePa)} ÷ ${f0(FAN_SHUTOFF_PA)}) ≈ ${f0(fanCfm)} cfm (straight-line fan curve).`,
    );
  }
  reasons.push(
    `Solving both zones so air in equals air out: the attic sits at ${f1(atticPa)} Pa and the house at ${f1(housePa)} Pa against outdoors at the ceiling; ${f0(atticAirCfm)} cfm passes through the attic.`,
  );
  if (fanM3 > 0) {
    const pct = (cfm: number) => (fanCfm > 0 ? f0((cfm / fanCfm) * 100) : "0");
    reasons.push(
      `Of the fans' ${f0(fanCfm)} cfm, ${f0(fanAirFrom.lowerVentsCfm)} (${pct(fanAirFrom.lowerVentsCfm)} %) comes in at the low vents, ${f0(fanAirFrom.upperVentsCfm)} (${pct(fanAirFrom.upperVentsCfm)} %) through other high vents and ${f0(fanAirFrom.houseCfm)} (${pct(fanAirFrom.houseCfm)} %) from the rooms below through the ceiling.`,
    );
  }
  if (ceilingM3 > 0) reasons.push(`House air drawn up through the ceiling: ${f0(cfmOf(ceilingM3))} cfm.`);
  else if (ceilingM3 < 0) reasons.push(`Attic air pushed down into the house through the ceiling: ${f0(cfmOf(-ceilingM3))} cfm.`);
  if (houseDepressurizationByFansPa !== null) {
    reasons.push(`The running fans lower the house's pressure by ${f1(-houseDepressurizationByFansPa)} Pa (the same at every height in the house).`);
  }
  reasons.push(
    `Attic air changes: ${f0(atticAirCfm)} cfm × 60 ÷ ${f0(volume.volumeCuFt)} cu ft${volume.isAssumed ? ` (${f0(floorAreaSqFt)} sq ft × ${DEFAULT_ATTIC_MEAN_HEIGHT_FT} ft assumed mean height)` : ""} = ${f1(atticAirChangesPerHour)} per hour.`,
  );

  assumptions.push("The attic and the house are each one well-mixed space at one temperature.");
  assumptions.push(
    `Each vent is one opening at one height: eave vents at the ceiling plane, ridge vents at the ridge, other high vents at their recorded height or three quarters of the rise${isAnyRiseAssumed ? `; where the pitch was not recorded the rise is taken as ${DEFAULT_RISE_FT} ft` : ""}.${isAnyHeightAssumed ? " Some heights here are assumed." : ""}`,
  );
  assumptions.push(`Half of the house's leakage is near its floor (${f0(houseHeightFt)} ft below the ceiling) and half at the ceiling line.`);
  assumptions.push("Flows are balanced by volume at the outdoor air's density; temperature differences act only through the stack pressure.");
  if (windMph > 0) assumptions.push("Wind blows square to the eaves; vents whose side is not recorded are taken half windward, half leeward; pressure coefficients are typical low-rise values (from memory).");
  if (fans.length > 0) {
    assumptions.push(
      fanModel === "curve"
        ? `A running fan moves its rated cfm with no back-pressure, falling in a straight line to none at ${f0(FAN_SHUTOFF_PA)} Pa (0.2 in. of water); a stopped fan is taken as closed.`
        : "A running fan moves exactly its rated cfm; a stopped fan is taken as closed.",
    );
  }
  if (attic.site?.soffitsBlocked) assumptions.push("The soffits were recorded as blocked by insulation; the model still counts their full net free area, so real intake is lower than shown.");

  return {
    atticPressurePa: roundTo(atticPa, 2),
    housePressurePa: roundTo(housePa, 2),
    openings: openings.map((o) => ({ id: o.id, cfm: roundTo(cfmOf(o.cfm), 1) || 0 })), // no "-0"
    dischargeCoefficient: cd,
    fanCfm: roundTo(fanCfm, 1),
    fanRatedCfm: roundTo(fanRatedCfm, 1),
    fanStates,
    fanAirFrom,
    atticAirCfm: roundTo(atticAirCfm, 1),
    atticVolumeCuFt: roundTo(volume.volumeCuFt, 1),
    atticAirChangesPerHour: roundTo(atticAirChangesPerHour, 2),
    houseAirDrawnCfm: roundTo(cfmOf(houseInM3), 1),
    houseDepressurizationByFansPa: houseDepressurizationByFansPa === null ? null : roundTo(houseDepressurizationByFansPa, 2),
    ceilingLeakageSqIn: roundTo(leakage.ceilingSqIn, 1),
    houseLeakageSqIn: roundTo(leakage.houseSqIn, 1),
    assumptions,
    reasons,
  };
}

function mergeHoles(holes: Hole[]): Hole[] {
  const byKey = new Map<string, Hole>();
  for (const h of holes) {
    const key = `${h.stackPa}|${h.windPa}`;
    const seen = byKey.get(key);
    if (seen) seen.cdAreaM2 += h.cdAreaM2;
    else byKey.set(key, { ...h });
  }
  return [...byKey.values()];
}
