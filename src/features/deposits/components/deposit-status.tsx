import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { can } from "@shared/schemas/roles";
import { formatCents } from "@shared/pricing/format-money";
import { Alert } from "@/components/ui/alert";
import { SeverityBadge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Spinner } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-client";
import { formatDateTime } from "@/lib/format-date";
import { useSession } from "@/lib/session";
import { depositKeys, depositQueries } from "../api/queries";
import { refundPayment } from "../api/refund-payment";
import type { Payment } from "../api/types";

export interface DepositStatusProps {
  /** The proposal revision whose deposit to show. */
  proposalId: string;
}

const REFUND_POLL_MS = 3_000;

/**
 * The deposit on the staff proposal page: due, received (with the payment service's reference),
 * refund requested or refunded. The owner can refund a received deposit.
 */
export function DepositStatus({ proposalId }: DepositStatusProps) {
  const { user } = useSession();
  const canRefund = can(user.role, "payments:refund");
  const queryClient = useQueryClient();
  const [isConfirming, setIsConfirming] = useState(false);
  const query = useQuery({
    ...depositQueries.staff(proposalId),
    // While a refund waits for the payment service's confirmation, look again now and then.
    refetchInterval: (q) => (q.state.data?.deposit.state === "paid" && q.state.data.deposit.isRefundRequested ? REFUND_POLL_MS : false),
  });
  const refund = useMutation({
    mutationFn: (paymentId: string) => refundPayment(paymentId),
    onSettled: () => {
      setIsConfirming(false);
      return queryClient.invalidateQueries({ queryKey: depositKeys.staff(proposalId) });
    },
  });

  if (query.isPending) {
    return (
      <p role="status" className="flex items-center gap-2 text-base text-ink-700">
        <Spinner /> Loading the deposit…
      </p>
    );
  }
  if (query.isError) return <Alert severity="warning" title="The deposit could not be loaded">{isApiError(query.error) ? query.error.message : "Please reload."}</Alert>;

  const { deposit, payments } = query.data;
  const settled: Payment | undefined = payments.find((p) => p.status === "paid" || p.status === "refunded");
  const amount = deposit.amountCents !== null ? formatCents(deposit.amountCents) : null;

  return (
    <section aria-labelledby={`deposit-${proposalId}`} data-testid="deposit-status" data-deposit-state={deposit.state} className="space-y-2">
      <h3 id={`deposit-${proposalId}`} className="text-lg font-semibold text-ink-900">Deposit</h3>
      {deposit.state === "paid" ? (
        <>
          <p className="flex flex-wrap items-center gap-2 text-base text-ink-900">
            <SeverityBadge severity="ok">{deposit.isRefundRequested ? "Refund requested" : "Deposit received"}</SeverityBadge>
            <span className="font-semibold tabular-nums">{amount}</span>
            {deposit.paidAt ? <span className="text-ink-700">paid {formatDateTime(deposit.paidAt)}</span> : null}
          </p>
          {deposit.isRefundRequested ? <p role="status" className="text-sm text-ink-700">Waiting for the payment service to confirm the refund.</p> : null}
        </>
      ) : null}
      {deposit.state === "refunded" ? (
        <p className="flex flex-wrap items-center gap-2 text-base text-ink-900">
          <SeverityBadge severity="info">Deposit refunded</SeverityBadge>
          <span className="font-semibold tabular-nums">{formatCents(deposit.refundedCents)}</span>
          {deposit.refundedAt ? <span className="text-ink-700">on {formatDateTime(deposit.refundedAt)}</span> : null}
        </p>
      ) : null}
      {deposit.state === "due" ? (
        <p className="flex flex-wrap items-center gap-2 text-base text-ink-900">
          <SeverityBadge severity="warning">Deposit not paid yet</SeverityBadge>
          <span className="font-semibold tabular-nums">{amount}</span>
          <span className="text-ink-700">{deposit.isCheckoutStarted ? "the homeowner opened the payment page" : "the homeowner can pay from the proposal link"}</span>
        </p>
      ) : null}
      {deposit.state === "none" ? <p className="text-base text-ink-700">{deposit.message ?? "No deposit is asked."}</p> : null}
      {deposit.state === "not-accepted" ? <p className="text-base text-ink-700">The homeowner pays the deposit after accepting.</p> : null}
      {deposit.state === "declined" ? <p className="text-base text-ink-700">Declined: no deposit is due.</p> : null}

      {settled?.paymentIntentId ? <p className="text-sm text-ink-600">Payment service reference: <span className="font-mono">{settled.paymentIntentId}</span></p> : null}

      {canRefund && settled && deposit.state === "paid" && !deposit.isRefundRequested ? (
        isConfirming ? (
          <div className="flex flex-wrap items-center gap-3 rounded-md border border-critical-200 bg-critical-50 p-3">
            <p className="text-base text-critical-900">Refund {amount} to the homeowner? This cannot be undone.</p>
            <Button variant="danger" size="sm" isLoading={refund.isPending} loadingText="Refunding…" onClick={() => refund.mutate(settled.id)}>Refund {amount}</Button>
            <Button variant="ghost" size="sm" onClick={() => setIsConfirming(false)}>Keep the deposit</Button>
          </div>
        ) : (
          <Button variant="secondary" size="sm" onClick={() => setIsConfirming(true)}>Refund deposit</Button>
        )
      ) : null}
      {refund.isError ? <Alert severity="critical" title="The refund was not made">{isApiError(refund.error) ? refund.error.message : "Please try again."}</Alert> : null}
    </section>
  );
}
