import { z } from "zod";
import {
  AcceptInviteSchema,
  ChangePasswordSchema,
  PASSWORD_MIN_LENGTH,
  PersonNameSchema,
  ResetRequestSchema,
  SignInSchema,
} from "@shared/schemas/auth";

/*
 * Form schemas for the account pages: the shared request contracts (shared/schemas/auth.ts, the
 * same ones the server validates with), plus the client-only "repeat the password" check.
 */

export { PASSWORD_MIN_LENGTH };

function passwordsMatch(password: string, repeatPassword: string, ctx: z.RefinementCtx) {
  if (password !== repeatPassword) {
    ctx.addIssue({ code: "custom", path: ["repeatPassword"], message: "The two passwords don't match." });
  }
}

export const signInSchema = SignInSchema;
export type SignInInput = z.output<typeof signInSchema>;

export const forgotPasswordSchema = ResetRequestSchema;
export type ForgotPasswordInput = z.output<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z
  .object({ password: AcceptInviteSchema.shape.password, repeatPassword: z.string() })
  .superRefine((value, ctx) => passwordsMatch(value.password, value.repeatPassword, ctx));
export type ResetPasswordInput = z.output<typeof resetPasswordSchema>;

export const acceptInviteSchema = AcceptInviteSchema.extend({ repeatPassword: z.string() }).superRefine((value, ctx) =>
  passwordsMatch(value.password, value.repeatPassword, ctx),
);
export type AcceptInviteInput = z.output<typeof acceptInviteSchema>;

export const profileSchema = z.object({
  name: PersonNameSchema,
  unitSystem: z.enum(["imperial", "metric"]),
});
export type ProfileInput = z.output<typeof profileSchema>;

export const changePasswordSchema = ChangePasswordSchema.extend({ repeatPassword: z.string() }).superRefine(
  (value, ctx) => passwordsMatch(value.newPassword, value.repeatPassword, ctx),
);
export type ChangePasswordInput = z.output<typeof changePasswordSchema>;
