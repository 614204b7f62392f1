import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { CustomerInputSchema } from "@shared/schemas/projects";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ConfirmDialog, Dialog, DialogClose, DialogContent } from "@/components/ui/dialog";
import { TextArea, TextField } from "@/components/ui/field";
import { toast } from "@/components/ui/toaster";
import { isApiError } from "@/lib/api-client";
import { applyServerErrors } from "@/lib/form-errors";
import { useCreateCustomer } from "../api/create-customer";
import { useDeleteCustomer } from "../api/delete-customer";
import type { Customer } from "../api/types";
import { useUpdateCustomer } from "../api/update-customer";

type FormInput = z.input<typeof CustomerInputSchema>;
type FormOutput = z.output<typeof CustomerInputSchema>;
const FIELDS = ["name", "phone", "email", "billingAddress", "notes"] as const;

const blankToNull = (value: string | null | undefined) => (value == null || value.trim() === "" ? null : value.trim());

export interface CustomerFormDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  /** The customer to edit; omit to add a new one. */
  customer?: Customer | null;
  /** Only look, change nothing. */
  isReadOnly?: boolean;
  /** Sales correct contact details but do not delete customers. */
  canDelete?: boolean;
  onSaved?: (customer: Customer) => void;
}

/** Add or edit a customer: name, phone, e-mail, billing address and notes. */
export function CustomerFormDialog({ open, onOpenChange, customer, isReadOnly = false, canDelete = true, onSaved }: CustomerFormDialogProps) {
  return (
    <Dialog open={open} onOpenChange={onOpenChange}>
      {open ? (
        <CustomerFormBody
          key={customer?.id ?? "new"}
          customer={customer ?? null}
          isReadOnly={isReadOnly}
          canDelete={canDelete}
          onDone={(saved) => {
            onOpenChange(false);
            if (saved) onSaved?.(saved);
          }}
        />
      ) : null}
    </Dialog>
  );
}

function CustomerFormBody({
  customer,
  isReadOnly,
  canDelete,
  onDone,
}: {
  customer: Customer | null;
  isReadOnly: boolean;
  canDelete: boolean;
  onDone: (saved: Customer | null) => void;
}) {
  const create = useCreateCustomer();
  const update = useUpdateCustomer();
  const remove = useDeleteCustomer();
  const [formError, setFormError] = useState<string | null>(null);
  const [isConfirmingDelete, setIsConfirmingDelete] = useState(false);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(CustomerInputSchema),
    defaultValues: {
      name: customer?.name ?? "",
      phone: customer?.phone ?? "",
      email: customer?.email ?? "",
      billingAddress: customer?.billingAddress ?? "",
      notes: customer?.notes ?? "",
    },
  });
  const { errors } = form.formState;
  const isPending = create.isPending || update.isPending;

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    const input = {
      name: values.name,
      phone: blankToNull(values.phone),
      email: blankToNull(values.email),
      billingAddress: blankToNull(values.billingAddress),
      notes: blankToNull(values.notes),
    };
    const onError = (error: Error) => setFormError(applyServerErrors(error, form.setError, FIELDS));
    if (customer) {
      update.mutate(
        { id: customer.id, input },
        {
          onSuccess: (saved) => {
            toast.success(`${saved.name} saved`);
            onDone(saved);
          },
          onError,
        },
      );
    } else {
      create.mutate(input, {
        onSuccess: (saved) => {
          toast.success(`${saved.name} added`);
          onDone(saved);
        },
        onError,
      });
    }
  });

  const title = isReadOnly ? (customer?.name ?? "Customer") : customer ? `Edit ${customer.name}` : "Add a customer";
  return (
    <>
      <DialogContent
        title={title}
        description={
          isReadOnly
            ? "Contact details. Only owners and estimators change customers."
            : "The homeowner's contact details. Only the name is required."
        }
        footer={
          isReadOnly ? (
            <DialogClose asChild>
              <Button variant="secondary" className="w-full sm:w-auto">
                Close
              </Button>
            </DialogClose>
          ) : (
            <>
              {customer && canDelete ? (
                <Button
                  variant="ghost"
                  className="w-full text-critical-700 hover:bg-critical-50 sm:mr-auto sm:w-auto"
                  onClick={() => setIsConfirmingDelete(true)}
                >
                  Delete customer
                </Button>
              ) : null}
              <DialogClose asChild>
                <Button variant="secondary" className="w-full sm:w-auto" disabled={isPending}>
                  Cancel
                </Button>
              </DialogClose>
              <Button
                type="submit"
                form="customer-form"
                isLoading={isPending}
                loadingText="Saving…"
                className="w-full sm:w-auto"
              >
                {customer ? "Save changes" : "Add customer"}
              </Button>
            </>
          )
        }
      >
        {formError ? (
          <Alert severity="critical" isAssertive className="mb-4">
            {formError}
          </Alert>
        ) : null}
        <form id="customer-form" onSubmit={onSubmit} noValidate className="space-y-4">
          <fieldset disabled={isReadOnly} className="space-y-4">
            <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField
                label="Phone"
                type="tel"
                inputMode="tel"
                autoComplete="off"
                isOptional
                error={errors.phone?.message}
                {...form.register("phone")}
              />
              <TextField
                label="E-mail"
                type="email"
                inputMode="email"
                autoCapitalize="none"
                spellCheck={false}
                autoComplete="off"
                isOptional
                error={errors.email?.message}
                {...form.register("email")}
              />
            </div>
            <TextArea
              label="Billing address"
              rows={2}
              isOptional
              error={errors.billingAddress?.message}
              {...form.register("billingAddress")}
            />
            <TextArea label="Notes" rows={3} isOptional error={errors.notes?.message} {...form.register("notes")} />
          </fieldset>
        </form>
      </DialogContent>
      {customer ? (
        <ConfirmDialog
          open={isConfirmingDelete}
          onOpenChange={setIsConfirmingDelete}
          title={`Delete ${customer.name}?`}
          description="Their contact details are removed. A customer with projects can't be deleted."
          confirmLabel="Delete customer"
          confirmVariant="danger"
          isPending={remove.isPending}
          onConfirm={() =>
            remove.mutate(customer.id, {
              onSuccess: () => {
                setIsConfirmingDelete(false);
                toast.success(`${customer.name} deleted`);
                onDone(null);
              },
              onError: (error) => {
                setIsConfirmingDelete(false);
                setFormError(
                  isApiError(error) && error.code === "customer-has-projects"
                    ? "This customer has projects, so they can't be deleted. Their projects keep their details."
                    : error.message,
                );
              },
            })
          }
        />
      ) : null}
    </>
  );
}
