import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { payments } from "../../server/db/schema/index.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, makeTeam, send, type Agent, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
let other: Team;
let projectId: string;
let optionIds: string[];
const totals: Record<string, number> = {};
const DAY_MS = 86_400_000;

const pub = (url: string, body: Record<string, unknown>) => t.request().post(url).set("origin", ORIGIN).send(body);

async function draft(agent: Agent, ids: string[]) {
  const res = await send(agent, "post", `/api/projects/${projectId}/proposals`, { optionIds: ids });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.proposal as { id: string; version: number };
}

async function sent(ids: string[]) {
  const p = await draft(team.asSales, ids);
  const res = await send(team.asSales, "post", `/api/proposals/${p.id}/send`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return { id: p.id, token: (res.body.link as string).split("/p/")[1]!, version: res.body.proposal.version as number };
}

type Overview = {
  periodDays: number;
  stages: { status: string; count: number; valueCents: number }[];
  proposals: { id: string; status: string; valueCents: number | null; valueBasis: string | null; ageDays: number; projectTitle: string; customerName: string | null }[];
  winRate: { accepted: number; declined: number; decided: number; expired: number; rate: number | null };
};
const stage = (o: Overview, status: string) => o.stages.find((s) => s.status === status)!;

let ids: { draftId: string; acceptedId: string; declinedId: string; oldRevisionId: string; newRevisionId: string };

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Tallgrass Exteriors (pipeline test)");
  other = await makeTeam(t, "Bluestem Roofing (pipeline test)");
  const customer = await createCustomer(team.asOwner, { name: "Odette Varnum", email: `odette-${Date.now()}@homeowner.example` });
  projectId = (await createProject(team.asEstimator, customer.id, { title: "Pipeline attic" })).id;
  const space = await createSpace(team.asEstimator, projectId);
  const item = await send(team.asOwner, "post", "/api/catalog", { sku: "RSV-4", name: "Round soffit vent 4 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 9, sellPriceCents: 600, materialCostCents: 100 });
  expect(item.status, JSON.stringify(item.body)).toBe(201);
  optionIds = [];
  for (const [name, quantity] of [["Twelve soffit vents", 12], ["Twenty-four soffit vents", 24]] as const) {
    const o = await send(team.asEstimator, "post", `/api/projects/${projectId}/options`, {
      name, spaces: [{ spaceId: space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: item.body.item.id, quantity }] }],
    });
    expect(o.status, JSON.stringify(o.body)).toBe(201);
    optionIds.push(o.body.option.id);
  }
  const options = await team.asSales.get(`/api/projects/${projectId}/options`).expect(200);
  for (const o of options.body.options as { id: string; price: { totalCents: number } }[]) totals[o.id] = o.price.totalCents;
  expect(totals[optionIds[1]!]).toBeGreaterThan(totals[optionIds[0]!]!);
  expect((await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Test sales" })).status).toBe(200);

  const draftId = (await draft(team.asEstimator, optionIds)).id;
  const accepted = await sent(optionIds);
  const acc = await pub(`/api/public/proposals/${accepted.token}/accept`, {
    optionId: optionIds[0], signerName: "Odette Varnum", signature: { typed: "Odette Varnum" }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION },
  });
  expect(acc.status, JSON.stringify(acc.body)).toBe(200);
  const declined = await sent(optionIds);
  expect((await pub(`/api/public/proposals/${declined.token}/decline`, { reason: "Too soon" })).status).toBe(200);
  const old = await sent([optionIds[0]!]);
  const revised = await send(team.asSales, "patch", `/api/proposals/${old.id}`, { version: old.version, coverNote: "With the second option too", optionIds });
  expect(revised.status, JSON.stringify(revised.body)).toBe(200);
  ids = { draftId, acceptedId: accepted.id, declinedId: declined.id, oldRevisionId: old.id, newRevisionId: revised.body.proposal.id };
});
afterAll(async () => t?.close());

describe("GET /api/pipeline", () => {
  it("when sales asks, then current revisions come by status with value, age and the win rate", async () => {
    const res = await team.asSales.get("/api/pipeline?days=30");
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const o = res.body as Overview;
    expect(o.periodDays).toBe(30);
    expect(o.stages.map((s) => s.status)).toEqual(["draft", "sent", "viewed", "accepted", "declined", "expired"]);
    // Two drafts (the estimator's and the new revision); the superseded revision is history, not pipeline.
    expect(o.proposals.map((p) => p.id).sort()).toEqual([ids.draftId, ids.acceptedId, ids.declinedId, ids.newRevisionId].sort());
    expect(stage(o, "draft").count).toBe(2);
    expect(stage(o, "accepted")).toMatchObject({ count: 1, valueCents: totals[optionIds[0]!] });
    expect(stage(o, "declined")).toMatchObject({ count: 1, valueCents: totals[optionIds[1]!] });

    const accepted = o.proposals.find((p) => p.id === ids.acceptedId)!;
    expect(accepted).toMatchObject({ status: "accepted", valueBasis: "accepted", valueCents: totals[optionIds[0]!], ageDays: 0, projectTitle: "Pipeline attic", customerName: "Odette Varnum" });
    // A draft has no frozen snapshot: its value is the largest live option total.
    expect(o.proposals.find((p) => p.id === ids.draftId)).toMatchObject({ status: "draft", valueBasis: "largest", valueCents: totals[optionIds[1]!] });
    expect(o.winRate).toEqual({ accepted: 1, declined: 1, decided: 2, expired: 0, rate: 0.5 });
  });

  it("when the period has passed, then decisions leave the win rate and open proposals age", async () => {
    t.clock.offsetMs = 40 * DAY_MS;
    try {
      // Sessions lapse over 40 days: sign in again on the moved clock.
      const owner = await t.signIn(team.owner.email);
      const o = (await owner.get("/api/pipeline?days=30").expect(200)).body as Overview;
      expect(o.winRate).toEqual({ accepted: 0, declined: 0, decided: 0, expired: 0, rate: null });
      expect(o.proposals.map((p) => p.id).sort()).toEqual([ids.draftId, ids.newRevisionId].sort());
      expect(o.proposals.every((p) => p.ageDays === 40)).toBe(true);
      const year = (await owner.get("/api/pipeline?days=365").expect(200)).body as Overview;
      expect(year.winRate.rate).toBe(0.5);
    } finally {
      t.clock.offsetMs = 0;
    }
  });

  it("when a deposit is confirmed (and another refunded), then the pipeline shows only the received one, on its card and in the total", async () => {
    const acceptedOptionId = (await team.asSales.get(`/api/proposals/${ids.acceptedId}`)).body.proposal.acceptance.optionId as string;
    const base = { companyId: team.company.id, proposalId: ids.acceptedId, optionId: acceptedOptionId };
    await t.db.insert(payments).values([
      { ...base, amountCents: 25_000, status: "refunded", paymentIntentId: "pi_test_pipeline_refunded" },
      { ...base, amountCents: 11_926, status: "paid", paymentIntentId: "pi_test_pipeline_paid" },
    ]);
    const o = (await team.asSales.get("/api/pipeline?days=90").expect(200)).body;
    expect(o.deposits).toEqual({ receivedCents: 11_926, count: 1 });
    expect(o.proposals.find((p: { id: string }) => p.id === ids.acceptedId).depositPaidCents).toBe(11_926);
    expect(o.proposals.find((p: { id: string }) => p.id === ids.declinedId).depositPaidCents).toBe(0);
  });

  it("when an estimator, a stranger or another company asks, then they get 403, 401 or nothing of ours", async () => {
    expect((await team.asEstimator.get("/api/pipeline")).status).toBe(403);
    expect((await t.request().get("/api/pipeline")).status).toBe(401);
    const theirs = (await other.asSales.get("/api/pipeline").expect(200)).body as Overview;
    expect(theirs.proposals).toEqual([]);
    expect(theirs.winRate.rate).toBeNull();
  });

  it("when the period is not one of 30, 90 or 365 days, then it answers a clear 400", async () => {
    const res = await team.asSales.get("/api/pipeline?days=7");
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("days");
    expect((await team.asSales.get("/api/pipeline")).body.periodDays).toBe(90);
  });
});
