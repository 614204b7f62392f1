import type { DepositRule, ProposalSnapshot, ProposalStatus, RenderStatus, ScopeText } from "@shared/proposals/types";
import type { OptionPrice } from "@shared/pricing/index";
import type { AtticAnalysis } from "@shared/ventilation/index";

/** A proposal revision as staff see it (presentProposal in server/modules/proposals/proposals.service.ts). */
export interface ProposalRecord {
  id: string;
  projectId: string;
  seriesId: string;
  revision: number;
  status: ProposalStatus;
  coverNote: string | null;
  terms: string | null;
  validUntil: string;
  depositRule: DepositRule | null;
  optionIds: string[];
  photoIds: string[];
  findingCodes: string[] | null;
  scopes: Record<string, ScopeText>;
  version: number;
  createdBy: string | null;
  sellerUserId: string | null;
  render: { status: RenderStatus; attempts: number; error: string | null; pdfSha256: string | null; isCurrent: boolean; updatedAt: string | null };
  signedRender: { status: RenderStatus; error: string | null; pdfSha256: string | null };
  snapshotSha256: string | null;
  link: { isActive: boolean; expiresAt: string | null; revokedAt: string | null; tokenId: string | null };
  supersededBy: string | null;
  acceptance: {
    optionId: string;
    signerName: string;
    signature: { typed: string | null; isDrawn: boolean; pngSha256: string | null };
    consentTextVersion: string;
    acceptedAt: string;
    ip: string | null;
    userAgent: string | null;
    tokenId: string | null;
  } | null;
  declineReason: string | null;
  sentAt: string | null;
  viewedAt: string | null;
  decidedAt: string | null;
  reminderSentAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface ProposalEvent {
  id: number | string;
  event: string;
  at: string;
  userId: string | null;
  ip: string | null;
  userAgent: string | null;
  tokenId: string | null;
  snapshotSha256: string | null;
  pdfSha256: string | null;
  consentTextVersion: string | null;
  detail: Record<string, unknown> | null;
}

export interface ProposalDetail {
  proposal: ProposalRecord;
  /** The frozen snapshot, once sent (null for a draft). */
  snapshot: ProposalSnapshot | null;
  events: ProposalEvent[];
}

/** PATCH /api/proposals/:id answers the revision it wrote and, after a send, the one it replaced. */
export interface ProposalUpdateResult {
  proposal: ProposalRecord;
  revisedFrom: string | null;
}

export interface SellerSignature {
  typed: string | null;
  drawnPngDataUrl: string | null;
}

/** What the builder needs of each design option (GET /api/projects/:id/options). */
export interface ProjectOption {
  id: string;
  name: string;
  notes: string | null;
  price: OptionPrice | null;
  priceIssue: string | null;
}

/** What the builder needs of the project (GET /api/projects/:id). */
export interface ProjectSummary {
  project: { id: string; title: string; siteAddress: string; status: string };
  customer: { id: string; name: string; email: string | null; phone: string | null } | null;
  photos: { id: string; caption: string | null; findingCode: string | null; thumbUrl: string; url: string }[];
}

export interface ProjectAnalysis {
  spaces: { spaceId: string; name: string; analysis: AtticAnalysis | null }[];
}
