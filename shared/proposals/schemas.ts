/**
 * Request contracts for the company profile, the seller's signature, proposals and the
 * homeowner's answers: shared by the client's forms and the server's validation.
 */
import { z } from "zod";
import { PROPOSAL_LIMITS } from "./limits.ts";
import { CodeBasisSchema, UpperShareBaseSchema } from "../ventilation/schema";
import { versionField } from "../schemas/input-safety.ts";
import { EstimateConditionsSchema } from "../airflow-model/schema";

/** No control characters (tabs, new lines, escapes) in a one-line name. */
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/;
const oneLine = (what: string, max: number) =>
  z.string({ error: `${what} must be text.` }).trim()
    .min(1, `Enter ${what.toLowerCase()}.`)
    .max(max, `${what} must be at most ${max.toLocaleString("en-US")} characters.`)
    .refine((v) => !CONTROL.test(v), `${what} can't contain control characters or line breaks.`);
export { PROPOSAL_LIMITS } from "./limits.ts";

const optionalText = (what: string, max: number) => z.string({ error: `${what} must be text.` }).trim().max(max, `${what} must be at most ${max.toLocaleString("en-US")} characters.`).nullable().optional();

/** A drawn signature as a PNG data URL; the server checks the bytes really are a PNG of at most 1 MB. */
export const MAX_SIGNATURE_PNG_BYTES = 1024 * 1024;
export const PNG_DATA_URL_PREFIX = "data:image/png;base64,";
const drawnPng = z.string({ error: "The drawn signature must be a PNG data URL." })
  .max(Math.ceil((MAX_SIGNATURE_PNG_BYTES * 4) / 3) + PNG_DATA_URL_PREFIX.length + 4, "The drawn signature image is too large: at most 1 MB.")
  .refine((v) => v.startsWith(PNG_DATA_URL_PREFIX), "The drawn signature must be a PNG image (data:image/png;base64,…).");

export const SignatureInputSchema = z.object({
  typed: oneLine("The typed signature", 120).optional(),
  drawnPngDataUrl: drawnPng.optional(),
}).strict().refine((s) => Boolean(s.typed) !== Boolean(s.drawnPngDataUrl), { message: "Sign either by typing your name or by drawing, not both and not neither.", path: ["typed"] });
export type SignatureInput = z.infer<typeof SignatureInputSchema>;

export const DepositRuleSchema = z.object({
  kind: z.enum(["percent", "amount"], { error: "The deposit is a percent or an amount." }),
  /** Percent of the total (10 = 10 %) or an amount in cents. */
  value: z.number({ error: "The deposit value must be a number." }).min(0, "The deposit can't be negative.").max(100_000_000),
  capCents: z.number().int("The cap is whole cents.").min(0).max(100_000_000).nullable().default(null),
}).strict().refine((r) => r.kind !== "percent" || r.value <= 100, { message: "A percent deposit is at most 100 %.", path: ["value"] })
  .refine((r) => r.kind !== "amount" || Number.isInteger(r.value), { message: "An amount deposit is whole cents.", path: ["value"] });

export const CompanyProfilePatchSchema = z.object({
  name: oneLine("The company name", 200),
  licenseNumber: optionalText("The licence number", 80),
  addressLine: optionalText("The address", 500),
  phone: optionalText("The phone number", 40),
  email: z.string().trim().max(254).email("That does not look like an e-mail address.").nullable().optional(),
  defaultTerms: optionalText("The default terms", PROPOSAL_LIMITS.maxTermsChars),
  taxRateBasisPoints: z.number({ error: "The tax rate is a number of basis points (825 = 8.25 %)." }).int().min(0).max(5_000, "The tax rate is at most 50 %."),
  depositRule: DepositRuleSchema.nullable(),
  /** Print the FTC three-day cancellation notice and form (sales made at the home). */
  isCoolingOffNoticeEnabled: z.boolean(),
  /** Remind the homeowner when the proposal is still unopened after this many days; null = never. */
  reminderDays: z.number().int().min(1, "Remind after at least 1 day.").max(60).nullable(),
  /**
   * How the building department reads the 1/300 route's 40–50 % upper-vent share: of the required
   * area (the literal text, the default) or of the area provided (a local reading).
   */
  upperShareBase: UpperShareBaseSchema,
  /** Summer and winter conditions for the airflow estimates shown in surveys, options and proposals. */
  estimateConditions: EstimateConditionsSchema,
  /** New projects start with these unless the estimator picks others. */
  defaultCodeBasis: CodeBasisSchema,
  defaultClimateZone: z.number({ error: "The climate zone is a number 1–8." }).int("The climate zone is a whole number 1–8.").min(1, "The climate zone is 1–8.").max(8, "The climate zone is 1–8."),
  unitSystem: z.enum(["imperial", "metric"], { error: "Choose feet and inches or metric." }),
}).partial().strict();
export type CompanyProfilePatch = z.infer<typeof CompanyProfilePatchSchema>;

/** A calendar date that exists: 2027-02-29 or 2026-13-01 are refused (Date.parse would roll them over). */
const isRealDate = (v: string) => {
  const [y, m, d] = v.split("-").map(Number) as [number, number, number];
  const date = new Date(Date.UTC(y, m - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d;
};
const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-12-31.").refine(isRealDate, "That is not a real date.");

export const ProposalCreateSchema = z.object({
  optionIds: z.array(z.string().uuid("Choose design options of this project.")).min(1, "Choose at least one design option.").max(PROPOSAL_LIMITS.maxOptions, `At most ${PROPOSAL_LIMITS.maxOptions} options in one proposal.`),
  validUntil: isoDate.optional(),
}).strict();

export const ScopeTextSchema = z
  .array(z.string().trim().min(1, "A scope line can't be empty.").max(PROPOSAL_LIMITS.maxScopeLineChars, `A scope line is at most ${PROPOSAL_LIMITS.maxScopeLineChars} characters.`))
  .max(PROPOSAL_LIMITS.maxScopeLines, `At most ${PROPOSAL_LIMITS.maxScopeLines} scope lines for one option.`);

export const ProposalPatchSchema = z.object({
  version: versionField("proposal"),
  coverNote: optionalText("The cover note", PROPOSAL_LIMITS.maxCoverNoteChars),
  terms: optionalText("The terms", PROPOSAL_LIMITS.maxTermsChars),
  validUntil: isoDate,
  depositRule: DepositRuleSchema.nullable(),
  optionIds: z.array(z.string().uuid()).min(1, "Choose at least one design option.").max(PROPOSAL_LIMITS.maxOptions, `At most ${PROPOSAL_LIMITS.maxOptions} options in one proposal.`),
  /** Scope lines per option id. */
  scopes: z.record(z.string().uuid(), ScopeTextSchema),
  photoIds: z.array(z.string().uuid()).max(PROPOSAL_LIMITS.maxPhotos, `At most ${PROPOSAL_LIMITS.maxPhotos} photos.`),
  /** Finding codes to show; null shows all. */
  findingCodes: z.array(z.string().regex(/^[a-z0-9-]+$/).max(60)).max(60).nullable(),
}).partial().required({ version: true }).strict();
export type ProposalPatch = z.infer<typeof ProposalPatchSchema>;

export const AcceptSchema = z.object({
  optionId: z.string({ error: "Choose the option you accept." }).uuid("Choose one of the options in this proposal."),
  signerName: oneLine("Your full name", 120),
  signature: SignatureInputSchema,
  consent: z.object({
    esign: z.literal(true, { error: "Please tick the box to agree to sign electronically." }),
    consentTextVersion: z.string().max(60),
  }).strict(),
}).strict();
export type AcceptInput = z.infer<typeof AcceptSchema>;

/** Sending: sales may give or correct the homeowner's e-mail address here; it is saved on the customer too. */
export const SendSchema = z.object({
  recipientEmail: z.string({ error: "The e-mail address must be text." }).trim().max(254, "The e-mail address is at most 254 characters.").email("That does not look like an e-mail address.").optional(),
}).strict();
export type SendInput = z.infer<typeof SendSchema>;

export const DeclineSchema = z.object({ reason: optionalText("The reason", 2_000) }).strict();

export const VerifyQuerySchema = z.object({ sha256: z.string().trim().toLowerCase().regex(/^[0-9a-f]{64}$/, "Give the SHA-256 as 64 hexadecimal characters.") });
