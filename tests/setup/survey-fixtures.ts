import { expect } from "vitest";
import { ORIGIN, type TestApp } from "./test-app.ts";

export type Agent = Awaited<ReturnType<TestApp["signIn"]>>;

/** A company with one user of each role, signed in, for the survey API tests. */
export async function makeTeam(t: TestApp, name?: string) {
  const company = await t.makeCompany(name);
  const [owner, estimator, sales] = await Promise.all([
    t.makeUser(company.id, "owner"), t.makeUser(company.id, "estimator"), t.makeUser(company.id, "sales"),
  ]);
  const [asOwner, asEstimator, asSales] = await Promise.all([t.signIn(owner.email), t.signIn(estimator.email), t.signIn(sales.email)]);
  return { company, owner, estimator, sales, asOwner, asEstimator, asSales };
}
export type Team = Awaited<ReturnType<typeof makeTeam>>;

type Body = Record<string, unknown>;
export const send = (agent: Agent, method: "post" | "put" | "patch" | "delete", path: string, body?: Body) =>
  agent[method](path).set("origin", ORIGIN).send(body ?? {});

export async function createCustomer(agent: Agent, body: Body = {}) {
  const res = await send(agent, "post", "/api/customers", { name: "Rowan Tessaly", ...body });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.customer as { id: string; name: string };
}

export async function createProject(agent: Agent, customerId: string, body: Body = {}) {
  const res = await send(agent, "post", "/api/projects", {
    customerId, title: "Attic survey", siteAddress: "12 Quarry Hill Road, Marrow Creek", climateZone: 4, ...body,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.project as { id: string; version: number; title: string; codeBasis: string };
}

export const mainAttic = {
  name: "Main attic",
  roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 },
  sections: [{ kind: "rect", lengthFt: 40, widthFt: 30 }],
  vents: [
    { id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18 },
    { id: "fan-1", kind: "powered-gable", location: "upper", dropBelowRidgeFt: 2, cfm: 1200, mounting: "gable" },
    { id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 6, nfaSqInPerUnit: 50 },
  ],
  site: { atmosphericCombustionAppliance: true },
  notes: null,
};

export async function createSpace(agent: Agent, projectId: string, body: Body = mainAttic) {
  const res = await send(agent, "post", `/api/projects/${projectId}/spaces`, body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.space as { id: string; version: number; vents: { id: string }[] } & Body;
}
