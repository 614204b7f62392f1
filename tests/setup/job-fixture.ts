import { expect } from "vitest";
import { ESIGN_CONSENT_VERSION } from "../../shared/proposals/disclosures.ts";
import { ORIGIN, type TestApp } from "./test-app.ts";
import { createProject, createSpace, mainAttic, send, type Team } from "./survey-fixtures.ts";

export const signBody = (name = "Odile Farrant") => ({ signerName: name, signature: { typed: name }, consent: { esign: true, consentTextVersion: ESIGN_CONSENT_VERSION } });

/** A crew member of the team's company, signed in. */
export async function makeCrew(t: TestApp, team: Team) {
  const user = await t.makeUser(team.company.id, "crew");
  return { user, agent: await t.signIn(user.email) };
}

/**
 * Accepted work ready for a crew: a customer with an e-mail address, a surveyed attic (ridge,
 * gable fan, soffits), an option that removes the fan and adds 40 ft of soffit strip, sent and
 * accepted with a typed signature. Returns the ids and the homeowner's address.
 */
export async function acceptedProject(t: TestApp, team: Team, opts: { title?: string } = {}) {
  const homeownerEmail = `homeowner-${crypto.randomUUID().slice(0, 8)}@homeowner.example`;
  await send(team.asSales, "put", "/api/auth/me/signature", { typed: "Test Sales" }).expect(200);
  const customer = await send(team.asOwner, "post", "/api/customers", { name: "Odile Farrant", email: homeownerEmail, phone: "555-0142" });
  const project = await createProject(team.asEstimator, customer.body.customer.id, { title: opts.title ?? "Crew attic", siteAddress: "3 Larch Row, Marrow Creek" });
  const space = await createSpace(team.asEstimator, project.id, mainAttic);
  const strip = await send(team.asOwner, "post", "/api/catalog", {
    sku: `SS-${crypto.randomUUID().slice(0, 6)}`, name: "Continuous soffit strip, 8 ft", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, soldInLengthFt: 8, materialCostCents: 150, sellPriceCents: 400,
  });
  expect(strip.status, JSON.stringify(strip.body)).toBe(201);
  const option = await send(team.asEstimator, "post", `/api/projects/${project.id}/options`, {
    name: "Soffit strip, fan out", spaces: [{ spaceId: space.id, ventActions: { "fan-1": "remove" }, added: [{ id: "a1", catalogItemId: strip.body.item.id, quantity: 40 }] }],
  });
  expect(option.status, JSON.stringify(option.body)).toBe(201);
  const draft = await send(team.asSales, "post", `/api/projects/${project.id}/proposals`, { optionIds: [option.body.option.id] });
  const sent = await send(team.asSales, "post", `/api/proposals/${draft.body.proposal.id}/send`);
  expect(sent.status, JSON.stringify(sent.body)).toBe(200);
  const token = (sent.body.link as string).split("/p/")[1]!;
  const accepted = await t.request().post(`/api/public/proposals/${token}/accept`).set("origin", ORIGIN).send({ optionId: option.body.option.id, ...signBody() });
  expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
  return { projectId: project.id, proposalId: draft.body.proposal.id as string, optionId: option.body.option.id as string, stripId: strip.body.item.id as string, homeownerEmail, spaceId: space.id };
}
