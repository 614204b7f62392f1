import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { ChevronRightIcon, ToolboxIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { SeverityBadge } from "@/components/ui/badge";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { can } from "@shared/schemas/roles";
import { useSession } from "@/lib/session";
import { jobQueries } from "../api/queries";
import { AssignForm } from "../components/assign-form";
import { formatDay } from "../lib/dates";

/** The crew's own jobs, soonest first; the office also sees every job and the sold work still to schedule. */
export function JobsPage() {
  const query = useQuery(jobQueries.list());
  const canAssign = can(useSession().user.role, "jobs:assign");
  if (query.isPending) return <LoadingBlock label="Loading jobs…" />;
  if (query.isError) return <EmptyState icon={<ToolboxIcon />} title="Couldn't load the jobs" description={query.error.message} />;
  const { jobs, awaitingCrew } = query.data;
  const open = jobs.filter((j) => j.status === "assigned");
  const done = jobs.filter((j) => j.status === "completed");

  return (
    <div className="mx-auto max-w-reading space-y-6">
      <PageHeader title="Jobs" description={canAssign ? "Accepted work, who installs it and when." : "The installs given to you, soonest first."} />
      {canAssign && awaitingCrew.length > 0 ? (
        <Card>
          <CardHeader><CardTitle>Sold, waiting for a crew</CardTitle></CardHeader>
          <CardBody>
            <ul className="space-y-5">
              {awaitingCrew.map((p) => (
                <li key={p.projectId} className="space-y-2" data-awaiting={p.projectId}>
                  <p><span className="font-semibold">{p.title}</span> · {p.siteAddress}</p>
                  <AssignForm projectId={p.projectId} title={p.title} />
                </li>
              ))}
            </ul>
          </CardBody>
        </Card>
      ) : null}
      <section aria-labelledby="open-jobs" className="space-y-2">
        <h2 id="open-jobs" className="text-lg font-semibold">To install</h2>
        {open.length === 0 ? <p className="text-base text-ink-700">No open jobs.</p> : (
          <ul className="space-y-2">
            {open.map((j) => (
              <li key={j.id}>
                <Link to={paths.app.job.getHref(j.id)} className="flex min-h-touch items-center justify-between gap-3 rounded-lg border border-ink-300 bg-white p-4 hover:border-ink-500" data-job={j.id}>
                  <span className="min-w-0">
                    <span className="block text-sm font-semibold text-ember-700">{formatDay(j.scheduledFor)}</span>
                    <span className="block text-lg font-semibold text-ink-950">{j.title}</span>
                    <span className="block text-base text-ink-700">{j.siteAddress}</span>
                    {canAssign ? <span className="block text-sm text-ink-700">Crew: {j.crewName}</span> : null}
                  </span>
                  <ChevronRightIcon className="size-6 shrink-0" />
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>
      {done.length > 0 ? (
        <section aria-labelledby="done-jobs" className="space-y-2">
          <h2 id="done-jobs" className="text-lg font-semibold">Completed</h2>
          <ul className="space-y-2">
            {done.map((j) => (
              <li key={j.id}>
                <Link to={paths.app.job.getHref(j.id)} className="flex min-h-touch items-center justify-between gap-3 rounded-lg border border-ink-200 bg-ink-50 p-4">
                  <span><span className="block font-semibold">{j.title}</span><span className="text-sm text-ink-700">{j.siteAddress}</span></span>
                  <SeverityBadge severity="ok">Done</SeverityBadge>
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
