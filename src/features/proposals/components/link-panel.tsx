import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { TextField } from "@/components/ui/field";
import { toast } from "@/components/ui/toaster";
import { formatDateTime } from "@/lib/format-date";
import { useRevokeLink } from "../api/revoke-link";
import type { ProposalRecord } from "../api/types";

/** The homeowner's link: shown once right after sending (only its hash is stored), its state, and revoking it. */
export function LinkPanel({ proposal, justSentLink, canSend }: { proposal: ProposalRecord; justSentLink: string | null; canSend: boolean }) {
  const revoke = useRevokeLink();
  const [isOpen, setIsOpen] = useState(false);
  const { link } = proposal;
  return (
    <div className="space-y-3">
      {justSentLink ? (
        <>
          <Alert severity="ok" title="Sent">
            The e-mail with the link is on its way. Copy the link now if you want to send it another way: for safety it is not stored and can't be shown again.
          </Alert>
          <TextField label="Homeowner's link" value={justSentLink} readOnly onFocus={(e) => e.target.select()} data-proposal-link />
          <Button
            variant="secondary"
            size="sm"
            onClick={() => void navigator.clipboard?.writeText(justSentLink).then(() => toast.success("Link copied"), () => toast.error("Copy failed: select the link and copy it"))}
          >
            Copy the link
          </Button>
        </>
      ) : null}
      <p className="text-base text-ink-800">
        {proposal.supersededBy
          ? "The link now says this proposal was replaced by a newer revision."
          : link.revokedAt
            ? `Link revoked ${formatDateTime(link.revokedAt)}: it now answers "not found".`
            : link.isActive
              ? `The link works until ${link.expiresAt ? formatDateTime(link.expiresAt) : proposal.validUntil}.`
              : "No working link."}
      </p>
      {canSend && link.isActive && !link.revokedAt && proposal.status !== "accepted" ? (
        <>
          <Button variant="secondary" onClick={() => setIsOpen(true)}>
            Revoke the link
          </Button>
          <ConfirmDialog
            open={isOpen}
            onOpenChange={setIsOpen}
            title="Revoke the homeowner's link?"
            description="It stops working at once and answers as if it never existed. To offer the proposal again, make a new revision and send it."
            confirmLabel="Revoke the link"
            confirmVariant="danger"
            isPending={revoke.isPending}
            onConfirm={() => revoke.mutate(proposal.id, { onSuccess: () => setIsOpen(false), onError: (e) => toast.error("Not revoked", { description: e.message }) })}
          />
        </>
      ) : null}
    </div>
  );
}
