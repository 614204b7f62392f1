import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Company defaults (test)");
});
afterAll(async () => t?.close());

describe("the company's defaults", () => {
  it("when a company has never set it, then the three-day cancellation notice is on (sales made at the home need it, 16 CFR 429.1)", async () => {
    const res = await team.asOwner.get("/api/company").expect(200);
    expect(res.body.company).toMatchObject({ isCoolingOffNoticeEnabled: true, defaultCodeBasis: "irc-2018", defaultClimateZone: 4, unitSystem: "imperial" });
  });

  it("when the owner sets the code edition, climate zone and units, then they are kept, and a new project without them starts with them", async () => {
    const patched = await send(team.asOwner, "patch", "/api/company", { defaultCodeBasis: "irc-2012", defaultClimateZone: 6, unitSystem: "metric" });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    expect(patched.body.company).toMatchObject({ defaultCodeBasis: "irc-2012", defaultClimateZone: 6, unitSystem: "metric" });
    const customer = await createCustomer(team.asOwner, { name: "Defaults Homeowner" });
    const project = await send(team.asEstimator, "post", "/api/projects", { customerId: customer.id, title: "Starts from the defaults", siteAddress: "1 Default Way, Marrow Creek" });
    expect(project.status, JSON.stringify(project.body)).toBe(201);
    expect(project.body.project).toMatchObject({ codeBasis: "irc-2012", climateZone: 6 });
  });

  it("when the owner has set the defaults, then anyone on the team can read what a new project starts with (to fill the form)", async () => {
    const res = await team.asEstimator.get("/api/company/project-defaults");
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.defaults).toEqual({ codeBasis: "irc-2012", climateZone: 6 });
    expect((await t.request().get("/api/company/project-defaults")).status).toBe(401);
  });

  it("when the company works in metric, then a teammate who accepts an invitation starts in metric", async () => {
    const email = `metric-${Date.now()}@test.example`;
    expect((await team.asOwner.post("/api/team/invites").set("origin", ORIGIN).send({ email, role: "estimator" })).status).toBe(201);
    const mail = await t.waitForMail(email, { subjectIncludes: "invited" });
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text ?? "")![1]!;
    const accepted = await t.request().post(`/api/auth/invites/${token}/accept`).set("origin", ORIGIN).send({ name: "Metric Mae", password: "a long invite passphrase" });
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(200);
    expect(accepted.body.user).toMatchObject({ email, unitSystem: "metric" });
  });

  it("when a default is out of range, then it answers 400 naming the field and keeps what was saved", async () => {
    const res = await send(team.asOwner, "patch", "/api/company", { defaultClimateZone: 9, defaultCodeBasis: "irc-1990" });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(["defaultClimateZone", "defaultCodeBasis"]));
    expect((await team.asOwner.get("/api/company").expect(200)).body.company.defaultClimateZone).toBe(6);
  });
});
