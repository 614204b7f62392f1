import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { TextLink } from "@/components/ui/text-link";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { applyServerErrors } from "@/lib/form-errors";
import { Link } from "react-router";
import { useRequestPasswordReset } from "../api/request-password-reset";
import { forgotPasswordSchema, type ForgotPasswordInput } from "../api/schemas";
import { AuthHeading } from "../components/auth-heading";

export function ForgotPasswordPage() {
  const request = useRequestPasswordReset();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<{ message: string; isRateLimit: boolean } | null>(null);
  const form = useForm<ForgotPasswordInput>({
    resolver: zodResolver(forgotPasswordSchema),
    defaultValues: { email: "" },
  });

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    request.mutate(input, {
      onSuccess: () => setSentTo(input.email),
      onError: (error) => {
        const message = applyServerErrors(error, form.setError, ["email"]);
        if (message) setFormError({ message, isRateLimit: isApiError(error) && error.status === 429 });
      },
    });
  });

  if (sentTo) {
    return (
      <>
        <AuthHeading title="Check your e-mail" />
        <Alert severity="ok" title="Link sent" className="mb-5">
          If an account exists for <strong className="font-semibold break-all">{sentTo}</strong>, we sent a link to
          set a new password. It can take a minute or two; check the spam folder too.
        </Alert>
        <div className="flex flex-col gap-3 sm:flex-row">
          <Link to={paths.auth.signIn.getHref()} className={buttonStyles({ className: "w-full sm:w-auto" })}>
            Back to sign in
          </Link>
          <Button variant="secondary" onClick={() => setSentTo(null)} className="w-full sm:w-auto">
            Use a different address
          </Button>
        </div>
      </>
    );
  }

  return (
    <>
      <AuthHeading
        title="Reset your password"
        description="Enter the e-mail address you sign in with. We'll send a link to choose a new password."
      />
      {formError ? (
        <Alert severity={formError.isRateLimit ? "warning" : "critical"} isAssertive className="mb-5">
          {formError.message}
        </Alert>
      ) : null}
      <form onSubmit={onSubmit} noValidate className="space-y-5">
        <TextField
          label="E-mail"
          type="email"
          autoComplete="username"
          inputMode="email"
          autoCapitalize="none"
          spellCheck={false}
          error={form.formState.errors.email?.message}
          {...form.register("email")}
        />
        <Button type="submit" size="lg" className="w-full" isLoading={request.isPending} loadingText="Sending…">
          Send reset link
        </Button>
      </form>
      <p className="mt-6 text-sm text-ink-700">
        Remembered it? <TextLink to={paths.auth.signIn.getHref()}>Back to sign in</TextLink>
      </p>
    </>
  );
}
