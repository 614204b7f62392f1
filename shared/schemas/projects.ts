import { z } from "zod";
import { versionField } from "./input-safety.ts";
import { CodeBasisSchema, RoofColorSchema, VaporRetarderSchema } from "../ventilation/schema.ts";

/** Request contracts for customers and projects, shared by the client's forms and the server. */
const text = (max: number, what: string) => z.string({ error: `${what} must be text.` }).trim().max(max, `${what} must be at most ${max} characters.`);
const optionalText = (max: number, what: string) => text(max, what).nullable().optional();

export const CustomerInputSchema = z.object({
  name: text(200, "Name").min(1, "Enter the customer's name."),
  phone: optionalText(40, "Phone"),
  email: z.string().trim().max(254, "E-mail must be at most 254 characters.").email("That does not look like an e-mail address.").nullable().optional().or(z.literal("").transform(() => null)),
  billingAddress: optionalText(500, "Billing address"),
  notes: optionalText(5000, "Notes"),
}).strict();
export const CustomerPatchSchema = CustomerInputSchema.partial().strict();

/** The code editions in words, for every place a person picks one (projects, the company's default). */
export const CODE_BASIS_LABELS: Record<z.infer<typeof CodeBasisSchema>, string> = {
  "irc-2024": "IRC 2024 (same vent rule as 2018)",
  "irc-2021": "IRC 2021 (same vent rule as 2018)",
  "irc-2018": "IRC 2018 text",
  "irc-2012": "IRC 2012 or 2015 text",
  "irc-2009": "IRC 2009 text",
  "strict-150": "Strict 1/150, no exceptions",
};

export const PROJECT_STATUSES = ["lead", "surveyed", "proposed", "sold", "lost", "completed"] as const;
export const ProjectStatusSchema = z.enum(PROJECT_STATUSES, { error: "Choose a status." });
export const MoistureRegimeSchema = z.enum(["A", "B", "C"], { error: "Moisture regime is A (moist), B (dry) or C (marine)." });

const projectFields = {
  customerId: z.string().uuid("Choose a customer."),
  title: text(200, "Title").min(1, "Give the project a short title."),
  siteAddress: text(500, "Site address").min(1, "Enter the site address."),
  status: ProjectStatusSchema,
  estimatorId: z.string().uuid("Choose an estimator.").nullable(),
  climateZone: z.number({ error: "Climate zone is a number 1–8." }).int("Climate zone is a whole number 1–8.").min(1, "Climate zone is 1–8.").max(8, "Climate zone is 1–8."),
  /** IECC moisture regime; zones 7 and 8 carry none. */
  moistureRegime: MoistureRegimeSchema.nullable(),
  codeBasis: CodeBasisSchema,
  ceilingVaporRetarder: VaporRetarderSchema,
  roofColor: RoofColorSchema,
  notes: optionalText(5000, "Notes"),
};

export const ProjectInputSchema = z
  .object({
    ...projectFields,
    status: ProjectStatusSchema.default("lead"),
    estimatorId: projectFields.estimatorId.optional(),
    moistureRegime: projectFields.moistureRegime.optional(),
    codeBasis: CodeBasisSchema.optional(), // the company default when omitted
    climateZone: projectFields.climateZone.optional(), // the company default when omitted
    ceilingVaporRetarder: VaporRetarderSchema.default("none"),
    roofColor: RoofColorSchema.default("medium"),
  })
  .strict();

/** A patch carries the version it was based on; a stale one answers 409. */
export const ProjectPatchSchema = z
  .object(projectFields)
  .partial()
  .extend({ version: versionField("project") })
  .strict();

export const ListQuerySchema = z.object({
  q: z.string().trim().max(200).optional(),
  status: ProjectStatusSchema.optional(),
  estimatorId: z.string().uuid().optional(),
  sort: z.enum(["updatedAt", "createdAt", "title", "customerName", "status"]).default("updatedAt"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});

/** A project as the API answers it (GET/POST/PATCH /api/projects…); dates are ISO strings. */
export interface ProjectRecord {
  id: string;
  customerId: string;
  title: string;
  siteAddress: string;
  status: ProjectStatus;
  estimatorId: string | null;
  climateZone: number;
  moistureRegime: "A" | "B" | "C" | null;
  codeBasis: z.infer<typeof CodeBasisSchema>;
  ceilingVaporRetarder: z.infer<typeof VaporRetarderSchema>;
  roofColor: z.infer<typeof RoofColorSchema>;
  notes: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
  /** The company's reading of the 1/300 upper-vent share, applied to this project's analyses (read-only). */
  upperShareBase?: "required" | "provided";
}

export type CustomerInput = z.infer<typeof CustomerInputSchema>;
export type ProjectInput = z.infer<typeof ProjectInputSchema>;
export type ProjectPatch = z.infer<typeof ProjectPatchSchema>;
export type ProjectStatus = z.infer<typeof ProjectStatusSchema>;
export type ListQuery = z.infer<typeof ListQuerySchema>;

/** The customer list: search over name, e-mail and phone; sort; pagination. */
export const CustomerListQuerySchema = z.object({
  q: z.string().trim().max(200, "Search at most 200 characters.").optional(),
  sort: z.enum(["name", "createdAt", "updatedAt"], { error: "Sort by name, createdAt or updatedAt." }).default("name"),
  dir: z.enum(["asc", "desc"], { error: "Direction is asc or desc." }).default("asc"),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type CustomerListQuery = z.infer<typeof CustomerListQuerySchema>;
