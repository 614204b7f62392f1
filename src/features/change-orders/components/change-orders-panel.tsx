import { useState, type FormEvent } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { formatCents } from "@shared/pricing/format-money";
import { parseDollarsToCents } from "@shared/pricing/parse-dollars";
import type { ChangeOrderLineInput } from "@shared/change-orders/schemas";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { TextArea, TextField } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Spinner } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-client";
import { formatDate } from "@/lib/format-date";
import { createChangeOrder, sendChangeOrder } from "../api/change-orders";
import { getCatalog } from "../api/get-catalog";
import { changeOrderKeys, changeOrderQueries } from "../api/queries";
import type { ChangeOrderRecord } from "../api/types";

export interface ChangeOrdersPanelProps {
  proposalId: string;
  canDraft: boolean;
  canSend: boolean;
}

const STATUS_WORDS = { draft: "Draft", sent: "Waiting for the homeowner", signed: "Signed", declined: "Declined" } as const;
const signedCents = (cents: number) => `${cents < 0 ? "−" : "+"}${formatCents(Math.abs(cents))}`;

/** The job's history on an accepted proposal: what was signed, each change order, and the total as it stands. */
export function ChangeOrdersPanel({ proposalId, canDraft, canSend }: ChangeOrdersPanelProps) {
  const query = useQuery(changeOrderQueries.forProposal(proposalId));
  const [isDrafting, setIsDrafting] = useState(false);
  if (query.isPending) return <Spinner label="Loading change orders…" />;
  if (query.isError) return <Alert severity="critical">{query.error.message}</Alert>;
  const { original, changeOrders, current } = query.data;
  if (!original || !current) return null;
  return (
    <div className="space-y-4" data-change-orders>
      <p className="text-base text-ink-800">
        Signed work changes only through a change order the homeowner signs. A declined or unsigned one changes nothing.
      </p>
      <ol className="space-y-3">
        <li className="rounded-md border border-ink-200 p-3">
          <p className="font-semibold text-ink-900">Signed proposal, rev. {original.revision}</p>
          <p className="text-base">
            {original.optionName} · <span className="tabular-nums">{formatCents(original.totalCents)}</span>
            {original.acceptedAt ? <span className="text-ink-700"> · signed {formatDate(original.acceptedAt)}</span> : null}
          </p>
        </li>
        {changeOrders.map((c) => (
          <ChangeOrderItem key={c.id} changeOrder={c} proposalId={proposalId} canSend={canSend} />
        ))}
      </ol>
      <p className="rounded-md border-2 border-ink-900 px-3 py-2 text-base" data-current-total>
        <span className="font-semibold">Job total now: </span>
        <span className="text-lg font-semibold tabular-nums">{formatCents(current.totalCents)}</span>
        <span className="text-ink-700">
          {current.signedChangeOrders.length ? ` (signed proposal + change order${current.signedChangeOrders.length > 1 ? "s" : ""} ${current.signedChangeOrders.join(", ")})` : " (as signed)"}
        </span>
      </p>
      {canDraft ? (
        isDrafting ? (
          <DraftForm proposalId={proposalId} onDone={() => setIsDrafting(false)} />
        ) : (
          <Button variant="secondary" onClick={() => setIsDrafting(true)}>
            Draft a change order
          </Button>
        )
      ) : null}
    </div>
  );
}

function ChangeOrderItem({ changeOrder: c, proposalId, canSend }: { changeOrder: ChangeOrderRecord; proposalId: string; canSend: boolean }) {
  const queryClient = useQueryClient();
  const send = useMutation({ mutationFn: sendChangeOrder, onSuccess: () => queryClient.invalidateQueries({ queryKey: changeOrderKeys.forProposal(proposalId) }) });
  return (
    <li className="space-y-2 rounded-md border border-ink-200 p-3" data-change-order={c.number} data-status={c.status}>
      <div className="flex flex-wrap items-center gap-2">
        <p className="font-semibold text-ink-900">Change order {c.number}</p>
        <Badge tone={c.status === "signed" ? "brand" : "outline"}>{STATUS_WORDS[c.status]}</Badge>
      </div>
      <p className="text-base">{c.reason}</p>
      <ul className="list-disc space-y-1 pl-5 text-base">
        {c.lines.map((l) => (
          <li key={l.id}>
            {l.action === "add" ? "Add" : "Leave out"}: {l.description}, {l.quantity} {l.unit} at {formatCents(l.unitPriceCents)}
          </li>
        ))}
      </ul>
      {c.totals && c.newTotalCents !== null ? (
        <p className="text-base tabular-nums">
          Change {signedCents(c.totals.changeCents)} (tax included) → {formatCents(c.newTotalCents)}
        </p>
      ) : null}
      {c.status === "signed" && c.decidedAt ? <p className="text-sm text-ink-700">Signed by {c.signerName} on {formatDate(c.decidedAt)}</p> : null}
      {c.status === "declined" && c.decidedAt ? <p className="text-sm text-ink-700">Declined on {formatDate(c.decidedAt)}{c.declineReason ? `: “${c.declineReason}”` : ""}</p> : null}
      {c.pdfSha256 ? (
        <a className="inline-flex min-h-touch items-center text-base font-medium text-brand-700 underline" href={`/api/change-orders/${c.id}/pdf`}>
          Download the PDF<span className="sr-only"> of change order {c.number}</span>
        </a>
      ) : null}
      {c.status === "draft" && canSend ? (
        <div className="space-y-2">
          <Button onClick={() => send.mutate(c.id)} isLoading={send.isPending} loadingText="Sending…">
            Send to the homeowner for signing
          </Button>
          {send.isError ? <Alert severity="critical">{send.error.message}</Alert> : null}
        </div>
      ) : null}
      {send.data ? (
        <Alert severity="ok" title="Sent">
          E-mailed to the homeowner. Their link: <span className="break-all">{send.data.link}</span>
        </Alert>
      ) : null}
    </li>
  );
}

interface LineDraft {
  id: string;
  action: "add" | "remove";
  catalogItemId: string;
  description: string;
  quantity: string;
  unit: string;
  price: string;
}
const blankLine = (): LineDraft => ({ id: crypto.randomUUID().slice(0, 8), action: "add", catalogItemId: "", description: "", quantity: "", unit: "", price: "" });

function DraftForm({ proposalId, onDone }: { proposalId: string; onDone: () => void }) {
  const queryClient = useQueryClient();
  const catalog = useQuery({ queryKey: ["change-orders", "catalog"], queryFn: ({ signal }) => getCatalog(signal) });
  const create = useMutation({ mutationFn: createChangeOrder, onSuccess: () => queryClient.invalidateQueries({ queryKey: changeOrderKeys.forProposal(proposalId) }) });
  const [reason, setReason] = useState("");
  const [lines, setLines] = useState<LineDraft[]>([blankLine()]);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const patch = (i: number, p: Partial<LineDraft>) => setLines((ls) => ls.map((l, j) => (j === i ? { ...l, ...p } : l)));
  const items = (catalog.data ?? []).filter((i) => i.isActive);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    const found: Record<string, string> = {};
    if (reason.trim().length < 3) found.reason = "Say why the work changes.";
    const input: ChangeOrderLineInput[] = lines.map((l, i) => {
      const quantity = Number(l.quantity);
      if (!(quantity > 0)) found[`lines.${i}.quantity`] = "Enter a quantity above 0.";
      const price = l.price.trim() ? parseDollarsToCents(l.price, "The price") : null;
      if (price && !price.ok) found[`lines.${i}.unitPriceCents`] = price.message;
      if (!l.catalogItemId && !l.description.trim()) found[`lines.${i}.description`] = "Describe the work, or choose a catalog item.";
      if (!l.catalogItemId && !price) found[`lines.${i}.unitPriceCents`] = "Give a price for this line.";
      return {
        id: l.id, action: l.action, catalogItemId: l.catalogItemId || null, description: l.description.trim() || null, quantity,
        unit: l.unit.trim() || null, unitPriceCents: price && price.ok ? price.cents : null,
      };
    });
    setErrors(found);
    if (Object.keys(found).length) return;
    create.mutate({ proposalId, input: { reason: reason.trim(), lines: input, photoIds: [] } }, {
      onSuccess: onDone,
      onError: (error) => setErrors(isApiError(error) ? error.fields : {}),
    });
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4 rounded-md border border-ink-300 bg-ink-25 p-3" aria-label="Draft a change order">
      <TextArea label="Why the work changes" hint="The homeowner reads this, e.g. “Rotted decking found under the ridge.”" rows={3} value={reason} onChange={(e) => setReason(e.target.value)} error={errors.reason} />
      {lines.map((l, i) => (
        <fieldset key={l.id} className="space-y-3 rounded-md border border-ink-200 bg-white p-3">
          <legend className="px-1 text-base font-semibold">Line {i + 1}</legend>
          <Select label="Change" value={l.action} onChange={(e) => patch(i, { action: e.target.value as LineDraft["action"] })}
            options={[{ value: "add", label: "Add work or material" }, { value: "remove", label: "Leave out signed work" }]} />
          <Select label="Catalog item" isOptional placeholder="None: describe it below" value={l.catalogItemId} onChange={(e) => patch(i, { catalogItemId: e.target.value })}
            options={items.map((it) => ({ value: it.id, label: `${it.name} (${formatCents(it.sellPriceCents)})` }))} />
          <TextField label="Description" isOptional={Boolean(l.catalogItemId)} value={l.description} onChange={(e) => patch(i, { description: e.target.value })} error={errors[`lines.${i}.description`]} />
          <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
            <TextField label="Quantity" inputMode="decimal" value={l.quantity} onChange={(e) => patch(i, { quantity: e.target.value })} error={errors[`lines.${i}.quantity`]} />
            <TextField label="Unit" isOptional hint="e.g. sq ft" value={l.unit} onChange={(e) => patch(i, { unit: e.target.value })} />
            <TextField label="Unit price ($)" isOptional={Boolean(l.catalogItemId)} inputMode="decimal" value={l.price} onChange={(e) => patch(i, { price: e.target.value })} error={errors[`lines.${i}.unitPriceCents`]} />
          </div>
          {lines.length > 1 ? (
            <Button variant="ghost" onClick={() => setLines((ls) => ls.filter((_, j) => j !== i))}>
              Remove line {i + 1}
            </Button>
          ) : null}
        </fieldset>
      ))}
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => setLines((ls) => [...ls, blankLine()])}>
          Add a line
        </Button>
        <Button type="submit" isLoading={create.isPending} loadingText="Saving…">
          Save the draft
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
      </div>
      {create.isError ? <Alert severity="critical">{create.error.message}</Alert> : null}
    </form>
  );
}
