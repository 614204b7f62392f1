// Frozen copy of the ventilation core's analyzeAttic as it stood at commit 3600f6f (before issue 17's
// speed work), bundled once with esbuild from shared/ (zod external). Never edit it: tests/unit/
// core-equivalence.test.ts and bench/core-bench.ts compare the current core against it.
// Rebuild command (from that commit): echo 'export { analyzeAttic } from "./shared/ventilation/analyze-attic";' |
//   npx esbuild --bundle --format=esm --platform=neutral --external:zod --legal-comments=none --charset=utf8 --sourcefile=entry.ts --loader=ts --resolve-extensions=.ts
// shared/units/format.ts
var SQ_IN_PER_SQ_FT = 144;
var CU_M_PER_CU_FT = 0.028316846592;
var LPS_PER_CFM = CU_M_PER_CU_FT * 1e3 / 60;
var formatterCache = /* @__PURE__ */ new Map();
function formatNumber(value, options = {}) {
  if (!Number.isFinite(value)) return "—";
  const max = options.maxFractionDigits ?? 2;
  const min = Math.min(options.minFractionDigits ?? 0, max);
  const key = `${min}:${max}`;
  let formatter = formatterCache.get(key);
  if (!formatter) {
    formatter = new Intl.NumberFormat("en-US", {
      maximumFractionDigits: max,
      minimumFractionDigits: min,
      useGrouping: true
    });
    formatterCache.set(key, formatter);
  }
  const text = formatter.format(value);
  return text === "-0" ? "0" : text;
}
function roundTo(value, digits) {
  const factor = 10 ** digits;
  return Math.sign(value) * Math.round(Math.abs(value) * factor * (1 + Number.EPSILON)) / factor;
}
function ceilWhole(value) {
  return Math.ceil(roundTo(value, 6));
}
function floorWhole(value) {
  return Math.floor(roundTo(value, 6));
}
function formatPercent(share) {
  return `${formatNumber(share * 100, { maxFractionDigits: 1 })} %`;
}

// shared/diagnostics/cautions.ts
var FAN_SAFETY_CAUTION = "Safety: switch the fan's circuit off at the breaker, lock or tag the breaker off so nobody switches it back on, and confirm the circuit is dead with a voltage tester that you prove on a known live source just before and just after (live-dead-live) before touching the fan, its thermostat or any wire. Any wiring repair or replacement is work for a licensed electrician. Attics get dangerously hot: work early in the day, bring water and limit your time up there. Walk only on the framing (joists or truss chords), never on drywall or insulation between them. Follow the manufacturer's instructions and local codes.";
var ATTIC_SAFETY_CAUTION = "Safety: attics get dangerously hot, so work early in the day and bring water; walk only on the framing, never on drywall or insulation between the joists; wear a dust mask around insulation.";
var ROOF_SAFETY_CAUTION = "Safety: roof work needs fall protection; follow the manufacturer's installation instructions, local codes and the authority having jurisdiction.";
var COMBUSTION_SAFETY_CAUTION = "A powered attic fan can pull air out of the house through ceiling leaks and make a natural-draft gas water heater, furnace or boiler spill exhaust (carbon monoxide) into the living space. Have a qualified technician run a combustion safety (worst-case depressurization and spillage) test with the fan running, air-seal the ceiling, and keep working carbon monoxide alarms.";
var LIVE_VOLTAGE_TEST_CAUTION = "The switching test is a live-voltage test: only a qualified person should do it, with a rated meter and insulated probes, touching no bare conductor; switch the breaker off again before disconnecting anything.";
var CAPACITOR_CAUTION = "A capacitor can hold a charge after the power is off: discharge it safely (a rated resistor across the terminals, never a screwdriver) before touching or measuring it.";

// shared/diagnostics/fan-controls.ts
var COLD_CLIMATE_MIN_ZONE = 5;
var SET_POINT_LOW_F = 75;
var SET_POINT_HIGH_F = 120;
function fanControlFindings(vent, climateZone) {
  const findings = [];
  const ventIds = [vent.id];
  const isCold = climateZone >= COLD_CLIMATE_MIN_ZONE;
  if (isCold && (vent.control === "thermostat-and-humidistat" || vent.control === "always-on")) {
    findings.push({
      code: "fan-control-cold-climate",
      severity: "warning",
      title: vent.control === "always-on" ? "Fan runs all the time in a cold climate" : "Humidistat on an attic fan in a cold climate",
      detail: (vent.control === "always-on" ? `In climate zone ${climateZone} a fan that never stops runs through the winter, ` : `In climate zone ${climateZone} a humidistat switches the fan on in cold, damp weather, `) + "pulling warm, moist house air up through ceiling leaks into the attic, where it condenses on the cold roof deck (frost, mould, rot). Use a thermostat only, or switch the fan off for the heating season; air-seal the ceiling either way (common practice).",
      ventIds
    });
  }
  if (vent.thermostatSetPointF !== void 0 && (vent.thermostatSetPointF < SET_POINT_LOW_F || vent.thermostatSetPointF > SET_POINT_HIGH_F)) {
    const isLow = vent.thermostatSetPointF < SET_POINT_LOW_F;
    findings.push({
      code: "fan-set-point-unusual",
      severity: isLow ? "warning" : "info",
      title: isLow ? "Fan thermostat set very low" : "Fan thermostat set very high",
      detail: isLow ? `The thermostat is set to ${formatNumber(vent.thermostatSetPointF)} °F, so the fan runs on mild days and much of the night, pulling house air into the attic for little benefit. The usual setting is about 90–110 °F (common practice; follow the maker's instructions).` : `The thermostat is set to ${formatNumber(vent.thermostatSetPointF)} °F, so the fan rarely runs. The usual setting is about 90–110 °F (common practice; follow the maker's instructions).`,
      ventIds
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
      caution: FAN_SAFETY_CAUTION
    });
  } else if (override === void 0 && hasAutomaticControl) {
    findings.push({
      code: "fan-override-untested",
      severity: "info",
      title: "Fan not seen running",
      detail: "Turn the thermostat dial below the attic temperature (or use the override switch) and confirm the fan starts, then set it back. Until then nobody knows the fan works.",
      ventIds
    });
  }
  return findings;
}

// shared/diagnostics/fan-diagnostics.ts
var WINDING_SHORT_BELOW_OHMS = 1;
var GROUND_INSULATION_MIN_OHMS = 1e6;
var DEFAULT_CAPACITOR_TOLERANCE_PERCENT = 6;
var WINDING_PLAUSIBLE_MAX_OHMS = 100;
var WINDING_OPEN_MIN_OHMS = 1e6;
var SWITCHED_LEG_LIVE_MIN_V = 100;
var SWITCHED_LEG_DEAD_MAX_V = 10;
var TYPICAL_SET_POINT_F = 90;
var withCaution = (finding, caution = FAN_SAFETY_CAUTION) => ({
  ...finding,
  detail: `${finding.detail} ${caution}`,
  caution
});
var THERMOSTAT_CAUTION = `${LIVE_VOLTAGE_TEST_CAUTION} ${FAN_SAFETY_CAUTION}`;
function checkPowerVerifiedOff(isPowerVerifiedOff, ventIds = []) {
  if (!isPowerVerifiedOff) {
    return withCaution({
      code: "fan-power-not-verified",
      severity: "critical",
      title: "Power to the fan not verified off",
      detail: "Stop: the fan may be live. Switch its breaker off, confirm with a voltage tester that no wire at the fan or thermostat is live, then repeat the checks. A resistance reading taken on a live circuit is not valid and can damage the meter.",
      ventIds
    });
  }
  return withCaution({
    code: "fan-power-verified",
    severity: "info",
    title: "Power verified off before the checks",
    detail: "The breaker was off and a tester confirmed the fan circuit dead before the hands-on checks.",
    ventIds
  });
}
function interpretWindingResistance(reading, ventIds = [], isPowerVerifiedOff = true) {
  if (!isPowerVerifiedOff) return checkPowerVerifiedOff(false, ventIds);
  if (reading === "open" || reading >= WINDING_OPEN_MIN_OHMS) {
    const shown = reading === "open" ? "open (OL, no continuity)" : `${formatNumber(reading / 1e6)} megohms`;
    return withCaution({
      code: "fan-winding-open",
      severity: "critical",
      title: "Fan motor winding is open",
      detail: `The winding reads ${shown}: the motor can't run. Replace the motor (or the whole fan, if the motor is not sold separately).`,
      ventIds
    });
  }
  if (reading < WINDING_SHORT_BELOW_OHMS) {
    return withCaution({
      code: "fan-winding-shorted",
      severity: "critical",
      title: "Fan motor winding reads as a short",
      detail: `The winding reads ${formatNumber(reading, { maxFractionDigits: 3 })} ohms: a motor winding reads at least about an ohm, so this is a shorted winding or the meter is across shorted leads. Disconnect the motor leads and measure again at the motor; if it still reads under 1 ohm, replace the motor. Do not switch it back on.`,
      ventIds
    });
  }
  if (reading <= WINDING_PLAUSIBLE_MAX_OHMS) {
    return withCaution({
      code: "fan-winding-ok",
      severity: "info",
      title: "Fan motor winding reads normally",
      detail: `The winding reads ${formatNumber(reading)} ohms, in the usual range (about 1 to some tens of ohms). If the fan still won't run, test the thermostat and the blade next.`,
      ventIds
    });
  }
  return withCaution({
    code: "fan-winding-suspect",
    severity: "warning",
    title: "Fan motor winding reading is unusual",
    detail: `The winding reads ${formatNumber(reading)} ohms, higher than a fan winding usually reads. Check that the meter leads are on the motor leads with the motor disconnected, compare with the motor's data, and replace the motor if it is confirmed high.`,
    ventIds
  });
}
function interpretWindingToGround(reading, ventIds = []) {
  if (reading === "open" || reading >= GROUND_INSULATION_MIN_OHMS) {
    return withCaution({
      code: "fan-ground-ok",
      severity: "info",
      title: "No leak from the winding to the motor frame",
      detail: `Winding to frame reads ${reading === "open" ? "open (OL)" : `${formatNumber(reading / 1e6)} megohms`}, as it should. An ordinary meter can't show marginal insulation; an insulation tester (megohmmeter) can.`,
      ventIds
    });
  }
  return withCaution({
    code: "fan-winding-grounded",
    severity: "critical",
    title: "Fan motor winding leaks to its frame",
    detail: `Winding to frame reads ${formatNumber(reading)} ohms; it should read open (OL) or at least 1 megohm. The insulation has failed and the motor frame can become live. Do not switch it back on: replace the motor, and have a licensed electrician check the circuit's grounding.`,
    ventIds
  });
}
function interpretCapacitor(reading, ventIds = []) {
  const tolerance = (reading.tolerancePercent ?? DEFAULT_CAPACITOR_TOLERANCE_PERCENT) / 100;
  const lowUf = reading.ratedMicrofarads * (1 - tolerance);
  const highUf = reading.ratedMicrofarads * (1 + tolerance);
  const range = `${formatNumber(lowUf)}–${formatNumber(highUf)} µF (${formatNumber(reading.ratedMicrofarads)} µF ± ${formatNumber(tolerance * 100)} %${reading.tolerancePercent === void 0 ? ", a common tolerance; use the one printed on it" : ""})`;
  const caution = `${CAPACITOR_CAUTION} ${FAN_SAFETY_CAUTION}`;
  if (reading.measuredMicrofarads >= lowUf - 1e-9 && reading.measuredMicrofarads <= highUf + 1e-9) {
    return withCaution({ code: "fan-capacitor-ok", severity: "info", title: "Capacitor reads within its rating", detail: `The capacitor reads ${formatNumber(reading.measuredMicrofarads)} µF, within ${range}.`, ventIds }, caution);
  }
  return withCaution({
    code: "fan-capacitor-failed",
    severity: "warning",
    title: "Capacitor out of its rating",
    detail: `The capacitor reads ${formatNumber(reading.measuredMicrofarads)} µF; it should read ${range}. A weak capacitor makes the motor hum, start slowly or overheat: replace it with one of the same µF and voltage rating.`,
    ventIds
  }, caution);
}
function interpretThermostatTest(test, ventIds = []) {
  const below = test.switchedLegVoltsDialBelow;
  const above = test.switchedLegVoltsDialAbove;
  const atTemp = test.atticTempF !== void 0 ? ` (attic at ${formatNumber(test.atticTempF)} °F)` : "";
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
      ventIds
    }, THERMOSTAT_CAUTION);
  }
  if (isDeadWhenCalling && isDeadWhenSatisfied) {
    return withCaution({
      code: "fan-thermostat-failed",
      severity: "warning",
      title: "Thermostat does not switch the fan on",
      detail: `${readings} No voltage even when the thermostat should call. First confirm about 120 V on the thermostat's line (supply) side; if it is there, the thermostat has failed open: replace it.${restore}`,
      ventIds
    }, THERMOSTAT_CAUTION);
  }
  if (isLiveWhenCalling && isLiveWhenSatisfied) {
    return withCaution({
      code: "fan-thermostat-failed",
      severity: "warning",
      title: "Thermostat never switches the fan off",
      detail: `${readings} The switched leg stays live with the dial above the attic temperature, so the fan runs all the time: the thermostat is stuck closed (or bypassed). Replace it.${restore}`,
      ventIds
    }, THERMOSTAT_CAUTION);
  }
  return withCaution({
    code: "fan-thermostat-inconclusive",
    severity: "warning",
    title: "Thermostat test inconclusive",
    detail: `${readings} Expected about 120 V when calling and about 0 V when not. Check the supply voltage and the meter connections and repeat the test; a partial voltage can mean a loose or burnt connection.${restore}`,
    ventIds
  }, THERMOSTAT_CAUTION);
}
function interpretBladeSpin(isBladeFreeToSpin, ventIds = []) {
  if (!isBladeFreeToSpin) {
    return withCaution({
      code: "fan-bearings-seized",
      severity: "warning",
      title: "Fan blade does not spin freely",
      detail: "The motor bearings are seized or dragging. Attic fan motors usually have sealed bearings that can't be serviced: replace the motor or the fan. Do not oil them — oil won't reach sealed bearings and attracts dust.",
      ventIds
    });
  }
  return withCaution({
    code: "fan-bearings-ok",
    severity: "info",
    title: "Fan blade spins freely",
    detail: "The blade turns easily and coasts, so the bearings are not seized.",
    ventIds
  });
}
function diagnoseFan(diagnostics, ventId) {
  const ventIds = [ventId];
  const findings = [];
  const hasHandsOn = diagnostics.windingResistanceOhms !== void 0 || diagnostics.isBladeFreeToSpin !== void 0 || diagnostics.windingToGroundOhms !== void 0 || diagnostics.capacitor !== void 0;
  if (diagnostics.isPowerVerifiedOff === false || hasHandsOn && diagnostics.isPowerVerifiedOff === void 0) {
    findings.push(checkPowerVerifiedOff(false, ventIds));
  } else if (diagnostics.isLockedOut === false) {
    findings.push(stopFinding("fan-lockout-missing", "Breaker not locked off", "Stop: the breaker was not locked or tagged off, so someone could switch the fan back on during the checks. Lock or tag it off, then repeat the checks; the readings recorded are not interpreted.", ventIds));
  } else if (diagnostics.isTesterProven === false) {
    findings.push(stopFinding("fan-tester-not-proven", "Tester not proven on a known live source", 'Stop: a tester that was not proven on a known live source before and after (live-dead-live) may show "dead" on a live circuit. Prove it, test again, then repeat the checks; the readings recorded are not interpreted.', ventIds));
  } else {
    if (diagnostics.isPowerVerifiedOff === true) findings.push(checkPowerVerifiedOff(true, ventIds));
    if (hasHandsOn && (diagnostics.isLockedOut === void 0 || diagnostics.isTesterProven === void 0)) {
      findings.push(withCaution({
        code: "fan-safety-steps-not-recorded",
        severity: "warning",
        title: "Lock-out and tester proof not recorded",
        detail: 'The survey does not say whether the breaker was locked or tagged off and whether the tester was proven on a known live source before and after the dead test. Record both next time; they are what makes a "dead" reading safe to trust.',
        ventIds
      }));
    }
    if (diagnostics.isBladeFreeToSpin !== void 0) findings.push(interpretBladeSpin(diagnostics.isBladeFreeToSpin, ventIds));
    if (diagnostics.windingResistanceOhms !== void 0) findings.push(interpretWindingResistance(diagnostics.windingResistanceOhms, ventIds));
    if (diagnostics.windingToGroundOhms !== void 0) findings.push(interpretWindingToGround(diagnostics.windingToGroundOhms, ventIds));
    if (diagnostics.hasCapacitor !== false && diagnostics.capacitor !== void 0) findings.push(interpretCapacitor(diagnostics.capacitor, ventIds));
  }
  if (diagnostics.thermostatTest !== void 0) findings.push(interpretThermostatTest(diagnostics.thermostatTest, ventIds));
  return findings;
}
function stopFinding(code, title, detail, ventIds) {
  return withCaution({ code, severity: "critical", title, detail, ventIds });
}

// shared/ventilation/floor-area.ts
function shoelaceAreaSqFt(pointsFt) {
  const n = pointsFt.length;
  if (n < 3) return 0;
  const [x0, y0] = pointsFt[0];
  let twiceArea = 0;
  for (let i = 0; i < n; i += 1) {
    const [ax, ay] = pointsFt[i];
    const [bx, by] = pointsFt[(i + 1) % n];
    twiceArea += (ax - x0) * (by - y0) - (bx - x0) * (ay - y0);
  }
  return Math.abs(twiceArea) / 2;
}
function orientation(a, b, c) {
  const value = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
  const scale = Math.max(1, Math.abs(b[0] - a[0]) + Math.abs(b[1] - a[1])) * Math.max(1, Math.abs(c[0] - a[0]) + Math.abs(c[1] - a[1]));
  if (Math.abs(value) <= 1e-12 * scale) return 0;
  return value > 0 ? 1 : -1;
}
function onSegment(a, b, p) {
  return Math.min(a[0], b[0]) <= p[0] && p[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= p[1] && p[1] <= Math.max(a[1], b[1]);
}
function segmentsIntersect(a, b, c, d) {
  const o1 = orientation(a, b, c);
  const o2 = orientation(a, b, d);
  const o3 = orientation(c, d, a);
  const o4 = orientation(c, d, b);
  if (o1 !== o2 && o3 !== o4) return true;
  if (o1 === 0 && onSegment(a, b, c)) return true;
  if (o2 === 0 && onSegment(a, b, d)) return true;
  if (o3 === 0 && onSegment(c, d, a)) return true;
  if (o4 === 0 && onSegment(c, d, b)) return true;
  return false;
}
function polygonProblem(pointsFt) {
  const n = pointsFt.length;
  if (n < 3) return "An outline needs at least 3 corners.";
  for (let i = 0; i < n; i += 1) {
    const a = pointsFt[i];
    const b = pointsFt[(i + 1) % n];
    if (a[0] === b[0] && a[1] === b[1]) {
      return `Corners ${i + 1} and ${(i + 1) % n + 1} are the same point; remove one.`;
    }
  }
  for (let i = 0; i < n; i += 1) {
    const a = pointsFt[i];
    const b = pointsFt[(i + 1) % n];
    for (let j = i + 1; j < n; j += 1) {
      const isNeighbour = j === i + 1 || i === 0 && j === n - 1;
      const c = pointsFt[j];
      const d = pointsFt[(j + 1) % n];
      if (isNeighbour) {
        const shared = j === i + 1 ? b : a;
        const otherA = j === i + 1 ? a : b;
        const otherB = j === i + 1 ? d : c;
        const folds = orientation(otherA, shared, otherB) === 0 && (otherB[0] - shared[0]) * (otherA[0] - shared[0]) + (otherB[1] - shared[1]) * (otherA[1] - shared[1]) > 0;
        if (folds) {
          return `The outline doubles back on itself at corner ${(j === i + 1 ? i + 1 : 0) + 1}; redraw that corner.`;
        }
        continue;
      }
      if (segmentsIntersect(a, b, c, d)) {
        return `The outline crosses itself: side ${i + 1} (corner ${i + 1} to ${(i + 1) % n + 1}) crosses side ${j + 1} (corner ${j + 1} to ${(j + 1) % n + 1}). Redraw it going around the edge in order.`;
      }
    }
  }
  if (shoelaceAreaSqFt(pointsFt) <= 0) return "The outline encloses no area.";
  return null;
}
function sectionAreaSqFt(section) {
  switch (section.kind) {
    case "rect":
      return section.lengthFt * section.widthFt;
    case "polygon":
      return shoelaceAreaSqFt(section.pointsFt);
    case "area":
      return section.areaSqFt;
  }
}
function describeSectionArea(section, formatNumber2) {
  switch (section.kind) {
    case "rect":
      return `${formatNumber2(section.lengthFt)} ft × ${formatNumber2(section.widthFt)} ft = ${formatNumber2(sectionAreaSqFt(section))} sq ft`;
    case "polygon":
      return `outline of ${section.pointsFt.length} corners = ${formatNumber2(sectionAreaSqFt(section))} sq ft`;
    case "area":
      return `entered as ${formatNumber2(section.areaSqFt)} sq ft`;
  }
}

// shared/ventilation/attic-volume.ts
function sectionSpanFt(section) {
  if (section.spanFt !== void 0) return section.spanFt;
  if (section.kind !== "rect") return null;
  if (section.roofForm === "hip") return Math.min(section.lengthFt, section.widthFt);
  return section.widthFt;
}
function sectionRiseFt(section) {
  if (section.roofForm === void 0 || section.pitchIn12 === void 0) return null;
  const spanFt = sectionSpanFt(section);
  if (spanFt === null) return null;
  const runFt = section.roofForm === "shed" ? spanFt : spanFt / 2;
  return runFt * section.pitchIn12 / 12;
}
function sectionGeometry(section, fmt = String) {
  if (section.roofForm === void 0) return { isKnown: false, reason: "the roof form (gable, hip or shed) was not recorded" };
  if (section.pitchIn12 === void 0) return { isKnown: false, reason: "the roof pitch was not recorded" };
  const spanFt = sectionSpanFt(section);
  const riseFt = sectionRiseFt(section);
  if (spanFt === null || riseFt === null) {
    return { isKnown: false, reason: "the span across the roof slope was not recorded for this outline" };
  }
  const areaSqFt = sectionAreaSqFt(section);
  const form = section.roofForm;
  if (section.kind === "rect" && section.spanFt === void 0) {
    const longFt = Math.max(section.lengthFt, section.widthFt);
    const alongRidgeFt = form === "hip" ? longFt : section.lengthFt;
    if (form === "hip") {
      const volumeCuFt3 = spanFt * riseFt * (3 * alongRidgeFt - spanFt) / 6;
      return {
        isKnown: true,
        riseFt,
        volumeCuFt: volumeCuFt3,
        explanation: `hip roof: rise ${fmt(spanFt)} ft ÷ 2 × ${fmt(section.pitchIn12)}/12 = ${fmt(riseFt)} ft; volume ${fmt(spanFt)} × ${fmt(riseFt)} × (3 × ${fmt(alongRidgeFt)} − ${fmt(spanFt)}) ÷ 6 = ${fmt(volumeCuFt3)} cu ft`
      };
    }
    const volumeCuFt2 = 0.5 * spanFt * riseFt * alongRidgeFt;
    const riseText = form === "shed" ? `${fmt(spanFt)} ft` : `${fmt(spanFt)} ft ÷ 2`;
    return {
      isKnown: true,
      riseFt,
      volumeCuFt: volumeCuFt2,
      explanation: `${form} roof: rise ${riseText} × ${fmt(section.pitchIn12)}/12 = ${fmt(riseFt)} ft; volume ½ × ${fmt(spanFt)} × ${fmt(riseFt)} × ${fmt(alongRidgeFt)} = ${fmt(volumeCuFt2)} cu ft`
    };
  }
  let meanHeightFt = riseFt / 2;
  if (form === "hip") {
    const alongRidgeFt = Math.max(areaSqFt / spanFt, spanFt);
    meanHeightFt = riseFt * (3 * alongRidgeFt - spanFt) / (6 * alongRidgeFt);
  }
  const volumeCuFt = areaSqFt * meanHeightFt;
  return {
    isKnown: true,
    riseFt,
    volumeCuFt,
    explanation: `${form} roof over ${fmt(areaSqFt)} sq ft, span ${fmt(spanFt)} ft at ${fmt(section.pitchIn12)}/12: rise ${fmt(riseFt)} ft, mean height about ${fmt(meanHeightFt)} ft, volume about ${fmt(volumeCuFt)} cu ft`
  };
}

// shared/ventilation/balance.ts
function meetsRequiredArea(providedSqIn, requiredSqIn) {
  return providedSqIn >= requiredSqIn - Math.abs(requiredSqIn) * 1e-12;
}
function providedNfa(perVent) {
  let intake = 0;
  let exhaust = 0;
  let poweredCfm = 0;
  let wholeHouseFanCfm = 0;
  for (const v of perVent) {
    if (v.isWholeHouseFan) wholeHouseFanCfm += v.airflowCfm;
    else if (v.isPowered) poweredCfm += v.airflowCfm;
    else if (v.location === "lower") intake += v.exactNfaSqIn;
    else exhaust += v.exactNfaSqIn;
  }
  const intakeSqIn = roundTo(intake, 2);
  const exhaustSqIn = roundTo(exhaust, 2);
  const totalSqIn = roundTo(intake + exhaust, 2);
  return {
    intakeSqIn,
    exhaustSqIn,
    totalSqIn,
    exactIntakeSqIn: intake,
    exactExhaustSqIn: exhaust,
    exactTotalSqIn: intake + exhaust,
    intakeShare: totalSqIn > 0 ? intakeSqIn / totalSqIn : null,
    poweredCfm,
    wholeHouseFanCfm,
    perVent
  };
}

// shared/ventilation/fan-sizing.ts
var CFM_PER_SQ_FT = 0.7;
var DARK_OR_STEEP_MULTIPLIER = 1.15;
var AIR_CHANGES_PER_HOUR = 10;
var CFM_PER_SQ_FT_OF_INTAKE = 300;
var STEEP_PITCH_IN_12 = 7;
var FAN_UNDERSIZED_BELOW = 0.75;
var FAN_OVERSIZED_ABOVE = 1.5;
function roundedUp(exact, rounded, unit) {
  return Math.abs(exact - rounded) > 1e-6 ? `, rounded up to ${formatNumber(rounded)} ${unit}` : "";
}
function fanIntakeNeededSqIn(airflowCfm) {
  return ceilWhole(airflowCfm / CFM_PER_SQ_FT_OF_INTAKE * SQ_IN_PER_SQ_FT);
}
function recommendFanCfm(input) {
  const { floorAreaSqFt, volumeCuFt, isDark, isSteep } = input;
  const isDarkOrSteep = isDark || isSteep;
  const exactBaseCfm = floorAreaSqFt * CFM_PER_SQ_FT;
  const exactAreaCfm = isDarkOrSteep ? exactBaseCfm * DARK_OR_STEEP_MULTIPLIER : exactBaseCfm;
  const areaMethodCfm = ceilWhole(exactAreaCfm);
  const reasons = [];
  const why = [isDark ? "a dark roof" : "", isSteep ? `a pitch of ${STEEP_PITCH_IN_12}/12 or steeper` : ""].filter(Boolean).join(" and ");
  reasons.push(
    `Area method (Home Ventilating Institute guidance): ${formatNumber(floorAreaSqFt)} sq ft × 0.7 cfm per sq ft = ${formatNumber(exactBaseCfm)} cfm` + (isDarkOrSteep ? `; 15 % more for ${why}: ${formatNumber(exactBaseCfm)} × 1.15 = ${formatNumber(exactAreaCfm)} cfm` : "") + roundedUp(exactAreaCfm, areaMethodCfm, "cfm") + "."
  );
  let airChangeMethodCfm = null;
  if (volumeCuFt !== null) {
    const exactAchCfm = volumeCuFt * AIR_CHANGES_PER_HOUR / 60;
    airChangeMethodCfm = ceilWhole(exactAchCfm);
    reasons.push(
      `Air-change method (HVI: 10 air changes an hour): ${formatNumber(volumeCuFt)} cu ft × 10 ÷ 60 minutes = ${formatNumber(exactAchCfm)} cfm${roundedUp(exactAchCfm, airChangeMethodCfm, "cfm")}.`
    );
  } else {
    reasons.push(`Air-change method not worked out: ${input.volumeUnknownReason ?? "the attic volume is unknown"}.`);
  }
  const recommendedCfm = Math.max(areaMethodCfm, airChangeMethodCfm ?? 0);
  reasons.push(`Recommended: the larger figure, ${formatNumber(recommendedCfm)} cfm.`);
  return { areaMethodCfm, airChangeMethodCfm, recommendedCfm, isDarkOrSteep, reasons };
}

// shared/ventilation/vent-kinds.ts
var VENT_KINDS = [
  "ridge",
  "soffit-continuous",
  "soffit-individual",
  "drip-edge",
  "fascia",
  "box",
  "turbine",
  "off-ridge",
  "cupola",
  "gable-louver",
  "powered-roof",
  "powered-gable",
  "solar-powered",
  "whole-house-fan"
];
var POWERED_KINDS = /* @__PURE__ */ new Set(["powered-roof", "powered-gable", "solar-powered"]);
var EAVE_KINDS = /* @__PURE__ */ new Set([
  "soffit-continuous",
  "soffit-individual",
  "drip-edge",
  "fascia"
]);
var AT_RIDGE_KINDS = /* @__PURE__ */ new Set(["ridge", "off-ridge", "cupola"]);
var isPoweredKind = (kind) => POWERED_KINDS.has(kind);
var isWholeHouseFanKind = (kind) => kind === "whole-house-fan";
var isMechanicalKind = (kind) => isPoweredKind(kind) || isWholeHouseFanKind(kind);
var VENT_KIND_LABELS = {
  ridge: "ridge vent",
  "soffit-continuous": "continuous soffit vent",
  "soffit-individual": "individual soffit vent",
  "drip-edge": "drip-edge intake vent",
  fascia: "fascia vent",
  box: "box (static) vent",
  turbine: "turbine vent",
  "off-ridge": "off-ridge vent",
  cupola: "cupola",
  "gable-louver": "gable louver",
  "powered-roof": "powered roof fan",
  "powered-gable": "powered gable fan",
  "solar-powered": "solar-powered fan",
  "whole-house-fan": "whole-house fan"
};
function ventDisplayName(vent) {
  const label = vent.label?.trim();
  return label ? `the ${VENT_KIND_LABELS[vent.kind]} "${label}"` : `the ${VENT_KIND_LABELS[vent.kind]}`;
}
function ventListPhrase(vents) {
  const names = [...new Set(vents.map(ventDisplayName))];
  if (names.length <= 1) return names[0] ?? "";
  return `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
}

// shared/ventilation/requirement.ts
function codeBasisRule(codeBasis) {
  return codeBasis === "irc-2024" || codeBasis === "irc-2021" ? "irc-2018" : codeBasis;
}
var CODE_BASIS_NAMES = {
  "irc-2024": "IRC 2024, section R806.2 (the same rule as the 2018 and 2021 text: both conditions for 1/300)",
  "irc-2021": "IRC 2021, section R806.2 (the same rule as the 2018 text: both conditions for 1/300)",
  "irc-2018": "IRC 2018/2021/2024 text, section R806.2",
  "irc-2012": "IRC 2012/2015 text, section R806.2",
  "irc-2009": "IRC 2009, section R806.2",
  "strict-150": "strict 1/150 (no exceptions)"
};
function ratioArithmetic(floorAreaSqFt, ratio) {
  const sqFt = floorAreaSqFt / ratio;
  const exactSqIn = floorAreaSqFt * SQ_IN_PER_SQ_FT / ratio;
  const total = ceilWhole(exactSqIn);
  const rounded = Math.abs(total - exactSqIn) > 1e-6 ? `, rounded up to ${formatNumber(total)} sq in` : "";
  return `${formatNumber(floorAreaSqFt)} sq ft ÷ ${ratio} = ${formatNumber(sqFt, { maxFractionDigits: 3 })} sq ft = ${formatNumber(exactSqIn)} sq in${rounded}`;
}
function makeSplit(totalSqIn, exactSqIn, shareMin, shareMax, isCodeRule, basis) {
  const upperMinSqIn = Math.min(ceilWhole(exactSqIn * shareMin), totalSqIn);
  const upperMaxSqIn = Math.max(floorWhole(exactSqIn * shareMax), upperMinSqIn);
  return {
    isCodeRule,
    upperShareMin: shareMin,
    upperShareMax: shareMax,
    upperMinSqIn,
    upperMaxSqIn,
    lowerMinSqIn: Math.max(0, totalSqIn - upperMaxSqIn),
    lowerMaxSqIn: Math.max(0, totalSqIn - upperMinSqIn),
    basis
  };
}
var PRACTICE_SPLIT_BASIS = "The code sets no split for this ratio; Eavesight suggests 40–50 % in high vents and the rest, at least as much, at the eaves, so intake is never smaller than exhaust (common practice: BC Housing, HVI).";
function listVents(items) {
  return items.map((v) => `${ventDisplayName({ kind: v.nfa.kind, label: v.label })} (${formatNumber(v.nfa.nfaSqIn)} sq in)`).join(", ");
}
function checkPlacement(input, edition, required300SqIn, base) {
  const passive = input.vents.filter((v) => !v.nfa.isPowered && v.nfa.nfaSqIn > 0);
  const upper = passive.filter((v) => v.nfa.location === "upper");
  const lower = passive.filter((v) => v.nfa.location === "lower");
  const shareMin = edition === "2009" ? 0.5 : 0.4;
  const shareMax = edition === "2009" ? 0.8 : 0.5;
  const qualifying = [];
  const tooLow = [];
  const unknown = [];
  const assumedAtRidge = [];
  for (const v of upper) {
    if (v.position.isHeightImpossible) {
      unknown.push(v);
      continue;
    }
    if (edition === "2009") {
      const h = v.position.heightAboveEaveFt;
      if (h === null) unknown.push(v);
      else if (h >= 3) qualifying.push(v);
      else tooLow.push(v);
    } else {
      const d = v.position.dropBelowRidgeFt;
      if (d === null) unknown.push(v);
      else if (d <= 3) qualifying.push(v);
      else tooLow.push(v);
    }
    if (v.position.dropSource === "at-ridge-kind") assumedAtRidge.push(v);
  }
  const lowQualifying = lower.filter((v) => edition === "2018" ? v.position.isInBottomThird : v.position.isEaveVent);
  const lowOther = lower.filter((v) => !lowQualifying.includes(v));
  const sum = (items) => items.reduce((acc, v) => acc + v.nfa.exactNfaSqIn, 0);
  const upperQSqIn = sum(qualifying);
  const lowerQSqIn = sum(lowQualifying);
  const upperAllSqIn = sum(upper);
  const passiveSqIn = sum(passive);
  const upperNeedSqIn = required300SqIn * shareMin;
  const upperCountedSqIn = Math.min(upperQSqIn, required300SqIn * shareMax);
  const lowerNeedSqIn = Math.max(0, required300SqIn - upperCountedSqIn);
  const upperShareOfProvided = passiveSqIn > 0 ? upperAllSqIn / passiveSqIn : 0;
  const isUpperMet = upperQSqIn + 1e-9 >= upperNeedSqIn && upperQSqIn > 0;
  const isLowerMet = lowerQSqIn + 1e-9 >= lowerNeedSqIn && lowerQSqIn > 0;
  const upperCapSqIn = required300SqIn * shareMax;
  const isCapOfRequiredMet = passiveSqIn > 0 && upperAllSqIn <= upperCapSqIn * (1 + 1e-12);
  const isCapOfProvidedMet = passiveSqIn > 0 && upperShareOfProvided <= shareMax + 1e-12;
  const isCapMet = base === "required" ? isCapOfRequiredMet : isCapOfProvidedMet;
  const capOfRequiredText = `All the high vents together give ${formatNumber(upperAllSqIn)} sq in; the text allows at most ${formatPercent(shareMax)} of ${formatNumber(required300SqIn)} sq in = ${formatNumber(upperCapSqIn)} sq in of the required area: ${isCapOfRequiredMet ? "met" : "not met"}.`;
  const capOfProvidedText = passiveSqIn > 0 ? `High vents are ${formatPercent(upperShareOfProvided)} of all the passive vent area (${formatNumber(upperAllSqIn)} of ${formatNumber(passiveSqIn)} sq in); at most ${formatPercent(shareMax)} is allowed: ${isCapOfProvidedMet ? "met" : "not met"}.` : "There is no passive vent area at all: not met.";
  const upperRule = edition === "2009" ? "at least 3 ft above the eave vents" : "no more than 3 ft below the ridge";
  const lowerRule = edition === "2018" ? "in the bottom third of the attic" : "in eave or cornice vents";
  const parts = [];
  parts.push(
    `Upper vents ${upperRule} give ${formatNumber(upperQSqIn)} sq in; the rule needs ${formatPercent(shareMin)} of ${formatNumber(required300SqIn)} sq in = ${formatNumber(upperNeedSqIn)} sq in or more: ${isUpperMet ? "met" : "not met"}.`
  );
  parts.push(
    `Low vents ${lowerRule} give ${formatNumber(lowerQSqIn)} sq in; the balance needed is ${formatNumber(required300SqIn)} − ${formatNumber(upperCountedSqIn)} = ${formatNumber(lowerNeedSqIn)} sq in or more: ${isLowerMet ? "met" : "not met"}.`
  );
  parts.push(base === "required" ? capOfRequiredText : capOfProvidedText);
  if (assumedAtRidge.length > 0) {
    parts.push(`Taken as sitting at the ridge because of their kind (no drop was recorded): ${listVents(assumedAtRidge)}.`);
  }
  if (tooLow.length > 0) parts.push(`Too low to count as upper vents: ${listVents(tooLow)}.`);
  if (unknown.length > 0) {
    parts.push(
      edition === "2009" ? `Height above the eave vents unknown or impossible (record the roof pitch and span, or the vent's height above the eaves): ${listVents(unknown)}; they are taken as not meeting the rule and not counted.` : `Drop below the highest point unknown or impossible (record it, or the roof pitch and span with the vent's height above the eaves): ${listVents(unknown)}; they are taken as not meeting the rule and not counted.`
    );
  }
  if (lowOther.length > 0) {
    parts.push(
      edition === "2018" ? `Low vents not known to be in the bottom third are not counted toward the balance: ${listVents(lowOther)}.` : `Low vents that are not eave or cornice vents are not counted toward the balance: ${listVents(lowOther)}.`
    );
  }
  const otherCapMet = base === "required" ? isCapOfProvidedMet : isCapOfRequiredMet;
  return {
    isMet: isUpperMet && isLowerMet && isCapMet,
    otherIsMet: isUpperMet && isLowerMet && otherCapMet,
    otherReason: base === "required" ? capOfProvidedText : capOfRequiredText,
    reason: parts.join(" "),
    qualifyingUpperVentIds: qualifying.map((v) => v.nfa.ventId),
    tooLowUpperVentIds: tooLow.map((v) => v.nfa.ventId),
    unknownPositionVentIds: unknown.map((v) => v.nfa.ventId)
  };
}
var isClassIorII = (retarder) => retarder === "class-I" || retarder === "class-II";
function retarderName(retarder) {
  return retarder === "none" ? "no ceiling vapor retarder" : `a ${retarder.replace("class-", "Class ")} vapor retarder`;
}
function requiredNfa(input) {
  const { floorAreaSqFt, codeBasis, climateZone, ceilingVaporRetarder } = input;
  const rule = codeBasisRule(codeBasis);
  const upperShareBase = input.upperShareBase ?? "required";
  let otherIsMet = false;
  const exact300 = floorAreaSqFt * SQ_IN_PER_SQ_FT / 300;
  const reasons = [
    `Code basis: ${CODE_BASIS_NAMES[codeBasis]}. The base rule is net free area of at least 1/150 of the attic floor: ${ratioArithmetic(floorAreaSqFt, 150)}.`
  ];
  const conditions = [];
  let connector = null;
  let isMet = false;
  let placement = null;
  let splitByPlacement = null;
  const inColdZone = climateZone >= 6;
  const hasRetarder = isClassIorII(ceilingVaporRetarder);
  if (rule === "irc-2009") {
    connector = "either";
    placement = checkPlacement(input, "2009", exact300, upperShareBase);
    conditions.push({
      id: "vent-placement",
      status: placement.isMet ? "met" : "not-met",
      reason: `Alternative 1 (50–80 % of the area in upper vents at least 3 ft above the eave vents, the rest at the eaves): ${placement.reason}`
    });
    conditions.push({
      id: "vapor-retarder",
      status: hasRetarder ? "met" : "not-met",
      reason: `Alternative 2 (a Class I or II vapor retarder on the warm-in-winter side of the ceiling, any climate zone): the survey records ${retarderName(ceilingVaporRetarder)}: ${hasRetarder ? "met" : "not met"}.`
    });
    isMet = placement.isMet || hasRetarder;
    otherIsMet = placement.otherIsMet || hasRetarder;
    if (placement.isMet) splitByPlacement = { min: 0.5, max: 0.8 };
    reasons.push("IRC 2009 allows 1/300 when either of two alternatives is met.");
  } else if (rule === "irc-2012" || rule === "irc-2018") {
    const edition = rule === "irc-2012" ? "2012" : "2018";
    connector = edition === "2012" ? "one-or-more" : "both";
    let retarderCondition;
    if (!inColdZone) {
      retarderCondition = {
        id: "vapor-retarder",
        status: "not-applicable",
        reason: edition === "2012" ? `Condition 1 (Class I or II ceiling vapor retarder) applies only in climate zones 6–8; this house is in zone ${climateZone}, so this route is not available.` : `Condition 1 (Class I or II ceiling vapor retarder) applies only in climate zones 6–8; this house is in zone ${climateZone}, so it does not apply and only the vent placement counts (the usual reading; confirm with the building department).`
      };
    } else {
      retarderCondition = {
        id: "vapor-retarder",
        status: hasRetarder ? "met" : "not-met",
        reason: `Condition 1: in climate zone ${climateZone} a Class I or II vapor retarder on the warm-in-winter side of the ceiling is needed; the survey records ${retarderName(ceilingVaporRetarder)}: ${hasRetarder ? "met" : "not met"}.`
      };
    }
    placement = checkPlacement(input, edition, exact300, upperShareBase);
    const placementCondition = {
      id: "vent-placement",
      status: placement.isMet ? "met" : "not-met",
      reason: `Condition 2 (40–50 % of the area in upper vents no more than 3 ft below the ridge, the balance ${edition === "2018" ? "in the bottom third of the attic" : "in eave or cornice vents"}): ${placement.reason}`
    };
    conditions.push(retarderCondition, placementCondition);
    if (edition === "2012") {
      isMet = retarderCondition.status === "met" || placement.isMet;
      otherIsMet = retarderCondition.status === "met" || placement.otherIsMet;
      reasons.push("The 2012/2015 text allows 1/300 when one or more of two conditions is met.");
    } else {
      isMet = retarderCondition.status !== "not-met" && placement.isMet;
      otherIsMet = retarderCondition.status !== "not-met" && placement.otherIsMet;
      reasons.push("The 2018/2021/2024 text allows 1/300 only when both conditions are met.");
    }
    if (placement.isMet) splitByPlacement = { min: 0.4, max: 0.5 };
  } else {
    reasons.push("This project uses 1/150 with no exceptions.");
  }
  for (const condition of conditions) reasons.push(condition.reason);
  const ratio = isMet ? 300 : 150;
  const exactSqIn = floorAreaSqFt * SQ_IN_PER_SQ_FT / ratio;
  const totalSqIn = ceilWhole(exactSqIn);
  if (codeBasis !== "strict-150") {
    reasons.push(
      isMet ? `The 1/300 exception is met, so the required area is ${ratioArithmetic(floorAreaSqFt, 300)}.` : `The 1/300 exception is not met, so 1/150 applies: ${ratioArithmetic(floorAreaSqFt, 150)}.`
    );
  } else {
    reasons.push(`Required: ${ratioArithmetic(floorAreaSqFt, 150)}.`);
  }
  const split = ratio === 300 && splitByPlacement ? makeSplit(
    totalSqIn,
    exactSqIn,
    splitByPlacement.min,
    splitByPlacement.max,
    true,
    `Set by the 1/300 vent-placement rule: ${formatNumber(splitByPlacement.min * 100)}–${formatNumber(splitByPlacement.max * 100)} % in upper vents, the balance low.`
  ) : makeSplit(totalSqIn, exactSqIn, 0.4, 0.5, false, PRACTICE_SPLIT_BASIS);
  reasons.push(
    `Split: ${formatNumber(split.upperMinSqIn)}–${formatNumber(split.upperMaxSqIn)} sq in high, ${formatNumber(split.lowerMinSqIn)}–${formatNumber(split.lowerMaxSqIn)} sq in low. ${split.basis}`
  );
  return {
    codeBasis,
    ratio,
    exactSqIn,
    totalSqIn,
    totalSqFt: floorAreaSqFt / ratio,
    split,
    exception: { isAvailable: codeBasis !== "strict-150", isMet, connector, conditions },
    qualifyingUpperVentIds: placement?.qualifyingUpperVentIds ?? [],
    tooLowUpperVentIds: placement?.tooLowUpperVentIds ?? [],
    unknownPositionVentIds: placement?.unknownPositionVentIds ?? [],
    upperShareBase,
    otherReading: placement !== null && otherIsMet !== isMet ? { upperShareBase: upperShareBase === "required" ? "provided" : "required", wouldBeMet: otherIsMet, reason: placement.otherReason } : null,
    reasons
  };
}
function unventedRequirement(codeBasis) {
  return {
    codeBasis,
    ratio: 150,
    exactSqIn: 0,
    totalSqIn: 0,
    totalSqFt: 0,
    split: { isCodeRule: false, upperShareMin: 0, upperShareMax: 0, upperMinSqIn: 0, upperMaxSqIn: 0, lowerMinSqIn: 0, lowerMaxSqIn: 0, basis: "An unvented attic has no vents, so there is no split." },
    exception: { isAvailable: false, isMet: false, connector: null, conditions: [] },
    qualifyingUpperVentIds: [],
    tooLowUpperVentIds: [],
    unknownPositionVentIds: [],
    upperShareBase: "required",
    otherReading: null,
    reasons: [
      "This is an unvented (sealed) attic: IRC R806.5 lets an attic go without vents when the insulation is at the roof line and its conditions are met, so no net free area is required and none should be added."
    ]
  };
}

// shared/ventilation/whole-house-fan.ts
var WHOLE_HOUSE_FAN_CFM_PER_SQ_FT_OF_OUTLET = 750;
var WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT = 500;
function wholeHouseFanOutletSqIn(airflowCfm, cfmPerSqFt = WHOLE_HOUSE_FAN_CFM_PER_SQ_FT_OF_OUTLET) {
  return airflowCfm / cfmPerSqFt * SQ_IN_PER_SQ_FT;
}
function wholeHouseFanFindings(input) {
  const { wholeHouseFanCfm: cfm, fanIds } = input;
  if (cfm <= 0) return [];
  const findings = [];
  const neededSqIn = wholeHouseFanOutletSqIn(cfm);
  const recommendedSqIn = wholeHouseFanOutletSqIn(cfm, WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT);
  const arithmetic = `${formatNumber(cfm)} cfm ÷ 750 = ${formatNumber(cfm / 750, { maxFractionDigits: 3 })} sq ft = ${formatNumber(neededSqIn)} sq in`;
  if (input.atticNfaSqIn < neededSqIn) {
    findings.push({
      code: "whole-house-fan-outlet-short",
      severity: "warning",
      title: "Not enough attic vent area for the whole-house fan",
      detail: `A whole-house fan blows house air into the attic, and the attic's vents — every one, the ridge vent included — must let it out: at least 1 sq ft of net free area per 750 cfm (California Energy Code §150.1(c)12(B)), ${arithmetic}; the attic has ${formatNumber(input.atticNfaSqIn)} sq in. Without it the fan pushes hot attic air back into the house and moves less air. Add attic vent area (keep every vent open), or follow the fan maker's figure if it asks for more.`,
      ventIds: fanIds
    });
  }
  findings.push({
    code: "whole-house-fan-operation",
    severity: input.hasAtmosphericAppliance === true ? "critical" : "info",
    title: "Whole-house fan: windows open whenever it runs",
    detail: `This whole-house fan (${formatNumber(cfm)} cfm) cools by pulling outdoor air in through open windows and pushing it out through the attic vents, so keep the attic vents open — never close a ridge or other vent for it. Run it only with windows open: with them shut it pulls air down chimneys and flues.` + (input.hasAtmosphericAppliance === true ? " This house has a natural-draft gas or oil appliance, so that can pull exhaust (carbon monoxide) into the house. " + COMBUSTION_SAFETY_CAUTION : "") + ` Fan makers commonly ask for 1 sq ft of attic vent per 500 cfm, ${formatNumber(recommendedSqIn)} sq in here (a recommendation above the code figure).` + (input.climateZone >= 4 ? " In the heating season cover or seal its ceiling shutter, which otherwise leaks warm, moist house air into the attic (common practice)." : ""),
    ventIds: fanIds,
    caution: COMBUSTION_SAFETY_CAUTION
  });
  return findings;
}

// shared/ventilation/findings.ts
var SEVERITY_ORDER = { critical: 0, warning: 1, info: 2 };
function sortFindings(findings) {
  return findings.map((finding, index) => ({ finding, index })).sort((a, b) => SEVERITY_ORDER[a.finding.severity] - SEVERITY_ORDER[b.finding.severity] || a.index - b.index).map(({ finding }) => finding);
}
var PASSIVE_EXHAUST_KINDS = /* @__PURE__ */ new Set(["ridge", "box", "turbine", "off-ridge", "cupola", "gable-louver"]);
var kindLabel = (kind) => VENT_KIND_LABELS[kind];
var plural = (n, one, many) => n === 1 ? one : many;
var capitalize = (text) => text.charAt(0).toUpperCase() + text.slice(1);
function ventilationFindings(ctx) {
  const findings = [];
  const { provided, requirement, site } = ctx;
  const passive = ctx.perVent.filter((v) => !v.isPowered && !v.isWholeHouseFan);
  const powered = ctx.perVent.filter((v) => v.isPowered);
  const passiveUpper = passive.filter((v) => v.location === "upper" && v.nfaSqIn > 0);
  const passiveLower = passive.filter((v) => v.location === "lower" && v.nfaSqIn > 0);
  const ids = (items) => items.map((v) => v.ventId);
  const meetsArea = meetsRequiredArea(provided.exactTotalSqIn, requirement.exactSqIn);
  if (!meetsArea) {
    const shortSqIn = requirement.exactSqIn - provided.exactTotalSqIn;
    findings.push({
      code: "below-minimum",
      severity: "critical",
      title: "Less vent area than the code minimum",
      detail: `The attic has ${formatNumber(provided.exactTotalSqIn)} sq in of net free vent area; at 1/${requirement.ratio} it needs ${formatNumber(requirement.exactSqIn)} sq in, ${formatNumber(shortSqIn, { maxFractionDigits: shortSqIn < 1 ? 3 : 2 })} sq in short. Add vent area — intake at the eaves first, then exhaust high on the roof — keeping intake at least equal to exhaust.`,
      ventIds: ids(passive),
      caution: ROOF_SAFETY_CAUTION
    });
  } else if (provided.exactTotalSqIn < requirement.totalSqIn) {
    findings.push({
      code: "meets-minimum-narrowly",
      severity: "info",
      title: "Meets the minimum by less than 1 sq in",
      detail: `The ${formatNumber(provided.exactTotalSqIn)} sq in provided is not less than the exact ${formatNumber(requirement.exactSqIn)} sq in the code asks for at 1/${requirement.ratio}, so it meets the minimum. Figures shown and bought are rounded up to ${formatNumber(requirement.totalSqIn)} sq in; any vent that closes up (paint, insulation, a nest) would put this attic below the minimum.`,
      ventIds: []
    });
  }
  if (passiveLower.length === 0) {
    findings.push({
      code: "no-intake",
      severity: "critical",
      title: "No intake vents",
      detail: "Nothing lets outside air in low at the eaves, so any exhaust vent or fan draws its air from the house or from other high vents. Add soffit or other eave intake, with baffles so insulation can't block it.",
      ventIds: ids([...passiveUpper, ...powered]),
      caution: ATTIC_SAFETY_CAUTION
    });
  }
  if (passiveUpper.length === 0 && powered.length === 0) {
    findings.push({
      code: "no-exhaust",
      severity: "critical",
      title: "No exhaust vents",
      detail: "Nothing lets warm, moist attic air out high on the roof. Add one kind of exhaust near the ridge — a ridge vent is usual — sized with the intake.",
      ventIds: ids(passiveLower),
      caution: ROOF_SAFETY_CAUTION
    });
  }
  if (provided.exhaustSqIn > provided.intakeSqIn && passiveLower.length > 0) {
    findings.push({
      code: "exhaust-exceeds-intake",
      severity: "warning",
      title: "More exhaust than intake",
      detail: `Exhaust vents give ${formatNumber(provided.exhaustSqIn)} sq in but intake only ${formatNumber(provided.intakeSqIn)} sq in. With more exhaust than intake the attic pulls air from the house through ceiling leaks. Add intake at the eaves (or reduce exhaust) until intake is at least equal to exhaust.`,
      ventIds: ids(passiveUpper)
    });
  }
  const highOpenings = passive.filter((v) => v.location === "upper" && PASSIVE_EXHAUST_KINDS.has(v.kind));
  if (powered.length > 0 && highOpenings.length > 0) {
    findings.push({
      code: "powered-with-passive-exhaust",
      severity: "critical",
      title: "Powered fan short-circuits through other high vents",
      detail: `A fan pulls air from the nearest, easiest opening. With ${ventListPhrase(highOpenings)} in the same attic, it draws outside air in through them instead of through the soffits, so the attic floor and roof deck are not swept. Either remove the fan and rely on passive vents, or close off the other high vents so the fan draws from the eaves.`,
      ventIds: [...ids(powered), ...ids(highOpenings)],
      caution: ROOF_SAFETY_CAUTION
    });
  }
  const exhaustKinds = new Set(passiveUpper.map((v) => v.kind));
  const hasRidge = exhaustKinds.has("ridge");
  const gables = passive.filter((v) => v.kind === "gable-louver" && v.nfaSqIn > 0);
  const isGableWithRidge = hasRidge && gables.length > 0;
  if (isGableWithRidge) {
    const ridges = passiveUpper.filter((v) => v.kind === "ridge");
    findings.push({
      code: "gable-with-ridge",
      severity: "warning",
      title: "Gable louvers together with a ridge vent",
      detail: "The ridge vent draws air in through the gable louvers, close by and high up, instead of from the soffits, leaving most of the roof deck unvented. Close off the gable louvers from the inside when a ridge vent serves the attic (common practice).",
      ventIds: [...ids(ridges), ...ids(gables)]
    });
  }
  const mixKinds = [...exhaustKinds].filter((k) => !(isGableWithRidge && k === "gable-louver"));
  if (mixKinds.length >= 2) {
    const mixed = passiveUpper.filter((v) => mixKinds.includes(v.kind));
    findings.push({
      code: "mixed-exhaust",
      severity: "warning",
      title: "More than one kind of exhaust vent",
      detail: `This attic has ${mixKinds.map(kindLabel).join(", ")}. Different exhaust vents can feed each other — one draws outside air in through the other — so air bypasses the soffit-to-ridge path. Use one kind of exhaust per attic space (common practice; manufacturers' instructions usually say the same) and close off the rest.`,
      ventIds: ids(mixed),
      caution: ROOF_SAFETY_CAUTION
    });
  }
  if (ctx.fan && powered.length > 0) {
    const fan = ctx.fan;
    if (fan.intakeProvidedSqIn < fan.intakeNeededSqIn) {
      findings.push({
        code: "fan-intake-short",
        severity: "warning",
        title: "Not enough intake for the fan",
        detail: `The fan${plural(powered.length, "", "s")} move${plural(powered.length, "s", "")} ${formatNumber(fan.installedCfm)} cfm and need${plural(powered.length, "s", "")} 1 sq ft of intake per 300 cfm: ${formatNumber(fan.installedCfm)} ÷ 300 × 144 = ${formatNumber(fan.intakeNeededSqIn)} sq in; the eaves give ${formatNumber(fan.intakeProvidedSqIn)} sq in. A starved fan pulls conditioned air out of the house. Add intake vents or use a smaller fan.`,
        ventIds: ids(powered)
      });
    }
    if (fan.installedCfm < fan.recommendedCfm * FAN_UNDERSIZED_BELOW) {
      findings.push({
        code: "fan-undersized",
        severity: "warning",
        title: "Fan far smaller than recommended",
        detail: `Installed ${formatNumber(fan.installedCfm)} cfm is ${formatPercent(fan.installedCfm / fan.recommendedCfm)} of the recommended ${formatNumber(fan.recommendedCfm)} cfm. Consider passive ventilation instead, or a fan sized to the recommendation with intake to match.`,
        ventIds: ids(powered)
      });
    } else if (fan.installedCfm > fan.recommendedCfm * FAN_OVERSIZED_ABOVE) {
      findings.push({
        code: "fan-oversized",
        severity: "warning",
        title: "Fan far larger than recommended",
        detail: `Installed ${formatNumber(fan.installedCfm)} cfm is ${formatPercent(fan.installedCfm / fan.recommendedCfm)} of the recommended ${formatNumber(fan.recommendedCfm)} cfm. An oversized fan is more likely to pull conditioned air and combustion gases out of the house; use a smaller fan or passive vents.`,
        ventIds: ids(powered)
      });
    }
    if (site.atmosphericCombustionAppliance === true) {
      findings.push({
        code: "backdraft-risk",
        severity: "critical",
        title: "Risk of backdrafting a gas appliance",
        detail: "This house has a natural-draft (atmospheric) combustion appliance and a powered attic fan. " + COMBUSTION_SAFETY_CAUTION + " Until a combustion safety test has passed, consider switching the fan off; passive ventilation avoids the risk.",
        ventIds: ids(powered),
        caution: COMBUSTION_SAFETY_CAUTION
      });
    } else {
      findings.push({
        code: "powered-fan-depressurization",
        severity: "info",
        title: "Powered fans can depressurize the house",
        detail: (site.atmosphericCombustionAppliance === false ? "No atmospheric combustion appliance was recorded, but " : "Check whether the house has a natural-draft gas water heater, furnace or boiler: ") + COMBUSTION_SAFETY_CAUTION + (site.ceilingAirSealed === true ? "" : " Air-sealing the ceiling first reduces how much house air the fan can pull."),
        ventIds: ids(powered),
        caution: COMBUSTION_SAFETY_CAUTION
      });
    }
    const gableFans = ctx.vents.filter(
      (v) => (v.kind === "powered-gable" || v.mounting === "gable") && (v.sealedToOpening === false || v.sealedToOpening === void 0 && site.gableFanSealed === false)
    );
    if (gableFans.length > 0) {
      findings.push({
        code: "gable-fan-unsealed",
        severity: "warning",
        title: "Gable fan not sealed to its opening",
        detail: "Gaps around a gable fan let it blow air in a circle, from the fan back into the attic, instead of out. Seal the fan to the louver opening with a shroud or a plywood baffle.",
        ventIds: gableFans.map((v) => v.id),
        caution: FAN_SAFETY_CAUTION
      });
    }
  }
  if (requirement.exception.isAvailable && requirement.ratio === 150 && !meetsArea) {
    const wouldPass = meetsRequiredArea(provided.exactTotalSqIn, ctx.required300SqIn);
    const failed = requirement.exception.conditions.filter((c) => c.status === "not-met").map((c) => c.reason);
    findings.push({
      code: "exception-not-met",
      severity: wouldPass ? "warning" : "info",
      title: "The 1/300 exception does not apply",
      detail: (wouldPass ? `The ${formatNumber(provided.totalSqIn)} sq in provided would meet 1/300 (${formatNumber(ctx.required300SqIn)} sq in), but the exception's conditions are not met, so 1/150 applies. ` : "Even the 1/300 route would need more vent area than is provided. ") + `What falls short: ${failed.join(" ")} To use 1/300, place 40–50 % of the vent area (50–80 % under IRC 2009) high near the ridge and the balance at the eaves, or meet the vapor-retarder condition where it applies.`,
      ventIds: []
    });
  }
  if (requirement.otherReading !== null) {
    const other = requirement.otherReading;
    const chosenIsLiteral = requirement.upperShareBase === "required";
    findings.push({
      code: "upper-share-reading",
      severity: "info",
      title: chosenIsLiteral ? "Another reading of the 40–50 % rule" : "This company reads the 40–50 % rule locally",
      detail: chosenIsLiteral ? `The code text takes the upper-vent share as a percentage of the required area, and that is what Eavesight checks. Your building department may read it as a share of the vent area provided; under that reading the 1/300 route ${other.wouldBeMet ? "would be met" : "would not be met"}. ${other.reason} Ask the building department which reading it uses.` : `This company's setting takes the upper-vent share as a percentage of the vent area provided. Under the literal text (a percentage of the required area) the 1/300 route ${other.wouldBeMet ? "would be met" : "would not be met"}. ${other.reason}`,
      ventIds: []
    });
  }
  for (const { vent, riseFt } of ctx.impossibleHeights ?? []) {
    const recorded = vent.heightAboveEaveFt !== void 0 && vent.heightAboveEaveFt > riseFt ? `recorded ${formatNumber(vent.heightAboveEaveFt)} ft above the eaves` : `recorded ${formatNumber(vent.dropBelowRidgeFt ?? 0)} ft below the ridge`;
    findings.push({
      code: "vent-height-impossible",
      severity: "warning",
      title: "A vent's recorded height can't be right",
      detail: `${capitalize(ventListPhrase([vent]))} is ${recorded}, but the highest point of this space is only ${formatNumber(riseFt)} ft above the eaves (from the roof pitch and span). Check the measurement or the pitch; until then the vent is not counted as an upper vent for the 1/300 route.`,
      ventIds: [vent.id]
    });
  }
  if (requirement.tooLowUpperVentIds.length > 0) {
    const isIrc2009 = codeBasisRule(requirement.codeBasis) === "irc-2009";
    findings.push({
      code: "upper-vent-too-low",
      severity: requirement.exception.isMet ? "info" : "warning",
      title: "Upper vents too low to count as upper vents",
      detail: (isIrc2009 ? "Under IRC 2009 the upper vents for the 1/300 route must be at least 3 ft above the eave vents; these are lower." : "For the 1/300 route the upper vents must be no more than 3 ft below the ridge, measured vertically; these are lower.") + " They still count toward the 1/150 total. Move exhaust up near the ridge (a ridge vent or vents within 3 ft of it) if the 1/300 route is wanted.",
      ventIds: requirement.tooLowUpperVentIds
    });
  }
  if (requirement.unknownPositionVentIds.length > 0 && !requirement.exception.isMet) {
    findings.push({
      code: "upper-vent-position-unknown",
      severity: "info",
      title: "Upper vent position not recorded",
      detail: "Eavesight can't tell whether these vents are high enough for the 1/300 route. Record each vent's drop below the ridge (or the roof pitch and span with the vent's height above the eaves).",
      ventIds: requirement.unknownPositionVentIds
    });
  }
  const eaveVents = passiveLower.filter((v) => EAVE_KINDS.has(v.kind));
  if (site.soffitsBlocked === true) {
    findings.push({
      code: "soffits-blocked",
      severity: "critical",
      title: "Insulation blocks the soffit vents",
      detail: "IRC R806.3 requires that insulation not block the free flow of air at eave vents, with at least a 1 in air space between insulation and roof sheathing. Pull the insulation back and install baffles (vent chutes) in every rafter bay, reaching above the insulation; until then the soffit intake counts for little.",
      ventIds: ids(eaveVents),
      caution: ATTIC_SAFETY_CAUTION
    });
  }
  const blockedVents = passive.filter((v) => v.openShare < 1);
  if (blockedVents.length > 0) {
    const lostSqIn = blockedVents.reduce((acc, v) => acc + (v.fullNfaSqIn - v.nfaSqIn), 0);
    const parts = blockedVents.map((v) => `${capitalize(ventListPhrase([v]))}: ${v.explanation.split("; ").slice(-1)[0]}`);
    const byInsulation = ctx.vents.some((v) => blockedVents.some((b) => b.ventId === v.id) && v.blockedBy === "insulation");
    findings.push({
      code: "vents-blocked",
      severity: "warning",
      title: "Some vents are blocked",
      detail: `${parts.join(". ")}. Blocked openings pass no air, so ${formatNumber(lostSqIn)} sq in of vent area is not counted. ` + (byInsulation ? "Pull the insulation back from the vents and fit baffles so it can't slide back (IRC R806.3 asks for at least 1 in of air space at the eaves)." : "Clear them (paint can usually be cut out of the slots; replace a vent that can't be opened)."),
      ventIds: blockedVents.map((v) => v.ventId),
      caution: ATTIC_SAFETY_CAUTION
    });
  }
  const damaged = ctx.vents.filter((v) => v.condition === "damaged");
  if (damaged.length > 0) {
    findings.push({
      code: "vent-damaged",
      severity: "warning",
      title: "Damaged vents",
      detail: `${capitalize(ventListPhrase(damaged))} ${damaged.length === 1 ? "is" : "are"} damaged. A broken vent or torn screen lets rain, snow, birds and insects in; vent openings must keep them out (IRC R806.1: openings 1/16 to 1/4 in). Repair or replace ${damaged.length === 1 ? "it" : "them"}.`,
      ventIds: damaged.map((v) => v.id),
      caution: ROOF_SAFETY_CAUTION
    });
  }
  if (site.bafflesPresent === false && eaveVents.length > 0 && site.soffitsBlocked !== true) {
    findings.push({
      code: "baffles-missing",
      severity: "warning",
      title: "No baffles at the eaves",
      detail: "Without baffles, insulation tends to slide over the soffit vents. Install a baffle in every rafter bay at the eaves, keeping at least a 1 in air space to the sheathing (IRC R806.3) and reaching above the insulation.",
      ventIds: ids(eaveVents),
      caution: ATTIC_SAFETY_CAUTION
    });
  }
  if (site.bathFanIntoAttic === true) {
    findings.push({
      code: "bath-fan-into-attic",
      severity: "warning",
      title: "Bath fan exhausts into the attic",
      detail: "Moist bathroom air dumped into the attic condenses on the cold roof deck. Duct the fan to the outdoors through a roof or wall cap (not just toward a soffit vent), with insulated duct in cold climates. Wiring changes are for a licensed electrician.",
      ventIds: [],
      caution: ATTIC_SAFETY_CAUTION
    });
  }
  if (site.kitchenOrDryerIntoAttic === true) {
    findings.push({
      code: "appliance-exhaust-into-attic",
      severity: "warning",
      title: "Kitchen or dryer exhaust into the attic",
      detail: "Grease- or lint-laden moist air must go outdoors. Duct the exhaust through a proper roof or wall cap as the appliance instructions require.",
      ventIds: [],
      caution: ATTIC_SAFETY_CAUTION
    });
  }
  findings.push(
    ...wholeHouseFanFindings({
      wholeHouseFanCfm: provided.wholeHouseFanCfm,
      fanIds: ctx.perVent.filter((v) => v.isWholeHouseFan).map((v) => v.ventId),
      atticNfaSqIn: provided.exactTotalSqIn,
      hasAtmosphericAppliance: site.atmosphericCombustionAppliance,
      climateZone: ctx.climateZone ?? 4
    })
  );
  const oddLocation = passive.filter((v) => EAVE_KINDS.has(v.kind) && v.location === "upper" || (v.kind === "ridge" || v.kind === "off-ridge" || v.kind === "cupola" || v.kind === "turbine") && v.location === "lower");
  if (oddLocation.length > 0) {
    findings.push({
      code: "vent-location-unusual",
      severity: "info",
      title: "Check where these vents are",
      detail: "These vents are recorded in an unusual place for their kind (for example a soffit vent as an upper vent). Check the survey: intake and exhaust totals depend on it.",
      ventIds: ids(oddLocation)
    });
  }
  return findings;
}
var ASSEMBLY_NEUTRAL_CODES = /* @__PURE__ */ new Set(["bath-fan-into-attic", "appliance-exhaust-into-attic", "backdraft-risk", "powered-fan-depressurization", "whole-house-fan-operation"]);
function unventedFindings(ctx) {
  const check = ctx.unvented;
  const findings = [];
  findings.push({
    code: "unvented-assembly",
    severity: "info",
    title: "Sealed (unvented) attic: no vents needed",
    detail: "The insulation is at the roof line, so this attic is meant to be sealed, not vented (IRC R806.5). It needs no vent area, and vents must not be added: outdoor air let into it would reach the cool side of the insulation and can condense there.",
    ventIds: []
  });
  for (const condition of check?.conditions ?? []) {
    if (condition.status === "not-met") {
      findings.push({
        code: "unvented-condition-not-met",
        severity: "warning",
        title: "A sealed-attic condition is not met",
        detail: `${condition.reason} The fix is to the insulation or air barrier, not more vents: have the insulation contractor and the building department confirm it.`,
        ventIds: [],
        caution: ATTIC_SAFETY_CAUTION
      });
    } else if (condition.status === "unknown") {
      findings.push({ code: "unvented-condition-unknown", severity: "info", title: "A sealed-attic condition was not recorded", detail: `${condition.reason} Record it so the check can be completed.`, ventIds: [] });
    }
  }
  const openings = ctx.vents;
  if (openings.length > 0) {
    findings.push({
      code: "vents-in-unvented-attic",
      severity: "warning",
      title: "Vents or fans open a sealed attic to the outside",
      detail: `${capitalize(ventListPhrase(openings))} ${openings.length === 1 ? "opens" : "open"} this sealed attic to outdoor air, which works against the insulation at the roof line. Don't add more. Whether to close ${openings.length === 1 ? "it" : "them"} off is a decision for the insulation contractor and the building department; a fan here pulls conditioned air out of the house.`,
      ventIds: openings.map((v) => v.id),
      caution: ROOF_SAFETY_CAUTION
    });
  }
  const installedCfm = ctx.perVent.reduce((acc, v) => acc + (v.isPowered ? v.airflowCfm : 0), 0);
  const fan = ctx.fan ?? (installedCfm > 0 ? { installedCfm, recommendedCfm: installedCfm, intakeNeededSqIn: 0, intakeProvidedSqIn: 0 } : null);
  const neutral = ventilationFindings({ ...ctx, fan, unvented: null }).filter((f) => ASSEMBLY_NEUTRAL_CODES.has(f.code));
  return [...findings, ...neutral];
}

// shared/ventilation/rafter-bays.ts
var LINEAR_KINDS = /* @__PURE__ */ new Set(["soffit-continuous", "ridge", "drip-edge", "fascia"]);
function reach(vent, nfa, bayCount, baySpacingIn) {
  if (nfa.exactNfaSqIn <= 0) return { bays: 0, perBaySqIn: 0 };
  const quantity = vent.quantity ?? 1;
  if (LINEAR_KINDS.has(vent.kind) && vent.lengthFt !== void 0) {
    const bays2 = Math.min(bayCount, Math.floor(vent.lengthFt * 12 * quantity / baySpacingIn + 1e-9));
    const perFt = nfa.exactNfaSqIn / (vent.lengthFt * quantity);
    return { bays: bays2, perBaySqIn: perFt * (baySpacingIn / 12) };
  }
  const bays = Math.min(bayCount, quantity);
  return { bays, perBaySqIn: nfa.exactNfaSqIn / quantity };
}
function checkRafterBays(bays, floorAreaSqFt, ratio, vents) {
  const { bayCount, baySpacingIn } = bays;
  const bayAreaSqFt = floorAreaSqFt / bayCount;
  const requiredPerBaySqIn = bayAreaSqFt * SQ_IN_PER_SQ_FT / ratio;
  const intakePerBay = new Array(bayCount).fill(0);
  const exhaustPerBay = new Array(bayCount).fill(0);
  for (const { vent, nfa } of vents) {
    if (nfa.isPowered || nfa.isWholeHouseFan) continue;
    const r = reach(vent, nfa, bayCount, baySpacingIn);
    const target = vent.location === "lower" ? intakePerBay : exhaustPerBay;
    for (let i = 0; i < r.bays; i += 1) target[i] += r.perBaySqIn;
  }
  const baysWithIntake = intakePerBay.filter((v) => v > 0).length;
  const baysWithExhaust = exhaustPerBay.filter((v) => v > 0).length;
  const totals = intakePerBay.map((v, i) => v + exhaustPerBay[i]);
  const leastPerBaySqIn = Math.min(...totals);
  const isCrossVented = baysWithIntake === bayCount && baysWithExhaust === bayCount;
  const isMet = isCrossVented && leastPerBaySqIn >= requiredPerBaySqIn * (1 - 1e-12);
  const reasons = [
    `Enclosed rafter bays: ${formatNumber(bayCount)} bays at ${formatNumber(baySpacingIn)} in, each its own space (IRC R806.1): ${formatNumber(floorAreaSqFt)} sq ft ÷ ${formatNumber(bayCount)} = ${formatNumber(bayAreaSqFt)} sq ft a bay, needing ${formatNumber(bayAreaSqFt)} ÷ ${ratio} × 144 = ${formatNumber(requiredPerBaySqIn)} sq in.`,
    `${formatNumber(baysWithIntake)} of ${formatNumber(bayCount)} bays have intake and ${formatNumber(baysWithExhaust)} have exhaust; the least-vented bay gets ${formatNumber(leastPerBaySqIn)} sq in. A linear vent counts in the bays its length crosses; an individual vent serves one bay.`
  ];
  return { bayCount, baySpacingIn, bayAreaSqFt, requiredPerBaySqIn, baysWithIntake, baysWithExhaust, leastPerBaySqIn, isMet, reasons };
}

// shared/ventilation/recommendations.ts
var STEEP_EXTRA_FROM_PITCH_IN_12 = 7;
var VERY_STEEP_ABOVE_PITCH_IN_12 = 10;
function aboveMinimum(input) {
  const out = [];
  if (input.isUnvented) return out;
  const pitch = input.maxPitchIn12;
  if (pitch !== null && pitch >= STEEP_EXTRA_FROM_PITCH_IN_12 && input.requiredExactSqIn > 0) {
    const factor = pitch > VERY_STEEP_ABOVE_PITCH_IN_12 ? 1.3 : 1.2;
    const exact = input.requiredExactSqIn * factor;
    out.push({
      id: "steep-roof-extra-area",
      title: "More vent area for a steep roof (recommended, not code)",
      detail: `A ${formatNumber(pitch)}/12 roof holds a tall attic; roofing guides recommend ${formatNumber((factor - 1) * 100)} % more vent area than the code minimum: ${formatNumber(input.requiredExactSqIn)} × ${formatNumber(factor)} = ${formatNumber(exact)} sq in. This is common practice (JLC field guide), not a code requirement.`,
      recommendedSqIn: ceilWhole(exact),
      source: "Common practice: JLC Roof Ventilation Field Guide (recommended practice)",
      isCode: false
    });
  }
  if (input.requiredExactSqIn > 0) {
    out.push({
      id: "intake-above-exhaust",
      title: "A little more intake than exhaust (recommended, not code)",
      detail: "Put slightly more of the vent area low at the eaves than high on the roof, so the attic is never pulled below the house's pressure and drawing house air through ceiling leaks. Common practice (BC Housing, HVI), not a code requirement.",
      recommendedSqIn: null,
      source: "Common practice: BC Housing; Home Ventilating Institute",
      isCode: false
    });
  }
  if (input.ceilingAirSealed !== true) {
    out.push({
      id: "air-seal-ceiling",
      title: "Air-seal the ceiling (recommended, not code)",
      detail: "Most attic moisture comes up from the house through gaps at light fixtures, top plates and the hatch. Sealing them does more for a dry attic than extra vents. Common practice, not a code requirement.",
      recommendedSqIn: null,
      source: "Common practice: JLC Q&A on roof venting (citing W. B. Rose)",
      isCode: false
    });
  }
  if (input.wholeHouseFanCfm > 0) {
    const exact = wholeHouseFanOutletSqIn(input.wholeHouseFanCfm, WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT);
    out.push({
      id: "whole-house-fan-maker-area",
      title: "Whole-house fan: the makers' vent area (recommended)",
      detail: `Fan makers commonly ask for 1 sq ft of attic vent per 500 cfm: ${formatNumber(input.wholeHouseFanCfm)} ÷ 500 = ${formatNumber(input.wholeHouseFanCfm / 500, { maxFractionDigits: 3 })} sq ft = ${formatNumber(exact)} sq in, more than the energy code's 1 per 750 cfm. Follow the installation instructions of the fan.`,
      recommendedSqIn: ceilWhole(exact),
      source: "Manufacturers' installation instructions (common practice)",
      isCode: false
    });
  }
  return out;
}

// shared/ventilation/unvented.ts
function minCondensationControlR(climateZone, moistureRegime) {
  if (climateZone <= 3) return { rValue: 5, zoneText: `zone ${climateZone}${moistureRegime ?? ""}`, isAssumed: false };
  if (climateZone === 4) {
    if (moistureRegime === "C") return { rValue: 10, zoneText: "zone 4C (marine)", isAssumed: false };
    if (moistureRegime === "A" || moistureRegime === "B") return { rValue: 15, zoneText: `zone 4${moistureRegime}`, isAssumed: false };
    return { rValue: 15, zoneText: "zone 4 (moisture letter not recorded, so 4A/4B's higher figure is used)", isAssumed: true };
  }
  const byZone = { 5: 20, 6: 25, 7: 30, 8: 35 };
  return { rValue: byZone[climateZone] ?? 35, zoneText: `zone ${climateZone}${climateZone <= 6 ? moistureRegime ?? "" : ""}`, isAssumed: false };
}
function checkUnventedAssembly(assembly, climateZone, moistureRegime, ceilingVaporRetarder) {
  const conditions = [];
  conditions.push({
    id: "inside-envelope",
    status: assembly.isInsideThermalEnvelope === true ? "met" : assembly.isInsideThermalEnvelope === false ? "not-met" : "unknown",
    reason: assembly.isInsideThermalEnvelope === true ? "The attic is inside the building's thermal envelope (the insulation and air barrier follow the roof): met." : assembly.isInsideThermalEnvelope === false ? "The attic is not fully inside the thermal envelope (for example the attic floor is still insulated and open to a vented part): not met. The roof-line insulation and air barrier must enclose the whole space." : "Whether the attic is fully inside the thermal envelope was not recorded."
  });
  conditions.push({
    id: "no-class-i-retarder",
    status: ceilingVaporRetarder === "class-I" ? "not-met" : "met",
    reason: ceilingVaporRetarder === "class-I" ? "A Class I vapor retarder (polyethylene, foil) is recorded at the ceiling; an unvented attic must have none on the interior side, so moisture can dry inward: not met." : "No Class I vapor retarder at the ceiling: met."
  });
  const isShakes = assembly.roofCovering === "wood-shingles-or-shakes";
  conditions.push({
    id: "shingle-shake-gap",
    status: !isShakes ? assembly.roofCovering === void 0 ? "unknown" : "not-applicable" : assembly.hasVentedGapUnderShakes === true ? "met" : assembly.hasVentedGapUnderShakes === false ? "not-met" : "unknown",
    reason: !isShakes ? assembly.roofCovering === void 0 ? "The roof covering was not recorded (wood shingles or shakes need a 1/4 in vented air space under them)." : "The roof is not wood shingles or shakes, so the 1/4 in vented gap rule does not apply." : assembly.hasVentedGapUnderShakes === true ? "Wood shingles or shakes sit over a 1/4 in vented air space: met." : "Wood shingles or shakes need a 1/4 in vented air space between them and the roofing underlayment" + (assembly.hasVentedGapUnderShakes === false ? ": not met." : "; not recorded.")
  });
  const isCold = climateZone >= 5;
  const hasAirImpermeable = assembly.insulation !== "air-permeable-only";
  conditions.push({
    id: "class-ii-retarder",
    status: !isCold || !hasAirImpermeable ? "not-applicable" : assembly.foamIsClassII === true ? "met" : assembly.foamIsClassII === false ? "not-met" : "unknown",
    reason: !isCold || !hasAirImpermeable ? `In zone ${climateZone} the Class II vapor retarder rule for the air-impermeable insulation does not apply.` : assembly.foamIsClassII === true ? `In zone ${climateZone} the air-impermeable insulation is, or is covered by, a Class II vapor retarder: met.` : `In climate zones 5–8 the air-impermeable insulation must be a Class II vapor retarder (closed-cell foam usually is at normal thickness; open-cell foam needs a vapor-retarder coating)` + (assembly.foamIsClassII === false ? ": not met." : "; not recorded.")
  });
  const table = minCondensationControlR(climateZone, moistureRegime);
  let insulation;
  if (assembly.insulation === "air-permeable-only") {
    insulation = {
      id: "insulation",
      status: "not-met",
      reason: "Only air-permeable insulation (batts, blown fiberglass or cellulose) at the roof: that does not make an unvented assembly. It needs air-impermeable insulation (spray foam) against the deck or rigid board above it (the vapor-diffusion-port route for hot climates is not checked here)."
    };
  } else if (assembly.insulation === "air-impermeable-only") {
    insulation = { id: "insulation", status: "met", reason: "Air-impermeable insulation alone, in contact with the underside of the roof deck: met (no condensation-control minimum applies when nothing air-permeable is below it)." };
  } else {
    const what = assembly.insulation === "rigid-above-deck-and-air-permeable" ? "rigid board above the deck" : "air-impermeable insulation under the deck";
    const r = assembly.airImpermeableRValue;
    insulation = r === void 0 ? { id: "insulation", status: "unknown", reason: `With air-permeable insulation below it, the ${what} must reach R-${table.rValue} in ${table.zoneText} (Table R806.5); its R-value was not recorded.` } : {
      id: "insulation",
      status: r >= table.rValue ? "met" : "not-met",
      reason: `With air-permeable insulation below it, the ${what} must reach R-${table.rValue} in ${table.zoneText} (Table R806.5); it is R-${r}: ${r >= table.rValue ? "met" : "not met — condensation can form at the deck"}.`
    };
  }
  conditions.push(insulation);
  return { isMet: conditions.every((c) => c.status === "met" || c.status === "not-applicable"), conditions };
}

// shared/ventilation/schema.ts
import { z as z2 } from "zod";

// shared/diagnostics/schema.ts
import { z } from "zod";
var ThermostatTestSchema = z.object({
  /** Attic air temperature when tested (°F), for the record. */
  atticTempF: z.number().min(-40).max(180).optional(),
  /** Dial set below the attic temperature: the thermostat should call, about 120 V expected. */
  switchedLegVoltsDialBelow: z.number().min(0).max(300),
  /** Dial set above the attic temperature: the thermostat should not call, about 0 V expected. */
  switchedLegVoltsDialAbove: z.number().min(0).max(300)
});
var CapacitorReadingSchema = z.object({
  ratedMicrofarads: z.number().positive("The rating must be more than 0 µF.").max(1e3),
  measuredMicrofarads: z.number().min(0).max(2e3),
  /** The tolerance printed on the capacitor, ± %; ±6 % when not recorded. */
  tolerancePercent: z.number().positive().max(50).optional()
});
var FanDiagnosticsSchema = z.object({
  /** Power confirmed off at the breaker with a tester before hands-on checks. */
  isPowerVerifiedOff: z.boolean().optional(),
  /** The breaker was locked (or tagged) off so nobody can switch it back on during the checks. */
  isLockedOut: z.boolean().optional(),
  /** The tester was proven on a known live source before and after the dead test (live-dead-live). */
  isTesterProven: z.boolean().optional(),
  /** Motor winding resistance in ohms, or "open" when the meter shows OL / no continuity. */
  windingResistanceOhms: z.union([z.number().min(0).max(1e12), z.literal("open")]).optional(),
  /** Winding to the motor frame (ground), ohms, or "open" when the meter shows OL. */
  windingToGroundOhms: z.union([z.number().min(0).max(1e12), z.literal("open")]).optional(),
  /** Does the motor have a run capacitor? Most small attic fan motors are shaded-pole and have none. */
  hasCapacitor: z.boolean().optional(),
  capacitor: CapacitorReadingSchema.optional(),
  thermostatTest: ThermostatTestSchema.optional(),
  /** Dial turned below the attic temperature (or the override switch used): did the fan start? */
  overrideTest: z.enum(["runs", "does-not-run"]).optional(),
  /** Power off, the blade turned by hand: does it spin freely and coast? */
  isBladeFreeToSpin: z.boolean().optional()
});

// shared/ventilation/schema.ts
var CODE_BASES = ["irc-2024", "irc-2021", "irc-2018", "irc-2012", "irc-2009", "strict-150"];
var CodeBasisSchema = z2.enum(CODE_BASES);
var VaporRetarderSchema = z2.enum(["none", "class-I", "class-II", "class-III"]);
var RoofColorSchema = z2.enum(["light", "medium", "dark"]);
var RoofFormSchema = z2.enum(["gable", "hip", "shed"]);
var VentKindSchema = z2.enum(VENT_KINDS);
var UpperShareBaseSchema = z2.enum(["required", "provided"]);
var VentLocationSchema = z2.enum(["upper", "lower"]);
var MeshSizeSchema = z2.enum(["1/4", "1/8", "1/16"]);
var VentConditionSchema = z2.enum(["open", "partly-blocked", "blocked", "painted-over", "damaged"]);
var BlockedBySchema = z2.enum(["insulation", "paint", "debris", "nest", "other"]);
var LouverMaterialSchema = z2.enum(["wood", "metal"]);
var CoveringSchema = z2.object({ mesh: MeshSizeSchema, louvers: z2.boolean(), louverMaterial: LouverMaterialSchema.optional() });
var LIMITS = {
  maxSideFt: 1e3,
  maxCoordinateFt: 1e4,
  maxSectionAreaSqFt: 2e5,
  maxPolygonPoints: 200,
  maxSections: 40,
  maxVents: 150,
  /** Separately vented attic spaces in one project (main attic, garage, additions, porches). */
  maxSpacesPerProject: 8,
  maxPitchIn12: 24,
  maxQuantity: 1e3,
  maxNfaSqInPerUnit: 1e5,
  maxNfaSqInPerFt: 200,
  maxVentLengthFt: 2e3,
  maxGrossSideIn: 480,
  maxCfm: 5e4,
  maxHeightFt: 200
};
var id = z2.string().trim().min(1, "An id is required.").max(100);
var positive = (max, what) => z2.number({ error: `${what} must be a number.` }).positive(`${what} must be more than 0.`).max(max, `${what} must be at most ${max.toLocaleString("en-US")}.`);
var roofFields = {
  id: id.optional(),
  label: z2.string().max(200).optional(),
  roofForm: RoofFormSchema.optional(),
  pitchIn12: z2.number().min(0, "Pitch can't be negative.").max(LIMITS.maxPitchIn12, "Pitch must be at most 24/12.").optional(),
  /** Horizontal span across the slope; needed for the volume of an outline or entered area. */
  spanFt: positive(LIMITS.maxSideFt, "Span").optional()
};
var coordinate = z2.number().min(-LIMITS.maxCoordinateFt).max(LIMITS.maxCoordinateFt);
var RectSectionSchema = z2.object({
  kind: z2.literal("rect"),
  /** Along the ridge. */
  lengthFt: positive(LIMITS.maxSideFt, "Length"),
  /** Across the ridge, eave to eave: the span of a gable or shed. */
  widthFt: positive(LIMITS.maxSideFt, "Width"),
  ...roofFields
});
var PolygonSectionSchema = z2.object({
  kind: z2.literal("polygon"),
  pointsFt: z2.array(z2.tuple([coordinate, coordinate])).min(3, "An outline needs at least 3 corners.").max(LIMITS.maxPolygonPoints, `An outline has at most ${LIMITS.maxPolygonPoints} corners.`),
  ...roofFields
}).superRefine((section, ctx) => {
  const problem = polygonProblem(section.pointsFt);
  if (problem) {
    ctx.addIssue({ code: "custom", message: problem, path: ["pointsFt"] });
    return;
  }
  if (shoelaceAreaSqFt(section.pointsFt) > LIMITS.maxSectionAreaSqFt) {
    ctx.addIssue({ code: "custom", message: `One section can be at most ${LIMITS.maxSectionAreaSqFt.toLocaleString("en-US")} sq ft.`, path: ["pointsFt"] });
  }
});
var AreaSectionSchema = z2.object({
  kind: z2.literal("area"),
  areaSqFt: positive(LIMITS.maxSectionAreaSqFt, "Area"),
  ...roofFields
});
var SectionSchema = z2.discriminatedUnion("kind", [RectSectionSchema, PolygonSectionSchema, AreaSectionSchema]);
var VentSchema = z2.object({
  id,
  kind: VentKindSchema,
  /** upper = exhaust (high on the roof), lower = intake (eaves, soffits). */
  location: VentLocationSchema,
  label: z2.string().max(200).optional(),
  /** Which section this vent serves; used for that section's rise. */
  sectionId: id.optional(),
  /** Vertical drop from the ridge (or highest point) to the vent, ft. */
  dropBelowRidgeFt: z2.number().min(0).max(LIMITS.maxHeightFt).optional(),
  /** Vertical height of the vent above the eave vents, ft, when measured directly. */
  heightAboveEaveFt: z2.number().min(0).max(LIMITS.maxHeightFt).optional(),
  quantity: z2.number().int("Quantity must be a whole number.").min(1, "Quantity must be at least 1.").max(LIMITS.maxQuantity).optional(),
  /** Manufacturer-rated NFA of one unit; wins over any computed figure. */
  nfaSqIn: positive(LIMITS.maxNfaSqInPerUnit, "Rated NFA").optional(),
  nfaSqInPerUnit: positive(LIMITS.maxNfaSqInPerUnit, "NFA per unit").optional(),
  lengthFt: positive(LIMITS.maxVentLengthFt, "Vent length").optional(),
  nfaSqInPerFt: positive(LIMITS.maxNfaSqInPerFt, "NFA per foot").optional(),
  grossWidthIn: positive(LIMITS.maxGrossSideIn, "Gross width").optional(),
  grossHeightIn: positive(LIMITS.maxGrossSideIn, "Gross height").optional(),
  covering: CoveringSchema.optional(),
  /** Rated airflow of one powered fan, cfm. */
  cfm: positive(LIMITS.maxCfm, "Airflow").optional(),
  mounting: z2.enum(["roof", "gable"]).optional(),
  hasThermostat: z2.boolean().optional(),
  thermostatSetPointF: z2.number().min(40).max(180).optional(),
  control: z2.enum(["thermostat", "thermostat-and-humidistat", "switch", "always-on", "solar"]).optional(),
  /** A gable fan: is it sealed to its opening (shroud or baffle) so it can't recirculate attic air? */
  sealedToOpening: z2.boolean().optional(),
  diagnostics: FanDiagnosticsSchema.optional(),
  /** Condition found on site; open when absent (older surveys). */
  condition: VentConditionSchema.optional(),
  /** Partly blocked: how many of the `quantity` units are blocked ("4 of 10 soffit vents"). */
  blockedQuantity: z2.number().int("Blocked count must be a whole number.").min(0).max(LIMITS.maxQuantity).optional(),
  /** Partly blocked: the share of the vent's area that is blocked, 0–1 (e.g. half a continuous soffit). */
  blockedShare: z2.number().min(0, "Blocked share is 0–100 %.").max(1, "Blocked share is 0–100 %.").optional(),
  blockedBy: BlockedBySchema.optional()
}).superRefine((vent, ctx) => {
  if (vent.condition === "partly-blocked") {
    if (vent.blockedQuantity === void 0 && vent.blockedShare === void 0) {
      ctx.addIssue({ code: "custom", path: ["blockedQuantity"], message: "Say how many are blocked (e.g. 4 of 10) or what share of the vent is blocked." });
    }
    if (vent.blockedQuantity !== void 0 && vent.blockedShare !== void 0) {
      ctx.addIssue({ code: "custom", path: ["blockedShare"], message: "Give either how many are blocked or the share blocked, not both." });
    }
    if (vent.blockedQuantity !== void 0 && vent.blockedQuantity > (vent.quantity ?? 1)) {
      ctx.addIssue({ code: "custom", path: ["blockedQuantity"], message: `At most ${vent.quantity ?? 1} can be blocked (the quantity recorded).` });
    }
  } else if (vent.blockedQuantity !== void 0 || vent.blockedShare !== void 0) {
    ctx.addIssue({ code: "custom", path: ["condition"], message: 'A blocked count or share goes with the condition "partly blocked".' });
  }
  if (isMechanicalKind(vent.kind) && vent.condition !== void 0 && vent.condition !== "open" && vent.condition !== "damaged") {
    ctx.addIssue({ code: "custom", path: ["condition"], message: "A fan is recorded as open or damaged; check it with the fan checks." });
  }
  const nfaFields = ["nfaSqIn", "nfaSqInPerUnit", "lengthFt", "nfaSqInPerFt", "grossWidthIn", "grossHeightIn", "covering"];
  if (isMechanicalKind(vent.kind)) {
    if (vent.cfm === void 0) {
      ctx.addIssue({ code: "custom", path: ["cfm"], message: "A powered fan needs its rated airflow in cfm." });
    }
    for (const field of nfaFields) {
      if (vent[field] !== void 0) {
        ctx.addIssue({
          code: "custom",
          path: [field],
          message: "A powered fan moves air mechanically and has no net free area; give its airflow in cfm instead."
        });
      }
    }
    return;
  }
  if (vent.cfm !== void 0) ctx.addIssue({ code: "custom", path: ["cfm"], message: "Only powered fans have a cfm rating; give this vent's net free area." });
  if (vent.diagnostics !== void 0) ctx.addIssue({ code: "custom", path: ["diagnostics"], message: "Fan checks apply to powered fans only." });
  if (vent.nfaSqIn !== void 0) return;
  const hasPerUnit = vent.nfaSqInPerUnit !== void 0;
  const hasLength = vent.lengthFt !== void 0 || vent.nfaSqInPerFt !== void 0;
  const hasGross = vent.grossWidthIn !== void 0 || vent.grossHeightIn !== void 0 || vent.covering !== void 0;
  const ways = [hasPerUnit, hasLength, hasGross].filter(Boolean).length;
  if (ways === 0) {
    ctx.addIssue({
      code: "custom",
      path: ["nfaSqIn"],
      message: "Give this vent's size: a rated NFA, a quantity with NFA per unit, a length with NFA per foot, or a gross width and height with the covering."
    });
    return;
  }
  if (ways > 1) {
    ctx.addIssue({ code: "custom", path: ["nfaSqInPerUnit"], message: "Give the vent's size one way only (per unit, per foot, or gross size with covering)." });
    return;
  }
  if (hasLength) {
    if (vent.lengthFt === void 0) ctx.addIssue({ code: "custom", path: ["lengthFt"], message: "Give the vent's length in feet." });
    if (vent.nfaSqInPerFt === void 0) ctx.addIssue({ code: "custom", path: ["nfaSqInPerFt"], message: "Give the NFA per foot (from the product label)." });
  }
  if (hasGross) {
    if (vent.grossWidthIn === void 0) ctx.addIssue({ code: "custom", path: ["grossWidthIn"], message: "Give the opening's gross width in inches." });
    if (vent.grossHeightIn === void 0) ctx.addIssue({ code: "custom", path: ["grossHeightIn"], message: "Give the opening's gross height in inches." });
    if (vent.covering === void 0) ctx.addIssue({ code: "custom", path: ["covering"], message: "Say what covers the opening (mesh size and whether it has louvers)." });
  }
});
var MoistureRegimeSchema = z2.enum(["A", "B", "C"]);
var EnclosedRafterBaysSchema = z2.object({
  bayCount: z2.number().int("Bays are counted in whole numbers.").min(1, "At least one bay.").max(500),
  baySpacingIn: z2.number().min(8, "Rafter spacing is at least 8 in.").max(96, "Rafter spacing is at most 96 in.")
});
var AtticAssemblySchema = z2.enum(["vented", "unvented"]);
var UnventedAssemblySchema = z2.object({
  insulation: z2.enum(["air-impermeable-only", "air-impermeable-and-air-permeable", "rigid-above-deck-and-air-permeable", "air-permeable-only"]),
  /** R-value of the spray foam against the deck, or of the rigid board above it. */
  airImpermeableRValue: z2.number().min(0).max(100).optional(),
  /** The foam is itself a Class II vapor retarder (closed-cell at normal thickness) or is coated with one. */
  foamIsClassII: z2.boolean().optional(),
  /** The insulated roof line and air barrier enclose the whole attic (it is inside the thermal envelope). */
  isInsideThermalEnvelope: z2.boolean().optional(),
  roofCovering: z2.enum(["asphalt-shingles", "wood-shingles-or-shakes", "tile-or-metal", "other"]).optional(),
  /** For wood shingles or shakes: a 1/4 in vented air space under them. */
  hasVentedGapUnderShakes: z2.boolean().optional()
});
var SiteSchema = z2.object({
  /** A natural-draft (atmospheric) gas or oil appliance in the house: water heater, furnace, boiler. */
  atmosphericCombustionAppliance: z2.boolean().optional(),
  /** A gable-mounted fan is sealed to its opening. */
  gableFanSealed: z2.boolean().optional(),
  /** Insulation blocks the soffit vents (IRC R806.3). */
  soffitsBlocked: z2.boolean().optional(),
  /** Insulation baffles (vent chutes) are in the rafter bays at the eaves. */
  bafflesPresent: z2.boolean().optional(),
  /** A bath fan exhausts into the attic instead of outdoors. */
  bathFanIntoAttic: z2.boolean().optional(),
  /** A kitchen hood or dryer exhausts into the attic. */
  kitchenOrDryerIntoAttic: z2.boolean().optional(),
  /** The ceiling (top plates, penetrations, hatch) has been air-sealed. */
  ceilingAirSealed: z2.boolean().optional()
});
var AtticInputSchema = z2.object({
  codeBasis: CodeBasisSchema,
  climateZone: z2.number().int("Climate zone is a whole number 1–8.").min(1, "Climate zone is 1–8.").max(8, "Climate zone is 1–8."),
  ceilingVaporRetarder: VaporRetarderSchema,
  roofColor: RoofColorSchema,
  /** IECC moisture letter with the zone (4C marine …); zones 7–8 have none. Optional for older surveys. */
  moistureRegime: MoistureRegimeSchema.nullable().optional(),
  /** A space of enclosed rafter bays (cathedral ceiling): each bay is vented on its own (IRC R806.1). */
  enclosedRafterBays: EnclosedRafterBaysSchema.optional(),
  /** "unvented" for a sealed attic (IRC R806.5); vented when absent. */
  assembly: AtticAssemblySchema.optional(),
  unvented: UnventedAssemblySchema.optional(),
  /** The company's reading of the upper-vent share; the literal "required" when absent. */
  upperShareBase: UpperShareBaseSchema.optional(),
  sections: z2.array(SectionSchema).min(1, "Add at least one section of attic floor.").max(LIMITS.maxSections, `At most ${LIMITS.maxSections} sections in one space.`),
  vents: z2.array(VentSchema).max(LIMITS.maxVents, `At most ${LIMITS.maxVents} vent rows in one space (give a row a quantity for identical vents).`),
  site: SiteSchema.optional()
}).superRefine((input, ctx) => {
  if (input.assembly === "unvented" && input.unvented === void 0) {
    ctx.addIssue({ code: "custom", path: ["unvented"], message: "Say how the unvented roof is insulated (spray foam, rigid board above the deck, or batts only)." });
  }
  const sectionIds = /* @__PURE__ */ new Set();
  input.sections.forEach((section, index) => {
    if (section.id === void 0) return;
    if (sectionIds.has(section.id)) ctx.addIssue({ code: "custom", path: ["sections", index, "id"], message: `Section id "${section.id}" is used twice.` });
    sectionIds.add(section.id);
  });
  const ventIds = /* @__PURE__ */ new Set();
  input.vents.forEach((vent, index) => {
    if (ventIds.has(vent.id)) ctx.addIssue({ code: "custom", path: ["vents", index, "id"], message: `Vent id "${vent.id}" is used twice.` });
    ventIds.add(vent.id);
    if (vent.sectionId !== void 0 && !sectionIds.has(vent.sectionId)) {
      ctx.addIssue({ code: "custom", path: ["vents", index, "sectionId"], message: `No section has the id "${vent.sectionId}".` });
    }
  });
});

// shared/ventilation/covering-factors.ts
var COVERING_FACTORS = {
  "1/4": { plain: 1, withLouvers: 2, withMetalLouvers: 2 },
  // 1/4 in hardware cloth
  "1/8": { plain: 1.25, withLouvers: 2.25, withMetalLouvers: 2.25 },
  // 1/8 in mesh screen
  "1/16": { plain: 2, withLouvers: 3, withMetalLouvers: 2 }
  // 1/16 in (#16) insect screen
};
function coveringFactor(covering) {
  const row = COVERING_FACTORS[covering.mesh];
  if (!covering.louvers) return row.plain;
  return covering.louverMaterial === "metal" ? row.withMetalLouvers : row.withLouvers;
}
function describeCovering(covering) {
  const mesh = covering.mesh === "1/4" ? "1/4 in hardware cloth" : covering.mesh === "1/16" ? "1/16 in insect screen" : "1/8 in mesh";
  if (!covering.louvers) return mesh;
  if (covering.louverMaterial === "metal") return `metal louvers with ${mesh}`;
  if (covering.louverMaterial === "wood") return `wood louvers with ${mesh}`;
  return covering.mesh === "1/16" ? `louvers (material not recorded, taken as wood) with ${mesh}` : `louvers with ${mesh}`;
}

// shared/ventilation/vent-nfa.ts
function ventNfa(vent) {
  const quantity = vent.quantity ?? 1;
  const base = { ventId: vent.id, kind: vent.kind, location: vent.location, ...vent.label ? { label: vent.label } : {} };
  const qtyText = (each) => quantity > 1 ? `${formatNumber(quantity)} × ${each}` : each;
  if (isWholeHouseFanKind(vent.kind)) {
    const airflowCfm = quantity * (vent.cfm ?? 0);
    return {
      ...base,
      isPowered: false,
      isWholeHouseFan: true,
      nfaSqIn: 0,
      exactNfaSqIn: 0,
      fullNfaSqIn: 0,
      openShare: 1,
      airflowCfm,
      explanation: `${qtyText(`${formatNumber(vent.cfm ?? 0)} cfm`)}${quantity > 1 ? ` = ${formatNumber(airflowCfm)} cfm` : ""}; a whole-house fan blows house air into the attic and adds no net free area`
    };
  }
  if (isPoweredKind(vent.kind)) {
    const airflowCfm = quantity * (vent.cfm ?? 0);
    return {
      ...base,
      isPowered: true,
      isWholeHouseFan: false,
      nfaSqIn: 0,
      exactNfaSqIn: 0,
      fullNfaSqIn: 0,
      openShare: 1,
      airflowCfm,
      explanation: `${qtyText(`${formatNumber(vent.cfm ?? 0)} cfm`)}${quantity > 1 ? ` = ${formatNumber(airflowCfm)} cfm` : ""}; a powered fan is mechanical and adds no net free area`
    };
  }
  let exactSqIn;
  let explanation;
  if (vent.nfaSqIn !== void 0) {
    exactSqIn = quantity * vent.nfaSqIn;
    explanation = `rated ${qtyText(`${formatNumber(vent.nfaSqIn)} sq in`)}`;
  } else if (vent.nfaSqInPerUnit !== void 0) {
    exactSqIn = quantity * vent.nfaSqInPerUnit;
    explanation = qtyText(`${formatNumber(vent.nfaSqInPerUnit)} sq in`);
  } else if (vent.lengthFt !== void 0 && vent.nfaSqInPerFt !== void 0) {
    exactSqIn = quantity * vent.lengthFt * vent.nfaSqInPerFt;
    explanation = qtyText(`${formatNumber(vent.lengthFt)} ft × ${formatNumber(vent.nfaSqInPerFt)} sq in per ft`);
  } else if (vent.grossWidthIn !== void 0 && vent.grossHeightIn !== void 0 && vent.covering !== void 0) {
    const grossSqIn = vent.grossWidthIn * vent.grossHeightIn;
    const factor = coveringFactor(vent.covering);
    exactSqIn = quantity * grossSqIn / factor;
    explanation = qtyText(
      `${formatNumber(vent.grossWidthIn)} in × ${formatNumber(vent.grossHeightIn)} in = ${formatNumber(grossSqIn)} sq in gross ÷ ${formatNumber(factor)} (${describeCovering(vent.covering)})`
    );
  } else {
    exactSqIn = 0;
    explanation = "no size recorded";
  }
  const fullNfaSqIn = roundTo(exactSqIn, 2);
  const { openShare, words } = conditionShare(vent, quantity);
  const countedExactSqIn = exactSqIn * openShare;
  const nfaSqIn = roundTo(countedExactSqIn, 2);
  return {
    ...base,
    isPowered: false,
    isWholeHouseFan: false,
    nfaSqIn,
    exactNfaSqIn: countedExactSqIn,
    fullNfaSqIn,
    openShare,
    airflowCfm: 0,
    explanation: openShare === 1 ? `${explanation} = ${formatNumber(nfaSqIn)} sq in` : `${explanation} = ${formatNumber(fullNfaSqIn)} sq in; ${words}: ${formatNumber(nfaSqIn)} sq in counted`
  };
}
var BLOCKED_BY_WORDS = {
  insulation: "insulation",
  paint: "paint",
  debris: "debris",
  nest: "a nest",
  other: "something"
};
function conditionShare(vent, quantity) {
  const by = vent.blockedBy ? ` by ${BLOCKED_BY_WORDS[vent.blockedBy]}` : "";
  switch (vent.condition) {
    case "blocked":
      return { openShare: 0, words: `blocked${by}, so none of it counts` };
    case "painted-over":
      return { openShare: 0, words: "painted over, so none of it counts" };
    case "partly-blocked":
      if (vent.blockedQuantity !== void 0) {
        const blocked = Math.min(vent.blockedQuantity, quantity);
        return { openShare: (quantity - blocked) / quantity, words: `${formatNumber(blocked)} of ${formatNumber(quantity)} blocked${by}, so ${formatNumber(quantity - blocked)} of ${formatNumber(quantity)} count` };
      }
      if (vent.blockedShare !== void 0) {
        return { openShare: 1 - vent.blockedShare, words: `${formatNumber(vent.blockedShare * 100)} % blocked${by}, so ${formatNumber((1 - vent.blockedShare) * 100)} % counts` };
      }
      return { openShare: 1, words: "" };
    default:
      return { openShare: 1, words: "" };
  }
}

// shared/ventilation/vent-position.ts
function riseLookup(sections) {
  const byId = /* @__PURE__ */ new Map();
  let lowestFt = Infinity;
  let highestFt = -Infinity;
  let isEveryRiseKnown = sections.length > 0;
  for (const section of sections) {
    const riseFt = sectionRiseFt(section);
    if (section.id !== void 0) byId.set(section.id, riseFt === null ? null : { highestFt: riseFt, lowestFt: riseFt });
    if (riseFt === null) isEveryRiseKnown = false;
    else {
      lowestFt = Math.min(lowestFt, riseFt);
      highestFt = Math.max(highestFt, riseFt);
    }
  }
  const whole = isEveryRiseKnown ? { highestFt, lowestFt } : null;
  return (sectionId) => sectionId !== void 0 && byId.has(sectionId) ? byId.get(sectionId) : whole;
}
function ventPosition(vent, rise) {
  const range = typeof rise === "number" ? { highestFt: rise, lowestFt: rise } : rise;
  const riseFt = range?.highestFt ?? null;
  const isEaveVent = EAVE_KINDS.has(vent.kind) && vent.location === "lower";
  const tolFt = 1e-9;
  const isHeightImpossible = range !== null && (vent.heightAboveEaveFt !== void 0 && vent.heightAboveEaveFt > range.highestFt + tolFt || vent.dropBelowRidgeFt !== void 0 && vent.dropBelowRidgeFt > range.highestFt + tolFt);
  if (isHeightImpossible) {
    return { ventId: vent.id, riseFt, isHeightImpossible, dropBelowRidgeFt: null, dropSource: null, heightAboveEaveFt: null, heightSource: null, isEaveVent, isInBottomThird: false };
  }
  let dropBelowRidgeFt = null;
  let dropSource = null;
  if (vent.dropBelowRidgeFt !== void 0) {
    dropBelowRidgeFt = vent.dropBelowRidgeFt;
    dropSource = "recorded";
  } else if (AT_RIDGE_KINDS.has(vent.kind)) {
    dropBelowRidgeFt = 0;
    dropSource = "at-ridge-kind";
  } else if (vent.heightAboveEaveFt !== void 0 && range !== null) {
    dropBelowRidgeFt = Math.max(0, range.highestFt - vent.heightAboveEaveFt);
    dropSource = "from-height-and-rise";
  }
  let heightAboveEaveFt = null;
  let heightSource = null;
  if (vent.heightAboveEaveFt !== void 0) {
    heightAboveEaveFt = vent.heightAboveEaveFt;
    heightSource = "recorded";
  } else if (isEaveVent) {
    heightAboveEaveFt = 0;
    heightSource = "eave-kind";
  } else if (dropBelowRidgeFt !== null && range !== null) {
    heightAboveEaveFt = Math.max(0, range.lowestFt - dropBelowRidgeFt);
    heightSource = "from-drop-and-rise";
  }
  const isInBottomThird = vent.location === "lower" && (isEaveVent || heightAboveEaveFt !== null && range !== null && heightAboveEaveFt <= range.lowestFt / 3);
  return { ventId: vent.id, riseFt, isHeightImpossible, dropBelowRidgeFt, dropSource, heightAboveEaveFt, heightSource, isEaveVent, isInBottomThird };
}

// shared/ventilation/analyze-attic.ts
function analyzeAttic(input) {
  const attic = AtticInputSchema.parse(input);
  const site = attic.site ?? {};
  const sections = attic.sections.map((section, index) => {
    const areaSqFt = sectionAreaSqFt(section);
    const geometry = sectionGeometry(section, (n) => formatNumber(n));
    return {
      index,
      ...section.id !== void 0 ? { id: section.id } : {},
      areaSqFt,
      areaExplanation: describeSectionArea(section, (n) => formatNumber(n)),
      riseFt: geometry.isKnown ? geometry.riseFt : null,
      volumeCuFt: geometry.isKnown ? geometry.volumeCuFt : null,
      volumeExplanation: geometry.isKnown ? geometry.explanation : geometry.reason
    };
  });
  const floorAreaSqFt = roundTo(sections.reduce((acc, s) => acc + s.areaSqFt, 0), 6);
  const unknownVolume = sections.find((s) => s.volumeCuFt === null);
  const volumeCuFt = unknownVolume ? null : roundTo(sections.reduce((acc, s) => acc + (s.volumeCuFt ?? 0), 0), 2);
  const riseOf = riseLookup(attic.sections);
  const vents = attic.vents.map((vent) => ({
    vent,
    nfa: ventNfa(vent),
    position: ventPosition(vent, riseOf(vent.sectionId)),
    label: vent.label
  }));
  const provided = providedNfa(vents.map((v) => v.nfa));
  const isUnvented = attic.assembly === "unvented" && attic.unvented !== void 0;
  const unvented = isUnvented ? checkUnventedAssembly(attic.unvented, attic.climateZone, attic.moistureRegime, attic.ceilingVaporRetarder) : null;
  const requirement = isUnvented ? unventedRequirement(attic.codeBasis) : requiredNfa({
    floorAreaSqFt,
    codeBasis: attic.codeBasis,
    climateZone: attic.climateZone,
    ceilingVaporRetarder: attic.ceilingVaporRetarder,
    upperShareBase: attic.upperShareBase,
    vents
  });
  let fan = null;
  if (provided.poweredCfm > 0 && !isUnvented) {
    const isSteep = attic.sections.some((s) => s.pitchIn12 !== void 0 && s.pitchIn12 >= STEEP_PITCH_IN_12);
    const sizing = recommendFanCfm({
      floorAreaSqFt,
      volumeCuFt,
      isDark: attic.roofColor === "dark",
      isSteep,
      volumeUnknownReason: unknownVolume ? `for section ${unknownVolume.index + 1}${unknownVolume.id ? ` (${unknownVolume.id})` : ""} ${unknownVolume.volumeExplanation}` : void 0
    });
    const intakeNeededSqIn = fanIntakeNeededSqIn(provided.poweredCfm);
    fan = {
      installedCfm: provided.poweredCfm,
      recommendedCfm: sizing.recommendedCfm,
      areaMethodCfm: sizing.areaMethodCfm,
      airChangeMethodCfm: sizing.airChangeMethodCfm,
      isDarkOrSteep: sizing.isDarkOrSteep,
      intakeNeededSqIn,
      intakeNeededForRecommendedSqIn: fanIntakeNeededSqIn(sizing.recommendedCfm),
      intakeProvidedSqIn: provided.intakeSqIn,
      reasons: [
        ...sizing.reasons,
        `Intake the installed ${formatNumber(provided.poweredCfm)} cfm needs (HVI: 1 sq ft per 300 cfm): ${formatNumber(provided.poweredCfm)} ÷ 300 = ${formatNumber(provided.poweredCfm / 300, { maxFractionDigits: 3 })} sq ft = ${formatNumber(intakeNeededSqIn)} sq in; the intake vents give ${formatNumber(provided.intakeSqIn)} sq in.`
      ]
    };
  }
  const rafterBays = attic.enclosedRafterBays && !isUnvented ? checkRafterBays(attic.enclosedRafterBays, floorAreaSqFt, requirement.ratio, vents.map((v) => ({ vent: v.vent, nfa: v.nfa }))) : null;
  const findings = (isUnvented ? unventedFindings : ventilationFindings)({
    floorAreaSqFt,
    vents: attic.vents,
    perVent: provided.perVent,
    provided,
    requirement,
    fan,
    site,
    required300SqIn: floorAreaSqFt * SQ_IN_PER_SQ_FT / 300,
    climateZone: attic.climateZone,
    impossibleHeights: vents.filter((v) => v.position.isHeightImpossible).map((v) => ({ vent: v.vent, riseFt: v.position.riseFt ?? 0 })),
    unvented
  });
  if (rafterBays && !rafterBays.isMet) {
    const unvented2 = rafterBays.bayCount - Math.min(rafterBays.baysWithIntake, rafterBays.baysWithExhaust);
    findings.push({
      code: "rafter-bays-not-vented",
      severity: "critical",
      title: unvented2 > 0 ? "Some rafter bays are not cross-ventilated" : "Rafter bays short of vent area",
      detail: `${rafterBays.reasons.join(" ")} ` + (unvented2 > 0 ? `Each bay is closed off from the next, so every bay needs its own intake at the eave and exhaust at the top (IRC R806.1); ${formatNumber(unvented2)} of ${formatNumber(rafterBays.bayCount)} lack one or both. Continuous soffit and ridge vents across every bay are the usual fix.` : `Each bay needs ${formatNumber(rafterBays.requiredPerBaySqIn)} sq in; the least-vented gets ${formatNumber(rafterBays.leastPerBaySqIn)} sq in.`),
      ventIds: attic.vents.map((v) => v.id)
    });
  }
  for (const vent of attic.vents) {
    if (vent.diagnostics) findings.push(...diagnoseFan(vent.diagnostics, vent.id));
    if (isPoweredKind(vent.kind)) findings.push(...fanControlFindings(vent, attic.climateZone));
  }
  const meetsArea = meetsRequiredArea(provided.exactTotalSqIn, requirement.exactSqIn);
  let compliant;
  let summary;
  if (unvented) {
    const openings = attic.vents.length;
    compliant = unvented.isMet && openings === 0;
    const open = unvented.conditions.filter((c) => c.status === "not-met").length;
    const unknown = unvented.conditions.filter((c) => c.status === "unknown").length;
    summary = "Unvented (sealed) attic: under IRC R806.5 it needs no vent area, and none should be added. " + (unvented.isMet ? openings === 0 ? "The conditions recorded are met." : "The conditions recorded are met, but vents or fans open it to the outside." : `${open > 0 ? `${open} of its conditions ${open === 1 ? "is" : "are"} not met` : ""}${open > 0 && unknown > 0 ? " and " : ""}${unknown > 0 ? `${unknown} ${unknown === 1 ? "condition is" : "conditions are"} not recorded` : ""}.`);
  } else {
    compliant = meetsArea && site.soffitsBlocked !== true && (rafterBays === null || rafterBays.isMet);
    const digits = Math.abs(provided.exactTotalSqIn - requirement.exactSqIn) < 0.01 ? 3 : 2;
    const providedText = formatNumber(provided.exactTotalSqIn, { maxFractionDigits: digits });
    const requiredText = formatNumber(requirement.exactSqIn, { maxFractionDigits: digits });
    summary = meetsArea ? compliant ? `Meets the code minimum: ${providedText} sq in of vent area provided, ${requiredText} sq in required at 1/${requirement.ratio}.` : `Enough vent area on paper (${providedText} of ${requiredText} sq in at 1/${requirement.ratio}), but insulation blocks the soffit vents, so it does not meet the code (IRC R806.3).` : `Below the code minimum: ${providedText} sq in of vent area provided, ${requiredText} sq in required at 1/${requirement.ratio}.`;
  }
  return {
    floorAreaSqFt,
    sections,
    volumeCuFt,
    requirement,
    provided,
    fan,
    compliant,
    assembly: isUnvented ? "unvented" : "vented",
    rafterBays,
    recommendations: aboveMinimum({
      requiredExactSqIn: requirement.exactSqIn,
      maxPitchIn12: attic.sections.reduce((max, s) => s.pitchIn12 === void 0 ? max : Math.max(max ?? 0, s.pitchIn12), null),
      wholeHouseFanCfm: provided.wholeHouseFanCfm,
      ceilingAirSealed: site.ceilingAirSealed,
      isUnvented
    }),
    unvented,
    summary,
    findings: sortFindings(findings)
  };
}
export {
  analyzeAttic
};
