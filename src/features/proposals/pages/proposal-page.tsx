import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Link, useNavigate } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader, CardTitle } from "@/components/ui/card";
import { ConfirmDialog } from "@/components/ui/dialog";
import { ChevronLeftIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { LoadingBlock } from "@/components/ui/spinner";
import { TextLink } from "@/components/ui/text-link";
import { toast } from "@/components/ui/toaster";
import { paths } from "@/config/paths";
import { formatDate, formatDateTime } from "@/lib/format-date";
import { proposalKeys, proposalQueries } from "../api/queries";
import type { ProposalRecord } from "../api/types";
import { updateProposal } from "../api/update-proposal";
import { AuditTrail } from "../components/audit-trail";
import { DraftEditor } from "../components/draft-editor";
import { FrozenProposal } from "../components/frozen-proposal";
import { LinkPanel } from "../components/link-panel";
import { RenderPanel } from "../components/render-panel";
import { SendPanel } from "../components/send-panel";
import { SignaturePanel } from "../components/signature-panel";
import { StatusBadge } from "../components/status-badge";
import { statusTime } from "../lib/status";

export interface ProposalPageProps {
  projectId: string;
  proposalId: string;
  canSend: boolean;
  userName: string;
  /** The deposit's state for staff, composed in by the route (the deposits feature); shown once accepted. */
  depositStatus?: React.ReactNode;
  /** Change orders and the job's current scope and total, composed in by the route (the change-orders feature); shown once accepted. */
  changeOrders?: React.ReactNode;
}

function Times({ p }: { p: ProposalRecord }) {
  const rows: [string, string | null][] = [
    ["Created", p.createdAt],
    ["Sent", p.sentAt],
    ["First opened", p.viewedAt],
    [p.status === "declined" ? "Declined" : "Accepted", p.status === "accepted" || p.status === "declined" ? p.decidedAt : null],
    ["Reminder sent", p.reminderSentAt],
  ];
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-base">
      {rows
        .filter(([, at]) => at)
        .map(([label, at]) => (
          <div key={label} className="contents">
            <dt className="text-ink-600">{label}</dt>
            <dd className="text-ink-900">{formatDateTime(at!)}</dd>
          </div>
        ))}
      <dt className="text-ink-600">Valid until</dt>
      <dd className="text-ink-900">{formatDate(`${p.validUntil}T12:00:00`)}</dd>
    </dl>
  );
}

/** One proposal revision: the builder while it is a draft, the frozen record with its audit trail once sent. */
export function ProposalPage({ projectId, proposalId, canSend, userName, depositStatus, changeOrders }: ProposalPageProps) {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const detail = useQuery({
    ...proposalQueries.detail(proposalId),
    // Once sent, follow the homeowner: viewed, accepted, the signed PDF.
    refetchInterval: (q) => {
      const p = q.state.data?.proposal;
      if (!p || p.status === "draft" || p.supersededBy) return false;
      const isSigning = p.acceptance && (p.signedRender.status === "queued" || p.signedRender.status === "rendering");
      return isSigning ? 2_000 : p.status === "sent" || p.status === "viewed" ? 8_000 : false;
    },
  });
  const project = useQuery(proposalQueries.project(projectId));
  const options = useQuery(proposalQueries.projectOptions(projectId));
  const analysis = useQuery(proposalQueries.projectAnalysis(projectId));
  const signature = useQuery(proposalQueries.signature());
  const [justSentLink, setJustSentLink] = useState<string | null>(null);
  const [reloadKey, setReloadKey] = useState(0);
  const [isReviseOpen, setIsReviseOpen] = useState(false);
  const [isRevising, setIsRevising] = useState(false);

  if (detail.isPending || project.isPending || options.isPending) return <LoadingBlock label="Loading the proposal…" />;
  if (detail.isError || project.isError || options.isError) {
    const error = detail.error ?? project.error ?? options.error;
    return (
      <Alert severity="critical" title="The proposal could not be loaded">
        {error?.message}
      </Alert>
    );
  }
  const { proposal, snapshot, events } = detail.data;
  const customer = project.data.customer;
  const isDraft = proposal.status === "draft";

  async function makeRevision() {
    setIsRevising(true);
    try {
      const result = await updateProposal(proposal.id, { version: proposal.version });
      await queryClient.invalidateQueries({ queryKey: proposalKeys.list(projectId) });
      await queryClient.invalidateQueries({ queryKey: proposalKeys.detail(proposal.id) });
      setIsReviseOpen(false);
      toast.success(`Revision ${result.proposal.revision} started`, { description: "The old link now says it was replaced." });
      void navigate(paths.app.projectProposal.getHref(projectId, result.proposal.id));
    } catch (error) {
      toast.error("No new revision", { description: error instanceof Error ? error.message : undefined });
    } finally {
      setIsRevising(false);
    }
  }

  const header = (
    <PageHeader
      documentTitle={`Proposal rev. ${proposal.revision} · ${project.data.project.title}`}
      eyebrow={
        <Link to={paths.app.projectProposals.getHref(projectId)} className="inline-flex min-h-touch items-center gap-1 hover:text-ink-900 md:min-h-0">
          <ChevronLeftIcon className="size-4" /> Proposals for {project.data.project.title}
        </Link>
      }
      title={
        <span className="flex flex-wrap items-center gap-3">
          Proposal for {customer?.name ?? "the homeowner"}
          <span className="text-lg font-medium text-ink-600">revision {proposal.revision}</span>
        </span>
      }
      description={
        <span className="flex flex-wrap items-center gap-2">
          <StatusBadge status={proposal.status} at={statusTime(proposal)} /> <span>{project.data.project.siteAddress}</span>
        </span>
      }
      actions={
        !isDraft && !proposal.supersededBy && proposal.status !== "accepted" ? (
          <Button variant="secondary" onClick={() => setIsReviseOpen(true)}>
            Make a new revision
          </Button>
        ) : null
      }
    />
  );

  const sideCards = (isSaved: boolean) => (
    <>
      <Card aria-labelledby="pp-status">
        <CardHeader>
          <CardTitle id="pp-status">Status</CardTitle>
        </CardHeader>
        <CardBody>
          <Times p={proposal} />
          {proposal.acceptance ? (
            <p className="mt-3 text-base text-ink-800">
              Signed by <strong>{proposal.acceptance.signerName}</strong> ({proposal.acceptance.signature.isDrawn ? "drawn" : "typed"} signature).
            </p>
          ) : null}
          {proposal.declineReason ? <p className="mt-3 text-base text-ink-800">Reason given: “{proposal.declineReason}”</p> : null}
        </CardBody>
      </Card>
      <Card aria-labelledby="pp-pdf">
        <CardHeader>
          <CardTitle id="pp-pdf">PDF</CardTitle>
        </CardHeader>
        <CardBody>
          <RenderPanel proposal={proposal} isSaving={!isSaved} />
        </CardBody>
      </Card>
      {isDraft ? (
        <>
          <Card aria-labelledby="pp-sign">
            <CardHeader>
              <CardTitle id="pp-sign">Your signature</CardTitle>
            </CardHeader>
            <CardBody>
              <SignaturePanel userName={userName} />
            </CardBody>
          </Card>
          <Card aria-labelledby="pp-send">
            <CardHeader>
              <CardTitle id="pp-send">Send</CardTitle>
            </CardHeader>
            <CardBody>
              <SendPanel
                proposal={proposal}
                customerName={customer?.name ?? null}
                customerEmail={customer?.email ?? null}
                hasSignature={Boolean(signature.data)}
                isSaved={isSaved}
                canSend={canSend}
                onSent={setJustSentLink}
              />
            </CardBody>
          </Card>
        </>
      ) : (
        <Card aria-labelledby="pp-link">
          <CardHeader>
            <CardTitle id="pp-link">Homeowner's link</CardTitle>
          </CardHeader>
          <CardBody>
            <LinkPanel proposal={proposal} justSentLink={justSentLink} canSend={canSend} customerEmail={customer?.email ?? null} />
          </CardBody>
        </Card>
      )}
      {proposal.status === "accepted" && changeOrders ? (
        <Card aria-labelledby="pp-change-orders">
          <CardHeader>
            <CardTitle id="pp-change-orders">Change orders</CardTitle>
          </CardHeader>
          <CardBody>{changeOrders}</CardBody>
        </Card>
      ) : null}
      {proposal.status === "accepted" && depositStatus ? (
        <Card aria-labelledby="pp-deposit">
          <CardHeader>
            <CardTitle id="pp-deposit">Deposit</CardTitle>
          </CardHeader>
          <CardBody>{depositStatus}</CardBody>
        </Card>
      ) : null}
      <Card aria-labelledby="pp-audit">
        <CardHeader>
          <CardTitle id="pp-audit">Audit trail</CardTitle>
        </CardHeader>
        <CardBody>
          <AuditTrail events={events} />
        </CardBody>
      </Card>
    </>
  );

  return (
    <>
      {header}
      {proposal.supersededBy ? (
        <Alert severity="info" title="Replaced by a newer revision" className="mb-6">
          This revision is kept as it was sent. <TextLink to={paths.app.projectProposal.getHref(projectId, proposal.supersededBy)}>Open the newer revision</TextLink>.
        </Alert>
      ) : !isDraft ? (
        <Alert severity={proposal.status === "accepted" ? "ok" : "info"} title={proposal.status === "accepted" ? "Accepted — locked" : "Sent — frozen"} className="mb-6">
          {proposal.status === "accepted"
            ? "The homeowner accepted this proposal, so it is read-only. To change the signed work, draft a change order below; the homeowner signs it the same way."
            : "What the homeowner sees can't change. To change anything, make a new revision: the old link will then say it was replaced."}
        </Alert>
      ) : null}

      {isDraft ? (
        <DraftEditor
          key={`${proposal.id}:${reloadKey}`}
          proposal={proposal}
          project={project.data}
          options={options.data}
          analysis={analysis.data}
          onSaved={(result) => {
            queryClient.setQueryData(proposalKeys.detail(proposal.id), { ...detail.data, proposal: result.proposal });
            queryClient.setQueryData(proposalKeys.render(proposal.id), result.proposal.render);
          }}
          onReload={() => {
            void detail.refetch().then(() => setReloadKey((k) => k + 1));
          }}
          renderAside={(state) => sideCards(state.kind === "saved")}
        />
      ) : (
        <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem] lg:items-start">
          <div className="min-w-0">{snapshot ? <FrozenProposal proposal={proposal} snapshot={snapshot} /> : null}</div>
          <aside className="min-w-0 space-y-6" aria-label="Status, PDF and link">
            {sideCards(true)}
          </aside>
        </div>
      )}

      <ConfirmDialog
        open={isReviseOpen}
        onOpenChange={setIsReviseOpen}
        title="Make a new revision?"
        description={`Revision ${proposal.revision + 1} starts as a draft copy of this one. The link you sent will then tell the homeowner that the proposal was replaced and to ask you for the new link.`}
        confirmLabel="Make a new revision"
        isPending={isRevising}
        onConfirm={() => void makeRevision()}
      />
    </>
  );
}
