import { zodResolver } from "@hookform/resolvers/zod";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useNavigate, useParams } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { LoadingBlock } from "@/components/ui/spinner";
import { TextLink } from "@/components/ui/text-link";
import { DEFAULT_SIGNED_IN_PATH, paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from "@/lib/authorization";
import { applyServerErrors } from "@/lib/form-errors";
import { useAcceptInvite } from "../api/accept-invite";
import { authKeys, authQueries } from "../api/queries";
import { acceptInviteSchema, type AcceptInviteInput } from "../api/schemas";
import { AuthHeading } from "../components/auth-heading";
import { NewPasswordFields } from "../components/new-password-fields";

function isDeadLink(error: unknown): boolean {
  return isApiError(error) && (error.status === 404 || error.status === 410);
}

function DeadInvite() {
  return (
    <>
      <AuthHeading title="This invite can't be used" />
      <Alert severity="warning" className="mb-5">
        The link has expired or was already used. Invites last 7 days. Ask the person who invited you to send a new
        one.
      </Alert>
      <p className="text-sm text-ink-700">
        Already set up your account? <TextLink to={paths.auth.signIn.getHref()}>Sign in</TextLink>
      </p>
    </>
  );
}

export function AcceptInvitePage() {
  const { token = "" } = useParams();
  const invite = useQuery({ ...authQueries.invite(token), enabled: token !== "" });
  const accept = useAcceptInvite();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const [formError, setFormError] = useState<string | null>(null);
  const [isDead, setIsDead] = useState(false);
  const form = useForm<AcceptInviteInput>({
    resolver: zodResolver(acceptInviteSchema),
    defaultValues: { name: "", password: "", repeatPassword: "" },
  });
  const { errors } = form.formState;

  if (!token || isDead || (invite.isError && isDeadLink(invite.error))) return <DeadInvite />;
  if (invite.isPending) return <LoadingBlock label="Opening your invite…" />;
  if (invite.isError) {
    return (
      <>
        <AuthHeading title="We couldn't open this invite" />
        <Alert severity="critical" className="mb-5">
          {invite.error.message}
        </Alert>
        <Button variant="secondary" onClick={() => invite.refetch()} isLoading={invite.isFetching}>
          Try again
        </Button>
      </>
    );
  }

  const { email, companyName, role } = invite.data;

  const onSubmit = form.handleSubmit(({ name, password }) => {
    setFormError(null);
    accept.mutate(
      { token, name, password },
      {
        onSuccess: async (session) => {
          queryClient.clear();
          queryClient.setQueryData(authKeys.me(), session);
          await navigate(DEFAULT_SIGNED_IN_PATH, { replace: true });
        },
        onError: (error) => {
          if (isDeadLink(error)) return setIsDead(true);
          const message = applyServerErrors(error, form.setError, ["name", "password"]);
          if (message) setFormError(message);
        },
      },
    );
  });

  return (
    <>
      <AuthHeading
        title={`Join ${companyName}`}
        description="Add your name and choose a password to finish setting up your account."
      />
      <dl className="mb-6 grid gap-3 rounded-md border border-ink-200 bg-ink-25 px-4 py-3.5 text-base">
        <div>
          <dt className="text-sm font-medium text-ink-600">E-mail</dt>
          <dd className="font-medium break-all text-ink-900">{email}</dd>
        </div>
        <div>
          <dt className="text-sm font-medium text-ink-600">Role</dt>
          <dd className="mt-0.5 space-y-1">
            <Badge tone="brand">{ROLE_LABELS[role]}</Badge>
            <p className="text-sm text-ink-700">{ROLE_DESCRIPTIONS[role]}</p>
          </dd>
        </div>
      </dl>
      {formError ? (
        <Alert severity="critical" isAssertive className="mb-5">
          {formError}
        </Alert>
      ) : null}
      <form onSubmit={onSubmit} noValidate className="space-y-5">
        {/* Lets password managers save the new login under the right address. */}
        <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
        <TextField
          label="Your name"
          hint="As customers will see it on proposals."
          autoComplete="name"
          error={errors.name?.message}
          {...form.register("name")}
        />
        <NewPasswordFields
          label="Choose a password"
          password={form.register("password")}
          repeatPassword={form.register("repeatPassword")}
          passwordError={errors.password?.message}
          repeatPasswordError={errors.repeatPassword?.message}
        />
        <Button type="submit" size="lg" className="w-full" isLoading={accept.isPending} loadingText="Setting up…">
          Create my account
        </Button>
      </form>
    </>
  );
}
