/**
 * Fan controls: how a powered attic fan is switched, read against the climate. Common practice, not
 * code [SOURCES.md S35, from memory]: in cold climates a humidistat or an always-on fan pulls warm,
 * moist house air through ceiling leaks into the attic, where it condenses on the cold deck; a
 * thermostat set far below the usual ~90–110 °F runs the fan on mild days, far above it hardly ever;
 * and a fan is only known to work when it has been seen to start (dial turned down or override).
 */
import type { Finding } from "../ventilation/findings";
import type { Vent } from "../ventilation/schema";
import { formatNumber } from "../units/format";
import { FAN_SAFETY_CAUTION } from "./cautions";

/** Cold climates for the control advice: IECC zones 5–8 [common practice]. */
export const COLD_CLIMATE_MIN_ZONE = 5;
/** Thermostat set points outside this band are called out, °F [common practice, from memory]. */
export const SET_POINT_LOW_F = 75;
export const SET_POINT_HIGH_F = 120;

/**
 * @example
 * fanControlFindings({ id: "f", kind: "powered-roof", location: "upper", cfm: 1200, control: "thermostat-and-humidistat" }, 6).map((f) => f.code)
 * // ["fan-control-cold-climate", "fan-override-untested"]
 */
export function fanControlFindings(vent: Vent, climateZone: number): Finding[] {
  const findings: Finding[] = [];
  const ventIds = [vent.id];
  const isCold = climateZone >= COLD_CLIMATE_MIN_ZONE;
  if (isCold && (vent.control === "thermostat-and-humidistat" || vent.control === "always-on")) {
    findings.push({
      code: "fan-control-cold-climate",
      severity: "warning",
      title: vent.control === "always-on" ? "Fan runs all the time in a cold climate" : "Humidistat on an attic fan in a cold climate",
      detail:
        (vent.control === "always-on"
          ? `In climate zone ${climateZone} a fan that never stops runs through the winter, `
          : `In climate zone ${climateZone} a humidistat switches the fan on in cold, damp weather, `) +
        "pulling warm, moist house air up through ceiling leaks into the attic, where it condenses on the cold roof deck (frost, mould, rot). Use a thermostat only, or switch the fan off for the heating season; air-seal the ceiling either way (common practice).",
      ventIds,
    });
  }
  if (vent.thermostatSetPointF !== undefined && (vent.thermostatSetPointF < SET_POINT_LOW_F || vent.thermostatSetPointF > SET_POINT_HIGH_F)) {
    const isLow = vent.thermostatSetPointF < SET_POINT_LOW_F;
    findings.push({
      code: "fan-set-point-unusual",
      severity: isLow ? "warning" : "info",
      title: isLow ? "Fan thermostat set very low" : "Fan thermostat set very high",
      detail: isLow
        ? `The thermostat is set to ${formatNumber(vent.thermostatSetPointF)} °F, so the fan runs on mild days and much of the night, pulling house air into the attic for little benefit. The usual setting is about 90–110 °F (common practice; follow the maker's instructions).`
        : `The thermostat is set to ${formatNumber(vent.thermostatSetPointF)} °F, so the fan rarely runs. The usual setting is about 90–110 °F (common practice; follow the maker's instructions).`,
      ventIds,
    });
  }
  const hasAutomaticControl = vent.control === "thermostat" || vent.control === "thermostat-and-humidistat" || vent.hasThermostat === true;
  const override = vent.diagnostics?.overrideTest;
  if (override === "does-not-run") {
    findings.push({
      code: "fan-override-failed",
      severity: "warning",
      title: "Fan did not start when forced on",
      detail: "With the dial turned below the attic temperature (or the override used) the fan did not start. Check the supply, the thermostat and the motor with the fan checks.",
      ventIds,
      caution: FAN_SAFETY_CAUTION,
    });
  } else if (override === undefined && hasAutomaticControl) {
    findings.push({
      code: "fan-override-untested",
      severity: "info",
      title: "Fan not seen running",
      detail: "Turn the thermostat dial below the attic temperature (or use the override switch) and confirm the fan starts, then set it back. Until then nobody knows the fan works.",
      ventIds,
    });
  }
  return findings;
}
