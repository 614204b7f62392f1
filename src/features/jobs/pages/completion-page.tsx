import { useMutation, useQuery } from "@tanstack/react-query";
import { useSearchParams } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { startBalanceCheckout } from "../api/jobs";
import { formatCents } from "@shared/pricing/format-money";
import { formatNumber } from "@shared/units/format";
import { EmptyState } from "@/components/ui/empty-state";
import { HouseIcon, OkIcon } from "@/components/ui/icons";
import { LoadingBlock } from "@/components/ui/spinner";

import { jobQueries } from "../api/queries";
import type { ReportFigures } from "@shared/jobs/index";

const sqIn = (n: number) => `${formatNumber(n, { maxFractionDigits: 1 })} sq in`;

function Figures({ label, f }: { label: string; f: ReportFigures | null }) {
  if (!f) return <p className="text-sm">{label}: not available</p>;
  return (
    <div className="rounded-md border border-ink-200 p-3">
      <p className="text-sm font-semibold text-ink-700 uppercase">{label}</p>
      <p className="text-base">Intake {sqIn(f.intakeSqIn)} · exhaust {sqIn(f.exhaustSqIn)}</p>
      <p className="flex items-center gap-1 text-base font-semibold">{f.isCompliant ? <><OkIcon className="size-5 text-ok-600" /> Meets the code minimum</> : "Below the code minimum"}</p>
    </div>
  );
}

/** Sends the homeowner to the payment service's page for the balance (the deposit's flow); the amount is the server's. */
function PayBalance({ token }: { token: string }) {
  const [search] = useSearchParams();
  const pay = useMutation({ mutationFn: () => startBalanceCheckout(token), onSuccess: ({ url }) => window.location.assign(url) });
  return (
    <div className="space-y-2">
      {search.get("balance") === "success" ? <Alert severity="ok" title="Thank you">Your payment is being confirmed by the payment service; this page shows it as paid once it arrives.</Alert> : null}
      {pay.isError ? <Alert severity="critical" title="The payment page did not open">{pay.error.message}</Alert> : null}
      <Button className="w-full" isLoading={pay.isPending} loadingText="Opening the payment page…" onClick={() => pay.mutate()}>Pay the balance online</Button>
      <p className="text-sm text-ink-700">You pay on the payment service's secure page; Eavesight never sees your card.</p>
    </div>
  );
}

/** The homeowner's page behind the completion e-mail's link: the same content as the PDF. */
export function CompletionPage({ token }: { token: string }) {
  const query = useQuery(jobQueries.public(token));
  if (query.isPending) return <LoadingBlock label="Opening your completion report…" />;
  if (query.isError) return <main className="p-6"><EmptyState icon={<HouseIcon />} title="This link doesn't open a report" description={query.error.message} /></main>;
  const { report: r, photos, isPdfReady } = query.data;
  return (
    <main className="mx-auto max-w-reading space-y-5 bg-white p-4 pb-12 text-ink-950 sm:p-8">
      <title>{`Completion report · ${r.company.name}`}</title>
      <header className="border-b-2 border-ink-900 pb-3">
        <p className="text-lg font-semibold text-ember-700">{r.company.name}</p>
        <h1 className="text-2xl font-semibold">Your attic work is finished</h1>
        <p className="text-base">{r.site.address} · completed {r.completedOn} by {r.crewName}</p>
      </header>
      <section aria-labelledby="installed" className="space-y-2">
        <h2 id="installed" className="text-lg font-semibold">What we installed</h2>
        <ul className="list-disc space-y-1 pl-5">{r.installed.map((l, i) => <li key={i}>{l}</li>)}</ul>
        <p className="text-sm text-ink-700">{r.checkedCount} steps checked, {r.photographedCount} photographed.</p>
      </section>
      <section aria-labelledby="figures" className="space-y-2">
        <h2 id="figures" className="text-lg font-semibold">Ventilation before and after</h2>
        {r.spaces.map((s) => (
          <div key={s.name} className="space-y-2">
            <p className="font-semibold">{s.name}{s.after ? ` · code minimum ${sqIn(s.after.requiredSqIn)}` : ""}</p>
            <div className="grid gap-2 sm:grid-cols-2"><Figures label="Before" f={s.before} /><Figures label="After" f={s.after} /></div>
          </div>
        ))}
      </section>
      {photos.length > 0 ? (
        <section aria-labelledby="photos" className="space-y-2">
          <h2 id="photos" className="text-lg font-semibold">The finished work</h2>
          <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3">
            {photos.map((p) => <li key={p.id}><img src={p.url} alt={p.caption ?? "The finished work"} className="aspect-[4/3] w-full rounded object-cover" loading="lazy" /><p className="text-sm text-ink-700">{p.caption}</p></li>)}
          </ul>
        </section>
      ) : null}
      <section aria-labelledby="balance" className="space-y-2 rounded-lg border-2 border-ink-900 p-4">
        <h2 id="balance" className="text-lg font-semibold">Balance</h2>
        <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1">
          <dt>Job total</dt><dd className="text-right tabular-nums">{formatCents(r.money.jobTotalCents)}</dd>
          <dt>Paid so far</dt><dd className="text-right tabular-nums">{formatCents(r.money.paidCents)}</dd>
          <dt className="font-semibold">Balance due</dt><dd className="text-right font-semibold tabular-nums" data-balance>{formatCents(r.balanceCents)}</dd>
        </dl>
        {r.balanceCents > 0 ? <PayBalance token={token} /> : <p className="text-sm">Nothing is left to pay. Thank you.</p>}
      </section>
      <section aria-labelledby="warranty" className="space-y-1">
        <h2 id="warranty" className="text-lg font-semibold">Warranty</h2>
        <p className="whitespace-pre-line">{r.warranty}</p>
        {r.cautions.map((c) => <p key={c} className="text-sm">{c}</p>)}
      </section>
      {isPdfReady ? <a className={buttonStyles({ variant: "secondary", className: "w-full sm:w-auto" })} href={`/api/public/completion/${encodeURIComponent(token)}/pdf`}>Download the report (PDF)</a> : null}
    </main>
  );
}
