import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { useNavigate, useSearchParams } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { PasswordField, TextField } from "@/components/ui/field";
import { TextLink } from "@/components/ui/text-link";
import { paths, safeNextPath, type SignInNotice } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { applyServerErrors } from "@/lib/form-errors";
import { authKeys } from "../api/queries";
import type { SignInInput } from "../api/schemas";
import { useSignIn } from "../api/sign-in";
import { AuthHeading } from "../components/auth-heading";

const NOTICES: Record<SignInNotice, string> = {
  "signed-out": "You're signed out.",
  "signed-out-everywhere": "You're signed out on every device.",
  "session-ended": "Your session ended. Sign in again to pick up where you left off.",
  "password-reset": "Your password is changed. Sign in with the new one.",
};

/**
 * The sign-in contract (shared/schemas/auth.ts, zod) loads when the visitor starts on the form, not
 * with the page: the first page paints without the validation library (issue 17, delivery).
 */
function loadSignInResolver() {
  return Promise.all([import("@hookform/resolvers/zod"), import("../api/schemas")]).then(
    ([{ zodResolver }, { signInSchema }]) => zodResolver(signInSchema) as Resolver<SignInInput>,
  );
}

const signInResolver: Resolver<SignInInput> = async (values, context, options) =>
  (await loadSignInResolver())(values, context, options);

export function SignInPage() {
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get("next"));
  const notice = NOTICES[searchParams.get("notice") as SignInNotice] as string | undefined;
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const signIn = useSignIn();
  const [formError, setFormError] = useState<{ message: string; isRateLimit: boolean } | null>(null);

  const form = useForm<SignInInput>({
    resolver: signInResolver,
    defaultValues: { email: "", password: "" },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    signIn.mutate(input, {
      onSuccess: async (session) => {
        // A different person may sign in on this device: never show the previous user's cached data.
        queryClient.clear();
        queryClient.setQueryData(authKeys.me(), session);
        await navigate(next, { replace: true });
      },
      onError: (error) => {
        const message = applyServerErrors(error, form.setError, ["email", "password"]);
        if (message) {
          setFormError({ message, isRateLimit: isApiError(error) && error.status === 429 });
        }
      },
    });
  });

  return (
    <>
      <AuthHeading title="Sign in" description="Use the e-mail address your company added you with." />
      {formError ? (
        <Alert
          severity={formError.isRateLimit ? "warning" : "critical"}
          title={formError.isRateLimit ? "Sign-in paused" : "Couldn't sign you in"}
          isAssertive
          className="mb-5"
        >
          {formError.message}
        </Alert>
      ) : notice ? (
        <Alert severity="ok" className="mb-5">
          {notice}
        </Alert>
      ) : null}
      <form onSubmit={onSubmit} onFocus={() => void loadSignInResolver()} noValidate className="space-y-5">
        <TextField
          label="E-mail"
          type="email"
          autoComplete="username"
          inputMode="email"
          autoCapitalize="none"
          spellCheck={false}
          error={errors.email?.message}
          {...form.register("email")}
        />
        <div className="space-y-2">
          <PasswordField
            label="Password"
            autoComplete="current-password"
            error={errors.password?.message}
            {...form.register("password")}
          />
          <p className="text-sm">
            <TextLink to={paths.auth.forgotPassword.getHref()}>Forgot your password?</TextLink>
          </p>
        </div>
        <Button type="submit" size="lg" className="w-full" isLoading={signIn.isPending} loadingText="Signing in…">
          Sign in
        </Button>
      </form>
      <p className="mt-6 text-sm text-ink-600">
        New to the team? Ask your company owner for an invite. It arrives by e-mail.
      </p>
    </>
  );
}
