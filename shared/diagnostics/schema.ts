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

/** A run capacitor's reading against its label (motors that have one; shaded-pole motors have none). */
export const CapacitorReadingSchema = z.object({
  ratedMicrofarads: z.number().positive("The rating must be more than 0 µF.").max(1_000),
  measuredMicrofarads: z.number().min(0).max(2_000),
  /** The tolerance printed on the capacitor, ± %; ±6 % when not recorded. */
  tolerancePercent: z.number().positive().max(50).optional(),
});

/**
 * Field checks on one powered fan, all optional; each present check becomes a finding. Fields added
 * later (lock-out, tester proof, winding-to-frame, capacitor) are optional so stored surveys stay
 * valid (DEVELOPERS.md decision 8).
 */
export const FanDiagnosticsSchema = z.object({
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
  isBladeFreeToSpin: z.boolean().optional(),
});

export type ThermostatTest = z.infer<typeof ThermostatTestSchema>;
export type FanDiagnostics = z.infer<typeof FanDiagnosticsSchema>;
export type CapacitorReading = z.infer<typeof CapacitorReadingSchema>;
