import type { ProposalStatus } from "../proposals/types.ts";

/** The response contract of GET /api/pipeline, read by the server's service and the client's page. */
export const PIPELINE_PERIODS_DAYS = [30, 90, 365] as const;
export type PipelinePeriodDays = (typeof PIPELINE_PERIODS_DAYS)[number];

export interface PipelineProposal {
  id: string;
  projectId: string;
  projectTitle: string;
  customerName: string | null;
  revision: number;
  status: ProposalStatus;
  /** The accepted option's total, else the largest option total; null when nothing is priced yet. */
  valueCents: number | null;
  valueBasis: "accepted" | "largest" | null;
  /** Whole days from sending (drafts: from creation) to the decision, or to now while open. */
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
  /** Accepted ÷ decided (accepted + declined) among decisions in the period; null with no decisions. */
  winRate: { accepted: number; declined: number; decided: number; expired: number; rate: number | null };
  deposits: { receivedCents: number; count: number };
}
