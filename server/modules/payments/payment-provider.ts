import Stripe from "stripe";
import type { Env } from "../../env.ts";
import { AppError } from "../../lib/errors.ts";

/** A checkout session as this app reads it, whichever call or event it came from. */
export interface CheckoutSessionFacts {
  id: string;
  /** "open", "complete" or "expired" (the provider may add more). */
  status: string | null;
  /** "paid", "unpaid" or "no_payment_required". */
  paymentStatus: string;
  url: string | null;
  amountTotalCents: number | null;
  currency: string | null;
  paymentIntentId: string | null;
  metadata: Record<string, string>;
}

export interface ChargeRefundFacts {
  paymentIntentId: string | null;
  amountCents: number;
  amountRefundedCents: number;
  isFullyRefunded: boolean;
  currency: string;
}

/** The verified event, reduced to what the payments service acts on. */
export type ProviderEvent =
  | { id: string; type: "checkout.session.completed" | "checkout.session.async_payment_succeeded" | "checkout.session.async_payment_failed" | "checkout.session.expired"; session: CheckoutSessionFacts }
  | { id: string; type: "charge.refunded"; charge: ChargeRefundFacts }
  | { id: string; type: "other"; providerType: string };

export interface CheckoutRequest {
  amountCents: number;
  currency: string;
  description: string;
  customerEmail: string | null;
  successUrl: string;
  cancelUrl: string;
  /** Our payment row's id: the provider's idempotency key and the client reference. */
  paymentId: string;
  metadata: Record<string, string>;
}

/**
 * The payment provider behind one small interface, through the official `stripe` SDK. With
 * PAYMENTS_API_BASE the SDK talks to that host (the local fake in development and tests);
 * without it, to the real API. Nothing else in the app imports the SDK.
 */
export interface PaymentProvider {
  createCheckout(input: CheckoutRequest): Promise<CheckoutSessionFacts>;
  retrieveCheckout(sessionId: string): Promise<CheckoutSessionFacts>;
  /** Closes an open session so it can no longer be paid. */
  expireCheckout(sessionId: string): Promise<CheckoutSessionFacts>;
  refund(input: { paymentIntentId: string; amountCents: number; paymentId: string; metadata: Record<string, string> }): Promise<{ id: string; status: string | null }>;
  /** Verifies the signature over the raw body and parses the event; throws a 400 AppError if it does not verify. */
  verifyEvent(rawBody: Buffer, signatureHeader: string | undefined): ProviderEvent;
}

const sessionFacts = (s: Stripe.Checkout.Session): CheckoutSessionFacts => ({
  id: s.id,
  status: s.status,
  paymentStatus: s.payment_status,
  url: s.url,
  amountTotalCents: s.amount_total,
  currency: s.currency,
  paymentIntentId: typeof s.payment_intent === "string" ? s.payment_intent : (s.payment_intent?.id ?? null),
  metadata: s.metadata ?? {},
});

/** The provider was unreachable or said no: a 502 with a plain message, never a stack. */
function unavailable(err: unknown): never {
  if (err instanceof Stripe.errors.StripeError) {
    throw new AppError("payments-unavailable", "The payment service did not accept the request. Please try again in a few minutes.", 502, {}, { provider: { type: err.type, code: err.code ?? null } });
  }
  throw err;
}

export function paymentsBaseConfig(apiBase: string | undefined): Pick<Stripe.StripeConfig, "host" | "port" | "protocol"> {
  if (!apiBase) return {};
  const url = new URL(apiBase);
  const protocol = url.protocol === "http:" ? "http" : "https";
  return { host: url.hostname, port: url.port || (protocol === "http" ? 80 : 443), protocol };
}

/** null when no keys are configured: the deposit routes then say online payment is not set up. */
export function createPaymentProvider(env: Pick<Env, "PAYMENTS_API_BASE" | "STRIPE_SECRET_KEY" | "STRIPE_WEBHOOK_SECRET">): PaymentProvider | null {
  const { STRIPE_SECRET_KEY: key, STRIPE_WEBHOOK_SECRET: webhookSecret } = env;
  if (!key || !webhookSecret) return null;
  const stripe = new Stripe(key, {
    ...paymentsBaseConfig(env.PAYMENTS_API_BASE),
    maxNetworkRetries: 2,
    timeout: 15_000,
    telemetry: false,
    appInfo: { name: "Eavesight" },
  });

  return {
    async createCheckout(input) {
      const session = await stripe.checkout.sessions.create({
        mode: "payment",
        line_items: [{ quantity: 1, price_data: { currency: input.currency, unit_amount: input.amountCents, product_data: { name: input.description } } }],
        client_reference_id: input.paymentId,
        metadata: input.metadata,
        payment_intent_data: { metadata: input.metadata },
        ...(input.customerEmail ? { customer_email: input.customerEmail } : {}),
        success_url: input.successUrl,
        cancel_url: input.cancelUrl,
      }, { idempotencyKey: `checkout-${input.paymentId}` }).catch(unavailable);
      return sessionFacts(session);
    },

    async retrieveCheckout(sessionId) {
      return sessionFacts(await stripe.checkout.sessions.retrieve(sessionId).catch(unavailable));
    },

    async expireCheckout(sessionId) {
      return sessionFacts(await stripe.checkout.sessions.expire(sessionId).catch(unavailable));
    },

    async refund(input) {
      const refund = await stripe.refunds.create({
        payment_intent: input.paymentIntentId, amount: input.amountCents, reason: "requested_by_customer", metadata: input.metadata,
      }, { idempotencyKey: `refund-${input.paymentId}` }).catch(unavailable);
      return { id: refund.id, status: refund.status };
    },

    verifyEvent(rawBody, signatureHeader) {
      if (!signatureHeader) throw new AppError("bad-signature", "The webhook carries no Stripe-Signature header.", 400);
      let event: Stripe.Event;
      try {
        event = stripe.webhooks.constructEvent(rawBody, signatureHeader, webhookSecret);
      } catch {
        throw new AppError("bad-signature", "The webhook signature does not verify.", 400);
      }
      switch (event.type) {
        case "checkout.session.completed":
        case "checkout.session.async_payment_succeeded":
        case "checkout.session.async_payment_failed":
        case "checkout.session.expired":
          return { id: event.id, type: event.type, session: sessionFacts(event.data.object) };
        case "charge.refunded": {
          const c = event.data.object;
          return {
            id: event.id, type: "charge.refunded",
            charge: {
              paymentIntentId: typeof c.payment_intent === "string" ? c.payment_intent : (c.payment_intent?.id ?? null),
              amountCents: c.amount, amountRefundedCents: c.amount_refunded, isFullyRefunded: c.refunded, currency: c.currency,
            },
          };
        }
        default:
          return { id: event.id, type: "other", providerType: event.type };
      }
    },
  };
}
