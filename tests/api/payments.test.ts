import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Server } from "node:http";
import { and, eq, like, sql } from "drizzle-orm";
import { auditEvents, outboxMessages, paymentEvents, payments, proposalEvents } from "../../server/db/schema/index.ts";
import { LOCAL_PAYMENT_KEYS } from "../../server/env.ts";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { signWebhookPayload, startFakePayments, type FakePayments } from "../../scripts/lib/fake-payments.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createProject, createSpace, makeTeam, mainAttic, send, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let fake: FakePayments;
let server: Server;
let webhookUrl: string;
let team: Team;
let projectId: string;
let optionId: string;
const homeowner = `ilse-${Date.now()}@homeowner.example`;
/** The company's rule: 30 % of the total, capped at $1,000 (the lesser of the two). */
const CAP_CENTS = 100_000;

const pub = (method: "get" | "post", url: string) => (method === "get" ? t.request().get(url) : t.request().post(url).set("origin", ORIGIN));
const acceptBody = () => ({ optionId, signerName: "Ilse Varrow", signature: { typed: "Ilse Varrow" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION } });

async function sentProposal(patch: Record<string, unknown> = {}) {
  const created = await send(team.asSales, "post", `/api/projects/${projectId}/proposals`, { optionIds: [optionId] });
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  const id = created.body.proposal.id as string;
  if (Object.keys(patch).length) {
    const patched = await send(team.asSales, "patch", `/api/proposals/${id}`, { version: created.body.proposal.version, ...patch });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
  }
  const sent = await send(team.asSales, "post", `/api/proposals/${id}/send`);
  expect(sent.status, JSON.stringify(sent.body)).toBe(200);
  return { id, token: (sent.body.link as string).split("/p/")[1]! };
}

async function acceptedProposal(patch: Record<string, unknown> = {}) {
  const p = await sentProposal(patch);
  const res = await pub("post", `/api/public/proposals/${p.token}/accept`).send(acceptBody());
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return p;
}

async function checkout(token: string, body: Record<string, unknown> = {}) {
  const res = await pub("post", `/api/public/proposals/${token}/deposit/checkout`).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  const sessionId = (res.body.url as string).split("/pay/")[1]!;
  return { ...(res.body as { url: string; amountCents: number; currency: string }), sessionId };
}

/** The homeowner presses "Pay" on the fake's hosted page (its form posts, then redirects back). */
async function payOnFake(sessionId: string) {
  const res = await fetch(`${fake.url}/pay/${sessionId}/pay`, { method: "POST", redirect: "manual" });
  return { status: res.status, location: res.headers.get("location") };
}

const depositOf = async (token: string) => (await pub("get", `/api/public/proposals/${token}/deposit`).expect(200)).body.deposit;
const rowsFor = (proposalId: string) => t.db.select().from(payments).where(eq(payments.proposalId, proposalId));
const deliveryFor = (sessionId: string) => fake.deliveries.find((d) => d.type === "checkout.session.completed" && d.body.includes(sessionId))!;
const postWebhook = (body: string, signature?: string) => {
  const req = t.request().post("/api/webhooks/payments").set("content-type", "application/json");
  return (signature === undefined ? req : req.set("stripe-signature", signature)).send(body);
};

/** The salesperson's e-mails that name this provider reference (other tests' deposits mail the same person). */
const mailsAbout = (reference: string) =>
  t.db.select().from(outboxMessages).where(and(eq(outboxMessages.toAddress, team.sales.email), like(outboxMessages.text, `%${reference}%`)));

async function waitFor<T>(what: string, read: () => Promise<T>, isDone: (v: T) => boolean, timeoutMs = 10_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (isDone(value)) return value;
    if (Date.now() > deadline) throw new Error(`${what} did not happen in time: ${JSON.stringify(value).slice(0, 300)}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

beforeAll(async () => {
  fake = await startFakePayments({ port: 0, apiKey: LOCAL_PAYMENT_KEYS.STRIPE_SECRET_KEY, webhookSecret: LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET, retryDelaysMs: [], quiet: true });
  t = await startTestApp({ envOverrides: { PAYMENTS_API_BASE: fake.url, ...LOCAL_PAYMENT_KEYS } });
  // The fake posts its webhooks over HTTP, so this app listens on a free loopback port too.
  server = await new Promise<Server>((resolve) => {
    const s = t.app.listen(0, "127.0.0.1", () => resolve(s));
  });
  webhookUrl = `http://127.0.0.1:${(server.address() as { port: number }).port}/api/webhooks/payments`;
  fake.setWebhookUrl(webhookUrl);

  team = await makeTeam(t, "Tallgrass Exteriors (payments test)");
  await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Test sales" }).expect(200);
  const customer = await send(team.asOwner, "post", "/api/customers", { name: "Ilse Varrow", email: homeowner });
  projectId = (await createProject(team.asEstimator, customer.body.customer.id, { title: "Deposit attic", siteAddress: "7 Sedge Lane, Marrow Creek" })).id;
  const space = await createSpace(team.asEstimator, projectId, mainAttic);
  const soffit = await send(team.asOwner, "post", "/api/catalog", { sku: "RSV-4", name: "Round soffit vent 4 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 9, materialCostCents: 100, sellPriceCents: 600 });
  const option = await send(team.asEstimator, "post", `/api/projects/${projectId}/options`, {
    name: "Soffit vents and a re-deck",
    spaces: [{ spaceId: space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: soffit.body.item.id, quantity: 12 }] }],
    laborLines: [{ id: "l1", description: "Replace rotted roof deck along the eaves", hours: 40, rateCents: 12_000 }],
  });
  expect(option.status, JSON.stringify(option.body)).toBe(201);
  optionId = option.body.option.id;
  const profile = await send(team.asOwner, "patch", "/api/company", {
    name: "Tallgrass Exteriors", email: "office@tallgrass.example", taxRateBasisPoints: 0, depositRule: { kind: "percent", value: 30, capCents: CAP_CENTS },
  });
  expect(profile.status, JSON.stringify(profile.body)).toBe(200);
});
afterAll(async () => {
  await fake?.close();
  await new Promise((r) => (server ? server.close(r) : r(null)));
  await t?.close();
});

describe("deposit checkout: who may pay, and how much", () => {
  it("when the proposal is sent but not accepted, then checkout is refused with 409 and the status says so", async () => {
    const p = await sentProposal();
    expect(await depositOf(p.token)).toMatchObject({ state: "not-accepted", amountCents: null });
    const res = await pub("post", `/api/public/proposals/${p.token}/deposit/checkout`).send({});
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("not-accepted");
    expect(await rowsFor(p.id)).toHaveLength(0);
  });

  it("when the proposal was declined, then checkout is refused with 409 and nothing is opened at the provider", async () => {
    const p = await sentProposal();
    await pub("post", `/api/public/proposals/${p.token}/decline`).send({ reason: "Going with a neighbour's roofer." }).expect(200);
    const sessionsBefore = fake.sessions.size;
    const res = await pub("post", `/api/public/proposals/${p.token}/deposit/checkout`).send({});
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: "declined", message: expect.stringContaining("declined") });
    expect(await depositOf(p.token)).toMatchObject({ state: "declined" });
    expect(fake.sessions.size).toBe(sessionsBefore);
  });

  it("when the proposal was superseded by a newer revision, then its old link cannot pay (410)", async () => {
    const p = await sentProposal();
    const row = (await team.asSales.get(`/api/proposals/${p.id}`)).body.proposal;
    await send(team.asSales, "patch", `/api/proposals/${p.id}`, { version: row.version, coverNote: "New prices." }).expect(200);
    const res = await pub("post", `/api/public/proposals/${p.token}/deposit/checkout`).send({});
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe("superseded");
    expect((await pub("get", `/api/public/proposals/${p.token}/deposit`)).status).toBe(410);
    expect(await rowsFor(p.id)).toHaveLength(0);
  });

  it("when the proposal asks for no deposit, or the link is unknown, then checkout says so with a 4xx", async () => {
    const p = await acceptedProposal({ depositRule: { kind: "amount", value: 0, capCents: null } });
    expect(await depositOf(p.token)).toMatchObject({ state: "none", message: "This proposal asks for no deposit." });
    const res = await pub("post", `/api/public/proposals/${p.token}/deposit/checkout`).send({});
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("no-deposit");
    expect((await pub("post", "/api/public/proposals/not-a-real-token-000000000000/deposit/checkout").send({})).status).toBe(404);
    expect((await pub("get", "/api/public/proposals/x/deposit")).status).toBe(404);
  });

  it("when the deposit asked is over the cap and the client sends its own amount, then the server charges the capped amount only", async () => {
    const p = await acceptedProposal();
    const view = (await pub("get", `/api/public/proposals/${p.token}`)).body;
    const totalCents = view.options.find((o: { id: string }) => o.id === optionId).price.totalCents as number;
    expect(Math.round(totalCents * 0.3)).toBeGreaterThan(CAP_CENTS);
    expect(await depositOf(p.token)).toMatchObject({ state: "due", amountCents: CAP_CENTS, currency: "usd", isCheckoutStarted: false });

    const tampered = await checkout(p.token, { amountCents: 1, amount: 1, unit_amount: 1, currency: "eur" });
    expect(tampered).toMatchObject({ amountCents: CAP_CENTS, currency: "usd" });
    expect(fake.sessions.get(tampered.sessionId)).toMatchObject({ amount_total: CAP_CENTS, currency: "usd", status: "open", mode: "payment" });
    const [row] = await rowsFor(p.id);
    expect(row).toMatchObject({ amountCents: CAP_CENTS, status: "pending", checkoutSessionId: tampered.sessionId });

    // A second click reuses the open checkout instead of opening another.
    expect((await checkout(p.token)).sessionId).toBe(tampered.sessionId);

    // The owner lowers the cap after sending (local law changed): the open checkout is closed and the new cap holds.
    await send(team.asOwner, "patch", "/api/company", { depositRule: { kind: "percent", value: 30, capCents: 50_000 } }).expect(200);
    try {
      const lowered = await checkout(p.token);
      expect(lowered.sessionId).not.toBe(tampered.sessionId);
      expect(fake.sessions.get(lowered.sessionId)!.amount_total).toBe(50_000);
      expect(fake.sessions.get(tampered.sessionId)!.status).toBe("expired");
      const rows = await rowsFor(p.id);
      expect(rows.map((r) => [r.amountCents, r.status]).sort()).toEqual([[100_000, "failed"], [50_000, "pending"]].sort());
    } finally {
      await send(team.asOwner, "patch", "/api/company", { depositRule: { kind: "percent", value: 30, capCents: CAP_CENTS } }).expect(200);
    }
  });
});

describe("the webhook decides, never the redirect", () => {
  it("when the homeowner cancels, or comes back to the success address without a webhook, then nothing is marked paid", async () => {
    const p = await acceptedProposal();
    const c = await checkout(p.token);
    const cancel = await fetch(`${fake.url}/pay/${c.sessionId}/cancel`, { method: "POST", redirect: "manual" });
    expect(cancel.status).toBe(303);
    expect(cancel.headers.get("location")).toMatch(new RegExp(`/p/${p.token}\\?deposit=cancel$`));
    expect(await depositOf(p.token)).toMatchObject({ state: "due", isCheckoutStarted: true });

    // The provider takes the money but its webhook cannot reach the app: the redirect alone changes nothing.
    fake.setWebhookUrl("http://127.0.0.1:9/unreachable");
    let paid: Awaited<ReturnType<typeof payOnFake>>;
    try {
      paid = await payOnFake(c.sessionId);
    } finally {
      fake.setWebhookUrl(webhookUrl);
    }
    expect(paid.status).toBe(303);
    expect(paid.location).toMatch(new RegExp(`/p/${p.token}\\?deposit=success$`));
    await t.request().get(new URL(paid.location!).pathname + "?deposit=success");
    expect(await depositOf(p.token)).toMatchObject({ state: "due" });
    expect((await rowsFor(p.id))[0]).toMatchObject({ status: "pending", paidAt: null });
    const again = await pub("post", `/api/public/proposals/${p.token}/deposit/checkout`).send({});
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("payment-confirming");

    // The provider's retry arrives: now it is paid.
    const delivery = await fake.redeliver(deliveryFor(c.sessionId).eventId);
    expect(delivery.status).toBe(200);
    expect(await depositOf(p.token)).toMatchObject({ state: "paid", amountCents: CAP_CENTS });
  });

  it("when a webhook's signature is wrong, missing, stale or over a changed body, then it answers 400 and nothing is recorded", async () => {
    const p = await acceptedProposal();
    const c = await checkout(p.token);
    const body = JSON.stringify({
      id: "evt_test_forged_0001", object: "event", type: "checkout.session.completed", created: Math.floor(Date.now() / 1000), livemode: false,
      data: { object: { ...fake.sessions.get(c.sessionId), status: "complete", payment_status: "paid", payment_intent: "pi_test_forged" } },
    });
    const cases = [
      signWebhookPayload(body, "whsec_someone_else"),
      signWebhookPayload(body.replace(String(CAP_CENTS), "1"), LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET),
      signWebhookPayload(body, LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET, Math.floor(Date.now() / 1000) - 3_600),
      "t=1,v1=00",
      "not a signature",
    ];
    for (const signature of cases) {
      const res = await postWebhook(body, signature);
      expect(res.status, signature).toBe(400);
      expect(res.body.error.code).toBe("bad-signature");
    }
    expect((await postWebhook(body)).status).toBe(400);
    expect((await postWebhook("", signWebhookPayload("", LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET))).status).toBe(400);
    expect(await t.db.select().from(paymentEvents).where(eq(paymentEvents.eventId, "evt_test_forged_0001"))).toHaveLength(0);
    expect((await rowsFor(p.id))[0]).toMatchObject({ status: "pending", paidAt: null, paymentIntentId: null });
    expect(await depositOf(p.token)).toMatchObject({ state: "due" });
  });

  it("when the same event arrives again, then it is acknowledged and changes nothing: one paid row, one event, one e-mail", async () => {
    const p = await acceptedProposal();
    const c = await checkout(p.token);
    await payOnFake(c.sessionId);
    const delivery = deliveryFor(c.sessionId);
    expect(delivery.status).toBe(200);
    const intent = fake.sessions.get(c.sessionId)!.payment_intent!;
    await waitFor("the salesperson's e-mail", () => mailsAbout(intent), (m) => m.length > 0);

    const replay = await postWebhook(delivery.body, signWebhookPayload(delivery.body, LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET));
    expect(replay.status).toBe(200);
    expect(replay.body).toMatchObject({ received: true, isDuplicate: true, isApplied: false });
    expect((await fake.redeliver(delivery.eventId)).status).toBe(200);

    const rows = await rowsFor(p.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "paid", paidCents: CAP_CENTS });
    const events = await t.db.select().from(proposalEvents).where(and(eq(proposalEvents.proposalId, p.id), eq(proposalEvents.event, "deposit-paid")));
    expect(events).toHaveLength(1);
    await new Promise((r) => setTimeout(r, 1_500));
    expect(await mailsAbout(intent)).toHaveLength(1);
    const payAgain = await pub("post", `/api/public/proposals/${p.token}/deposit/checkout`).send({});
    expect(payAgain.status).toBe(409);
    expect(payAgain.body.error.code).toBe("already-paid");
  });
});

describe("a checkout is applied once, whatever events arrive (issue 14)", () => {
  it("when six different signed 'paid' events for one checkout are posted at once, then the deposit is applied exactly once: one paid row, one event, one e-mail", async () => {
    const p = await acceptedProposal();
    const c = await checkout(p.token);
    // The provider may send checkout.session.completed and async_payment_succeeded, each retried
    // under a new id by a misbehaving relay: six different events, all saying this checkout is paid.
    const intent = `pi_race_${Date.now()}`;
    const session = { id: c.sessionId, object: "checkout.session", status: "complete", payment_status: "paid", amount_total: c.amountCents, currency: "usd", payment_intent: intent, url: null, metadata: {} };
    const bodies = Array.from({ length: 6 }, (_, i) => JSON.stringify({
      id: `evt_race_${i}_${Date.now()}`, object: "event", api_version: "2026-10-28.endive", created: Math.floor(Date.now() / 1000),
      type: i % 2 === 0 ? "checkout.session.completed" : "checkout.session.async_payment_succeeded",
      data: { object: session }, livemode: false, pending_webhooks: 1, request: { id: null, idempotency_key: null },
    }));
    const answers = await Promise.all(bodies.map((body) => postWebhook(body, signWebhookPayload(body, LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET))));
    expect(answers.map((a) => a.status)).toEqual([200, 200, 200, 200, 200, 200]);
    expect(answers.filter((a) => a.body.isApplied === true)).toHaveLength(1);

    const rows = await rowsFor(p.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: "paid", paidCents: c.amountCents, paymentIntentId: intent });
    const events = await t.db.select().from(proposalEvents).where(and(eq(proposalEvents.proposalId, p.id), eq(proposalEvents.event, "deposit-paid")));
    expect(events).toHaveLength(1);
    const audits = await t.db.select().from(auditEvents).where(and(eq(auditEvents.event, "deposit-paid"), sql`${auditEvents.detail}->>'paymentIntentId' = ${intent}`));
    expect(audits).toHaveLength(1);
    // Every event id is still claimed, so none is applied later by a retry.
    const claimed = await t.db.select().from(paymentEvents).where(eq(paymentEvents.paymentId, rows[0]!.id));
    expect(claimed).toHaveLength(6);
    await waitFor("the salesperson's e-mail", () => mailsAbout(intent), (m) => m.length > 0);
    await new Promise((r) => setTimeout(r, 1_500));
    expect(await mailsAbout(intent)).toHaveLength(1);
  });
});

describe("the whole way, and refunds", () => {
  let proposalId: string;
  let token: string;
  let paymentId: string;

  it("when the homeowner accepts, pays on the provider's page and the signed webhook arrives, then the deposit is paid and the salesperson is e-mailed", async () => {
    ({ id: proposalId, token } = await acceptedProposal());
    const c = await checkout(token);
    const page = await fetch(c.url);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Pay $1,000.00 (test)");
    expect(html).toContain("Local test payment page");

    const back = await payOnFake(c.sessionId);
    expect(back.location).toBe(`${ORIGIN}/p/${token}?deposit=success`);
    const deposit = await depositOf(token);
    expect(deposit).toMatchObject({ state: "paid", amountCents: CAP_CENTS, currency: "usd", isRefundRequested: false });
    expect(new Date(deposit.paidAt).getTime()).toBeGreaterThan(Date.now() - 60_000);

    const staff = await team.asSales.get(`/api/proposals/${proposalId}/payments`).expect(200);
    expect(staff.body.deposit).toMatchObject({ state: "paid", amountCents: CAP_CENTS });
    expect(staff.body.payments).toHaveLength(1);
    const payment = staff.body.payments[0];
    paymentId = payment.id;
    expect(payment).toMatchObject({ status: "paid", amountCents: CAP_CENTS, paidCents: CAP_CENTS, currency: "usd", checkoutSessionId: c.sessionId, paymentIntentId: expect.stringMatching(/^pi_test_/) });

    const [mail] = await waitFor("the salesperson's e-mail", () => mailsAbout(payment.paymentIntentId), (m) => m.length > 0);
    expect(mail!.subject).toBe("Deposit received: $1,000.00 — Ilse Varrow, 7 Sedge Lane, Marrow Creek");
    expect(mail!.text).toContain(`/projects/${projectId}`);
    expect(mail!.companyId).toBe(team.company.id);

    const detail = (await team.asSales.get(`/api/proposals/${proposalId}`)).body;
    const paidEvent = detail.events.find((e: { event: string }) => e.event === "deposit-paid");
    expect(paidEvent.detail).toMatchObject({ amountCents: CAP_CENTS, currency: "usd", checkoutSessionId: c.sessionId, paymentIntentId: payment.paymentIntentId, providerEventId: expect.stringMatching(/^evt_test_/) });
    const audit = await t.db.select().from(auditEvents).where(and(eq(auditEvents.companyId, team.company.id), eq(auditEvents.event, "deposit-paid")));
    expect(audit.some((a) => a.detail.paymentId === paymentId)).toBe(true);
  });

  it("when someone other than the owner asks for a refund, then it is refused with 403", async () => {
    expect((await send(team.asSales, "post", `/api/payments/${paymentId}/refund`)).status).toBe(403);
    expect((await send(team.asEstimator, "post", `/api/payments/${paymentId}/refund`)).status).toBe(403);
    expect((await send(team.asOwner, "post", "/api/payments/not-a-uuid/refund")).status).toBe(404);
  });

  it("when the owner refunds, then the provider refunds it, its webhook marks it refunded, and a second refund is refused", async () => {
    const res = await send(team.asOwner, "post", `/api/payments/${paymentId}/refund`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.payment).toMatchObject({ id: paymentId, refundId: expect.stringMatching(/^re_test_/), refundRequestedBy: team.owner.id });
    await fake.settle();
    const deposit = await waitFor("refund webhook", () => depositOf(token), (d) => d.state === "refunded");
    expect(deposit).toMatchObject({ state: "refunded", refundedCents: CAP_CENTS, isRefundRequested: true });
    const [row] = await rowsFor(proposalId);
    expect(row).toMatchObject({ status: "refunded", refundedCents: CAP_CENTS });
    expect(row!.refundedAt).toBeInstanceOf(Date);

    const again = await send(team.asOwner, "post", `/api/payments/${paymentId}/refund`);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("already-refunded");
    expect((await pub("post", `/api/public/proposals/${token}/deposit/checkout`).send({})).status).toBe(409);
    await t.waitForMail(team.sales.email, { subjectIncludes: "Deposit refunded: $1,000.00" });
    expect(await mailsAbout("refunded in full")).toHaveLength(1);
    const events = (await team.asOwner.get(`/api/proposals/${proposalId}`)).body.events.map((e: { event: string }) => e.event);
    expect(events).toEqual(expect.arrayContaining(["deposit-paid", "deposit-refund-requested", "deposit-refunded"]));
  });

  it("when another company's owner names this payment or proposal, then it is not found", async () => {
    const other = await makeTeam(t, "Bluestem-like (payments test)");
    expect((await send(other.asOwner, "post", `/api/payments/${paymentId}/refund`)).status).toBe(404);
    expect((await other.asOwner.get(`/api/proposals/${proposalId}/payments`)).status).toBe(404);
  });
});
