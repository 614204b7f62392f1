import { AppError, conflict, notFound } from "../../lib/errors.ts";
import type { Jobs } from "../../lib/jobs.ts";
import type { Logger } from "../../lib/logger.ts";
import type { Actor, RequestMeta } from "../../lib/request-context.ts";
import { formatCents } from "../../../shared/pricing/index.ts";
import type { ProposalRow } from "../proposals/proposals.repository.ts";
import type { ProposalsService } from "../proposals/proposals.service.ts";
import { depositDue, MIN_ONLINE_CHARGE_CENTS } from "./deposit-amount.ts";
import type { CheckoutSessionFacts, PaymentProvider, ProviderEvent } from "./payment-provider.ts";
import type { PaymentRow, PaymentsRepository } from "./payments.repository.ts";
import type { DepositView, Payment } from "../../../shared/schemas/deposits.ts";

/** Deposits are charged in US dollars: the product serves US contractors. */
export const DEPOSIT_CURRENCY = "usd";
/** A pending row without a session this old was left by a request that died midway. */
const STALE_START_MS = 2 * 60_000;

/** What staff see of one payment attempt, provider ids included. */
export function presentPayment(p: PaymentRow): Payment {
  return {
    id: p.id, purpose: p.purpose, proposalId: p.proposalId, optionId: p.optionId, amountCents: p.amountCents, currency: p.currency, status: p.status,
    paidCents: p.paidCents, paidAt: iso(p.paidAt), checkoutSessionId: p.checkoutSessionId, paymentIntentId: p.paymentIntentId,
    refundId: p.refundId, refundRequestedAt: iso(p.refundRequestedAt), refundRequestedBy: p.refundRequestedBy, refundedCents: p.refundedCents, refundedAt: iso(p.refundedAt),
    failedAt: iso(p.failedAt), failureReason: p.failureReason, createdAt: p.createdAt.toISOString(), updatedAt: p.updatedAt.toISOString(),
  };
}

const iso = (d: Date | null) => d?.toISOString() ?? null;

const utc = (d: Date) => `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;

export function createPaymentsService(deps: {
  repo: PaymentsRepository;
  proposals: Pick<ProposalsService, "byToken">;
  provider: PaymentProvider | null;
  jobs: Pick<Jobs, "sendEmail">;
  logger: Logger;
  now: () => Date;
  appOrigin: () => string;
}) {
  const { repo } = deps;

  function requireProvider(): PaymentProvider {
    if (!deps.provider) throw new AppError("payments-not-configured", "Online deposit payment is not set up. Please contact the company to arrange the deposit.", 503);
    return deps.provider;
  }

  async function ruleFor(p: ProposalRow) {
    return p.depositRule ?? (await repo.companyDepositRule(p));
  }

  async function depositView(p: ProposalRow, allRows: PaymentRow[]): Promise<DepositView> {
    // The balance paid after completion is not the deposit.
    const rows = allRows.filter((r) => r.purpose === "deposit");
    const base = {
      currency: DEPOSIT_CURRENCY, message: null, isOnlinePaymentAvailable: deps.provider !== null, isCheckoutStarted: false,
      paidAt: null, isRefundRequested: false, refundedCents: 0, refundedAt: null,
    };
    // A payment the provider confirmed counts whatever happened to the proposal since.
    const settled = rows.find((r) => r.status === "paid" || r.status === "refunded");
    if (settled) {
      return {
        ...base, state: settled.status === "refunded" ? "refunded" : "paid", amountCents: settled.paidCents ?? settled.amountCents, currency: settled.currency,
        paidAt: iso(settled.paidAt), isRefundRequested: Boolean(settled.refundRequestedAt), refundedCents: settled.refundedCents, refundedAt: iso(settled.refundedAt),
      };
    }
    if (p.status === "declined") return { ...base, state: "declined", amountCents: null, message: "This proposal was declined, so no deposit is due." };
    if (p.status !== "accepted" || !p.snapshot) return { ...base, state: "not-accepted", amountCents: null, message: "The deposit is paid after an option is accepted." };
    const due = depositDue(p.snapshot, p.acceptance?.optionId ?? null, await ruleFor(p));
    if (!due.isDue) return { ...base, state: "none", amountCents: null, message: due.reason };
    return { ...base, state: "due", amountCents: due.amountCents, isCheckoutStarted: rows.some((r) => r.status === "pending") };
  }

  /** Retires an open checkout that can no longer be used (expired, or for an amount no longer right). */
  async function retire(p: ProposalRow, row: PaymentRow, session: CheckoutSessionFacts | null, reason: string) {
    if (session?.status === "open") await requireProvider().expireCheckout(session.id);
    await repo.update(p, row.id, { status: "failed", failedAt: deps.now(), failureReason: reason }, ["pending"]);
  }

  async function notifySeller(payment: PaymentRow, subjectStart: string, lines: string[]) {
    const p = await repo.proposal(payment, payment.proposalId);
    if (!p?.snapshot) return;
    const sellerId = p.sellerUserId ?? p.createdBy;
    const seller = sellerId ? await repo.user(payment, sellerId) : null;
    const to = seller?.isActive ? seller.email : p.snapshot.company.email;
    if (!to) {
      deps.logger.warn({ paymentId: payment.id }, "no one to tell about the deposit: the seller is gone and the company has no e-mail");
      return;
    }
    const s = p.snapshot;
    await deps.jobs.sendEmail({
      companyId: payment.companyId, to,
      subject: `${subjectStart} — ${s.customer.name}, ${s.site.address}`,
      text: [`Hello ${seller?.isActive ? seller.name : s.company.name},`, "", ...lines, "",
        `Open the project: ${deps.appOrigin()}/projects/${p.projectId}`, "",
        "Eavesight sent this when the payment service confirmed it. No card details ever reach Eavesight."].join("\n"),
    });
  }

  async function onSessionPaid(event: Extract<ProviderEvent, { session: CheckoutSessionFacts }>, meta: RequestMeta) {
    const { session } = event;
    if (session.paymentStatus !== "paid") return { isApplied: false, note: "The checkout is complete but the money has not arrived yet." };
    const payment = await repo.findByCheckoutSession(session.id);
    if (!payment) return { isApplied: false, note: "Not a checkout of this app." };
    const now = deps.now();
    const paidCents = session.amountTotalCents ?? payment.amountCents;
    const currency = session.currency ?? payment.currency;
    const detail = {
      paymentId: payment.id, amountCents: paidCents, currency, checkoutSessionId: session.id, paymentIntentId: session.paymentIntentId,
      providerEventId: event.id, paidAt: now.toISOString(),
      ...(paidCents !== payment.amountCents || currency !== payment.currency ? { expectedCents: payment.amountCents, expectedCurrency: payment.currency, isMismatch: true } : {}),
    };
    // Only a payment not yet settled becomes paid, decided under the row's lock: of several events
    // saying "paid" (completed, then async succeeded, or retries under new ids) exactly one applies.
    const outcome = await repo.applyEventOnce(payment, event.id, event.type,
      { status: "paid", paidCents, currency, paymentIntentId: session.paymentIntentId, paidAt: now, failedAt: null, failureReason: null },
      { event: `${payment.purpose}-paid`, detail, meta }, { statuses: ["pending", "failed"] });
    if (!outcome) return { isApplied: false, isDuplicate: true, note: "This event was already processed." };
    if (!outcome.isApplied) return { isApplied: false, note: "The payment was already recorded." };
    const updated = outcome.row;
    if (detail.isMismatch) deps.logger.warn({ paymentId: payment.id, paidCents, expectedCents: payment.amountCents }, "the provider collected a different amount than asked");
    const option = (await repo.proposal(payment, payment.proposalId))?.snapshot?.options.find((o) => o.id === payment.optionId);
    const what = payment.purpose === "balance" ? "balance" : "deposit";
    await notifySeller(updated, `${what === "balance" ? "Balance" : "Deposit"} received: ${formatCents(paidCents)}`, [
      `The homeowner paid the ${what} of ${formatCents(paidCents)}${option ? ` for "${option.name}"` : ""}.`,
      `Paid: ${utc(now)}`,
      `Payment service reference: ${session.paymentIntentId ?? session.id}`,
    ]);
    return { isApplied: true, note: `${what === "balance" ? "Balance" : "Deposit"} recorded as paid.` };
  }

  async function onSessionClosed(event: Extract<ProviderEvent, { session: CheckoutSessionFacts }>, meta: RequestMeta) {
    const payment = await repo.findByCheckoutSession(event.session.id);
    if (!payment) return { isApplied: false, note: "Not a checkout of this app." };
    if (payment.status !== "pending") {
      await repo.applyEventOnce(payment, event.id, event.type, {}, null);
      return { isApplied: false, note: "Nothing to change." };
    }
    const isFailed = event.type === "checkout.session.async_payment_failed";
    const outcome = await repo.applyEventOnce(payment, event.id, event.type, { status: "failed", failedAt: deps.now(), failureReason: isFailed ? "the payment failed" : "the checkout expired" },
      isFailed ? { event: "deposit-failed", detail: { paymentId: payment.id, checkoutSessionId: event.session.id, providerEventId: event.id }, meta } : null,
      { statuses: ["pending"] });
    if (!outcome) return { isApplied: false, isDuplicate: true, note: "This event was already processed." };
    return outcome.isApplied ? { isApplied: true, note: "Checkout closed." } : { isApplied: false, note: "Nothing to change." };
  }

  async function onRefunded(event: Extract<ProviderEvent, { type: "charge.refunded" }>, meta: RequestMeta) {
    const { charge } = event;
    const payment = charge.paymentIntentId ? await repo.findByPaymentIntent(charge.paymentIntentId) : null;
    if (!payment) return { isApplied: false, note: "Not a payment of this app." };
    const now = deps.now();
    const isFull = charge.isFullyRefunded;
    const outcome = await repo.applyEventOnce(payment, event.id, event.type, {
      refundedCents: charge.amountRefundedCents, ...(isFull ? { status: "refunded", refundedAt: now } : {}),
    }, {
      event: "deposit-refunded",
      detail: { paymentId: payment.id, refundedCents: charge.amountRefundedCents, currency: charge.currency, isFullRefund: isFull, paymentIntentId: charge.paymentIntentId, refundId: payment.refundId, providerEventId: event.id, refundedAt: now.toISOString() },
      meta,
    // Refunds only grow: an event reporting no more than is already recorded changes nothing.
    }, { refundedBelowCents: charge.amountRefundedCents });
    if (!outcome) return { isApplied: false, isDuplicate: true, note: "This event was already processed." };
    if (!outcome.isApplied) return { isApplied: false, note: "This refund was already recorded." };
    const updated = outcome.row;
    await notifySeller(updated, `Deposit refunded: ${formatCents(charge.amountRefundedCents)}`, [
      `The deposit was refunded${isFull ? " in full" : " in part"}: ${formatCents(charge.amountRefundedCents)} of ${formatCents(charge.amountCents)}.`,
      `Confirmed: ${utc(now)}`,
    ]);
    return { isApplied: true, note: "Refund recorded." };
  }

  /** Reuses an open checkout for the same purpose and amount, else retires it and opens a new one. */
  async function openCheckout(p: ProposalRow, rows: PaymentRow[], want: { purpose: PaymentRow["purpose"]; optionId: string; amountCents: number; description: string; back: { success: string; cancel: string } }, meta: RequestMeta) {
    const provider = requireProvider();
    const now = deps.now();
    const open = rows.find((r) => r.status === "pending");
    if (open) {
      if (!open.checkoutSessionId) {
        if (now.getTime() - open.createdAt.getTime() < STALE_START_MS) throw conflict("The payment page is being prepared; try again in a moment.", "checkout-starting");
        await retire(p, open, null, "the checkout was never opened");
      } else {
        const session = await provider.retrieveCheckout(open.checkoutSessionId);
        if (session.status === "complete") throw conflict("This payment was just made and is being confirmed. Refresh the page in a moment.", "payment-confirming");
        if (session.status === "open" && session.url && open.purpose === want.purpose && session.amountTotalCents === want.amountCents && open.amountCents === want.amountCents) {
          return { url: session.url, amountCents: want.amountCents, currency: open.currency };
        }
        await retire(p, open, session, session.status === "expired" ? "the checkout expired" : "the amount changed");
      }
    }

    const row = await repo.insertPending(p, { proposalId: p.id, optionId: want.optionId, amountCents: want.amountCents, currency: DEPOSIT_CURRENCY, purpose: want.purpose });
    if (!row) throw conflict("The payment page is being prepared; try again in a moment.", "checkout-starting");
    let session: CheckoutSessionFacts;
    try {
      session = await provider.createCheckout({
        amountCents: want.amountCents, currency: DEPOSIT_CURRENCY, description: want.description.slice(0, 250),
        customerEmail: p.snapshot!.customer.email, successUrl: want.back.success, cancelUrl: want.back.cancel,
        paymentId: row.id, metadata: { paymentId: row.id, proposalId: p.id, companyId: p.companyId, purpose: want.purpose },
      });
      if (!session.url) throw new AppError("payments-unavailable", "The payment service did not return a payment page. Please try again in a few minutes.", 502);
    } catch (err) {
      await repo.update(p, row.id, { status: "failed", failedAt: deps.now(), failureReason: "the checkout could not be opened" }, ["pending"]);
      throw err;
    }
    await repo.update(p, row.id, { checkoutSessionId: session.id });
    await repo.audit(p.companyId, `${want.purpose}-checkout-opened`, { proposalId: p.id, paymentId: row.id, amountCents: want.amountCents, currency: DEPOSIT_CURRENCY, checkoutSessionId: session.id }, meta);
    return { url: session.url, amountCents: want.amountCents, currency: DEPOSIT_CURRENCY };
  }

  return {
    /** GET /public/proposals/:token/deposit */
    async publicDeposit(token: string): Promise<DepositView> {
      const p = await deps.proposals.byToken(token);
      return depositView(p, await repo.listForProposal(p, p.id));
    },

    /**
     * Opens (or reopens) the provider's hosted checkout for the deposit. The amount is the
     * server's own (depositDue); nothing the client sends is read.
     */
    async startCheckout(token: string, meta: RequestMeta): Promise<{ url: string; amountCents: number; currency: string }> {
      const p = await deps.proposals.byToken(token);
      if (p.status === "declined") throw conflict("This proposal was declined, so there is no deposit to pay.", "declined");
      if (p.status !== "accepted" || !p.snapshot || !p.acceptance) throw conflict("Accept an option first: the deposit is paid after signing.", "not-accepted");
      const rows = await repo.listForProposal(p, p.id);
      const deposits = rows.filter((r) => r.purpose === "deposit");
      if (deposits.some((r) => r.status === "paid")) throw conflict("The deposit for this proposal has already been paid.", "already-paid");
      if (deposits.some((r) => r.status === "refunded")) throw conflict("The deposit for this proposal was refunded. Please contact the company.", "refunded");
      const due = depositDue(p.snapshot, p.acceptance.optionId, await ruleFor(p));
      if (!due.isDue) throw new AppError("no-deposit", due.reason, 409);
      const back = `${deps.appOrigin()}/p/${encodeURIComponent(token)}`;
      return openCheckout(p, rows, {
        purpose: "deposit", optionId: due.optionId, amountCents: due.amountCents, back: { success: `${back}?deposit=success`, cancel: `${back}?deposit=cancel` },
        description: `Deposit: ${due.optionName} — ${p.snapshot.company.name}, ${p.snapshot.site.address}`,
      }, meta);
    },

    /**
     * Opens the provider's checkout for the balance of completed work, through the deposit's flow
     * (one open checkout per proposal, confirmed only by the signed webhook). The caller (the jobs
     * module) works out the amount on the server; nothing the client sends is read.
     */
    async startBalanceCheckout(p: ProposalRow, input: { amountCents: number; back: string }, meta: RequestMeta): Promise<{ url: string; amountCents: number; currency: string }> {
      if (p.status !== "accepted" || !p.snapshot || !p.acceptance) throw conflict("This work's proposal is not accepted.", "not-accepted");
      if (input.amountCents < MIN_ONLINE_CHARGE_CENTS) throw new AppError("nothing-due", "Nothing is left to pay online for this job.", 409);
      const rows = await repo.listForProposal(p, p.id);
      return openCheckout(p, rows, {
        purpose: "balance", optionId: p.acceptance.optionId, amountCents: input.amountCents, back: { success: `${input.back}?balance=success`, cancel: `${input.back}?balance=cancel` },
        description: `Balance: ${p.snapshot.company.name}, ${p.snapshot.site.address}`,
      }, meta);
    },

    /** POST /webhooks/payments: verified, then applied at most once per event id. */
    async handleWebhook(rawBody: unknown, signature: string | undefined, meta: RequestMeta) {
      const provider = requireProvider();
      if (!Buffer.isBuffer(rawBody) || rawBody.length === 0) throw new AppError("bad-request", "The webhook body must be the raw JSON the payment service sent.", 400);
      const event = provider.verifyEvent(rawBody, signature);
      const outcome = await (async () => {
        switch (event.type) {
          case "checkout.session.completed":
          case "checkout.session.async_payment_succeeded":
            return onSessionPaid(event, meta);
          case "checkout.session.expired":
          case "checkout.session.async_payment_failed":
            return onSessionClosed(event, meta);
          case "charge.refunded":
            return onRefunded(event, meta);
          default:
            return { isApplied: false, note: `Events of type ${event.providerType} are not used.` };
        }
      })();
      return { received: true, eventId: event.id, isDuplicate: false, ...outcome };
    },

    /** GET /proposals/:id/payments */
    async forProposal(actor: Actor, proposalId: string) {
      const p = await repo.proposal(actor, proposalId);
      if (!p) throw notFound("That proposal");
      const rows = await repo.listForProposal(actor, p.id);
      return { deposit: await depositView(p, rows), payments: rows.map(presentPayment) };
    },

    /** POST /payments/:id/refund: asks the provider; the refund webhook then records it as refunded. */
    async refund(actor: Actor, paymentId: string, meta: RequestMeta) {
      const payment = await repo.find(actor, paymentId);
      if (!payment) throw notFound("That payment");
      if (payment.status === "refunded") throw conflict("This deposit was already refunded.", "already-refunded");
      if (payment.status !== "paid" || !payment.paymentIntentId) throw conflict("Only a paid deposit can be refunded.", "not-paid");
      if (payment.refundRequestedAt) throw conflict("A refund was already requested; it shows as refunded when the payment service confirms it.", "refund-requested");
      const amountCents = (payment.paidCents ?? payment.amountCents) - payment.refundedCents;
      const refund = await requireProvider().refund({
        paymentIntentId: payment.paymentIntentId, amountCents, paymentId: payment.id,
        metadata: { paymentId: payment.id, proposalId: payment.proposalId, companyId: payment.companyId },
      });
      // The refund webhook may already have marked it refunded; only the request facts are added.
      const updated = await repo.updateWithRecord(actor, payment, { refundId: refund.id, refundRequestedAt: deps.now(), refundRequestedBy: actor.userId }, ["paid", "refunded"], {
        event: "deposit-refund-requested", userId: actor.userId, meta,
        detail: { paymentId: payment.id, amountCents, currency: payment.currency, refundId: refund.id, refundStatus: refund.status },
      });
      return { payment: presentPayment(updated ?? (await repo.find(actor, paymentId))!) };
    },
  };
}
export type PaymentsService = ReturnType<typeof createPaymentsService>;
