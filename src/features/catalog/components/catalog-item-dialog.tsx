import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Checkbox } from "@/components/ui/checkbox";
import { Dialog, DialogClose, DialogContent } from "@/components/ui/dialog";
import { TextField } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { toast } from "@/components/ui/toaster";
import { isApiError } from "@/lib/api-client";
import { useCreateCatalogItem } from "../api/create-catalog-item";
import type { CatalogRecord } from "../api/types";
import { useUpdateCatalogItem } from "../api/update-catalog-item";
import {
  CatalogFormSchema,
  emptyForm,
  FORM_FIELD_OF,
  formFromItem,
  ratingNeed,
  readCatalogForm,
  type CatalogFormField,
  type CatalogFormValues,
} from "../lib/catalog-form";
import { KIND_OPTION_GROUPS, kindLabel, UNIT_LABELS } from "../lib/labels";

export interface CatalogItemDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  /** The item to edit; null to add one. */
  item: CatalogRecord | null;
}

/** Add or edit one catalog item (owner only). Money is typed in dollars and saved as exact cents. */
export function CatalogItemDialog({ open, onOpenChange, item }: CatalogItemDialogProps) {
  return (
    <Dialog open={open} onOpenChange={onOpenChange}>
      {open ? <CatalogItemForm key={item?.id ?? "new"} item={item} onDone={() => onOpenChange(false)} /> : null}
    </Dialog>
  );
}

const KIND_OPTIONS = KIND_OPTION_GROUPS.flatMap((group) => group.kinds.map((kind) => ({ value: kind, label: kindLabel(kind) })));
const UNIT_OPTIONS = Object.entries(UNIT_LABELS).map(([value, label]) => ({ value, label }));

function CatalogItemForm({ item, onDone }: { item: CatalogRecord | null; onDone: () => void }) {
  const create = useCreateCatalogItem();
  const update = useUpdateCatalogItem();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<CatalogFormValues>({
    resolver: zodResolver(CatalogFormSchema),
    defaultValues: item ? formFromItem(item) : emptyForm(),
  });
  const { errors } = form.formState;
  const kind = useWatch({ control: form.control, name: "kind" });
  const unit = useWatch({ control: form.control, name: "unit" });
  const need = ratingNeed(kind, unit);
  const isPending = create.isPending || update.isPending;

  const onServerError = (error: Error) => {
    if (!isApiError(error)) {
      setFormError("Something went wrong. Please try again.");
      return;
    }
    let isPlaced = false;
    for (const [serverField, message] of Object.entries(error.fields)) {
      const field = FORM_FIELD_OF[serverField as keyof typeof FORM_FIELD_OF] as CatalogFormField | undefined;
      if (field) {
        form.setError(field, { type: "server", message }, { shouldFocus: !isPlaced });
        isPlaced = true;
      }
    }
    setFormError(isPlaced ? "Some details need a fix; see the marked fields." : error.message);
  };

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    const read = readCatalogForm(values);
    if (!read.input) return;
    const input = read.input;
    if (item) {
      update.mutate(
        { id: item.id, patch: input },
        {
          onSuccess: (saved) => {
            toast.success(`${saved.name} saved`);
            onDone();
          },
          onError: onServerError,
        },
      );
    } else {
      create.mutate(input, {
        onSuccess: (saved) => {
          toast.success(`${saved.name} added to the catalog`);
          onDone();
        },
        onError: onServerError,
      });
    }
  });

  return (
    <DialogContent
      title={item ? `Edit ${item.name}` : "Add a catalog item"}
      description="Prices are in dollars and cents. Ratings come from the product label."
      className="sm:w-[min(42rem,calc(100vw-2rem))]"
      footer={
        <>
          <DialogClose asChild>
            <Button variant="secondary" className="w-full sm:w-auto" disabled={isPending}>
              Cancel
            </Button>
          </DialogClose>
          <Button type="submit" form="catalog-item-form" isLoading={isPending} loadingText="Saving…" className="w-full sm:w-auto">
            {item ? "Save changes" : "Add item"}
          </Button>
        </>
      }
    >
      {formError ? (
        <Alert severity="critical" isAssertive className="mb-4">
          {formError}
        </Alert>
      ) : null}
      <form id="catalog-item-form" onSubmit={onSubmit} noValidate className="space-y-4">
        <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
          <TextField label="Name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
          <TextField
            label="Code (SKU)"
            autoComplete="off"
            autoCapitalize="characters"
            spellCheck={false}
            error={errors.sku?.message}
            {...form.register("sku")}
          />
        </div>
        <div className="grid gap-4 sm:grid-cols-2">
          <Select label="Kind" options={KIND_OPTIONS} error={errors.kind?.message} {...form.register("kind")} />
          <Select label="Sold by" options={UNIT_OPTIONS} error={errors.unit?.message} {...form.register("unit")} />
        </div>
        <div className="grid gap-4 sm:grid-cols-2">
          {need === "nfa-per-unit" || need === "nfa-per-ft" ? (
            <TextField
              label={need === "nfa-per-ft" ? "Net free area per foot" : "Net free area per vent"}
              inputMode="decimal"
              autoComplete="off"
              trailing={<span className="pr-3 text-sm text-ink-600">{need === "nfa-per-ft" ? "sq in/ft" : "sq in"}</span>}
              inputClassName="pr-20"
              error={errors.nfa?.message}
              {...form.register("nfa")}
            />
          ) : null}
          {need === "cfm" ? (
            <TextField
              label="Rated airflow"
              inputMode="decimal"
              autoComplete="off"
              trailing={<span className="pr-3 text-sm text-ink-600">cfm</span>}
              error={errors.cfm?.message}
              {...form.register("cfm")}
            />
          ) : null}
          {unit === "linear-ft" ? (
            <TextField
              label="Bought in pieces of"
              hint="Leave empty if bought by the foot"
              isOptional
              inputMode="decimal"
              autoComplete="off"
              trailing={<span className="pr-3 text-sm text-ink-600">ft</span>}
              error={errors.soldInLengthFt?.message}
              {...form.register("soldInLengthFt")}
            />
          ) : null}
          {need === "none" ? (
            <p className="text-sm text-ink-600 sm:col-span-2">Accessories and work carry no vent rating.</p>
          ) : null}
        </div>
        <div className="grid gap-4 sm:grid-cols-3">
          <TextField
            label="Material cost"
            hint={`Your cost, ${unit === "linear-ft" ? "per foot" : unit === "hour" ? "per hour" : "each"}`}
            inputMode="decimal"
            autoComplete="off"
            trailing={<span className="pr-3 text-sm text-ink-600">$</span>}
            error={errors.materialCost?.message}
            {...form.register("materialCost")}
          />
          <TextField
            label="Sell price"
            hint={`Installed, ${unit === "linear-ft" ? "per foot" : unit === "hour" ? "per hour" : "each"}`}
            inputMode="decimal"
            autoComplete="off"
            trailing={<span className="pr-3 text-sm text-ink-600">$</span>}
            error={errors.sellPrice?.message}
            {...form.register("sellPrice")}
          />
          <TextField
            label="Labour minutes"
            hint={`Per ${unit === "linear-ft" ? "foot" : unit === "hour" ? "hour" : "unit"}`}
            inputMode="numeric"
            autoComplete="off"
            trailing={<span className="pr-3 text-sm text-ink-600">min</span>}
            error={errors.laborMinutes?.message}
            {...form.register("laborMinutes")}
          />
        </div>
        <Checkbox
          label="Active"
          description="Retired items stay on saved options but are not offered for new ones."
          {...form.register("isActive")}
        />
      </form>
    </DialogContent>
  );
}
