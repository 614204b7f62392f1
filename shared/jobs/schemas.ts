import { z } from "zod";

/** A calendar date that exists (2027-02-29 is refused). */
const realDate = z.string({ error: "Give the date as YYYY-MM-DD." }).regex(/^\d{4}-\d{2}-\d{2}$/, "Give the date as YYYY-MM-DD.").refine((v) => {
  const d = new Date(`${v}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === v;
}, "That date does not exist.");

export const AssignJobSchema = z.object({
  crewUserId: z.string({ error: "Choose a crew member." }).min(1, "Choose a crew member.").max(100),
  scheduledFor: realDate,
}).strict();
export type AssignJobInput = z.infer<typeof AssignJobSchema>;

export const TickSchema = z.object({ isDone: z.boolean({ error: "Say whether the step is done (true or false)." }) }).strict();

export const JobPhotoFieldsSchema = z.object({ caption: z.string().trim().max(500, "The caption is at most 500 characters.").optional() }).strict();
