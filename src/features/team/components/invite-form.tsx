import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { InviteSchema } from "@shared/schemas/auth";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { MailIcon } from "@/components/ui/icons";
import { Select } from "@/components/ui/select";
import { toast } from "@/components/ui/toaster";
import { ROLE_DESCRIPTIONS, ROLE_LABELS, ROLES } from "@/lib/authorization";
import { applyServerErrors } from "@/lib/form-errors";
import { useInviteMember } from "../api/invite-member";

const inviteSchema = InviteSchema;
type InviteInput = z.input<typeof inviteSchema>;
type InviteOutput = z.output<typeof inviteSchema>;

const roleOptions = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function InviteForm() {
  const invite = useInviteMember();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<InviteInput, unknown, InviteOutput>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: "", role: "estimator" },
  });
  const { errors } = form.formState;
  const role = useWatch({ control: form.control, name: "role" });

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    invite.mutate(input, {
      onSuccess: () => {
        toast.success(`Invite sent to ${input.email}`, { description: "The link works for 7 days." });
        form.reset({ email: "", role: input.role });
      },
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ["email", "role"])),
    });
  });

  return (
    <Card aria-labelledby="invite-title">
      <CardHeader>
        <CardTitle id="invite-title">Invite someone</CardTitle>
        <CardDescription>They get an e-mail with a link to choose their password. The link lasts 7 days.</CardDescription>
      </CardHeader>
      <CardBody>
        {formError ? (
          <Alert severity="critical" isAssertive className="mb-5">
            {formError}
          </Alert>
        ) : null}
        <form onSubmit={onSubmit} noValidate className="grid gap-5 md:grid-cols-[minmax(0,3fr)_minmax(0,2fr)_auto] md:items-start">
          <TextField
            label="E-mail"
            type="email"
            inputMode="email"
            autoComplete="off"
            autoCapitalize="none"
            spellCheck={false}
            placeholder="name@example.com"
            error={errors.email?.message}
            {...form.register("email")}
          />
          <Select
            label="Role"
            options={roleOptions}
            error={errors.role?.message}
            hint={role && role in ROLE_DESCRIPTIONS ? ROLE_DESCRIPTIONS[role as keyof typeof ROLE_DESCRIPTIONS] : undefined}
            hintPlacement="below"
            {...form.register("role")}
          />
          <Button
            type="submit"
            icon={<MailIcon />}
            isLoading={invite.isPending}
            loadingText="Sending…"
            className="w-full md:mt-8 md:w-auto"
          >
            Send invite
          </Button>
        </form>
      </CardBody>
    </Card>
  );
}
