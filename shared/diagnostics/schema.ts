import { z } from "zod";

/**
 * Voltage readings of a thermostat switching test at the fan's switched leg (the wire from the
 * thermostat to the motor), taken with the dial set below and then above the attic temperature.
 */
export const ThermostatTestSchema = z.object({
  /** Attic air temperature when tested (°F), for the record. */
  atticTempF: z.number().min(-40).max(180).optional(),
  /** Dial set below the attic temperature: the thermostat should call, about 120 V expected. */
  switchedLegVoltsDialBelow: z.number().min(0).max(300),
  /** Dial set above the attic temperature: the thermostat should not call, about 0 V expected. */
  switchedLegVoltsDialAbove: z.number().min(0).max(300),
});

/** Field checks on one powered fan, all optional; each present check becomes a finding. */
export const FanDiagnosticsSchema = z.object({
  /** Power confirmed off at the breaker with a tester before hands-on checks. */
  isPowerVerifiedOff: z.boolean().optional(),
  /** Motor winding resistance in ohms, or "open" when the meter shows OL / no continuity. */
  windingResistanceOhms: z.union([z.number().min(0).max(1e12), z.literal("open")]).optional(),
  thermostatTest: ThermostatTestSchema.optional(),
  /** Power off, the blade turned by hand: does it spin freely and coast? */
  isBladeFreeToSpin: z.boolean().optional(),
});

export type ThermostatTest = z.infer<typeof ThermostatTestSchema>;
export type FanDiagnostics = z.infer<typeof FanDiagnosticsSchema>;
