import { PROPOSAL_STATUSES, type ProposalStatus } from "../../../shared/proposals/types.ts";
import { PIPELINE_PERIODS_DAYS, type PipelineOverview, type PipelinePeriodDays, type PipelineProposal } from "../../../shared/schemas/pipeline.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { PipelineRepository, PipelineRow } from "./pipeline.repository.ts";

const DAY_MS = 86_400_000;
export { PIPELINE_PERIODS_DAYS };
export type { PipelineOverview, PipelinePeriodDays, PipelineProposal };
/** When a proposal left the open pipeline, for the period filter: its decision, or its link's lapse. */
function closedAt(row: PipelineRow): Date | null {
  if (row.status === "accepted" || row.status === "declined") return row.decidedAt;
  if (row.status === "expired") return row.tokenExpiresAt;
  return null;
}

export function createPipelineService(deps: {
  repo: PipelineRepository;
  /** Live option totals of a project, for drafts that have no frozen snapshot to read. */
  liveOptionTotals: (actor: Actor, projectId: string) => Promise<{ id: string; totalCents: number | null }[]>;
  now: () => Date;
}) {
  return {
    /**
     * The proposals in play by status, with value and age, and the win rate for the period. Open
     * proposals (draft, sent, viewed) always show; closed ones only when they closed in the period.
     */
    async overview(actor: Actor, periodDays: PipelinePeriodDays): Promise<PipelineOverview> {
      const now = deps.now();
      const since = new Date(now.getTime() - periodDays * DAY_MS);
      const rows = (await deps.repo.currentRevisions(actor)).filter((r) => {
        const closed = closedAt(r);
        return closed === null ? r.status !== "expired" : closed >= since;
      });

      const liveByProject = new Map<string, Promise<{ id: string; totalCents: number | null }[]>>();
      const live = (projectId: string) => {
        if (!liveByProject.has(projectId)) liveByProject.set(projectId, deps.liveOptionTotals(actor, projectId));
        return liveByProject.get(projectId)!;
      };

      const proposals = await Promise.all(
        rows.map(async (r): Promise<PipelineProposal> => {
          let totals = r.status === "draft" ? null : (r.snapshotTotalsCents ?? []).filter((n): n is number => typeof n === "number");
          if (totals === null) totals = (await live(r.projectId)).filter((o) => r.optionIds.includes(o.id)).map((o) => o.totalCents).filter((n): n is number => n !== null);
          const accepted = r.status === "accepted" ? r.acceptedTotalCents : null;
          const valueCents = accepted ?? (totals.length > 0 ? Math.max(...totals) : null);
          const start = r.sentAt ?? r.createdAt;
          const end = closedAt(r) ?? now;
          return {
            id: r.id, projectId: r.projectId, projectTitle: r.projectTitle, customerName: r.customerName, revision: r.revision, status: r.status,
            valueCents, valueBasis: accepted !== null ? "accepted" : valueCents !== null ? "largest" : null,
            ageDays: Math.max(0, Math.floor((end.getTime() - start.getTime()) / DAY_MS)),
            createdAt: r.createdAt.toISOString(), sentAt: r.sentAt?.toISOString() ?? null, viewedAt: r.viewedAt?.toISOString() ?? null,
            decidedAt: r.decidedAt?.toISOString() ?? null, validUntil: r.validUntil,
            depositPaidCents: r.depositPaidCents,
          };
        }),
      );

      const stages = PROPOSAL_STATUSES.map((status) => {
        const inStage = proposals.filter((p) => p.status === status);
        return { status, count: inStage.length, valueCents: inStage.reduce((sum, p) => sum + (p.valueCents ?? 0), 0) };
      });
      const count = (s: ProposalStatus) => proposals.filter((p) => p.status === s).length;
      const accepted = count("accepted");
      const declined = count("declined");
      const decided = accepted + declined;
      return {
        periodDays, generatedAt: now.toISOString(), stages, proposals,
        winRate: { accepted, declined, decided, expired: count("expired"), rate: decided === 0 ? null : accepted / decided },
        deposits: {
          receivedCents: proposals.reduce((sum, p) => sum + p.depositPaidCents, 0),
          count: proposals.filter((p) => p.depositPaidCents > 0).length,
        },
      };
    },
  };
}
export type PipelineService = ReturnType<typeof createPipelineService>;
