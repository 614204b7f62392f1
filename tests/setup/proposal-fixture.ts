import { expect } from "vitest";
import type { TestApp } from "./test-app.ts";
import { createProject, createSpace, send, type Team } from "./survey-fixtures.ts";

/**
 * A draft proposal that can be sent at once: a customer with an e-mail address, a surveyed attic,
 * one priced option and the seller's typed signature. Returns the homeowner's unique address, so
 * a test can count the e-mails that reach it.
 */
export async function draftReadyToSend(t: TestApp, team: Team) {
  const homeownerEmail = `homeowner-${crypto.randomUUID().slice(0, 8)}@homeowner.example`;
  const customer = await send(team.asOwner, "post", "/api/customers", { name: "Rowan Tessaly", email: homeownerEmail });
  expect(customer.status, JSON.stringify(customer.body)).toBe(201);
  const project = await createProject(team.asEstimator, customer.body.customer.id, { title: "Crash-safe send" });
  const space = await createSpace(team.asEstimator, project.id);
  const item = await send(team.asOwner, "post", "/api/catalog", {
    sku: `SV-${crypto.randomUUID().slice(0, 6)}`, name: "Round soffit vent 4 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 9, sellPriceCents: 600, materialCostCents: 100,
  });
  expect(item.status, JSON.stringify(item.body)).toBe(201);
  const option = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, {
    name: "More soffit vents", spaces: [{ spaceId: space.id, ventActions: {}, added: [{ id: "a1", catalogItemId: item.body.item.id, quantity: 8 }] }],
  });
  expect(option.status, JSON.stringify(option.body)).toBe(201);
  const draft = await send(team.asSales, "post", `/api/projects/${project.id}/proposals`, { optionIds: [option.body.option.id] });
  expect(draft.status, JSON.stringify(draft.body)).toBe(201);
  const signature = await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Test Sales" });
  expect(signature.status, JSON.stringify(signature.body)).toBe(200);
  return { proposalId: draft.body.proposal.id as string, projectId: project.id, homeownerEmail };
}
