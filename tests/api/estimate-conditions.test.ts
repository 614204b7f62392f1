import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_ESTIMATE_CONDITIONS } from "../../shared/airflow-model/index.ts";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { makeTeam, send, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;

beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "estimate-conditions");
});
afterAll(async () => {
  await t?.close();
});

describe("the company's airflow-estimate conditions", () => {
  it("when nothing was stated, then every role reads the defaults", async () => {
    for (const agent of [team.asOwner, team.asEstimator, team.asSales]) {
      const res = await agent.get("/api/company/estimate-conditions").expect(200);
      expect(res.body.estimateConditions).toEqual(DEFAULT_ESTIMATE_CONDITIONS);
    }
  });

  it("when the owner states them, then every role reads them, and bad figures answer 400 and change nothing", async () => {
    const stated = { summer: { outdoorTempF: 98, atticTempF: 140, houseTempF: 74, windMph: 5 }, winter: { outdoorTempF: 10, atticTempF: 14, houseTempF: 68, windMph: 0 } };
    const ok = await send(team.asOwner, "patch", "/api/company", { estimateConditions: stated });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.company.estimateConditions).toEqual(stated);
    expect((await team.asEstimator.get("/api/company/estimate-conditions").expect(200)).body.estimateConditions).toEqual(stated);

    const bad = await send(team.asOwner, "patch", "/api/company", { estimateConditions: { ...stated, summer: { ...stated.summer, atticTempF: 400 } } });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.error.fields)).toContain("atticTempF");
    expect((await team.asSales.get("/api/company/estimate-conditions").expect(200)).body.estimateConditions).toEqual(stated);

    const notOwner = await send(team.asSales, "patch", "/api/company", { estimateConditions: DEFAULT_ESTIMATE_CONDITIONS });
    expect(notOwner.status).toBe(403);
  });
});
