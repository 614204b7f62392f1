import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql as rawSql } from "drizzle-orm";
import { users } from "../../server/db/schema/index.ts";
import { startServerProcess, type ServerProcess } from "../setup/server-process.ts";
import { testSmtpPort } from "../setup/test-env.ts";
import { ORIGIN, TEST_PASSWORD, startTestApp, type TestApp } from "../setup/test-app.ts";

/**
 * Sessions are validated once and then answered from each process's cache for reads
 * (server/modules/auth/session-cache.ts). Two processes on one database: this test process runs
 * the app in-process ("here"), and the real server runs as a child process ("there"). A change
 * made in one must be honoured by the other on the very next request, with no wait.
 */
let t: TestApp;
let server: ServerProcess;
let companyId: string;
let storageDir: string;

beforeAll(async () => {
  t = await startTestApp();
  companyId = (await t.makeCompany()).id;
  storageDir = mkdtempSync(path.join(tmpdir(), "eavesight-session-cache-"));
  server = await startServerProcess({ SMTP_PORT: String(testSmtpPort()), STORAGE_DIR: storageDir });
}, 60_000);
afterAll(async () => {
  await server?.stop();
  await t?.close();
  if (storageDir) rmSync(storageDir, { recursive: true, force: true });
});

/** Signs in here and returns the raw cookie, good in both processes (the session is in the database). */
async function signIn(email: string): Promise<string> {
  const res = await t.request().post("/api/auth/sign-in").set("origin", ORIGIN).send({ email, password: TEST_PASSWORD });
  expect(res.status).toBe(200);
  return String(res.headers["set-cookie"]).split(";")[0]!;
}
async function here(cookie: string, method: "GET" | "POST" | "PATCH", pathname: string, body?: object) {
  const req = t.request()[method.toLowerCase() as "get" | "post" | "patch"](pathname).set("cookie", cookie).set("origin", ORIGIN);
  return (body ? await req.send(body) : await req).status;
}
async function there(cookie: string, method: "GET" | "POST" | "PATCH", pathname: string, body?: object) {
  const res = await fetch(`${server.origin}${pathname}`, {
    method, headers: { cookie, origin: server.origin, "content-type": "application/json" },
    ...(body ? { body: JSON.stringify(body) } : {}),
  });
  await res.arrayBuffer();
  return res.status;
}
/** A read twice, so the second answer certainly came from that process's cache. */
async function warm(where: typeof here, cookie: string, pathname: string, status: number) {
  expect(await where(cookie, "GET", pathname)).toBe(status);
  expect(await where(cookie, "GET", pathname)).toBe(status);
}

describe("the session cache across two server processes", () => {
  it("when a cached session is read again, then it answers from the cache (no database read), and an unsignalled change is not seen by reads", async () => {
    const owner = await t.makeUser(companyId, "owner");
    const cookie = await signIn(owner.email);
    await warm(here, cookie, "/api/team", 200);
    expect(t.sessionCache.isListening).toBe(true);
    expect(t.sessionCache.get(cookie.split("=")[1]!, Date.now())?.actor).toMatchObject({ userId: owner.id, role: "owner" });
    await warm(there, cookie, "/api/team", 200);
    // A demotion written with its trigger off sends no notification (the trigger is off only inside
    // this transaction: other transactions never see it off). Reads in both processes keep the
    // cached role, which proves they really answer from the cache…
    await t.db.transaction(async (tx) => {
      await tx.execute(rawSql`alter table users disable trigger users_auth_change_update`);
      await tx.update(users).set({ role: "estimator" }).where(eq(users.id, owner.id));
      await tx.execute(rawSql`alter table users enable trigger users_auth_change_update`);
    });
    expect(await here(cookie, "GET", "/api/team")).toBe(200);
    expect(await there(cookie, "GET", "/api/team")).toBe(200);
    // …while a write is always checked against the database, in either process.
    expect(await there(cookie, "POST", "/api/team/invites", { email: "someone@test.example", role: "sales" })).toBe(403);
    expect(await here(cookie, "POST", "/api/team/invites", { email: "someone@test.example", role: "sales" })).toBe(403);
  });

  it("when an owner changes a user's role in one process, then the other process refuses that user's next read at once", async () => {
    const owner = await t.makeUser(companyId, "owner");
    const demoted = await t.makeUser(companyId, "owner");
    const ownerCookie = await signIn(owner.email);
    const demotedCookie = await signIn(demoted.email);
    await warm(there, demotedCookie, "/api/team", 200);
    await warm(here, demotedCookie, "/api/team", 200);
    expect(await here(ownerCookie, "PATCH", `/api/team/users/${demoted.id}`, { role: "estimator" })).toBe(200);
    expect(await there(demotedCookie, "GET", "/api/team")).toBe(403);
    expect(await here(demotedCookie, "GET", "/api/team")).toBe(403);
    // And back: promoted there, allowed here at once.
    await warm(here, demotedCookie, "/api/team", 403);
    expect(await there(ownerCookie, "PATCH", `/api/team/users/${demoted.id}`, { role: "owner" })).toBe(200);
    expect(await here(demotedCookie, "GET", "/api/team")).toBe(200);
  });

  it("when a user signs out in one process, then the other process refuses that session's next read at once", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const cookie = await signIn(u.email);
    await warm(there, cookie, "/api/projects", 200);
    await warm(here, cookie, "/api/projects", 200);
    expect(await here(cookie, "POST", "/api/auth/sign-out")).toBe(204);
    expect(await there(cookie, "GET", "/api/projects")).toBe(401);
    expect(await here(cookie, "GET", "/api/projects")).toBe(401);
  });

  it("when a user signs out everywhere in one process, then every session of theirs is refused by the other at once", async () => {
    const u = await t.makeUser(companyId, "sales");
    const phone = await signIn(u.email);
    const desk = await signIn(u.email);
    await warm(here, phone, "/api/projects", 200);
    await warm(here, desk, "/api/projects", 200);
    expect(await there(desk, "POST", "/api/auth/sign-out-everywhere")).toBe(204);
    expect(await here(phone, "GET", "/api/projects")).toBe(401);
    expect(await here(desk, "GET", "/api/projects")).toBe(401);
  });

  it("when an owner deactivates a user in one process, then the other process refuses that user's next read at once", async () => {
    const owner = await t.makeUser(companyId, "owner");
    const u = await t.makeUser(companyId, "estimator");
    const ownerCookie = await signIn(owner.email);
    const cookie = await signIn(u.email);
    await warm(here, cookie, "/api/projects", 200);
    await warm(there, cookie, "/api/projects", 200);
    expect(await there(ownerCookie, "POST", `/api/team/users/${u.id}/deactivate`)).toBe(200);
    expect(await here(cookie, "GET", "/api/projects")).toBe(401);
    expect(await there(cookie, "GET", "/api/projects")).toBe(401);
  });

  it("when the absolute lifetime passes while the session is cached, then the cached session is refused too", async () => {
    const u = await t.makeUser(companyId, "estimator");
    const cookie = await signIn(u.email);
    await warm(here, cookie, "/api/projects", 200);
    t.clock.offsetMs = 15 * 24 * 60 * 60 * 1000;
    try {
      expect(await here(cookie, "GET", "/api/projects")).toBe(401);
    } finally {
      t.clock.offsetMs = 0;
    }
  });
});
