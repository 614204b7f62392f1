import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Link, useNavigate } from "react-router";
import { formatCents } from "@shared/pricing/index";
import { PROPOSAL_LIMITS } from "@shared/proposals/limits";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardFooter, CardHeader, CardTitle } from "@/components/ui/card";
import { Checkbox } from "@/components/ui/checkbox";
import { EmptyState } from "@/components/ui/empty-state";
import { TextField } from "@/components/ui/field";
import { ChevronLeftIcon, ClipboardIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { useCreateProposal } from "../api/create-proposal";
import { proposalQueries } from "../api/queries";
import type { ProposalRecord } from "../api/types";
import { StatusBadge } from "../components/status-badge";
import { statusTime } from "../lib/status";

const inDays = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

function NewProposalCard({ projectId }: { projectId: string }) {
  const options = useQuery(proposalQueries.projectOptions(projectId));
  const create = useCreateProposal();
  const navigate = useNavigate();
  const [chosen, setChosen] = useState<string[] | null>(null);
  const [validUntil, setValidUntil] = useState(() => inDays(30));
  if (options.isPending) return <LoadingBlock label="Loading the design options…" />;
  if (options.isError) return <Alert severity="critical">{options.error.message}</Alert>;
  // At first, the first options up to the limit a proposal holds.
  const ids = chosen ?? options.data.slice(0, PROPOSAL_LIMITS.maxOptions).map((o) => o.id);
  const isFull = ids.length >= PROPOSAL_LIMITS.maxOptions;

  if (options.data.length === 0) {
    return (
      <EmptyState
        icon={<ClipboardIcon />}
        title="No design options yet"
        description="A proposal offers one or more saved design options. Make them first."
        action={
          <Link to={paths.app.projectOptions.getHref(projectId)} className={buttonStyles()}>
            Open the design options
          </Link>
        }
      />
    );
  }

  return (
    <Card aria-labelledby="new-proposal-title">
      <CardHeader>
        <CardTitle id="new-proposal-title">New proposal</CardTitle>
        <CardDescription>Choose the options to offer. The scope of work is written from each option and the terms from your company profile; you can change both next.</CardDescription>
      </CardHeader>
      <CardBody className="space-y-4">
        <fieldset>
          <legend className="text-base font-semibold text-ink-900">Options to include</legend>
          {options.data.length > PROPOSAL_LIMITS.maxOptions ? (
            <p className="mb-2 text-sm text-ink-700">A proposal offers at most {PROPOSAL_LIMITS.maxOptions} options: a homeowner compares a few more easily than many.</p>
          ) : null}
          {options.data.map((o) => (
            <Checkbox
              key={o.id}
              label={o.name}
              description={o.price ? `Total ${formatCents(o.price.totalCents)}` : (o.priceIssue ?? "No price yet")}
              checked={ids.includes(o.id)}
              disabled={isFull && !ids.includes(o.id)}
              onChange={(e) => setChosen(e.target.checked ? [...ids, o.id] : ids.filter((x) => x !== o.id))}
            />
          ))}
        </fieldset>
        <TextField label="Valid until" type="date" className="max-w-xs" value={validUntil} onChange={(e) => setValidUntil(e.target.value)} />
        {create.isError ? <Alert severity="critical">{create.error.message}</Alert> : null}
      </CardBody>
      <CardFooter>
        <Button
          disabled={ids.length === 0}
          isLoading={create.isPending}
          loadingText="Starting…"
          onClick={() =>
            create.mutate(
              { projectId, optionIds: options.data.filter((o) => ids.includes(o.id)).map((o) => o.id), validUntil },
              { onSuccess: (p) => void navigate(paths.app.projectProposal.getHref(projectId, p.id)) },
            )
          }
        >
          Start the proposal
        </Button>
      </CardFooter>
    </Card>
  );
}

function ProposalRow({ p, projectId }: { p: ProposalRecord; projectId: string }) {
  return (
    <li className="flex flex-wrap items-center justify-between gap-3 border-b border-ink-100 py-3 last:border-b-0">
      <div className="min-w-0 space-y-1">
        <Link to={paths.app.projectProposal.getHref(projectId, p.id)} className="text-base font-semibold text-ember-700 underline decoration-ember-300 underline-offset-4">
          Revision {p.revision} · {p.optionIds.length} option{p.optionIds.length === 1 ? "" : "s"}
        </Link>
        <div>
          <StatusBadge status={p.status} at={statusTime(p)} />
          {p.supersededBy ? <span className="ml-2 text-sm text-ink-600">replaced by a newer revision</span> : null}
        </div>
      </div>
    </li>
  );
}

/** A project's proposals (every revision) and the start of a new one. */
export function ProjectProposalsPage({ projectId }: { projectId: string }) {
  const project = useQuery(proposalQueries.project(projectId));
  const list = useQuery(proposalQueries.list(projectId));
  if (project.isPending || list.isPending) return <LoadingBlock label="Loading proposals…" />;
  if (project.isError || list.isError) return <Alert severity="critical">{(project.error ?? list.error)?.message}</Alert>;
  const series = new Map<string, ProposalRecord[]>();
  for (const p of list.data) series.set(p.seriesId, [...(series.get(p.seriesId) ?? []), p]);

  return (
    <>
      <PageHeader
        documentTitle={`Proposals · ${project.data.project.title}`}
        eyebrow={
          <Link to={paths.app.project.getHref(projectId)} className="inline-flex min-h-touch items-center gap-1 hover:text-ink-900 md:min-h-0">
            <ChevronLeftIcon className="size-4" /> {project.data.project.title}
          </Link>
        }
        title="Proposals"
        description={`For ${project.data.customer?.name ?? "the homeowner"} at ${project.data.project.siteAddress}.`}
        actions={
          <Link to={paths.app.projectOptions.getHref(projectId)} className={buttonStyles({ variant: "secondary" })}>
            Design options
          </Link>
        }
      />
      <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
        <section aria-labelledby="existing-title" className="space-y-4">
          <h2 id="existing-title" className="text-lg font-semibold text-ink-900">
            Sent and drafted
          </h2>
          {series.size === 0 ? <p className="text-base text-ink-700">No proposals for this project yet.</p> : null}
          {[...series.values()].map((revisions) => (
            <Card key={revisions[0]!.seriesId}>
              <CardBody className="py-2">
                <ul>
                  {revisions
                    .sort((a, b) => b.revision - a.revision)
                    .map((p) => (
                      <ProposalRow key={p.id} p={p} projectId={projectId} />
                    ))}
                </ul>
              </CardBody>
            </Card>
          ))}
        </section>
        <NewProposalCard projectId={projectId} />
      </div>
    </>
  );
}
