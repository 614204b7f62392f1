import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Server } from "node:http";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { payments } from "../../server/db/schema/index.ts";
import { LOCAL_PAYMENT_KEYS } from "../../server/env.ts";
import { startFakePayments, type FakePayments } from "../../scripts/lib/fake-payments.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { makeTeam, send, type Team } from "../setup/survey-fixtures.ts";
import { acceptedProject, makeCrew } from "../setup/job-fixture.ts";

/**
 * Issue 21, item 4: the balance shown on the completion report is paid through the deposit's
 * flow — the provider's hosted checkout, confirmed only by its signed webhook — for the amount
 * the server works out (job total with signed change orders, less what was paid), never the client's.
 */
let t: TestApp;
let fake: FakePayments;
let server: Server;
let team: Team;
let token = "";
let proposalId = "";

beforeAll(async () => {
  fake = await startFakePayments({ port: 0, apiKey: LOCAL_PAYMENT_KEYS.STRIPE_SECRET_KEY, webhookSecret: LOCAL_PAYMENT_KEYS.STRIPE_WEBHOOK_SECRET, retryDelaysMs: [], quiet: true });
  t = await startTestApp({ envOverrides: { PAYMENTS_API_BASE: fake.url, ...LOCAL_PAYMENT_KEYS } });
  server = await new Promise<Server>((resolve) => {
    const s = t.app.listen(0, "127.0.0.1", () => resolve(s));
  });
  fake.setWebhookUrl(`http://127.0.0.1:${(server.address() as { port: number }).port}/api/webhooks/payments`);
  team = await makeTeam(t, "Tallgrass Exteriors (balance)");
  const crew = await makeCrew(t, team);
  const work = await acceptedProject(t, team);
  proposalId = work.proposalId;
  const job = await send(team.asSales, "put", `/api/projects/${work.projectId}/job`, { crewUserId: crew.user.id, scheduledFor: "2026-12-08" });
  const png = await sharp({ create: { width: 20, height: 20, channels: 3, background: "#777" } }).png().toBuffer();
  for (const item of (await crew.agent.get(`/api/jobs/${job.body.job.id}`)).body.checklist as { id: string }[]) {
    await crew.agent.post(`/api/jobs/${job.body.job.id}/items/${item.id}/photos`).set("origin", ORIGIN).attach("file", png, "a.png");
    await send(crew.agent, "put", `/api/jobs/${job.body.job.id}/items/${item.id}`, { isDone: true });
  }
  const done = await send(crew.agent, "post", `/api/jobs/${job.body.job.id}/complete`);
  expect(done.status, JSON.stringify(done.body)).toBe(200);
  token = (done.body.link as string).split("/done/")[1]!;
});
afterAll(async () => {
  await fake?.close();
  await new Promise((r) => (server ? server.close(r) : r(null)));
  await t?.close();
});

describe("paying the balance after completion", () => {
  it("when the homeowner pays the balance on the provider's page, then only the signed webhook records it and the report shows nothing left to pay", async () => {
    const before = (await t.request().get(`/api/public/completion/${token}`).expect(200)).body.report;
    expect(before.balanceCents).toBeGreaterThan(0);
    // An amount sent by the client is ignored: the server's balance is charged.
    const res = await t.request().post(`/api/public/completion/${token}/balance/checkout`).set("origin", ORIGIN).send({ amountCents: 1 });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.amountCents).toBe(before.balanceCents);
    const sessionId = (res.body.url as string).split("/pay/")[1]!;
    const [pending] = await t.db.select().from(payments).where(eq(payments.checkoutSessionId, sessionId));
    expect(pending).toMatchObject({ status: "pending", purpose: "balance", amountCents: before.balanceCents, proposalId });
    // Until the provider's signed event arrives, nothing is paid.
    expect((await t.request().get(`/api/public/completion/${token}`)).body.report.balanceCents).toBe(before.balanceCents);
    const paid = await fetch(`${fake.url}/pay/${sessionId}/pay`, { method: "POST", redirect: "manual" });
    expect(paid.headers.get("location")).toMatch(new RegExp(`^${ORIGIN}/done/${token}`));
    const deadline = Date.now() + 10_000;
    let after = before;
    while (Date.now() < deadline && after.balanceCents !== 0) {
      await new Promise((r) => setTimeout(r, 150));
      after = (await t.request().get(`/api/public/completion/${token}`)).body.report;
    }
    expect(after.money).toEqual({ jobTotalCents: before.money.jobTotalCents, paidCents: before.money.jobTotalCents, balanceCents: 0 });
    const again = await t.request().post(`/api/public/completion/${token}/balance/checkout`).set("origin", ORIGIN).send({});
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("nothing-due");
  });

  it("when the link is wrong, then the checkout answers 404 like the page", async () => {
    expect((await t.request().post(`/api/public/completion/${"y".repeat(43)}/balance/checkout`).set("origin", ORIGIN).send({})).status).toBe(404);
  });

  it("when a deposit was paid before, then the deposit's own status still reads the deposit only", async () => {
    const deposit = await team.asOwner.get(`/api/proposals/${proposalId}/payments`).expect(200);
    expect(deposit.body.deposit.state).not.toBe("paid");
    expect(deposit.body.payments.map((p: { purpose: string }) => p.purpose)).toEqual(["balance"]);
  });
});
