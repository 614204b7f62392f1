import { useQuery } from "@tanstack/react-query";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { CriticalIcon, OkIcon, RefreshIcon } from "@/components/ui/icons";
import { Progress, Spinner } from "@/components/ui/spinner";
import { cn } from "@/lib/cn";
import { formatDateTime } from "@/lib/format-date";
import { proposalQueries } from "../api/queries";
import { useRenderProposal } from "../api/render-proposal";
import type { ProposalRecord } from "../api/types";
import { RENDER_LABELS, shortHash } from "../lib/status";

const STEPS = ["queued", "rendering", "ready"] as const;
const STEP_WORDS: Record<(typeof STEPS)[number], string> = { queued: "Queued", rendering: "Drawing the pages", ready: "Ready" };

export const pdfHref = (proposalId: string, kind: "latest" | "original" | "signed") => `/api/proposals/${encodeURIComponent(proposalId)}/pdf?kind=${kind}`;

export interface RenderPanelProps {
  proposal: ProposalRecord;
  /** Unsaved edits: the PDF is drawn from what is saved, so it waits for the save. */
  isSaving: boolean;
}

/**
 * "Prepare PDF" and its progress: queued → drawing → ready, or failed with a retry. The status
 * is polled (TanStack Query refetchInterval) only while a render is under way.
 */
export function RenderPanel({ proposal, isSaving }: RenderPanelProps) {
  const render = useQuery({ ...proposalQueries.render(proposal.id), initialData: proposal.render, initialDataUpdatedAt: 0 });
  const start = useRenderProposal();
  const status = render.data.status;
  const isDraft = proposal.status === "draft";
  const isBusy = status === "queued" || status === "rendering";
  const stepIndex = status === "ready" ? 3 : status === "rendering" ? 2 : status === "queued" ? 1 : 0;
  const isReady = status === "ready" && render.data.isCurrent;

  return (
    <div className="space-y-4" data-render-status={status}>
      {status !== "none" ? (
        <>
          <Progress label="PDF" value={stepIndex} max={3} valueText={RENDER_LABELS[status]} />
          <ol className="grid grid-cols-3 gap-2 text-sm" aria-label="PDF steps">
            {STEPS.map((step, i) => {
              const isDone = stepIndex > i || (step === "ready" && isReady);
              const isCurrent = stepIndex === i + 1 && status !== "ready";
              return (
                <li key={step} className={cn("flex items-center gap-1.5", isDone ? "font-semibold text-ink-900" : "text-ink-600")}>
                  {isDone ? <OkIcon className="size-4 text-ok-600" /> : isCurrent ? <Spinner className="size-4" /> : <span aria-hidden="true" className="size-4 rounded-full border border-ink-300" />}
                  {STEP_WORDS[step]}
                  <span className="sr-only">{isDone ? " (done)" : isCurrent ? " (under way)" : " (to come)"}</span>
                </li>
              );
            })}
          </ol>
        </>
      ) : (
        <p className="text-base text-ink-700">{isDraft ? "Make a PDF of the draft to check it before sending." : "The PDF is made when the proposal is sent."}</p>
      )}

      {status === "failed" ? (
        <Alert severity="critical" title="The PDF could not be made">
          <p>{render.data.error ?? "Something went wrong while drawing the pages."}</p>
          <p className="mt-1">It was tried {render.data.attempts} time{render.data.attempts === 1 ? "" : "s"}.</p>
        </Alert>
      ) : null}
      {status === "queued" && render.data.error ? (
        <p className="flex items-start gap-1.5 text-sm text-warning-800">
          <CriticalIcon className="mt-0.5 size-4 text-warning-600" /> The last try failed ({render.data.error}); trying again.
        </p>
      ) : null}
      {start.isError ? <Alert severity="critical">{start.error.message}</Alert> : null}

      <div className="flex flex-wrap gap-3">
        {status === "failed" ? (
          <Button icon={<RefreshIcon />} onClick={() => start.mutate(proposal.id)} isLoading={start.isPending} loadingText="Queuing…">
            Retry
          </Button>
        ) : isDraft ? (
          <Button
            variant={isReady ? "secondary" : "primary"}
            onClick={() => start.mutate(proposal.id)}
            isLoading={start.isPending || isBusy}
            loadingText={isBusy ? "Preparing…" : "Queuing…"}
            disabled={isSaving}
          >
            {isReady ? "Prepare the PDF again" : "Prepare PDF"}
          </Button>
        ) : null}
        {isReady ? (
          <a href={pdfHref(proposal.id, isDraft ? "latest" : "original")} download className={buttonStyles({ variant: isDraft ? "primary" : "secondary" })}>
            {isDraft ? "Download the PDF" : "Download the PDF as sent"}
          </a>
        ) : null}
      </div>
      {isSaving && isDraft ? <p className="text-sm text-ink-600">Saving your changes first…</p> : null}
      {isReady && render.data.pdfSha256 ? (
        <p className="text-sm text-ink-600">
          Made {render.data.updatedAt ? formatDateTime(render.data.updatedAt) : ""} · SHA-256 <span className="font-mono" title={render.data.pdfSha256}>{shortHash(render.data.pdfSha256)}</span>
        </p>
      ) : null}
      {status === "ready" && !render.data.isCurrent && isDraft ? <p className="text-sm text-warning-800">The draft changed after this PDF was made: prepare it again.</p> : null}

      {proposal.acceptance ? (
        <div className="space-y-2 border-t border-ink-100 pt-4">
          <p className="text-base font-semibold text-ink-900">Signed copy</p>
          {proposal.signedRender.status === "ready" ? (
            <a href={pdfHref(proposal.id, "signed")} download className={buttonStyles({ variant: "primary" })}>
              Download the signed PDF
            </a>
          ) : proposal.signedRender.status === "failed" ? (
            <Alert severity="critical">The signed PDF could not be made: {proposal.signedRender.error}</Alert>
          ) : (
            <p className="flex items-center gap-2 text-base text-ink-700">
              <Spinner className="size-4" /> Preparing the signed PDF with the signing certificate…
            </p>
          )}
        </div>
      ) : null}
    </div>
  );
}
