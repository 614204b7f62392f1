import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { createProject, createSpace, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Recipient at send time (test)");
  const signature = await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Priya Sales" });
  expect(signature.status, JSON.stringify(signature.body)).toBe(200);
});
afterAll(async () => {
  await t?.close();
});

/** A draft for a customer with no e-mail address on file. */
async function draftForCustomerWithoutEmail() {
  const customer = await send(team.asOwner, "post", "/api/customers", { name: "Ansel Brightwater" });
  expect(customer.status, JSON.stringify(customer.body)).toBe(201);
  const project = await createProject(team.asEstimator, customer.body.customer.id, { title: `No e-mail yet ${crypto.randomUUID().slice(0, 6)}` });
  const space = await createSpace(team.asEstimator, project.id);
  const item = await send(team.asOwner, "post", "/api/catalog", {
    sku: `SV-${crypto.randomUUID().slice(0, 6)}`, name: "Round soffit vent 4 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 9, sellPriceCents: 600, materialCostCents: 100,
  });
  const option = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, {
    name: "More soffit vents", spaces: [{ spaceId: space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: item.body.item.id, quantity: 8 }] }],
  });
  const draft = await send(team.asSales, "post", `/api/projects/${project.id}/proposals`, { optionIds: [option.body.option.id] });
  expect(draft.status, JSON.stringify(draft.body)).toBe(201);
  return { proposalId: draft.body.proposal.id as string, customerId: customer.body.customer.id as string };
}

describe("the recipient at send time", () => {
  it("when the customer has no e-mail and sales sends without one, then it answers 400 naming the recipient field and nothing is sent", async () => {
    const { proposalId } = await draftForCustomerWithoutEmail();
    const res = await send(team.asSales, "post", `/api/proposals/${proposalId}/send`, {});
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty("recipientEmail");
    expect((await team.asSales.get(`/api/proposals/${proposalId}`)).body.proposal.status).toBe("draft");
  });

  it("when sales types the homeowner's e-mail in the send dialog, then the link goes there and the customer keeps the address", async () => {
    const { proposalId, customerId } = await draftForCustomerWithoutEmail();
    const to = `ansel-${crypto.randomUUID().slice(0, 6)}@homeowner.example`;
    const res = await send(team.asSales, "post", `/api/proposals/${proposalId}/send`, { recipientEmail: ` ${to} ` });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const mail = await t.waitForMail(to, { subjectIncludes: "proposal" });
    expect(mail.text).toContain(res.body.link);
    expect((await team.asSales.get(`/api/customers/${customerId}`)).body.customer.email).toBe(to);
    const detail = await team.asSales.get(`/api/proposals/${proposalId}`);
    expect(detail.body.events.map((e: { event: string }) => e.event)).toEqual(expect.arrayContaining(["recipient-changed", "sent"]));
  });

  it("when the typed address is not an e-mail address, then it answers 400 and the draft is kept", async () => {
    const { proposalId } = await draftForCustomerWithoutEmail();
    const res = await send(team.asSales, "post", `/api/proposals/${proposalId}/send`, { recipientEmail: "not an address" });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.recipientEmail).toMatch(/e-mail/);
    expect((await team.asSales.get(`/api/proposals/${proposalId}`)).body.proposal.status).toBe("draft");
  });
});
