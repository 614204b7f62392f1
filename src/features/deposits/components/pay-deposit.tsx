import { useEffect, useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useSearchParams } from "react-router";
import { formatCents } from "@shared/pricing/format-money";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { OkIcon } from "@/components/ui/icons";
import { Spinner } from "@/components/ui/spinner";
import { isApiError } from "@/lib/api-client";
import { formatDateTime } from "@/lib/format-date";
import { depositKeys, depositQueries } from "../api/queries";
import { startCheckout } from "../api/start-checkout";
import { checkoutReturnOf, CONFIRMATION_POLL_MS, CONFIRMATION_WAIT_MS } from "../lib/return-state";

export interface PayDepositProps {
  /** The homeowner's link token. */
  token: string;
  /** Who to contact when the deposit can't be paid online. */
  company: { name: string; phone: string | null; email: string | null };
}

function contactWords(company: PayDepositProps["company"]): string {
  const ways = [company.phone, company.email].filter(Boolean);
  return ways.length ? `${company.name} (${ways.join(", ")})` : company.name;
}

/**
 * The homeowner's deposit after accepting: the amount the server worked out, "Pay deposit" to the
 * payment service's page, and on return (`?deposit=success|cancel`) a wait for the server's
 * confirmation. "Deposit received" shows only when the server has the payment service's signed
 * word for it; being sent back to the success address proves nothing.
 */
export function PayDeposit({ token, company }: PayDepositProps) {
  const [searchParams] = useSearchParams();
  const [returned] = useState(() => checkoutReturnOf(`?${searchParams.toString()}`));
  const [hasWaitedLongEnough, setHasWaitedLongEnough] = useState(false);
  const isAwaitingConfirmation = returned === "success" && !hasWaitedLongEnough;
  const queryClient = useQueryClient();
  const query = useQuery({
    ...depositQueries.public(token),
    refetchInterval: (q) => (isAwaitingConfirmation && q.state.data?.state === "due" ? CONFIRMATION_POLL_MS : false),
  });

  useEffect(() => {
    if (returned !== "success") return;
    const timer = window.setTimeout(() => setHasWaitedLongEnough(true), CONFIRMATION_WAIT_MS);
    return () => window.clearTimeout(timer);
  }, [returned]);

  const checkout = useMutation({
    mutationFn: () => startCheckout(token),
    onSuccess: ({ url }) => window.location.assign(url),
    // "already paid" and the like: the status below is then out of date.
    onError: () => void queryClient.invalidateQueries({ queryKey: depositKeys.public(token) }),
  });

  if (query.isPending) {
    return (
      <p role="status" className="flex items-center gap-2 text-base text-ink-700">
        <Spinner /> Checking the deposit…
      </p>
    );
  }
  if (query.isError) {
    return <Alert severity="warning" title="The deposit could not be checked">{isApiError(query.error) ? query.error.message : "Please reload the page."}</Alert>;
  }

  const deposit = query.data;
  const amount = deposit.amountCents !== null ? formatCents(deposit.amountCents) : null;

  if (deposit.state === "paid" || deposit.state === "refunded") {
    const isRefunded = deposit.state === "refunded";
    return (
      <section aria-labelledby="deposit-title" data-testid="deposit" data-deposit-state={deposit.state} className="space-y-2 rounded-lg border border-ok-200 bg-white p-4">
        <h3 id="deposit-title" className="flex items-center gap-2 text-xl font-semibold text-ink-900">
          <OkIcon className="size-6 text-ok-600" /> {isRefunded ? "Deposit refunded" : "Deposit received"}
        </h3>
        <p role="status" className="text-base text-ink-800">
          {isRefunded
            ? `${formatCents(deposit.refundedCents)} of your ${amount} deposit was refunded${deposit.refundedAt ? ` on ${formatDateTime(deposit.refundedAt)}` : ""}. It can take a few days to show on your statement.`
            : `${company.name} has your deposit of ${amount}${deposit.paidAt ? `, paid ${formatDateTime(deposit.paidAt)}` : ""}. Thank you.`}
        </p>
      </section>
    );
  }
  if (deposit.state === "none") {
    return deposit.message ? <p className="text-base text-ink-700">{deposit.message}</p> : null;
  }
  if (deposit.state !== "due" || !amount) return null;

  return (
    <section aria-labelledby="deposit-title" data-testid="deposit" data-deposit-state="due" className="space-y-3 rounded-lg border border-ink-300 bg-white p-4">
      <h3 id="deposit-title" className="text-xl font-semibold text-ink-900">Deposit due at signing</h3>
      <p className="text-3xl font-semibold tabular-nums text-ink-900" data-testid="deposit-amount">{amount}</p>

      {returned === "success" && isAwaitingConfirmation ? (
        <p role="status" className="flex items-center gap-2 text-base text-ink-800">
          <Spinner /> Waiting for the payment service to confirm your payment…
        </p>
      ) : null}
      {returned === "success" && !isAwaitingConfirmation ? (
        <Alert severity="warning" title="Payment not completed">
          The payment service has not confirmed a payment. If you did pay, it will show here shortly; reload in a minute, or contact {contactWords(company)}.
        </Alert>
      ) : null}
      {returned === "cancel" ? (
        <Alert severity="warning" title="Payment not completed">
          You left the payment page before paying. Nothing was charged; you can pay whenever you are ready.
        </Alert>
      ) : null}
      {checkout.isError ? (
        <Alert severity="critical" title="The payment page could not be opened">
          {isApiError(checkout.error) ? checkout.error.message : "Please try again in a moment."}
        </Alert>
      ) : null}

      {deposit.isOnlinePaymentAvailable ? (
        <>
          <p className="text-base text-ink-700">
            You pay on the payment service&rsquo;s secure page and come back here afterwards. {company.name} never sees your card details.
          </p>
          <Button size="lg" className="w-full sm:w-auto" isLoading={checkout.isPending || checkout.isSuccess} loadingText="Opening the payment page…" onClick={() => checkout.mutate()}>
            Pay deposit
          </Button>
        </>
      ) : (
        <p className="text-base text-ink-700">Online payment is not available; {contactWords(company)} will arrange the deposit with you.</p>
      )}
    </section>
  );
}
