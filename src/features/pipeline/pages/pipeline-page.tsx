import { useQuery } from "@tanstack/react-query";
import { Link, useSearchParams } from "react-router";
import type { ProposalStatus } from "@shared/proposals/types";
import { formatCents } from "@shared/pricing/index";
import { Alert } from "@/components/ui/alert";
import { Badge, SeverityBadge, type Severity } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { ChartIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Select } from "@/components/ui/select";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { cn } from "@/lib/cn";
import { formatDate } from "@/lib/format-date";
import { pipelineQueries } from "../api/queries";
import { PIPELINE_PERIODS_DAYS, type PipelinePeriodDays, type PipelineProposal } from "../api/types";

const STAGE_WORDS: Record<ProposalStatus, { label: string; hint: string }> = {
  draft: { label: "Draft", hint: "Being written" },
  sent: { label: "Sent", hint: "Not opened yet" },
  viewed: { label: "Viewed", hint: "Opened, no answer yet" },
  accepted: { label: "Accepted", hint: "Signed in the period" },
  declined: { label: "Declined", hint: "Said no in the period" },
  expired: { label: "Expired", hint: "Lapsed in the period" },
};
const SEVERITY: Partial<Record<ProposalStatus, Severity>> = { sent: "info", viewed: "info", accepted: "ok", declined: "critical", expired: "warning" };

function StageBadge({ status }: { status: ProposalStatus }) {
  const severity = SEVERITY[status];
  return severity ? <SeverityBadge severity={severity}>{STAGE_WORDS[status].label}</SeverityBadge> : <Badge tone="outline">{STAGE_WORDS[status].label}</Badge>;
}

const periodOf = (text: string | null): PipelinePeriodDays => (PIPELINE_PERIODS_DAYS.find((d) => String(d) === text) ?? 90);

function ProposalItem({ p }: { p: PipelineProposal }) {
  return (
    <li className="rounded-md border border-ink-200 bg-white p-3 shadow-card" data-pipeline-proposal={p.status}>
      <Link to={paths.app.projectProposal.getHref(p.projectId, p.id)} className="flex min-h-touch items-center rounded-sm text-base font-semibold text-ember-700 underline decoration-ember-300 underline-offset-4">
        {p.customerName ?? p.projectTitle}
      </Link>
      <p className="text-sm text-ink-700">
        {p.projectTitle} · rev. {p.revision}
      </p>
      <p className="mt-1 flex flex-wrap justify-between gap-x-3 text-base">
        <span className="font-semibold text-ink-900 tabular-nums">
          {p.valueCents === null ? "Not priced" : formatCents(p.valueCents)}
          {p.valueBasis === "largest" ? <span className="ml-1 text-sm font-normal text-ink-600">(largest option)</span> : null}
        </span>
        <span className="text-ink-700">
          {p.ageDays} day{p.ageDays === 1 ? "" : "s"}
        </span>
      </p>
      {p.depositPaidCents > 0 ? <p className="text-sm font-medium text-ok-800">Deposit received: {formatCents(p.depositPaidCents)}</p> : null}
      {p.decidedAt ? <p className="text-sm text-ink-600">Decided {formatDate(p.decidedAt)}</p> : p.sentAt ? <p className="text-sm text-ink-600">Sent {formatDate(p.sentAt)}</p> : null}
    </li>
  );
}

/** Proposals by stage, what they are worth, how long they have waited, and how many were won. */
export function PipelinePage() {
  const [search, setSearch] = useSearchParams();
  const days = periodOf(search.get("days"));
  const query = useQuery(pipelineQueries.overview(days));

  const periodSelect = (
    <Select
      label="Period"
      className="w-48"
      value={String(days)}
      options={PIPELINE_PERIODS_DAYS.map((d) => ({ value: String(d), label: d === 365 ? "Last 12 months" : `Last ${d} days` }))}
      onChange={(e) => setSearch({ days: e.target.value }, { replace: true })}
    />
  );

  return (
    <>
      <PageHeader title="Pipeline" description="Every current proposal by stage, what it is worth and how long it has waited; decisions and the win rate for the period you choose." actions={periodSelect} />
      {query.isPending ? (
        <LoadingBlock label="Loading the pipeline…" />
      ) : query.isError ? (
        <Alert severity="critical" title="The pipeline could not be loaded">
          {query.error.message}
        </Alert>
      ) : query.data.proposals.length === 0 && query.data.winRate.decided === 0 ? (
        <EmptyState
          icon={<ChartIcon />}
          title="No proposals yet"
          description="When a proposal is drafted from a project's design options, it shows up here so you can follow it from sent to signed."
        />
      ) : (
        <div className={cn("space-y-8", query.isPlaceholderData && "opacity-60")}>
          <section aria-labelledby="summary-title" className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            <h2 id="summary-title" className="sr-only">
              Summary
            </h2>
            <div className="rounded-lg border border-ink-200 bg-white p-4 shadow-card" data-win-rate>
              <p className="text-sm font-medium text-ink-600">Win rate</p>
              <p className="text-3xl font-semibold text-ink-900 tabular-nums">{query.data.winRate.rate === null ? "—" : `${Math.round(query.data.winRate.rate * 100)} %`}</p>
              <p className="text-sm text-ink-700">
                {query.data.winRate.decided === 0
                  ? "No decisions in the period yet"
                  : `${query.data.winRate.accepted} accepted of ${query.data.winRate.decided} decided`}
                {query.data.winRate.expired ? ` · ${query.data.winRate.expired} expired unanswered` : ""}
              </p>
            </div>
            <div className="rounded-lg border border-ink-200 bg-white p-4 shadow-card">
              <p className="text-sm font-medium text-ink-600">Open (sent or viewed)</p>
              <p className="text-3xl font-semibold text-ink-900 tabular-nums">
                {formatCents(query.data.stages.filter((s) => s.status === "sent" || s.status === "viewed").reduce((n, s) => n + s.valueCents, 0))}
              </p>
              <p className="text-sm text-ink-700">Largest option of each proposal waiting for an answer</p>
            </div>
            <div className="rounded-lg border border-ink-200 bg-white p-4 shadow-card">
              <p className="text-sm font-medium text-ink-600">Won in the period</p>
              <p className="text-3xl font-semibold text-ink-900 tabular-nums">{formatCents(query.data.stages.find((s) => s.status === "accepted")?.valueCents ?? 0)}</p>
              <p className="text-sm text-ink-700">Accepted option totals</p>
            </div>
            <div className="rounded-lg border border-ink-200 bg-white p-4 shadow-card">
              <p className="text-sm font-medium text-ink-600">Deposits received</p>
              <p className="text-3xl font-semibold text-ink-900 tabular-nums">{formatCents(query.data.deposits.receivedCents)}</p>
              <p className="text-sm text-ink-700">
                {query.data.deposits.count} proposal{query.data.deposits.count === 1 ? "" : "s"}, confirmed by the payment service
              </p>
            </div>
          </section>

          <div className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3 2xl:grid-cols-6" role="list" aria-label="Stages">
            {query.data.stages.map((stage) => {
              const items = query.data.proposals.filter((p) => p.status === stage.status);
              return (
                <section key={stage.status} role="listitem" aria-labelledby={`stage-${stage.status}`} className="space-y-3 rounded-lg bg-ink-50 p-3" data-stage={stage.status}>
                  <div className="space-y-1">
                    <h2 id={`stage-${stage.status}`} className="flex items-center justify-between gap-2">
                      <StageBadge status={stage.status} />
                      <span className="text-base font-semibold text-ink-900 tabular-nums">{stage.count}</span>
                    </h2>
                    <p className="text-sm text-ink-700">
                      {STAGE_WORDS[stage.status].hint} · {formatCents(stage.valueCents)}
                    </p>
                  </div>
                  {items.length === 0 ? (
                    <p className="text-sm text-ink-600">None</p>
                  ) : (
                    <ul className="space-y-2">
                      {items.map((p) => (
                        <ProposalItem key={p.id} p={p} />
                      ))}
                    </ul>
                  )}
                </section>
              );
            })}
          </div>
        </div>
      )}
    </>
  );
}
