import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { MailIcon } from "@/components/ui/icons";
import { TextField } from "@/components/ui/field";
import { isApiError } from "@/lib/api-client";
import { useSendProposal } from "../api/send-proposal";
import type { ProposalRecord } from "../api/types";

export interface SendPanelProps {
  proposal: ProposalRecord;
  customerName: string | null;
  customerEmail: string | null;
  hasSignature: boolean;
  isSaved: boolean;
  canSend: boolean;
  onSent: (link: string) => void;
}

/** Send: a confirmation where the homeowner's e-mail is entered or corrected, then the link. */
export function SendPanel({ proposal, customerName, customerEmail, hasSignature, isSaved, canSend, onSent }: SendPanelProps) {
  const send = useSendProposal();
  const [isOpen, setIsOpen] = useState(false);
  const [recipient, setRecipient] = useState(customerEmail ?? "");
  if (!canSend) return <p className="text-base text-ink-700">A salesperson or the owner signs and sends proposals. Your draft is saved for them.</p>;

  const blockers: string[] = [];
  if (!hasSignature) blockers.push("Save your signature above first.");
  if (!isSaved) blockers.push("Wait until your changes are saved.");

  return (
    <div className="space-y-3">
      <p className="text-base text-ink-700">
        Sending signs the proposal with your saved signature, freezes this revision and e-mails {customerName ?? "the homeowner"} a private link.
      </p>
      {!customerEmail ? <p className="text-base text-ink-800">The customer has no e-mail address yet: you enter it when you send.</p> : null}
      <Button
        icon={<MailIcon />}
        size="lg"
        className="w-full"
        disabled={blockers.length > 0}
        onClick={() => {
          setRecipient(customerEmail ?? "");
          setIsOpen(true);
        }}
      >
        Send to the homeowner
      </Button>
      {blockers.length > 0 ? <p className="text-sm text-ink-600">{blockers.join(" ")}</p> : null}
      <ConfirmDialog
        open={isOpen}
        onOpenChange={setIsOpen}
        title="Send this proposal?"
        description={`It goes to ${customerName ?? "the homeowner"} by e-mail.`}
        confirmLabel="Sign and send"
        isPending={send.isPending}
        onConfirm={() =>
          send.mutate({ proposalId: proposal.id, recipientEmail: recipient.trim() || undefined }, {
            onSuccess: ({ link }) => {
              setIsOpen(false);
              onSent(link);
            },
          })
        }
      >
        <div className="space-y-3 text-base text-ink-800">
          <TextField
            label="Homeowner's e-mail"
            type="email"
            autoComplete="off"
            value={recipient}
            onChange={(e) => setRecipient(e.target.value)}
            hint={recipient.trim() && recipient.trim() !== customerEmail ? "Saved on the customer when you send." : undefined}
            error={send.isError && isApiError(send.error) ? send.error.fields.recipientEmail : undefined}
            data-send-to
          />
          <p>Revision {proposal.revision} is frozen once sent: any later change makes a new revision, and this link will then say it was replaced.</p>
          <p>The link works through {proposal.validUntil}.</p>
          {send.isError ? <Alert severity="critical">{send.error.message}</Alert> : null}
        </div>
      </ConfirmDialog>
    </div>
  );
}
