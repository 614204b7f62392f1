import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { MailIcon } from "@/components/ui/icons";
import { TextLink } from "@/components/ui/text-link";
import { paths } from "@/config/paths";
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

/** Send: a confirmation that names the homeowner's e-mail, then the link. */
export function SendPanel({ proposal, customerName, customerEmail, hasSignature, isSaved, canSend, onSent }: SendPanelProps) {
  const send = useSendProposal();
  const [isOpen, setIsOpen] = useState(false);
  if (!canSend) return <p className="text-base text-ink-700">A salesperson or the owner signs and sends proposals. Your draft is saved for them.</p>;

  const blockers: string[] = [];
  if (!customerEmail) blockers.push("The customer has no e-mail address.");
  if (!hasSignature) blockers.push("Save your signature above first.");
  if (!isSaved) blockers.push("Wait until your changes are saved.");

  return (
    <div className="space-y-3">
      <p className="text-base text-ink-700">
        Sending signs the proposal with your saved signature, freezes this revision and e-mails {customerName ?? "the homeowner"} a private link.
      </p>
      {!customerEmail ? (
        <Alert severity="warning" title="No e-mail address">
          Add one to the customer on the <TextLink to={paths.app.customers.getHref()}>customers page</TextLink>.
        </Alert>
      ) : null}
      <Button icon={<MailIcon />} size="lg" className="w-full" disabled={blockers.length > 0} onClick={() => setIsOpen(true)}>
        Send to the homeowner
      </Button>
      {blockers.length > 0 && customerEmail ? <p className="text-sm text-ink-600">{blockers.join(" ")}</p> : null}
      <ConfirmDialog
        open={isOpen}
        onOpenChange={setIsOpen}
        title="Send this proposal?"
        description={`It goes to ${customerName ?? "the homeowner"} at ${customerEmail ?? ""}.`}
        confirmLabel="Sign and send"
        isPending={send.isPending}
        onConfirm={() =>
          send.mutate(proposal.id, {
            onSuccess: ({ link }) => {
              setIsOpen(false);
              onSent(link);
            },
          })
        }
      >
        <div className="space-y-3 text-base text-ink-800">
          <p>
            E-mail to: <strong data-send-to>{customerEmail}</strong>
          </p>
          <p>Revision {proposal.revision} is frozen once sent: any later change makes a new revision, and this link will then say it was replaced.</p>
          <p>The link works through {proposal.validUntil}.</p>
          {send.isError ? <Alert severity="critical">{send.error.message}</Alert> : null}
        </div>
      </ConfirmDialog>
    </div>
  );
}
