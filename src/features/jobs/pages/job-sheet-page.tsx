import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Link } from "react-router";
import { formatCents } from "@shared/pricing/format-money";
import { formatNumber } from "@shared/units/format";
import { AirflowPicture } from "@/components/airflow/airflow-picture";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { ChevronLeftIcon, MailIcon, MapPinIcon, ToolboxIcon, WarningIcon } from "@/components/ui/icons";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { completeJob } from "../api/jobs";
import { jobKeys, jobQueries } from "../api/queries";
import type { JobSheet } from "../api/types";
import { Checklist } from "../components/checklist";
import { formatDay } from "../lib/dates";

function Section({ id, title, children }: { id: string; title: string; children: React.ReactNode }) {
  return (
    <section aria-labelledby={id} className="space-y-2 rounded-lg border border-ink-200 bg-white p-4 shadow-card">
      <h2 id={id} className="text-lg font-semibold text-ink-950">{title}</h2>
      {children}
    </section>
  );
}

function Cautions({ sheet }: { sheet: JobSheet }) {
  return (
    <section aria-labelledby="cautions-title" className="space-y-2 rounded-lg border-2 border-warning-600 bg-warning-50 p-4 text-warning-900">
      <h2 id="cautions-title" className="flex items-center gap-2 text-lg font-semibold">
        <WarningIcon className="size-5" /> Before you start: safety
      </h2>
      <ul className="space-y-2 text-base">
        {sheet.cautions.map((c) => <li key={c} className="border-l-4 border-warning-600 pl-2">{c}</li>)}
      </ul>
      <p className="text-sm">{sheet.deferral}</p>
    </section>
  );
}

function CompleteJob({ sheet }: { sheet: JobSheet }) {
  const queryClient = useQueryClient();
  const open = sheet.checklist.filter((i) => !i.isTicked).length;
  const complete = useMutation({
    mutationFn: () => completeJob(sheet.job.id),
    onSuccess: (answer) => {
      queryClient.setQueryData(jobKeys.sheet(sheet.job.id), answer.sheet);
      void queryClient.invalidateQueries({ queryKey: jobKeys.list() });
    },
  });
  return (
    <section aria-labelledby="complete-title" className="space-y-3 rounded-lg border border-ink-300 bg-white p-4">
      <h2 id="complete-title" className="text-lg font-semibold">Finish the job</h2>
      <p className="text-base">
        {open === 0 ? "Every step is ticked. Completing tells the office and e-mails the homeowner the completion report." : `${open} step${open === 1 ? "" : "s"} still to tick before the job can be completed.`}
      </p>
      {complete.isError ? <Alert severity="critical" title="Not completed">{complete.error.message}</Alert> : null}
      <Button size="lg" className="w-full" disabled={open > 0} isLoading={complete.isPending} loadingText="Completing…" onClick={() => complete.mutate()}>
        Mark the job done
      </Button>
    </section>
  );
}

/** The crew's job sheet: phone first, read top to bottom on site. */
export function JobSheetPage({ jobId }: { jobId: string }) {
  const query = useQuery(jobQueries.sheet(jobId));
  if (query.isPending) return <LoadingBlock label="Opening the job sheet…" />;
  if (query.isError) {
    const isMissing = isApiError(query.error) && query.error.status === 404;
    return <EmptyState icon={<ToolboxIcon />} title={isMissing ? "No such job for you" : "Couldn't open the job"} description={isMissing ? "It may be assigned to someone else. Your jobs are on the Jobs page." : query.error.message} />;
  }
  const sheet = query.data;
  const isDone = sheet.job.status === "completed";

  return (
    <div className="mx-auto max-w-reading space-y-4 pb-10" data-job-sheet={sheet.job.id}>
      <title>{`${sheet.site.title} · Job · Eavesight`}</title>
      <Link to={paths.app.jobs.getHref()} className="inline-flex min-h-touch items-center gap-1 text-base font-medium text-ink-800 hover:text-ink-950">
        <ChevronLeftIcon className="size-5" /> All jobs
      </Link>
      <header className="space-y-1">
        <p className="text-sm font-semibold tracking-wide text-ink-700 uppercase">Job sheet · {formatDay(sheet.job.scheduledFor)}</p>
        <h1 className="text-2xl font-semibold text-ink-950">{sheet.site.title}</h1>
        <p className="text-base text-ink-800">Crew: {sheet.job.crewName ?? "—"}</p>
      </header>
      {isDone ? (
        <Alert severity="ok" title="Completed">
          Finished {sheet.job.completedAt ? new Date(sheet.job.completedAt).toLocaleString() : ""}. The homeowner was sent the completion report.{" "}
          {sheet.report ? <a className="font-semibold underline" href={sheet.report.pdfUrl}>Download the report (PDF)</a> : null}
        </Alert>
      ) : null}

      <Section id="where-title" title="Where and who">
        <p className="text-lg font-semibold">{sheet.site.address}</p>
        <a href={sheet.site.mapUrl} target="_blank" rel="noreferrer" className={buttonStyles({ variant: "secondary", className: "w-full" })}>
          <MapPinIcon className="size-5" /> Open the address on a map
        </a>
        <p className="pt-2 text-base"><span className="font-semibold">Homeowner:</span> {sheet.homeowner.name}</p>
        {sheet.homeowner.phone ? <a href={`tel:${sheet.homeowner.phone.replace(/[^0-9+]/g, "")}`} className={buttonStyles({ variant: "secondary", className: "w-full" })}>Call {sheet.homeowner.phone}</a> : null}
        {sheet.homeowner.email ? (
          <a href={`mailto:${sheet.homeowner.email}`} className="flex min-h-touch items-center gap-2 text-base font-medium break-all text-ink-900 underline">
            <MailIcon className="size-5 shrink-0" /> {sheet.homeowner.email}
          </a>
        ) : null}
      </Section>

      <Cautions sheet={sheet} />

      <Section id="scope-title" title="Signed work">
        <p className="text-sm text-ink-700">"{sheet.scope.optionName}", proposal revision {sheet.scope.revision}{sheet.scope.acceptedAt ? `, signed ${new Date(sheet.scope.acceptedAt).toLocaleDateString()}` : ""}. Only signed documents are shown.</p>
        <ul className="list-disc space-y-1 pl-5 text-base">{sheet.scope.lines.map((l, i) => <li key={i}>{l}</li>)}</ul>
        {sheet.scope.changeOrders.map((c) => (
          <div key={c.number} className="mt-2 border-l-4 border-ember-600 pl-3" data-change-order={c.number}>
            <p className="font-semibold">Signed change order {c.number}</p>
            <p className="text-sm text-ink-700">{c.reason}</p>
            <ul className="list-disc pl-5">
              {c.lines.map((l) => (
                <li key={l.id}>
                  {l.action === "add" ? "Add" : "Leave out"} {l.description} ({formatNumber(l.quantity)} {l.unit}){l.unitPriceCents !== undefined ? ` · ${formatCents(l.unitPriceCents)} each` : ""}
                </li>
              ))}
            </ul>
          </div>
        ))}
      </Section>

      <Section id="load-title" title="Load the truck">
        {sheet.materials.length === 0 ? <p>No catalog materials.</p> : (
          <ul className="divide-y divide-ink-200">
            {sheet.materials.map((m) => (
              <li key={m.catalogItemId} className="flex items-baseline justify-between gap-3 py-2" data-material={m.sku}>
                <span><span className="block font-medium">{m.name}</span><span className="text-sm text-ink-700">{m.sku} · {formatNumber(m.quantity)} {m.unit === "linear-ft" ? "ft" : ""} designed</span></span>
                <span className="text-right whitespace-nowrap"><span className="text-xl font-semibold tabular-nums">{formatNumber(m.buyCount)}</span> {m.buyUnit}</span>
              </li>
            ))}
          </ul>
        )}
      </Section>

      <Checklist sheet={sheet} isLocked={isDone} />
      {!isDone ? <CompleteJob sheet={sheet} /> : null}

      <Section id="airflow-title" title="The attic: survey and signed design">
        {sheet.after.map((space) => {
          const before = sheet.before.find((b) => b.spaceId === space.spaceId);
          return (
            <div key={space.spaceId} className="space-y-2">
              {before?.picture ? (
                <>
                  <h3 className="font-semibold">{space.name}: as surveyed</h3>
                  <AirflowPicture picture={before.picture} title={`${space.name} as surveyed`} />
                </>
              ) : null}
              {space.picture ? (
                <>
                  <h3 className="border-t border-ink-200 pt-3 font-semibold">{space.name}: after the signed work</h3>
                  <AirflowPicture picture={space.picture} title={`${space.name} after the signed work`} />
                </>
              ) : null}
              {space.summary ? <p className="text-sm">{space.summary}</p> : null}
            </div>
          );
        })}
        {sheet.photos.length > 0 ? (
          <>
            <h3 className="pt-2 font-semibold">Survey photos</h3>
            <ul className="grid grid-cols-3 gap-2">
              {sheet.photos.map((p) => (
                <li key={p.id}><a href={p.url} target="_blank" rel="noreferrer"><img src={p.thumbUrl} alt={p.caption ?? "Survey photo"} className="aspect-square w-full rounded object-cover" loading="lazy" /></a></li>
              ))}
            </ul>
          </>
        ) : null}
      </Section>

      {sheet.money ? (
        <Section id="money-title" title="Money">
          <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-base">
            <dt>Job total (signed work and changes)</dt><dd className="text-right tabular-nums">{formatCents(sheet.money.jobTotalCents)}</dd>
            <dt>Paid so far</dt><dd className="text-right tabular-nums">{formatCents(sheet.money.paidCents)}</dd>
            <dt className="font-semibold">Balance due</dt><dd className="text-right font-semibold tabular-nums">{formatCents(sheet.money.balanceCents)}</dd>
          </dl>
        </Section>
      ) : null}
    </div>
  );
}
