import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startTestApp, type TestApp } from "../setup/test-app.ts";
import { createCustomer, createProject, makeTeam, type Team } from "../setup/survey-fixtures.ts";

let t: TestApp;
let team: Team;
beforeAll(async () => {
  t = await startTestApp();
  team = await makeTeam(t);
  const customer = await createCustomer(team.asOwner);
  for (let i = 0; i < 8; i += 1) await createProject(team.asOwner, customer.id, { title: `Attic survey ${i + 1}` });
});
afterAll(async () => t?.close());

describe("compressed JSON (issue 17, delivery)", () => {
  it("when a staff list is over 1 kB and the browser takes brotli, then it comes brotli-compressed and reads the same", async () => {
    const plain = await team.asOwner.get("/api/projects").set("accept-encoding", "identity").expect(200);
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(Buffer.byteLength(JSON.stringify(plain.body))).toBeGreaterThan(1024);
    const brotli = await team.asOwner.get("/api/projects").set("accept-encoding", "br, gzip").expect(200);
    expect(brotli.headers["content-encoding"]).toBe("br");
    expect(brotli.body).toEqual(plain.body);
  });

  it("when an error is answered, then it is still the usual JSON error", async () => {
    const res = await team.asOwner.get("/api/no-such-route").set("accept-encoding", "br, gzip").expect(404);
    expect(res.body.error.code).toBe("not-found");
  });
});
