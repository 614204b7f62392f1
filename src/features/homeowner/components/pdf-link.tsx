import { buttonStyles } from "@/components/ui/button";
import { publicPdfHref } from "../api/get-public-proposal";
import type { PublicProposal } from "../api/types";

/** The proposal's PDF, or the signed copy once accepted; a plain status line while it is being made. */
export function PdfLink({ token, view }: { token: string; view: PublicProposal }) {
  const isSigned = view.proposal.status === "accepted";
  const isReady = isSigned ? view.proposal.isSignedPdfReady : view.proposal.isPdfReady;
  if (!isReady) {
    return (
      <p role="status" className="text-base text-ink-700">
        {isSigned ? "Your signed copy is being prepared; it will appear here in a moment and is also e-mailed to you." : "The PDF is being prepared; the download appears here in a moment."}
      </p>
    );
  }
  return (
    <a href={publicPdfHref(token)} download className={buttonStyles({ variant: "secondary", size: "lg", className: "w-full sm:w-auto" })}>
      {isSigned ? "Download your signed copy (PDF)" : "Download the proposal (PDF)"}
    </a>
  );
}
