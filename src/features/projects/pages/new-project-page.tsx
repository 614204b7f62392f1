import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Link, useNavigate } from "react-router";
import { CODE_BASIS_LABELS, CustomerInputSchema, ProjectInputSchema } from "@shared/schemas/projects";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardFooter, CardHeader, CardTitle } from "@/components/ui/card";
import { TextArea, TextField } from "@/components/ui/field";
import { ChevronLeftIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Select } from "@/components/ui/select";
import { toast } from "@/components/ui/toaster";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { useAddCustomer } from "../api/add-customer";
import { useCreateProject } from "../api/create-project";
import { projectQueries } from "../api/queries";
import { CustomerPicker, type CustomerChoice, type NewCustomerDraft } from "../components/customer-picker";
import { ProjectBasisFields, type ProjectBasisValue } from "../components/project-basis-fields";
import { fitMoistureRegime } from "../lib/project-options";

export interface NewProjectPageProps {
  /** Start with this customer chosen (from the customers list). */
  initialCustomerId: string | null;
  /** The signed-in user, assigned as estimator when they are one. */
  currentUser: { id: string; role: string };
}

type FieldErrors = Record<string, string>;

const blankToNull = (v: string) => (v.trim() === "" ? null : v.trim());

export function NewProjectPage({ initialCustomerId, currentUser }: NewProjectPageProps) {
  const navigate = useNavigate();
  const initialCustomer = useQuery({ ...projectQueries.customer(initialCustomerId ?? ""), enabled: Boolean(initialCustomerId) });
  const estimators = useQuery(projectQueries.estimators());
  const [picked, setPicked] = useState<CustomerChoice | null>(null);
  const choice: CustomerChoice = picked ?? { mode: "existing", customer: initialCustomer.data ?? null };
  const [title, setTitle] = useState("");
  const [siteAddress, setSiteAddress] = useState("");
  const [estimatorId, setEstimatorId] = useState<string>(currentUser.role === "estimator" ? currentUser.id : "");
  const defaults = useQuery(projectQueries.defaults());
  // The climate zone starts at the company's default until the estimator picks one.
  const [basisEdits, setBasis] = useState<ProjectBasisValue | null>(null);
  const defaultZone = defaults.data?.climateZone ?? 4;
  const basis: ProjectBasisValue = basisEdits ?? {
    climateZone: defaultZone,
    moistureRegime: fitMoistureRegime(defaultZone, "A"),
    codeBasis: "",
    ceilingVaporRetarder: "none",
    roofColor: "medium",
  };
  const [errors, setErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const addCustomer = useAddCustomer();
  const createProject = useCreateProject();
  const isPending = addCustomer.isPending || createProject.isPending;

  const customerName = choice.mode === "new" ? choice.draft.name.trim() : choice.customer?.name;
  const billingAddress = choice.mode === "existing" ? choice.customer?.billingAddress : null;

  async function onSubmit(event: React.FormEvent) {
    event.preventDefault();
    setFormError(null);
    const next: FieldErrors = {};
    let newCustomer: { name: string; phone: string | null; email: string | null } | null = null;
    if (choice.mode === "new") {
      newCustomer = { name: choice.draft.name, phone: blankToNull(choice.draft.phone), email: blankToNull(choice.draft.email) };
      const parsed = CustomerInputSchema.safeParse(newCustomer);
      if (!parsed.success) for (const issue of parsed.error.issues) next[`customer.${String(issue.path[0])}`] ??= issue.message;
    } else if (!choice.customer) {
      next.customerId = "Choose the customer, or add a new one.";
    }
    const projectInput = {
      // A placeholder id only to check the other fields; the real one is set below.
      customerId: choice.mode === "existing" && choice.customer ? choice.customer.id : "00000000-0000-4000-8000-000000000000",
      title: title.trim() || (customerName ? `${customerName} attic survey` : ""),
      siteAddress,
      estimatorId: estimatorId || null,
      climateZone: basis.climateZone,
      moistureRegime: basis.moistureRegime,
      ...(basis.codeBasis ? { codeBasis: basis.codeBasis } : {}),
      ceilingVaporRetarder: basis.ceilingVaporRetarder,
      roofColor: basis.roofColor,
    };
    const parsedProject = ProjectInputSchema.safeParse(projectInput);
    if (!parsedProject.success) for (const issue of parsedProject.error.issues) next[String(issue.path[0])] ??= issue.message;
    setErrors(next);
    if (Object.keys(next).length > 0) {
      setFormError("Some details need a look; they are marked below.");
      return;
    }
    try {
      let customerId = projectInput.customerId;
      if (newCustomer) {
        const created = await addCustomer.mutateAsync(newCustomer);
        customerId = created.id;
        setPicked({ mode: "existing", customer: created });
      }
      const project = await createProject.mutateAsync({ ...projectInput, customerId });
      toast.success("Project started", { description: "Add the attic spaces next." });
      void navigate(paths.app.project.getHref(project.id));
    } catch (error) {
      if (isApiError(error)) {
        setErrors(error.fields);
        setFormError(error.message);
      } else setFormError("Something went wrong. Please try again.");
    }
  }

  const newErrors: Partial<Record<keyof NewCustomerDraft, string>> = {
    name: errors["customer.name"],
    phone: errors["customer.phone"],
    email: errors["customer.email"],
  };
  const estimatorOptions = (estimators.data ?? []).map((e) => ({ value: e.id, label: e.name }));

  return (
    <>
      <PageHeader
        eyebrow={
          <Link to={paths.app.projects.getHref()} className="inline-flex min-h-touch items-center gap-1 hover:text-ink-900 md:min-h-0">
            <ChevronLeftIcon className="size-4" /> Projects
          </Link>
        }
        title="New project"
        description="Who it's for, where the house is, and what the code check depends on. You add the attic spaces next."
      />
      <form onSubmit={onSubmit} noValidate className="max-w-reading space-y-6">
        {formError ? (
          <Alert severity="critical" isAssertive>
            {formError}
          </Alert>
        ) : null}
        <Card>
          <CardHeader>
            <CardTitle>Customer and site</CardTitle>
          </CardHeader>
          <CardBody className="space-y-5">
            <CustomerPicker value={choice} onChange={setPicked} error={errors.customerId} newErrors={newErrors} />
            <TextField
              label="Project title"
              hint={customerName ? `Leave empty for "${customerName} attic survey".` : "A short name you'll recognise in the list."}
              value={title}
              error={errors.title}
              onChange={(e) => setTitle(e.target.value)}
              autoComplete="off"
            />
            <div className="space-y-2">
              <TextArea
                label="Site address"
                rows={2}
                value={siteAddress}
                error={errors.siteAddress}
                onChange={(e) => setSiteAddress(e.target.value)}
              />
              {billingAddress && siteAddress.trim() !== billingAddress.trim() ? (
                <Button variant="ghost" size="sm" onClick={() => setSiteAddress(billingAddress)}>
                  Use the billing address
                </Button>
              ) : null}
            </div>
            <Select
              label="Estimator"
              options={estimatorOptions}
              placeholder="Not assigned"
              value={estimatorId}
              error={errors.estimatorId}
              onChange={(e) => setEstimatorId(e.target.value)}
            />
          </CardBody>
        </Card>
        <Card>
          <CardHeader>
            <CardTitle>Code check basis</CardTitle>
            <CardDescription>You can change these later on the project page; the analysis follows.</CardDescription>
          </CardHeader>
          <CardBody>
            <ProjectBasisFields
              value={basis}
              onChange={(patch) => setBasis({ ...basis, ...patch })}
              errors={errors}
              companyDefaultLabel={defaults.data ? `Company default (${CODE_BASIS_LABELS[defaults.data.codeBasis]})` : "Company default"}
            />
          </CardBody>
          <CardFooter>
            <Link to={paths.app.projects.getHref()} className={buttonStyles({ variant: "secondary", className: "w-full sm:w-auto" })}>
              Cancel
            </Link>
            <Button type="submit" isLoading={isPending} loadingText="Starting…" className="w-full sm:w-auto">
              Start project
            </Button>
          </CardFooter>
        </Card>
      </form>
    </>
  );
}
