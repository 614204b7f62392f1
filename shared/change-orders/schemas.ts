import { z } from "zod";
import { AcceptSchema } from "../proposals/schemas";

/** One line as sales enters it: a catalog item (priced from the catalog unless a price is given) or free text with a price. */
export const ChangeOrderLineInputSchema = z.object({
  id: z.string().min(1).max(100),
  action: z.enum(["add", "remove"], { error: "Say whether the line adds work or takes it out." }),
  catalogItemId: z.string().uuid("Choose a catalog item.").nullable().default(null),
  description: z.string().trim().max(300, "The description must be at most 300 characters.").nullable().default(null),
  quantity: z.number({ error: "Quantity must be a number." }).positive("Quantity must be more than 0.").max(100_000, "Quantity is too large."),
  unit: z.string().trim().max(30).nullable().default(null),
  unitPriceCents: z.number({ error: "The price must be a number of cents." }).int("The price must be whole cents.").min(0).max(100_000_000).nullable().default(null),
}).strict();
export type ChangeOrderLineInput = z.infer<typeof ChangeOrderLineInputSchema>;

export const ChangeOrderDraftSchema = z.object({
  /** Why the signed work has to change, in words the homeowner reads (e.g. "rotted decking found under the ridge"). */
  reason: z.string({ error: "Say why the work changes." }).trim().min(3, "Say why the work changes.").max(2_000, "The reason must be at most 2,000 characters."),
  lines: z.array(ChangeOrderLineInputSchema).min(1, "Add at least one line.").max(100),
  photoIds: z.array(z.string().uuid()).max(20).default([]),
}).strict();
export type ChangeOrderDraftInput = z.infer<typeof ChangeOrderDraftSchema>;

/** The homeowner signs a change order exactly as a proposal: name, signature and the e-sign consent. */
export const ChangeOrderSignSchema = AcceptSchema.omit({ optionId: true });
export type ChangeOrderSignInput = z.infer<typeof ChangeOrderSignSchema>;
