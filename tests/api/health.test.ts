import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startOwnCluster, type OwnCluster } from "../setup/own-cluster.ts";
import { ORIGIN, startTestApp, type TestApp } from "../setup/test-app.ts";

// A cluster of this file's own: stopping it leaves the suite's database (and other runs) alone.
let db: OwnCluster;
let t: TestApp;
beforeAll(async () => {
  db = await startOwnCluster("health");
  t = await startTestApp({ databaseUrl: db.databaseUrl });
});
afterAll(async () => {
  await db?.start();
  await t?.close();
  db?.destroy();
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

    await db.stop("fast");
    try {
      expect(await pollStatus("/api/health", 503)).toBe(503);
      const signIn = await t.request().post("/api/auth/sign-in").set("origin", ORIGIN).send({ email: "someone@test.example", password: "whatever it is" });
      expect(signIn.status).toBe(503);
      expect(signIn.body.error.message).toMatch(/briefly unavailable/);
    } finally {
      await db.start();
    }
    expect(await pollStatus("/api/health", 200)).toBe(200);
  });
});
