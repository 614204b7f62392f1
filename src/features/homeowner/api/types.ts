import type { ProposalSnapshot, ProposalStatus } from "@shared/proposals/types";

/** What GET /api/public/proposals/:token answers (publicView in server/modules/proposals/proposals.service.ts). */
export interface PublicProposal {
  proposal: {
    revision: number;
    status: ProposalStatus;
    validUntil: string;
    sentAt: string | null;
    acceptedOptionId: string | null;
    decidedAt: string | null;
    isPdfReady: boolean;
    isSignedPdfReady: boolean;
    snapshotSha256: string | null;
  };
  company: { name: string; licenseNumber: string | null; addressLine: string | null; phone: string | null; email: string | null; hasLogo: boolean };
  customer: { firstName: string };
  site: { address: string };
  seller: { name: string; email: string | null };
  coverNote: string | null;
  explanation: string[];
  before: ProposalSnapshot["before"];
  photos: { id: string; caption: string | null; findingCode: string | null }[];
  options: ProposalSnapshot["options"];
  terms: string | null;
  cautions: string[];
  coolingOff: ProposalSnapshot["coolingOff"];
  esign: ProposalSnapshot["esign"];
}
