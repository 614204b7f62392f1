import { z } from "zod";
import { ROLES } from "./roles.ts";

/** Request contracts of the accounts API, shared by the client's forms and the server. */
export const EmailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(3, "Enter your e-mail address.")
  .max(254, "An e-mail address is at most 254 characters.")
  .email("That does not look like an e-mail address.")
  .transform((s) => s.toLowerCase());

export const PASSWORD_MIN_LENGTH = 12;
export const NewPasswordSchema = z
  .string({ error: "Enter a password." })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(200, "Use at most 200 characters.");

export const PersonNameSchema = z
  .string({ error: "Enter a name." })
  .trim()
  .min(1, "Enter a name.")
  .max(120, "Use at most 120 characters.");

export const SignInSchema = z.object({
  email: EmailSchema,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").max(200, "Use at most 200 characters."),
});

export const UpdateMeSchema = z
  .object({ name: PersonNameSchema.optional(), unitSystem: z.enum(["imperial", "metric"]).optional() })
  .strict();

export const ChangePasswordSchema = z.object({
  currentPassword: z.string({ error: "Enter your current password." }).min(1, "Enter your current password.").max(200),
  newPassword: NewPasswordSchema,
});

export const ResetRequestSchema = z.object({ email: EmailSchema });
export const TokenSchema = z.string({ error: "The link is missing its token." }).regex(/^[A-Za-z0-9_-]{20,100}$/, "This link is not valid.");
export const ResetConfirmSchema = z.object({ token: TokenSchema, password: NewPasswordSchema });
export const AcceptInviteSchema = z.object({ name: PersonNameSchema, password: NewPasswordSchema });

export const InviteSchema = z.object({ email: EmailSchema, role: z.enum(ROLES, { error: "Choose a role." }) });
export const ChangeRoleSchema = z.object({ role: z.enum(ROLES, { error: "Choose a role." }) }).strict();

export type SignInInput = z.infer<typeof SignInSchema>;
