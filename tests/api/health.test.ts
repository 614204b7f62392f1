import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startCluster, stopCluster, testCluster } from "../../scripts/lib/postgres.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";

let t: TestApp;
beforeAll(async () => {
  // No workers: jobs queued by other test files must not be mid-run when the database stops.
  t = await startTestApp({ runWorkers: false });
});
afterAll(async () => {
  startCluster(testCluster()); // never leave the suite without its database
  await t?.close();
});

async function pollStatus(path: string, want: number, timeoutMs = 20_000): Promise<number> {
  const deadline = Date.now() + timeoutMs;
  let last = 0;
  while (Date.now() < deadline) {
    last = (await t.request().get(path)).status;
    if (last === want) return last;
    await new Promise((r) => setTimeout(r, 250));
  }
  return last;
}

describe("GET /api/health", () => {
  it("when PostgreSQL stops, then health answers 503 and other routes 503 (not 500); when it starts again, then health is 200 without restarting the app", async () => {
    const ok = await t.request().get("/api/health");
    expect(ok.status).toBe(200);
    expect(ok.body).toEqual({ status: "ok", database: "reachable" });

    stopCluster(testCluster());
    try {
      expect(await pollStatus("/api/health", 503)).toBe(503);
      const signIn = await t.request().post("/api/auth/sign-in").set("origin", ORIGIN).send({ email: "someone@test.example", password: "whatever it is" });
      expect(signIn.status).toBe(503);
      expect(signIn.body.error.message).toMatch(/briefly unavailable/);
    } finally {
      startCluster(testCluster());
    }
    expect(await pollStatus("/api/health", 200)).toBe(200);
  });
});
