import { useQuery } from "@tanstack/react-query";
import { PROPOSAL_LIMITS } from "@shared/proposals/limits";
import { useState, type FormEvent } from "react";
import { EstimateConditionsSchema, SEASONS, type EstimateConditions, type Season } from "@shared/airflow-model/index";
import type { CompanyProfilePatch } from "@shared/proposals/schemas";
import { CODE_BASIS_LABELS } from "@shared/schemas/projects";
import { CODE_BASES } from "@shared/ventilation/index";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardFooter, CardHeader, CardTitle } from "@/components/ui/card";
import { Checkbox, Radio, RadioGroup } from "@/components/ui/checkbox";
import { Hint, Label, TextArea, TextField } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { toast } from "@/components/ui/toaster";
import { isApiError } from "@/lib/api-client";
import { companyQueries } from "../api/queries";
import type { CompanyProfile } from "../api/types";
import { useUpdateCompany } from "../api/update-company";
import { useUploadLogo } from "../api/upload-logo";
import { basisPointsToPercentText, centsToDollarsText, parseDepositPercent, parseDollarsToCents, parsePercentToBasisPoints } from "../lib/numbers";

type DepositKind = "none" | "percent" | "amount";

interface FormState {
  name: string;
  licenseNumber: string;
  addressLine: string;
  phone: string;
  email: string;
  defaultTerms: string;
  taxRate: string;
  depositKind: DepositKind;
  depositValue: string;
  depositCap: string;
  isCoolingOffNoticeEnabled: boolean;
  isReminderOn: boolean;
  reminderDays: string;
  upperShareBase: "required" | "provided";
  defaultCodeBasis: CompanyProfile["defaultCodeBasis"];
  defaultClimateZone: string;
  unitSystem: CompanyProfile["unitSystem"];
  /** Airflow-estimate conditions as typed: "summer.atticTempF" → "130". */
  conditions: Record<string, string>;
}

const CONDITION_FIELDS = [
  ["outdoorTempF", "Outdoors", "°F"],
  ["atticTempF", "Attic", "°F"],
  ["houseTempF", "House", "°F"],
  ["windMph", "Wind", "mph"],
] as const;

function conditionsText(c: EstimateConditions): Record<string, string> {
  const out: Record<string, string> = {};
  for (const season of SEASONS) for (const [key] of CONDITION_FIELDS) out[`${season}.${key}`] = String(c[season][key]);
  return out;
}

function toForm(c: CompanyProfile): FormState {
  const rule = c.depositRule;
  return {
    name: c.name,
    licenseNumber: c.licenseNumber ?? "",
    addressLine: c.addressLine ?? "",
    phone: c.phone ?? "",
    email: c.email ?? "",
    defaultTerms: c.defaultTerms ?? "",
    taxRate: basisPointsToPercentText(c.taxRateBasisPoints),
    depositKind: rule ? rule.kind : "none",
    depositValue: rule ? (rule.kind === "percent" ? String(rule.value) : centsToDollarsText(rule.value)) : "",
    depositCap: rule?.capCents != null ? centsToDollarsText(rule.capCents) : "",
    isCoolingOffNoticeEnabled: c.isCoolingOffNoticeEnabled,
    isReminderOn: c.reminderDays !== null,
    reminderDays: String(c.reminderDays ?? 3),
    upperShareBase: c.upperShareBase ?? "required",
    conditions: conditionsText(c.estimateConditions),
    defaultCodeBasis: c.defaultCodeBasis,
    defaultClimateZone: String(c.defaultClimateZone),
    unitSystem: c.unitSystem,
  };
}

const orNull = (text: string) => (text.trim() === "" ? null : text.trim());

/** The form's text turned into the PATCH body, or the messages per field. */
function toPatch(f: FormState): { patch: CompanyProfilePatch | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  if (f.name.trim() === "") errors.name = "Enter the company name.";
  const tax = parsePercentToBasisPoints(f.taxRate, "The tax rate");
  if (!tax.ok) errors.taxRateBasisPoints = tax.message;
  else if (tax.value > 5_000) errors.taxRateBasisPoints = "The tax rate is at most 50 %.";
  let depositRule: CompanyProfilePatch["depositRule"] = null;
  if (f.depositKind !== "none") {
    const value = f.depositKind === "percent" ? parseDepositPercent(f.depositValue) : parseDollarsToCents(f.depositValue, "The deposit amount");
    const cap = f.depositCap.trim() === "" ? ({ ok: true, value: null } as const) : parseDollarsToCents(f.depositCap, "The cap");
    if (!value.ok) errors["depositRule.value"] = value.message;
    if (!cap.ok) errors["depositRule.capCents"] = cap.message;
    if (value.ok && cap.ok) depositRule = { kind: f.depositKind, value: value.value, capCents: cap.value };
  }
  let reminderDays: number | null = null;
  if (f.isReminderOn) {
    const n = Number(f.reminderDays.trim());
    if (!/^\d+$/.test(f.reminderDays.trim()) || n < 1 || n > 60) errors.reminderDays = "Enter a whole number of days from 1 to 60.";
    else reminderDays = n;
  }
  const typed: Record<Season, Record<string, number>> = { summer: {}, winter: {} };
  for (const season of SEASONS) {
    for (const [key] of CONDITION_FIELDS) {
      const raw = (f.conditions[`${season}.${key}`] ?? "").trim();
      const n = raw === "" ? Number.NaN : Number(raw.replace("−", "-"));
      if (!Number.isFinite(n)) errors[`estimateConditions.${season}.${key}`] = "Enter a number.";
      else typed[season][key] = n;
    }
  }
  const conditions = EstimateConditionsSchema.safeParse(typed);
  if (!conditions.success) {
    for (const issue of conditions.error.issues) errors[`estimateConditions.${issue.path.join(".")}`] ??= issue.message;
  }
  if (Object.keys(errors).length > 0 || !tax.ok || !conditions.success) return { patch: null, errors };
  return {
    errors,
    patch: {
      name: f.name.trim(),
      licenseNumber: orNull(f.licenseNumber),
      addressLine: orNull(f.addressLine),
      phone: orNull(f.phone),
      email: orNull(f.email),
      defaultTerms: orNull(f.defaultTerms),
      taxRateBasisPoints: tax.value,
      depositRule,
      isCoolingOffNoticeEnabled: f.isCoolingOffNoticeEnabled,
      reminderDays,
      upperShareBase: f.upperShareBase,
      estimateConditions: conditions.data,
      defaultCodeBasis: f.defaultCodeBasis,
      defaultClimateZone: Number(f.defaultClimateZone),
      unitSystem: f.unitSystem,
    },
  };
}

function LogoCard({ company }: { company: CompanyProfile }) {
  const upload = useUploadLogo();
  const [error, setError] = useState<string | null>(null);
  const logoSrc = company.logo ? `${company.logo.url}?v=${company.logo.sha256 ?? ""}` : null;
  return (
    <Card aria-labelledby="company-logo-title">
      <CardHeader>
        <CardTitle id="company-logo-title">Logo</CardTitle>
        <CardDescription>Printed at the top of every proposal. A PNG or JPEG of at most 2 MB; a wide logo on a white or clear background prints best.</CardDescription>
      </CardHeader>
      <CardBody className="flex flex-col gap-5 sm:flex-row sm:items-center">
        <div className="flex h-28 w-56 shrink-0 items-center justify-center rounded-md border border-dashed border-ink-300 bg-ink-25 p-3">
          {logoSrc ? (
            <img src={logoSrc} alt={`${company.name} logo`} className="max-h-full max-w-full object-contain" />
          ) : (
            <span className="text-sm text-ink-600">No logo yet</span>
          )}
        </div>
        <div className="space-y-2">
          <Label htmlFor="company-logo-file">{company.logo ? "Replace the logo" : "Upload a logo"}</Label>
          <input
            id="company-logo-file"
            type="file"
            accept="image/png,image/jpeg"
            disabled={upload.isPending}
            className="block w-full min-h-touch text-base text-ink-800 file:mr-3 file:h-touch file:rounded-md file:border file:border-ink-400 file:bg-white file:px-4 file:font-semibold file:text-ink-900 hover:file:bg-ink-50"
            onChange={(event) => {
              const file = event.target.files?.[0];
              event.target.value = "";
              if (!file) return;
              setError(null);
              upload.mutate(file, {
                onSuccess: () => toast.success("Logo saved"),
                onError: (e) => setError(isApiError(e) ? (e.fields.file ?? e.message) : "The logo could not be uploaded."),
              });
            }}
          />
          {upload.isPending ? <Hint role="status">Uploading…</Hint> : null}
          {error ? <Alert severity="critical">{error}</Alert> : null}
        </div>
      </CardBody>
    </Card>
  );
}

function ProfileForm({ company }: { company: CompanyProfile }) {
  const update = useUpdateCompany();
  const [form, setForm] = useState<FormState>(() => toForm(company));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const set = <K extends keyof FormState>(key: K, value: FormState[K]) => setForm((f) => ({ ...f, [key]: value }));
  const text = (key: keyof FormState) => ({
    value: form[key] as string,
    onChange: (e: { target: { value: string } }) => set(key, e.target.value as never),
  });

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    setFormError(null);
    const { patch, errors: found } = toPatch(form);
    setErrors(found);
    if (!patch) {
      setFormError("Some details need a look: see the messages beside the fields.");
      return;
    }
    update.mutate(patch, {
      onSuccess: (saved) => {
        setForm(toForm(saved));
        toast.success("Company profile saved");
      },
      onError: (error) => {
        if (isApiError(error)) {
          setErrors(error.fields);
          setFormError(error.message);
        } else setFormError("Something went wrong. Please try again.");
      },
    });
  }

  const depositHint =
    form.depositKind === "percent" ? "Percent of the option's total, like 10." : form.depositKind === "amount" ? "A fixed amount in dollars, like 500." : undefined;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6">
      {formError ? (
        <Alert severity="critical" isAssertive>
          {formError}
        </Alert>
      ) : null}

      <Card aria-labelledby="company-details-title">
        <CardHeader>
          <CardTitle id="company-details-title">Details on every proposal</CardTitle>
          <CardDescription>The homeowner sees these on the proposal page and in the PDF.</CardDescription>
        </CardHeader>
        <CardBody className="grid gap-5 sm:grid-cols-2">
          <TextField label="Company name" autoComplete="organization" error={errors.name} {...text("name")} className="sm:col-span-2" />
          <TextField label="Licence number" isOptional error={errors.licenseNumber} {...text("licenseNumber")} />
          <TextField label="Phone" type="tel" autoComplete="tel" isOptional error={errors.phone} {...text("phone")} />
          <TextField label="E-mail" type="email" autoComplete="email" isOptional error={errors.email} {...text("email")} />
          <TextField label="Address" autoComplete="street-address" isOptional error={errors.addressLine} {...text("addressLine")} className="sm:col-span-2" />
        </CardBody>
      </Card>

      <Card aria-labelledby="company-defaults-title">
        <CardHeader>
          <CardTitle id="company-defaults-title">New projects start with</CardTitle>
          <CardDescription>The estimator can change these on each project.</CardDescription>
        </CardHeader>
        <CardBody className="grid gap-5 sm:grid-cols-2">
          <Select
            label="Code edition"
            hint="The code text your building departments enforce."
            options={CODE_BASES.map((c) => ({ value: c, label: CODE_BASIS_LABELS[c] }))}
            value={form.defaultCodeBasis}
            error={errors.defaultCodeBasis}
            onChange={(e) => set("defaultCodeBasis", e.target.value as FormState["defaultCodeBasis"])}
          />
          <Select
            label="Climate zone"
            hint="From the IECC map, for where you work most."
            options={[1, 2, 3, 4, 5, 6, 7, 8].map((z) => ({ value: String(z), label: `Zone ${z}` }))}
            value={form.defaultClimateZone}
            error={errors.defaultClimateZone}
            onChange={(e) => set("defaultClimateZone", e.target.value)}
          />
          <RadioGroup legend="Units" isInline className="sm:col-span-2">
            <Radio name="unit-system" value="imperial" label="Feet and inches" checked={form.unitSystem === "imperial"} onChange={() => set("unitSystem", "imperial")} />
            <Radio name="unit-system" value="metric" label="Metric" checked={form.unitSystem === "metric"} onChange={() => set("unitSystem", "metric")} />
          </RadioGroup>
        </CardBody>
      </Card>

      <Card aria-labelledby="company-money-title">
        <CardHeader>
          <CardTitle id="company-money-title">Tax and deposit</CardTitle>
          <CardDescription>Used to price every option; a proposal can set its own deposit.</CardDescription>
        </CardHeader>
        <CardBody className="space-y-6">
          <TextField
            label="Sales tax rate"
            hint="As a percent, like 8.25. Stored exactly (8.25 % = 825 basis points)."
            inputMode="decimal"
            className="max-w-xs"
            trailing={<span className="pr-3.5 text-ink-600">%</span>}
            error={errors.taxRateBasisPoints}
            {...text("taxRate")}
          />
          <RadioGroup legend="Deposit asked at signing" isInline>
            <Radio name="deposit-kind" value="none" label="No deposit" checked={form.depositKind === "none"} onChange={() => set("depositKind", "none")} />
            <Radio name="deposit-kind" value="percent" label="A percent of the total" checked={form.depositKind === "percent"} onChange={() => set("depositKind", "percent")} />
            <Radio name="deposit-kind" value="amount" label="A fixed amount" checked={form.depositKind === "amount"} onChange={() => set("depositKind", "amount")} />
          </RadioGroup>
          {form.depositKind !== "none" ? (
            <div className="grid gap-5 sm:grid-cols-2">
              <TextField
                label={form.depositKind === "percent" ? "Deposit percent" : "Deposit amount"}
                hint={depositHint}
                inputMode="decimal"
                trailing={<span className="pr-3.5 text-ink-600">{form.depositKind === "percent" ? "%" : "$"}</span>}
                error={errors["depositRule.value"]}
                {...text("depositValue")}
              />
              <TextField
                label="Never more than"
                hint="A cap in dollars, like 1000. Leave empty for no cap."
                isOptional
                inputMode="decimal"
                trailing={<span className="pr-3.5 text-ink-600">$</span>}
                error={errors["depositRule.capCents"]}
                {...text("depositCap")}
              />
            </div>
          ) : null}
          <Alert severity="info" title="Deposits are limited in some states">
            Some states cap the deposit on a home-improvement contract, for example at the lesser of $1,000 or 10 % of the price. The cap
            here is applied to every proposal, but local law decides what you may ask: check the rules where the house is.
          </Alert>
        </CardBody>
      </Card>

      <Card aria-labelledby="company-terms-title">
        <CardHeader>
          <CardTitle id="company-terms-title">Terms, notices and reminders</CardTitle>
        </CardHeader>
        <CardBody className="space-y-6">
          <TextArea
            label="Default terms"
            hint="Copied into each new proposal, where it can be changed: payment schedule, warranty, what is not included."
            rows={6}
            isOptional
            maxLength={PROPOSAL_LIMITS.maxTermsChars}
            error={errors.defaultTerms}
            {...text("defaultTerms")}
          />
          <Checkbox
            label="Add the three-day cancellation notice"
            description="The FTC cooling-off rule gives a buyer three business days to cancel a sale made at their home (or away from your place of business). When on, the proposal page and PDF carry the notice and the cancellation form."
            checked={form.isCoolingOffNoticeEnabled}
            onChange={(e) => set("isCoolingOffNoticeEnabled", e.target.checked)}
          />
          <div className="space-y-3">
            <Checkbox
              label="Remind the homeowner about an unopened proposal"
              description="One friendly e-mail, sent only if the link has not been opened and the proposal has not expired."
              checked={form.isReminderOn}
              onChange={(e) => set("isReminderOn", e.target.checked)}
            />
            {form.isReminderOn ? (
              <TextField label="Remind after" inputMode="numeric" className="max-w-xs" trailing={<span className="pr-3.5 text-ink-600">days</span>} error={errors.reminderDays} {...text("reminderDays")} />
            ) : null}
          </div>
          <RadioGroup legend="Your building department's reading of the 1/300 vent split (IRC R806.2)">
            <Radio
              name="upper-share-base"
              label="40–50 % of the required area in high vents (the code text; the default)"
              checked={form.upperShareBase === "required"}
              onChange={() => set("upperShareBase", "required")}
            />
            <Radio
              name="upper-share-base"
              label="40–50 % of the vent area provided (a local reading)"
              checked={form.upperShareBase === "provided"}
              onChange={() => set("upperShareBase", "provided")}
            />
          </RadioGroup>
        </CardBody>
      </Card>

      <Card aria-labelledby="company-conditions-title">
        <CardHeader>
          <CardTitle id="company-conditions-title">Conditions for airflow estimates</CardTitle>
          <CardDescription>
            The survey, the option comparison and the proposal estimate where the air goes on a typical summer afternoon and winter night. State
            what is typical where you work: the attic temperature is the one under the roof deck on such a day.
          </CardDescription>
        </CardHeader>
        <CardBody className="grid gap-6 sm:grid-cols-2">
          {SEASONS.map((season) => (
            <fieldset key={season} className="space-y-3">
              <legend className="text-base font-semibold text-ink-900">{season === "summer" ? "Summer afternoon" : "Winter night"}</legend>
              <div className="grid grid-cols-2 gap-3">
                {CONDITION_FIELDS.map(([key, label, unit]) => (
                  <TextField
                    key={key}
                    label={`${label}, ${season}`}
                    inputMode="decimal"
                    trailing={<span className="pr-3.5 text-ink-600">{unit}</span>}
                    error={errors[`estimateConditions.${season}.${key}`]}
                    value={form.conditions[`${season}.${key}`] ?? ""}
                    onChange={(e) => set("conditions", { ...form.conditions, [`${season}.${key}`]: e.target.value })}
                  />
                ))}
              </div>
            </fieldset>
          ))}
        </CardBody>
        <CardFooter>
          <Button type="submit" isLoading={update.isPending} loadingText="Saving…">
            Save company profile
          </Button>
        </CardFooter>
      </Card>
    </form>
  );
}

/** Settings → Company profile (owner only): what every proposal prints. */
export function CompanyPage() {
  const query = useQuery(companyQueries.profile());
  return (
    <>
      <PageHeader title="Company profile" description="How your company appears on proposals and e-mails, and the money rules every proposal uses." />
      {query.isPending ? (
        <LoadingBlock label="Loading the company profile…" />
      ) : query.isError ? (
        <Alert severity="critical" title="The company profile could not be loaded">
          {query.error.message}
        </Alert>
      ) : (
        <div className="max-w-3xl space-y-6">
          <LogoCard company={query.data} />
          <ProfileForm key={query.data.id} company={query.data} />
        </div>
      )}
    </>
  );
}
