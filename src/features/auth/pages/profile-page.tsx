import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardFooter, CardHeader, CardTitle } from "@/components/ui/card";
import { Radio, RadioGroup } from "@/components/ui/checkbox";
import { ConfirmDialog } from "@/components/ui/dialog";
import { PasswordField, TextField } from "@/components/ui/field";
import { PageHeader } from "@/components/ui/page-header";
import { toast } from "@/components/ui/toaster";
import { ROLE_LABELS } from "@/lib/authorization";
import { applyServerErrors } from "@/lib/form-errors";
import { useSession } from "@/lib/session";
import { useChangePassword } from "../api/change-password";
import { changePasswordSchema, profileSchema, type ChangePasswordInput, type ProfileInput } from "../api/schemas";
import { useSignOutEverywhere } from "../api/sign-out-everywhere";
import { useUpdateMe } from "../api/update-me";
import { NewPasswordFields } from "../components/new-password-fields";

function DetailsCard() {
  const { user, company } = useSession();
  const updateMe = useUpdateMe();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ProfileInput>({
    resolver: zodResolver(profileSchema),
    defaultValues: { name: user.name, unitSystem: user.unitSystem },
  });
  const { errors, isDirty } = form.formState;

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    updateMe.mutate(input, {
      onSuccess: (session) => {
        form.reset({ name: session.user.name, unitSystem: session.user.unitSystem });
        toast.success("Profile saved");
      },
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ["name", "unitSystem"])),
    });
  });

  return (
    <Card aria-labelledby="profile-details-title">
      <form onSubmit={onSubmit} noValidate>
        <CardHeader>
          <CardTitle id="profile-details-title">Your details</CardTitle>
          <CardDescription>Your name appears on proposals you prepare or send.</CardDescription>
        </CardHeader>
        <CardBody className="space-y-6">
          {formError ? (
            <Alert severity="critical" isAssertive>
              {formError}
            </Alert>
          ) : null}
          <dl className="grid gap-4 sm:grid-cols-3">
            <div className="min-w-0">
              <dt className="text-sm font-medium text-ink-600">E-mail</dt>
              <dd className="text-base break-all text-ink-900">{user.email}</dd>
            </div>
            <div>
              <dt className="text-sm font-medium text-ink-600">Role</dt>
              <dd className="mt-0.5">
                <Badge tone="brand">{ROLE_LABELS[user.role]}</Badge>
              </dd>
            </div>
            <div className="min-w-0">
              <dt className="text-sm font-medium text-ink-600">Company</dt>
              <dd className="text-base text-ink-900">{company.name}</dd>
            </div>
          </dl>
          <TextField
            label="Name"
            autoComplete="name"
            className="max-w-form"
            error={errors.name?.message}
            {...form.register("name")}
          />
          <RadioGroup
            legend="Units"
            hint="How lengths and areas are shown to you. Saved surveys are not changed."
            error={errors.unitSystem?.message}
            isInline
            className="max-w-reading"
          >
            <Radio value="imperial" label="Imperial" description="Feet, inches, sq ft, sq in" {...form.register("unitSystem")} />
            <Radio value="metric" label="Metric" description="Metres, centimetres, m², cm²" {...form.register("unitSystem")} />
          </RadioGroup>
        </CardBody>
        <CardFooter>
          <Button type="submit" isLoading={updateMe.isPending} loadingText="Saving…" disabled={!isDirty}>
            Save details
          </Button>
        </CardFooter>
      </form>
    </Card>
  );
}

function PasswordCard() {
  const { user } = useSession();
  const changePassword = useChangePassword();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ChangePasswordInput>({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: "", newPassword: "", repeatPassword: "" },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(({ currentPassword, newPassword }) => {
    setFormError(null);
    changePassword.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => {
          form.reset();
          toast.success("Password changed");
        },
        onError: (error) =>
          setFormError(applyServerErrors(error, form.setError, ["currentPassword", "newPassword"])),
      },
    );
  });

  return (
    <Card aria-labelledby="profile-password-title">
      <form onSubmit={onSubmit} noValidate>
        <CardHeader>
          <CardTitle id="profile-password-title">Password</CardTitle>
          <CardDescription>Enter your current password to choose a new one.</CardDescription>
        </CardHeader>
        <CardBody className="max-w-form space-y-5">
          {formError ? (
            <Alert severity="critical" isAssertive>
              {formError}
            </Alert>
          ) : null}
          <input type="email" name="username" autoComplete="username" value={user.email} readOnly hidden />
          <PasswordField
            label="Current password"
            autoComplete="current-password"
            error={errors.currentPassword?.message}
            {...form.register("currentPassword")}
          />
          <NewPasswordFields
            password={form.register("newPassword")}
            repeatPassword={form.register("repeatPassword")}
            passwordError={errors.newPassword?.message}
            repeatPasswordError={errors.repeatPassword?.message}
          />
        </CardBody>
        <CardFooter>
          <Button type="submit" isLoading={changePassword.isPending} loadingText="Changing…">
            Change password
          </Button>
        </CardFooter>
      </form>
    </Card>
  );
}

function DevicesCard() {
  const [isConfirming, setIsConfirming] = useState(false);
  const signOutEverywhere = useSignOutEverywhere();
  return (
    <Card aria-labelledby="profile-devices-title">
      <CardHeader>
        <CardTitle id="profile-devices-title">Signed-in devices</CardTitle>
        <CardDescription>
          Lost a phone, or signed in on a shared computer? Sign out everywhere ends every session, this one included.
        </CardDescription>
      </CardHeader>
      <CardFooter className="mt-5">
        <Button variant="secondary" onClick={() => setIsConfirming(true)}>
          Sign out everywhere
        </Button>
      </CardFooter>
      <ConfirmDialog
        open={isConfirming}
        onOpenChange={setIsConfirming}
        title="Sign out on every device?"
        description="You'll need your password to sign in again on each phone, tablet and computer."
        confirmLabel="Sign out everywhere"
        confirmVariant="danger"
        isPending={signOutEverywhere.isPending}
        onConfirm={() =>
          signOutEverywhere.mutate(undefined, {
            onError: (error) => toast.error("Couldn't sign out everywhere", { description: error.message }),
          })
        }
      />
    </Card>
  );
}

export function ProfilePage() {
  return (
    <>
      <PageHeader title="My profile" description="Your name, units and password." />
      <div className="space-y-6">
        <DetailsCard />
        <PasswordCard />
        <DevicesCard />
      </div>
    </>
  );
}
