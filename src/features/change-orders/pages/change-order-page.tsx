import { useQuery } from "@tanstack/react-query";
import { formatCents } from "@shared/pricing/format-money";
import { formatNumber } from "@shared/units/format";
import { Alert } from "@/components/ui/alert";
import { LoadingBlock } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-client";
import { formatDate, formatDateTime } from "@/lib/format-date";
import { changeOrderQueries } from "../api/queries";
import { ChangeOrderSignForm } from "../components/change-order-sign-form";

const signedCents = (cents: number) => `${cents < 0 ? "−" : "+"} ${formatCents(Math.abs(cents))}`;

/**
 * The homeowner's page for one change order (no account): why the signed work changes, each line,
 * the total before and after, the PDF, and signing or declining. A separate page from the proposal
 * (its own component tree), so the proposal page can change look without touching it.
 */
export function ChangeOrderPage({ token }: { token: string }) {
  const query = useQuery(changeOrderQueries.public(token));
  if (query.isPending) return <LoadingBlock label="Opening the change order…" />;
  if (query.isError) {
    const isMissing = isApiError(query.error) && query.error.status === 404;
    return (
      <main className="mx-auto max-w-xl px-4 py-12" data-link-problem={isMissing ? "not-found" : "unreachable"}>
        <h1 className="text-2xl font-semibold text-ink-900">{isMissing ? "We can't find this change order" : "The change order could not be loaded"}</h1>
        <p className="mt-3 text-base text-ink-800">
          {isMissing
            ? "The link may be incomplete (e-mail programs sometimes cut long links), or it may have been withdrawn. Open it again from the e-mail, or contact the company that sent it."
            : "Check that you are online and try again in a moment."}
        </p>
      </main>
    );
  }
  const view = query.data;
  const { snapshot: s, changeOrder: c } = view;
  return (
    <div className="min-h-dvh bg-ink-25">
      <header className="border-b border-ink-200 bg-white">
        <div className="mx-auto flex max-w-reading items-center justify-between gap-3 px-4 py-3">
          <p className="text-lg font-semibold text-brand-800">{s.company.name}</p>
          {s.company.phone ? <a className="min-h-touch content-center text-base font-medium text-brand-700 underline" href={`tel:${s.company.phone}`}>{s.company.phone}</a> : null}
        </div>
      </header>
      <main className="mx-auto max-w-reading space-y-6 px-4 py-6" data-change-order-page={c.number}>
        <div className="space-y-1">
          <p className="text-sm font-semibold tracking-wide text-ink-700 uppercase">Change to your signed work</p>
          <h1 className="text-2xl font-semibold text-ink-950">Change order {c.number}</h1>
          <p className="text-base text-ink-800">
            {s.customer.firstName}, {s.seller.name} asks you to approve a change to the work you signed (proposal revision {s.proposalRevision}, “{s.optionName}”) at {s.site.address}.
          </p>
        </div>
        {c.status === "signed" ? (
          <Alert severity="ok" title="Signed — thank you">
            You signed change order {c.number}{c.decidedAt ? ` on ${formatDateTime(c.decidedAt)}` : ""}. The crew works from the changed list; the new job total is {formatCents(s.newTotalCents)}.
          </Alert>
        ) : c.status === "declined" ? (
          <Alert severity="info" title="Declined">
            You declined this change{c.decidedAt ? ` on ${formatDate(c.decidedAt)}` : ""}. The work you signed stays as it is, at {formatCents(s.previousTotalCents)}.
          </Alert>
        ) : null}
        <section aria-labelledby="co-why" className="space-y-2 rounded-lg border border-ink-200 bg-white p-4">
          <h2 id="co-why" className="text-lg font-semibold text-ink-900">Why the work changes</h2>
          <p className="text-base">{s.reason}</p>
        </section>
        <section aria-labelledby="co-what" className="space-y-3 rounded-lg border border-ink-200 bg-white p-4">
          <h2 id="co-what" className="text-lg font-semibold text-ink-900">What changes</h2>
          <ul className="divide-y divide-ink-200">
            {s.lines.map((l) => (
              <li key={l.id} className="flex items-start justify-between gap-3 py-2 text-base">
                <span>
                  <span className="font-semibold">{l.action === "add" ? "Add" : "Leave out"}:</span> {l.description}
                  <span className="block text-sm text-ink-700">{formatNumber(l.quantity)} {l.unit} × {formatCents(l.unitPriceCents)}</span>
                </span>
                <span className="font-semibold whitespace-nowrap tabular-nums">{signedCents(l.action === "add" ? l.totalCents : -l.totalCents)}</span>
              </li>
            ))}
          </ul>
          <dl className="space-y-1 rounded-md border-2 border-ink-900 p-3 text-base tabular-nums" data-co-totals>
            <div className="flex justify-between gap-3"><dt>Job total before this change</dt><dd>{formatCents(s.previousTotalCents)}</dd></div>
            <div className="flex justify-between gap-3"><dt>Change, tax included</dt><dd>{signedCents(s.totals.changeCents)}</dd></div>
            <div className="flex justify-between gap-3 text-lg font-semibold"><dt>New job total</dt><dd>{formatCents(s.newTotalCents)}</dd></div>
          </dl>
          <p className="text-sm text-ink-700">Nothing changes unless you sign. Tax on the change: {signedCents(s.totals.taxChangeCents)}.</p>
          {c.isPdfReady ? (
            <a className="inline-flex min-h-touch items-center text-base font-medium text-brand-700 underline" href={`/api/public/change-orders/${encodeURIComponent(token)}/pdf`}>
              Download change order {c.number} (PDF)
            </a>
          ) : null}
        </section>
        {c.status === "sent" ? (
          <section className="rounded-lg border border-ink-200 bg-white p-4">
            <ChangeOrderSignForm token={token} view={view} />
          </section>
        ) : null}
      </main>
    </div>
  );
}
