import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql as rawSql } from "drizzle-orm";
import { DEMO_PASSWORD, DEMO_PROJECTS, seedDemo } from "../../scripts/lib/seed.ts";
import { testDatabaseUrl } from "../setup/test-env.ts";
import { startTestApp, type TestApp } from "../setup/test-app.ts";

// The test task seeds the demo into the test database before the suite; this file reads it.
let t: TestApp;
let asEstimator: Awaited<ReturnType<TestApp["signIn"]>>;
beforeAll(async () => {
  t = await startTestApp();
  asEstimator = await t.signIn("estimator@tallgrass.example", DEMO_PASSWORD);
});
afterAll(async () => t?.close());

async function analysisOf(title: string) {
  const list = await asEstimator.get(`/api/projects?q=${encodeURIComponent(title)}`).expect(200);
  const project = list.body.items.find((p: { title: string }) => p.title === title);
  expect(project, title).toBeDefined();
  return (await asEstimator.get(`/api/projects/${project.id}/analysis`).expect(200)).body.spaces as {
    name: string;
    analysis: { compliant: boolean; requirement: { ratio: number; codeBasis: string }; findings: { code: string }[] };
  }[];
}
const codes = (space: { analysis: { findings: { code: string }[] } }) => space.analysis.findings.map((f) => f.code);

describe("demo data", () => {
  it("when the gable-fan demo is analysed, then the fan short-circuits through the ridge, is short of intake and its checks show a dead fan", async () => {
    const [main] = await analysisOf("Varnum attic — gable fan and ridge vent");
    expect(codes(main!)).toEqual(expect.arrayContaining(["powered-with-passive-exhaust", "fan-intake-short", "fan-bearings-seized", "fan-winding-open", "backdraft-risk"]));
  });

  it("when the balanced demo is analysed, then it meets 1/300 under the 2018 text with no findings", async () => {
    const [main] = await analysisOf("Brennock attic — balanced ridge and soffit");
    expect(main!.analysis).toMatchObject({ compliant: true, requirement: { ratio: 300, codeBasis: "irc-2018" } });
    expect(codes(main!)).toEqual([]);
  });

  it("when the L-shaped demo is analysed, then it has a main attic and a separate garage attic", async () => {
    const spaces = await analysisOf("Farrowby ranch — L-shaped attic and garage");
    expect(spaces.map((s) => s.name)).toEqual(["Main attic", "Garage attic"]);
    expect(codes(spaces[0]!)).toContain("soffits-blocked");
    expect(codes(spaces[1]!)).toContain("no-intake");
  });

  it("when Bluestem's owner lists projects, then they see only their own one", async () => {
    const owner = await t.signIn("owner@bluestem.example", DEMO_PASSWORD);
    const list = await owner.get("/api/projects").expect(200);
    expect(list.body.items.map((p: { title: string }) => p.title)).toEqual(["Pettibone attic survey"]);
  });

  it("when the seed runs again, then it adds nothing (idempotent by natural keys)", async () => {
    const count = async () => (await t.db.execute<{ n: number }>(rawSql`select (select count(*) from customers) + (select count(*) from projects) + (select count(*) from attic_spaces) as n`))[0]!.n;
    const before = await count();
    await seedDemo(testDatabaseUrl());
    expect(await count()).toBe(before);
    const seededTitles = (await t.db.execute<{ title: string }>(rawSql`select title from projects where title in ${DEMO_PROJECTS.map((p) => p.title)}`)).map((r) => r.title);
    expect(new Set(seededTitles).size).toBe(DEMO_PROJECTS.length);
    expect(seededTitles).toHaveLength(DEMO_PROJECTS.length);
  });
});
