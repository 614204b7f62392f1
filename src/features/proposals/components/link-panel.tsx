import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { TextField } from "@/components/ui/field";
import { toast } from "@/components/ui/toaster";
import { isApiError } from "@/lib/api-client";
import { formatDateTime } from "@/lib/format-date";
import { useReissueLink } from "../api/reissue-link";
import { useResendProposal } from "../api/resend-proposal";
import { useRevokeLink } from "../api/revoke-link";
import type { ProposalRecord } from "../api/types";

type Action = "resend" | "reissue" | "revoke";

function linkState(proposal: ProposalRecord): string {
  const { link } = proposal;
  if (proposal.supersededBy) return "The link now says this proposal was replaced by a newer revision.";
  if (link.revokedAt) return `Link revoked ${formatDateTime(link.revokedAt)}: it now tells the homeowner the company withdrew it.`;
  if (proposal.status === "accepted") return "The link shows the homeowner what they signed, and their signed copy.";
  if (link.isActive) return `The link works until ${link.expiresAt ? formatDateTime(link.expiresAt) : proposal.validUntil}.`;
  return "No working link.";
}

/**
 * The homeowner's link: shown once right after sending (only its hash is stored), its state, and
 * what sales can do with it: send the same link again, send a new link in its place, or revoke it.
 * None of these touches what was signed.
 */
export function LinkPanel({ proposal, justSentLink, canSend, customerEmail }: { proposal: ProposalRecord; justSentLink: string | null; canSend: boolean; customerEmail: string | null }) {
  const revoke = useRevokeLink();
  const resend = useResendProposal();
  const reissue = useReissueLink();
  const [open, setOpen] = useState<Action | null>(null);
  const [recipient, setRecipient] = useState(customerEmail ?? "");
  const [newLink, setNewLink] = useState<string | null>(null);
  const isAccepted = proposal.status === "accepted";
  const isRevoked = Boolean(proposal.link.revokedAt);
  const shownLink = isRevoked ? null : (newLink ?? justSentLink);
  const isAnswerable = proposal.status === "sent" || proposal.status === "viewed";
  const hasLink = Boolean(proposal.link.tokenId) && !proposal.supersededBy;
  const canResend = canSend && hasLink && isAnswerable && !isRevoked;
  const canReissue = canSend && hasLink && (isAnswerable || isAccepted);
  const canRevoke = canSend && hasLink && !isRevoked && (isAnswerable || isAccepted);
  const to = recipient.trim() && recipient.trim() !== customerEmail ? recipient.trim() : undefined;
  const recipientError = (error: unknown) => (isApiError(error) ? error.fields.recipientEmail : undefined);

  const close = () => setOpen(null);
  const opener = (action: Action) => () => {
    setRecipient(customerEmail ?? "");
    resend.reset();
    reissue.reset();
    setOpen(action);
  };

  return (
    <div className="space-y-3">
      {shownLink ? (
        <>
          <Alert severity="ok" title={newLink ? "New link sent" : "Sent"}>
            {newLink ? "The old link no longer opens the proposal. " : ""}
            The e-mail with the link is on its way. Copy the link now if you want to send it another way: for safety it is not stored and can't be shown again.
          </Alert>
          <TextField label="Homeowner's link" value={shownLink} readOnly onFocus={(e) => e.target.select()} data-proposal-link />
          <Button
            variant="secondary"
            size="sm"
            onClick={() => void navigator.clipboard?.writeText(shownLink).then(() => toast.success("Link copied"), () => toast.error("Copy failed: select the link and copy it"))}
          >
            Copy the link
          </Button>
        </>
      ) : null}
      <p className="text-base text-ink-800" data-link-state>
        {linkState(proposal)}
      </p>
      {canResend || canReissue || canRevoke ? (
        <div className="flex flex-wrap gap-3">
          {canResend ? (
            <Button variant="secondary" onClick={opener("resend")}>
              Send the e-mail again
            </Button>
          ) : null}
          {canReissue ? (
            <Button variant="secondary" onClick={opener("reissue")}>
              Send a new link
            </Button>
          ) : null}
          {canRevoke ? (
            <Button variant="secondary" onClick={opener("revoke")}>
              Revoke the link
            </Button>
          ) : null}
        </div>
      ) : null}

      <ConfirmDialog
        open={open === "resend"}
        onOpenChange={(next) => (next ? undefined : close())}
        title="Send the e-mail again?"
        description="The homeowner gets the same link in a new e-mail. Correct the address if the first one went astray."
        confirmLabel="Send again"
        isPending={resend.isPending}
        onConfirm={() =>
          resend.mutate(
            { proposalId: proposal.id, recipientEmail: to },
            {
              onSuccess: ({ isQueued }) => {
                close();
                if (isQueued) toast.success("Sent again", { description: "The same link is on its way in a new e-mail." });
                else toast.success("Already sent again a moment ago", { description: "Nothing more was sent; wait a minute to send it again." });
              },
              onError: (e) => (recipientError(e) ? undefined : toast.error("Not sent again", { description: e.message })),
            },
          )
        }
      >
        <TextField label="Send to" type="email" value={recipient} onChange={(e) => setRecipient(e.target.value)} error={recipientError(resend.error)} autoComplete="off" />
      </ConfirmDialog>

      <ConfirmDialog
        open={open === "reissue"}
        onOpenChange={(next) => (next ? undefined : close())}
        title="Send a new link?"
        description={
          isAccepted
            ? "The homeowner gets a new link to what they signed. The old link stops working at once and tells them it was replaced. Nothing they signed changes."
            : "The homeowner gets a new link to this proposal. The old link stops working at once and tells them it was replaced (use this if the old one was forwarded or exposed)."
        }
        confirmLabel="Send the new link"
        isPending={reissue.isPending}
        onConfirm={() =>
          reissue.mutate(
            { proposalId: proposal.id, recipientEmail: to },
            {
              onSuccess: ({ link }) => {
                close();
                setNewLink(link);
                toast.success("New link sent");
              },
              onError: (e) => (recipientError(e) ? undefined : toast.error("No new link", { description: e.message })),
            },
          )
        }
      >
        <TextField label="Send to" type="email" value={recipient} onChange={(e) => setRecipient(e.target.value)} error={recipientError(reissue.error)} autoComplete="off" />
      </ConfirmDialog>

      <ConfirmDialog
        open={open === "revoke"}
        onOpenChange={(next) => (next ? undefined : close())}
        title="Revoke the homeowner's link?"
        description={
          isAccepted
            ? "The link stops working at once and tells the homeowner it was withdrawn. What they signed, their signed copy, the crew's list and any deposit stay exactly as they are. You can send them a new link later."
            : "The link stops working at once and tells the homeowner it was withdrawn. To let them answer again later, send a new link."
        }
        confirmLabel="Revoke the link"
        confirmVariant="danger"
        isPending={revoke.isPending}
        onConfirm={() => revoke.mutate(proposal.id, { onSuccess: () => { close(); setNewLink(null); }, onError: (e) => toast.error("Not revoked", { description: e.message }) })}
      />
    </div>
  );
}
