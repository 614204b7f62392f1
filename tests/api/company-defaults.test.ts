import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
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

  it("when a default is out of range, then it answers 400 naming the field and keeps what was saved", async () => {
    const res = await send(team.asOwner, "patch", "/api/company", { defaultClimateZone: 9, defaultCodeBasis: "irc-1990" });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(["defaultClimateZone", "defaultCodeBasis"]));
    expect((await team.asOwner.get("/api/company").expect(200)).body.company.defaultClimateZone).toBe(6);
  });
});
