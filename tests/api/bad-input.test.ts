import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, mainAttic, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 13, item 5: inputs that reached PostgreSQL and answered 500. Each must be a 400 that names
 * the field, and nothing may be saved from the refused request.
 */

let t: TestApp;
let team: Team;
let projectId: string;
let proposalId: string;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Bad Input Roofing");
  const customer = await createCustomer(team.asOwner);
  const project = await createProject(team.asOwner, customer.id);
  projectId = project.id;
  const space = await createSpace(team.asOwner, project.id, mainAttic);
  const option = await send(team.asOwner, "post", `/api/projects/${project.id}/options`, { name: "Option", spaces: [{ spaceId: space.id, ventActions: {}, added: [] }] });
  const proposal = await send(team.asOwner, "post", `/api/projects/${project.id}/proposals`, { optionIds: [option.body.option.id] });
  expect(proposal.status, JSON.stringify(proposal.body)).toBe(201);
  proposalId = proposal.body.proposal.id;
});
afterAll(async () => {
  await t?.close();
});

function expectFieldError(res: { status: number; body: { error?: { fields?: Record<string, string>; message?: string } } }, field: string, pattern?: RegExp) {
  expect(res.status, JSON.stringify(res.body)).toBe(400);
  expect(Object.keys(res.body.error?.fields ?? {}), JSON.stringify(res.body)).toContain(field);
  if (pattern) expect(res.body.error!.fields![field]).toMatch(pattern);
}

describe("control characters (NUL and friends) in text", () => {
  it("when a customer's name holds a NUL byte, then the answer is 400 on name and no customer is saved", async () => {
    const before = await team.asOwner.get("/api/customers?q=Nul").set("origin", ORIGIN);
    const res = await send(team.asOwner, "post", "/api/customers", { name: "Nul\u0000Customer" });
    expectFieldError(res, "name", /control character/i);
    const after = await team.asOwner.get("/api/customers?q=Nul").set("origin", ORIGIN);
    expect(after.body.total ?? after.body.customers?.length).toEqual(before.body.total ?? before.body.customers?.length);
  });

  it.each([
    ["a project's notes (patch)", () => send(team.asOwner, "patch", `/api/projects/${projectId}`, { version: 1, notes: "line\u0000two" }), "notes"],
    ["a proposal's cover note", () => send(team.asOwner, "patch", `/api/proposals/${proposalId}`, { version: 1, coverNote: "x\u0000" }), "coverNote"],
    ["a nested vent id of a survey", () => send(team.asOwner, "post", `/api/projects/${projectId}/spaces`, { ...mainAttic, vents: [{ ...mainAttic.vents[0], id: "r\u0000" }] }), "vents.0.id"],
    ["a catalog item's name", () => send(team.asOwner, "post", "/api/catalog", { sku: "NUL-1", name: "Ridge\u0000vent", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, materialCostCents: 1, sellPriceCents: 2 }), "name"],
    ["an escape character in a customer's phone", () => send(team.asOwner, "post", "/api/customers", { name: "Escape", phone: "555\u001b[31m" }), "phone"],
    ["a key of an object", () => send(team.asOwner, "patch", `/api/proposals/${proposalId}`, { version: 1, scopes: { "a\u0000": ["x"] } }), "scopes"],
  ])("when %s holds a control character, then the answer is 400 naming it", async (_what, call, field) => {
    const res = await call();
    expectFieldError(res, field, /control character/i);
  });

  it("when a query string holds a NUL byte, then list routes answer 400 on that parameter", async () => {
    for (const path of ["/api/customers", "/api/projects", "/api/catalog", "/api/pipeline"]) {
      const res = await team.asOwner.get(`${path}?q=a%00b`).set("origin", ORIGIN);
      expectFieldError(res, "q", /control character/i);
    }
  });

  it("when text holds ordinary new lines and tabs, then it is saved as written", async () => {
    const res = await send(team.asOwner, "post", "/api/customers", { name: "Line Breaks", notes: "Gate code 4411\n\tDog in yard\r\n" });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });
});

describe("numbers beyond what a column holds", () => {
  it("when a patch names version 2147483648 (past a 32-bit integer), then the answer is 400 on version", async () => {
    for (const [path, body] of [
      [`/api/projects/${projectId}`, { version: 2_147_483_648, title: "x" }],
      [`/api/proposals/${proposalId}`, { version: 2_147_483_648, coverNote: "x" }],
    ] as const) {
      expectFieldError(await send(team.asOwner, "patch", path, body), "version");
    }
  });
});

describe("dates a calendar does not have, or too far ahead", () => {
  it("when validUntil is 2027-02-29 (2027 is not a leap year), then the answer is 400 on validUntil", async () => {
    expectFieldError(await send(team.asOwner, "patch", `/api/proposals/${proposalId}`, { version: 1, validUntil: "2027-02-29" }), "validUntil", /real date/i);
    expectFieldError(await send(team.asOwner, "patch", `/api/proposals/${proposalId}`, { version: 1, validUntil: "2026-13-01" }), "validUntil", /real date/i);
  });

  it("when validUntil is 9999-12-31, then the answer is 400 on validUntil and the proposal keeps its date", async () => {
    const before = await team.asOwner.get(`/api/proposals/${proposalId}`);
    const res = await send(team.asOwner, "patch", `/api/proposals/${proposalId}`, { version: before.body.proposal.version, validUntil: "9999-12-31" });
    expectFieldError(res, "validUntil", /at most/i);
    const created = await send(team.asOwner, "post", `/api/projects/${projectId}/proposals`, { optionIds: before.body.proposal.optionIds, validUntil: "9999-12-31" });
    expectFieldError(created, "validUntil", /at most/i);
    const after = await team.asOwner.get(`/api/proposals/${proposalId}`);
    expect(after.body.proposal.validUntil).toBe(before.body.proposal.validUntil);
  });
});
