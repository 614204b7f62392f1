import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FieldError, TextField } from "@/components/ui/field";
import { PlusIcon, SearchIcon } from "@/components/ui/icons";
import { Spinner } from "@/components/ui/spinner";
import { cn } from "@/lib/cn";
import { projectQueries } from "../api/queries";
import type { CustomerSummary } from "../api/types";
import { useDebouncedValue } from "@/lib/use-debounced-value";

export interface NewCustomerDraft {
  name: string;
  phone: string;
  email: string;
}

export type CustomerChoice =
  | { mode: "existing"; customer: CustomerSummary | null }
  | { mode: "new"; draft: NewCustomerDraft };

export interface CustomerPickerProps {
  value: CustomerChoice;
  onChange: (value: CustomerChoice) => void;
  error?: string;
  newErrors?: Partial<Record<keyof NewCustomerDraft, string>>;
}

/** Pick an existing customer by searching, or type a new one's details in place. */
export function CustomerPicker({ value, onChange, error, newErrors = {} }: CustomerPickerProps) {
  const [typed, setTyped] = useState("");
  const q = useDebouncedValue(typed, 250);
  const isSearching = value.mode === "existing" && value.customer === null;
  const results = useQuery({ ...projectQueries.customerSearch(q), enabled: isSearching });

  if (value.mode === "new") {
    const { draft } = value;
    const set = (patch: Partial<NewCustomerDraft>) => onChange({ mode: "new", draft: { ...draft, ...patch } });
    return (
      <fieldset className="space-y-4 rounded-lg border border-ink-200 bg-ink-25 p-4">
        <legend className="px-1 text-base font-semibold text-ink-900">New customer</legend>
        <TextField label="Customer name" value={draft.name} error={newErrors.name} onChange={(e) => set({ name: e.target.value })} autoComplete="off" />
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Phone" type="tel" inputMode="tel" isOptional value={draft.phone} error={newErrors.phone} onChange={(e) => set({ phone: e.target.value })} autoComplete="off" />
          <TextField
            label="E-mail"
            type="email"
            inputMode="email"
            autoCapitalize="none"
            spellCheck={false}
            isOptional
            value={draft.email}
            error={newErrors.email}
            onChange={(e) => set({ email: e.target.value })}
            autoComplete="off"
          />
        </div>
        <Button variant="ghost" size="sm" onClick={() => onChange({ mode: "existing", customer: null })}>
          Pick an existing customer instead
        </Button>
      </fieldset>
    );
  }

  if (value.customer) {
    const c = value.customer;
    return (
      <div className="flex flex-wrap items-start justify-between gap-3 rounded-lg border border-ink-300 bg-white p-4">
        <div className="min-w-0">
          <p className="text-sm font-medium text-ink-600">Customer</p>
          <p className="text-lg font-semibold text-ink-900">{c.name}</p>
          <p className="text-sm text-ink-700">{[c.phone, c.email].filter(Boolean).join(" · ") || "No contact details"}</p>
        </div>
        <Button variant="secondary" size="sm" onClick={() => onChange({ mode: "existing", customer: null })}>
          Change customer
        </Button>
      </div>
    );
  }

  const items = results.data ?? [];
  return (
    <div className="space-y-3">
      <TextField
        label="Customer"
        hint="Search by name, phone or e-mail, then choose."
        type="search"
        value={typed}
        autoComplete="off"
        onChange={(e) => setTyped(e.target.value)}
        error={error}
        trailing={results.isFetching ? <Spinner className="mr-3.5 text-ink-500" /> : <SearchIcon className="mr-3.5 text-ink-500" />}
      />
      <ul aria-label="Matching customers" className="divide-y divide-ink-100 overflow-hidden rounded-lg border border-ink-200 bg-white">
        {items.map((c) => (
          <li key={c.id}>
            <button
              type="button"
              onClick={() => onChange({ mode: "existing", customer: c })}
              className={cn("flex min-h-touch w-full flex-col items-start px-4 py-2.5 text-left hover:bg-ink-50")}
            >
              <span className="font-semibold text-ink-900">{c.name}</span>
              <span className="text-sm text-ink-600">{[c.phone, c.email, c.billingAddress].filter(Boolean).join(" · ") || "No contact details"}</span>
            </button>
          </li>
        ))}
        {results.isSuccess && items.length === 0 ? (
          <li className="px-4 py-3 text-sm text-ink-600">{q ? `No customer matches "${q}".` : "No customers yet."}</li>
        ) : null}
        <li>
          <button
            type="button"
            onClick={() => onChange({ mode: "new", draft: { name: typed.trim(), phone: "", email: "" } })}
            className="flex min-h-touch w-full items-center gap-2 px-4 py-2.5 text-left font-semibold text-ember-700 hover:bg-ember-50"
          >
            <PlusIcon />
            {typed.trim() ? `Add "${typed.trim()}" as a new customer` : "Add a new customer"}
          </button>
        </li>
      </ul>
      {results.isError ? <FieldError>{results.error.message}</FieldError> : null}
    </div>
  );
}
