/**
 * Powered attic fan diagnostics as pure functions: each field reading becomes a Finding (the same
 * type the ventilation core returns), always carrying FAN_SAFETY_CAUTION.
 *
 * Thresholds are field practice, not code [common practice, from memory; SOURCES.md S30]: a small
 * fan motor winding reads from about an ohm to some tens of ohms; below 1 ohm it is shorted (or the
 * meter is across shorted leads); an open winding reads OL (no continuity) or megohms; winding to
 * frame should read OL or at least 1 megohm (the usual floor for low-voltage motor insulation); a
 * run capacitor should read within the tolerance printed on it (±6 % is common).
 * Lock-out and the tester proof follow OSHA 29 CFR 1910.147 and 1910.333 and NFPA 70E's
 * live-dead-live test [SOURCES.md S31, S32; from memory].
 * A line-voltage attic fan thermostat passes about 120 V to the motor when it calls and about 0 V
 * when it does not; set points are typically around 90 °F [common practice].
 */
import type { Finding } from "../ventilation/findings";
import { formatNumber } from "../units/format";
import { CAPACITOR_CAUTION, FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "./cautions";
import type { CapacitorReading, FanDiagnostics, ThermostatTest } from "./schema";

/** Below this a winding reads as shorted (ohms) [common practice, from memory]. */
export const WINDING_SHORT_BELOW_OHMS = 1;
/** Winding to frame at or above this (ohms) is healthy insulation [common practice, from memory]. */
export const GROUND_INSULATION_MIN_OHMS = 1_000_000;
/** Capacitor tolerance when the label's is not recorded, ± % [common practice, from memory]. */
export const DEFAULT_CAPACITOR_TOLERANCE_PERCENT = 6;
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

/**
 * The finding with its caution, shown after the detail and kept on its own for the UI and PDF. The
 * caution is one shared string, never copied; a plain literal because an object spread here cost
 * microseconds per finding in Node 20 (issue 17).
 */
function withCaution(finding: Omit<Finding, "caution">, caution: string = FAN_SAFETY_CAUTION): Finding {
  return { code: finding.code, severity: finding.severity, title: finding.title, detail: `${finding.detail} ${caution}`, ventIds: finding.ventIds, caution };
}

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
  if (reading < WINDING_SHORT_BELOW_OHMS) {
    return withCaution({
      code: "fan-winding-shorted",
      severity: "critical",
      title: "Fan motor winding reads as a short",
      detail: `The winding reads ${formatNumber(reading, { maxFractionDigits: 3 })} ohms: a motor winding reads at least about an ohm, so this is a shorted winding or the meter is across shorted leads. Disconnect the motor leads and measure again at the motor; if it still reads under 1 ohm, replace the motor. Do not switch it back on.`,
      ventIds,
    });
  }
  if (reading <= WINDING_PLAUSIBLE_MAX_OHMS) {
    return withCaution({
      code: "fan-winding-ok",
      severity: "info",
      title: "Fan motor winding reads normally",
      detail: `The winding reads ${formatNumber(reading)} ohms, in the usual range (about 1 to some tens of ohms). If the fan still won't run, test the thermostat and the blade next.`,
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
 * Winding to frame (ground): healthy insulation reads OL or megohms.
 *
 * @example
 * interpretWindingToGround("open", ["fan1"]).code // "fan-ground-ok"
 * interpretWindingToGround(2_000, ["fan1"]).code // "fan-winding-grounded"
 */
export function interpretWindingToGround(reading: number | "open", ventIds: string[] = []): Finding {
  if (reading === "open" || reading >= GROUND_INSULATION_MIN_OHMS) {
    return withCaution({
      code: "fan-ground-ok",
      severity: "info",
      title: "No leak from the winding to the motor frame",
      detail: `Winding to frame reads ${reading === "open" ? "open (OL)" : `${formatNumber(reading / 1_000_000)} megohms`}, as it should. An ordinary meter can't show marginal insulation; an insulation tester (megohmmeter) can.`,
      ventIds,
    });
  }
  return withCaution({
    code: "fan-winding-grounded",
    severity: "critical",
    title: "Fan motor winding leaks to its frame",
    detail: `Winding to frame reads ${formatNumber(reading)} ohms; it should read open (OL) or at least 1 megohm. The insulation has failed and the motor frame can become live. Do not switch it back on: replace the motor, and have a licensed electrician check the circuit's grounding.`,
    ventIds,
  });
}

/**
 * Run capacitor against its label; only for motors that have one (shaded-pole motors have none).
 *
 * @example
 * interpretCapacitor({ ratedMicrofarads: 5, measuredMicrofarads: 4.6 }, ["fan1"]).code // "fan-capacitor-failed" (outside 4.7–5.3 µF)
 */
export function interpretCapacitor(reading: CapacitorReading, ventIds: string[] = []): Finding {
  const tolerance = (reading.tolerancePercent ?? DEFAULT_CAPACITOR_TOLERANCE_PERCENT) / 100;
  const lowUf = reading.ratedMicrofarads * (1 - tolerance);
  const highUf = reading.ratedMicrofarads * (1 + tolerance);
  const range = `${formatNumber(lowUf)}–${formatNumber(highUf)} µF (${formatNumber(reading.ratedMicrofarads)} µF ± ${formatNumber(tolerance * 100)} %${reading.tolerancePercent === undefined ? ", a common tolerance; use the one printed on it" : ""})`;
  const caution = `${CAPACITOR_CAUTION} ${FAN_SAFETY_CAUTION}`;
  if (reading.measuredMicrofarads >= lowUf - 1e-9 && reading.measuredMicrofarads <= highUf + 1e-9) {
    return withCaution({ code: "fan-capacitor-ok", severity: "info", title: "Capacitor reads within its rating", detail: `The capacitor reads ${formatNumber(reading.measuredMicrofarads)} µF, within ${range}.`, ventIds }, caution);
  }
  return withCaution({
    code: "fan-capacitor-failed",
    severity: "warning",
    title: "Capacitor out of its rating",
    detail: `The capacitor reads ${formatNumber(reading.measuredMicrofarads)} µF; it should read ${range}. A weak capacitor makes the motor hum, start slowly or overheat: replace it with one of the same µF and voltage rating.`,
    ventIds,
  }, caution);
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
  const hasHandsOn =
    diagnostics.windingResistanceOhms !== undefined ||
    diagnostics.isBladeFreeToSpin !== undefined ||
    diagnostics.windingToGroundOhms !== undefined ||
    diagnostics.capacitor !== undefined;
  if (diagnostics.isPowerVerifiedOff === false || (hasHandsOn && diagnostics.isPowerVerifiedOff === undefined)) {
    findings.push(checkPowerVerifiedOff(false, ventIds));
  } else if (diagnostics.isLockedOut === false) {
    findings.push(stopFinding("fan-lockout-missing", "Breaker not locked off", "Stop: the breaker was not locked or tagged off, so someone could switch the fan back on during the checks. Lock or tag it off, then repeat the checks; the readings recorded are not interpreted.", ventIds));
  } else if (diagnostics.isTesterProven === false) {
    findings.push(stopFinding("fan-tester-not-proven", "Tester not proven on a known live source", "Stop: a tester that was not proven on a known live source before and after (live-dead-live) may show \"dead\" on a live circuit. Prove it, test again, then repeat the checks; the readings recorded are not interpreted.", ventIds));
  } else {
    if (diagnostics.isPowerVerifiedOff === true) findings.push(checkPowerVerifiedOff(true, ventIds));
    if (hasHandsOn && (diagnostics.isLockedOut === undefined || diagnostics.isTesterProven === undefined)) {
      findings.push(withCaution({
        code: "fan-safety-steps-not-recorded",
        severity: "warning",
        title: "Lock-out and tester proof not recorded",
        detail: "The survey does not say whether the breaker was locked or tagged off and whether the tester was proven on a known live source before and after the dead test. Record both next time; they are what makes a \"dead\" reading safe to trust.",
        ventIds,
      }));
    }
    if (diagnostics.isBladeFreeToSpin !== undefined) findings.push(interpretBladeSpin(diagnostics.isBladeFreeToSpin, ventIds));
    if (diagnostics.windingResistanceOhms !== undefined) findings.push(interpretWindingResistance(diagnostics.windingResistanceOhms, ventIds));
    if (diagnostics.windingToGroundOhms !== undefined) findings.push(interpretWindingToGround(diagnostics.windingToGroundOhms, ventIds));
    if (diagnostics.hasCapacitor !== false && diagnostics.capacitor !== undefined) findings.push(interpretCapacitor(diagnostics.capacitor, ventIds));
  }
  // The thermostat test is a live-voltage test, done with power on by someone qualified.
  if (diagnostics.thermostatTest !== undefined) findings.push(interpretThermostatTest(diagnostics.thermostatTest, ventIds));
  return findings;
}

function stopFinding(code: "fan-lockout-missing" | "fan-tester-not-proven", title: string, detail: string, ventIds: string[]): Finding {
  return withCaution({ code, severity: "critical", title, detail, ventIds });
}
