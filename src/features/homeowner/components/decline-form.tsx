import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { TextArea } from "@/components/ui/field";
import { useDeclineProposal } from "../api/decline-proposal";

/** Decline, with an optional reason; nothing is sent until the second button. */
export function DeclineForm({ token, companyName, onDeclined }: { token: string; companyName: string; onDeclined?: () => void }) {
  const decline = useDeclineProposal(token);
  const [isOpen, setIsOpen] = useState(false);
  const [reason, setReason] = useState("");
  if (!isOpen) {
    return (
      <Button variant="secondary" onClick={() => setIsOpen(true)}>
        Decline this proposal
      </Button>
    );
  }
  return (
    <div className="space-y-4 rounded-md border border-ink-300 p-4">
      <TextArea
        label={`Would you tell ${companyName} why?`}
        hint="Optional. For example: the price, the timing, or you chose someone else."
        isOptional
        rows={3}
        value={reason}
        onChange={(e) => setReason(e.target.value)}
      />
      {decline.isError ? <Alert severity="critical">{decline.error.message}</Alert> : null}
      <div className="flex flex-col gap-3 sm:flex-row">
        <Button variant="danger" isLoading={decline.isPending} loadingText="Sending…" onClick={() => decline.mutate(reason.trim() === "" ? null : reason.trim(), { onSuccess: () => onDeclined?.() })}>
          Decline the proposal
        </Button>
        <Button variant="ghost" onClick={() => setIsOpen(false)}>
          Keep it open
        </Button>
      </div>
    </div>
  );
}
