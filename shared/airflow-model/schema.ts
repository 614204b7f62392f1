/**
 * zod schema of the conditions an airflow estimate is made for (issue 19's contract). Every
 * range is bounded so a valid input can never make the model produce NaN or Infinity.
 */
import { z } from "zod";

const temp = (what: string) =>
  z.number({ error: `${what} must be a number.` }).min(-40, `${what} must be at least −40 °F.`).max(180, `${what} must be at most 180 °F.`);

export const AirflowConditionsSchema = z.object({
  outdoorTempF: temp("Outdoor temperature"),
  atticTempF: temp("Attic temperature"),
  houseTempF: temp("House temperature"),
  /** Wind speed at roof height, mph; calm when absent. */
  windMph: z.number().min(0, "Wind can't be negative.").max(60, "Wind must be at most 60 mph.").optional(),
  /** Effective leakage area of the ceiling between house and attic (at 4 Pa, C_D = 1), sq in. */
  ceilingLeakageSqIn: z.number().min(0).max(20_000).optional(),
  /** Blower-door airflow of the whole house at 50 Pa, cfm. */
  houseCfm50: z.number().positive().max(50_000).optional(),
  /** Floor of the lowest storey to the ceiling under the attic, ft; one storey (8 ft) when absent. */
  houseHeightFt: z.number().min(6).max(60).optional(),
  /** "curve" (default): a straight-line fan curve; "rated": every running fan moves its rated cfm. */
  fanModel: z.enum(["curve", "rated"]).optional(),
  /** Force powered fans on or off; by default each runs when the attic is at its thermostat's set point. */
  areFansRunning: z.boolean().optional(),
});

export type AirflowConditions = z.infer<typeof AirflowConditionsSchema>;

/** The summer and winter conditions a company states for its estimates (company profile). */
export const SeasonConditionsSchema = z.object({
  outdoorTempF: temp("Outdoor temperature"),
  atticTempF: temp("Attic temperature"),
  houseTempF: temp("House temperature"),
  windMph: z.number().min(0).max(60),
});
export type SeasonConditions = z.infer<typeof SeasonConditionsSchema>;

export const EstimateConditionsSchema = z.object({ summer: SeasonConditionsSchema, winter: SeasonConditionsSchema });
export type EstimateConditions = z.infer<typeof EstimateConditionsSchema>;

/**
 * Used until a company states its own (common practice, not from a source): a sunny summer
 * afternoon with the attic 35 °F over outdoors and the house air-conditioned; a winter night with
 * the attic a few degrees over outdoors and the house heated. Both calm.
 */
export const DEFAULT_ESTIMATE_CONDITIONS: EstimateConditions = {
  summer: { outdoorTempF: 92, atticTempF: 130, houseTempF: 75, windMph: 0 },
  winter: { outdoorTempF: 25, atticTempF: 30, houseTempF: 68, windMph: 0 },
};
