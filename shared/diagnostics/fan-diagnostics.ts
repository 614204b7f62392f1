/**
 * Powered attic fan diagnostics as pure functions: each field reading becomes a Finding (the same
 * type the ventilation core returns), always carrying FAN_SAFETY_CAUTION.
 *
 * Thresholds are field practice, not code: a fan motor winding reads from near 0 to some tens of
 * ohms; an open winding reads OL (no continuity) or megohms [common practice, from memory].
 * A line-voltage attic fan thermostat passes about 120 V to the motor when it calls and about 0 V
 * when it does not; set points are typically around 90 °F [common practice].
 */
import type { Finding } from "../ventilation/findings";
import { formatNumber } from "../units/format";
import { FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "./cautions";
import type { FanDiagnostics, ThermostatTest } from "./schema";

/** Highest winding resistance read as a plausible, intact winding (ohms) [common practice, from memory]. */
export const WINDING_PLAUSIBLE_MAX_OHMS = 100;
/** From this resistance up (ohms) the winding is taken as open [common practice]. */
export const WINDING_OPEN_MIN_OHMS = 1_000_000;
/** At or above this the switched leg is "live" (nominal 120 V circuit) [common practice]. */
export const SWITCHED_LEG_LIVE_MIN_V = 100;
/** At or below this the switched leg is "dead" [common practice]. */
export const SWITCHED_LEG_DEAD_MAX_V = 10;
/** Typical thermostat set point to restore after the test (°F) [common practice]. */
export const TYPICAL_SET_POINT_F = 90;

const withCaution = (finding: Omit<Finding, "caution">, caution: string = FAN_SAFETY_CAUTION): Finding => ({
  ...finding,
  detail: `${finding.detail} ${caution}`,
  caution,
});

const THERMOSTAT_CAUTION = `${LIVE_VOLTAGE_TEST_CAUTION} ${FAN_SAFETY_CAUTION}`;

/**
 * Whether power was confirmed off with a tester before hands-on checks.
 *
 * @example
 * checkPowerVerifiedOff(false, ["fan1"]).code // "fan-power-not-verified"
 */
export function checkPowerVerifiedOff(isPowerVerifiedOff: boolean, ventIds: string[] = []): Finding {
  if (!isPowerVerifiedOff) {
    return withCaution({
      code: "fan-power-not-verified",
      severity: "critical",
      title: "Power to the fan not verified off",
      detail:
        "Stop: the fan may be live. Switch its breaker off, confirm with a voltage tester that no wire at the fan or thermostat is live, then repeat the checks. A resistance reading taken on a live circuit is not valid and can damage the meter.",
      ventIds,
    });
  }
  return withCaution({
    code: "fan-power-verified",
    severity: "info",
    title: "Power verified off before the checks",
    detail: "The breaker was off and a tester confirmed the fan circuit dead before the hands-on checks.",
    ventIds,
  });
}

/**
 * Reads a motor winding resistance.
 *
 * @example
 * interpretWindingResistance("open", ["fan1"]).code // "fan-winding-open"
 * interpretWindingResistance(18, ["fan1"]).code // "fan-winding-ok"
 */
export function interpretWindingResistance(reading: number | "open", ventIds: string[] = [], isPowerVerifiedOff = true): Finding {
  if (!isPowerVerifiedOff) return checkPowerVerifiedOff(false, ventIds);
  if (reading === "open" || reading >= WINDING_OPEN_MIN_OHMS) {
    const shown = reading === "open" ? "open (OL, no continuity)" : `${formatNumber(reading / 1_000_000)} megohms`;
    return withCaution({
      code: "fan-winding-open",
      severity: "critical",
      title: "Fan motor winding is open",
      detail: `The winding reads ${shown}: the motor can't run. Replace the motor (or the whole fan, if the motor is not sold separately).`,
      ventIds,
    });
  }
  if (reading <= WINDING_PLAUSIBLE_MAX_OHMS) {
    return withCaution({
      code: "fan-winding-ok",
      severity: "info",
      title: "Fan motor winding reads normally",
      detail: `The winding reads ${formatNumber(reading)} ohms, in the usual range (near 0 to some tens of ohms). If the fan still won't run, test the thermostat and the blade next.`,
      ventIds,
    });
  }
  return withCaution({
    code: "fan-winding-suspect",
    severity: "warning",
    title: "Fan motor winding reading is unusual",
    detail: `The winding reads ${formatNumber(reading)} ohms, higher than a fan winding usually reads. Check that the meter leads are on the motor leads with the motor disconnected, compare with the motor's data, and replace the motor if it is confirmed high.`,
    ventIds,
  });
}

/**
 * Thermostat switching test: voltage at the switched leg with the dial below, then above, the
 * attic temperature.
 *
 * @example
 * interpretThermostatTest({ switchedLegVoltsDialBelow: 121, switchedLegVoltsDialAbove: 0 }, ["fan1"]).code // "fan-thermostat-ok"
 * interpretThermostatTest({ switchedLegVoltsDialBelow: 0, switchedLegVoltsDialAbove: 0 }, ["fan1"]).code // "fan-thermostat-failed"
 */
export function interpretThermostatTest(test: ThermostatTest, ventIds: string[] = []): Finding {
  const below = test.switchedLegVoltsDialBelow;
  const above = test.switchedLegVoltsDialAbove;
  const atTemp = test.atticTempF !== undefined ? ` (attic at ${formatNumber(test.atticTempF)} °F)` : "";
  const readings = `With the dial below the attic temperature${atTemp} the switched leg read ${formatNumber(below)} V; with it above, ${formatNumber(above)} V.`;
  const restore = ` Set the dial back to about ${TYPICAL_SET_POINT_F} °F afterwards (a common setting).`;
  const isLiveWhenCalling = below >= SWITCHED_LEG_LIVE_MIN_V;
  const isDeadWhenCalling = below <= SWITCHED_LEG_DEAD_MAX_V;
  const isDeadWhenSatisfied = above <= SWITCHED_LEG_DEAD_MAX_V;
  const isLiveWhenSatisfied = above >= SWITCHED_LEG_LIVE_MIN_V;
  if (isLiveWhenCalling && isDeadWhenSatisfied) {
    return withCaution({
      code: "fan-thermostat-ok",
      severity: "info",
      title: "Thermostat switches correctly",
      detail: `${readings} About 120 V when calling and about 0 V when not is correct. If the fan does not run with 120 V at the motor, the motor or its bearings are at fault.${restore}`,
      ventIds,
    }, THERMOSTAT_CAUTION);
  }
  if (isDeadWhenCalling && isDeadWhenSatisfied) {
    return withCaution({
      code: "fan-thermostat-failed",
      severity: "warning",
      title: "Thermostat does not switch the fan on",
      detail: `${readings} No voltage even when the thermostat should call. First confirm about 120 V on the thermostat's line (supply) side; if it is there, the thermostat has failed open: replace it.${restore}`,
      ventIds,
    }, THERMOSTAT_CAUTION);
  }
  if (isLiveWhenCalling && isLiveWhenSatisfied) {
    return withCaution({
      code: "fan-thermostat-failed",
      severity: "warning",
      title: "Thermostat never switches the fan off",
      detail: `${readings} The switched leg stays live with the dial above the attic temperature, so the fan runs all the time: the thermostat is stuck closed (or bypassed). Replace it.${restore}`,
      ventIds,
    }, THERMOSTAT_CAUTION);
  }
  return withCaution({
    code: "fan-thermostat-inconclusive",
    severity: "warning",
    title: "Thermostat test inconclusive",
    detail: `${readings} Expected about 120 V when calling and about 0 V when not. Check the supply voltage and the meter connections and repeat the test; a partial voltage can mean a loose or burnt connection.${restore}`,
    ventIds,
  }, THERMOSTAT_CAUTION);
}

/**
 * Blade turned by hand with the power off.
 *
 * @example
 * interpretBladeSpin(false, ["fan1"]).code // "fan-bearings-seized"
 */
export function interpretBladeSpin(isBladeFreeToSpin: boolean, ventIds: string[] = []): Finding {
  if (!isBladeFreeToSpin) {
    return withCaution({
      code: "fan-bearings-seized",
      severity: "warning",
      title: "Fan blade does not spin freely",
      detail:
        "The motor bearings are seized or dragging. Attic fan motors usually have sealed bearings that can't be serviced: replace the motor or the fan. Do not oil them — oil won't reach sealed bearings and attracts dust.",
      ventIds,
    });
  }
  return withCaution({
    code: "fan-bearings-ok",
    severity: "info",
    title: "Fan blade spins freely",
    detail: "The blade turns easily and coasts, so the bearings are not seized.",
    ventIds,
  });
}

/**
 * All findings for one fan's recorded checks, in the order a technician works: power verified
 * off, blade, winding, thermostat. When power was not verified off, the hands-on readings are
 * not interpreted — only the stop finding is returned — because they are neither safe nor valid.
 *
 * @example
 * diagnoseFan({ isPowerVerifiedOff: true, windingResistanceOhms: "open" }, "fan1").map((f) => f.code)
 * // ["fan-power-verified", "fan-winding-open"]
 */
export function diagnoseFan(diagnostics: FanDiagnostics, ventId: string): Finding[] {
  const ventIds = [ventId];
  const findings: Finding[] = [];
  const hasHandsOn = diagnostics.windingResistanceOhms !== undefined || diagnostics.isBladeFreeToSpin !== undefined;
  if (diagnostics.isPowerVerifiedOff === false || (hasHandsOn && diagnostics.isPowerVerifiedOff === undefined)) {
    findings.push(checkPowerVerifiedOff(false, ventIds));
  } else {
    if (diagnostics.isPowerVerifiedOff === true) findings.push(checkPowerVerifiedOff(true, ventIds));
    if (diagnostics.isBladeFreeToSpin !== undefined) findings.push(interpretBladeSpin(diagnostics.isBladeFreeToSpin, ventIds));
    if (diagnostics.windingResistanceOhms !== undefined) findings.push(interpretWindingResistance(diagnostics.windingResistanceOhms, ventIds));
  }
  // The thermostat test is a live-voltage test, done with power on by someone qualified.
  if (diagnostics.thermostatTest !== undefined) findings.push(interpretThermostatTest(diagnostics.thermostatTest, ventIds));
  return findings;
}
