import type { ProposalStatus } from "@shared/proposals/types";

export const PIPELINE_PERIODS_DAYS = [30, 90, 365] as const;
export type PipelinePeriodDays = (typeof PIPELINE_PERIODS_DAYS)[number];

/** GET /api/pipeline (server/modules/pipeline/pipeline.service.ts, PipelineOverview). */
export interface PipelineProposal {
  id: string;
  projectId: string;
  projectTitle: string;
  customerName: string | null;
  revision: number;
  status: ProposalStatus;
  valueCents: number | null;
  valueBasis: "accepted" | "largest" | null;
  ageDays: number;
  createdAt: string;
  sentAt: string | null;
  viewedAt: string | null;
  decidedAt: string | null;
  validUntil: string;
  /** Deposits received (confirmed by the payment webhook, not refunded), cents. */
  depositPaidCents: number;
}

export interface PipelineOverview {
  periodDays: PipelinePeriodDays;
  generatedAt: string;
  stages: { status: ProposalStatus; count: number; valueCents: number }[];
  proposals: PipelineProposal[];
  winRate: { accepted: number; declined: number; decided: number; expired: number; rate: number | null };
  deposits: { receivedCents: number; count: number };
}
