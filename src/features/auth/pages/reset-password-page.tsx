import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Link, useNavigate, useSearchParams } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { TextLink } from "@/components/ui/text-link";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { applyServerErrors } from "@/lib/form-errors";
import { useConfirmPasswordReset } from "../api/confirm-password-reset";
import { resetPasswordSchema, type ResetPasswordInput } from "../api/schemas";
import { AuthHeading } from "../components/auth-heading";
import { NewPasswordFields } from "../components/new-password-fields";

export function ResetPasswordPage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get("token") ?? "";
  const navigate = useNavigate();
  const confirm = useConfirmPasswordReset();
  const [formError, setFormError] = useState<{ message: string; isLinkProblem: boolean } | null>(null);
  const form = useForm<ResetPasswordInput>({
    resolver: zodResolver(resetPasswordSchema),
    defaultValues: { password: "", repeatPassword: "" },
  });
  const { errors } = form.formState;

  if (!token) {
    return (
      <>
        <AuthHeading title="This reset link is incomplete" />
        <Alert severity="warning" className="mb-5">
          The link is missing its code. Open it straight from the e-mail, or ask for a new one.
        </Alert>
        <Link to={paths.auth.forgotPassword.getHref()} className={buttonStyles({ className: "w-full sm:w-auto" })}>
          Send me a new link
        </Link>
      </>
    );
  }

  const onSubmit = form.handleSubmit(({ password }) => {
    setFormError(null);
    confirm.mutate(
      { token, password },
      {
        onSuccess: () => navigate(paths.auth.signIn.getHref(undefined, "password-reset"), { replace: true }),
        onError: (error) => {
          const message = applyServerErrors(error, form.setError, ["password"]);
          if (message) {
            const isLinkProblem =
              isApiError(error) && ([404, 410].includes(error.status) || (error.status === 400 && "token" in error.fields));
            setFormError({ message, isLinkProblem });
          }
        },
      },
    );
  });

  return (
    <>
      <AuthHeading title="Choose a new password" description="After this you'll sign in with the new password." />
      {formError ? (
        <Alert severity="critical" isAssertive className="mb-5">
          <p>{formError.message}</p>
          {formError.isLinkProblem ? (
            <p className="mt-2">
              <TextLink to={paths.auth.forgotPassword.getHref()}>Send me a new link</TextLink>
            </p>
          ) : null}
        </Alert>
      ) : null}
      <form onSubmit={onSubmit} noValidate className="space-y-5">
        <NewPasswordFields
          password={form.register("password")}
          repeatPassword={form.register("repeatPassword")}
          passwordError={errors.password?.message}
          repeatPasswordError={errors.repeatPassword?.message}
        />
        <Button type="submit" size="lg" className="w-full" isLoading={confirm.isPending} loadingText="Saving…">
          Save new password
        </Button>
      </form>
    </>
  );
}
