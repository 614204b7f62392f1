/**
 * A local stand-in for the payment provider (a test double of the few Stripe API calls the
 * product makes), on loopback. The app's `stripe` SDK is pointed at it through its host, port
 * and protocol options (PAYMENTS_API_BASE), so the product code is the same as against the real
 * service. It implements:
 *
 * - POST /v1/checkout/sessions (form-encoded, like the real API), GET /v1/checkout/sessions/:id and
 *   POST /v1/checkout/sessions/:id/expire
 * - POST /v1/refunds (by payment_intent)
 * - a hosted test page GET /pay/:sessionId with "Pay" and "Cancel"; paying completes the session
 *   and POSTs a `checkout.session.completed` event to the app's webhook URL, signed the way the
 *   provider signs: `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<body>">`
 * - `charge.refunded` and `refund.created` events after a refund
 *
 * State lives in memory. No money moves and nothing leaves the machine.
 */
import express, { type Request, type Response } from "express";
import { createHmac, randomBytes } from "node:crypto";
import type { Server } from "node:http";

export interface FakePaymentsOptions {
  /** 0 picks a free port. */
  port: number;
  /** The secret key the app is configured with; requests with another key get a 401. */
  apiKey: string;
  /** The webhook endpoint's signing secret. */
  webhookSecret: string;
  /** Where events are POSTed, e.g. http://127.0.0.1:3000/api/webhooks/payments; settable later. */
  webhookUrl?: string;
  /** Waits between retries of a failed delivery; [] for none (tests that want no surprise later). */
  retryDelaysMs?: number[];
  quiet?: boolean;
}

export interface FakeDelivery {
  eventId: string;
  type: string;
  /** The exact bytes that were signed and sent. */
  body: string;
  signature: string;
  /** HTTP status of the last attempt; 0 when the app could not be reached. */
  status: number;
  attempts: number;
}

interface Session {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  created: number;
  expires_at: number;
  livemode: false;
  metadata: Record<string, string>;
  mode: "payment";
  payment_intent: string | null;
  payment_status: "unpaid" | "paid";
  status: "open" | "complete" | "expired";
  success_url: string;
  cancel_url: string;
  customer_email: string | null;
  url: string | null;
}

interface Charge {
  id: string;
  object: "charge";
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  currency: string;
  created: number;
  livemode: false;
  metadata: Record<string, string>;
  paid: true;
  payment_intent: string;
  refunded: boolean;
  status: "succeeded";
}

interface LineItem {
  name: string;
  unitAmount: number;
  quantity: number;
}

const id = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;
const unix = () => Math.floor(Date.now() / 1000);

/** The provider's webhook signature header for a payload (its documented scheme v1). */
export function signWebhookPayload(payload: string, secret: string, timestamp = unix()): string {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${v1}`;
}

class ApiProblem extends Error {
  constructor(readonly status: number, message: string, readonly param?: string, readonly type = "invalid_request_error") {
    super(message);
  }
}

const asRecord = (v: unknown): Record<string, unknown> => (v && typeof v === "object" && !Array.isArray(v) ? (v as Record<string, unknown>) : {});
const asList = (v: unknown): unknown[] => (Array.isArray(v) ? v : v && typeof v === "object" ? Object.values(v) : []);
const stringMap = (v: unknown): Record<string, string> =>
  Object.fromEntries(Object.entries(asRecord(v)).filter(([, x]) => typeof x === "string")) as Record<string, string>;

function positiveInt(value: unknown, param: string): number {
  const n = typeof value === "string" && /^\d+$/.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(n) || n <= 0) throw new ApiProblem(400, `Invalid positive integer: ${param}`, param);
  return n;
}
function requiredString(value: unknown, param: string): string {
  if (typeof value !== "string" || value === "") throw new ApiProblem(400, `Missing required param: ${param}.`, param);
  return value;
}
function absoluteUrl(value: unknown, param: string): string {
  const s = requiredString(value, param);
  try {
    new URL(s);
  } catch {
    throw new ApiProblem(400, `Not a valid URL: ${param}`, param);
  }
  return s;
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
const money = (cents: number, currency: string) =>
  currency === "usd" ? `$${(cents / 100).toLocaleString("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 })}` : `${(cents / 100).toFixed(2)} ${currency.toUpperCase()}`;

/** The hosted page: deliberately its own plain look, and clearly not a real checkout. */
function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>
  body{margin:0;font:16px/1.5 ui-monospace,Menlo,Consolas,monospace;background:#eef1f4;color:#1d2630}
  .band{background:repeating-linear-gradient(45deg,#ffd84d,#ffd84d 14px,#1d2630 14px,#1d2630 28px);height:10px}
  main{max-width:30rem;margin:3rem auto;padding:1.5rem 1.75rem;background:#fff;border:2px dashed #5b6b7a;border-radius:6px}
  .tag{display:inline-block;background:#1d2630;color:#ffd84d;padding:.1rem .5rem;font-size:.8rem;letter-spacing:.08em;text-transform:uppercase}
  h1{font-size:1.25rem;margin:.75rem 0 .25rem} .amount{font-size:2rem;font-weight:700;margin:.5rem 0}
  ul{padding-left:1.1rem} .row{display:flex;gap:.75rem;margin-top:1.25rem;flex-wrap:wrap}
  button{font:inherit;font-weight:700;padding:.7rem 1.2rem;border-radius:4px;cursor:pointer;min-height:44px}
  .pay{background:#1b6e3c;color:#fff;border:2px solid #1b6e3c} .cancel{background:#fff;color:#1d2630;border:2px solid #5b6b7a}
  small{color:#5b6b7a}
</style></head><body><div class="band"></div><main>${body}</main></body></html>`;
}

export async function startFakePayments(opts: FakePaymentsOptions) {
  let webhookUrl = opts.webhookUrl ?? null;
  const sessions = new Map<string, Session>();
  const lineItems = new Map<string, LineItem[]>();
  /** payment_intent_data.metadata, copied onto the charge as the provider does. */
  const intentMetadata = new Map<string, Record<string, string>>();
  const charges = new Map<string, Charge>();
  const chargeByIntent = new Map<string, string>();
  const idempotent = new Map<string, { status: number; body: unknown }>();
  const deliveries: FakeDelivery[] = [];
  const pending = new Set<Promise<unknown>>();
  let base = "";
  const say = (line: string) => {
    if (!opts.quiet) console.log(`[payments] ${line}`);
  };

  async function attempt(delivery: FakeDelivery): Promise<boolean> {
    if (!webhookUrl) return false;
    delivery.attempts += 1;
    try {
      const res = await fetch(webhookUrl, {
        method: "POST",
        headers: { "content-type": "application/json; charset=utf-8", "stripe-signature": delivery.signature, "user-agent": "Eavesight-FakePayments/1.0" },
        body: delivery.body,
        signal: AbortSignal.timeout(10_000),
      });
      delivery.status = res.status;
      await res.arrayBuffer();
      return res.ok;
    } catch {
      delivery.status = 0;
      return false;
    }
  }

  /** Sends an event once now; on failure retries a few times in the background, as the provider does (at least once). */
  async function deliver(type: string, object: unknown): Promise<FakeDelivery> {
    const event = {
      id: id("evt_test"), object: "event", api_version: "2026-10-28.endive", created: unix(), type,
      data: { object }, livemode: false, pending_webhooks: 1, request: { id: null, idempotency_key: null },
    };
    const body = JSON.stringify(event, null, 2);
    const delivery: FakeDelivery = { eventId: event.id, type, body, signature: signWebhookPayload(body, opts.webhookSecret), status: 0, attempts: 0 };
    deliveries.push(delivery);
    if (!(await attempt(delivery))) {
      const retry = (async () => {
        for (const waitMs of opts.retryDelaysMs ?? [500, 1_000, 2_000]) {
          await new Promise((r) => setTimeout(r, waitMs));
          // Each attempt is signed afresh, with its own time, like the provider's retries.
          delivery.signature = signWebhookPayload(body, opts.webhookSecret);
          if (await attempt(delivery)) break;
        }
      })();
      pending.add(retry);
      void retry.finally(() => pending.delete(retry));
    }
    say(`${type} ${event.id} → ${delivery.status || "unreachable"}`);
    return delivery;
  }

  function later(fn: () => Promise<unknown>) {
    const p = new Promise((r) => setImmediate(r)).then(fn).catch(() => {});
    pending.add(p);
    void p.finally(() => pending.delete(p));
  }

  function expireIfDue(s: Session) {
    if (s.status === "open" && s.expires_at <= unix()) s.status = "expired";
  }

  function createSession(body: Record<string, unknown>): Session {
    if (body.mode !== "payment") throw new ApiProblem(400, "This test double only supports mode=payment.", "mode");
    const items = asList(body.line_items).map((raw, i): LineItem & { currency: string } => {
      const item = asRecord(raw);
      const priceData = asRecord(item.price_data);
      const product = asRecord(priceData.product_data);
      return {
        name: requiredString(product.name, `line_items[${i}][price_data][product_data][name]`),
        unitAmount: positiveInt(priceData.unit_amount, `line_items[${i}][price_data][unit_amount]`),
        currency: requiredString(priceData.currency, `line_items[${i}][price_data][currency]`).toLowerCase(),
        quantity: positiveInt(item.quantity, `line_items[${i}][quantity]`),
      };
    });
    if (items.length === 0) throw new ApiProblem(400, "Missing required param: line_items.", "line_items");
    const currency = items[0]!.currency;
    if (items.some((i) => i.currency !== currency)) throw new ApiProblem(400, "All line items must use the same currency.", "line_items");
    const total = items.reduce((sum, i) => sum + i.unitAmount * i.quantity, 0);
    const sessionId = id("cs_test");
    const session: Session = {
      id: sessionId, object: "checkout.session", amount_subtotal: total, amount_total: total, currency,
      client_reference_id: typeof body.client_reference_id === "string" ? body.client_reference_id : null,
      created: unix(), expires_at: typeof body.expires_at === "string" ? positiveInt(body.expires_at, "expires_at") : unix() + 24 * 3600,
      livemode: false, metadata: stringMap(body.metadata), mode: "payment", payment_intent: null, payment_status: "unpaid", status: "open",
      success_url: absoluteUrl(body.success_url, "success_url"), cancel_url: absoluteUrl(body.cancel_url, "cancel_url"),
      customer_email: typeof body.customer_email === "string" ? body.customer_email : null,
      url: `${base}/pay/${sessionId}`,
    };
    sessions.set(sessionId, session);
    lineItems.set(sessionId, items.map(({ name, unitAmount, quantity }) => ({ name, unitAmount, quantity })));
    intentMetadata.set(sessionId, stringMap(asRecord(body.payment_intent_data).metadata));
    say(`checkout session ${sessionId} for ${money(total, currency)}`);
    return session;
  }

  function refund(body: Record<string, unknown>) {
    const intent = requiredString(body.payment_intent, "payment_intent");
    const chargeId = chargeByIntent.get(intent);
    const charge = chargeId ? charges.get(chargeId) : undefined;
    if (!charge) throw new ApiProblem(404, `No such payment_intent: '${intent}'`, "payment_intent");
    const remaining = charge.amount - charge.amount_refunded;
    const amount = body.amount === undefined ? remaining : positiveInt(body.amount, "amount");
    if (remaining === 0) throw new ApiProblem(400, `Charge ${charge.id} has already been refunded.`, undefined, "invalid_request_error");
    if (amount > remaining) throw new ApiProblem(400, `Refund amount (${money(amount, charge.currency)}) is greater than unrefunded amount on charge (${money(remaining, charge.currency)})`, "amount");
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded === charge.amount;
    const refundObject = {
      id: id("re_test"), object: "refund", amount, charge: charge.id, created: unix(), currency: charge.currency,
      metadata: stringMap(body.metadata), payment_intent: intent, reason: typeof body.reason === "string" ? body.reason : null, status: "succeeded",
    };
    say(`refund ${refundObject.id} of ${money(amount, charge.currency)}`);
    later(async () => {
      await deliver("charge.refunded", { ...charge });
      await deliver("refund.created", refundObject);
    });
    return refundObject;
  }

  const app = express();
  app.disable("x-powered-by");
  app.use(express.urlencoded({ extended: true, limit: "100kb" }));

  /** The API part: bearer key, idempotency keys and the provider's error shape. */
  const api = (handler: (req: Request) => unknown, status = 200) => (req: Request, res: Response) => {
    const key = /^Bearer (.+)$/.exec(req.get("authorization") ?? "")?.[1];
    if (!key || key !== opts.apiKey || key.startsWith("sk_live_")) {
      res.status(401).json({ error: { type: "invalid_request_error", message: "Invalid API Key provided (the local test payment service takes only the configured test key)." } });
      return;
    }
    const idem = req.get("idempotency-key");
    const cacheKey = idem ? `${req.method} ${req.path} ${idem}` : null;
    const cached = cacheKey ? idempotent.get(cacheKey) : undefined;
    if (cached) {
      res.status(cached.status).set("idempotent-replayed", "true").json(cached.body);
      return;
    }
    let answer: { status: number; body: unknown };
    try {
      answer = { status, body: handler(req) };
    } catch (err) {
      if (!(err instanceof ApiProblem)) throw err;
      answer = { status: err.status, body: { error: { type: err.type, message: err.message, ...(err.param ? { param: err.param } : {}) } } };
    }
    if (cacheKey) idempotent.set(cacheKey, answer);
    res.status(answer.status).set("request-id", id("req")).json(answer.body);
  };

  app.post("/v1/checkout/sessions", api((req) => createSession(asRecord(req.body))));
  app.get("/v1/checkout/sessions/:id", api((req) => {
    const s = sessions.get(String(req.params.id));
    if (!s) throw new ApiProblem(404, `No such checkout.session: '${String(req.params.id)}'`, "id");
    expireIfDue(s);
    return s;
  }));
  app.post("/v1/checkout/sessions/:id/expire", api((req) => {
    const s = sessions.get(String(req.params.id));
    if (!s) throw new ApiProblem(404, `No such checkout.session: '${String(req.params.id)}'`, "id");
    expireIfDue(s);
    if (s.status !== "open") throw new ApiProblem(400, `Only Checkout Sessions with a status in ["open"] can be expired. This session has a status of "${s.status}".`);
    Object.assign(s, { status: "expired", url: null });
    later(() => deliver("checkout.session.expired", { ...s }));
    return s;
  }));
  app.post("/v1/refunds", api((req) => refund(asRecord(req.body))));

  app.get("/pay/:id", (req, res) => {
    const s = sessions.get(String(req.params.id));
    res.set("Cache-Control", "no-store");
    if (!s) {
      res.status(404).type("html").send(page("Test checkout not found", `<span class="tag">Local test payment page</span><h1>This test checkout does not exist</h1><p>It may belong to a run of the test payment service that has stopped.</p>`));
      return;
    }
    expireIfDue(s);
    const items = lineItems.get(s.id) ?? [];
    const total = money(s.amount_total, s.currency);
    if (s.status !== "open") {
      res.status(409).type("html").send(page("Test checkout closed", `<span class="tag">Local test payment page</span><h1>This test checkout is ${s.status === "complete" ? "already paid" : "expired"}</h1><p><a href="${escapeHtml(s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id))}">Back to the site</a></p>`));
      return;
    }
    res.type("html").send(page(`Pay ${total} (test)`, `
      <span class="tag">Local test payment page</span>
      <h1>Test checkout — no real money moves</h1>
      <p><small>This page stands in for the payment provider on this computer. Nothing is charged.</small></p>
      <ul>${items.map((i) => `<li>${escapeHtml(i.name)}${i.quantity > 1 ? ` × ${i.quantity}` : ""}: ${money(i.unitAmount * i.quantity, s.currency)}</li>`).join("")}</ul>
      <p class="amount" data-testid="fake-amount">${total}</p>
      <div class="row">
        <form method="post" action="/pay/${s.id}/pay"><button class="pay" type="submit">Pay ${total} (test)</button></form>
        <form method="post" action="/pay/${s.id}/cancel"><button class="cancel" type="submit">Cancel</button></form>
      </div>`));
  });

  app.post("/pay/:id/pay", async (req, res) => {
    const s = sessions.get(String(req.params.id));
    if (!s) return void res.status(404).type("text").send("No such test checkout.");
    expireIfDue(s);
    if (s.status !== "open") return void res.redirect(303, `/pay/${s.id}`);
    const intent = id("pi_test");
    const charge: Charge = {
      id: id("ch_test"), object: "charge", amount: s.amount_total, amount_captured: s.amount_total, amount_refunded: 0, currency: s.currency,
      created: unix(), livemode: false, metadata: intentMetadata.get(s.id) ?? {}, paid: true, payment_intent: intent, refunded: false, status: "succeeded",
    };
    charges.set(charge.id, charge);
    chargeByIntent.set(intent, charge.id);
    Object.assign(s, { status: "complete", payment_status: "paid", payment_intent: intent, url: null });
    // The event goes out before the redirect, so the app normally knows by the time the buyer is back;
    // the app must not rely on that order (it polls).
    await deliver("checkout.session.completed", { ...s });
    res.redirect(303, s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id));
  });

  app.post("/pay/:id/cancel", (req, res) => {
    const s = sessions.get(String(req.params.id));
    if (!s) return void res.status(404).type("text").send("No such test checkout.");
    // As with the provider, leaving the page does not close the session; it can still be paid until it expires.
    res.redirect(303, s.cancel_url);
  });

  app.use((req, res) => {
    res.status(404).json({ error: { type: "invalid_request_error", message: `Unrecognized request URL (${req.method}: ${req.path}). The local test payment service implements only what Eavesight uses.` } });
  });

  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(opts.port, "127.0.0.1", () => resolve(s));
    s.once("error", reject);
  });
  const port = (server.address() as { port: number }).port;
  base = `http://127.0.0.1:${port}`;

  return {
    port,
    /** For PAYMENTS_API_BASE. */
    url: base,
    deliveries,
    sessions: sessions as ReadonlyMap<string, Readonly<Session>>,
    setWebhookUrl(url: string) {
      webhookUrl = url;
    },
    /** Sends a recorded event again, freshly signed (a provider retry). */
    async redeliver(eventId: string) {
      const d = deliveries.find((x) => x.eventId === eventId);
      if (!d) throw new Error(`no event ${eventId}`);
      d.signature = signWebhookPayload(d.body, opts.webhookSecret);
      await attempt(d);
      return d;
    },
    /** Waits for background deliveries (refund events, retries). */
    async settle() {
      while (pending.size) await Promise.allSettled([...pending]);
    },
    async close() {
      await Promise.allSettled([...pending]);
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
export type FakePayments = Awaited<ReturnType<typeof startFakePayments>>;
