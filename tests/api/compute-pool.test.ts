import { eq } from "drizzle-orm";
import express from "express";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createComputePool, busyError } from "../../server/lib/compute/pool.ts";
import { createLogger } from "../../server/lib/logger.ts";
import { errorMiddleware } from "../../server/lib/error-middleware.ts";
import { projects } from "../../server/db/schema/index.ts";
import type { Actor } from "../../server/lib/request-context.ts";
import { analyzeSpace } from "../../server/modules/projects/analyze-space.ts";
import { createProjectsRepository } from "../../server/modules/projects/projects.repository.ts";
import { LIMITS } from "../../shared/ventilation/index.ts";
import { SpaceSurveySchema } from "../../shared/schemas/survey.ts";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, createSpace, mainAttic, makeTeam, type Team } from "../setup/survey-fixtures.ts";

/**
 * Issue 13, item 6: a project's analysis and the PDFs are drawn on worker threads (server/lib/compute),
 * so the request thread stays free. What is checked here: the pooled analysis is the same as the core
 * run in this process, and a full queue refuses at once with a 503 that says when to come back. (How
 * fast the health check stays meanwhile is measured in bench/largest-analysis-bench.ts, never asserted.)
 */

let t: TestApp;
let team: Team;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t, "Compute Pool Roofing");
});
afterAll(async () => t?.close());

const BIGGEST_SPACE = SpaceSurveySchema.parse({
  name: "Largest",
  roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 60, eaveLengthFt: 120 },
  sections: Array.from({ length: LIMITS.maxSections }, (_, i) => ({ kind: "rect", lengthFt: 10 + (i % 20), widthFt: 8 + (i % 5) })),
  vents: Array.from({ length: LIMITS.maxVents }, (_, i) =>
    i % 2 ? { id: `v${i}`, kind: "soffit-individual", location: "lower", quantity: 1 + (i % 12), nfaSqInPerUnit: 25 } : { id: `v${i}`, kind: "box", location: "upper", quantity: 1, nfaSqInPerUnit: 50 },
  ),
});
const BASIS = { codeBasis: "irc-2018", climateZone: 5, ceilingVaporRetarder: "none", roofColor: "medium" } as const;

describe("the compute pool", () => {
  it("when a project with two spaces is analysed through the API, then the answer is what the core gives in this process", async () => {
    const customer = await createCustomer(team.asOwner);
    const project = await createProject(team.asOwner, customer.id, { climateZone: 5 });
    const a = await createSpace(team.asEstimator, project.id, mainAttic);
    const b = await createSpace(team.asEstimator, project.id, { ...mainAttic, name: "Garage attic" });
    const res = await team.asEstimator.get(`/api/projects/${project.id}/analysis`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^application\/json/);
    // The same rows, read in this process and run through the core here.
    const [owner] = await t.db.select({ companyId: projects.companyId }).from(projects).where(eq(projects.id, project.id));
    const row = await createProjectsRepository(t.db).findWithSpaces({ companyId: owner!.companyId } as Actor, project.id);
    const { spaces, ...basis } = row!;
    expect(spaces.map((s) => s.id)).toEqual([a.id, b.id]);
    expect(res.body.spaces).toEqual(spaces.map((space) => JSON.parse(JSON.stringify(analyzeSpace(basis, space)))));
    expect(res.body.spaces.map((s: { analysis: unknown }) => s.analysis !== null)).toEqual([true, true]);
  });

  it("when more work is handed over than its queue holds, then the rest is refused at once as busy (503), and what was taken is done", async () => {
    const pool = createComputePool({ threads: 1, maxQueue: 2 });
    try {
      const input = { project: BASIS, spaces: [{ ...BIGGEST_SPACE, id: "s1" }] };
      const outcomes = await Promise.allSettled(Array.from({ length: 8 }, () => pool.run("analyzeProject", input)));
      const refused = outcomes.filter((o) => o.status === "rejected");
      const done = outcomes.filter((o): o is PromiseFulfilledResult<string> => o.status === "fulfilled");
      expect(refused.length).toBeGreaterThan(0);
      expect(done.length).toBeGreaterThan(0);
      for (const r of refused) expect((r as PromiseRejectedResult).reason).toMatchObject({ status: 503, code: "busy" });
      const inProcess = JSON.stringify({ spaces: [analyzeSpace(BASIS, { ...BIGGEST_SPACE, id: "s1" })] });
      for (const d of done) expect(d.value).toBe(inProcess);
    } finally {
      await pool.close();
    }
  });

  it("when the server answers a refusal from the pool, then it is a 503 with Retry-After and words for the person", async () => {
    const app = express();
    app.get("/busy", () => {
      throw busyError();
    });
    app.use(errorMiddleware(createLogger("silent")));
    const res = await request(app).get("/busy");
    expect(res.status).toBe(503);
    expect(res.headers["retry-after"]).toBe("5");
    expect(res.body.error).toMatchObject({ code: "busy", message: expect.stringMatching(/busy.*try again/i) });
  });
});
